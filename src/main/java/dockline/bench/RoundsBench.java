package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import dockline.solve.rounds.DeadlineSolver;
import dockline.solve.rounds.PatrolSolver;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

/**
 * Benchmark rows for the missions beyond one trip on the generated buildings ({@link BuildingGenerator}):
 * {@code patrol} (the reserve instance's three rooms as checkpoints of a patrol, the budget for the whole night)
 * and {@code deadline} (the reserve instance with a deadline of four turns per cell of the floor's side, tick 1 s).
 * Each row is one product build and solve at the mission's floor (no policy, no bisection), best CPU time (the
 * solving thread's plus the collectors') of
 * {@code reps} runs after one warm-up run on the smallest floor; the report gives per instance the least-squares
 * slope of log(time) against log(product edges), which is 1 for a solve linear in the product.
 */
public final class RoundsBench {

    /** The instances. */
    public static final List<String> INSTANCES = List.of("patrol", "deadline");

    /** One row. */
    public record Row(int side, String instance, long vertices, long edges, double millis, String verdict) {
    }

    private RoundsBench() {
    }

    /** The patrol mission on a floor of the given side. */
    static Mission patrol(int side, long seed, int budget) {
        Mission m = reserve(side, seed, budget);
        return new Mission("patrol on " + m.map().name(), null, m.map(), m.robot(), m.start(), m.startCharge(),
                m.reserve(), Tasks.patrol(m.tasks().visit(), m.tasks().avoid()), m.objective(),
                new Timing(BigDecimal.ONE, null));
    }

    /** The deadline mission on a floor of the given side. */
    static Mission deadline(int side, long seed, int budget) {
        return reserve(side, seed, budget).withTiming(new Timing(BigDecimal.ONE, BigDecimal.valueOf(4L * side)));
    }

    private static Mission reserve(int side, long seed, int budget) {
        BuildingMap map = BuildingGenerator.generate(side, seed, budget);
        return MissionGenerator.generate(map, MissionSpec.docking(budget), seed);
    }

    /** Runs the rows; progress lines go to {@code progress}. */
    public static List<Row> run(List<Integer> sides, List<String> instances, long seed, int budget, int reps,
                                long budgetBytes, Consumer<String> progress) {
        List<Row> rows = new ArrayList<>();
        for (String kind : instances) {
            measure(kind, sides.get(0), seed, budget, 2, budgetBytes); // warm-up: the compiled code and a grown heap
            for (int side : sides) {
                Row r = measure(kind, side, seed, budget, reps, budgetBytes);
                progress.accept(String.format(Locale.ROOT, "%dx%d %s: %d vertices, %d edges, %.1f ms, %s", side, side,
                        kind, r.vertices, r.edges, r.millis, r.verdict));
                rows.add(r);
            }
        }
        return rows;
    }

    private static Row measure(String kind, int side, long seed, int budget, int reps, long budgetBytes) {
        Mission m = kind.equals("patrol") ? patrol(side, seed, budget) : deadline(side, seed, budget);
        Arena arena = ArenaCompiler.compile(m);
        double best = Double.MAX_VALUE;
        long vertices = 0;
        long edges = 0;
        String verdict = null;
        for (int i = 0; i < reps; i++) {
            System.gc();
            long t0 = cpuNanos();
            if (kind.equals("patrol")) {
                PatrolSolver.Decision d = PatrolSolver.decide(arena, m.reserveUnits(), m.startUnits(), budgetBytes);
                vertices = d.vertices();
                edges = d.edges();
                verdict = (d.guaranteed() ? "guaranteed" : "not-guaranteed") + " (" + d.rounds() + " rounds)";
            } else {
                long[] d = DeadlineSolver.decide(arena, m.reserveUnits(), m.startUnits(), budgetBytes);
                vertices = d[0];
                edges = d[1];
                verdict = d[2] >= 0 && d[2] <= m.timing().deadlineTicks() ? "guaranteed" : "not-guaranteed";
            }
            best = Math.min(best, (cpuNanos() - t0) / 1e6);
        }
        return new Row(side, kind, vertices, edges, best, verdict);
    }

    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    /**
     * CPU time of this thread plus the collectors' time so far, in ns: other processes on the shared machine
     * hardly change it (wall clock when the platform cannot tell).
     */
    private static long cpuNanos() {
        long gc = 0;
        for (java.lang.management.GarbageCollectorMXBean b : java.lang.management.ManagementFactory
                .getGarbageCollectorMXBeans()) {
            gc += Math.max(0, b.getCollectionTime());
        }
        long cpu = THREADS.isCurrentThreadCpuTimeSupported() ? THREADS.getCurrentThreadCpuTime() : System.nanoTime();
        return cpu + gc * 1_000_000L;
    }

    /** The least-squares slope of log(time) against log(edges) over the rows of one instance, or NaN. */
    public static double slope(List<Row> rows, String instance) {
        List<double[]> pts = new ArrayList<>();
        for (Row r : rows) {
            if (r.instance.equals(instance) && r.millis > 0 && r.edges > 0) {
                pts.add(new double[] {Math.log(r.edges), Math.log(r.millis)});
            }
        }
        if (pts.size() < 2) {
            return Double.NaN;
        }
        return BenchReport.slope(pts);
    }

    /** The rows as a text table with the slope per instance. */
    public static String table(List<Row> rows, List<String> instances) {
        StringBuilder b = new StringBuilder();
        b.append("| side | instance | product vertices | product edges | build+solve CPU ms | verdict |\n");
        b.append("|---:|---|---:|---:|---:|---|\n");
        for (Row r : rows) {
            b.append(String.format(Locale.ROOT, "| %d² | %s | %,d | %,d | %.1f | %s |%n", r.side, r.instance, r.vertices,
                    r.edges, r.millis, r.verdict));
        }
        for (String i : instances) {
            double s = slope(rows, i);
            b.append(String.format(Locale.ROOT, "%nlog-log slope of time against product edges (%s): %s (goal 0.9 to 1.3)",
                    i, Double.isNaN(s) ? "fewer than two sizes" : String.format(Locale.ROOT, "%.2f", s)));
        }
        return b.append('\n').toString();
    }
}
