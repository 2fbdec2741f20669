package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code dockline view}: bad files are refused before any window; no display gives a message, not a crash. */
class ViewCommandTest {

    @TempDir
    Path tmp;

    @Test
    void a_broken_file_is_refused_with_its_problems_and_no_window() throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, "name: broken\nmap: nowhere.yaml\nrobot: 3\n");
        CliRun r = CliRun.run("view", bad.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).containsPattern("bad\\.yaml:\\d+:\\d+: ");
    }

    /** In a fresh JVM with no display (only checked where this machine has none, so no window can open). */
    @Test
    void without_a_display_the_view_says_so_and_exits_2() throws Exception {
        Assumptions.assumeTrue(System.getenv("DISPLAY") == null && System.getenv("WAYLAND_DISPLAY") == null,
                "a display is present: the window would really open");
        CliRun.Forked p = CliRun.fork(tmp, Duration.ofMinutes(2), List.of(), "view", "missions/night-round.yaml");
        String text = p.all();
        assertThat(p.finished()).as(text).isTrue();
        assertThat(p.code()).as(text).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(text).contains("dockline view: cannot open a window").contains("dockline render");
    }
}
