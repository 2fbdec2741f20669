package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code replay --force} on the bundled lasting demos (missions/README.md, "The shut fire door"), now planned
 * phase by phase: the exit codes and the words are those the product route on the whole closure arena gave
 * before (recorded from it on 2026-12-03: the same stdout, stderr and exit code for these and for eight more
 * forced replays of vault-check and late-return), and nothing is written on a refusal. {@code --fewest-moves}
 * keeps the whole arena and says so in a note.
 */
class ReplayLastingCommandTest {

    private static final String VAULT = "missions/vault-check.yaml";

    @TempDir
    Path tmp;

    /** The safest policy goes round the drying court (missions/README.md), so it never tries the fire door. */
    @Test
    void forcedAtTheFireDoor_theSafestRunNeverTriesIt_exit2_nothingWritten() {
        Path csv = tmp.resolve("r.csv");
        CliRun r = CliRun.run("replay", VAULT, "--force", "door-shut@court-fire-door", "--csv", csv.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("dockline: --force: door-shut@court-fire-door: the policy's run never"
                + " tries to enter that place while the event can still happen (check the name against the map's doors and"
                + " zones, and the budget)");
        assertThat(r.out()).isEmpty();
        assertThat(csv).doesNotExist();
    }

    @Test
    void forcedAtAStepWithoutADoor_saysWhereTheRobotIs_exit2() {
        CliRun r = CliRun.run("replay", VAULT, "--force", "3:door-shut");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("dockline: --force: step 3: door-shut cannot happen there: the robot is"
                + " at 1:3 and its policy says 'move 1:4', and 1:4 is not a door that may shut");
        CliRun none = CliRun.run("replay", VAULT, "--budget", "0", "--force", "3:door-shut");
        assertThat(none.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(none.err()).contains("no disturbance budget is left (the map allows 0)");
    }

    /** late-return: no floor at all can be guaranteed (missions/README.md), so there is no policy to force. */
    @Test
    void forcedWithoutAPolicy_exit1() {
        CliRun r = CliRun.run("replay", "missions/late-return.yaml", "--force", "door-shut@west-fire-door");
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.err()).contains("no policy to run: not even a reserve floor of 0 can be guaranteed");
    }

    @Test
    void fewestMoves_onLastingClosures_notesTheWholeArena_inTheTextAndOnStderrWithJson() throws Exception {
        CliRun text = CliRun.run("replay", VAULT, "--fewest-moves", "--disturbance", "nominal", "--quiet");
        assertThat(text.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(text.out()).contains(ReplayCommand.WHOLE_ARENA_NOTE + "\n")
                .contains("Safety: ");
        CliRun json = CliRun.run("replay", VAULT, "--fewest-moves", "--disturbance", "nominal", "--json");
        assertThat(json.err()).contains(ReplayCommand.WHOLE_ARENA_NOTE);
        assertThat(new ObjectMapper().readTree(json.out()).get("caveats").size()).isPositive();
        CliRun safest = CliRun.run("replay", VAULT, "--disturbance", "nominal", "--quiet");
        assertThat(safest.out()).doesNotContain("whole closure arena");
    }
}
