package dockline.solve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The demo missions' verdicts (explained in missions/README.md), with the solution checked by
 * {@link SolutionChecks}, a guaranteed policy walked independently by {@link PolicyWalk}, and the
 * size estimate held to be an upper bound that is not far off.
 */
class DemoMissionsTest {

    @ParameterizedTest
    @CsvSource({"missions/night-round.yaml, true", "missions/supply-run.yaml, true", "missions/late-return.yaml, false"})
    void demoMission_hasItsVerdict(String file, boolean guaranteed) throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(a.guaranteed()).as(file).isEqualTo(guaranteed);
        SolutionChecks.assertValidSolution(a.game(), a.solution(),
                new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()));
        if (guaranteed) {
            PolicyWalk.Result walk = new PolicyWalk(m, a.game().arena(), a.policy().orElseThrow()).run();
            assertThat(walk.lowestLevel()).isEqualTo(a.worstCaseMinimumUnits().getAsInt());
            assertThat(walk.situations()).hasSize(a.policy().get().size());
        }
        assertThat(a.highestGuaranteedReserveUnits()).isPresent();
        assertThat(a.highestGuaranteedReserveUnits().getAsInt() >= a.reserveUnits()).isEqualTo(guaranteed);
        // the estimate bounds the game from above, and (a later target is 20%) is within a factor of 2
        assertThat(a.estimate().vertices()).isBetween(a.productVertices(), 2 * a.productVertices());
        assertThat(a.estimate().edges()).isBetween(a.productEdges(), 2 * a.productEdges());
    }
}
