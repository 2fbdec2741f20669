package dockline.bench;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dockline.report.Caveats;
import dockline.solve.game.ReserveSizeForecast;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

/**
 * The rows of one benchmark run, the ratios between methods measured in that run, the targets of
 * issue 7 checked against them, and any verdict disagreement; as a text table or as JSON.
 *
 * <p>Ratios compare CPU times (the solving thread's, plus the garbage collector's pauses; wall clock
 * where the platform cannot tell), which other processes on a shared machine disturb much less than
 * wall-clock times.
 * Ratios (per floor size unless noted): {@code attractorOverBfs} (the main route, the implicit
 * product, against plain BFS over it), {@code sweepOverAttractor} (naive sweeps against the attractor,
 * both on the stored product), {@code fixpointOverAttractor} (solve times on the reserve instance),
 * {@code viOverComparator} (value iteration against comparator product build + attractor, discounted
 * instance), {@code peakBytesPerVertex} (main route, per product vertex reachable from the start),
 * {@code estimateOverActual} (the pre-build forecast against the real size), {@code fastWallMillis}
 * (fast path: arena compile + solve), the {@code stored...} figures of the stored CSR product, and
 * one number {@code attractorSlope}: the least-squares slope of log(attractor time) against
 * log(product edges) over the reserve sizes that ran.
 */
public final class BenchReport {

    private final Map<String, String> machine;
    private final List<BenchRow> rows;
    private final double totalMillis;
    private final Map<String, Object> ratios = new LinkedHashMap<>();
    private final List<String> targets = new ArrayList<>();
    private final List<String> mismatches;

    BenchReport(Map<String, String> machine, List<BenchRow> rows, double totalMillis) {
        this.machine = Map.copyOf(machine);
        this.rows = List.copyOf(rows);
        this.totalMillis = totalMillis;
        this.mismatches = mismatches(rows);
        computeRatios();
    }

    public List<BenchRow> rows() {
        return rows;
    }

    public Map<String, Object> ratios() {
        return ratios;
    }

    /** Disagreements between methods on one instance; empty when every verdict agrees. */
    public List<String> mismatches() {
        return mismatches;
    }

    /** Each target of issue 7 with the figure measured and whether it is met. */
    public List<String> targets() {
        return targets;
    }

    private Optional<BenchRow> row(int size, String instance, String method) {
        return rows.stream().filter(r -> r.size() == size && r.instance().equals(instance)
                && r.method().equals(method) && r.ran()).findFirst();
    }

    private List<Integer> sizes(String instance, String method) {
        return rows.stream().filter(r -> r.instance().equals(instance) && r.method().equals(method) && r.ran())
                .map(BenchRow::size).distinct().sorted().toList();
    }

    private Map<String, Double> ratioPerSize(String instance, String num, String den, boolean denIncludesBuild) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int s : sizes(instance, num)) {
            Optional<BenchRow> a = row(s, instance, num);
            Optional<BenchRow> b = row(s, instance, den);
            if (a.isPresent() && b.isPresent()) {
                double d = b.get().ratioMillis() + (denIncludesBuild ? b.get().buildMillis() : 0);
                out.put(Integer.toString(s), round(a.get().ratioMillis() / Math.max(d, 1e-3)));
            }
        }
        return out;
    }

    /**
     * A route's figures per size: peak bytes per vertex, the size forecast over the vertices found, and
     * the least-squares slope of log(time) against log(edges) (null with fewer than two sizes).
     */
    private record SizeFigures(Map<String, Double> bytesPerVertex, Map<String, Double> estimateOverActual,
                               Double slope) {
    }

    /**
     * The figures of {@code method} at each size it ran; memory, edges and time are those of
     * {@code measured} at that size when it ran (else of {@code method}), the forecast is {@code method}'s.
     */
    private SizeFigures sizeFigures(String instance, String method, String measured,
                                    java.util.function.ToLongFunction<BenchRow> forecast) {
        Map<String, Double> bpv = new LinkedHashMap<>();
        Map<String, Double> est = new LinkedHashMap<>();
        List<double[]> pts = new ArrayList<>();
        for (int s : sizes(instance, method)) {
            BenchRow a = row(s, instance, method).orElseThrow();
            BenchRow c = row(s, instance, measured).orElse(a);
            bpv.put(Integer.toString(s), round(c.bytesPerVertex()));
            if (forecast.applyAsLong(a) > 0) {
                est.put(Integer.toString(s), round(forecast.applyAsLong(a) / (double) a.vertices()));
            }
            pts.add(new double[] {Math.log(c.edges()), Math.log(Math.max(c.ratioMillis(), 1e-3))});
        }
        return new SizeFigures(bpv, est, pts.size() >= 2 ? round(slope(pts)) : null);
    }

    private void computeRatios() {
        String res = Benchmark.RESERVE;
        // the main route is the implicit product (ReserveOptions' default); the stored CSR product is the reference
        Map<String, Double> overBfs = ratioPerSize(res, "attractor", "bfs", false);
        ratios.put("attractorOverBfs", overBfs);
        ratios.put("fullOverBfs", ratioPerSize(res, "full", "bfs", false));
        ratios.put("earlyOverAttractor", ratioPerSize(res, "early", "attractor", false));
        ratios.put("storedAttractorOverStoredBfs", ratioPerSize(res, "stored-attractor", "stored-bfs", false));
        ratios.put("storedCompactOverStoredBfs", ratioPerSize(res, "stored-compact", "stored-bfs", false));
        // the stored route's solve alone (its build excluded) against the main route end to end
        ratios.put("storedCompactOverAttractor", ratioPerSize(res, "stored-compact", "attractor", false));
        // naive sweeps against the attractor on the same (stored) graph, as in the reference figures
        ratios.put("sweepOverAttractor", ratioPerSize(res, "sweep", "stored-attractor", false));
        ratios.put("fixpointOverAttractor", ratioPerSize(res, "fixpoint", "attractor", false));
        // lasting door-shut events against the momentary main route on the same instance (issue target: 3 x)
        ratios.put("lastingOverAttractor", ratioPerSize(res, "lasting", "attractor", false));
        Map<String, Double> vi = ratioPerSize(Benchmark.DISCOUNTED, "vi", "attractor", false);
        ratios.put("viOverComparator", vi);
        // the same against the stored comparator product, for comparison with the main route's layout
        ratios.put("viOverStoredComparator", ratioPerSize(Benchmark.DISCOUNTED, "vi", "stored-attractor", false));
        SizeFigures main = sizeFigures(res, "attractor", "attractor", BenchRow::forecastVertices);
        ratios.put("peakBytesPerVertex", main.bytesPerVertex());
        ratios.put("estimateOverActual", main.estimateOverActual());
        // the stored route's memory and time are those of its compact layout when that ran
        SizeFigures stored = sizeFigures(res, "stored-attractor", "stored-compact", BenchRow::estimatedVertices);
        ratios.put("storedPeakBytesPerVertex", stored.bytesPerVertex());
        ratios.put("storedEstimateOverActual", stored.estimateOverActual());
        Double slope = main.slope();
        ratios.put("attractorSlope", slope);
        ratios.put("storedSlope", stored.slope());
        Map<String, Double> fastWall = new LinkedHashMap<>();
        for (int s : sizes(Benchmark.CONSUMPTION, "fast")) {
            fastWall.put(Integer.toString(s), round(row(s, Benchmark.CONSUMPTION, "fast").orElseThrow().wallMillis()));
        }
        ratios.put("fastWallMillis", fastWall);

        // targets
        double maxOverBfs = overBfs.values().stream().mapToDouble(Double::doubleValue).max().orElse(Double.NaN);
        targets.add(target("attractor time <= 1.5x plain BFS over the same product graph at every size (main route)",
                "max " + fmt(maxOverBfs) + " " + overBfs, !overBfs.isEmpty() && maxOverBfs <= 1.5));
        targets.add(target("log-log slope of attractor time against product edges in 0.9..1.15 (main route)",
                slope == null ? "fewer than two sizes ran" : fmt(slope), slope != null && slope >= 0.9 && slope <= 1.15));
        List<Double> from64 = new ArrayList<>();
        vi.forEach((k, v) -> {
            if (Integer.parseInt(k) >= 64) {
                from64.add(v);
            }
        });
        boolean viOk = !from64.isEmpty() && from64.stream().allMatch(v -> v > 1);
        for (int i = 1; i < from64.size(); i++) {
            viOk &= from64.get(i) >= from64.get(i - 1);
        }
        targets.add(target("discounted: comparator product + attractor faster than value iteration from 64x64 up,"
                + " ratio not shrinking", vi.isEmpty() ? "not measured" : vi.toString(), viOk));
        Optional<BenchRow> largest = rows.stream().filter(r -> r.instance().equals(res) && r.method().equals("attractor")
                && r.ran()).max((x, y) -> Long.compare(x.vertices(), y.vertices()));
        targets.add(target("peak heap <= 64 bytes per product vertex on the largest product that fits (main route,"
                        + " per vertex reachable from the start)",
                largest.map(r -> fmt(r.bytesPerVertex()) + " B/vertex at " + r.size() + "x" + r.size() + " ("
                        + r.vertices() + " vertices)").orElse("no product ran"),
                largest.isPresent() && largest.get().bytesPerVertex() <= 64));
        Optional<BenchRow> fast512 = row(512, Benchmark.CONSUMPTION, "fast");
        targets.add(target("fast path: 512x512, K=2, 1,000 levels decided in <= 3 s wall (arena compile + solve)",
                fast512.map(r -> fmt(r.wallMillis()) + " ms").orElse("512x512 not run"),
                fast512.isPresent() && fast512.get().wallMillis() <= 3000));
        Optional<BenchRow> check512 = row(512, Benchmark.CONSUMPTION, "check");
        targets.add(target("  the same for check's whole fast route from the mission (need, highest floor, policy, certificate)",
                check512.map(r -> fmt(r.wallMillis()) + " ms").orElse("512x512 not run"),
                check512.isPresent() && check512.get().wallMillis() <= 3000));
        Map<String, Double> est = main.estimateOverActual();
        double worstEst = est.values().stream().mapToDouble(v -> Math.abs(v - 1)).max().orElse(Double.NaN);
        targets.add(target("pre-build size estimate within 20% of the real product (main route: ReserveSizeForecast)",
                est.toString(), !est.isEmpty() && worstEst <= 0.2));
        Map<String, Double> lastingRatios = new LinkedHashMap<>();
        String worstLasting = null;
        double worstLastingRatio = Double.NaN;
        for (BenchRow r : rows) {
            double q = r.overMomentary();
            if (!Double.isNaN(q)) {
                String key = r.size() + "x" + r.size() + " " + r.instance() + " " + r.method();
                lastingRatios.put(key, round(q));
                if (Double.isNaN(worstLastingRatio) || q > worstLastingRatio) {
                    worstLastingRatio = q;
                    worstLasting = key;
                }
            }
        }
        ratios.put("lastingOverMomentary", lastingRatios);
        targets.add(target("lasting door-shut events at K=2: at most 3x the momentary time on the same instance, every"
                        + " lasting row (CPU, each timed back to back with its momentary counterpart)",
                worstLasting == null ? "no lasting row ran" : "max " + fmt(worstLastingRatio) + " (" + worstLasting + ")",
                worstLasting != null && worstLastingRatio <= 3));
        targets.add(target("every method gives the same verdict on each instance",
                mismatches.isEmpty() ? "all agree" : mismatches.toString(), mismatches.isEmpty()));
    }

    private static String target(String what, String measured, boolean met) {
        return (met ? "met     " : "MISSED  ") + what + ": " + measured;
    }

    /** Least-squares slope of y on x. */
    static double slope(List<double[]> pts) {
        double mx = 0;
        double my = 0;
        for (double[] p : pts) {
            mx += p[0];
            my += p[1];
        }
        mx /= pts.size();
        my /= pts.size();
        double sxy = 0;
        double sxx = 0;
        for (double[] p : pts) {
            sxy += (p[0] - mx) * (p[1] - my);
            sxx += (p[0] - mx) * (p[0] - mx);
        }
        return sxx == 0 ? Double.NaN : sxy / sxx;
    }

    private static double round(double v) {
        return Double.isFinite(v) ? Math.round(v * 1000) / 1000.0 : Double.NaN;
    }

    private static String fmt(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : "n/a";
    }

    static final String HEADER = String.format(Locale.ROOT, "%-9s %-11s %-12s %12s %12s %9s %9s %9s %8s %9s %7s  %-14s %s",
            "size", "instance", "method", "vertices", "edges", "build ms", "solve ms", "cpu ms", "Medge/s", "peak MB",
            "B/vert", "verdict", "note");

    static String formatRow(BenchRow r) {
        String size = r.size() + "x" + r.size();
        if (!r.ran()) {
            return String.format(Locale.ROOT, "%-9s %-11s %-12s %12d %12d %9s %9s %9s %8s %9s %7s  %-14s %s", size,
                    r.instance(), r.method(), r.vertices(), r.edges(), "-", "-", "-", "-", "-", "-", "-", r.note());
        }
        return String.format(Locale.ROOT, "%-9s %-11s %-12s %12d %12d %9.0f %9.1f %9.1f %8.1f %9s %7s  %-14s %s", size,
                r.instance(), r.method(), r.vertices(), r.edges(), r.buildMillis(), r.solveMillis(),
                r.solveCpuMillis(), r.megaEdgesPerSecond(), r.peakBytes() < 0 ? "-" : Long.toString(r.peakBytes() >> 20),
                Double.isFinite(r.bytesPerVertex()) ? String.format(Locale.ROOT, "%.1f", r.bytesPerVertex()) : "-",
                r.verdict() == null ? "-" : r.verdict(), r.note() == null ? "" : r.note());
    }

    /** The whole report as text: machine, table, ratios, targets, mismatches, caveats. */
    public String toText() {
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        sb.append("Machine:");
        machine.forEach((k, v) -> sb.append(' ').append(k).append('=').append(v).append(';'));
        sb.append(nl).append(nl).append(HEADER).append(nl);
        for (BenchRow r : rows) {
            sb.append(formatRow(r)).append(nl);
        }
        sb.append(nl).append("Ratios (measured in this run):").append(nl);
        ratios.forEach((k, v) -> sb.append("  ").append(k).append(": ").append(v).append(nl));
        sb.append(nl).append("Targets:").append(nl);
        for (String t : targets) {
            sb.append("  ").append(t).append(nl);
        }
        if (!mismatches.isEmpty()) {
            sb.append(nl).append("VERDICT MISMATCH (an internal error; please report it):").append(nl);
            for (String m : mismatches) {
                sb.append("  ").append(m).append(nl);
            }
        }
        sb.append(nl).append(String.format(Locale.ROOT, "Total %.1f s.", totalMillis / 1000)).append(nl);
        sb.append(Caveats.block()).append(nl);
        return sb.toString();
    }

    /** The report as JSON: machine, rows, ratios, targets, mismatches, caveats. */
    public String toJson() {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("machine", new LinkedHashMap<>(machine));
        List<Map<String, Object>> rs = new ArrayList<>();
        for (BenchRow r : rows) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("size", r.size());
            m.put("instance", r.instance());
            m.put("method", r.method());
            m.put("vertices", r.vertices());
            m.put("edges", r.edges());
            m.put("buildMillis", r.ran() ? round(r.buildMillis()) : null);
            m.put("solveMillis", r.ran() ? round(r.solveMillis()) : null);
            m.put("solveCpuMillis", r.ran() && r.solveCpuMillis() >= 0 ? round(r.solveCpuMillis()) : null);
            m.put("wallMillis", r.ran() ? round(r.wallMillis()) : null);
            m.put("megaEdgesPerSecond", finiteOrNull(r.megaEdgesPerSecond()));
            m.put("peakBytes", r.peakBytes() < 0 ? null : r.peakBytes());
            m.put("bytesPerVertex", finiteOrNull(r.bytesPerVertex()));
            m.put("verdict", r.verdict());
            m.put("estimatedVertices", r.estimatedVertices() < 0 ? null : r.estimatedVertices());
            m.put("forecastVertices", r.forecastVertices() < 0 ? null : r.forecastVertices());
            m.put("note", r.note());
            m.put("momentaryCpuMillis", r.momentaryCpuMillis() >= 0 ? round(r.momentaryCpuMillis()) : null);
            rs.add(m);
        }
        root.put("rows", rs);
        Map<String, Object> rat = new LinkedHashMap<>();
        ratios.forEach((k, v) -> rat.put(k, v instanceof Double d ? finiteOrNull(d) : v));
        root.put("ratios", rat);
        root.put("targets", targets);
        root.put("mismatches", mismatches);
        root.put("totalMillis", round(totalMillis));
        root.put("caveats", Caveats.LINES);
        try {
            return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the benchmark report as JSON", e);
        }
    }

    private static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? round(v) : null;
    }

    /** Verdicts per instance that disagree: "size instance: method=verdict, ...". */
    private static List<String> mismatches(List<BenchRow> rows) {
        Map<String, Map<String, String>> byInstance = new LinkedHashMap<>();
        for (BenchRow r : rows) {
            if (r.verdict() != null) {
                // the lasting rows solve another mission (its door-shut events lasting): they agree among themselves
                String mission = r.method().startsWith("lasting") ? r.instance() + " (door-shut lasting)" : r.instance();
                byInstance.computeIfAbsent(r.size() + "x" + r.size() + " " + mission, k -> new LinkedHashMap<>())
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
}
