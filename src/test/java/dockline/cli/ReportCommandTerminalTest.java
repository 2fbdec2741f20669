package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The report's progress lines are for a person at a terminal: under the test runner standard error is not one. */
class ReportCommandTerminalTest {

    @Test
    void stderrIsNotATerminal_underTheTestRunner() {
        // surefire redirects the forked JVM's standard error to a pipe
        assertThat(ProgressLine.stderrIsTerminal()).isFalse();
        assertThat(ProgressLine.wanted(false, false)).isFalse();
    }

    @Test
    void version_hasNoToolName() {
        assertThat(ReportCommand.version()).doesNotStartWith("dockline").isNotBlank();
    }
}
