package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The options that mean nothing outside the reserve objective are refused by {@code check} and {@code export}
 * in one wording (exit 2, nothing written), on the demo missions/discounted-trap.yaml (a discounted objective,
 * missions/README.md). Run through the shared command-line harness ({@link CliRun}).
 */
class ReserveOnlyRefusalTest {

    private static CliRun run(String... args) {
        return CliRun.run(args);
    }

    @Test
    void aPolicyChoiceOnADiscountedMission_isRefusedInTheSameWordsByCheckAndExport(@TempDir Path dir) {
        String line = "dockline: --fewest-moves applies to the reserve objective only";
        CliRun check = run("check", "missions/discounted-trap.yaml", "--fewest-moves");
        assertThat(check.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(check.err().strip()).isEqualTo(line);
        Path policy = dir.resolve("p.json");
        CliRun export = run("export", "missions/discounted-trap.yaml", "--fewest-moves", "--policy", policy.toString());
        assertThat(export.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(export.err().strip()).isEqualTo(line);
        assertThat(Files.exists(policy)).as("no output is written on bad input").isFalse();
        CliRun older = run("export", "missions/discounted-trap.yaml", "--safest-policy", "--policy", policy.toString());
        assertThat(older.err().strip()).isEqualTo("dockline: --safest-policy applies to the reserve objective only");
    }

    @Test
    void theRouteOptionsOnADiscountedMission_areRefusedTogether() {
        CliRun r = run("check", "missions/discounted-trap.yaml", "--method", "product");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("dockline: --method and --verdict-only apply to the reserve objective only");
        assertThat(r.err()).doesNotContain("Exception");
    }

    @Test
    void theSharedWording_oneOptionOrSeveral() {
        StringWriter s = new StringWriter();
        PrintWriter w = new PrintWriter(s, true);
        assertThat(MissionOptions.reserveObjectiveOnly(w, "--x")).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(MissionOptions.reserveObjectiveOnly(w, "--x", "--y")).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(s.toString().split("\\R")).containsExactly("dockline: --x applies to the reserve objective only",
                "dockline: --x and --y apply to the reserve objective only");
    }
}
