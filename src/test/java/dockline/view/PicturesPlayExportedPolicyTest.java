package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import dockline.fixtures.ExportedPolicyReading;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import dockline.replay.ReplayStep;
import dockline.report.MissionChecker;
import dockline.report.MissionResult;
import dockline.report.Pictures;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The pictures play the policy {@code export} writes: the window's runs (which {@code render} draws too: both through
 * {@link SolverAnalyzer}) and the run the report pictures, on the night round, whose product-game policy takes other
 * moves among equally safe ones (it tops up on the dock before it leaves; the exported policy leaves at once).
 *
 * <p>Oracle: {@link ExportedPolicyReading}, the exported file read with Jackson as missions/POLICY-FORMAT.md documents
 * it, each move looked up there on its own (no production lookup code).
 */
class PicturesPlayExportedPolicyTest {

    private static final Path MISSION = Path.of("missions/night-round.yaml");

    @TempDir
    Path tmp;

    @Test
    void theWindowsRuns_followTheExportedPolicy() throws Exception {
        ExportedPolicyReading policy = exported();
        Mission m = MissionLoader.load(MISSION);
        ViewData d = new SolverAnalyzer().analyze(m, () -> false);
        assertThat(d.replays()).extracting(ViewReplay::kind)
                .containsExactly(ViewReplay.Kind.WORST_CASE, ViewReplay.Kind.NOMINAL);
        for (ViewReplay r : d.replays()) {
            List<ExportedPolicyReading.Step> run = new ArrayList<>();
            for (ViewStep s : r.steps()) {
                run.add(new ExportedPolicyReading.Step(s.cell().toString(), s.levelUnits(), s.budgetLeft(),
                        s.progress(), s.action() == null ? "" : s.action().toString(),
                        s.event() == null ? "none" : s.event().word(), s.eventCell() == null ? "" : s.eventCell().toString(),
                        "", null));
            }
            policy.assertFollows(run);
        }
    }

    @Test
    void theReportsPicturedRun_followsTheExportedPolicy() throws Exception {
        ExportedPolicyReading policy = exported();
        List<Plan> pictured = new ArrayList<>();
        Pictures capture = new Pictures() {
            @Override
            public byte[] oneTrip(Plan plan) {
                pictured.add(plan);
                return new byte[0];
            }

            @Override
            public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) {
                throw new AssertionError("a one-trip mission");
            }
        };
        MissionResult result = MissionChecker.check(MISSION, 0, capture);
        assertThat(result.status()).isEqualTo(MissionResult.Status.GUARANTEED);
        assertThat(pictured).hasSize(1);
        Replay worst = pictured.get(0).replays().orElseThrow().worstCase();
        List<ExportedPolicyReading.Step> run = new ArrayList<>();
        for (ReplayStep s : worst.steps()) {
            run.add(new ExportedPolicyReading.Step(s.cell().toString(), s.batteryUnits(), s.budgetLeft(),
                    s.progressMask(), s.taken() == null ? "" : s.taken().toString(),
                    s.event().kind() == null ? "none" : s.event().kind().word(),
                    s.event().cell() == null ? "" : s.event().cell().toString(), "", s.event().closed()));
        }
        policy.assertFollows(run);
        // the report's run is that one: its battery levels step by step
        assertThat(result.run().levelsUnits()).isEqualTo(worst.steps().stream().map(ReplayStep::batteryUnits).toList());
    }

    private ExportedPolicyReading exported() throws Exception {
        Path file = tmp.resolve("night-round-policy.json");
        CliRun r = CliRun.run("export", MISSION.toString(), "--policy", file.toString(), "--quiet");
        assertThat(r.code()).as(r.err()).isZero();
        return ExportedPolicyReading.of(file, MISSION);
    }
}
