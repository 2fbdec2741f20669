package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.solve.charging.ChargingRoute;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.replay.Replay;
import dockline.util.VisitQueue;
import java.math.BigDecimal;
import java.util.Locale;

/**
 * The benchmark row "resolution independence": one generated building with charging, the full check of
 * the charging route ({@code check}'s default for it: {@link MissionPlanner} with {@link Route.Charging}:
 * arena compile, verdict, threshold policy, its independent certificate, the worst-case replay, the highest
 * floor and the lowest start, all from one pass) at 1,000 and at 10,000 battery levels, and a plain
 * breadth-first search over arena × goal for scale.
 *
 * <p>The mission is {@link MissionSpec#docking} with a 50 Wh battery, reserve 20 %, start full, 2 Wh
 * per charging step, three rooms in order; at 0.05 Wh per unit (1,000 levels) and 0.005 Wh per unit
 * (10,000 levels) every energy figure of {@link MissionGenerator} and {@link BuildingGenerator} (0.05,
 * 0.1, 0.15, 0.25, 0.3, 2 Wh) is a whole number of units, so the two missions are the same game with
 * every energy figure scaled by ten; the row checks that the answers scale so. Times are the best of
 * a few runs, by the thread's CPU time; the peak heap is sampled every millisecond during one run at
 * 1,000 levels (garbage not yet collected included, so an upper bound).
 */
public final class ResolutionBench {

    private ResolutionBench() {
    }

    /**
     * One full check.
     *
     * @param plan      the plan
     * @param worstCase the worst-case (or counterexample) replay's lowest level
     * @param cpuMillis best thread CPU time of the runs
     * @param peakBytes highest used heap during the first run, above the settled heap before it
     * @param peakUsed  highest used heap during the first run, in all
     */
    public record Check(Plan plan, int worstCase, double cpuMillis, long peakBytes, long peakUsed) {
        ChargingRoute.Analysis analysis() {
            return ((Plan.Detail.Charging) plan.detail()).analysis();
        }

        String figures() {
            ChargingRoute.Analysis a = analysis();
            return String.format(Locale.ROOT, "%s, highest floor %s, lowest start %s, certified worst %s units, replay"
                            + " worst %d; 1 pass of %,d batches, %,d policy entries, %,d recomputations",
                    plan.verdict().word(), units(plan.highestFloorUnits()), units(plan.lowestStartUnits()),
                    plan.certification() instanceof dockline.plan.Certification.Reserve r
                            ? Integer.toString(r.certificate().worstMinimumUnits()) : "-",
                    worstCase, a.rounds(), a.sweep().historyEntries(), a.sweep().recomputations());
        }
    }

    /**
     * What the row measured.
     *
     * @param side      floor side in cells
     * @param positions robot positions of arena × goal
     * @param coarse    the full check at 1,000 levels
     * @param fine      the full check at 10,000 levels
     * @param bfsMillis plain BFS over every vertex of arena × goal (robot and disturbance) reachable from the start
     * @param bfsVertices vertices that BFS reached
     * @param agree     the fine answers are the coarse ones times ten
     *
     * <p>Data only.
     */
    public record Row(int side, long positions, Check coarse, Check fine, double bfsMillis, int bfsVertices,
                      boolean agree) {

        public String toText() {
            return String.format(Locale.ROOT, "resolution independence, %dx%d, %,d positions of arena x goal; full"
                            + " check (compile, verdict, threshold policy, certificate, worst-case replay, highest floor,"
                            + " lowest start): %.0f ms at 1,000 levels, %.0f ms at 10,000 levels, ratio %.2f (target at"
                            + " most 1.5); peak heap at 1,000 levels %.0f MB above the settled heap (%.0f MB used in"
                            + " all; target under 1 GB); plain BFS over arena x goal (%,d vertices) %.0f ms, check/BFS"
                            + " %.1f at 1,000 levels%n  1,000 levels: %s%n  10,000 levels: %s%n  answers scale by ten:"
                            + " %s%n",
                    side, side, positions, coarse.cpuMillis(), fine.cpuMillis(), fine.cpuMillis() / coarse.cpuMillis(),
                    coarse.peakBytes() / 1e6, coarse.peakUsed() / 1e6, bfsVertices, bfsMillis,
                    coarse.cpuMillis() / bfsMillis, coarse.figures(), fine.figures(), agree ? "yes" : "NO");
        }
    }

    /** Runs the row on a generated floor of the given side (seed and budget K as for the other rows). */
    public static Row run(int side, long seed, int budget, int reps) {
        BuildingMap map = BuildingGenerator.generate(side, seed, budget);
        Mission coarse = mission(map, budget, new BigDecimal("0.05"), seed);
        Mission fine = mission(map, budget, new BigDecimal("0.005"), seed);
        // warm the JIT on both before timing
        fullCheck(coarse);
        fullCheck(fine);
        Check c = measure(coarse, reps);
        Check f = measure(fine, reps);
        Arena ac = ArenaCompiler.compile(coarse);
        GoalAutomaton goal = GoalAutomaton.of(coarse);
        int[] seen = new int[1];
        double tb = best(reps, () -> seen[0] = bfs(ac, goal));
        Plan pc = c.plan();
        Plan pf = f.plan();
        boolean agree = pc.verdict() == pf.verdict() && times10(pc.lowestStartUnits()) == pf.lowestStartUnits().orElse(-1)
                && times10(pc.highestFloorUnits()) == pf.highestFloorUnits().orElse(-1)
                && c.worstCase() * 10 == f.worstCase();
        return new Row(side, (long) ac.robotCount() * goal.stateCount(), c, f, tb, seen[0], agree);
    }

    /** The full check at 1,000 levels alone, once (for the floors too large to run twice). */
    public static Check coarseOnly(int side, long seed, int budget) {
        BuildingMap map = BuildingGenerator.generate(side, seed, budget);
        return measure(mission(map, budget, new BigDecimal("0.05"), seed), 1);
    }

    /** The text line of {@link #coarseOnly}. */
    public static String coarseText(int side, Check c) {
        return String.format(Locale.ROOT, "charging route, full check, %dx%d at 1,000 levels: %.0f ms (thread CPU, one"
                        + " run), peak heap %.0f MB above the settled heap (%.0f MB used in all); %s%n", side, side,
                c.cpuMillis(), c.peakBytes() / 1e6, c.peakUsed() / 1e6, c.figures());
    }

    private static Check measure(Mission m, int reps) {
        long base;
        long peak;
        Object[] out = new Object[2];
        try (HeapSampler sampler = new HeapSampler()) {
            base = HeapSampler.settledUsed();
            sampler.start();
            fullCheck(m, out);
            peak = sampler.stop();
        }
        double t = best(reps, () -> fullCheck(m, out));
        return new Check((Plan) out[0], (Integer) out[1], t, Math.max(0, peak - base), peak);
    }

    private static void fullCheck(Mission m) {
        fullCheck(m, new Object[2]);
    }

    /** {@code check}'s work on the mission by the charging route, and the worst-case replay. */
    private static void fullCheck(Mission m, Object[] out) {
        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Charging(true, false, false)));
        if (p.certification().problem().isPresent()) {
            throw new IllegalStateException("internal: " + p.certification().problem().get());
        }
        Replay r = p.replays().orElseThrow().worstCase();
        out[0] = p;
        out[1] = r.minimumUnits();
    }

    private static String units(java.util.OptionalInt x) {
        return x.isPresent() ? Integer.toString(x.getAsInt()) : "none";
    }

    private static int times10(java.util.OptionalInt x) {
        return x.isPresent() ? x.getAsInt() * 10 : -1;
    }

    static Mission mission(BuildingMap map, int budget, BigDecimal resolution, long seed) {
        MissionSpec spec = MissionSpec.docking(budget).withBattery(new BigDecimal("50"), resolution,
                Charge.percent(new BigDecimal("100")), Charge.percent(new BigDecimal("20")));
        return MissionGenerator.generate(map, spec, seed);
    }

    /** Breadth-first search from the start over arena × goal (every vertex, both players); returns vertices seen. */
    static int bfs(Arena arena, GoalAutomaton goal) {
        int gc = goal.stateCount();
        int g0 = goal.initial(arena.cellZones(arena.cell(arena.startVertex())));
        if (g0 == GoalAutomaton.REJECT) {
            return 0;
        }
        int n = Math.multiplyExact(arena.vertexCount(), gc);
        VisitQueue queue = new VisitQueue(n, n); // the baseline allocates its whole queue up front, as it always did
        queue.visit(arena.startVertex() * gc + g0);
        while (queue.hasNext()) {
            int p = queue.next();
            int v = p / gc;
            int g = p - v * gc;
            boolean robot = arena.isRobot(v);
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int t = arena.target(e);
                int g2 = robot ? g : goal.step(g, arena.cellZones(arena.cell(t)));
                if (g2 != GoalAutomaton.REJECT) {
                    queue.visit(t * gc + g2);
                }
            }
        }
        return queue.visited();
    }

    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    private static double best(int reps, Runnable body) {
        double best = Double.MAX_VALUE;
        for (int i = 0; i < Math.max(1, reps); i++) {
            System.gc();
            long c0 = THREADS.getCurrentThreadCpuTime();
            body.run();
            best = Math.min(best, (THREADS.getCurrentThreadCpuTime() - c0) / 1e6);
        }
        return best;
    }
}
