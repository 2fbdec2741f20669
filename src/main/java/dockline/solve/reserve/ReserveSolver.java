package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import dockline.solve.WinningRegion;
import dockline.solve.game.GameGraph;
import dockline.solve.game.GameSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.game.ReserveSizeForecast;
import dockline.solve.game.Solution;
import dockline.util.MonotoneSearch;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The threshold solver for the reserve objective: arena × goal automaton × {@link ReserveMonitor},
 * solved as a reachability game by the linear-time attractor (README.md, "How it decides").
 *
 * <p>{@link #analyse} gives the verdict, the robot's policy (by default the attractor strategy at
 * the mission's floor, which finishes in the fewest moves in the worst case; with
 * {@link ReserveOptions#safestPolicy()} the one at the highest guaranteed floor), the worst level
 * the disturbances can force under it (dynamic programming over the acyclic closed loop, O(closed
 * loop)), the highest floor that can be guaranteed, and optionally the heat map. By default the
 * product is not stored ({@link ImplicitReserveGame}, {@link ReserveOptions.Route#IMPLICIT}: half a
 * byte per vertex, edges generated on demand; the highest floor by bisection over verdicts, exact
 * because winning is monotone in the floor). The stored route ({@link ReserveOptions.Route#PRODUCT},
 * {@link ProductGame} in CSR arrays) is the reference: there the highest floor is a max-min fixpoint
 * over one more product, computed as an incremental attractor while the floor falls.
 *
 * <p>Sources: the attractor of Grädel, Thomas, Wilke (2002, "Automata, Logics, and Infinite Games",
 * ch. 2); the threshold question decided by a comparator automaton on the weights (published work on
 * comparator automata, 2018). Cost: O(|V| + |E|) of the product per solve; the highest floor takes
 * O(log capacity) solves on the default route.
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
        return analyse(mission, ArenaCompiler.compile(mission), GoalAutomaton.of(mission), options, t0);
    }

    /**
     * As {@link #analyse(Mission, ReserveOptions)} on an arena and goal automaton already compiled from
     * this very mission (so that a caller asking several questions compiles them once).
     */
    public static ReserveAnalysis analyse(Mission mission, Arena arena, GoalAutomaton goal, ReserveOptions options) {
        return analyse(mission, arena, goal, options, System.nanoTime());
    }

    private static ReserveAnalysis analyse(Mission mission, Arena arena, GoalAutomaton goal, ReserveOptions options,
                                           long t0) {
        int capacity = mission.capacityUnits();
        int reserve = mission.reserveUnits();
        int start = mission.startUnits();
        ReserveMonitor monitor = new ReserveMonitor(reserve, capacity, start);
        List<String> notes = new ArrayList<>();
        if (!(options.route() instanceof ReserveOptions.Stored stored)) {
            return analyseImplicitly(mission, options, arena, goal, monitor, notes, t0);
        }
        GameSolver.Factory solver = stored.solver();

        ProductGame game = ProductGame.fromStart(arena, goal, monitor, options.product());
        Solution sol = solver.create(game.graph(), options.product().cancelled()).solve();
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
            heat = Optional.of(ChargeNeeded.compute(arena, goal, monitor, options.product(), solver));
        }

        OptionalInt highest = OptionalInt.empty();
        boolean searched = false;
        if (options.highestReserve() || options.safestPolicy()) {
            try {
                int h = highestFloorByThresholds(arena, goal, monitor.withFloor(won ? worst.getAsInt() : 0),
                        options.product());
                highest = h >= 0 ? OptionalInt.of(h) : OptionalInt.empty();
                searched = true;
            } catch (ProductTooLargeException e) {
                notes.add("highest guaranteed reserve not computed: a lower floor gives a larger game, and "
                        + e.getMessage());
            }
        }
        int policyFloor = reserve;
        ProductGame policyGame = game;
        Solution policySolution = sol;
        if (options.safestPolicy() && won && highest.isPresent() && highest.getAsInt() > worst.getAsInt()) {
            // the policy of the game at the highest floor: it keeps the battery at or above that floor
            policyFloor = highest.getAsInt();
            ReserveMonitor safest = monitor.withFloor(policyFloor);
            policyGame = ProductGame.fromStart(arena, goal, safest, options.product());
            policySolution = solver.create(policyGame.graph(), options.product().cancelled()).solve();
            policy = Optional.of(policyGame.policy(policySolution, safest::level));
            worst = OptionalInt.of(worstCaseMinimum(policyGame, policySolution, safest));
        }
        long t1 = System.nanoTime();
        return new ReserveAnalysis(mission, Verdict.of(won), start, reserve, capacity, mission.scale(), worst, highest,
                searched, game.vertexCount(), game.edgeCount(), game.estimate(), millis(game.buildNanos()),
                millis(solved - t0), millis(t1 - t0), policy, policyFloor, policyGame, policySolution, heat, notes,
                arena, goal, Optional.of(SolverRegion.of(game, sol)));
    }

    /**
     * {@link #analyse} on {@link ImplicitReserveGame} ({@link ReserveOptions.Route#IMPLICIT}): verdict,
     * policy and worst case from the recorded choices, no stored product; the highest floor by bisection
     * over implicit verdicts (exact: winning is monotone in the floor); the heat map, when asked for, on
     * the product as before. The analysis carries no game and no solution (null).
     */
    private static ReserveAnalysis analyseImplicitly(Mission mission, ReserveOptions options, Arena arena,
                                                     GoalAutomaton goal, ReserveMonitor monitor, List<String> notes,
                                                     long t0) {
        ProductOptions po = options.product();
        int start = mission.startUnits();
        int reserve = monitor.floorUnits();
        ImplicitReserveGame game = implicitGame(arena, goal, monitor, po);
        ImplicitReserveGame.Strategy st = game.solveWithStrategy(po.cancelled());
        long built = System.nanoTime();
        boolean won = st.startWon();
        Optional<WinningRegion> region = st.complete()
                ? Optional.of(SolverRegion.of(arena, goal, monitor, st)) : Optional.empty();
        Optional<Policy> policy = Optional.empty();
        OptionalInt worst = OptionalInt.empty();
        if (won) {
            policy = Optional.of(game.policy(st));
            worst = OptionalInt.of(game.worstCaseMinimum(st));
        }
        long solved = System.nanoTime();
        Optional<ChargeNeeded> heat = Optional.empty();
        if (options.chargeNeeded()) {
            heat = Optional.of(ChargeNeeded.computeImplicitly(arena, goal, monitor, po));
        }
        OptionalInt highest = OptionalInt.empty();
        boolean searched = false;
        if (options.highestReserve() || options.safestPolicy()) {
            try {
                // with lasting closures each verdict is found phase by phase (exact, and only the closure
                // phases the robot's strategy relies on are built); otherwise on the whole implicit product
                boolean phased = arena.states().itemCount() > 0 && arena.stateCount() == arena.states().count();
                int lo = MonotoneSearch.highest(won ? worst.getAsInt() : -1, won ? start : Math.min(start, reserve - 1),
                        f -> phased ? PhasedLastingSolver.wins(arena.mission(), goal, monitor.withFloor(f), po)
                                : implicitGame(arena, goal, monitor.withFloor(f), po).solve(true, po.cancelled())
                                .startWon());
                highest = lo >= 0 ? OptionalInt.of(lo) : OptionalInt.empty();
                searched = true;
            } catch (ProductTooLargeException e) {
                notes.add("highest guaranteed reserve not computed: a lower floor gives a larger game, and "
                        + e.getMessage());
            }
        }
        int policyFloor = reserve;
        if (options.safestPolicy() && won && highest.isPresent() && highest.getAsInt() > worst.getAsInt()) {
            policyFloor = highest.getAsInt();
            ImplicitReserveGame safest = implicitGame(arena, goal, monitor.withFloor(policyFloor), po);
            ImplicitReserveGame.Strategy ss = safest.solveWithStrategy(po.cancelled());
            policy = Optional.of(safest.policy(ss));
            worst = OptionalInt.of(safest.worstCaseMinimum(ss));
        }
        long t1 = System.nanoTime();
        SizeEstimate size = new SizeEstimate(game.vertexCount(), st.result().edgesScanned(),
                implicitBytes(game, arena), 0);
        return new ReserveAnalysis(mission, Verdict.of(won), start, reserve, mission.capacityUnits(), mission.scale(),
                worst, highest, searched, game.vertexCount(), st.result().edgesScanned(), size,
                millis(built - t0), millis(solved - t0), millis(t1 - t0), policy, policyFloor, null, null, heat, notes,
                arena, goal, region);
    }

    /** Counters with the choices (half a byte per slot), the policy walk's visited bits (1/8 byte per slot), the inlined reverse CSR and action indices (10 B per arena edge). */
    private static long implicitBytes(ImplicitReserveGame game, Arena arena) {
        return game.slotCount() / 2 + game.slotCount() / 8 + 10L * arena.edgeCount();
    }

    /**
     * The implicit game, refused with a {@link ProductTooLargeException} when its counters, the policy
     * walk's bits and the arena arrays pass the budget, its worklist capped by what is left.
     */
    static ImplicitReserveGame implicitGame(Arena arena, GoalAutomaton goal, ReserveMonitor monitor,
                                                    ProductOptions po) {
        return budgeted(new ImplicitReserveGame(arena, goal, monitor), arena, po);
    }

    /**
     * The game on {@code arena} checked against the memory budget ({@code po}) and with its worklist capped.
     * The counters a round of {@link PhasedLastingSolver} holds on top of the game's own (the previous round's,
     * until copied, and its own copy for the next round) are counted against the same budget when they are
     * held ({@link CarriedRound#hold}).
     *
     * @throws ProductTooLargeException if its counters do not fit the memory budget
     */
    static ImplicitReserveGame budgeted(ImplicitReserveGame game, Arena arena, ProductOptions po) {
        long bytes = implicitBytes(game, arena);
        long budget = po.effectiveMemoryBudget();
        if (bytes > budget) {
            throw new ProductTooLargeException(new SizeEstimate(game.vertexCount(), game.edgeCount(), bytes, 0), budget,
                    false);
        }
        // the worklist's size is only known while solving: it may take the rest of the budget
        game.limitWorklist(bytes, budget);
        return game;
    }

    /**
     * Verdict only (no policy, no search), for callers that probe many variants: the implicit product
     * ({@link ImplicitReserveGame}), its attractor stopping as soon as the start is won; with lasting closures
     * {@link PhasedLastingSolver}, which builds only the closure phases the robot's strategy relies on.
     *
     * @throws ProductTooLargeException if the implicit game's counters do not fit the memory budget
     */
    public static boolean guaranteed(Mission mission, ProductOptions options) {
        GoalAutomaton goal = GoalAutomaton.of(mission);
        ReserveMonitor monitor = new ReserveMonitor(mission.reserveUnits(), mission.capacityUnits(),
                mission.startUnits());
        if (!mission.beyondOneTrip() && ArenaCompiler.states(mission).itemCount() > 0) {
            // lasting closures: phase by phase (exact), as the highest-floor search does, so that a probe builds
            // only the closure phases the robot's strategy relies on instead of every closure set
            return PhasedLastingSolver.wins(mission, goal, monitor, options);
        }
        Arena arena = ArenaCompiler.compile(mission);
        return implicitGame(arena, goal, monitor, options).solve(true, options.cancelled()).startWon();
    }

    /**
     * The outcome of {@link #decideImplicitly}: the verdict only (no policy, no certificate).
     *
     * @param verdict          the start verdict
     * @param exploredVertices product vertices the backward search won and expanded before it stopped
     * @param edgesScanned     product edges it scanned
     * @param forecastVertices the size of the product reachable from the start ({@link ReserveSizeForecast},
     *                         an upper bound), or -1 when arena × goal is too large to forecast
     * @param slotCount        slots of the implicit numbering (every triple, padded)
     * @param stoppedEarly     the search stopped once the start was won
     * @param millis           arena compile and solve
     */
    public record ImplicitVerdict(Verdict verdict, long exploredVertices, long edgesScanned, long forecastVertices,
                                  long slotCount, boolean stoppedEarly, long millis) {
    }

    /**
     * The verdict alone, on the product game without storing it ({@link ImplicitReserveGame}), with
     * the attractor stopping as soon as the start is won. The same game as {@link #analyse} solves
     * (property-tested), at half a byte per triple of the full product instead of about 64 bytes per
     * reachable vertex; no policy comes out of it, so the verdict is not certified.
     *
     * @throws ProductTooLargeException if its counters (half a byte per slot of the long numbering) do not fit the budget
     */
    public static ImplicitVerdict decideImplicitly(Mission mission, ProductOptions options) {
        long t0 = System.nanoTime();
        return decideImplicitly(mission, ArenaCompiler.compile(mission), GoalAutomaton.of(mission), options, t0);
    }

    /** As {@link #decideImplicitly(Mission, ProductOptions)} on an arena and goal already compiled from the mission. */
    public static ImplicitVerdict decideImplicitly(Mission mission, Arena arena, GoalAutomaton goal,
                                                   ProductOptions options) {
        return decideImplicitly(mission, arena, goal, options, System.nanoTime());
    }

    private static ImplicitVerdict decideImplicitly(Mission mission, Arena arena, GoalAutomaton goal,
                                                    ProductOptions options, long t0) {
        ReserveMonitor monitor = new ReserveMonitor(mission.reserveUnits(), mission.capacityUnits(),
                mission.startUnits());
        long forecast;
        long forecastEdges;
        try {
            ReserveSizeForecast.Forecast f = ReserveSizeForecast.of(arena, goal, monitor);
            forecast = f.vertices();
            forecastEdges = f.edges();
        } catch (ArithmeticException tooManyPairs) {
            forecast = -1;
            forecastEdges = -1;
        }
        ImplicitReserveGame game = new ImplicitReserveGame(arena, goal, monitor);
        // the counters (half a byte per slot) and the arena's inlined reverse CSR (9 bytes per edge)
        long bytes = game.slotCount() / 2 + 9L * arena.edgeCount();
        long budget = options.effectiveMemoryBudget();
        if (bytes > budget) {
            throw new ProductTooLargeException(new SizeEstimate(game.vertexCount(),
                    forecastEdges > 0 ? forecastEdges : game.edgeCount(), bytes, 0), budget, false);
        }
        game.limitWorklist(bytes, budget);
        ImplicitReserveGame.Result r = game.solve(true, options.cancelled());
        return new ImplicitVerdict(Verdict.of(r.startWon()), r.wonVertices(), r.edgesScanned(), forecast,
                game.slotCount(), r.stoppedEarly(), (System.nanoTime() - t0) / 1_000_000L);
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
        int[] list = game.closedLoop(sol);
        int size = list.length;
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
     * The highest floor f in [f0, start] such that the robot wins with floor f, or -1 if none, where
     * f0 is the floor of {@code base}: one product at floor f0 and one pass over it (a max-min
     * fixpoint computed as an incremental attractor). For a floor f the game is the product at f0
     * with the triples below level f, and the entries into WIN that arrive below f, removed; as f
     * falls from the start to f0 these games only gain vertices and edges, so their attractors only
     * grow and can be maintained incrementally (a vertex joins when it is admitted and ready: a
     * robot triple with a successor in the attractor, a disturbance triple whose counter of other
     * successors is zero). The answer is the first f at which the start joins.
     *
     * <p>O(|V| + |E| + start) for the product at f0. Checked in tests against
     * a bisection over stored products and an independent brute force.
     */
    static int highestFloorByThresholds(Arena arena, GoalAutomaton goal, ReserveMonitor base, ProductOptions options) {
        ProductGame game = ProductGame.fromStart(arena, goal, base, options);
        int start = game.start();
        if (start == ProductGame.WIN) {
            return base.startUnits();
        }
        if (start == ProductGame.LOSE) {
            return -1;
        }
        GameGraph g = game.graph();
        int n = g.vertexCount();
        int f0 = base.floorUnits();
        int top = base.startUnits();
        int span = top - f0 + 1;
        // triples bucketed by level (only levels f0..start matter: the start must be admitted)
        int[] vStart = new int[span + 1];
        for (int v = 2; v < n; v++) {
            int l = Math.min(top, base.level(game.monitorState(v)));
            vStart[top - l + 1]++;
        }
        // entries into WIN bucketed by arrival level (above the start: admitted at once)
        int winEdges = 0;
        int[] eStart = new int[span + 1];
        for (int i = g.inBegin(ProductGame.WIN); i < g.inEnd(ProductGame.WIN); i++) {
            if (g.inSource(i) != ProductGame.WIN) {
                winEdges++;
            }
        }
        int[] winSource = new int[winEdges];
        int[] winArrival = new int[winEdges];
        int k = 0;
        for (int d = 2; d < n; d++) {
            if (g.isRobot(d)) {
                continue;
            }
            for (int e = g.outBegin(d); e < g.outEnd(d); e++) {
                if (g.target(e) == ProductGame.WIN) {
                    int arrive = base.step(game.monitorState(d), arena.weight(game.arenaEdge(d, e)));
                    winSource[k] = d;
                    winArrival[k] = Math.min(top, base.level(arrive));
                    eStart[top - winArrival[k] + 1]++;
                    k++;
                }
            }
        }
        for (int i = 0; i < span; i++) {
            vStart[i + 1] += vStart[i];
            eStart[i + 1] += eStart[i];
        }
        int[] byLevel = new int[n];
        int[] fill = java.util.Arrays.copyOf(vStart, span);
        for (int v = 2; v < n; v++) {
            int l = Math.min(top, base.level(game.monitorState(v)));
            byLevel[fill[top - l]++] = v;
        }
        int[] winByLevel = new int[winEdges];
        fill = java.util.Arrays.copyOf(eStart, span);
        for (int i = 0; i < winEdges; i++) {
            winByLevel[fill[top - winArrival[i]]++] = winSource[i];
        }

        int[] counter = new int[n];
        for (int v = 2; v < n; v++) {
            if (!g.isRobot(v)) {
                counter[v] = g.outDegree(v);
            }
        }
        boolean[] admitted = new boolean[n];
        boolean[] ready = new boolean[n]; // robot triple with a successor in the attractor
        boolean[] in = new boolean[n];
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        java.util.function.BooleanSupplier cancelled = options.cancelled();
        for (int b = 0; b < span; b++) {
            if (cancelled.getAsBoolean()) {
                throw new java.util.concurrent.CancellationException("search for the highest floor was cancelled");
            }
            int f = top - b;
            for (int i = eStart[b]; i < eStart[b + 1]; i++) {
                int d = winByLevel[i];
                if (--counter[d] == 0 && admitted[d] && !in[d]) {
                    in[d] = true;
                    queue[tail++] = d;
                }
            }
            for (int i = vStart[b]; i < vStart[b + 1]; i++) {
                int v = byLevel[i];
                admitted[v] = true;
                if (!in[v] && (g.isRobot(v) ? ready[v] : counter[v] == 0)) {
                    in[v] = true;
                    queue[tail++] = v;
                }
            }
            while (head < tail) {
                int v = queue[head++];
                for (int i = g.inBegin(v); i < g.inEnd(v); i++) {
                    int u = g.inSource(i);
                    if (in[u]) {
                        continue;
                    }
                    boolean join;
                    if (g.isRobot(u)) {
                        ready[u] = true;
                        join = admitted[u];
                    } else {
                        join = --counter[u] == 0 && admitted[u];
                    }
                    if (join) {
                        in[u] = true;
                        queue[tail++] = u;
                    }
                }
            }
            if (in[start]) {
                return f;
            }
        }
        return -1;
    }

    private static long millis(long nanos) {
        return nanos / 1_000_000L;
    }
}
