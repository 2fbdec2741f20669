package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import java.math.BigDecimal;
import java.util.Locale;

/**
 * The benchmark row "resolution independence": one generated building with charging, solved by the
 * charging route ({@link ChargingRoute}: verdict, threshold policy, lowest start, highest floor) at 1,000
 * and at 10,000 battery levels, and a plain breadth-first search over arena × goal for scale.
 *
 * <p>The mission is {@link MissionSpec#docking} with a 50 Wh battery, reserve 20 %, start full, 2 Wh
 * per charging step, three rooms in order; at 0.05 Wh per unit (1,000 levels) and 0.005 Wh per unit
 * (10,000 levels) every energy figure of {@link MissionGenerator} and {@link BuildingGenerator} (0.05,
 * 0.1, 0.15, 0.25, 0.3, 2 Wh) is a whole number of units, so the two missions are the same game with
 * every energy figure scaled by ten; the row checks that the answers scale so. Times are the best of
 * a few runs, by the thread's CPU time. Not the certificate nor the worst case (not yet on this route).
 */
public final class ResolutionBench {

    private ResolutionBench() {
    }

    /**
     * What the row measured.
     *
     * @param side          floor side in cells
     * @param positions     robot positions of arena × goal
     * @param coarseMillis  charging route at 1,000 levels
     * @param fineMillis    charging route at 10,000 levels
     * @param bfsMillis     plain BFS over every vertex of arena × goal (robot and disturbance)
     * @param coarse        the analysis at 1,000 levels
     * @param fine          the analysis at 10,000 levels
     * @param agree         the fine answers are the coarse ones times ten
     *
     * <p>Data only.
     */
    public record Row(int side, long positions, double coarseMillis, double fineMillis, double bfsMillis,
                      ChargingRoute.Analysis coarse, ChargingRoute.Analysis fine, boolean agree) {

        public String toText() {
            return String.format(Locale.ROOT, "resolution independence, %dx%d, %,d positions: charging route %.0f ms"
                            + " at 1,000 levels (%d solves, %d rounds), %.0f ms at 10,000 levels (%d solves, %d rounds),"
                            + " ratio %.2f (target at most 1.5); plain BFS over arena x goal %.0f ms, route/BFS %.1f"
                            + " at 1,000 levels; verdict %s, highest floor %s units, lowest start %s units;"
                            + " answers scale by ten: %s%n",
                    side, side, positions, coarseMillis, coarse.solves(), coarse.rounds(), fineMillis, fine.solves(),
                    fine.rounds(), fineMillis / coarseMillis, bfsMillis, coarseMillis / bfsMillis,
                    coarse.verdict().word(), units(coarse.highestFloorUnits()), units(coarse.lowestStartUnits()),
                    agree ? "yes" : "NO");
        }
    }

    /** Runs the row on a generated floor of the given side (seed and budget K as for the other rows). */
    public static Row run(int side, long seed, int budget, int reps) {
        BuildingMap map = BuildingGenerator.generate(side, seed, budget);
        Mission coarse = mission(map, budget, new BigDecimal("0.05"), seed);
        Mission fine = mission(map, budget, new BigDecimal("0.005"), seed);
        Arena ac = ArenaCompiler.compile(coarse);
        Arena af = ArenaCompiler.compile(fine);
        GoalAutomaton goal = GoalAutomaton.of(coarse);
        ChargingRoute.Analysis[] out = new ChargingRoute.Analysis[2];
        // warm the JIT on both before timing
        run(ac, goal, coarse);
        run(af, goal, fine);
        double tc = best(reps, () -> out[0] = run(ac, goal, coarse));
        double tf = best(reps, () -> out[1] = run(af, goal, fine));
        double tb = best(reps, () -> bfs(ac, goal));
        ChargingRoute.Analysis c = out[0];
        ChargingRoute.Analysis f = out[1];
        boolean agree = c.verdict() == f.verdict() && times10(c.lowestStartUnits()) == f.lowestStartUnits().orElse(-1)
                && times10(c.highestFloorUnits()) == f.highestFloorUnits().orElse(-1);
        return new Row(side, (long) ac.robotCount() * goal.stateCount(), tc, tf, tb, c, f, agree);
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

    private static ChargingRoute.Analysis run(Arena arena, GoalAutomaton goal, Mission m) {
        return ChargingRoute.analyse(new ChargingSolver(arena, goal), m.capacityUnits(), m.reserveUnits(),
                m.startUnits());
    }

    /** Breadth-first search from the start over arena × goal (every vertex, both players); returns vertices seen. */
    static int bfs(Arena arena, GoalAutomaton goal) {
        int gc = goal.stateCount();
        int n = Math.multiplyExact(arena.vertexCount(), gc);
        boolean[] seen = new boolean[n];
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        int g0 = goal.initial(arena.cellZones(arena.cell(arena.startVertex())));
        if (g0 == GoalAutomaton.REJECT) {
            return 0;
        }
        int s = arena.startVertex() * gc + g0;
        seen[s] = true;
        queue[tail++] = s;
        while (head < tail) {
            int p = queue[head++];
            int v = p / gc;
            int g = p - v * gc;
            boolean robot = arena.isRobot(v);
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int t = arena.target(e);
                int g2 = robot ? g : goal.step(g, arena.cellZones(arena.cell(t)));
                if (g2 == GoalAutomaton.REJECT) {
                    continue;
                }
                int q = t * gc + g2;
                if (!seen[q]) {
                    seen[q] = true;
                    queue[tail++] = q;
                }
            }
        }
        return tail;
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
