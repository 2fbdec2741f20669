package dockline.bench;

/**
 * The sizes of a discounted threshold product (arena x comparator, {@link DiscountedThresholdGame} and
 * {@link ImplicitDiscountedGame}) as built or explored: vertices (the two sinks included), edges (the
 * sinks' self-loops included) and comparator states discovered (the initial state and the accepting
 * sink included). The on-the-fly game may stop before it has found the whole product; its sizes are
 * then those of the part explored.
 */
abstract class ProductCounts {

    private final int vertexCount;
    private final int edgeCount;
    private final int comparatorStates;

    ProductCounts(int vertexCount, int edgeCount, int comparatorStates) {
        this.vertexCount = vertexCount;
        this.edgeCount = edgeCount;
        this.comparatorStates = comparatorStates;
    }

    public final int vertexCount() {
        return vertexCount;
    }

    public final int edgeCount() {
        return edgeCount;
    }

    public final int comparatorStates() {
        return comparatorStates;
    }
}
