package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.io.PolicyFiles;
import dockline.report.Caveats;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code dockline check} and {@code dockline export} on the demo missions: exit codes and output. */
class CheckCommandTest {

    @TempDir
    Path dir;

    @Test
    void guaranteedMission_exitsZeroWithTheSummary() {
        CliRun r = run("check", "missions/night-round.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        String[] lines = r.out().split("\\R");
        assertThat(lines[0]).startsWith("GUARANTEED: Night round, clinic east wing");
        assertThat(r.out()).contains("Worst battery level under the policy:  ", " units = ", " Wh (", "%)")
                .contains("Highest reserve floor guaranteed:").contains("Game: ").contains(" positions of arena x goal")
                .contains("1 unit = 0.5 Wh; consumption and reserve floor rounded up")
                .contains(Caveats.block());
    }

    /**
     * Several missions: one result each in the order given, headed by the file; the exit code is the worst of
     * them (0 all guaranteed; 1 one not guaranteed; 2 one bad file, which is still listed with its errors).
     */
    @Test
    void severalMissions_oneResultEach_exitCodeTheWorst() throws Exception {
        CliRun ok = run("check", "missions/night-round.yaml", "missions/supply-run.yaml");
        assertThat(ok.code()).as(ok.err()).isEqualTo(ExitCodes.OK);
        int first = ok.out().indexOf("== missions/night-round.yaml (1 of 2)");
        int second = ok.out().indexOf("== missions/supply-run.yaml (2 of 2)");
        assertThat(first).isZero();
        assertThat(second).isGreaterThan(first);
        assertThat(ok.out().substring(first, second)).contains("GUARANTEED: Night round").contains(Caveats.block());
        assertThat(ok.out().substring(second)).contains("GUARANTEED: Supply run").contains(Caveats.block());

        CliRun mixed = run("check", "missions/night-round.yaml", "missions/late-return.yaml");
        assertThat(mixed.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(mixed.out()).contains("GUARANTEED: Night round").contains("NOT GUARANTEED: ");

        Path bad = dir.resolve("bad.yaml");
        java.nio.file.Files.writeString(bad, "name: x\nmap: nowhere.yaml\n");
        CliRun withBad = run("check", "missions/late-return.yaml", bad.toString(), "missions/night-round.yaml");
        assertThat(withBad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(withBad.out()).contains("== " + bad + " (2 of 3)").contains("GUARANTEED: Night round");
        assertThat(withBad.err()).containsPattern(java.util.regex.Pattern.quote(bad.toString()) + ":\\d+:\\d+: ");

        CliRun json = run("check", "missions/night-round.yaml", "missions/late-return.yaml", "--json");
        JsonNode a = new ObjectMapper().readTree(json.out());
        assertThat(a.isArray()).isTrue();
        assertThat(a).extracting(n -> n.get("verdict").asText()).containsExactly("guaranteed", "not-guaranteed");
        // one mission prints what it always did: one object and no heading
        CliRun one = run("check", "missions/night-round.yaml");
        assertThat(one.out()).startsWith("GUARANTEED: ").doesNotContain("== ");
    }

    @Test
    void json_hasTheDocumentedKeys() throws Exception {
        CliRun r = run("check", "missions/night-round.yaml", "--json");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("verdict").asText()).isEqualTo("guaranteed");
        for (String k : new String[] {"reserveUnits", "startUnits", "lowestLevelUnits",
                "highestReserveUnits", "lowestStartUnits", "productVertices", "solveMillis"}) {
            assertThat(j.get(k).isIntegralNumber()).as(k).isTrue();
        }
        JsonNode product = new ObjectMapper().readTree(run("check", "missions/night-round.yaml", "--json", "--method",
                "product").out());
        for (String k : new String[] {"productVertices", "productEdges", "solveMillis"}) {
            assertThat(product.get(k).isIntegralNumber()).as(k).isTrue();
        }
        assertThat(j.get("unitWh").decimalValue()).isEqualByComparingTo("0.5");
        assertThat(j.get("caveats").size()).isEqualTo(Caveats.LINES.size());
        assertThat(j.get("lowestLevelUnits").asInt()).isGreaterThanOrEqualTo(j.get("reserveUnits").asInt());
    }

    @Test
    void notGuaranteedMission_exitsOneWithNullWorstCase() throws Exception {
        CliRun r = run("check", "missions/late-return.yaml", "--json");
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("verdict").asText()).isEqualTo("not-guaranteed");
        assertThat(j.get("lowestLevelUnits").isNull()).isTrue();
        CliRun human = run("check", "missions/late-return.yaml");
        assertThat(human.out()).startsWith("NOT GUARANTEED: ").contains("none (there is no safe policy)");
        // the fast path phase by phase says in the text, as in the JSON, how many closure phases it kept
        assertThat(human.out()).contains("  Note: lasting closures phase by phase: ");
        assertThat(j.get("notes").toString()).contains("lasting closures phase by phase: ");
    }

    @Test
    void overrides_changeTheVerdict() {
        // no charge beats a bridge fire door that stays shut (lasting, the map's default) ...
        CliRun r = run("check", "missions/late-return.yaml", "--start-charge", "100%", "--reserve", "10%");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("reserve floor 30 units = 15 Wh (10%)");
        // ... but with no disturbance at all the fuller battery and the lower floor make it safe
        CliRun none = run("check", "missions/late-return.yaml", "--start-charge", "100%", "--reserve", "10%", "--budget",
                "0", "--json");
        assertThat(none.code()).as(none.err()).isEqualTo(ExitCodes.OK);
        assertThat(none.out()).contains("\"budget\" : 0");
    }

    @Test
    void safestPolicy_isTheDefault_andKeepsTheHighestGuaranteedFloor() throws Exception {
        JsonNode j = new ObjectMapper().readTree(run("check", "missions/night-round.yaml", "--json").out());
        assertThat(j.get("policyChoice").asText()).isEqualTo("safest");
        assertThat(j.get("lowestLevelUnits").asInt()).isEqualTo(j.get("highestReserveUnits").asInt());
        assertThat(j.get("policyReserveUnits").asInt()).isEqualTo(j.get("highestReserveUnits").asInt());
        assertThat(run("check", "missions/night-round.yaml").out()).contains("the safest policy");
        // --safest-policy is an accepted no-op: the same figures as the default
        JsonNode alias = new ObjectMapper().readTree(run("check", "missions/night-round.yaml", "--json",
                "--safest-policy").out());
        assertThat(alias.get("lowestLevelUnits")).isEqualTo(j.get("lowestLevelUnits"));
    }

    /**
     * {@code --fewest-moves} keeps the policy that was the default before: it finishes in the fewest
     * moves at the mission's floor, and on the night round its worst level (47 units, missions/README.md)
     * lies below the highest guaranteed floor (83 units).
     */
    @Test
    void fewestMoves_keepsTheShortestPolicy() throws Exception {
        JsonNode j = new ObjectMapper().readTree(run("check", "missions/night-round.yaml", "--json",
                "--fewest-moves").out());
        assertThat(j.get("policyChoice").asText()).isEqualTo("fewest-moves");
        assertThat(j.get("lowestLevelUnits").asInt()).isEqualTo(47);
        assertThat(j.get("highestReserveUnits").asInt()).isEqualTo(83);
        assertThat(j.get("policyReserveUnits").asInt()).isEqualTo(j.get("reserveUnits").asInt());
        assertThat(run("check", "missions/night-round.yaml", "--fewest-moves").out()).contains("fewest moves");
    }

    @Test
    void overMemoryLimit_exitsThreeAndSaysWhatToChange() {
        // the product route (late-return would take the fast path, whose game is small enough for 1 MB)
        CliRun r = run("check", "missions/late-return.yaml", "--max-memory", "1", "--method", "product");
        assertThat(r.code()).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(r.err()).contains("vertices", "MB", "coarser energy resolution", "smaller disturbance budget K");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void badOverrides_areAllReportedWithExitTwo() {
        CliRun r = run("check", "missions/late-return.yaml", "--reserve", "120%", "--start-charge", "2x", "--budget", "-1");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--reserve", "--start-charge", "--budget").doesNotContain("Exception");
        assertThat(run("check", dir.resolve("missing.yaml").toString()).code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("check").code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void export_writesAPolicyThatReadsBack() throws Exception {
        for (String name : new String[] {"night.csv", "night.json"}) {
            Path f = dir.resolve(name);
            CliRun r = run("export", "missions/night-round.yaml", "--policy", f.toString());
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
            PolicyFiles.Document d = PolicyFiles.read(f);
            assertThat(d.header().mission()).isEqualTo("Night round, clinic east wing");
            assertThat(d.header().floorUnits()).isEqualTo(24);
            // the charging route's safest policy comes as level thresholds (format version 4)
            assertThat(d.thresholdForm()).isTrue();
            assertThat(r.out()).contains(d.thresholds().size() + " positions").contains(Caveats.block());
        }
    }

    @Test
    void export_ofANotGuaranteedMission_writesNothing() throws Exception {
        Path f = dir.resolve("keep.json");
        Files.writeString(f, "old content");
        CliRun r = run("export", "missions/late-return.yaml", "--policy", f.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(Files.readString(f)).isEqualTo("old content");
    }

    @Test
    void help_listsTheNewSubcommands() {
        CliRun r = run("--help");
        assertThat(r.out()).contains("check", "export");
        assertThat(run("check", "--help").out()).contains("--reserve", "--start-charge", "--budget", "--json");
    }
}
