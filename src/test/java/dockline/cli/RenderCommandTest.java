package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code dockline render}: a PNG of the asked size with no display; bad input writes nothing. */
class RenderCommandTest {

    @TempDir
    Path tmp;

    /**
     * Runs the command in a fresh JVM whose environment has no display and no JavaFX platform
     * settings, as on a build server: the command must select the headless glass itself.
     */
    @Test
    void renders_a_png_of_the_asked_size_in_a_jvm_without_a_display() throws Exception {
        Path png = tmp.resolve("night.png");
        CliRun.Forked p = CliRun.fork(tmp, Duration.ofMinutes(5), List.of(), "render", "missions/night-round.yaml",
                "--out", png.toString(), "--size", "900x600");
        String text = p.all();
        assertThat(p.finished()).as("render finished; output:\n%s", text).isTrue();
        assertThat(p.code()).as(text).isEqualTo(ExitCodes.OK);
        assertThat(text).contains("wrote ").contains("Guaranteed").contains("Safety:");
        BufferedImage img = ImageIO.read(png.toFile());
        assertThat(img.getWidth()).isEqualTo(900);
        assertThat(img.getHeight()).isEqualTo(600);
    }

    @Test
    void a_bad_size_is_refused_and_nothing_is_written() {
        Path png = tmp.resolve("x.png");
        CliRun r = run("render", "missions/night-round.yaml", "--out", png.toString(), "--size", "big");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--size").contains("WIDTHxHEIGHT");
        assertThat(png).doesNotExist();
    }

    @Test
    void an_unknown_layer_is_refused() {
        CliRun r = run("render", "missions/night-round.yaml", "--out", tmp.resolve("x.png").toString(), "--layer", "fog");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("unknown overlay 'fog'");
    }

    @Test
    void a_broken_mission_gets_file_line_column_messages_and_nothing_is_written() throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, "name: broken\nmap: nowhere.yaml\nrobot: 3\n");
        Path png = tmp.resolve("x.png");
        CliRun r = run("render", bad.toString(), "--out", png.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).containsPattern("bad\\.yaml:\\d+:\\d+: ");
        assertThat(png).doesNotExist();
    }

    @Test
    void a_reserve_above_the_capacity_is_refused() {
        CliRun r = run("render", "missions/night-round.yaml", "--out", tmp.resolve("x.png").toString(), "--reserve", "70 Wh");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--reserve").contains("capacity");
    }

    /** The same refusal as check's and margin's: a floor above the starting charge (48 Wh) is an input mistake. */
    @Test
    void a_reserve_above_the_starting_charge_is_refused_and_nothing_is_written() {
        Path png = tmp.resolve("above-start.png");
        CliRun r = run("render", "missions/night-round.yaml", "--out", png.toString(), "--reserve", "90%");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("above the starting charge").contains("lower --reserve");
        assertThat(png).doesNotExist();
    }

    @Test
    void view_and_render_are_listed_with_help() {
        CliRun r = run("--help");
        assertThat(r.out()).contains("view").contains("render");
        CliRun h = run("render", "--help");
        assertThat(h.out()).contains("--out").contains("--size").contains("--layer");
        assertThat(h.code()).isEqualTo(ExitCodes.OK);
    }

    /**
     * Regression: {@code render MISSION --out MISSION} overwrote the mission file with a PNG, and a
     * mistyped output folder was created silently. Both are now refused before any work, exit 2,
     * and the mission file is left as it was.
     */
    @Test
    void refuses_to_overwrite_an_input_or_write_into_a_missing_folder() throws Exception {
        Path mission = tmp.resolve("m.yaml");
        Path map = tmp.resolve("clinic-wing.yaml");
        Files.copy(Path.of("maps/clinic-wing.yaml"), map);
        Files.writeString(mission, Files.readString(Path.of("missions/night-round.yaml"))
                .replace("../maps/clinic-wing.yaml", "clinic-wing.yaml"));
        byte[] before = Files.readAllBytes(mission);
        CliRun self = run("render", mission.toString(), "--out", mission.toString());
        assertThat(self.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(self.err()).contains("input file");
        assertThat(Files.readAllBytes(mission)).isEqualTo(before);
        CliRun ofMap = run("render", mission.toString(), "--out", map.toString());
        assertThat(ofMap.code()).isEqualTo(ExitCodes.BAD_INPUT);
        CliRun missing = run("render", mission.toString(), "--out", tmp.resolve("no-such-folder/x.png").toString());
        assertThat(missing.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(tmp.resolve("no-such-folder")).doesNotExist();
    }
}
