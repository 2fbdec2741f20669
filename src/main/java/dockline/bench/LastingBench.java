package dockline.bench;

import static dockline.bench.Timing.time;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.Benchmark.Instance;
import dockline.bench.Timing.Timed;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductTooLargeException;
import dockline.solve.Verdict;
import dockline.solve.game.ReserveSizeForecast;
import dockline.solve.reserve.ImplicitReserveGame;
import dockline.solve.reserve.PhasedLastingSolver;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * The benchmark's rows for lasting disturbances (issue 13): the reserve instance with its door-shut events
 * lasting (a shut door stays shut), solved on the whole arena ({@code lasting}) and phase by phase
 * ({@code lasting-phased}, {@link PhasedLastingSolver}), and {@code check} end to end on it and on the consumption
 * instance ({@code lasting-check}: {@link MissionPlanner#plan}, the charging route or the fast path phase by phase),
 * each against the momentary main route on the same
 * instance timed again back to back, so that the ratio is of one run. See DEVELOPERS.md, "Lasting doors".
 */
final class LastingBench {

    private LastingBench() {
    }

    /**
     * Only the lasting rows (issue 13's door-shut events that stay shut) on the configured sides, after one
     * warm-up of the same row on a 32x32 floor: a development aid ({@code bench --lasting-row}, used by {@link Benchmark#lastingOnly}) for profiling
     * the lasting route; each row times the momentary main route again back to back, so its ratio is of one run.
     */
    static List<BenchRow> only(Benchmark bench, Benchmark.Config config, Consumer<String> progress) {
        List<BenchRow> rows = new ArrayList<>();
        try (HeapSampler sampler = new HeapSampler()) {
            progress.accept("warming up the JIT compiler (the lasting row on a 32x32 floor)");
            for (int w = 0; w < Math.max(1, config.warmups()); w++) {
                lasting(bench.instance(32, Benchmark.RESERVE), sampler, 1);
            }
            phased(bench.instance(32, Benchmark.RESERVE), sampler, 1);
            check(bench.instance(32, Benchmark.RESERVE), sampler, 1);
            check(bench.instance(32, Benchmark.CONSUMPTION), sampler, 1);
            for (int side : config.sizes()) {
                Instance inst = bench.instance(side, Benchmark.RESERVE);
                // the consumption instance (no charging before the end): check takes the fast path phase by phase
                Instance consumption = bench.instance(side, Benchmark.CONSUMPTION);
                for (BenchRow r : List.of(lasting(inst, sampler, config.reps()), phased(inst, sampler,
                        config.reps()), knownPhases(inst, sampler, config.reps()), check(inst, sampler,
                        config.reps()), check(consumption, sampler, config.reps()))) {
                    rows.add(r);
                    progress.accept(r.compact());
                }
            }
        }
        return rows;
    }

    /** Largest side on which the table's run ({@link #inTable}) times the phase-by-phase lasting rows. */
    static final int TABLE_MAX_SIDE = 128;

    /**
     * The phase-by-phase lasting rows of the table's run: on the reserve instance {@code lasting-phased} (the product
     * route) and {@code lasting-check} (what {@code check} runs: the charging route), on the consumption instance
     * {@code lasting-check} (the fast path), each with its momentary counterpart timed back to back; skipped above
     * {@link #TABLE_MAX_SIDE} ({@code bench --lasting-row --sizes} runs them on any side).
     */
    static List<BenchRow> inTable(Instance inst, HeapSampler sampler, int reps) {
        boolean reserve = inst.kind().equals(Benchmark.RESERVE);
        if (inst.side() > TABLE_MAX_SIDE) {
            String why = "skipped: the table's run times the lasting rows up to " + TABLE_MAX_SIDE + "x"
                    + TABLE_MAX_SIDE + " (bench --lasting-row --sizes " + inst.side() + " runs them here)";
            List<BenchRow> out = new ArrayList<>();
            if (reserve) {
                out.add(BenchRow.skipped(inst.side(), inst.kind(), "lasting-phased", 0, 0, why));
            }
            out.add(BenchRow.skipped(inst.side(), inst.kind(), "lasting-check", 0, 0, why));
            return out;
        }
        return reserve ? List.of(phased(inst, sampler, reps), check(inst, sampler, reps))
                : List.of(check(inst, sampler, reps));
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
    static BenchRow lasting(Instance inst, HeapSampler sampler, int reps) {
        Mission m = inst.mission();
        Mission lm = lastingMission(m);
        long states = lastingStates(lm);
        long robots = states >= Long.MAX_VALUE / 4 ? states : states * inst.arena().freeCellCount();
        if (robots > LASTING_ROBOT_VERTEX_LIMIT) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting", robots, 0, "skipped: the arena with lasting doors"
                    + " would have " + robots + " robot vertices (" + states + " disturbance states), over this run's"
                    + " limit of " + LASTING_ROBOT_VERTEX_LIMIT);
        }
        long t0 = System.nanoTime();
        Arena arena;
        try {
            arena = ArenaCompiler.compile(lm);
        } catch (ArithmeticException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting", 0, 0, "does not fit: " + e.getMessage());
        }
        double compileMs = (System.nanoTime() - t0) / 1e6;
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ImplicitReserveGame game;
        try {
            game = new ImplicitReserveGame(arena, inst.goal(), monitor);
        } catch (ProductTooLargeException e) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting", arena.vertexCount(), arena.edgeCount(),
                    "does not fit: more than 2^31 slots in the numbering");
        }
        if (game.slotCount() + 4 * game.vertexCount() > Runtime.getRuntime().maxMemory() - HeapSampler.settledUsed()) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting", game.vertexCount(), 0,
                    "does not fit: " + Benchmark.megabytes(game.slotCount() + 4 * game.vertexCount()) + " needed at most");
        }
        long forecast;
        try {
            forecast = ReserveSizeForecast.of(arena, inst.goal(), monitor).vertices();
        } catch (ArithmeticException tooManyPairs) {
            forecast = -1;
        }
        long base = HeapSampler.settledUsed();
        Timed<ImplicitReserveGame.Result> bfs = time(sampler, base, 1, game::bfs);
        Timed<long[]> pol = time(sampler, base, reps, () -> Benchmark.policyRun(game));
        long[] pv = pol.value();
        long reachable = bfs.value().wonVertices();
        // the momentary main route on the same instance, for the ratio (timed here again, back to back)
        ImplicitReserveGame mgame = new ImplicitReserveGame(inst.arena(), inst.goal(), monitor);
        Timed<Boolean> mom = time(sampler, base, reps, () -> mgame.solveWithStrategy(() -> false).startWon());
        double ratio = pol.cpuMillis() / Math.max(mom.cpuMillis(), 1e-3);
        return new BenchRow(inst.side(), inst.kind(), "lasting", reachable, bfs.value().edgesScanned(), 0, pol.millis(),
                pol.cpuMillis(), pol.peak(), Verdict.of(pv[0] == 1).word(), compileMs + pol.millis(), -1, forecast,
                String.format(java.util.Locale.ROOT, "door-shut events lasting: %d disturbance states (%d closable"
                                + " doors) against %d; arena %d vertices compiled in %.0f ms (momentary %d in %.0f ms);"
                                + " solve %.2f x the momentary attractor's CPU time (%.1f ms); forecast / reachable"
                                + " product %.3f; %s", arena.stateCount(), arena.states().itemCount(),
                        inst.arena().stateCount(), arena.vertexCount(), compileMs, inst.arena().vertexCount(),
                        inst.arenaMillis(), ratio, mom.cpuMillis(), forecast / (double) Math.max(1, reachable),
                        pv[0] == 1 ? "policy of " + pv[3] + " rows, worst case " + pv[1] + " units"
                                : "not guaranteed")).withMomentary(mom.cpuMillis());
    }

    /**
     * The lasting instance decided phase by phase ({@link PhasedLastingSolver}: only the closure phases the
     * robot's attempts run into are compiled and solved, refined until exact), timed end to end (its restricted
     * compiles included, as it builds them itself), against the momentary main route timed back to back.
     */
    static BenchRow phased(Instance inst, HeapSampler sampler, int reps) {
        Mission lm = lastingMission(inst.mission());
        ReserveMonitor monitor = new ReserveMonitor(lm.reserveUnits(), lm.capacityUnits(), lm.startUnits());
        long base = HeapSampler.settledUsed();
        Timed<PhasedLastingSolver.Result> ph;
        try {
            ph = time(sampler, base, reps, () -> PhasedLastingSolver.solve(lm, inst.goal(), monitor,
                    dockline.solve.ProductOptions.defaults()));
        } catch (RuntimeException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting-phased", 0, 0, "does not fit: " + e.getMessage());
        }
        PhasedLastingSolver.Result r = ph.value();
        ImplicitReserveGame mgame = new ImplicitReserveGame(inst.arena(), inst.goal(), monitor);
        Timed<Boolean> mom = time(sampler, base, reps, () -> mgame.solveWithStrategy(() -> false).startWon());
        double ratio = ph.cpuMillis() / Math.max(mom.cpuMillis(), 1e-3);
        return new BenchRow(inst.side(), inst.kind(), "lasting-phased", r.game().vertexCount(),
                r.strategy().result().edgesScanned(), 0, ph.millis(), ph.cpuMillis(), ph.peak(),
                Verdict.of(r.startWon()).word(), ph.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "door-shut events lasting, phase by phase: %d of %d disturbance"
                                + " states kept in %d rounds, last arena %d vertices; %.2f x the momentary attractor's"
                                + " CPU time (%.1f ms)", r.keptStates(), r.totalStates(), r.rounds(),
                        r.arena().vertexCount(), ratio, mom.cpuMillis())).withMomentary(mom.cpuMillis());
    }

    /**
     * The phases the phased solve ends with, given in advance, solved in one round (the weakened game on them,
     * {@link PhasedLastingSolver#solveKept}; compile included), against the momentary main route back to back:
     * what the phased solver's last round would cost even if its phases were known before the first round (the
     * rounds before it and the strengthened stage are saved, the kept phases are not).
     */
    static BenchRow knownPhases(Instance inst, HeapSampler sampler, int reps) {
        Mission lm = lastingMission(inst.mission());
        ReserveMonitor monitor = new ReserveMonitor(lm.reserveUnits(), lm.capacityUnits(), lm.startUnits());
        dockline.solve.ProductOptions po = dockline.solve.ProductOptions.defaults();
        PhasedLastingSolver.Result r;
        try {
            r = PhasedLastingSolver.solve(lm, inst.goal(), monitor, po);
        } catch (RuntimeException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting-known-phases", 0, 0, "does not fit: "
                    + e.getMessage());
        }
        boolean[] keep = PhasedLastingSolver.kept(r);
        dockline.arena.DisturbanceStates st = ArenaCompiler.states(lm);
        long base = HeapSampler.settledUsed();
        Timed<ImplicitReserveGame.Strategy> one = time(sampler, base, reps, () -> PhasedLastingSolver.solveKept(lm,
                inst.goal(), monitor, st, keep, po));
        ImplicitReserveGame mgame = new ImplicitReserveGame(inst.arena(), inst.goal(), monitor);
        Timed<Boolean> mom = time(sampler, base, reps, () -> mgame.solveWithStrategy(() -> false).startWon());
        double ratio = one.cpuMillis() / Math.max(mom.cpuMillis(), 1e-3);
        int[] byBudget = new int[lm.map().disturbances().budget() + 1];
        for (int s = 0; s < keep.length; s++) {
            byBudget[st.budgetLeft(s)] += keep[s] ? 1 : 0;
        }
        return new BenchRow(inst.side(), inst.kind(), "lasting-known-phases", r.game().vertexCount(),
                one.value().result().edgesScanned(), 0, one.millis(), one.cpuMillis(), one.peak(),
                Verdict.of(one.value().startWon()).word(), one.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "the %d of %d disturbance states the phased solve ends with"
                                + " (by budget left 0..K: %s), given in advance and solved in one round: %.2f x the"
                                + " momentary attractor's CPU time (%.1f ms)", r.keptStates(), r.totalStates(), java.util.Arrays.toString(byBudget), ratio,
                        mom.cpuMillis())).withMomentary(mom.cpuMillis());
    }

    /**
     * What {@code check} runs, end to end: {@link MissionPlanner#plan} with the mission's default options (the
     * compile, the route's solve, the certificate, the suggestions when not guaranteed) on the lasting instance,
     * then on the momentary one back to back, so that the ratio is of one run. On the lasting reserve instance the
     * charging route decides phase by phase, on the consumption instance (no charging before the end) the fast path
     * (their note, quoted in the row's, gives the disturbance states kept and the rounds).
     */
    static BenchRow check(Instance inst, HeapSampler sampler, int reps) {
        Mission m = inst.mission();
        Mission lm = lastingMission(m);
        long base = HeapSampler.settledUsed();
        Timed<Plan> lp;
        try {
            lp = time(sampler, base, reps, () -> MissionPlanner.plan(lm, PlanOptions.defaults(lm)));
        } catch (RuntimeException | OutOfMemoryError e) {
            return BenchRow.skipped(inst.side(), inst.kind(), "lasting-check", 0, 0, "does not fit: " + e.getMessage());
        }
        Timed<Plan> mp = time(sampler, base, reps, () -> MissionPlanner.plan(m, PlanOptions.defaults(m)));
        Plan p = lp.value();
        double ratio = lp.cpuMillis() / Math.max(mp.cpuMillis(), 1e-3);
        String phases = p.notes().stream().filter(n -> n.startsWith("lasting closures")).findFirst()
                .orElse("the whole arena (not phase by phase)");
        return new BenchRow(inst.side(), inst.kind(), "lasting-check", p.size().vertices(), -1, 0, lp.millis(),
                lp.cpuMillis(), lp.peak(), p.verdict().word(), lp.millis(), -1, -1,
                String.format(java.util.Locale.ROOT, "check end to end (MissionPlanner.plan, default route %s),"
                                + " door-shut events lasting: %.1f ms CPU, %.2f x the momentary mission's %.1f ms"
                                + " (%s, %s); %s", p.method(), lp.cpuMillis(), ratio, mp.cpuMillis(),
                        mp.value().method(), mp.value().verdict().word(), phases)).withMomentary(mp.cpuMillis());
    }

    /** The instance's mission with its door-shut events lasting (the rest as they are). */
    static Mission lastingMission(Mission m) {
        List<dockline.model.EventRule> rules = new ArrayList<>();
        for (dockline.model.EventRule r : m.map().disturbances().rules()) {
            rules.add(r.kind() == dockline.model.EventKind.DOOR_SHUT
                    ? r.withDuration(dockline.model.EventDuration.REST_OF_MISSION) : r);
        }
        return new Mission(m.name(), m.source(), m.map().withDisturbances(
                new dockline.model.DisturbanceModel(m.map().disturbances().budget(), rules)), m.robot(), m.start(),
                m.startCharge(), m.reserve(), m.tasks(), m.objective());
    }
}
