package dockline.solve;

/**
 * The product game would not fit in the memory budget. Thrown before the build when the estimate
 * is over the budget, or during the build when the vertices found so far are. The message says how
 * big the game would be and what to change; the CLI maps it to exit code 3.
 */
public final class ProductTooLargeException extends RuntimeException {

    private final SizeEstimate estimate;
    private final long budgetBytes;

    public ProductTooLargeException(SizeEstimate estimate, long budgetBytes, boolean duringBuild) {
        super((duringBuild ? "the game grew past the memory budget while it was built: at least " : "the game would have ")
                + estimate.describe() + ", over the budget of " + SizeEstimate.megabytes(budgetBytes)
                + ". Make it smaller: a coarser energy resolution (a larger unit in Wh), a smaller disturbance"
                + " budget K, fewer tasks in any order, or give the JVM more memory (-Xmx).");
        this.estimate = estimate;
        this.budgetBytes = budgetBytes;
    }

    public SizeEstimate estimate() {
        return estimate;
    }

    public long budgetBytes() {
        return budgetBytes;
    }
}
