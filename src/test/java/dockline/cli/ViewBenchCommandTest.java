package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** {@code bench --view}: one row per bundled map and generated floor, in the published schema. */
class ViewBenchCommandTest {

    /** The toolkit the way TestFX starts it, so that window tests later in the same JVM keep their input. */
    @BeforeAll
    static void toolkit() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
    }

    @Test
    void json_hasARowPerMapWithStepAndFullRepaint_andFollowsTheSchema() throws Exception {
        CliRun r = CliRun.run("bench", "--view", "--json", "--sizes", "64");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        // the published schema (general-purpose validator, as in JsonOutputSchemaTest)
        assertThat(JsonOutputSchemaTest.schema("bench").validate(root)).as("%s", root).isEmpty();
        List<String> maps = new ArrayList<>();
        for (JsonNode row : root.get("view")) {
            maps.add(row.get("map").asText());
            assertThat(row.get("viewStepMillis").asDouble()).isPositive();
            assertThat(row.get("viewFullRepaintMillis").asDouble()).isPositive();
            assertThat(row.get("viewStepOverFullRepaint").asDouble())
                    .isEqualTo(row.get("viewStepMillis").asDouble() / row.get("viewFullRepaintMillis").asDouble());
            // a replay step draws the dynamic layer only
            assertThat(row.get("staticTilesDuringSteps").asLong()).isZero();
        }
        assertThat(maps).contains("research-block", "clinic-wing", "generated-64");
        assertThat(root.get("caveats").size()).isPositive();
    }

    @Test
    void aSideOutsideTheRange_isBadUsage() {
        CliRun r = CliRun.run("bench", "--view", "--sizes", "8");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--sizes");
    }
}
