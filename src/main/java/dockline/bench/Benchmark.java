package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import static dockline.bench.Timing.time;
import static dockline.bench.Timing.timeInterleaved;

import dockline.bench.Timing.Body;
import dockline.bench.Timing.Timed;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import dockline.solve.discounted.DiscountedValueIteration;
import dockline.solve.fast.FastPath;
import dockline.solve.fast.MinChargeSolver;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.CompactAttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.game.ReserveSizeForecast;
import dockline.solve.game.Solution;
import dockline.solve.reserve.ImplicitReserveGame;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

/**
 * Measures every solving method on generated buildings of growing size, one instance at a time, in
 * one run, and checks that all methods give the same verdict on each instance.
 *
 * <p>Instances per floor size (all from {@link BuildingGenerator} and {@link MissionGenerator},
 * same seed):
 * <ul>
 *   <li>{@code reserve}: {@link MissionSpec#docking} (charging on docks, few levels): the product
 *       with the reserve monitor covers the floor. Methods: {@code attractor} (the main route as
 *       landed: {@code ProductGame} built from the start in CSR arrays + {@code AttractorSolver}),
 *       {@code compact} ({@code CompactAttractorSolver} on the same graph), {@code bfs} (plain
 *       breadth-first search over the same graph: the memory-bound floor), {@code sweep} (naive
 *       sweeps to the fixpoint on the same graph), {@code implicit} / {@code early} /
 *       {@code implicit-bfs} / {@code implicit-policy} (the attractor, the attractor stopping once the
 *       start is won, plain BFS, and the route end to end with the robot's choices, the policy walk and
 *       the worst case, on {@code ImplicitReserveGame}, which stores no product graph), {@code fixpoint}
 *       (the margins' minimum-credit solver on arena × goal: the charging route's one pass).</li>
 *   <li>{@code consumption}: {@link MissionSpec#consumptionOnly} (no charging, 1,000 levels):
 *       {@code fast} ({@link MinChargeSolver}, stopping once the start is decided), and the other
 *       methods where the product fits.</li>
 *   <li>{@code discounted}: the discounted-sum threshold question (discount 2, threshold the exact
 *       optimal value, no dock goal) on the consumption instance's arena: {@code attractor} on the
 *       comparator product generated on demand ({@code ImplicitDiscountedGame}: robot pairs stored,
 *       disturbance pairs and edges generated from the arena), {@code stored-attractor} on the product
 *       stored in CSR arrays ({@code DiscountedThresholdGame}, the reference), versus {@code vi}
 *       (value iteration, then compare: {@code DiscountedValueIteration}).</li>
 * </ul>
 *
 * <p>Before measuring, every method runs a few times on small floors so the JIT compiler has done its
 * work; each timed solve is the best of {@link Config#reps()} runs (the least disturbed by other
 * processes on a shared machine; runs over two seconds are not repeated, except for the discounted
 * instance's three routes, which are measured in {@link Config#reps()} interleaved rounds, so all
 * get the same number of runs (see timeInterleaved); the heap is settled before
 * each run, outside the timing, so no run pays for an earlier one's garbage), timed both by the wall
 * clock and by the solving thread's CPU time plus the collector's pauses (the ratios use the latter,
 * as other processes on a shared machine hardly change it). The peak heap of a method
 * is sampled above the baseline taken (after a full collection) with the instance's arena in memory;
 * for methods on a built product it covers the build too.
 */
public final class Benchmark {

    /** Instance names, as in the rows. */
    public static final String RESERVE = "reserve";
    public static final String CONSUMPTION = "consumption";
    public static final String DISCOUNTED = "discounted";
    /** Every instance, in the order they run on each floor size. */
    public static final List<String> INSTANCES = List.of(RESERVE, CONSUMPTION, DISCOUNTED);

    /**
     * What to run.
     *
     * @param sizes          floor sides on which every instance and method runs (where it fits)
     * @param fastOnlySizes  floor sides on which only the consumption instance's {@code fast} method runs
     * @param seed           seed of the generated floors and missions
     * @param budget         disturbance budget K of every mission
     * @param reps           timed repetitions per solve (best kept)
     * @param warmups        warm-up rounds on small floors before measuring
     * @param sweepCapMillis a naive sweep running longer than this is stopped and reported as such
     * @param maxProductVertices the CSR product methods are skipped when the forecast product is larger
     * @param maxImplicitVertices the implicit-product methods are skipped when the full product is larger
     * @param instances      the instances to run and warm up ({@link #INSTANCES} or a part of it; a
     *                       development aid: ratios between instances are then missing)
     */
    public record Config(List<Integer> sizes, List<Integer> fastOnlySizes, long seed, int budget, int reps,
                         int warmups, long sweepCapMillis, long maxProductVertices, long maxImplicitVertices,
                         List<String> instances) {

        public Config {
            sizes = List.copyOf(sizes);
            fastOnlySizes = List.copyOf(fastOnlySizes);
            instances = List.copyOf(instances);
            if (reps < 1 || warmups < 0 || budget < 0) {
                throw new IllegalArgumentException("reps must be positive, warm-ups and budget not negative");
            }
            if (instances.isEmpty() || !INSTANCES.containsAll(instances)) {
                throw new IllegalArgumentException("instances must be some of " + INSTANCES + ", not " + instances);
            }
        }

        /** Every instance. */
        public Config(List<Integer> sizes, List<Integer> fastOnlySizes, long seed, int budget, int reps,
                      int warmups, long sweepCapMillis, long maxProductVertices, long maxImplicitVertices) {
            this(sizes, fastOnlySizes, seed, budget, reps, warmups, sweepCapMillis, maxProductVertices,
                    maxImplicitVertices, INSTANCES);
        }

        /** Under a minute on two cores: 32² to 128², and the fast path on 512². */
        public static Config quick() {
            return new Config(List.of(32, 64, 128), List.of(512), 7, 2, 3, 1, 8_000, 20_000_000L, 40_000_000L);
        }

        /** Under ten minutes on two cores: 32² to 512² (product methods where the product fits). */
        public static Config full() {
            return new Config(List.of(32, 64, 128, 256, 512), List.of(), 7, 2, 3, 2, 60_000, 400_000_000L,
                    Integer.MAX_VALUE);
        }
    }

    private final Config config;
    private final Consumer<String> progress;

    public Benchmark(Config config, Consumer<String> progress) {
        this.config = Objects.requireNonNull(config);
        this.progress = Objects.requireNonNull(progress);
    }

    /** Runs the benchmark. */
    public BenchReport run() {
        long t0 = System.nanoTime();
        Map<String, String> machine = MachineFacts.collect();
        List<BenchRow> rows = new ArrayList<>();
        try (HeapSampler sampler = new HeapSampler()) {
            progress.accept("warming up the JIT compiler (" + config.warmups() + " rounds on 32x32 and 48x48 floors)");
            for (int w = 0; w < config.warmups(); w++) {
                for (int side : new int[] {32, 48}) {
                    for (String kind : config.instances()) {
                        // the consumption products are large even on small floors: the reserve ones warm the same code
                        measure(instance(side, kind), sampler, 2, !kind.equals(CONSUMPTION), true);
                    }
                }
            }
            TreeSet<Integer> all = new TreeSet<>(config.sizes());
            all.addAll(config.fastOnlySizes());
            for (int side : all) {
                boolean full = config.sizes().contains(side);
                for (String kind : full ? config.instances() : List.of(CONSUMPTION)) {
                    if (!config.instances().contains(kind)) {
                        continue;
                    }
                    Instance inst = instance(side, kind);
                    progress.accept(String.format(java.util.Locale.ROOT,
                            "%dx%d %s: arena %d vertices, %d edges, goal %d states, compiled in %.0f ms",
                            side, side, kind, inst.arena.vertexCount(), inst.arena.edgeCount(),
                            inst.goal.stateCount(), inst.arenaMillis));
                    for (BenchRow r : measure(inst, sampler, config.reps(), full, false)) {
                        rows.add(r);
                        progress.accept(r.compact());
                    }
                }
            }
        }
        return new BenchReport(machine, rows, (System.nanoTime() - t0) / 1e6);
    }

    /**
     * Only the lasting rows (issue 13's door-shut events that stay shut) on the configured sides, after a
     * warm-up: a development aid ({@code bench --lasting-row}); see {@link LastingBench#only}.
     */
    public List<BenchRow> lastingOnly() {
        return LastingBench.only(this, config, progress);
    }

    // ------------------------------------------------------------------ instances

    /** One mission on one generated floor, compiled (outside every timing). */
    record Instance(int side, String kind, Mission mission, Arena arena, GoalAutomaton goal, double arenaMillis,
                    double generateMillis) {
    }

    Instance instance(int side, String kind) {
        long t0 = System.nanoTime();
        BuildingMap map = BuildingGenerator.generate(side, config.seed(), config.budget());
        // the discounted question runs on the consumption arena: with charging on the start dock the
        // best play is to charge for ever and the comparator product collapses to a dozen vertices
        MissionSpec spec = kind.equals(RESERVE) ? MissionSpec.docking(config.budget())
                : MissionSpec.consumptionOnly(config.budget());
        Mission mission = MissionGenerator.generate(map, spec, config.seed());
        long t1 = System.nanoTime();
        Arena arena = ArenaCompiler.compile(mission);
        GoalAutomaton goal = GoalAutomaton.of(mission);
        long t2 = System.nanoTime();
        return new Instance(side, kind, mission, arena, goal, (t2 - t1) / 1e6, (t1 - t0) / 1e6);
    }

    // ------------------------------------------------------------------ measuring

    private List<BenchRow> measure(Instance inst, HeapSampler sampler, int reps, boolean products, boolean warmup) {
        List<BenchRow> rows = new ArrayList<>();
        switch (inst.kind) {
            case RESERVE -> {
                rows.addAll(csrMethods(inst, sampler, reps, warmup));
                rows.addAll(implicitMethods(inst, sampler, reps));
                rows.add(fixpoint(inst, sampler, reps));
                if (!warmup) {
                    rows.add(LastingBench.lasting(inst, sampler, reps));
                }
                rows.addAll(LastingBench.inTable(inst, sampler, reps));
            }
            case CONSUMPTION -> {
                rows.add(fast(inst, sampler, reps));
                rows.add(fastCheck(inst, sampler, reps));
                rows.addAll(LastingBench.inTable(inst, sampler, reps));
                if (products) {
                    rows.addAll(csrMethods(inst, sampler, reps, warmup));
                    rows.addAll(implicitMethods(inst, sampler, reps));
                    rows.add(fixpoint(inst, sampler, reps));
                }
            }
            case DISCOUNTED -> {
                if (warmup) {
                    warmComparatorPaths(inst.arena);
                }
                rows.addAll(discounted(inst, sampler, reps));
            }
            default -> throw new IllegalStateException(inst.kind);
        }
        return rows;
    }

    private static final String[] CSR_METHODS = {"stored-attractor", "stored-compact", "stored-bfs", "sweep"};

    /**
     * The main route as landed (ProductGame: the product built from the start in CSR arrays, solved by
     * AttractorSolver), then on the same graph CompactAttractorSolver, plain BFS and naive sweeps.
     */
    private List<BenchRow> csrMethods(Instance inst, HeapSampler sampler, int reps, boolean warmup) {
        List<BenchRow> rows = new ArrayList<>();
        Mission m = inst.mission;
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        SizeEstimate est = ProductGame.estimate(inst.arena, inst.goal, monitor, false);
        long tf0 = System.nanoTime();
        ReserveSizeForecast.Forecast forecast = ReserveSizeForecast.of(inst.arena, inst.goal, monitor);
        double forecastMs = (System.nanoTime() - tf0) / 1e6;
        long budget = ProductOptions.defaultMemoryBudget();
        String skip = null;
        if (forecast.vertices() > config.maxProductVertices()) {
            skip = "skipped: the forecast (" + forecast.vertices() + " vertices) is over this run's limit of "
                    + config.maxProductVertices() + " vertices";
        } else if (est.bytes() > budget) {
            skip = "does not fit: the estimate (" + est.describe() + ") is over the memory budget of "
                    + megabytes(budget);
        }
        if (skip != null) {
            for (String method : CSR_METHODS) {
                rows.add(BenchRow.skipped(inst.side, inst.kind, method, est.vertices(), est.edges(), skip));
            }
            return rows;
        }
        long base = HeapSampler.settledUsed();
        sampler.start();
        ProductGame game;
        long tb0 = System.nanoTime();
        try {
            game = ProductGame.fromStart(inst.arena, inst.goal, monitor, ProductOptions.defaults());
        } catch (ProductTooLargeException e) {
            sampler.stop();
            for (String method : CSR_METHODS) {
                rows.add(BenchRow.skipped(inst.side, inst.kind, method, est.vertices(), est.edges(),
                        "does not fit: " + e.getMessage()));
            }
            return rows;
        }
        double buildMs = (System.nanoTime() - tb0) / 1e6;
        long buildPeak = sampler.stop() - base;
        long n = game.vertexCount();
        long edges = game.edgeCount();
        double wall0 = inst.arenaMillis + buildMs;

        Timed<Solution> at = time(sampler, base, reps, () -> new AttractorSolver(game.graph()).solve());
        rows.add(new BenchRow(inst.side, inst.kind, "stored-attractor", n, edges, buildMs, at.millis(), at.cpuMillis(),
                Math.max(buildPeak, at.peak()), Verdict.of(at.value().winning(game.start())).word(), wall0 + at.millis(),
                est.vertices(), forecast.vertices(), String.format(java.util.Locale.ROOT,
                        "ProductGame + AttractorSolver (the reference solver); ProductGame's estimate %.2fx the real size,"
                                + " ReserveSizeForecast %.2fx (in %.0f ms)",
                        est.vertices() / (double) n, forecast.vertices() / (double) n, forecastMs)));

        Timed<Solution> ct = time(sampler, base, reps, () -> new CompactAttractorSolver(game.graph()).solve());
        rows.add(new BenchRow(inst.side, inst.kind, "stored-compact", n, edges, buildMs, ct.millis(), ct.cpuMillis(),
                Math.max(buildPeak, ct.peak()), Verdict.of(ct.value().winning(game.start())).word(),
                wall0 + ct.millis(), -1, -1, "the same stored product graph, CompactAttractorSolver (check --method stored)"));

        Timed<GraphBaselines.Traversal> bt = time(sampler, base, reps, () -> GraphBaselines.bfs(game.graph(), game.start()));
        rows.add(new BenchRow(inst.side, inst.kind, "stored-bfs", bt.value().vertices(), bt.value().edges(), buildMs,
                bt.millis(), bt.cpuMillis(), Math.max(buildPeak, bt.peak()), null, wall0 + bt.millis(), -1, -1,
                "plain BFS over the same stored product graph, from the start"));

        long cap = warmup ? 2_000 : config.sweepCapMillis();
        long deadline = System.nanoTime() + cap * 1_000_000L;
        BooleanSupplier late = () -> System.nanoTime() > deadline;
        Timed<GraphBaselines.Sweeps> st = time(sampler, base, 1, () -> GraphBaselines.sweep(game.graph(), late));
        if (st.value() == null) {
            rows.add(new BenchRow(inst.side, inst.kind, "sweep", n, edges, buildMs, -1, -1, -1, null, -1, -1, -1,
                    "stopped after " + cap + " ms (the time cap of this run)"));
        } else {
            rows.add(new BenchRow(inst.side, inst.kind, "sweep", n, edges, buildMs, st.millis(), st.cpuMillis(),
                    Math.max(buildPeak, st.peak()), Verdict.of(st.value().won()[game.start()]).word(),
                    wall0 + st.millis(), -1, -1, st.value().sweeps() + " naive sweeps over the same product graph"));
        }
        return rows;
    }

    private static final String[] IMPLICIT_METHODS = {"attractor", "bfs", "full", "early"};

    /**
     * The main route (ImplicitReserveGame, ReserveOptions' default: the product's moves generated on
     * demand, nothing stored but the solver's counters, choices and worklist): {@code attractor} is the
     * route as check runs it (the first-in first-out attractor recording the robot's choices, stopping
     * once the start is won, then the policy walk and the worst case over the closed loop); {@code bfs}
     * is plain BFS over the same product from the start; {@code full} the last-in first-out attractor
     * to the end (the whole winning region), {@code early} the same stopping once the start is won
     * (check --verdict-only).
     */
    private List<BenchRow> implicitMethods(Instance inst, HeapSampler sampler, int reps) {
        List<BenchRow> rows = new ArrayList<>();
        Mission m = inst.mission;
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ImplicitReserveGame game;
        try {
            game = new ImplicitReserveGame(inst.arena, inst.goal, monitor);
        } catch (ProductTooLargeException e) {
            long v = (long) inst.arena.vertexCount() * inst.goal.stateCount() * monitor.stateBound();
            for (String method : IMPLICIT_METHODS) {
                rows.add(BenchRow.skipped(inst.side, inst.kind, method, v, v,
                        "does not fit: more than 2^31 slots in the numbering"));
            }
            return rows;
        }
        long slots = game.slotCount();
        if (game.vertexCount() > config.maxImplicitVertices()) {
            for (String method : IMPLICIT_METHODS) {
                rows.add(BenchRow.skipped(inst.side, inst.kind, method, game.vertexCount(), 0,
                        "skipped: " + game.vertexCount() + " vertices is over this run's limit of "
                                + config.maxImplicitVertices()));
            }
            return rows;
        }
        if (slots + 4 * game.vertexCount() > Runtime.getRuntime().maxMemory() - HeapSampler.settledUsed()) {
            for (String method : IMPLICIT_METHODS) {
                rows.add(BenchRow.skipped(inst.side, inst.kind, method, game.vertexCount(), 0,
                        "does not fit: " + megabytes(slots + 4 * game.vertexCount()) + " needed at most"));
            }
            return rows;
        }
        long forecast;
        try {
            forecast = ReserveSizeForecast.of(inst.arena, inst.goal, monitor).vertices();
        } catch (ArithmeticException tooManyPairs) {
            forecast = -1;
        }
        long base = HeapSampler.settledUsed();
        long all = game.vertexCount();
        Timed<ImplicitReserveGame.Result> full = time(sampler, base, reps, () -> game.solve(false));
        Timed<ImplicitReserveGame.Result> early = time(sampler, base, reps, () -> game.solve(true));
        Timed<ImplicitReserveGame.Result> bfs = time(sampler, base, reps, game::bfs);
        // the implicit route end to end as ReserveSolver's Route.IMPLICIT runs it: the attractor with the
        // robot's choices (stopping at the start), the policy walk and the worst-case DP over the closed loop
        Timed<long[]> pol = time(sampler, base, reps, () -> policyRun(game));
        long[] pv = pol.value();
        long reachable = bfs.value().wonVertices();
        rows.add(new BenchRow(inst.side, inst.kind, "attractor", reachable, bfs.value().edgesScanned(), 0, pol.millis(),
                pol.cpuMillis(), pol.peak(), Verdict.of(pv[0] == 1).word(), inst.arenaMillis + pol.millis(), -1,
                forecast, String.format(java.util.Locale.ROOT, "main route: implicit product (%d triples, %d reachable),"
                                + " attractor with the robot's choices, %d edges scanned; %s", all, reachable, pv[2],
                        pv[0] == 1 ? String.format(java.util.Locale.ROOT, "policy of %d rows, worst case %d units",
                                pv[3], pv[1]) : "not guaranteed, no policy")));
        rows.add(new BenchRow(inst.side, inst.kind, "bfs", reachable, bfs.value().edgesScanned(), 0, bfs.millis(),
                bfs.cpuMillis(), bfs.peak(), null, inst.arenaMillis + bfs.millis(), -1, -1,
                "plain BFS over the same implicit product, from the start"));
        rows.add(new BenchRow(inst.side, inst.kind, "full", all, full.value().edgesScanned(), 0, full.millis(),
                full.cpuMillis(), full.peak(), Verdict.of(full.value().startWon()).word(), inst.arenaMillis + full.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "implicit product, last-in first-out attractor to the end: won %d"
                        + " of %d triples", full.value().wonVertices(), all)));
        rows.add(new BenchRow(inst.side, inst.kind, "early", all, early.value().edgesScanned(), 0, early.millis(),
                early.cpuMillis(), early.peak(), Verdict.of(early.value().startWon()).word(), inst.arenaMillis + early.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "implicit, stops once the start is won (check --verdict-only): %s;"
                                + " won %d (%.0f%% of the full attractor's)",
                        early.value().stoppedEarly() ? "stopped early" : "ran to the end", early.value().wonVertices(),
                        100.0 * early.value().wonVertices() / Math.max(1, full.value().wonVertices()))));
        return rows;
    }

    /**
     * The minimum-credit solver of the margins (the charging route's one pass, {@code FloorSweep}, which
     * replaced the margin package's fixpoint over energy levels): the least starting level per position
     * of arena × goal at the mission's floor, then compared with the starting charge. The row keeps its
     * name; its vertices are the robot positions of arena × goal.
     */
    private BenchRow fixpoint(Instance inst, HeapSampler sampler, int reps) {
        Mission m = inst.mission;
        long base = HeapSampler.settledUsed();
        Timed<ChargingRoute.Analysis> t = time(sampler, base, reps, () -> ChargingRoute.analyse(
                new ChargingSolver(inst.arena, inst.goal), m.capacityUnits(), m.reserveUnits(), m.startUnits()));
        ChargingRoute.Analysis a = t.value();
        boolean won = a.guaranteed();
        long positions = (long) inst.arena.robotCount() * inst.goal.stateCount();
        return new BenchRow(inst.side, inst.kind, "fixpoint", positions, 0, 0, t.millis(), t.cpuMillis(), t.peak(),
                Verdict.of(won).word(), inst.arenaMillis + t.millis(), -1, -1,
                "least starting level over arena x goal (charging route, one pass of " + a.rounds() + " batches): "
                        + (a.lowestStartUnits().isEmpty() ? "none" : a.lowestStartUnits().getAsInt() + " units")
                        + " against " + m.startUnits());
    }

    /** Discount factor of the discounted instance. */
    static final int DISCOUNT = 2;

    /**
     * The discounted threshold question DS ≥ v without the dock goal (the question both routes
     * answer; see DiscountedThresholdGame) on the consumption instance's arena, v the exact optimal value
     * found by an untimed value-iteration solve first: the hardest threshold for both routes (value
     * iteration must pin the value, the comparator must track every play that stays near it).
     */
    private List<BenchRow> discounted(Instance inst, HeapSampler sampler, int reps) {
        List<BenchRow> rows = new ArrayList<>();
        Rational v;
        try {
            v = new DiscountedValueIteration(inst.arena, DISCOUNT).solve().exactValue();
        } catch (ArithmeticException e) {
            rows.add(BenchRow.skipped(inst.side, inst.kind, "attractor", 0, 0,
                    "skipped: the optimal value needs more than 64-bit rationals"));
            rows.add(BenchRow.skipped(inst.side, inst.kind, "vi", 0, 0,
                    "skipped: the optimal value needs more than 64-bit rationals"));
            return rows;
        }
        int mu = inst.arena.maxAbsWeight();
        // the timed bodies keep nothing of a product but its sizes, so that no run starts with an earlier
        // product still live; all three routes get the same number of runs of over SHORT_RUN_MILLIS (with
        // value iteration's long runs not repeated, its single run would face the comparator route's best
        // of three, a bias in the comparator's favour on exactly the sizes where the ratio is a target),
        // and they are measured interleaved (timeInterleaved), so that the ratio compares like with like
        boolean implicit = ImplicitDiscountedGame.applicable(inst.arena);
        // the main route: the product with its disturbance pairs and edges implicit (ImplicitDiscountedGame)
        Body<long[]> mainRoute = () -> {
            DiscountedComparator c = new DiscountedComparator(DISCOUNT, mu, v, Relation.AT_LEAST);
            if (implicit) {
                ImplicitDiscountedGame g = ImplicitDiscountedGame.solve(inst.arena, c);
                return new long[] {g.robotWins() ? 1 : 0, g.vertexCount(), g.edgeCount(), g.comparatorStates(),
                        g.robotPairs()};
            }
            DiscountedThresholdGame g = DiscountedThresholdGame.build(inst.arena, c);
            return new long[] {g.robotWins() ? 1 : 0, g.vertexCount(), g.edgeCount(), g.comparatorStates(), -1};
        };
        // the reference route: the product stored in CSR arrays (DiscountedThresholdGame)
        Body<long[]> storedRoute = () -> {
            DiscountedThresholdGame g = DiscountedThresholdGame.build(inst.arena,
                    new DiscountedComparator(DISCOUNT, mu, v, Relation.AT_LEAST));
            return new long[] {g.robotWins() ? 1 : 0, g.vertexCount(), g.edgeCount()};
        };
        Body<DiscountedValueIteration.Result> viRoute =
                () -> new DiscountedValueIteration(inst.arena, DISCOUNT).decide(v, Relation.AT_LEAST);
        List<Timed<Object>> timed = timeInterleaved(sampler, reps, List.of(mainRoute, storedRoute, viRoute));
        Timed<Object> comp = timed.get(0);
        Timed<Object> stored = timed.get(1);
        Timed<Object> vi = timed.get(2);
        long[] game = (long[]) comp.value();
        rows.add(new BenchRow(inst.side, inst.kind, "attractor", game[1], game[2], 0, comp.millis(),
                comp.cpuMillis(), comp.peak(), Verdict.of(game[0] == 1).word(), inst.arenaMillis + comp.millis(), -1, -1,
                (implicit ? "comparator product on demand (" + game[4] + " robot pairs stored, "
                        : "comparator product stored (") + game[3] + " comparator states), solved by the attractor;"
                        + " DS >= " + v + ", d = " + DISCOUNT + ", no dock goal"));
        long[] sg = (long[]) stored.value();
        rows.add(new BenchRow(inst.side, inst.kind, "stored-attractor", sg[1], sg[2], 0, stored.millis(),
                stored.cpuMillis(), stored.peak(), Verdict.of(sg[0] == 1).word(), inst.arenaMillis + stored.millis(),
                -1, -1, "comparator product stored in CSR arrays, solved by the attractor (reference route)"));
        DiscountedValueIteration.Result vr = (DiscountedValueIteration.Result) vi.value();
        rows.add(new BenchRow(inst.side, inst.kind, "vi", inst.arena.vertexCount(), inst.arena.edgeCount(), 0,
                vi.millis(), vi.cpuMillis(), vi.peak(), Verdict.of(vr.holds()).word(),
                inst.arenaMillis + vi.millis(), -1, -1,
                "value iteration on the arena, then compare: " + vr.sweeps() + " sweeps"));
        return rows;
    }

    /**
     * Warm-up only: both comparator routes on a small arena with a comparator of wider weight bound
     * and thresholds of larger denominators, for both relations, so that every path of their code is
     * taken while the JIT compiler profiles it (many states on one arena vertex, chains that outgrow
     * their walk, arrays that grow, actions decided by a sink before their last outcome, joins told to
     * pairs already joined). On the small floors of the ordinary warm-up those paths are never taken;
     * they first are at some larger size, where the compiled code is then thrown away and compiled
     * again in the middle of the measurements, and how fast the new code is varies from one process to
     * the next. No answer is kept.
     */
    private static void warmComparatorPaths(Arena arena) {
        int mu = arena.maxAbsWeight();
        for (int round = 0; round < 4; round++) {
            for (Relation rel : Relation.values()) {
                for (int q : new int[] {7, 97, 389}) {
                    for (int extra : new int[] {0, 4}) {
                        Rational v = Rational.of(-(long) q * (round + 1) / 2, q);
                        ImplicitDiscountedGame.solve(arena, new DiscountedComparator(DISCOUNT, mu + extra, v, rel));
                        DiscountedThresholdGame.build(arena, new DiscountedComparator(DISCOUNT, mu + extra, v, rel))
                                .robotWins();
                    }
                }
            }
        }
    }

    /** The fast path: arena × goal, stopping once the start is decided. */
    private BenchRow fast(Instance inst, HeapSampler sampler, int reps) {
        if (!MinChargeSolver.applicable(inst.arena, inst.goal)) {
            return BenchRow.skipped(inst.side, inst.kind, "fast", 0, 0, "the robot can charge before completion");
        }
        long base = HeapSampler.settledUsed();
        Timed<MinChargeSolver.Result> t = time(sampler, base, reps, () -> new MinChargeSolver(inst.arena, inst.goal).decide());
        MinChargeSolver.Result res = t.value();
        long v = (long) inst.arena.vertexCount() * inst.goal.stateCount();
        long e = (long) inst.arena.edgeCount() * inst.goal.stateCount();
        String note = String.format(java.util.Locale.ROOT,
                "arena x goal; need %s of %d available; explored %d of %d robot vertices (%.0f%%)",
                res.describeNeed(), res.availableUnits(), res.explored(),
                (long) inst.arena.robotCount() * inst.goal.stateCount(),
                100.0 * res.explored() / Math.max(1, (long) inst.arena.robotCount() * inst.goal.stateCount()));
        return new BenchRow(inst.side, inst.kind, "fast", v, e, 0, t.millis(), t.cpuMillis(), t.peak(),
                Verdict.of(res.guaranteed()).word(), inst.arenaMillis + t.millis(), -1, -1, note);
    }

    /**
     * What {@code check} does on the fast path, from the mission: arena compile, the start's need
     * ({@link FastPath}: verdict and highest floor), the policy rows over the closed loop when it has at
     * most {@link FastPath#DEFAULT_MAX_POLICY_ROWS} situations, and then the independent certificate.
     */
    private BenchRow fastCheck(Instance inst, HeapSampler sampler, int reps) {
        if (!MinChargeSolver.applicable(inst.arena, inst.goal)) {
            return BenchRow.skipped(inst.side, inst.kind, "check", 0, 0, "the robot can charge before completion");
        }
        long base = HeapSampler.settledUsed();
        Timed<String[]> t = time(sampler, base, reps, () -> {
            FastPath.Analysis a = FastPath.analyse(inst.mission, FastPath.DEFAULT_MAX_POLICY_ROWS, false).orElseThrow();
            String cert;
            if (a.policy().isPresent()) {
                Certificate c = CertificateChecker.check(a.arena(), a.policy().get(), a.reserveUnits(), a.startUnits());
                cert = (c.ok() ? "certified over " : "CERTIFICATE FAILED over ") + c.statesChecked() + " situations";
            } else if (a.loopTooLarge()) {
                cert = "not certified: closed loop over " + a.maxPolicyRows() + " situations";
            } else {
                cert = "nothing to certify";
            }
            return new String[] {a.verdict().word(), cert, a.highestGuaranteedReserveUnits().isPresent()
                    ? Integer.toString(a.highestGuaranteedReserveUnits().getAsInt()) : "none"};
        });
        long v = (long) inst.arena.vertexCount() * inst.goal.stateCount();
        long e = (long) inst.arena.edgeCount() * inst.goal.stateCount();
        return new BenchRow(inst.side, inst.kind, "check", v, e, 0, t.millis(), t.cpuMillis(), t.peak(),
                t.value()[0], t.millis(), -1, -1, "check's fast route from the mission (compile, need, highest floor "
                + t.value()[2] + ", policy rows, certificate): " + t.value()[1]);
    }

    static String megabytes(long bytes) {
        return (bytes >> 20) + " MB";
    }

    /**
     * The implicit route end to end as the planner runs it: the attractor with the robot's choices, the
     * policy walk and the worst-case pass over the closed loop, as {won, worst level, edges scanned, rows}.
     */
    static long[] policyRun(ImplicitReserveGame game) {
        ImplicitReserveGame.Strategy st = game.solveWithStrategy(() -> false);
        if (!st.startWon()) {
            return new long[] {0, -1, st.result().edgesScanned(), 0};
        }
        return new long[] {1, game.worstCaseMinimum(st), st.result().edgesScanned(), game.policy(st).size()};
    }
}
