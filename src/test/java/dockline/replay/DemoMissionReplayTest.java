package dockline.replay;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.ReplayChecks;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.solve.reserve.ReserveOptions;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every demo mission: certified when guaranteed, a real breach when not, and byte-identical files. */
class DemoMissionReplayTest {

    static Stream<Path> demoMissions() throws IOException {
        return Files.list(Path.of("missions")).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    /**
     * Oracles: the threshold solver's own worst case (ReserveSolver's dynamic programme over its
     * ranks) for the worst-case replay; the arena's step semantics (maps/README.md, "Game semantics") for every row.
     */
    @ParameterizedTest
    @MethodSource("demoMissions")
    void guaranteed_isCertified_andWorstReplayMatchesSolver_elseCounterexampleBreaches(Path file) throws Exception {
        Mission m = MissionLoader.load(file);
        MissionReplays mr = MissionReplays.of(m, ReserveOptions.defaults());
        Replay worst = mr.worstCase();
        ReplayChecks.assertIsARun(mr.arena(), worst, mr.analysis().startUnits());
        int floor = mr.analysis().reserveUnits();
        if (mr.guaranteed()) {
            assertThat(mr.certified()).as(mr.certificate().orElseThrow().reason()).isTrue();
            assertThat(worst.minimumUnits()).isEqualTo(mr.analysis().worstCaseMinimumUnits().getAsInt());
            assertThat(mr.certificate().orElseThrow().worstMinimumUnits()).isEqualTo(worst.minimumUnits());
            assertThat(worst.ending()).isEqualTo(Replay.Ending.COMPLETE);
            Replay nominal = mr.nominal();
            ReplayChecks.assertIsARun(mr.arena(), nominal, mr.analysis().startUnits());
            assertThat(nominal.ending()).isEqualTo(Replay.Ending.COMPLETE);
            assertThat(nominal.minimumUnits()).isGreaterThanOrEqualTo(worst.minimumUnits());
        } else {
            dockline.solve.WinningRegion region = mr.analysis().region().orElseThrow();
            ReplayStep last = worst.last();
            int v = mr.arena().robotVertex(last.cell().index(mr.arena().width()), last.budgetLeft());
            boolean breach = worst.ending() == Replay.Ending.BELOW_FLOOR && last.batteryUnits() < floor;
            boolean stuck = worst.ending() != Replay.Ending.COMPLETE
                    && !region.robotWins(v, last.progressMask(), last.batteryUnits());
            assertThat(breach || stuck).as(String.join("\n", worst.explanation())).isTrue();
            assertThat(worst.explanation().get(0)).startsWith("Not guaranteed");
        }
    }

    /** Same input, byte-identical CSV and JSON, from two independent runs of the whole pipeline. */
    @ParameterizedTest
    @MethodSource("demoMissions")
    void replays_areDeterministic(Path file) throws Exception {
        Mission m1 = MissionLoader.load(file);
        Mission m2 = MissionLoader.load(file);
        Replay a = MissionReplays.of(m1, ReserveOptions.defaults()).worstCase();
        Replay b = MissionReplays.of(m2, ReserveOptions.defaults()).worstCase();
        assertThat(ReplayFormats.csv(a).getBytes()).isEqualTo(ReplayFormats.csv(b).getBytes());
        assertThat(ReplayFormats.json(m1, a)).isEqualTo(ReplayFormats.json(m2, b));
    }
}
