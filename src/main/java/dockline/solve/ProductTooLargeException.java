package dockline.solve;

import dockline.model.ResourceLimitException;

/**
 * The product game would not fit: either in the memory budget (thrown before the build when the
 * estimate is over it, or during the build when the vertices found so far are), or in the index
 * range of a Java array (only where memory would allow more than 2^31 of them: the stored route's
 * vertices, the fast path's arena × goal pairs; the implicit route numbers with longs). The
 * message says how big the game would be, which limit applied and what to change; the CLI maps it
 * to exit code 3.
 */
public final class ProductTooLargeException extends ResourceLimitException {

    private static final long serialVersionUID = 1L;

    private final transient SizeEstimate estimate;
    private final long budgetBytes;

    /** Over the memory budget {@code budgetBytes} (the one in force: --max-memory, or half the heap). */
    public ProductTooLargeException(SizeEstimate estimate, long budgetBytes, boolean duringBuild) {
        this(estimate, budgetBytes, duringBuild, SMALLER);
    }

    /**
     * As {@link #ProductTooLargeException(SizeEstimate, long, boolean)}, with the game's own ways to be
     * smaller ({@code smaller}, e.g. "make the game smaller: ..."), for a game whose size does not
     * depend on what the general advice names.
     */
    public ProductTooLargeException(SizeEstimate estimate, long budgetBytes, boolean duringBuild, String smaller) {
        super((duringBuild ? "the game grew past the memory budget while it was built: at least " : "the game would have ")
                + estimate.describe() + ", over the memory budget of " + SizeEstimate.megabytes(budgetBytes)
                + " (" + budgetSource(budgetBytes) + ")", memoryAdvice(budgetBytes, smaller));
        this.estimate = estimate;
        this.budgetBytes = budgetBytes;
    }

    private static final String SMALLER = "make the game smaller: a coarser energy resolution (a larger unit in Wh), a"
            + " smaller disturbance budget K or fewer tasks in any order";

    private ProductTooLargeException(SizeEstimate estimate, long slots, String unused) {
        super("the game would have " + estimate.describe() + ", numbered in " + slots + " slots: more than the "
                        + (Integer.MAX_VALUE - 16) + " a Java array can index",
                "make the game smaller: a coarser energy resolution (a larger unit in Wh), a smaller disturbance"
                        + " budget K or fewer tasks in any order; more memory does not help with this limit");
        this.estimate = estimate;
        this.budgetBytes = -1;
    }

    /** The implicit numbering of the product has more slots than an int array can index. */
    public static ProductTooLargeException indexRange(SizeEstimate estimate, long slots) {
        return new ProductTooLargeException(estimate, slots, null);
    }

    /** Where the budget came from, judged against the default (half of {@link Runtime#maxMemory()}). */
    static String budgetSource(long budgetBytes) {
        long heap = Runtime.getRuntime().maxMemory();
        if (budgetBytes == ProductOptions.defaultMemoryBudget()) {
            return "half the JVM's maximum heap of " + (heap >> 20) + " MB, set by -Xmx";
        }
        if (budgetBytes == heap) {
            return "the JVM's maximum heap, set by -Xmx, which is below the budget given with --max-memory";
        }
        return "the budget given with --max-memory; the JVM's maximum heap is " + (heap >> 20) + " MB";
    }

    private static String memoryAdvice(long budgetBytes, String smaller) {
        long heap = Runtime.getRuntime().maxMemory();
        if (budgetBytes == ProductOptions.defaultMemoryBudget()) {
            return smaller + "; or give the JVM more memory (java -Xmx...; the budget is half of it)";
        }
        if (budgetBytes == heap) {
            return smaller + "; or give the JVM more memory (java -Xmx...)";
        }
        if (budgetBytes < heap / 2) {
            return smaller + "; or raise --max-memory (up to about " + (heap >> 21) + " MB with this -Xmx)";
        }
        return smaller + "; or give the JVM more memory (java -Xmx...) and raise --max-memory with it";
    }

    public SizeEstimate estimate() {
        return estimate;
    }

    /** The memory budget that applied, or -1 when the limit was the index range. */
    public long budgetBytes() {
        return budgetBytes;
    }
}
