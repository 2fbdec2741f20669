package dockline.plan;

import dockline.model.Worded;

/** The method a {@link Plan} was computed by; {@link #word()} is its name in the JSON outputs. */
public enum Method implements Worded {
    /** Minimum charge on arena × goal (Knuth 1977): the robot cannot charge before the end. */
    FAST,
    /** Least charge per position of arena × goal with the good docks as targets, every floor in one pass. */
    CHARGING,
    /** The product game arena × goal × battery levels, its moves generated on demand, and the attractor. */
    PRODUCT,
    /** The same product game stored in CSR arrays (the reference route). */
    STORED_PRODUCT,
    /** The verdict alone on the product game without storing it. */
    IMPLICIT_PRODUCT,
    /** Bisection over the threshold solver and the charging route's minimum-credit pass. */
    MARGINS,
    /** The product with the discounted-sum comparator (and the battery, unless the score alone is asked). */
    COMPARATOR_PRODUCT;
}
