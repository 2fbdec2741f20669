package dockline.certify;

import dockline.arena.Arena;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.util.IntArrayList;
import java.util.List;

/**
 * The nodes and edges a closed loop of a policy is made of, as both checkers build them
 * ({@link ClosedLoop} for the reserve floor, {@link DiscountedClosedLoop} with the score memory as
 * well): per node its arena robot vertex, battery level, task progress and the policy's choice, in
 * int arrays, and the successor slots and breadth-first tree in a {@link LoopGraph}. O(1) per query;
 * the topological order and the cycle search are O(N + E) (Kahn 1962).
 */
abstract class LoopNodes {

    final Arena arena;
    Policy policy; // a threshold policy's loop makes its rows on demand (ClosedLoop.policy)
    final int floor;
    final int startLevel;
    final int capacity;
    final TaskProgress progress;

    final IntArrayList nodeVertex = new IntArrayList(1024);
    final IntArrayList nodeLevel = new IntArrayList(1024);
    final IntArrayList nodeMask = new IntArrayList(1024);
    final IntArrayList nodeChoice = new IntArrayList(1024);
    final LoopGraph graph = new LoopGraph();
    int expanded;

    LoopNodes(Arena arena, Policy policy, int floor, int startLevel) {
        this.arena = arena;
        this.policy = policy;
        this.floor = floor;
        this.startLevel = startLevel;
        Mission m = arena.mission();
        this.capacity = m.capacityUnits();
        this.progress = TaskProgress.of(m);
    }

    /** The node at which a problem stopped the search, or -1 when none did. */
    abstract int problemNode();

    /** The kind of the problem that stopped the search, or null when none did. */
    abstract Enum<?> problemKind();

    public Arena arena() {
        return arena;
    }

    public Policy policy() {
        return policy;
    }

    public int floor() {
        return floor;
    }

    public int startLevel() {
        return startLevel;
    }

    /** Number of nodes found (the start is node 0). */
    public int nodeCount() {
        return nodeVertex.size();
    }

    public int vertex(int node) {
        return nodeVertex.get(node);
    }

    public Cell cell(int node) {
        return arena.cellOf(nodeVertex.get(node));
    }

    public int level(int node) {
        return nodeLevel.get(node);
    }

    public int budgetLeft(int node) {
        return arena.budgetLeft(nodeVertex.get(node));
    }

    /** Task progress mask: bit i set when task i of the visit list is done. */
    public int progress(int node) {
        return nodeMask.get(node);
    }

    /** The lowest battery level over the nodes found (Integer.MAX_VALUE when there are none). */
    int minLevelSeen() {
        int lo = Integer.MAX_VALUE;
        for (int v = 0; v < nodeCount(); v++) {
            lo = Math.min(lo, level(v));
        }
        return lo;
    }

    /** Whether the node is a completed mission (absorbing). */
    public boolean isComplete(int node) {
        return node < expanded && nodeChoice.get(node) < 0 && problemNode() != node;
    }

    /** The arena disturbance vertex of the policy's action at the node, or -1 (complete or not expanded). */
    public int choice(int node) {
        return node < expanded ? nodeChoice.get(node) : -1;
    }

    /** The parent node in the breadth-first tree (-1 for the start). */
    public int parent(int node) {
        return graph.parent(node);
    }

    /** The arena edge from the parent (-1 for the start). */
    public int parentEdge(int node) {
        return graph.parentEdge(node);
    }

    public int succBegin(int node) {
        return graph.succBegin(node);
    }

    public int succEnd(int node) {
        return graph.succEnd(node);
    }

    /** The successor node of the i-th successor slot, or one of the loop's {@code LOST_*} codes. */
    public int succNode(int i) {
        return graph.succNode(i);
    }

    /** The arena outcome edge of the i-th successor slot. */
    public int succEdge(int i) {
        return graph.succEdge(i);
    }

    /** The nodes on the breadth-first path from the start to the node, start first. */
    public List<Integer> pathTo(int node) {
        return graph.pathTo(node);
    }

    /**
     * A topological order of the loop's nodes (every edge goes from an earlier to a later node), or
     * {@code null} if the loop has a cycle. Kahn's algorithm (Kahn 1962, "Topological sorting of large
     * networks", CACM 5(11)), O(N + E); ties are taken in node order, so the order is deterministic.
     *
     * @throws IllegalStateException if the loop is not complete
     */
    public int[] topologicalOrder() {
        requireComplete();
        return graph.topologicalOrder(nodeCount());
    }

    /**
     * A cycle of the loop as a list of nodes {@code n0, n1, ..., nk} with {@code nk == n0}, or an empty
     * list if the loop is acyclic. Found by peeling off sources (Kahn) and walking back along
     * predecessors among the nodes left, which must close a cycle. O(N + E).
     *
     * @throws IllegalStateException if the loop is not complete
     */
    public List<Integer> findCycle() {
        requireComplete();
        return graph.findCycle(nodeCount());
    }

    /** The loop's graph, for the checker's second opinion on cycles. */
    LoopGraph graph() {
        return graph;
    }

    private void requireComplete() {
        if (problemKind() != null) {
            throw new IllegalStateException("the closed loop was not completed: " + problemKind());
        }
    }
}
