package dockline.solve;

import java.util.function.BooleanSupplier;

/**
 * How a {@link dockline.solve.game.ProductGame} is built.
 *
 * @param memoryBudgetBytes refuse to build a product estimated (or found) to need more than this;
 *                          0 means {@link #defaultMemoryBudget()}
 * @param index             how (arena vertex, goal state, monitor state) triples are numbered
 * @param cancelled         polled every few thousand steps; when it returns {@code true} the build stops
 *                          with {@link java.util.concurrent.CancellationException}
 *
 * <p>Data only (settings); validated in the constructor.
 */
public record ProductOptions(long memoryBudgetBytes, IndexKind index, BooleanSupplier cancelled) {

    /** How product vertices are looked up while the product is built. */
    public enum IndexKind {
        /** Dense for the reserve monitor when the dense table is not much bigger than a hash table would be. */
        AUTO,
        /** A direct index over all (arena vertex, goal state, level) triples (reserve-like monitors only). */
        DENSE,
        /** An open-addressing hash table over the triples (any monitor). */
        HASH
    }

    public ProductOptions {
        if (memoryBudgetBytes < 0) {
            throw new IllegalArgumentException("memory budget must not be negative");
        }
        if (index == null) {
            index = IndexKind.AUTO;
        }
        if (cancelled == null) {
            cancelled = () -> false;
        }
    }

    public static ProductOptions defaults() {
        return new ProductOptions(0, IndexKind.AUTO, () -> false);
    }

    public ProductOptions withMemoryBudget(long bytes) {
        return new ProductOptions(bytes, index, cancelled);
    }

    public ProductOptions withIndex(IndexKind kind) {
        return new ProductOptions(memoryBudgetBytes, kind, cancelled);
    }

    public ProductOptions withCancelled(BooleanSupplier flag) {
        return new ProductOptions(memoryBudgetBytes, index, flag);
    }

    /**
     * The budget in force: the given one, or {@link #defaultMemoryBudget()}; a given budget above the
     * JVM's maximum heap is the heap ({@link Runtime#maxMemory()}), as no more can be had, so that a refusal
     * names the limit that really applied.
     */
    public long effectiveMemoryBudget() {
        return budgetInForce(memoryBudgetBytes);
    }

    /** The budget in force for a given one ({@code --max-memory}; 0: none given), as {@link #effectiveMemoryBudget()}. */
    public static long budgetInForce(long givenBytes) {
        return givenBytes > 0 ? Math.min(givenBytes, Runtime.getRuntime().maxMemory()) : defaultMemoryBudget();
    }

    /**
     * Half of the largest heap the JVM will use ({@link Runtime#maxMemory()}): the rest is left for
     * the arena, the policy, the heat map and whatever the caller holds.
     */
    public static long defaultMemoryBudget() {
        return Runtime.getRuntime().maxMemory() / 2;
    }
}
