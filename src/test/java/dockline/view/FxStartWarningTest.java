package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Starting the toolkit the way the tool does ({@link FxRuntime}, here through {@code dockline render} in
 * a JVM of its own, so that no test harness has started JavaFX before) prints no "Unsupported JavaFX
 * configuration" warning, while the picture is still drawn.
 */
class FxStartWarningTest {

    @TempDir
    Path tmp;

    @Test
    void a_start_from_the_class_path_prints_no_javafx_configuration_warning() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Path out = tmp.resolve("round.png");
        Path log = tmp.resolve("stderr.txt");
        Process p = new ProcessBuilder(List.of(java, "-cp", System.getProperty("java.class.path"), "dockline.cli.Main",
                "render", "missions/night-round.yaml", "--out=" + out, "--size=640x480"))
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
        assertThat(p.waitFor(180, TimeUnit.SECONDS)).isTrue();
        String text = Files.readString(log, StandardCharsets.UTF_8);
        assertThat(p.exitValue()).as(text).isZero();
        assertThat(new File(out.toString())).exists();
        assertThat(text).startsWith("wrote ").doesNotContain("Unsupported JavaFX configuration")
                .doesNotContain("WARNING");
    }
}
