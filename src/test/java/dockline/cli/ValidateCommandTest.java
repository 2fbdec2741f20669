package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import dockline.report.Caveats;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ValidateCommandTest {

    @TempDir
    Path dir;

    @Test
    void demo_files_are_valid() {
        CliRun r = run("validate", "maps/clinic-wing.yaml", "maps/research-block.yaml", "missions/night-round.yaml",
                "missions/supply-run.yaml", "missions/late-return.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.err()).isEmpty();
        assertThat(r.out().lines().filter(l -> l.startsWith("ok ")).count()).isEqualTo(5);
        assertThat(r.out()).contains("ok maps/clinic-wing.yaml: map 'Day clinic, east wing (demo)', 20 x 12 cells");
        assertThat(r.out()).contains("1 unit = 0.5 Wh");
        assertThat(r.out()).contains("reserve floor 20% = 12 Wh (24 units)");
        assertThat(r.out()).contains(Caveats.LINES.get(0));
    }

    @Test
    void a_map_alone_shows_no_mission_caveat_block() {
        CliRun r = run("validate", "maps/clinic-wing.yaml");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("1 dock,").doesNotContain("Safety:");
    }

    @Test
    void three_mistakes_give_three_lines_and_exit_2() throws IOException {
        String mission = Files.readString(Path.of("missions/night-round.yaml"))
                .replace("map: ../maps/clinic-wing.yaml", "map: " + Path.of("maps/clinic-wing.yaml").toAbsolutePath())
                .replace("  wait-energy: 0.5", "  wait-enrgy: 0.5")
                .replace("cell: [1, 6]", "cell: [0, 6]")
                .replace("reserve: 20%", "reserve: 120%");
        Path f = dir.resolve("bad.yaml");
        Files.writeString(f, mission);
        CliRun r = run("validate", f.toString(), "maps/clinic-wing.yaml");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.errLines()).hasSize(3).allMatch(l -> l.matches(".+:\\d+:\\d+: .+"));
        assertThat(r.errLines().get(0)).contains("unknown key 'wait-enrgy', did you mean 'wait-energy'?");
        assertThat(r.errLines().get(1)).contains("start cell 0:6 is a wall");
        assertThat(r.errLines().get(2)).contains("'120%' is above 100% of the battery");
        // the valid map is still reported as ok, and no safety block without a valid mission
        assertThat(r.out()).contains("ok maps/clinic-wing.yaml").doesNotContain("Safety:");
    }

    @Test
    void unknown_kind_empty_file_and_missing_file() throws IOException {
        Path odd = dir.resolve("odd.yaml");
        Files.writeString(odd, "colour: blue\n");
        Path empty = dir.resolve("empty.yaml");
        Files.writeString(empty, "");
        CliRun r = run("validate", odd.toString(), empty.toString(), dir.resolve("none.yaml").toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.errLines()).hasSize(3);
        assertThat(r.errLines().get(0)).endsWith("odd.yaml:1:1: cannot tell whether this is a map or a mission"
                + " (hint: a map has 'plan:' and 'legend:'; a mission has 'map:' and 'robot:' (see maps/README.md, missions/README.md))");
        assertThat(r.errLines().get(1)).endsWith("empty.yaml:1:1: the file is empty"
                + " (hint: see maps/README.md or missions/README.md for what goes in it)");
        assertThat(r.errLines().get(2)).contains("none.yaml:1:1: cannot read the file: it does not exist (hint: ");
        assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void no_files_is_a_usage_error() {
        CliRun r = run("validate");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("FILE");
    }

    @Test
    void help_lists_exit_codes() {
        CliRun r = run("validate", "--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("Exit codes").contains("file:line:column");
    }

    @Test
    void summary_shows_the_rounding_of_each_figure() throws IOException {
        String mission = Files.readString(Path.of("missions/night-round.yaml"))
                .replace("map: ../maps/clinic-wing.yaml", "map: " + Path.of("maps/clinic-wing.yaml").toAbsolutePath())
                .replace("charge-rate: 1 ", "charge-rate: 0.3 ")
                .replace("    carpet: 1\n", "    carpet: 0.7\n");
        Path f = dir.resolve("m.yaml");
        Files.writeString(f, mission);
        CliRun r = run("validate", f.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        // 0.7 Wh at 0.5 Wh per unit rounds up to 2 units; 0.3 Wh of charging rounds down to none (hand-worked)
        assertThat(r.out()).contains("carpet 0.7 Wh = 2 units").contains("no charging (0.3 Wh rounds down to 0 units)");
    }
}
