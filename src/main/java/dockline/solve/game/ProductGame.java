package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.solve.ProductOptions;
import dockline.solve.SizeEstimate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
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
    private final ProductBuilder.Index index;
    private final SizeEstimate estimate;
    private final long buildNanos;

    ProductGame(ProductBuilder.Builder b, GameGraph graph, long buildNanos) {
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
        return new ProductBuilder.Builder(arena, goal, monitor, options, false).build();
    }

    /**
     * Builds the part of the product reachable from every robot triple (a, g, m) with g normalised
     * to a's cell (g := goal.step(g, zones of a's cell), skipped when that rejects or completes the
     * mission) and m in {@code 0 .. monitor.stateBound()-1}; the start is included too. Requires
     * that every int in that range is a monitor state (true of {@link ReserveMonitor}). Used for the
     * heat map.
     */
    public static ProductGame everywhere(Arena arena, GoalAutomaton goal, Monitor monitor, ProductOptions options) {
        return new ProductBuilder.Builder(arena, goal, monitor, options, true).build();
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
        return index instanceof ProductBuilder.DenseIndex;
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
}
