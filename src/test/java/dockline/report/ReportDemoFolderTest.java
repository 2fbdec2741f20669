package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * {@code dockline report missions BAD}: the bundled demo folder (every mission file in it, sorted) and one
 * bad file. The verdicts and figures are those missions/README.md states for each demo (the documented
 * figures of {@code check} and {@code margin}); the bad file is listed with its located errors; the exit
 * code is 2 (a bad input), and would be 1 for the demo folder alone (some demos are not guaranteed).
 */
class ReportDemoFolderTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void demoFolder_everyMissionInOrder_withTheDocumentedVerdicts() throws Exception {
        DemoReport.Made r = DemoReport.get();
        assertThat(r.code()).as(r.err()).isEqualTo(2);
        JsonNode j = JSON.readTree(Files.readString(r.json()));
        JsonNode ms = j.get("missions");
        assertThat(ms).hasSize(DemoReport.DEMOS.length + 1);
        Map<String, JsonNode> byFile = new HashMap<>();
        int worstOfDemos = 0;
        for (int i = 0; i < DemoReport.DEMOS.length; i++) {
            JsonNode m = ms.get(i);
            assertThat(m.get("file").asText()).endsWith(DemoReport.DEMOS[i]);
            byFile.put(DemoReport.DEMOS[i], m);
            worstOfDemos = Math.max(worstOfDemos, m.get("exitCode").asInt());
        }
        assertThat(worstOfDemos).isEqualTo(1);
        // missions/README.md, "Verdicts of the demos"
        Map<String, String> verdicts = Map.of("aisle-return.yaml", "guaranteed", "discounted-trap.yaml", "guaranteed",
                "early-clean.yaml", "not-guaranteed", "late-return.yaml", "not-guaranteed", "night-patrol.yaml",
                "guaranteed", "night-round.yaml", "guaranteed", "supply-run.yaml", "guaranteed", "vault-check.yaml",
                "not-guaranteed");
        verdicts.forEach((f, v) -> assertThat(byFile.get(f).get("verdict").asText()).as(f).isEqualTo(v));
        // figures missions/README.md gives: night-round worst 83 units (the highest floor); supply-run worst 40;
        // aisle-return lowest start 33.5 % of 10 Wh = 67 units of 0.05 Wh; vault-check highest floor 4 units;
        // late-return: no floor at all can be guaranteed
        assertThat(byFile.get("night-round.yaml").get("lowestLevelUnits").asInt()).isEqualTo(83);
        assertThat(byFile.get("night-round.yaml").get("highestReserveUnits").asInt()).isEqualTo(83);
        assertThat(byFile.get("supply-run.yaml").get("lowestLevelUnits").asInt()).isEqualTo(40);
        assertThat(byFile.get("aisle-return.yaml").get("lowestStartUnits").asInt()).isEqualTo(67);
        assertThat(byFile.get("aisle-return.yaml").get("method").asText()).isEqualTo("fast");
        assertThat(byFile.get("vault-check.yaml").get("highestReserveUnits").asInt()).isEqualTo(4);
        assertThat(byFile.get("late-return.yaml").get("highestReserveUnits").isNull()).isTrue();
        assertThat(byFile.get("night-patrol.yaml").get("kind").asText()).isEqualTo("patrol");
        assertThat(byFile.get("early-clean.yaml").get("kind").asText()).isEqualTo("deadline");
        // worked by hand: the patrol starts on its dock, so from the floor itself (24 units) it charges to full
        // first and is then better off than from its own start of 96 units: its lowest start is the floor
        assertThat(byFile.get("night-patrol.yaml").get("lowestStartUnits").asInt()).isEqualTo(24);
        // early-clean misses its 37 turns at any charge (its worst case needs 43 turns): no lowest start; the rule
        // of thumb judges it against those 37 turns (2.5 min of 4 s, rounded down)
        assertThat(byFile.get("early-clean.yaml").get("lowestStartUnits").isNull()).isTrue();
        for (JsonNode rule : byFile.get("early-clean.yaml").get("ruleOfThumb")) {
            assertThat(rule.get("deadlineTicks").asInt()).isEqualTo(37);
            assertThat(rule.get("shortestRunTicks").asInt()).isPositive().isLessThanOrEqualTo(43);
        }
        assertThat(byFile.get("night-patrol.yaml").get("ruleOfThumb").get(0).has("deadlineTicks")).isFalse();
        for (JsonNode m : byFile.values()) {
            assertThat(m.get("picture").asBoolean()).as(m.get("file").asText()).isTrue();
            assertThat(m.get("run").get("levelUnits")).isNotEmpty();
            if (m.get("verdict").asText().equals("guaranteed")) {
                assertThat(m.get("certified").asBoolean()).as(m.get("file").asText()).isTrue();
            }
        }
        JsonNode bad = ms.get(DemoReport.DEMOS.length);
        assertThat(bad.get("status").asText()).isEqualTo("bad-input");
        assertThat(bad.get("errors")).isNotEmpty();
        assertThat(bad.get("errors").get(0).get("line").asInt()).isPositive();
        assertThat(r.err()).contains(r.bad().toString() + ":");
        assertThat(r.out()).contains("9 missions").contains("Safety:");
    }
}
