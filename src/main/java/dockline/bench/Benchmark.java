package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
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
import dockline.solve.reserve.PhasedLastingSolver;
import java.util.ArrayList;
import java.util.LinkedHashMap;
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
                        progress.accept(compact(r));
                    }
                }
            }
        }
        return new BenchReport(machine, rows, (System.nanoTime() - t0) / 1e6);
    }

    /**
     * Only the lasting rows (issue 13's door-shut events that stay shut) on the configured sides, after one
     * warm-up of the same row on a 32x32 floor: a development aid ({@code bench --lasting-row}) for profiling
     * the lasting route; each row times the momentary main route again back to back, so its ratio is of one run.
     */
    public List<BenchRow> lastingOnly() {
        List<BenchRow> rows = new ArrayList<>();
        try (HeapSampler sampler = new HeapSampler()) {
            progress.accept("warming up the JIT compiler (the lasting row on a 32x32 floor)");
            for (int w = 0; w < Math.max(1, config.warmups()); w++) {
                lasting(instance(32, RESERVE), sampler, 1);
            }
            lastingPhased(instance(32, RESERVE), sampler, 1);
            for (int side : config.sizes()) {
                Instance inst = instance(side, RESERVE);
                for (BenchRow r : List.of(lasting(inst, sampler, config.reps()), lastingPhased(inst, sampler,
                        config.reps()))) {
                    rows.add(r);
                    progress.accept(compact(r));
                }
            }
        }
        return rows;
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
                    rows.add(lasting(inst, sampler, reps));
                }
            }
            case CONSUMPTION -> {
                rows.add(fast(inst, sampler, reps));
                rows.add(fastCheck(inst, sampler, reps));
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

    /** Something timed; its value is kept from the last run. */
    @FunctionalInterface
    private interface Body<T> {
        T run();
    }

    /** The value of the last run, the best wall and CPU times over the runs, the peak heap of the first run. */
    private record Timed<T>(T value, double millis, double cpuMillis, long peak) {
    }

    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    /**
     * CPU time of this thread plus the garbage collector's pauses so far, in ns (other processes on the
     * machine do not count); -1 when the platform cannot tell. Thread CPU time has nanosecond
     * resolution (process CPU time on Linux only clock ticks); the pauses are added because the
     * collector's work is done by its own threads.
     */
    private static long cpuNow() {
        if (!THREADS.isCurrentThreadCpuTimeSupported()) {
            return -1;
        }
        long gcMillis = 0;
        for (java.lang.management.GarbageCollectorMXBean gc
                : java.lang.management.ManagementFactory.getGarbageCollectorMXBeans()) {
            gcMillis += Math.max(0, gc.getCollectionTime());
        }
        return THREADS.getCurrentThreadCpuTime() + gcMillis * 1_000_000L;
    }

    /** A first run shorter than this is repeated (see {@link #time(HeapSampler, long, int, Body)}). */
    private static final double SHORT_RUN_MILLIS = 200;
    private static final int SHORT_RUN_REPS = 7;
    private static final int SHORT_RUN_MAX = 50;
    private static final double SHORT_RUN_BUDGET_MILLIS = 300;

    /** A run longer than this is not repeated (its time is stable enough, and the full run must stay short). */
    private static final double REPEAT_BELOW_MILLIS = 2_000;

    /**
     * Runs {@code body} up to {@code reps} times (once when the first run takes over
     * {@value #REPEAT_BELOW_MILLIS} ms); the heap is sampled during the first run, above {@code base}.
     */
    private static <T> Timed<T> time(HeapSampler sampler, long base, int reps, Body<T> body) {
        double best = Double.MAX_VALUE;
        double bestCpu = Double.MAX_VALUE;
        long peak = -1;
        T value = null;
        // a method whose first run is under SHORT_RUN_MILLIS is run again until SHORT_RUN_BUDGET_MILLIS
        // have been spent on it (at least SHORT_RUN_REPS runs, at most SHORT_RUN_MAX): the best of three is
        // at the mercy of one collection or scheduling hiccup when a run takes a few milliseconds, and the
        // best of many is a stable estimate of the undisturbed time
        int tries = reps;
        double spent = 0;
        for (int r = 0; r < tries; r++) {
            if (r == 0) {
                // settled first, so that the peak is this method's and not also the garbage of the one before
                System.gc();
                sampler.start();
            } else if (r < reps) {
                // (the extra runs of a short method skip this: a collection costs more than such a run,
                // and the best of many runs leaves out the few a collection falls into)
                // Settle the heap between repetitions, outside the timing: without this a repetition starts
                // with the previous one's result still referenced and its garbage uncollected, and pays
                // (in the collector's pauses counted by cpuNow) for memory it did not allocate; the first
                // repetition already starts from the heap the caller settled. A method's own collections
                // during a repetition are still counted.
                value = null;
                System.gc();
            }
            long c0 = cpuNow();
            long t0 = System.nanoTime();
            value = body.run();
            double ms = (System.nanoTime() - t0) / 1e6;
            long c1 = cpuNow();
            if (r == 0) {
                peak = sampler.stop() - base;
            }
            best = Math.min(best, ms);
            bestCpu = Math.min(bestCpu, c0 < 0 ? -1 : (c1 - c0) / 1e6);
            spent += ms;
            if (r == 0 && ms < SHORT_RUN_MILLIS && reps > 1) {
                tries = SHORT_RUN_MAX;
            }
            if (tries == SHORT_RUN_MAX && r + 1 >= Math.max(reps, SHORT_RUN_REPS) && spent >= SHORT_RUN_BUDGET_MILLIS) {
                break;
            }
            if (ms > REPEAT_BELOW_MILLIS) {
                break;
            }
        }
        return new Timed<>(value, best, bestCpu, peak);
    }

    /**
     * Several methods whose ratio is a target, measured in {@code rounds} interleaved rounds: each round
     * runs every method once after settling the heap (a method whose run is under
     * {@value #SHORT_RUN_MILLIS} ms is run again within the round, until its share of
     * {@value #SHORT_RUN_BUDGET_MILLIS} ms is spent), so that a slow phase of a shared machine, which
     * lasts seconds, falls on every method alike instead of on whichever ran then. Per method: the best
     * times over all rounds, the peak heap of its first run (above the heap settled just before it) and
     * the value of its last run.
     */
    private static List<Timed<Object>> timeInterleaved(HeapSampler sampler, int rounds, List<Body<?>> bodies) {
        int k = bodies.size();
        double[] best = new double[k];
        double[] bestCpu = new double[k];
        long[] peak = new long[k];
        Object[] value = new Object[k];
        java.util.Arrays.fill(best, Double.MAX_VALUE);
        java.util.Arrays.fill(bestCpu, Double.MAX_VALUE);
        int minRuns = Math.max(1, (SHORT_RUN_REPS + rounds - 1) / rounds);
        int maxRuns = Math.max(minRuns, SHORT_RUN_MAX / rounds);
        double budget = SHORT_RUN_BUDGET_MILLIS / rounds;
        for (int r = 0; r < rounds; r++) {
            for (int i = 0; i < k; i++) {
                value[i] = null;
                long base = HeapSampler.settledUsed();
                double spent = 0;
                for (int run = 0; run < maxRuns; run++) {
                    if (r == 0 && run == 0) {
                        sampler.start();
                    }
                    long c0 = cpuNow();
                    long t0 = System.nanoTime();
                    value[i] = bodies.get(i).run();
                    double ms = (System.nanoTime() - t0) / 1e6;
                    long c1 = cpuNow();
                    if (r == 0 && run == 0) {
                        peak[i] = sampler.stop() - base;
                    }
                    best[i] = Math.min(best[i], ms);
                    bestCpu[i] = Math.min(bestCpu[i], c0 < 0 ? -1 : (c1 - c0) / 1e6);
                    spent += ms;
                    if (ms >= SHORT_RUN_MILLIS || (run + 1 >= minRuns && spent >= budget)) {
                        break;
                    }
                }
            }
        }
        List<Timed<Object>> out = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            out.add(new Timed<>(value[i], best[i], bestCpu[i], peak[i]));
        }
        return out;
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

    /** The lasting row is skipped above this many robot vertices of its arena (compile time and heap). */
    static final long LASTING_ROBOT_VERTEX_LIMIT = 1_500_000;

    /** Disturbance states of a mission, counted on a one-row copy of nothing but its rules (cheap). */
    private static long lastingStates(Mission m) {
        int n = dockline.arena.ArenaCompiler.disturbanceStateCount(m, 1_000_000);
        return n < 0 ? Long.MAX_VALUE / 4 : n;
    }

    /**
     * The main route on the same instance with its door-shut events lasting (a shut door stays shut):
     * the arena then carries the closed doors, found only as event sequences can close them. The row's
     * note gives the ratio of its solve time to the momentary {@code attractor}'s (both CPU, the same
     * work: implicit product, attractor with the robot's choices, policy and worst case), the arena sizes
     * and compile times of both, and the size forecast against the reachable product.
     */
    private BenchRow lasting(Instance inst, HeapSampler sampler, int reps) {
        Mission m = inst.mission;
        List<dockline.model.EventRule> rules = new ArrayList<>();
        for (dockline.model.EventRule r : m.map().disturbances().rules()) {
            rules.add(r.kind() == dockline.model.EventKind.DOOR_SHUT
                    ? r.withDuration(dockline.model.EventDuration.REST_OF_MISSION) : r);
        }
        Mission lm = new Mission(m.name(), m.source(), m.map().withDisturbances(
                new dockline.model.DisturbanceModel(m.map().disturbances().budget(), rules)), m.robot(), m.start(),
                m.startCharge(), m.reserve(), m.tasks(), m.objective());
        long states = lastingStates(lm);
        long robots = states >= Long.MAX_VALUE / 4 ? states : states * inst.arena.freeCellCount();
        if (robots > LASTING_ROBOT_VERTEX_LIMIT) {
            return BenchRow.skipped(inst.side, inst.kind, "lasting", robots, 0, "skipped: the arena with lasting doors"
                    + " would have " + robots + " robot vertices (" + states + " disturbance states), over this run's"
                    + " limit of " + LASTING_ROBOT_VERTEX_LIMIT);
        }
        long t0 = System.nanoTime();
        Arena arena;
        try {
            arena = ArenaCompiler.compile(lm);
        } catch (ArithmeticException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side, inst.kind, "lasting", 0, 0, "does not fit: " + e.getMessage());
        }
        double compileMs = (System.nanoTime() - t0) / 1e6;
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ImplicitReserveGame game;
        try {
            game = new ImplicitReserveGame(arena, inst.goal, monitor);
        } catch (ProductTooLargeException e) {
            return BenchRow.skipped(inst.side, inst.kind, "lasting", arena.vertexCount(), arena.edgeCount(),
                    "does not fit: more than 2^31 slots in the numbering");
        }
        if (game.slotCount() + 4 * game.vertexCount() > Runtime.getRuntime().maxMemory() - HeapSampler.settledUsed()) {
            return BenchRow.skipped(inst.side, inst.kind, "lasting", game.vertexCount(), 0,
                    "does not fit: " + megabytes(game.slotCount() + 4 * game.vertexCount()) + " needed at most");
        }
        long forecast;
        try {
            forecast = ReserveSizeForecast.of(arena, inst.goal, monitor).vertices();
        } catch (ArithmeticException tooManyPairs) {
            forecast = -1;
        }
        long base = HeapSampler.settledUsed();
        Timed<ImplicitReserveGame.Result> bfs = time(sampler, base, 1, game::bfs);
        Timed<long[]> pol = time(sampler, base, reps, () -> policyRun(game));
        long[] pv = pol.value();
        long reachable = bfs.value().wonVertices();
        // the momentary main route on the same instance, for the ratio (timed here again, back to back)
        ImplicitReserveGame mgame = new ImplicitReserveGame(inst.arena, inst.goal, monitor);
        Timed<Boolean> mom = time(sampler, base, reps, () -> mgame.solveWithStrategy(() -> false).startWon());
        double ratio = pol.cpuMillis() / Math.max(mom.cpuMillis(), 1e-3);
        return new BenchRow(inst.side, inst.kind, "lasting", reachable, bfs.value().edgesScanned(), 0, pol.millis(),
                pol.cpuMillis(), pol.peak(), Verdict.of(pv[0] == 1).word(), compileMs + pol.millis(), -1, forecast,
                String.format(java.util.Locale.ROOT, "door-shut events lasting: %d disturbance states (%d closable"
                                + " doors) against %d; arena %d vertices compiled in %.0f ms (momentary %d in %.0f ms);"
                                + " solve %.2f x the momentary attractor's CPU time (%.1f ms); forecast / reachable"
                                + " product %.3f; %s", arena.stateCount(), arena.states().itemCount(),
                        inst.arena.stateCount(), arena.vertexCount(), compileMs, inst.arena.vertexCount(),
                        inst.arenaMillis, ratio, mom.cpuMillis(), forecast / (double) Math.max(1, reachable),
                        pv[0] == 1 ? "policy of " + pv[3] + " rows, worst case " + pv[1] + " units"
                                : "not guaranteed"));
    }

    /**
     * The lasting instance decided phase by phase ({@link PhasedLastingSolver}: only the closure phases the
     * robot's attempts run into are compiled and solved, refined until exact), timed end to end (its restricted
     * compiles included, as it builds them itself), against the momentary main route timed back to back.
     */
    private BenchRow lastingPhased(Instance inst, HeapSampler sampler, int reps) {
        Mission lm = lastingMission(inst.mission);
        ReserveMonitor monitor = new ReserveMonitor(lm.reserveUnits(), lm.capacityUnits(), lm.startUnits());
        long base = HeapSampler.settledUsed();
        Timed<PhasedLastingSolver.Result> ph;
        try {
            ph = time(sampler, base, reps, () -> PhasedLastingSolver.solve(lm, inst.goal, monitor,
                    dockline.solve.ProductOptions.defaults()));
        } catch (RuntimeException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side, inst.kind, "lasting-phased", 0, 0, "does not fit: " + e.getMessage());
        }
        PhasedLastingSolver.Result r = ph.value();
        ImplicitReserveGame mgame = new ImplicitReserveGame(inst.arena, inst.goal, monitor);
        Timed<Boolean> mom = time(sampler, base, reps, () -> mgame.solveWithStrategy(() -> false).startWon());
        double ratio = ph.cpuMillis() / Math.max(mom.cpuMillis(), 1e-3);
        return new BenchRow(inst.side, inst.kind, "lasting-phased", r.game().vertexCount(),
                r.strategy().result().edgesScanned(), 0, ph.millis(), ph.cpuMillis(), ph.peak(),
                Verdict.of(r.startWon()).word(), ph.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "door-shut events lasting, phase by phase: %d of %d disturbance"
                                + " states kept in %d rounds, last arena %d vertices; %.2f x the momentary attractor's"
                                + " CPU time (%.1f ms)", r.keptStates(), r.totalStates(), r.rounds(),
                        r.arena().vertexCount(), ratio, mom.cpuMillis()));
    }

    /** The instance's mission with its door-shut events lasting (the rest as they are). */
    private static Mission lastingMission(Mission m) {
        List<dockline.model.EventRule> rules = new ArrayList<>();
        for (dockline.model.EventRule r : m.map().disturbances().rules()) {
            rules.add(r.kind() == dockline.model.EventKind.DOOR_SHUT
                    ? r.withDuration(dockline.model.EventDuration.REST_OF_MISSION) : r);
        }
        return new Mission(m.name(), m.source(), m.map().withDisturbances(
                new dockline.model.DisturbanceModel(m.map().disturbances().budget(), rules)), m.robot(), m.start(),
                m.startCharge(), m.reserve(), m.tasks(), m.objective());
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

    /** A row as one short progress line (the full row is in the final table). */
    static String compact(BenchRow r) {
        return String.format(java.util.Locale.ROOT, "  %s: %s", r.method(), r.ran()
                ? String.format(java.util.Locale.ROOT, "%.1f ms%s", r.solveMillis(),
                        r.verdict() == null ? "" : ", " + r.verdict())
                : "skipped");
    }

    /** Verdicts per instance that disagree: "size instance: method=verdict, ...". */
    static List<String> mismatches(List<BenchRow> rows) {
        Map<String, Map<String, String>> byInstance = new LinkedHashMap<>();
        for (BenchRow r : rows) {
            if (r.verdict() != null) {
                byInstance.computeIfAbsent(r.size() + "x" + r.size() + " " + r.instance(), k -> new LinkedHashMap<>())
                        .put(r.method(), r.verdict());
            }
        }
        List<String> out = new ArrayList<>();
        byInstance.forEach((k, v) -> {
            if (new TreeSet<>(v.values()).size() > 1) {
                out.add(k + ": " + v);
            }
        });
        return out;
    }

    /**
     * The implicit route end to end as the planner runs it: the attractor with the robot's choices, the
     * policy walk and the worst-case pass over the closed loop, as {won, worst level, edges scanned, rows}.
     */
    private static long[] policyRun(ImplicitReserveGame game) {
        ImplicitReserveGame.Strategy st = game.solveWithStrategy(() -> false);
        if (!st.startWon()) {
            return new long[] {0, -1, st.result().edgesScanned(), 0};
        }
        return new long[] {1, game.worstCaseMinimum(st), st.result().edgesScanned(), game.policy(st).size()};
    }
}
