package dockline.solve.charging;

import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.GoalPredecessors;
import dockline.solve.game.MinMaxSearch;
import dockline.util.Csr;
import dockline.util.IntArrayList;
import dockline.util.Progress;
import java.util.Arrays;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The reserve question <em>with</em> charging, solved without the battery levels in the game: per
 * game position (robot vertex of the arena, goal state) the least charge, in units above the
 * reserve floor, from which the robot can force completion (maps/README.md, "Game semantics").
 *
 * <p><b>Method.</b> Consumption games with reload states (Brázdil, Chatterjee, Kučera, Novotný,
 * "Efficient Controller Synthesis for Consumption Games with Multiple Resource Types", CAV 2012),
 * here with one resource, a capacity and a reachability objective: rounds of Knuth's min-max
 * Dijkstra on arena × goal ({@link MinMaxSearch.Counting}; D. E. Knuth, 1977, "A generalization of Dijkstra's algorithm",
 * Information Processing Letters 6(1):1-5), in which a <em>good</em> dock counts as a target.
 *
 * <p><b>Why it equals the product game.</b> Write λ = level − floor and U = capacity − floor. In
 * the product (arena × goal × levels, {@code ReserveMonitor}) a step of delta w takes λ to
 * min(U, λ + w) and loses when λ + w &lt; 0. (1) Winning is upward closed in λ, because
 * min(U, λ + w) is monotone in λ; so a position is described by its least winning λ, {@code need},
 * in 0..U, or ∞. (2) For an outcome of delta w ≤ 0 to a position of need x ≤ U the least λ before
 * the step is x − w (the saturation never bites, as λ + w ≤ λ ≤ U); values above U are ∞. These are
 * Knuth's superior functions (max over outcomes of x − w, min over actions), so a Dijkstra pass
 * finds the least fixpoint. (3) The only positive deltas are charge actions, which the arena gives
 * exactly one undisturbed outcome, back to the same robot vertex; the goal state is unchanged too,
 * because occupying the same cell again is idempotent in the goal automaton on every position a play
 * can meet (one whose goal state already counts its own cell; other positions get an upper bound). So at a dock the robot
 * can charge from any λ ≥ 0 to exactly U (charge rate ≥ 1 unit, saturating), and a charging dock
 * position has need 0 if its need without charging, with a full battery, is at most U, and ∞
 * otherwise (charging never lowers a need below what the moves give at U). (4) Reachability is a
 * least fixpoint, so good docks are found <em>from below</em>: round 0 has only completion positions
 * as targets; after each round every charging dock position whose need without charging is at most U
 * becomes good (need 0) and a target of the next round; the rounds stop when no dock position is
 * added. Starting from "every dock good" and removing bad ones (the greatest fixpoint, right for the
 * safety objective of consumption games) would be wrong here: two docks within reach of each other
 * but of no completion would stay good. Values only fall from round to round, and the last round's
 * values are the product game's least winning levels, at every position, for this U.
 *
 * <p><b>Policy.</b> A position's policy is the list of its improvements, one per round in which its
 * value fell: (threshold, action), thresholds falling. At level λ the robot takes the first entry
 * whose threshold is at most λ (the earliest round that already wins from λ); at a good dock below
 * its move's threshold it charges. This is a ranked strategy: an entry of round r leads, in Dijkstra's
 * order of round r, to positions that then use an entry of a round at most r and finalised earlier,
 * or to a completion, or to a dock that turned good before round r; so plays cannot cycle and every
 * step keeps λ ≥ the next position's threshold ≥ 0. Taking each position's last-round choice instead
 * could cycle between two docks.
 *
 * <p><b>Cost.</b> At most (number of charging dock positions + 1) rounds, in practice the largest
 * number of reloads a worst-case play needs plus two; each round O(m·G·log(n·G)) time for an arena of
 * n vertices and m edges and G goal states (every round starts afresh: values only fall between rounds,
 * but a dock that turns good lowers values below Dijkstra's frontier, so a round cannot be resumed), and
 * 11 bytes per robot position and 5 per disturbance position, plus 12 bytes per policy entry (one per
 * position and round in which its need fell) and the heap. Nothing depends on the number of battery levels except
 * the size of the numbers. This solves one floor (U changes the good docks); {@link FloorSweep} answers
 * every floor in one pass and is what {@link ChargingRoute} runs; these rounds stay as its cross-check.
 */
public final class ChargingSolver {

    /** Need of a position from which the robot cannot force completion. */
    public static final int INFINITE = MinMaxSearch.INFINITE;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int goalCount;
    private final int robotCount;
    private final GoalPredecessors inverse;
    /** Per robot vertex: the out-edge of its charge action, or -1. */
    private final int[] chargeEdge;
    /** Polled by the rounds and by {@link FloorSweep}; raised: the solve stops (a window's Cancel). */
    private final BooleanSupplier cancelled;

    /**
     * A solver that is never cancelled.
     *
     * @throws IllegalArgumentException if arena × goal has more than {@code Integer.MAX_VALUE} vertices, or a
     *                                  positive delta is not a charge action's only outcome back to its robot vertex
     */
    public ChargingSolver(Arena arena, GoalAutomaton goal) {
        this(arena, goal, () -> false);
    }

    /**
     * A solver whose rounds and whose {@link FloorSweep} poll {@code cancelled} (once per round, and every
     * {@value AttractorSolver#POLL_INTERVAL} queue pops of the pass) and stop with a
     * {@link CancellationException} once it is raised, as the product routes do.
     *
     * @throws IllegalArgumentException if arena × goal has more than {@code Integer.MAX_VALUE} vertices, or a
     *                                  positive delta is not a charge action's only outcome back to its robot vertex
     */
    public ChargingSolver(Arena arena, GoalAutomaton goal, BooleanSupplier cancelled) {
        this.cancelled = cancelled == null ? () -> false : cancelled;
        this.arena = arena;
        this.goal = goal;
        this.goalCount = goal.stateCount();
        Math.multiplyExact(arena.vertexCount(), goalCount);
        this.robotCount = arena.robotCount();
        this.inverse = new GoalPredecessors(arena, goal);
        this.chargeEdge = new int[robotCount];
        Arrays.fill(chargeEdge, -1);
        for (int r = 0; r < robotCount; r++) {
            for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                int d = arena.target(e);
                boolean charge = arena.actionKind(d) == ActionKind.CHARGE;
                for (int f = arena.outBegin(d); f < arena.outEnd(d); f++) {
                    if (arena.weight(f) > 0 && !(charge && arena.outEnd(d) - arena.outBegin(d) == 1
                            && arena.target(f) == r)) {
                        throw new IllegalArgumentException("a positive energy delta that is not a charge step"
                                + " back to the same position: the charging route does not apply");
                    }
                }
                if (charge && arena.outEnd(d) > arena.outBegin(d)) {
                    chargeEdge[r] = e;
                }
            }
        }
    }

    public Arena arena() {
        return arena;
    }

    public GoalAutomaton goal() {
        return goal;
    }

    /** The goal state after occupying the start cell (may be {@link GoalAutomaton#REJECT}). */
    public int startGoal() {
        return goal.initial(arena.cellZones(arena.cell(arena.startVertex())));
    }

    /**
     * Every position's least winning level above the floor for a usable range of {@code usable} units
     * (capacity − floor), and the threshold policy.
     *
     * @throws IllegalArgumentException if {@code usable} is negative
     */
    public Values solve(int usable) {
        if (usable < 0) {
            throw new IllegalArgumentException("usable range must not be negative: " + usable);
        }
        final int gc = goalCount;
        final MinMaxSearch.Counting search = new MinMaxSearch.Counting(arena, goal, inverse);
        final int robotN = search.positions();
        final boolean[] good = new boolean[robotN];
        final int[] best = new int[robotN];
        Arrays.fill(best, INFINITE);
        // improvements, per round: position, threshold, out-edge
        IntArrayList impPos = new IntArrayList();
        IntArrayList impNeed = new IntArrayList();
        IntArrayList impEdge = new IntArrayList();
        int rounds = 0;
        int goodCount = 0;
        while (true) {
            poll(0);
            rounds++;
            search.reset();
            // every robot vertex (cell and disturbance state: budget left, and closures with lasting events)
            for (int p = 0; p < robotN; p++) {
                if (good[p] || search.completes(p)) {
                    search.addTarget(p);
                }
            }
            // one round of Knuth's min-max Dijkstra; charge steps are handled by the good docks (class comment, point 3)
            search.run(usable, INFINITE, -1, Progress.Tracker.NONE);
            int added = 0;
            for (int p = 0; p < robotN; p++) {
                if (good[p] || search.completes(p)) {
                    continue;
                }
                int r = p / gc;
                int x = search.isFinal(p) ? search.need(p) : INFINITE;
                if (x < best[p]) {
                    best[p] = x;
                    impPos.add(p);
                    impNeed.add(x);
                    impEdge.add(search.chosenEdge(p));
                }
                if (x != INFINITE && chargeEdge[r] >= 0) {
                    good[p] = true;
                    added++;
                }
            }
            goodCount += added;
            if (added == 0) {
                break;
            }
        }
        int[] need = search.needs();
        for (int p = 0; p < robotN; p++) {
            if (good[p]) {
                need[p] = 0;
            }
        }
        return new Values(this, usable, need, good, rounds, goodCount, impPos.toArray(), impNeed.toArray(),
                impEdge.toArray());
    }

    /**
     * Stops the solve when its flag is raised, polled at every {@value AttractorSolver#POLL_INTERVAL}-th
     * {@code step} the caller counts (step 0: now, as each round does).
     */
    void poll(int step) {
        if ((step & (AttractorSolver.POLL_INTERVAL - 1)) == 0 && cancelled.getAsBoolean()) {
            throw new CancellationException("the charging route was cancelled");
        }
    }

    int chargeEdge(int r) {
        return chargeEdge[r];
    }

    GoalPredecessors inverse() {
        return inverse;
    }

    /** Values made by another pass of this package ({@link FloorSweep}). */
    Values values(int usable, int[] need, boolean[] good, int rounds, int goodDocks, int[] impPos, int[] impNeed,
                  int[] impEdge) {
        return new Values(this, usable, need, good, rounds, goodDocks, impPos, impNeed, impEdge);
    }

    int goalCount() {
        return goalCount;
    }

    /**
     * The result of {@link #solve}: least needs and the threshold policy for one usable range.
     */
    public static final class Values {
        private final ChargingSolver solver;
        private final int usable;
        private final int[] need;
        private final boolean[] good;
        private final int rounds;
        private final int goodDocks;
        // policy entries in CSR by position, thresholds falling
        private final int[] entryStart;
        private final int[] entryNeed;
        private final int[] entryEdge;

        private Values(ChargingSolver solver, int usable, int[] need, boolean[] good, int rounds, int goodDocks,
                       int[] impPos, int[] impNeed, int[] impEdge) {
            this.solver = solver;
            this.usable = usable;
            this.need = need;
            this.good = good;
            this.rounds = rounds;
            this.goodDocks = goodDocks;
            // the entries grouped by position by a counting sort; improvements were recorded round by round,
            // so each position's entries come in falling thresholds
            int n = need.length;
            this.entryStart = Csr.reverseOffsets(n, impPos.length, impPos);
            int[] order = Csr.reverseEdges(n, impPos, entryStart);
            this.entryNeed = new int[impPos.length];
            this.entryEdge = new int[impPos.length];
            for (int at = 0; at < order.length; at++) {
                entryNeed[at] = impNeed[order[at]];
                entryEdge[at] = impEdge[order[at]];
            }
        }

        /** Capacity minus floor, in units. */
        public int usable() {
            return usable;
        }

        /** Dijkstra rounds taken (the last one adds no dock). */
        public int rounds() {
            return rounds;
        }

        /** Charging dock positions found good (a full battery there suffices). */
        public int goodDocks() {
            return goodDocks;
        }

        /**
         * The least level above the floor from which the robot wins at robot vertex {@code v} in goal state
         * {@code g}; {@link #INFINITE} when no level does or {@code g} is the reject sink.
         */
        public int need(int v, int g) {
            checkRobot(v);
            return g == GoalAutomaton.REJECT ? INFINITE : need[v * solver.goalCount + g];
        }

        /** Whether (v, g) is a charging dock position from which a full battery suffices. */
        public boolean goodDock(int v, int g) {
            checkRobot(v);
            return g != GoalAutomaton.REJECT && good[v * solver.goalCount + g];
        }

        /** The start position's need (with the start cell's goal state). */
        public int startNeed() {
            int g = solver.startGoal();
            return need(solver.arena.startVertex(), g);
        }

        /**
         * The policy of position (v, g) as level thresholds: pairs (threshold above the floor, arena out-edge
         * of v), thresholds falling; at level λ take the first pair whose threshold is at most λ. A good dock
         * ends with (0, its charge edge) when its move needs more than 0. Empty for completion positions and
         * for positions that cannot win.
         */
        public int[][] thresholds(int v, int g) {
            checkRobot(v);
            if (g == GoalAutomaton.REJECT) {
                return new int[0][];
            }
            int p = v * solver.goalCount + g;
            int from = entryStart[p];
            int to = entryStart[p + 1];
            boolean charge = good[p] && to > from && entryNeed[to - 1] > 0;
            int[][] out = new int[to - from + (charge ? 1 : 0)][];
            for (int i = from; i < to; i++) {
                out[i - from] = new int[] {entryNeed[i], entryEdge[i]};
            }
            if (charge) {
                out[to - from] = new int[] {0, solver.chargeEdge(v)};
            }
            return out;
        }

        /**
         * The arena out-edge the threshold policy takes at robot vertex v, goal state g and level λ above the
         * floor; -1 when the mission is complete there or λ is below the position's need. O(entries of the
         * position).
         */
        public int action(int v, int g, int level) {
            checkRobot(v);
            if (g == GoalAutomaton.REJECT || level < 0) {
                return -1;
            }
            int p = v * solver.goalCount + g;
            for (int i = entryStart[p]; i < entryStart[p + 1]; i++) {
                if (entryNeed[i] <= level) {
                    return entryEdge[i];
                }
            }
            return good[p] ? solver.chargeEdge(v) : -1;
        }

        /** Policy entries over all positions (the charge entries of good docks not counted). */
        public int entryCount() {
            return entryNeed.length;
        }

        private void checkRobot(int v) {
            if (v < 0 || v >= solver.robotCount) {
                throw new IllegalArgumentException("not a robot vertex: " + v);
            }
        }
    }

}
