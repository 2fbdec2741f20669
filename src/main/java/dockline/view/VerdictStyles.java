package dockline.view;

/** CSS style classes for the verdict label (colour and words together: the words carry the meaning). */
final class VerdictStyles {

    private VerdictStyles() {
    }

    static String of(VerdictSummary.Outcome o) {
        return switch (o) {
            case GUARANTEED -> "verdict-guaranteed";
            case NOT_GUARANTEED -> "verdict-not-guaranteed";
            case NOT_CHECKED -> "verdict-not-checked";
        };
    }

    static void apply(javafx.scene.control.Label l, VerdictSummary.Outcome o) {
        l.getStyleClass().removeAll("verdict-guaranteed", "verdict-not-guaranteed", "verdict-not-checked");
        if (!l.getStyleClass().contains("verdict")) {
            l.getStyleClass().add("verdict");
        }
        l.getStyleClass().add(of(o));
    }
}
