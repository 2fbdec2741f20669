package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.model.ResourceLimitException;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Exit codes by type (issue 15, bullets 2-4): resource limits are 3 with the real size, the limit
 * that applied and advice for that cause; everything that is not bad input or a limit is 4 with a
 * log file; outputs to devices and links are refused with 2; every command gives its errors as a
 * JSON object on stdout with --json.
 */
class FailureHandlingTest {

    @TempDir
    Path dir;

    private static String report(Throwable t, int[] code) {
        StringWriter w = new StringWriter();
        code[0] = Failures.report(t, Path.of("m.yaml"), new PrintWriter(w, true));
        return w.toString();
    }

    @Test
    void internalContractFailures_areExit4_withALogFile_notBadInputOrTooLarge() throws IOException {
        int[] code = new int[1];
        for (RuntimeException e : new RuntimeException[] {new IllegalArgumentException("arena vertex 3 has 16 out-edges"),
                new ArithmeticException("long overflow"), new IllegalStateException("internal: could not be certified")}) {
            String err = report(e, code);
            assertThat(code[0]).as(err).isEqualTo(ExitCodes.INTERNAL);
            assertThat(err).contains("internal error: " + e.getClass().getSimpleName()).doesNotContain("\tat ");
            Matcher m = Pattern.compile("The details are in (\\S+);").matcher(err);
            assertThat(m.find()).as(err).isTrue();
            Path log = Path.of(m.group(1));
            assertThat(Files.readString(log)).contains(e.getMessage()).contains("\tat ");
            Files.deleteIfExists(log);
        }
    }

    @Test
    void debug_putsTheTraceOnStderr_andIsTakenFromAnywhereBeforeDashDash() {
        String[] rest = Main.takeDebug(new String[] {"check", "--debug", "m.yaml", "--", "--debug"});
        try {
            assertThat(rest).containsExactly("check", "m.yaml", "--", "--debug");
            assertThat(Failures.debug).isTrue();
            StringWriter w = new StringWriter();
            assertThat(Failures.internal(new IllegalStateException("boom"), new PrintWriter(w, true))).isEqualTo(ExitCodes.INTERNAL);
            assertThat(w.toString()).contains("internal error: IllegalStateException: boom").contains("\tat ");
        } finally {
            Main.takeDebug(new String[0]);
        }
        assertThat(Failures.debug).isFalse();
    }

    @Test
    void resourceLimits_areExit3_withTheirOwnAdvice() {
        int[] code = new int[1];
        String err = report(new ResourceLimitException("the game is huge", "make it smaller"), code);
        assertThat(code[0]).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(err).contains("the game is huge (hint: make it smaller)");
        err = report(new OutOfMemoryError("Java heap space"), code);
        assertThat(code[0]).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(err).contains("maximum heap of " + (Runtime.getRuntime().maxMemory() >> 20) + " MB")
                .doesNotContain("Java heap space");
    }

    /** The refusal said "over the budget of 2048 MB" whatever -Xmx or --max-memory said. */
    @Test
    void theMemoryRefusal_namesTheBudgetThatApplied() {
        CliRun r = run("check", "missions/night-round.yaml", "--max-memory", "1", "--method", "stored");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(r.err()).contains("over the memory budget of 1 MB").contains("--max-memory")
                .contains("maximum heap is " + (Runtime.getRuntime().maxMemory() >> 20) + " MB");
        SizeEstimate e = new SizeEstimate(1000, 1000, 64_000, 0);
        String byDefault = new ProductTooLargeException(e, ProductOptions.defaultMemoryBudget(), false).getMessage();
        assertThat(byDefault).contains("half the JVM's maximum heap of " + (Runtime.getRuntime().maxMemory() >> 20) + " MB");
        ProductTooLargeException index = ProductTooLargeException.indexRange(e, 3_000_000_000L);
        assertThat(index.getMessage()).contains("3000000000 slots").doesNotContain("budget");
        assertThat(index.advice()).contains("more memory does not help");
    }

    /** The 2048 x 2048 plan the reader accepts is refused with its size before the arena is allocated. */
    @Test
    void aHugeFloor_isRefusedBeforeAllocating_withItsSize() {
        assertThatThrownBy(() -> dockline.arena.ArenaCompiler.refuseIfTooLarge(4_186_116, 1001))
                .isInstanceOf(ResourceLimitException.class)
                .hasMessageContaining("4190302116 robot positions").hasMessageContaining("maximum heap of");
    }

    @Test
    void outputsToADeviceOrALink_areRefusedWithExit2() throws IOException {
        assumeTrue(Files.exists(Path.of("/dev/null")));
        CliRun r = run("export", "missions/night-round.yaml", "--policy", "/dev/null");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("device");
        Path target = Files.writeString(dir.resolve("t.json"), "keep");
        Path link = Files.createSymbolicLink(dir.resolve("l.json"), target);
        CliRun l = run("export", "missions/night-round.yaml", "--policy", link.toString());
        assertThat(l.code()).as(l.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(target)).isEqualTo("keep");
        assertThat(Files.isSymbolicLink(link)).isTrue();
    }

    /** `check --json` on bad input printed nothing on stdout; now every command gives a JSON object. */
    @Test
    void jsonErrors_onEveryCommand() throws IOException {
        Path bad = Files.writeString(dir.resolve("bad.yaml"), "name: x\nmap: nowhere.yaml\nrobot: {}\n");
        ObjectMapper om = new ObjectMapper();
        for (String[] args : new String[][] {{"check", bad.toString()}, {"export", bad.toString(), "--policy",
                dir.resolve("p.json").toString()}, {"replay", bad.toString()}, {"margin", bad.toString()},
                {"render", bad.toString(), "--out", dir.resolve("p.png").toString()}, {"validate", bad.toString()},
                {"bench", "--sizes", "x"}}) {
            String[] withJson = java.util.Arrays.copyOf(args, args.length + 1);
            withJson[args.length] = "--json";
            CliRun r = run(withJson);
            assertThat(r.code()).as(String.join(" ", withJson) + "\n" + r.err()).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.err()).as("the text stays on stderr").isNotBlank();
            JsonNode j = om.readTree(r.out());
            if (args[0].equals("validate")) {
                assertThat(j.get("valid").asBoolean()).isFalse(); // validate's own JSON, with its problems
                continue;
            }
            assertThat(j.get("exitCode").asInt()).isEqualTo(ExitCodes.BAD_INPUT);
            JsonNode first = j.get("errors").get(0);
            for (String k : new String[] {"file", "line", "column", "message", "hint", "exitCode"}) {
                assertThat(first.has(k)).as(k + " in " + first).isTrue();
            }
            if (!args[0].equals("render") && !args[0].equals("bench")) {
                assertThat(first.get("file").asText()).isEqualTo(bad.toString());
                assertThat(first.get("line").asInt()).isPositive();
                assertThat(first.get("hint").asText()).isNotBlank();
            }
            assertThat(j.get("caveats").size()).isPositive();
        }
    }

    @Test
    void jsonErrors_parseLocatedLinesAndPlainOnes() {
        JsonNode j = Failures.jsonErrors("a.yaml:3:7: bad value (hint: write 2)\ndockline: --budget is wrong\nTry again.\n", 2);
        assertThat(j.get("errors")).hasSize(2);
        assertThat(j.get("errors").get(0).get("line").asInt()).isEqualTo(3);
        assertThat(j.get("errors").get(0).get("column").asInt()).isEqualTo(7);
        assertThat(j.get("errors").get(0).get("hint").asText()).isEqualTo("write 2");
        assertThat(j.get("errors").get(1).get("file").isNull()).isTrue();
        assertThat(j.get("errors").get(1).get("message").asText()).isEqualTo("--budget is wrong");
        assertThat(j.get("errors").get(1).get("hint").asText()).isEqualTo("Try again.");
    }
}
