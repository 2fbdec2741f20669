package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import org.junit.jupiter.api.Test;

class BenchCommandTest {

    @Test
    void help_listsTheOptions() {
        CliRun r = run("bench", "--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("--quick", "--json", "--sizes", "--seed");
    }

    @Test
    void sizeOutOfRange_isBadUsage() {
        CliRun r = run("bench", "--sizes", "8");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--sizes");
    }

    @Test
    void json_onTheSmallestFloor_agreesAndHasRowsAndRatios() throws Exception {
        CliRun r = run("bench", "--quick", "--json", "--sizes", "32");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertThat(root.get("rows").size()).isPositive();
        assertThat(root.get("ratios").has("attractorOverBfs")).isTrue();
        assertThat(root.get("mismatches").size()).isZero();
        assertThat(r.err()).contains("32x32 reserve"); // progress goes to standard error with --json
    }

    @Test
    void unknownInstance_isBadUsage() {
        CliRun r = run("bench", "--instances", "discountd");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--instances", "discounted");
    }

    @Test
    void oneInstance_runsOnlyThatInstance_andBothRoutesAgree() throws Exception {
        CliRun r = run("bench", "--json", "--sizes", "32", "--instances", "discounted");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        // the published schema of the output (general-purpose validator, as in JsonOutputSchemaTest)
        assertThat(JsonOutputSchemaTest.schema("bench").validate(root)).isEmpty();
        // the comparator product on demand (main route), stored (reference), and value iteration
        assertThat(root.get("rows").size()).isEqualTo(3);
        for (JsonNode row : root.get("rows")) {
            assertThat(row.get("instance").asText()).isEqualTo("discounted");
            // the comparator routes and value iteration are independent computations of the same question
            assertThat(row.get("verdict").asText()).isEqualTo(root.get("rows").get(0).get("verdict").asText());
        }
        assertThat(root.get("ratios").get("viOverComparator").has("32")).isTrue();
        assertThat(root.get("ratios").get("viOverStoredComparator").has("32")).isTrue();
        assertThat(r.err()).doesNotContain("32x32 reserve");
    }
}
