package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class BenchCommandTest {

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void help_listsTheOptions() {
        Run r = run("bench", "--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("--quick", "--json", "--sizes", "--seed");
    }

    @Test
    void sizeOutOfRange_isBadUsage() {
        Run r = run("bench", "--sizes", "8");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--sizes");
    }

    @Test
    void json_onTheSmallestFloor_agreesAndHasRowsAndRatios() throws Exception {
        Run r = run("bench", "--quick", "--json", "--sizes", "32");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertThat(root.get("rows").size()).isPositive();
        assertThat(root.get("ratios").has("attractorOverBfs")).isTrue();
        assertThat(root.get("mismatches").size()).isZero();
        assertThat(r.err()).contains("32x32 reserve"); // progress goes to standard error with --json
    }

    @Test
    void unknownInstance_isBadUsage() {
        Run r = run("bench", "--instances", "discountd");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--instances", "discounted");
    }

    @Test
    void oneInstance_runsOnlyThatInstance_andBothRoutesAgree() throws Exception {
        Run r = run("bench", "--json", "--sizes", "32", "--instances", "discounted");
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
