package dockline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.certify.Certificate;
import dockline.fixtures.ReplayChecks;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.replay.Replay;
import dockline.replay.ReplayFormats;
import dockline.replay.ReplayStep;
import dockline.solve.reserve.ReserveAnalysis;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every demo mission: certified when guaranteed, a real breach when not, and byte-identical files. */
class DemoMissionReplayTest {

    /**
     * Oracles: the threshold solver's own worst case (ReserveSolver's dynamic programme over its
     * ranks) for the worst-case replay; the arena's step semantics (maps/README.md, "Game semantics") for every row.
     */
    @ParameterizedTest
    @MethodSource("dockline.fixtures.DemoFiles#missions")
    void guaranteed_isCertified_andWorstReplayMatchesSolver_elseCounterexampleBreaches(Path file) throws Exception {
        Mission m = MissionLoader.load(file);
        Plan plan = PlanReplaysProperties.replays(m, PolicyChoice.SAFEST);
        ReserveAnalysis an = ((Plan.Detail.Product) plan.detail()).analysis();
        PlanReplays mr = plan.replays().orElseThrow();
        Replay worst = mr.worstCase();
        ReplayChecks.assertIsARun(an.arena(), worst, an.startUnits());
        int floor = an.reserveUnits();
        if (plan.guaranteed()) {
            Certificate cert = ((Certification.Reserve) plan.certification()).certificate();
            assertThat(plan.certification().ok()).as(cert.reason()).isTrue();
            assertThat(worst.minimumUnits()).isEqualTo(an.worstCaseMinimumUnits().getAsInt());
            assertThat(cert.worstMinimumUnits()).isEqualTo(worst.minimumUnits());
            assertThat(worst.ending()).isEqualTo(Replay.Ending.COMPLETE);
            // the default policy is the safest: its worst case is the highest guaranteed floor
            assertThat(worst.minimumUnits()).isEqualTo(plan.highestFloorUnits().getAsInt());
            Replay nominal = mr.nominal();
            ReplayChecks.assertIsARun(an.arena(), nominal, an.startUnits());
            assertThat(nominal.ending()).isEqualTo(Replay.Ending.COMPLETE);
            assertThat(nominal.minimumUnits()).isGreaterThanOrEqualTo(worst.minimumUnits());
        } else {
            dockline.solve.WinningRegion region = an.region().orElseThrow();
            ReplayStep last = worst.last();
            int v = an.arena().robotVertex(last.cell().index(an.arena().width()), last.budgetLeft());
            boolean breach = worst.ending() == Replay.Ending.BELOW_FLOOR && last.batteryUnits() < floor;
            boolean stuck = worst.ending() != Replay.Ending.COMPLETE
                    && !region.robotWins(v, last.progressMask(), last.batteryUnits());
            assertThat(breach || stuck).as(String.join("\n", worst.explanation())).isTrue();
            assertThat(worst.explanation().get(0)).startsWith("Not guaranteed");
        }
    }

    /** Same input, byte-identical CSV and JSON, from two independent runs of the whole pipeline. */
    @ParameterizedTest
    @MethodSource("dockline.fixtures.DemoFiles#missions")
    void replays_areDeterministic(Path file) throws Exception {
        Mission m1 = MissionLoader.load(file);
        Mission m2 = MissionLoader.load(file);
        Replay a = PlanReplaysProperties.replays(m1, PolicyChoice.SAFEST).replays().orElseThrow().worstCase();
        Replay b = PlanReplaysProperties.replays(m2, PolicyChoice.SAFEST).replays().orElseThrow().worstCase();
        assertThat(ReplayFormats.csv(a).getBytes()).isEqualTo(ReplayFormats.csv(b).getBytes());
        assertThat(ReplayFormats.json(m1, a)).isEqualTo(ReplayFormats.json(m2, b));
    }
}
