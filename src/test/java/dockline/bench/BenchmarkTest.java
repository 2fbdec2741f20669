package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The benchmark's plumbing on the smallest floor (no timing is asserted: speed is shown by the
 * benchmark's own ratios, not by tests).
 */
class BenchmarkTest {

    private static BenchReport report;

    @BeforeAll
    static void runTinyBenchmark() {
        Benchmark.Config c = new Benchmark.Config(List.of(32), List.of(), 7, 1, 1, 0, 10_000, 5_000_000L, 5_000_000L);
        List<String> progress = new ArrayList<>();
        report = new Benchmark(c, progress::add).run();
        assertThat(progress).isNotEmpty();
    }

    @Test
    void everyMethodRuns_andAllVerdictsAgree() {
        Set<String> ran = new HashSet<>();
        for (BenchRow r : report.rows()) {
            if (r.ran()) {
                ran.add(r.instance() + "/" + r.method());
            }
        }
        assertThat(ran).contains("reserve/attractor", "reserve/bfs", "reserve/full", "reserve/early",
                "reserve/stored-attractor", "reserve/stored-compact", "reserve/stored-bfs", "reserve/sweep",
                "consumption/fast");
        assertThat(report.mismatches()).isEmpty();
        // the BFS rows see the same graph as the attractor they are compared with
        BenchRow stored = find("reserve", "stored-attractor");
        BenchRow storedBfs = find("reserve", "stored-bfs");
        assertThat(storedBfs.edges()).isLessThanOrEqualTo(stored.edges());
        // the implicit product reachable from the start is the stored product without its two sinks
        assertThat(find("reserve", "bfs").vertices()).isEqualTo(stored.vertices() - 2);
        assertThat(find("reserve", "attractor").vertices()).isEqualTo(find("reserve", "bfs").vertices());
    }

    @Test
    void json_hasTheDocumentedKeys() throws Exception {
        JsonNode root = new ObjectMapper().readTree(report.toJson());
        assertThat(root.has("rows")).isTrue();
        assertThat(root.has("ratios")).isTrue();
        assertThat(root.has("machine")).isTrue();
        assertThat(root.get("caveats").size()).isPositive();
        for (JsonNode row : root.get("rows")) {
            for (String k : new String[] {"size", "method", "vertices", "edges", "solveMillis", "verdict"}) {
                assertThat(row.has(k)).as("row key %s", k).isTrue();
            }
        }
        JsonNode ratios = root.get("ratios");
        for (String k : new String[] {"attractorOverBfs", "attractorSlope", "viOverComparator", "estimateOverActual",
            "peakBytesPerVertex", "storedAttractorOverStoredBfs"}) {
            assertThat(ratios.has(k)).as("ratio %s", k).isTrue();
        }
        assertThat(ratios.get("attractorOverBfs").has("32")).isTrue();
    }

    @Test
    void text_showsTheTableTargetsAndCaveats() {
        String text = report.toText();
        assertThat(text).contains("Machine:", "attractor", "Targets:", "Safety:");
    }

    /** A disagreement between two methods on one instance is reported (the command then exits 4). */
    @Test
    void disagreeingVerdicts_areReported() {
        BenchRow a = new BenchRow(64, "reserve", "attractor", 10, 20, 1, 1, 1, 100, "guaranteed", 2, -1, -1, null);
        BenchRow b = new BenchRow(64, "reserve", "sweep", 10, 20, 1, 1, 1, 100, "not-guaranteed", 2, -1, -1, null);
        BenchRow c = new BenchRow(64, "reserve", "bfs", 10, 20, 1, 1, 1, 100, null, 2, -1, -1, null);
        BenchReport r = new BenchReport(Map.of(), List.of(a, b, c), 1);
        assertThat(r.mismatches()).hasSize(1).first().asString().contains("64x64 reserve");
        assertThat(r.toText()).contains("VERDICT MISMATCH");
        assertThat(new BenchReport(Map.of(), List.of(a, c), 1).mismatches()).isEmpty();
    }

    /**
     * The table's run has the phase-by-phase lasting rows, each with its momentary counterpart's CPU time from the
     * same run; their ratios and the 3x target are reported (the ratio is recomputed here by hand from the
     * row's two times, not read back).
     */
    @Test
    void lastingRows_carryTheirMomentaryTime_andTheTargetIsReported() throws Exception {
        for (String[] kindMethod : new String[][] {{"reserve", "lasting-phased"}, {"reserve", "lasting-check"},
            {"consumption", "lasting-check"}}) {
            BenchRow r = find(kindMethod[0], kindMethod[1]);
            assertThat(r.ran()).as("%s/%s ran", kindMethod[0], kindMethod[1]).isTrue();
            assertThat(r.momentaryCpuMillis()).isPositive();
            assertThat(r.overMomentary()).isCloseTo(r.solveCpuMillis() / r.momentaryCpuMillis(),
                    org.assertj.core.data.Offset.offset(1e-12));
        }
        assertThat(find("reserve", "attractor").momentaryCpuMillis()).isEqualTo(-1);
        assertThat(find("reserve", "attractor").overMomentary()).isNaN();
        JsonNode ratios = new ObjectMapper().readTree(report.toJson()).get("ratios").get("lastingOverMomentary");
        assertThat(ratios.has("32x32 reserve lasting-phased")).isTrue();
        assertThat(ratios.has("32x32 consumption lasting-check")).isTrue();
        assertThat(report.targets()).anyMatch(t -> t.contains("lasting door-shut events at K=2: at most 3x"));
    }

    /** Lasting rows solve another mission: they are compared with one another, not with the momentary rows. */
    @Test
    void lastingRows_areComparedAmongThemselves() {
        BenchRow a = new BenchRow(64, "reserve", "attractor", 10, 20, 1, 1, 1, 100, "guaranteed", 2, -1, -1, null);
        BenchRow l = new BenchRow(64, "reserve", "lasting-phased", 10, 20, 1, 1, 1, 100, "not-guaranteed", 2, -1, -1,
                null).withMomentary(1);
        BenchRow c = new BenchRow(64, "reserve", "lasting-check", 10, 20, 1, 1, 1, 100, "guaranteed", 2, -1, -1, null)
                .withMomentary(1);
        assertThat(new BenchReport(Map.of(), List.of(a, l), 1).mismatches()).isEmpty();
        assertThat(new BenchReport(Map.of(), List.of(a, l, c), 1).mismatches()).hasSize(1).first().asString()
                .contains("door-shut lasting");
    }

    /** Least-squares slope, checked on points of a known power law y = 3 x^1.1 (common practice). */
    @Test
    void slope_ofAPowerLaw_isItsExponent() {
        List<double[]> pts = new ArrayList<>();
        for (double x : new double[] {1e5, 1e6, 1e7}) {
            pts.add(new double[] {Math.log(x), Math.log(3 * Math.pow(x, 1.1))});
        }
        assertThat(BenchReport.slope(pts)).isCloseTo(1.1, org.assertj.core.data.Offset.offset(1e-9));
    }

    private static BenchRow find(String instance, String method) {
        return report.rows().stream().filter(r -> r.instance().equals(instance) && r.method().equals(method))
                .findFirst().orElseThrow();
    }
}
