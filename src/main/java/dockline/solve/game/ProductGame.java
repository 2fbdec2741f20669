package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.util.Progress;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import java.util.function.IntUnaryOperator;

/**
 * The product arena × goal automaton × monitor (README.md, "How it decides") as a reachability game: the robot
 * wants to reach {@link #WIN} (mission complete, accepted by the monitor), the disturbance wants to
 * reach {@link #LOSE} or to keep the play away from {@code WIN} for ever. Generic over any
 * {@link Monitor}.
 *
 * <p><b>Vertices.</b> {@code WIN = 0} and {@code LOSE = 1} are absorbing sinks (a self-loop each,
 * weight 0); every other vertex is a triple (arena vertex, goal state, monitor state), owned by the
 * owner of its arena vertex. They are numbered densely in the order a breadth-first search from
 * the roots discovers them (the start, or for {@link #everywhere} all robot triples), looked up
 * through an open-addressing hash table or, for the reserve monitor, a direct index.
 *
 * <p><b>Edges</b>, one per arena edge, in the arena's order. From a robot triple (a, g, m) each
 * arena edge a→d leads to (d, g, m): choosing an action reads no weight. From a disturbance triple
 * (d, g, m) each outcome d→a' with weight w leads to: LOSE if m' = monitor.step(m, w) is REJECT;
 * else LOSE if g' = goal.step(g, zones of a's cell) is REJECT (an avoided zone); else WIN if
 * goal.accepting(g', a' on a dock) and monitor.acceptsAtCompletion(m'); else (a', g', m'). So the
 * i-th out-edge of a product vertex corresponds to the i-th out-edge of its arena vertex
 * ({@link #arenaEdge}).
 *
 * <p><b>Start.</b> g0 = goal.initial(zones of the start cell), m0 = monitor.initialState(); the
 * start is LOSE if either is a sink, WIN if the mission is already complete there, else the triple.
 *
 * <p><b>Cost.</b> O(|V| + |E|) time for the product's vertices and edges (one hash look-up per
 * edge), plus a counting sort for the reverse CSR. The size is estimated before building
 * ({@link #estimate}) and the build is refused when the estimate, or the part built so far, is over
 * the memory budget ({@link ProductTooLargeException}).
 *
 * <p>Source: the product of a game arena with deterministic automata that reduces an automaton
 * objective to reachability (Grädel, Thomas, Wilke 2002, "Automata, Logics, and Infinite Games",
 * ch. 2); the monitor is a comparator automaton (published work on comparator automata, 2018).
 */
public final class ProductGame {

    /** The absorbing "mission complete" sink. */
    public static final int WIN = 0;
    /** The absorbing losing sink (below the floor, avoided zone, monitor rejected). */
    public static final int LOSE = 1;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final Monitor monitor;
    private final GameGraph graph;
    private final int[] vArena;
    private final int[] vGoal;
    private final int[] vMonitor;
    private final int start;
    private final Index index;
    private final SizeEstimate estimate;
    private final long buildNanos;

    private ProductGame(Builder b, GameGraph graph, long buildNanos) {
        this.arena = b.arena;
        this.goal = b.goal;
        this.monitor = b.monitor;
        this.graph = graph;
        this.vArena = b.vA;
        this.vGoal = b.vG;
        this.vMonitor = b.vM;
        this.start = b.startId;
        this.index = b.index;
        this.estimate = b.estimate;
        this.buildNanos = buildNanos;
    }

    /** Builds the part of the product reachable from the start. */
    public static ProductGame fromStart(Arena arena, GoalAutomaton goal, Monitor monitor, ProductOptions options) {
        return new Builder(arena, goal, monitor, options, false).build();
    }

    /**
     * Builds the part of the product reachable from every robot triple (a, g, m) with g normalised
     * to a's cell (g := goal.step(g, zones of a's cell), skipped when that rejects or completes the
     * mission) and m in {@code 0 .. monitor.stateBound()-1}; the start is included too. Requires
     * that every int in that range is a monitor state (true of {@link ReserveMonitor}). Used for the
     * heat map.
     */
    public static ProductGame everywhere(Arena arena, GoalAutomaton goal, Monitor monitor, ProductOptions options) {
        return new Builder(arena, goal, monitor, options, true).build();
    }

    /**
     * An upper estimate of the size of {@link #fromStart} (everywhere = false) or
     * {@link #everywhere} (true), in O(arena) time: the arena vertices the start can reach (all, for
     * everywhere) × goal states × monitor states each can hold, plus their out-edges. For the reserve
     * monitor, the levels a vertex can hold are cut from above by the least energy any play spends
     * to reach it from the start or from its last charging step (Dijkstra 1959 on the arena, all
     * outcomes); and for {@link #fromStart} with the reserve monitor, by the tighter
     * {@link ReserveSizeForecast} (the highest level each pair of arena × goal can be reached with,
     * O(arena × goal)), which is exact when waiting costs one unit.
     */
    public static SizeEstimate estimate(Arena arena, GoalAutomaton goal, Monitor monitor, boolean everywhere) {
        return ProductSizeEstimate.estimate(arena, goal, monitor, everywhere, ProductOptions.IndexKind.AUTO);
    }

    /** Arrays longer than this are refused (the JVM's limit, with a margin). */
    static final long MAX_ARRAY = Integer.MAX_VALUE - 16;

    // ---------------------------------------------------------------- queries

    public Arena arena() {
        return arena;
    }

    public GoalAutomaton goal() {
        return goal;
    }

    public Monitor monitor() {
        return monitor;
    }

    /** The game graph the solvers read; its only target is {@link #WIN}. */
    public GameGraph graph() {
        return graph;
    }

    public int vertexCount() {
        return graph.vertexCount();
    }

    public int edgeCount() {
        return graph.edgeCount();
    }

    /** The start vertex: {@link #WIN}, {@link #LOSE} or a robot triple. */
    public int start() {
        return start;
    }

    public boolean isSink(int p) {
        return p == WIN || p == LOSE;
    }

    public boolean isRobot(int p) {
        return graph.isRobot(p);
    }

    /** The arena vertex of a triple, -1 for a sink. */
    public int arenaVertex(int p) {
        return vArena[p];
    }

    /** The goal state of a triple, -1 for a sink. */
    public int goalState(int p) {
        return vGoal[p];
    }

    /** The monitor state of a triple, -1 for a sink. */
    public int monitorState(int p) {
        return vMonitor[p];
    }

    /** Row-major index of the triple's cell. */
    public int cell(int p) {
        return arena.cell(vArena[p]);
    }

    public int budgetLeft(int p) {
        return arena.budgetLeft(vArena[p]);
    }

    /** Bit mask of the tasks done ({@link GoalAutomaton#progressMask}). */
    public int progressMask(int p) {
        return goal.progressMask(vGoal[p]);
    }

    /**
     * The arena edge that product edge {@code e} of vertex {@code p} stands for; -1 for a sink's
     * self-loop.
     */
    public int arenaEdge(int p, int e) {
        if (isSink(p)) {
            return -1;
        }
        int i = e - graph.outBegin(p);
        if (i < 0 || e >= graph.outEnd(p)) {
            throw new IllegalArgumentException("edge " + e + " does not leave vertex " + p);
        }
        return arena.outBegin(vArena[p]) + i;
    }

    /** The product vertex of a triple, or -1 when the build did not reach it. */
    public int vertexOf(int arenaVertex, int goalState, int monitorState) {
        return index.find(arenaVertex, goalState, monitorState);
    }

    /** Whether vertices were numbered through the direct index (else a hash table). */
    public boolean denseIndex() {
        return index instanceof DenseIndex;
    }

    /** The estimate made before the build. */
    public SizeEstimate estimate() {
        return estimate;
    }

    public long buildNanos() {
        return buildNanos;
    }

    /** The vertex in words, e.g. {@code 3:4, 2 disturbances left, 1 of 2 tasks done, 57 units}. */
    public String describe(int p) {
        if (p == WIN) {
            return "mission complete";
        }
        if (p == LOSE) {
            return "lost";
        }
        int a = vArena[p];
        Cell c = arena.cellOf(a);
        String what = arena.isRobot(a) ? "" : ", after choosing " + arena.action(a);
        return c + what + ", " + arena.budgetLeft(a) + " disturbances left, " + goal.describe(vGoal[p]) + ", "
                + monitor.describe(vMonitor[p]);
    }

    /**
     * The robot's policy from the start: one entry per robot triple reachable from the start when
     * the robot follows the solution's chosen edges and the disturbance plays every outcome. The
     * level of an entry is {@code levelOf.applyAsInt(monitor state)}.
     *
     * <p>O(size of the closed loop).
     *
     * @throws IllegalArgumentException if the solution does not win the start
     */
    public Policy policy(Solution solution, IntUnaryOperator levelOf) {
        if (solution.vertexCount() != vertexCount()) {
            throw new IllegalArgumentException("the solution is for another game");
        }
        if (!solution.winning(start)) {
            throw new IllegalArgumentException("the robot does not win from the start");
        }
        List<PolicyEntry> entries = new ArrayList<>();
        for (int p : closedLoop(solution)) {
            if (!isSink(p) && graph.isRobot(p)) {
                int d = graph.target(solution.strategyEdge(p));
                entries.add(new PolicyEntry(arena.cellOf(vArena[p]), levelOf.applyAsInt(vMonitor[p]),
                        arena.budgetLeft(vArena[p]), goal.progressMask(vGoal[p]), arena.action(vArena[d]), null,
                        arena.closures(vArena[p])));
            }
        }
        return new Policy(entries);
    }

    /**
     * The closed loop of a solution from the start: the vertices a play can reach when the robot follows
     * the solution's chosen edges and the disturbance plays every outcome, in breadth-first order from the
     * start (the sinks are listed but not expanded). O(size of the closed loop) time, O(|V|) memory.
     *
     * @throws IllegalArgumentException if a robot vertex reached has no chosen edge
     */
    public int[] closedLoop(Solution solution) {
        boolean[] seen = new boolean[vertexCount()];
        int[] todo = new int[vertexCount()];
        int tail = 0;
        seen[start] = true;
        todo[tail++] = start;
        for (int head = 0; head < tail; head++) {
            int p = todo[head];
            if (isSink(p)) {
                continue;
            }
            int begin = graph.outBegin(p);
            int end = graph.outEnd(p);
            if (graph.isRobot(p)) {
                begin = solution.strategyEdge(p);
                if (begin < 0) {
                    throw new IllegalArgumentException("no chosen edge at winning vertex " + describe(p));
                }
                end = begin + 1;
            }
            for (int e = begin; e < end; e++) {
                int t = graph.target(e);
                if (!seen[t]) {
                    seen[t] = true;
                    todo[tail++] = t;
                }
            }
        }
        return Arrays.copyOf(todo, tail);
    }

    // ---------------------------------------------------------------- index

    private interface Index {
        int find(int a, int g, int m);
    }

    private static final class DenseIndex implements Index {
        private final int[] slot; // id + 1, 0 = absent
        private final int gs;
        private final int ms;

        DenseIndex(int slots, int gs, int ms) {
            this.slot = new int[slots];
            this.gs = gs;
            this.ms = ms;
        }

        int key(int a, int g, int m) {
            if (m < 0 || m >= ms) {
                throw new IllegalStateException("monitor state " + m + " outside 0.." + (ms - 1)
                        + ": the direct index needs a monitor whose states lie below stateBound()");
            }
            return (a * gs + g) * ms + m;
        }

        @Override
        public int find(int a, int g, int m) {
            if (a < 0 || g < 0 || m < 0 || m >= ms || g >= gs) {
                return -1;
            }
            long k = ((long) a * gs + g) * ms + m;
            return k < slot.length ? slot[(int) k] - 1 : -1;
        }
    }

    /** Open addressing with linear probing; keys live in the vertex arrays, the table holds id + 1. */
    private static final class HashIndex implements Index {
        private int[] table;
        private int mask;
        private int size;
        private final Builder b;

        HashIndex(Builder b, int expected) {
            this.b = b;
            int cap = Integer.highestOneBit(Math.max(16, expected) * 2 - 1) << 1;
            table = new int[Math.max(16, cap)];
            mask = table.length - 1;
        }

        static int hash(int a, int g, int m) {
            long h = a * 0x9E3779B97F4A7C15L;
            h ^= (g + 0x632BE59BD9B4E019L) * 0xC2B2AE3D27D4EB4FL;
            h ^= (m + 0x165667B19E3779F9L) * 0x94D049BB133111EBL;
            h ^= h >>> 31;
            return (int) (h ^ (h >>> 29));
        }

        @Override
        public int find(int a, int g, int m) {
            int i = hash(a, g, m) & mask;
            while (true) {
                int id = table[i] - 1;
                if (id < 0) {
                    return -1;
                }
                if (b.vA[id] == a && b.vG[id] == g && b.vM[id] == m) {
                    return id;
                }
                i = (i + 1) & mask;
            }
        }

        /** Inserts a new id whose triple is already in the vertex arrays. */
        void insert(int id) {
            if (2 * (size + 1) > table.length) {
                grow();
            }
            place(id);
            size++;
        }

        private void place(int id) {
            int i = hash(b.vA[id], b.vG[id], b.vM[id]) & mask;
            while (table[i] != 0) {
                i = (i + 1) & mask;
            }
            table[i] = id + 1;
        }

        private void grow() {
            int[] old = table;
            if (old.length >= (1 << 30)) {
                throw new ArithmeticException("product hash table is full");
            }
            table = new int[old.length * 2];
            mask = table.length - 1;
            for (int s : old) {
                if (s != 0) {
                    place(s - 1);
                }
            }
        }
    }

    // ---------------------------------------------------------------- builder

    private static final class Builder {
        final Arena arena;
        final GoalAutomaton goal;
        final Monitor monitor;
        final boolean everywhere;
        final BooleanSupplier cancelled;
        final long budget;
        final SizeEstimate estimate;
        Index index;
        DenseIndex dense;
        HashIndex hash;

        int[] vA;
        int[] vG;
        int[] vM;
        byte[] owner;
        int n;
        int startId;

        Builder(Arena arena, GoalAutomaton goal, Monitor monitor, ProductOptions options, boolean everywhere) {
            if (arena == null || goal == null || monitor == null || options == null) {
                throw new IllegalArgumentException("arena, goal, monitor and options are required");
            }
            this.arena = arena;
            this.goal = goal;
            this.monitor = monitor;
            this.everywhere = everywhere;
            this.cancelled = options.cancelled();
            this.budget = options.effectiveMemoryBudget();
            this.estimate = ProductSizeEstimate.estimate(arena, goal, monitor, everywhere, options.index());
            if (estimate.bytes() > budget) {
                throw new ProductTooLargeException(estimate, budget, false);
            }
            int initial = (int) Math.min(Math.max(estimate.vertices(), 16), 1 << 20);
            vA = new int[initial];
            vG = new int[initial];
            vM = new int[initial];
            owner = new byte[initial];
            if (estimate.denseSlots() > 0) {
                if (estimate.denseSlots() > MAX_ARRAY || monitor.stateBound() > Integer.MAX_VALUE) {
                    throw new ProductTooLargeException(estimate, budget, false);
                }
                dense = new DenseIndex((int) estimate.denseSlots(), goal.stateCount(), (int) monitor.stateBound());
                index = dense;
            } else {
                hash = new HashIndex(this, initial);
                index = hash;
            }
        }

        ProductGame build() {
            long t0 = System.nanoTime();
            // the sinks
            addRaw(-1, -1, -1, GameGraph.ROBOT);
            addRaw(-1, -1, -1, GameGraph.ROBOT);
            int a0 = arena.startVertex();
            int c0 = arena.cell(a0);
            int g0 = goal.initial(arena.cellZones(c0));
            int m0 = monitor.initialState();
            if (g0 == GoalAutomaton.REJECT || m0 == Monitor.REJECT) {
                startId = LOSE;
            } else if (goal.accepting(g0, arena.isDock(c0)) && monitor.acceptsAtCompletion(m0)) {
                startId = WIN;
            } else {
                startId = intern(a0, g0, m0);
            }
            if (everywhere) {
                addAllRoots();
            }

            IntArray outStart = new IntArray(Math.min(vA.length + 1, 1 << 20));
            IntArray edgeTarget = new IntArray((int) Math.min(Math.max(estimate.edges(), 16), 1 << 22));
            // sinks: self-loops
            outStart.add(0);
            edgeTarget.add(WIN);
            outStart.add(1);
            edgeTarget.add(LOSE);
            int steps = 0;
            // per cent of the estimated vertices built (the estimate is an upper bound)
            Progress.Tracker progress = Progress.phase("building the stored game",
                    estimate.vertices());
            for (int p = 2; p < n; p++) {
                if ((p & (Progress.EVERY - 1)) == 0) {
                    progress.at(p);
                }
                outStart.add(edgeTarget.size());
                int a = vA[p];
                int g = vG[p];
                int m = vM[p];
                int begin = arena.outBegin(a);
                int end = arena.outEnd(a);
                if (arena.isRobot(a)) {
                    for (int e = begin; e < end; e++) {
                        edgeTarget.add(intern(arena.target(e), g, m));
                    }
                } else {
                    for (int e = begin; e < end; e++) {
                        edgeTarget.add(outcome(arena.target(e), g, monitor.step(m, arena.weight(e))));
                    }
                }
                steps += end - begin + 1;
                if (steps >= AttractorSolver.POLL_INTERVAL) {
                    steps = 0;
                    if (cancelled.getAsBoolean()) {
                        throw new CancellationException("building the game was cancelled");
                    }
                    checkBudget(edgeTarget.size());
                }
            }
            outStart.add(edgeTarget.size());
            checkBudget(edgeTarget.size());
            progress.done();
            byte[] own = owner;
            boolean[] target = new boolean[n];
            target[WIN] = true;
            GameGraph graph = new GameGraph(own, target, outStart.array(), edgeTarget.array(), n, edgeTarget.size());
            return new ProductGame(this, graph, System.nanoTime() - t0);
        }

        /** The product vertex an outcome leads to. */
        private int outcome(int a2, int g, int m2) {
            if (m2 == Monitor.REJECT) {
                return LOSE;
            }
            int c2 = arena.cell(a2);
            int g2 = goal.step(g, arena.cellZones(c2));
            if (g2 == GoalAutomaton.REJECT) {
                return LOSE;
            }
            if (goal.accepting(g2, arena.isDock(c2)) && monitor.acceptsAtCompletion(m2)) {
                return WIN;
            }
            return intern(a2, g2, m2);
        }

        private void addAllRoots() {
            int gs = goal.stateCount();
            long ms = monitor.stateBound();
            for (int a = 0; a < arena.robotCount(); a++) {
                int c = arena.cell(a);
                long zones = arena.cellZones(c);
                boolean dock = arena.isDock(c);
                for (int g = 0; g < gs; g++) {
                    int gn = goal.step(g, zones);
                    if (gn == GoalAutomaton.REJECT || gn != g) {
                        continue; // not normalised: the same position is root (a, gn, m)
                    }
                    for (int m = 0; m < ms; m++) {
                        if (goal.accepting(gn, dock) && monitor.acceptsAtCompletion(m)) {
                            continue;
                        }
                        intern(a, gn, m);
                    }
                }
            }
        }

        private void checkBudget(long edges) {
            SizeEstimate sofar = SizeEstimate.of(n, edges, estimate.denseSlots());
            if (sofar.bytes() > budget) {
                throw new ProductTooLargeException(sofar, budget, true);
            }
        }

        private int intern(int a, int g, int m) {
            if (dense != null) {
                int k = dense.key(a, g, m);
                int id = dense.slot[k] - 1;
                if (id < 0) {
                    id = addRaw(a, g, m, arena.isRobot(a) ? GameGraph.ROBOT : GameGraph.DISTURBANCE);
                    dense.slot[k] = id + 1;
                }
                return id;
            }
            int id = hash.find(a, g, m);
            if (id < 0) {
                id = addRaw(a, g, m, arena.isRobot(a) ? GameGraph.ROBOT : GameGraph.DISTURBANCE);
                hash.insert(id);
            }
            return id;
        }

        private int addRaw(int a, int g, int m, byte own) {
            if (n == vA.length) {
                int cap = (int) Math.min(MAX_ARRAY, (long) n + (n >> 1) + 16);
                if (cap <= n) {
                    throw ProductTooLargeException.indexRange(SizeEstimate.of(n, n, 0), n);
                }
                vA = Arrays.copyOf(vA, cap);
                vG = Arrays.copyOf(vG, cap);
                vM = Arrays.copyOf(vM, cap);
                owner = Arrays.copyOf(owner, cap);
            }
            vA[n] = a;
            vG[n] = g;
            vM[n] = m;
            owner[n] = own;
            return n++;
        }
    }
}
