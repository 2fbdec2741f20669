package dockline.view;

/** What is drawn over the plain map. */
public enum Overlay {
    /** The plan only: surfaces, walls, docks, doors, zones. */
    PLAIN("plain map"),
    /** The charge needed per cell. */
    HEAT("charge needed"),
    /** The policy's moves for one battery level and task progress. */
    POLICY("policy");

    private final String word;

    Overlay(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** Parses {@code plain}, {@code heat} or {@code policy} (as the render option takes them). */
    public static Overlay ofOption(String s) {
        return switch (s.toLowerCase(java.util.Locale.ROOT)) {
            case "plain", "none" -> PLAIN;
            case "heat" -> HEAT;
            case "policy" -> POLICY;
            default -> throw new IllegalArgumentException("unknown overlay '" + s + "' (plain, heat or policy)");
        };
    }

    @Override
    public String toString() {
        return word;
    }
}
