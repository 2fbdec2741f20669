package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.certify.DeadlineCertificateChecker;
import dockline.certify.PatrolCertificateChecker;
import dockline.certify.RoundsCertificate;
import dockline.fixtures.CliRun;
import dockline.io.InputException;
import dockline.io.MissionLoader;
import dockline.io.PolicyFiles;
import dockline.model.Mission;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.replay.RoundsReplay;
import dockline.view.ViewReplay;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code export}, {@code margin} and {@code render} on patrols and deadline missions. The oracle of the exported
 * files is the independent certificate checkers ({@link PatrolCertificateChecker}, {@link DeadlineCertificateChecker},
 * which use the model, the arena and the policy's rows, never the solver), run on the policy as read back from the
 * file; the margins must be the figures {@code check} reports (one search, not two that could drift apart).
 */
class RoundsCommandsTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    /** The demo early clean with another deadline (2.5 min is 2 turns short; 3 min = 45 turns is enough). */
    static Path earlyClean(Path dir, String deadline) throws Exception {
        String text = Files.readString(Path.of("missions/early-clean.yaml"))
                .replace("map: ../maps/clinic-wing.yaml", "map: " + Path.of("maps/clinic-wing.yaml").toAbsolutePath())
                .replace("deadline: 2.5 min", "deadline: " + deadline);
        Path p = dir.resolve("early-clean-" + deadline.replace(' ', '-') + ".yaml");
        Files.writeString(p, text);
        return p;
    }

    private static JsonNode json(CliRun r) throws Exception {
        return JSON.readTree(r.out());
    }

    @Test
    void exportedPatrolPolicy_readBack_passesTheIndependentCertificate() throws Exception {
        for (String name : new String[] {"patrol.json", "patrol.csv"}) {
            Path file = dir.resolve(name);
            CliRun r = CliRun.run("export", "missions/night-patrol.yaml", "--policy",
                    file.toString());
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
            assertThat(r.out()).contains("Wrote the patrol policy").contains("longest lap").contains("Safety:");
            PolicyFiles.Document doc = PolicyFiles.read(file);
            assertThat(doc.header().rounds()).isPresent();
            assertThat(doc.header().rounds().get().patrol()).isTrue();
            Mission m = MissionLoader.load(Path.of("missions/night-patrol.yaml"));
            assertThat(doc.header().tasks()).isEqualTo(m.tasks().patrol());
            Arena arena = ArenaCompiler.compile(m);
            RoundsCertificate c = PatrolCertificateChecker.check(arena, doc.policy(), doc.header().floorUnits(),
                    m.startUnits());
            assertThat(c.ok()).as(c.reason()).isTrue();
            JsonNode check = json(CliRun.run("check", "missions/night-patrol.yaml", "--json"));
            assertThat(c.worstMinimumUnits()).isEqualTo(check.get("lowestLevelUnits").asInt());
            assertThat(c.longestLapTicks()).isEqualTo(check.get("longestLapTicks").asInt());
        }
    }

    @Test
    void exportedDeadlinePolicy_readBack_docksInTime() throws Exception {
        Path mission = earlyClean(dir, "3 min");
        Path file = dir.resolve("clean.csv");
        CliRun r = CliRun.run("export", mission.toString(), "--policy", file.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        PolicyFiles.Document doc = PolicyFiles.read(file);
        assertThat(doc.header().rounds().orElseThrow().deadlineTicks()).isEqualTo(45);
        Mission m = MissionLoader.load(mission);
        RoundsCertificate c = DeadlineCertificateChecker.check(ArenaCompiler.compile(m), doc.policy(),
                doc.header().floorUnits(), m.startUnits(), doc.header().rounds().get().deadlineTicks());
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.longestLapTicks()).isLessThanOrEqualTo(45);
        // the demo's own deadline is missed: nothing is written
        Path none = dir.resolve("none.json");
        CliRun late = CliRun.run("export", "missions/early-clean.yaml", "--policy",
                none.toString());
        assertThat(late.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(none).doesNotExist();
    }

    @Test
    void policyFileGoal_badValues_areLocatedWithAHint() throws Exception {
        Path file = dir.resolve("p.json");
        assertThat(CliRun.run("export", "missions/night-patrol.yaml", "--policy", file.toString()).code())
                .isEqualTo(ExitCodes.OK);
        String text = Files.readString(file);
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, text.replace("\"goal\" : \"patrol\"", "\"goal\" : \"circle\"")
                .replace("\"budgetPer\" : \"mission\"", "\"budgetPer\" : \"night\""));
        try {
            PolicyFiles.read(bad);
            throw new AssertionError("read a policy with goal 'circle'");
        } catch (InputException e) {
            assertThat(e.problems().get(0).format()).contains(bad.toString() + ":").contains("'goal' must be visit,"
                    + " patrol or deadline").contains("hint:");
        }
        Path stray = dir.resolve("stray.json");
        Files.writeString(stray, text.replace("\"goal\" : \"patrol\",", "").replace("\"goal\" : \"patrol\"", ""));
        try {
            PolicyFiles.read(stray);
            throw new AssertionError("read 'budgetPer' without a goal");
        } catch (InputException e) {
            assertThat(e.problems().get(0).format()).contains("'budgetPer' belongs to a patrol or deadline policy");
        }
    }

    @Test
    void patrolMargin_isCheckHighestFloor() throws Exception {
        JsonNode check = json(CliRun.run("check", "missions/night-patrol.yaml", "--json"));
        CliRun r = CliRun.run("margin", "missions/night-patrol.yaml", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode mj = json(r);
        assertThat(mj.get("highestReserveUnits").asInt()).isEqualTo(check.get("highestReserveUnits").asInt());
        CliRun text = CliRun.run("margin", "missions/night-patrol.yaml");
        assertThat(text.out()).contains("highest reserve floor guaranteed from this start: "
                + check.get("highestReserveUnits").asInt() + " units").contains("Safety:");
        // missions/README.md, worked by hand: the patrol starts on its dock, so its lowest start is its floor
        assertThat(check.get("lowestStartUnits").asInt()).isEqualTo(24);
        assertThat(check.get("lowestStartSearched").asBoolean()).isTrue();
        assertThat(mj.get("lowestStartUnits").asInt()).isEqualTo(24);
        assertThat(mj.get("lowestStartWh").asDouble()).isEqualTo(12.0);
        assertThat(text.out()).contains("lowest starting charge that guarantees this floor: 24 units = 12 Wh (20%)");
    }

    @Test
    void deadlineMargin_isTheTightestDeadlineAndTheHighestFloor() throws Exception {
        JsonNode check = json(CliRun.run("check", "missions/early-clean.yaml", "--json"));
        CliRun r = CliRun.run("margin", "missions/early-clean.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        // missions/README.md: the early clean needs 43 turns = 2 min 52 s, its deadline is 37 turns
        assertThat(r.out()).contains("tightest deadline guaranteed at this floor: 43 turns = 2 min 52 s")
                .contains("allow a deadline of at least");
        JsonNode mj = json(CliRun.run("margin", "missions/early-clean.yaml", "--json"));
        assertThat(mj.get("tightestDeadlineTicks").asInt()).isEqualTo(check.get("tightestDeadlineTicks").asInt());
        assertThat(mj.get("highestReserveUnits")).isEqualTo(check.get("highestReserveUnits"));
        assertThat(mj.get("deadlineTicks").asInt()).isEqualTo(37);
        // no charge keeps the deadline (missions/README.md); the search ran to the end
        assertThat(mj.get("lowestStartUnits").isNull()).isTrue();
        assertThat(mj.get("lowestStartSearched").asBoolean()).isTrue();
        assertThat(check.get("lowestStartUnits")).isEqualTo(mj.get("lowestStartUnits"));
        assertThat(r.out()).contains("lowest starting charge that guarantees this floor within the deadline: none");
    }

    /** The picture's path is the lasso: the way in, then one lap, which ends where the loop starts again. */
    @Test
    void renderedPatrol_drawsTheLasso() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/night-patrol.yaml"));
        long budget = RoundsCheck.budget(0);
        dockline.view.ViewData data = new dockline.view.SolverAnalyzer().analyze(m, () -> false);
        RoundsReplay lasso = RoundsPlan.replay(m, budget, PolicyChoice.SAFEST).orElseThrow();
        assertThat(lasso.loopStart()).isNotNegative();
        ViewReplay drawn = data.replays().get(0);
        assertThat(drawn.kind()).isEqualTo(ViewReplay.Kind.LASSO);
        assertThat(drawn.steps()).hasSize(lasso.replay().steps().size());
        assertThat(drawn.loopStart()).isEqualTo(lasso.loopStart());
        assertThat(drawn.title()).contains("lap from step " + lasso.loopStart());
        assertThat(drawn.minimumUnits()).isEqualTo(data.verdict().worstCaseMinimumUnits().getAsInt());
        assertThat(data.verdict().highestReserveUnits()).isPresent();
    }
}
