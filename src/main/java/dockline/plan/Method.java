package dockline.plan;

/** The method a {@link Plan} was computed by; {@link #word()} is its name in the JSON outputs. */
public enum Method {
    /** Minimum charge on arena × goal (Knuth 1977): the robot cannot charge before the end. */
    FAST("fast"),
    /** Least charge per position of arena × goal with the good docks as targets, every floor in one pass. */
    CHARGING("charging"),
    /** The product game arena × goal × battery levels, its moves generated on demand, and the attractor. */
    PRODUCT("product"),
    /** The same product game stored in CSR arrays (the reference route). */
    STORED_PRODUCT("stored-product"),
    /** The verdict alone on the product game without storing it. */
    IMPLICIT_VERDICT("implicit-product"),
    /** Bisection over the threshold solver and the charging route's minimum-credit pass. */
    MARGINS("margins"),
    /** The product with the discounted-sum comparator (and the battery, unless the score alone is asked). */
    COMPARATOR_PRODUCT("comparator-product");

    private final String word;

    Method(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }
}
