package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.report.MissionResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The report's statuses give the command line's exit codes by name, not by the order of the constants: each
 * status is the code of {@link ExitCodes} with the same meaning, and that code is the one README.md's "Exit
 * codes" paragraph gives it (the documented contract of the command line).
 */
class StatusExitCodesTest {

    @Test
    void eachStatusHasTheExitCodeOfItsMeaning() {
        Map<MissionResult.Status, Integer> expected = new EnumMap<>(MissionResult.Status.class);
        expected.put(MissionResult.Status.GUARANTEED, ExitCodes.OK);
        expected.put(MissionResult.Status.NOT_GUARANTEED, ExitCodes.NOT_GUARANTEED);
        expected.put(MissionResult.Status.BAD_INPUT, ExitCodes.BAD_INPUT);
        expected.put(MissionResult.Status.OVER_RESOURCE_LIMIT, ExitCodes.RESOURCE_LIMIT);
        expected.put(MissionResult.Status.INTERNAL_ERROR, ExitCodes.INTERNAL);
        assertThat(expected.keySet()).containsExactlyInAnyOrder(MissionResult.Status.values());
        for (MissionResult.Status s : MissionResult.Status.values()) {
            assertThat(s.exitCode()).as(s.name()).isEqualTo(expected.get(s));
        }
    }

    @Test
    void theCodesAreTheOnesReadmeDocuments() throws Exception {
        String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
        assertThat(readme).contains("Exit codes: " + ExitCodes.OK + " guaranteed")
                .contains(ExitCodes.NOT_GUARANTEED + " not guaranteed, " + ExitCodes.BAD_INPUT + " bad input or usage, "
                        + ExitCodes.RESOURCE_LIMIT + " over a resource limit")
                .contains(ExitCodes.INTERNAL + " internal error");
    }
}
