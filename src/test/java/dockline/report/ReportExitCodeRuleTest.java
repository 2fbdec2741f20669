package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The run's exit code with several missions is the highest of theirs, in any order: 4 (internal error) over 3
 * (over a resource limit) over 2 (bad input) over 1 (not guaranteed) over 0, the rule README.md's "Exit codes"
 * states (the documented contract; the expected codes here are read from that rule, not from the code).
 */
class ReportExitCodeRuleTest {

    private static MissionResult with(MissionResult.Status s) {
        return new MissionResult(Path.of("m.yaml"), s, List.of(), List.of(), "m", null, null, List.of(), null, null,
                null, "not checked", List.of());
    }

    private static int code(MissionResult.Status... statuses) {
        List<MissionResult> rs = new ArrayList<>();
        for (MissionResult.Status s : statuses) {
            rs.add(with(s));
        }
        int code = ReportRun.exitCode(rs);
        Collections.reverse(rs);
        assertThat(ReportRun.exitCode(rs)).as("the same in the other order").isEqualTo(code);
        return code;
    }

    @Test
    void theHighestCodeWins_inAnyOrder() {
        assertThat(ReportRun.exitCode(List.of())).isEqualTo(0);
        assertThat(code(MissionResult.Status.GUARANTEED, MissionResult.Status.GUARANTEED)).isEqualTo(0);
        assertThat(code(MissionResult.Status.GUARANTEED, MissionResult.Status.NOT_GUARANTEED)).isEqualTo(1);
        assertThat(code(MissionResult.Status.NOT_GUARANTEED, MissionResult.Status.BAD_INPUT)).isEqualTo(2);
        assertThat(code(MissionResult.Status.BAD_INPUT, MissionResult.Status.OVER_RESOURCE_LIMIT)).isEqualTo(3);
        assertThat(code(MissionResult.Status.BAD_INPUT, MissionResult.Status.INTERNAL_ERROR,
                MissionResult.Status.OVER_RESOURCE_LIMIT)).isEqualTo(4);
        assertThat(code(MissionResult.Status.INTERNAL_ERROR, MissionResult.Status.GUARANTEED)).isEqualTo(4);
    }

    @Test
    void theRuleIsWrittenDown() throws Exception {
        String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
        assertThat(readme).contains("the exit code is the highest of the missions' codes, in whatever order they"
                + " come: 4 over 3 over 2 over 1 over 0");
    }
}
