package dockline.solve.fast;

import dockline.util.Progress;
import dockline.util.VisitQueue;

import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.game.GoalPredecessors;
import dockline.solve.game.MinMaxSearch;

/**
 * The fast path for missions without charging before the end: the minimum charge needed at every
 * vertex of arena × goal automaton, by the generalisation of Dijkstra's algorithm to AND-OR graphs
 * with superior cost functions (D. E. Knuth, 1977, "A generalization of Dijkstra's algorithm",
 * Information Processing Letters 6(1):1-5).
 *
 * <p><b>What it computes.</b> For a robot vertex u = (arena vertex, goal state) the value
 * {@code need(u)} is the least amount of energy E (in units) such that the robot has a strategy
 * that, against every disturbance choice, completes the mission from u spending at most E in total;
 * {@link #INFINITE} if no strategy forces completion. Robot vertices take the minimum over their
 * actions (robot edges cost 0), disturbance vertices the maximum over their outcomes of
 * (consumption of the outcome + need of its target), and completion vertices (all tasks done, on a
 * dock if required) are worth 0. Plays that never complete, or that occupy an avoided zone, are
 * worth {@link #INFINITE}. This is the least fixpoint of those equations; a disturbance vertex is
 * finalised when all its successors are, a robot vertex when it leaves the priority queue.
 *
 * <p><b>Why it decides the reserve question.</b> Without charging every outcome has a delta w ≤ 0,
 * so the battery after a step is {@code min(capacity, level + w) = level + w}: levels never saturate
 * (the starting charge is already clamped to the capacity, see {@link Mission#startUnits()}), and
 * the level only falls. A play keeps the level at or above the floor at every step iff it does at
 * its last step, i.e. iff {@code start − (energy spent) ≥ floor}. Hence, with start level s,
 * floor f and initial goal state g0 (after occupying the start cell):
 * <pre>
 *   guaranteed  ⇔  s ≥ f  and  g0 is not the reject sink  and  need(start, g0) ≤ s − f.
 * </pre>
 * The capacity plays no further part. The result is independent of the energy resolution in
 * cost (values are plain ints): O(m·G·log(n·G)) time for an arena of n vertices and m edges and a
 * goal automaton of G states (the search is {@link MinMaxSearch.Counting}, shared with the charging route),
 * with a 4-ary heap on a primitive long array (key and vertex packed in
 * one entry, lazy deletion); memory about 5 bytes per disturbance vertex of arena × goal (a 4-byte
 * running maximum and a 1-byte counter) and 5 bytes per robot vertex (value and a final flag), plus
 * 8 bytes per heap entry (at most one per improvement), on top of the arena.
 *
 * <p><b>When it applies.</b> When the arena has no charge action (charge rate 0), or no robot
 * vertex reachable from the start before completion can charge (see {@link #applicable}). Charge
 * outcomes are left out of the computation: {@code need} is exact on every vertex when the charge
 * rate is 0, and on every vertex reachable from the start otherwise (elsewhere it is an upper
 * bound, because an option of the robot was dropped).
 *
 * <p>{@link #decide()} stops as soon as the start vertex is finalised or the smallest value in
 * the queue exceeds {@code s − f} (values leave the queue in increasing order), so it explores only
 * the vertices that need at most the available energy; {@link #solveAll()} computes every value.
 */
public final class MinChargeSolver {

    /** Value of a vertex from which the robot cannot force completion. */
    public static final int INFINITE = MinMaxSearch.INFINITE;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int goalCount;
    private final int startGoal;
    private final int available;
    private final GoalPredecessors inverse;
    private final boolean strengthened;

    /**
     * The outcome of a run.
     *
     * @param guaranteed      the start verdict
     * @param startNeed       the start vertex's need; from {@link #decide()}, {@link #INFINITE} also when it
     *                        exceeds the available energy (the search stopped before it)
     * @param availableUnits  starting level minus floor (negative: the start is already below the floor)
     * @param explored        robot vertices of arena × goal taken from the queue
     * @param productVertices vertices of arena × goal
     * @param complete        every value was computed ({@link #solveAll()})
     */
    public record Result(boolean guaranteed, int startNeed, int availableUnits, long explored, long productVertices,
                         boolean complete) {
        /** The start need as text: units, or "never" when the robot cannot force completion. */
        public String describeNeed() {
            return startNeed == INFINITE ? "never" : startNeed + " units";
        }
    }

    /**
     * @throws IllegalArgumentException if the mission can charge before completion ({@link #applicable} is false)
     *                                  or arena × goal has more than {@code Integer.MAX_VALUE} vertices
     */
    public MinChargeSolver(Arena arena, GoalAutomaton goal) {
        this(arena, goal, false);
    }

    /**
     * The solver of the weakened ({@code strengthened} false) or the strengthened game of an arena restricted to
     * some closure phases ({@link dockline.arena.ArenaCompiler#compileWithin}); on a whole arena, which has no
     * left-out outcome, both are the mission's. Weakened: an outcome into a left-out phase loses, so every need is
     * an upper bound of the mission's. Strengthened: such an outcome is not the building's to choose (it is left
     * out of the disturbance position's maximum; every action keeps its nominal outcome), so every need is a lower
     * bound, and a start it cannot finish from is lost in the mission too.
     *
     * @throws IllegalArgumentException as {@link #MinChargeSolver(Arena, GoalAutomaton)}
     */
    public MinChargeSolver(Arena arena, GoalAutomaton goal, boolean strengthened) {
        this.strengthened = strengthened;
        if (!applicable(arena, goal)) {
            throw new IllegalArgumentException("the robot can charge before the mission is complete:"
                    + " the minimum-charge fast path does not apply; use the product solver");
        }
        this.arena = arena;
        this.goal = goal;
        this.goalCount = goal.stateCount();
        Math.multiplyExact(arena.vertexCount(), goalCount);
        Mission mission = arena.mission();
        int s = arena.startVertex();
        this.startGoal = goal.initial(arena.cellZones(arena.cell(s)));
        this.available = mission.startUnits() - mission.reserveUnits();

        this.inverse = new GoalPredecessors(arena, goal);
    }

    /**
     * Whether the fast path is exact for the start verdict: the arena has no charge action, or no
     * robot vertex of arena × goal reachable from the start, other than completion vertices, has
     * one. O(m·G) time when charging exists (a forward search ignoring energy), O(1) otherwise.
     */
    public static boolean applicable(Arena arena, GoalAutomaton goal) {
        if (!canCharge(arena)) {
            return true;
        }
        return noChargeBeforeTheEnd(arena, goal);
    }

    /** Whether the arena has a charge action at all (a dock with a charging rate). O(free cells). */
    public static boolean canCharge(Arena arena) {
        boolean anyCharge = false;
        for (int slot = 0; slot < arena.freeCellCount() && !anyCharge; slot++) {
            int c = arena.freeCell(slot);
            if (arena.isDock(c)) {
                int r = arena.robotVertex(c, 0);
                for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                    if (arena.actionKind(arena.target(e)) == ActionKind.CHARGE) {
                        anyCharge = true;
                    }
                }
            }
        }
        return anyCharge;
    }

    /** The forward search of {@link #applicable} when the arena can charge: O(m·G), 1 to 5 bytes per pair. */
    private static boolean noChargeBeforeTheEnd(Arena arena, GoalAutomaton goal) {
        int gc = goal.stateCount();
        int s = arena.startVertex();
        int g0 = goal.initial(arena.cellZones(arena.cell(s)));
        if (g0 == GoalAutomaton.REJECT) {
            return true;
        }
        VisitQueue queue = new VisitQueue(Math.toIntExact(Math.multiplyExact((long) arena.vertexCount(), gc)));
        queue.visit(s * gc + g0);
        while (queue.hasNext()) {
            int p = queue.next();
            int v = p / gc;
            int g = p % gc;
            boolean robot = arena.isRobot(v);
            if (robot && goal.accepting(g, arena.isDock(arena.cell(v)))) {
                continue;
            }
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int t = arena.target(e);
                if (robot && arena.actionKind(t) == ActionKind.CHARGE) {
                    return false;
                }
                int g2 = robot ? g : goal.step(g, arena.cellZones(arena.cell(t)));
                if (g2 != GoalAutomaton.REJECT) {
                    queue.visit(t * gc + g2);
                }
            }
        }
        return true;
    }

    /** The start verdict, stopping as soon as it is known (see the class comment). */
    public Result decide() {
        return decideValues().result;
    }

    /**
     * As {@link #decide()}, with the values and choices found so far: when the start is guaranteed, those of the
     * closed loop of the chosen actions from it are final (as for {@link #solveStart()}).
     */
    public Values decideValues() {
        return run(Mode.DECIDE);
    }

    /**
     * The start's need exactly (not capped by the available energy), stopping once the start is
     * finalised: the values and chosen actions of every vertex taken from the queue so far are
     * final, which covers the closed loop of the chosen actions from the start (each choice leads
     * to a disturbance vertex finalised before the chooser). With it the highest floor that can be
     * guaranteed is {@code s − need(start)} (from the class comment's equivalence, for floor f:
     * guaranteed ⇔ need ≤ s − f), when the need is at most s; no floor can be guaranteed otherwise.
     */
    public Values solveStart() {
        return run(Mode.START);
    }

    /** Every value; {@link Values#need(int, int)} gives the minimum charge per arena vertex and goal state. */
    public Values solveAll() {
        return run(Mode.ALL);
    }

    private enum Mode { DECIDE, START, ALL }

    /** The minimum charge needed per robot vertex of arena × goal, from {@link #solveAll()}. */
    public static final class Values {
        private final MinMaxSearch.Counting search;
        private final Result result;

        private Values(MinMaxSearch.Counting search, Result result) {
            this.search = search;
            this.result = result;
        }

        /**
         * The robot's action of least need at robot vertex {@code v} in goal state {@code g}: the arena
         * edge to the disturbance vertex whose finalised value gave {@code need(v, g)} first (on a tie
         * the one finalised first, so following the choices never cycles: each leads to a vertex
         * finalised earlier). -1 when the vertex is not final, is a completion vertex, or cannot force
         * completion. The choice does not depend on the battery level.
         */
        public int chosenEdge(int v, int g) {
            int p = position(v, g);
            return p >= 0 && search.isFinal(p) ? search.chosenEdge(p) : -1;
        }

        /**
         * The least energy (units) the robot must be able to spend to complete the mission from robot
         * vertex {@code v} in goal state {@code g}; {@link #INFINITE} when it cannot force completion
         * or {@code g} is the reject sink.
         */
        public int need(int v, int g) {
            int p = position(v, g);
            return p < 0 ? INFINITE : search.need(p);
        }

        /** The position of (v, g), -1 for the reject sink. */
        private int position(int v, int g) {
            if (v < 0 || v >= search.arena().robotCount()) {
                throw new IllegalArgumentException("not a robot vertex: " + v);
            }
            return g == GoalAutomaton.REJECT ? -1 : v * search.goalCount() + g;
        }

        public Result result() {
            return result;
        }
    }

    private Values run(Mode mode) {
        final boolean stopEarly = mode == Mode.DECIDE;
        final boolean stopAtStart = mode != Mode.ALL;
        final int gc = goalCount;
        final MinMaxSearch.Counting search = new MinMaxSearch.Counting(arena, goal, inverse, strengthened);
        final int robotN = search.positions();

        int startP = startGoal == GoalAutomaton.REJECT ? -1 : arena.startVertex() * gc + startGoal;
        boolean feasible = available >= 0 && startP >= 0;
        if (feasible || !stopEarly && startP >= 0 || mode == Mode.ALL) {
            for (int p = 0; p < robotN; p++) {
                if (search.completes(p)) {
                    search.addTarget(p);
                }
            }
        }
        // per cent of the robot situations finalised: a bound, as the search may stop at the start
        Progress.Tracker progress = Progress.phase("least charge to finish (fast path)", robotN);
        // no cap: a need is at most the int range, and one beyond it counts as never
        long explored = search.run(INFINITE, stopEarly ? available : INFINITE, stopAtStart ? startP : -1, progress);
        // after a full run every vertex left with a value is final; in decide() mode an undecided start needs more
        int startNeed = startP >= 0 && search.isFinal(startP) ? search.need(startP) : INFINITE;
        boolean guaranteed = feasible && startNeed != INFINITE && startNeed <= available;
        long productVertices = (long) arena.vertexCount() * gc;
        progress.done();
        return new Values(search, new Result(guaranteed, startNeed, available, explored, productVertices,
                mode == Mode.ALL));
    }

}
