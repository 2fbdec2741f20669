package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** {@code dockline view}: bad files are refused before any window; no display gives a message, not a crash. */
class ViewCommandTest {

    @TempDir
    Path tmp;

    @Test
    void a_broken_file_is_refused_with_its_problems_and_no_window() throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, "name: broken\nmap: nowhere.yaml\nrobot: 3\n");
        CommandLine cl = Main.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute("view", bad.toString());
        assertThat(code).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).containsPattern("bad\\.yaml:\\d+:\\d+: ");
    }

    /** In a fresh JVM with no display (only checked where this machine has none, so no window can open). */
    @Test
    void without_a_display_the_view_says_so_and_exits_2() throws Exception {
        Assumptions.assumeTrue(System.getenv("DISPLAY") == null && System.getenv("WAYLAND_DISPLAY") == null,
                "a display is present: the window would really open");
        ProcessBuilder pb = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "dockline.cli.Main", "view", "missions/night-round.yaml"));
        pb.environment().remove("JAVA_TOOL_OPTIONS");
        pb.redirectErrorStream(true);
        File log = tmp.resolve("log.txt").toFile();
        pb.redirectOutput(log);
        Process p = pb.start();
        boolean done = p.waitFor(2, TimeUnit.MINUTES);
        if (!done) {
            p.destroyForcibly();
        }
        String text = Files.readString(log.toPath());
        assertThat(done).as(text).isTrue();
        assertThat(p.exitValue()).as(text).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(text).contains("dockline view: cannot open a window").contains("dockline render");
    }
}
