package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The checker must not share code with what it checks (DEVELOPERS.md, "Layout"): its sources may use the model,
 * the arena, the policy records, the primitive collections of {@code dockline.util} and jgrapht, never
 * the solver, the goal automaton or the monitors. {@code dockline.util} in turn may use nothing of
 * dockline, so no solver logic can reach the checker through it.
 */
class IndependenceTest {

    private static final List<String> ALLOWED = List.of("dockline.model.", "dockline.arena.", "dockline.policy.",
            "dockline.certify", "dockline.util.", "org.jgrapht.",
            "java.");

    @Test
    void certifyPackage_importsOnlyModelArenaAndPolicyData() throws IOException {
        Pattern ref = Pattern.compile("\\b((?:dockline|org\\.jgrapht|java)\\.[a-z][\\w.]*\\.?[A-Z]?\\w*)");
        int files = 0;
        try (Stream<Path> s = Files.list(Path.of("src/main/java/dockline/certify"))) {
            for (Path f : s.filter(p -> p.toString().endsWith(".java")).toList()) {
                files++;
                Matcher m = ref.matcher(Files.readString(f));
                while (m.find()) {
                    String name = m.group(1);
                    assertThat(ALLOWED.stream().anyMatch(name::startsWith)).as("%s uses %s", f.getFileName(), name).isTrue();
                }
            }
        }
        assertThat(files).isGreaterThan(3);
    }

    @Test
    void utilPackage_usesNothingElseOfDockline() throws IOException {
        Pattern ref = Pattern.compile("\\b(dockline\\.[a-z]\\w*)");
        int files = 0;
        try (Stream<Path> s = Files.list(Path.of("src/main/java/dockline/util"))) {
            for (Path f : s.filter(p -> p.toString().endsWith(".java")).toList()) {
                files++;
                Matcher m = ref.matcher(Files.readString(f));
                while (m.find()) {
                    assertThat(m.group(1)).as("%s uses %s", f.getFileName(), m.group(1)).isEqualTo("dockline.util");
                }
            }
        }
        assertThat(files).isGreaterThanOrEqualTo(2);
    }
}
