package dockline.solve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The threshold solver for the reserve objective: arena × goal automaton × {@link ReserveMonitor},
 * solved as a reachability game by the linear-time attractor (DESIGN.md 2.4).
 *
 * <p>{@link #analyse} gives the verdict, the robot's policy, the worst level the disturbances can
 * force under it (dynamic programming over the acyclic closed loop, O(closed loop)), the highest
 * floor that can be guaranteed (bisection over the floor, one solve per probe, O(log start) solves;
 * sound because winning is monotone in the floor), and optionally the heat map.
 */
public final class ReserveSolver {

    private ReserveSolver() {
    }

    /**
     * Analyses a mission with the reserve objective (its objective field is not consulted).
     *
     * @throws ProductTooLargeException               if the game of the verdict is over the memory budget
     * @throws java.util.concurrent.CancellationException if the options' cancellation flag was raised
     * @throws IllegalArgumentException               if the reserve floor is above the capacity, or the
     *                                                mission breaks an invariant of the arena or goal
     */
    public static ReserveAnalysis analyse(Mission mission, ReserveOptions options) {
        long t0 = System.nanoTime();
        Arena arena = ArenaCompiler.compile(mission);
        GoalAutomaton goal = GoalAutomaton.of(mission);
        int capacity = mission.capacityUnits();
        int reserve = mission.reserveUnits();
        int start = mission.startUnits();
        ReserveMonitor monitor = new ReserveMonitor(reserve, capacity, start);
        List<String> notes = new ArrayList<>();

        ProductGame game = ProductGame.fromStart(arena, goal, monitor, options.product());
        Solution sol = options.solver().create(game.graph(), options.product().cancelled()).solve();
        boolean won = sol.winning(game.start());
        Optional<Policy> policy = Optional.empty();
        OptionalInt worst = OptionalInt.empty();
        if (won) {
            policy = Optional.of(game.policy(sol, monitor::level));
            worst = OptionalInt.of(worstCaseMinimum(game, sol, monitor));
        }
        long solved = System.nanoTime();

        Optional<ChargeNeeded> heat = Optional.empty();
        if (options.chargeNeeded()) {
            heat = Optional.of(ChargeNeeded.compute(arena, goal, monitor, options.product(), options.solver()));
        }

        OptionalInt highest = OptionalInt.empty();
        boolean searched = false;
        if (options.highestReserve()) {
            try {
                int h = highestFloor(arena, goal, monitor, won ? worst.getAsInt() : -1, won ? -1 : reserve - 1,
                        options);
                highest = h >= 0 ? OptionalInt.of(h) : OptionalInt.empty();
                searched = true;
            } catch (ProductTooLargeException e) {
                notes.add("highest guaranteed reserve not computed: a lower floor gives a larger game, and "
                        + e.getMessage());
            }
        }
        long t1 = System.nanoTime();
        return new ReserveAnalysis(mission, Verdict.of(won), start, reserve, capacity, mission.scale(), worst, highest,
                searched, game.vertexCount(), game.edgeCount(), game.estimate(), millis(game.buildNanos()),
                millis(solved - t0), millis(t1 - t0), policy, game, sol, heat, notes);
    }

    /** Verdict only (no policy, no search), for callers that probe many variants. */
    public static boolean guaranteed(Mission mission, ProductOptions options) {
        Arena arena = ArenaCompiler.compile(mission);
        GoalAutomaton goal = GoalAutomaton.of(mission);
        ReserveMonitor monitor = new ReserveMonitor(mission.reserveUnits(), mission.capacityUnits(),
                mission.startUnits());
        return wins(arena, goal, monitor, options, AttractorSolver::new);
    }

    private static boolean wins(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, ProductOptions options,
                                GameSolver.Factory solver) {
        ProductGame game = ProductGame.fromStart(arena, goal, monitor, options);
        return solver.create(game.graph(), options.cancelled()).solve().winning(game.start());
    }

    /**
     * The lowest battery level along any play of the closed loop of the solution from the start
     * (robot follows its chosen edges, disturbance plays every outcome), the level on arrival at
     * WIN included. The closed loop is acyclic (ranks strictly decrease), so vertices are taken in
     * increasing rank: W(robot p) = min(level p, W(chosen successor)); W(disturbance d) = min over
     * outcomes of W(successor), or the level on arrival for an outcome into WIN.
     *
     * <p>O(closed loop) after a counting sort by rank.
     */
    static int worstCaseMinimum(ProductGame game, Solution sol, ReserveMonitor monitor) {
        int start = game.start();
        if (start == ProductGame.WIN) {
            return monitor.startUnits();
        }
        GameGraph g = game.graph();
        Arena arena = game.arena();
        int n = g.vertexCount();
        // closed loop from the start
        boolean[] in = new boolean[n];
        int[] list = new int[n];
        int size = 0;
        in[start] = true;
        list[size++] = start;
        for (int i = 0; i < size; i++) {
            int p = list[i];
            if (game.isSink(p)) {
                continue;
            }
            if (g.isRobot(p)) {
                int t = g.target(sol.strategyEdge(p));
                if (!in[t]) {
                    in[t] = true;
                    list[size++] = t;
                }
            } else {
                for (int e = g.outBegin(p); e < g.outEnd(p); e++) {
                    int t = g.target(e);
                    if (!in[t]) {
                        in[t] = true;
                        list[size++] = t;
                    }
                }
            }
        }
        // counting sort by rank
        int maxRank = 0;
        for (int i = 0; i < size; i++) {
            maxRank = Math.max(maxRank, sol.rank(list[i]));
        }
        int[] bucket = new int[maxRank + 2];
        for (int i = 0; i < size; i++) {
            bucket[sol.rank(list[i]) + 1]++;
        }
        for (int r = 0; r <= maxRank; r++) {
            bucket[r + 1] += bucket[r];
        }
        int[] order = new int[size];
        for (int i = 0; i < size; i++) {
            order[bucket[sol.rank(list[i])]++] = list[i];
        }
        int[] worst = new int[n];
        for (int i = 0; i < size; i++) {
            int p = order[i];
            if (game.isSink(p)) {
                continue;
            }
            int level = monitor.level(game.monitorState(p));
            if (g.isRobot(p)) {
                int t = g.target(sol.strategyEdge(p));
                worst[p] = Math.min(level, worst[t]);
            } else {
                int w = level;
                for (int e = g.outBegin(p); e < g.outEnd(p); e++) {
                    int t = g.target(e);
                    if (t == ProductGame.WIN) {
                        int arrive = monitor.step(game.monitorState(p), arena.weight(game.arenaEdge(p, e)));
                        w = Math.min(w, monitor.level(arrive));
                    } else {
                        w = Math.min(w, worst[t]);
                    }
                }
                worst[p] = w;
            }
        }
        return worst[start];
    }

    /**
     * The highest floor f in 0..start such that the robot wins with floor f, or -1 if none.
     * Winning is monotone (a strategy that keeps the level at or above f keeps it at or above any
     * lower floor), so bisection is exact. {@code knownTrue} is a floor already known to win, or -1;
     * the search runs over [knownTrue, start] when knownTrue &ge; 0, else over
     * [-1, min(below, start)] where {@code below} is the highest floor not yet known to lose.
     */
    private static int highestFloor(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, int knownTrue,
                                    int below, ReserveOptions options) {
        int lo = knownTrue; // wins at lo (or lo == -1: nothing known)
        int hi = knownTrue >= 0 ? monitor.startUnits() : Math.min(below, monitor.startUnits());
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (wins(arena, goal, monitor.withFloor(mid), options.product(), options.solver())) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    private static long millis(long nanos) {
        return nanos / 1_000_000L;
    }
}
