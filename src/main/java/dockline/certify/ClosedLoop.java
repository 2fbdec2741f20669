package dockline.certify;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.ThresholdPolicy;
import dockline.util.LongIntMap;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The closed loop of a robot policy against every disturbance choice: the graph whose nodes are the
 * robot situations (arena robot vertex, battery level, task progress) reachable from the start when
 * the robot follows the policy, and whose edges are the disturbance's outcomes (arena edges).
 *
 * <p>Built by breadth-first search from the start, so the first problem found (a missing or illegal
 * policy entry, a level below the floor, an avoided zone) has a shortest trace. Complete situations
 * (all tasks done, on a dock when required) have no successors. Battery levels follow maps/README.md, "Game
 * semantics":
 * {@code level' = min(capacity, level + delta)}; a successor below the floor is not a node.
 *
 * <p>The policy is either rows per situation ({@link Policy}) or thresholds per position
 * ({@link ThresholdPolicy}: the action at a level is the position's first step at or below it, looked up
 * here for every level a play meets, so the check is exact for every play from the start).
 *
 * <p>Cost: O(N + E) time and memory plus one policy lookup per node, for N nodes and E edges of the
 * loop; everything is stored in int arrays. The task progress is this package's own bookkeeping
 * ({@link TaskProgress}), not the solver's goal automaton.
 */
public final class ClosedLoop extends LoopNodes {

    /** Successor code: the outcome leaves the battery below the floor. */
    public static final int LOST_BELOW_FLOOR = -1;
    /** Successor code: the outcome puts the robot in an avoided zone. */
    public static final int LOST_AVOIDED_ZONE = -2;

    /** Default limit on the loop size. */
    public static final int DEFAULT_MAX_NODES = 20_000_000;

    /** What went wrong while building the loop. */
    public enum ProblemKind {
        START_BELOW_FLOOR, START_IN_AVOIDED_ZONE, MISSING_ENTRY, ILLEGAL_ACTION, BELOW_FLOOR, AVOIDED_ZONE
    }

    /**
     * The first problem found.
     *
     * @param kind   what went wrong
     * @param node   the loop node where it happened
     * @param edge   the arena outcome edge that caused it, or -1
     * @param level  for {@link ProblemKind#BELOW_FLOOR}: the level reached; otherwise the node's level
     */
    public record Problem(ProblemKind kind, int node, int edge, int level) {
    }

    /** The loop would exceed the node limit. */
    public static final class TooLargeException extends dockline.model.ResourceLimitException {
        private static final long serialVersionUID = 1L;

        /** The loop would have more than {@code limit} nodes. */
        public TooLargeException(int limit) {
            super("the closed loop of the policy has more than " + limit + " states, too many to certify",
                    "make the game smaller: a coarser energy resolution or a smaller disturbance budget K (the limit is"
                            + " the certificate checker's own, so more memory does not help)");
        }
    }


    private Problem problem;
    private final ThresholdPolicy thresholds;

    private ClosedLoop(Arena arena, Policy policy, ThresholdPolicy thresholds, int floor, int startLevel) {
        super(arena, policy, floor, startLevel);
        this.thresholds = thresholds;
    }

    /**
     * Builds the loop from the arena's start vertex with the given start level; stops at the first
     * problem.
     *
     * @throws TooLargeException if the loop has more than {@code maxNodes} nodes
     */
    static ClosedLoop build(Arena arena, Policy policy, int floor, int startLevel, int maxNodes) {
        ClosedLoop loop = new ClosedLoop(arena, policy, null, floor, startLevel);
        loop.explore(maxNodes);
        return loop;
    }

    /**
     * Builds the loop of a threshold policy; stops at the first problem.
     *
     * @throws TooLargeException if the loop has more than {@code maxNodes} nodes
     */
    static ClosedLoop build(Arena arena, ThresholdPolicy policy, int floor, int startLevel, int maxNodes) {
        ClosedLoop loop = new ClosedLoop(arena, null, policy, floor, startLevel);
        loop.explore(maxNodes);
        return loop;
    }

    /** The threshold policy this loop follows, when it follows one. */
    public Optional<ThresholdPolicy> thresholds() {
        return Optional.ofNullable(thresholds);
    }

    /**
     * The policy as rows: the given rows, or for a threshold policy one row per robot situation of the
     * loop with the action the thresholds give there (made on first use).
     */
    @Override
    public Policy policy() {
        if (policy == null) {
            List<PolicyEntry> rows = new ArrayList<>();
            for (int n = 0; n < expanded; n++) {
                int d = nodeChoice.get(n);
                if (d >= 0) {
                    int v = nodeVertex.get(n);
                    rows.add(new PolicyEntry(arena.cellOf(v), nodeLevel.get(n), arena.budgetLeft(v), nodeMask.get(n),
                            arena.action(d), null, arena.closures(v)));
                }
            }
            policy = new Policy(rows);
        }
        return policy;
    }

    /** The action the policy gives at a situation (rows or thresholds). */
    Optional<Action> lookup(int v, int level, int mask) {
        return thresholds != null
                ? thresholds.lookup(arena.cellOf(v), level, arena.budgetLeft(v), mask, arena.closures(v))
                : policy.lookup(arena.cellOf(v), level, arena.budgetLeft(v), mask, null, arena.closures(v));
    }

    private void explore(int maxNodes) {
        int v0 = arena.startVertex();
        int m0 = progress.step(0, arena.cellZones(arena.cell(v0)));
        LongIntMap ids = new LongIntMap(1 << 12);
        addNode(ids, v0, startLevel, Math.max(m0, 0), -1, -1);
        if (startLevel < floor) {
            problem = new Problem(ProblemKind.START_BELOW_FLOOR, 0, -1, startLevel);
            return;
        }
        if (m0 == TaskProgress.AVOIDED) {
            problem = new Problem(ProblemKind.START_IN_AVOIDED_ZONE, 0, -1, startLevel);
            return;
        }
        for (int n = 0; n < nodeVertex.size(); n++) {
            graph.openSuccessors();
            expanded = n + 1;
            int v = nodeVertex.get(n);
            int level = nodeLevel.get(n);
            int mask = nodeMask.get(n);
            int cell = arena.cell(v);
            if (progress.complete(mask, arena.isDock(cell))) {
                nodeChoice.add(-1);
                continue;
            }
            Optional<Action> act = lookup(v, level, mask);
            if (act.isEmpty()) {
                nodeChoice.add(-1);
                problem = new Problem(ProblemKind.MISSING_ENTRY, n, -1, level);
                return;
            }
            int d = LoopGraph.legalChoice(arena, v, act.get());
            nodeChoice.add(d);
            if (d < 0) {
                problem = new Problem(ProblemKind.ILLEGAL_ACTION, n, -1, level);
                return;
            }
            for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                int u = arena.target(e);
                long raw = (long) level + arena.weight(e);
                int next = (int) Math.min(capacity, raw);
                if (raw < floor) {
                    graph.addSuccessor(LOST_BELOW_FLOOR, e);
                    problem = new Problem(ProblemKind.BELOW_FLOOR, n, e, (int) Math.max(Integer.MIN_VALUE, raw));
                    return;
                }
                int nextMask = progress.step(mask, arena.cellZones(arena.cell(u)));
                if (nextMask == TaskProgress.AVOIDED) {
                    graph.addSuccessor(LOST_AVOIDED_ZONE, e);
                    problem = new Problem(ProblemKind.AVOIDED_ZONE, n, e, next);
                    return;
                }
                long key = key(u, next, nextMask);
                int id = ids.get(key);
                if (id < 0) {
                    if (nodeVertex.size() >= maxNodes) {
                        throw new TooLargeException(maxNodes);
                    }
                    id = addNode(ids, u, next, nextMask, n, e);
                }
                graph.addSuccessor(id, e);
            }
        }
        graph.closeSuccessors();
    }

    private int addNode(LongIntMap ids, int v, int level, int mask, int parent, int parentEdge) {
        int id = nodeVertex.size();
        nodeVertex.add(v);
        nodeLevel.add(level);
        nodeMask.add(mask);
        graph.addNode(parent, parentEdge);
        ids.put(key(v, level, mask), id);
        return id;
    }

    private long key(int v, int level, int mask) {
        long k = Math.addExact(Math.multiplyExact((long) v, (long) capacity + 1), level);
        return Math.addExact(Math.multiplyExact(k, 1L << progress.taskCount()), mask);
    }

    public int capacity() {
        return capacity;
    }

    /** Whether the whole loop was built (no problem stopped the search). */
    public boolean complete() {
        return problem == null;
    }

    public Optional<Problem> problem() {
        return Optional.ofNullable(problem);
    }

    /** Number of nodes whose successors were computed. */
    public int expandedCount() {
        return expanded;
    }

    /** The doors and zones closed at the node ({@link dockline.policy.PolicyEntry#closures}). */
    public String closures(int node) {
        return arena.closures(nodeVertex.get(node));
    }

    /**
     * Per node the lowest battery level any run from it can reach, the node's own level included: a
     * backward pass over a topological order ({@link #topologicalOrder()}) of this acyclic loop, O(N + E).
     */
    public int[] lowestLevels(int[] order) {
        int[] lowest = new int[nodeCount()];
        for (int i = order.length - 1; i >= 0; i--) {
            int v = order[i];
            int lo = level(v);
            for (int s = succBegin(v); s < succEnd(v); s++) {
                lo = Math.min(lo, lowest[succNode(s)]);
            }
            lowest[v] = lo;
        }
        return lowest;
    }

    /** The level after following outcome edge {@code e} from level {@code level} (saturated at capacity). */
    public int levelAfter(int level, int e) {
        return (int) Math.min(capacity, (long) level + arena.weight(e));
    }

    @Override
    int problemNode() {
        return problem == null ? -1 : problem.node();
    }

    @Override
    Enum<?> problemKind() {
        return problem == null ? null : problem.kind();
    }
}
