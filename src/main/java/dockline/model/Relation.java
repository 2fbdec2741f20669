package dockline.model;

/** How a discounted score is compared with its threshold. */
public enum Relation {
    /** score ≥ threshold: a safety condition on the comparator. */
    AT_LEAST(">="),
    /** score &gt; threshold: a co-safety (reachability) condition on the comparator. */
    ABOVE(">");

    private final String symbol;

    Relation(String symbol) {
        this.symbol = symbol;
    }

    /** How files and reports write it: {@code >=} or {@code >}. */
    public String symbol() {
        return symbol;
    }
}
