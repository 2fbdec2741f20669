package dockline.solve;

import dockline.arena.Arena;
import dockline.monitor.DiscountedComparator;
import dockline.util.LongIntMap;
import dockline.monitor.Monitor;
import dockline.model.Relation;
import java.util.Arrays;

/**
 * The comparator route for the discounted threshold question <b>without</b> the dock goal: the
 * product of the arena with a {@link DiscountedComparator}, over infinite plays. It answers exactly
 * the question {@link DiscountedValueIteration#decide} answers by optimisation, so the two are
 * cross-checked in tests and compared in {@link DiscountedBench}. (Missions, with their tasks and
 * dock, go through {@link DiscountedSolver} and the generic {@link ProductGame}.)
 *
 * <p>Vertices: {@link #ACCEPTED} (the comparator's accepting sink) and {@link #REJECTED} (its
 * losing sink), each with a self-loop, then the pairs (arena vertex, comparator state) reachable
 * from (start, initial), numbered in breadth-first order through an open-addressing table. A
 * robot pair (x, s) has one edge per action, to (action, s): choosing reads no weight. A
 * disturbance pair (a, s) has one edge per outcome a -> x' of weight w, to the sink the comparator
 * reaches on w or to (x', s').
 *
 * <p>For {@code >} the robot must reach {@link #ACCEPTED} (co-safety): the robot's attractor. For
 * {@code >=} the robot must avoid {@link #REJECTED} for ever (safety): the robot wins exactly
 * outside the disturbance's attractor to {@link #REJECTED}, computed by the same linear-time
 * {@link AttractorSolver} with the roles swapped (Grädel, Thomas, Wilke (eds.), "Automata, Logics,
 * and Infinite Games", LNCS 2500, 2002, ch. 2: safety and reachability games are dual). The method follows the published work on
 * satisficing (threshold) problems in quantitative games (2021).
 *
 * <p>Cost: O(|V| + |E|) time and memory in the product, which has at most (arena vertices) x
 * (comparator states) vertices.
 */
public final class DiscountedThresholdGame {

    public static final int ACCEPTED = 0;
    public static final int REJECTED = 1;
    private static final int START = 2;

    private final Relation relation;
    private final int vertexCount;
    private final int edgeCount;
    private final boolean[] robotOwned;
    private final int[] outStart;
    private final int[] edgeTarget;
    private final int comparatorStates;
    private final long buildNanos;

    private DiscountedThresholdGame(Relation relation, int n, int m, boolean[] robotOwned, int[] outStart,
                                    int[] edgeTarget, int comparatorStates, long buildNanos) {
        this.relation = relation;
        this.vertexCount = n;
        this.edgeCount = m;
        this.robotOwned = robotOwned;
        this.outStart = outStart;
        this.edgeTarget = edgeTarget;
        this.comparatorStates = comparatorStates;
        this.buildNanos = buildNanos;
    }

    /**
     * Builds the product from the start vertex.
     *
     * @throws IllegalArgumentException if an arena weight exceeds the comparator's bound
     * @throws ArithmeticException      if the product would have more than {@code Integer.MAX_VALUE} vertices or edges
     */
    public static DiscountedThresholdGame build(Arena arena, DiscountedComparator comparator) {
        long t0 = System.nanoTime();
        int cap = Math.max(16, arena.vertexCount() * 2);
        int[] vA = new int[cap];
        int[] vM = new int[cap];
        boolean[] robot = new boolean[cap];
        int[] outStart = new int[cap + 1];
        int[] edgeTarget = new int[Math.max(16, arena.edgeCount() * 2)];
        LongIntMap index = new LongIntMap(cap);
        // sinks: self-loops
        robot[ACCEPTED] = true;
        robot[REJECTED] = false;
        int n = START;
        int m = 0;
        vA[START] = arena.startVertex();
        vM[START] = comparator.initialState();
        robot[START] = arena.isRobot(arena.startVertex());
        index.put(key(arena.startVertex(), comparator.initialState()), START);
        n++;
        for (int v = 0; v < n; v++) {
            outStart[v] = m;
            if (v < START) {
                edgeTarget = ensure(edgeTarget, m + 1);
                edgeTarget[m++] = v;
                continue;
            }
            int x = vA[v];
            int s = vM[v];
            for (int e = arena.outBegin(x); e < arena.outEnd(x); e++) {
                int t = arena.target(e);
                int s2 = arena.isRobot(x) ? s : comparator.step(s, arena.weight(e));
                int id;
                if (s2 == Monitor.REJECT) {
                    id = REJECTED;
                } else if (s2 == DiscountedComparator.ACCEPT) {
                    id = ACCEPTED;
                } else {
                    long k = key(t, s2);
                    id = index.get(k);
                    if (id == LongIntMap.ABSENT) {
                        if (n == vA.length) {
                            int c = Math.addExact(n, n / 2);
                            vA = Arrays.copyOf(vA, c);
                            vM = Arrays.copyOf(vM, c);
                            robot = Arrays.copyOf(robot, c);
                            outStart = Arrays.copyOf(outStart, c + 1);
                        }
                        id = n++;
                        vA[id] = t;
                        vM[id] = s2;
                        robot[id] = arena.isRobot(t);
                        index.put(k, id);
                    }
                }
                edgeTarget = ensure(edgeTarget, m + 1);
                edgeTarget[m] = id;
                m = Math.addExact(m, 1);
            }
        }
        outStart = Arrays.copyOf(outStart, n + 1);
        outStart[n] = m;
        return new DiscountedThresholdGame(comparator.relation(), n, m, Arrays.copyOf(robot, n), outStart,
                Arrays.copyOf(edgeTarget, m), comparator.stateCount(), System.nanoTime() - t0);
    }

    private static int[] ensure(int[] a, int size) {
        return size <= a.length ? a : Arrays.copyOf(a, Math.max(size, Math.addExact(a.length, a.length / 2)));
    }

    private static long key(int arenaVertex, int state) {
        return ((long) arenaVertex << 32) | (state & 0xffffffffL);
    }

    /** Whether the robot can force {@code DS relation v} from the start, by one linear-time attractor. */
    public boolean robotWins() {
        boolean safety = relation == Relation.AT_LEAST;
        boolean[] reacher = new boolean[vertexCount];
        boolean[] target = new boolean[vertexCount];
        for (int v = 0; v < vertexCount; v++) {
            reacher[v] = safety != robotOwned[v];
        }
        target[safety ? REJECTED : ACCEPTED] = true;
        Solution sol = new AttractorSolver(new GameGraph(reacher, target, outStart, edgeTarget)).solve();
        return safety != sol.winning(START);
    }

    public int vertexCount() {
        return vertexCount;
    }

    public int edgeCount() {
        return edgeCount;
    }

    /** Comparator states discovered while building (initial state and accepting sink included). */
    public int comparatorStates() {
        return comparatorStates;
    }

    public long buildNanos() {
        return buildNanos;
    }
}
