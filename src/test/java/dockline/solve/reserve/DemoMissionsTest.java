package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.PolicyWalk;
import dockline.solve.SolutionChecks;
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
    @CsvSource({"missions/night-round.yaml, true, 49, 83, 0", "missions/supply-run.yaml, true, 24, 40, 0",
            // lasting fire doors: a shut bridge door cuts off both docks, no charge is enough
            "missions/late-return.yaml, false, -1, -1, " + ChargeNeeded.IMPOSSIBLE,
            // lasting fire door: 38 Wh round the court + the 10 Wh floor is more than the 40 Wh capacity
            "missions/vault-check.yaml, false, -1, 4, " + ChargeNeeded.IMPOSSIBLE})
    void demoMission_hasItsVerdict_storedRoute(String file, boolean guaranteed, int worst, int highest, int need)
            throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT));
        assertThat(a.guaranteed()).as(file).isEqualTo(guaranteed);
        // the figures quoted in missions/README.md
        assertThat(a.worstCaseMinimumUnits().orElse(-1)).as(file).isEqualTo(worst);
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as(file).isEqualTo(highest);
        SolutionChecks.assertValidSolution(a.game(), a.solution(),
                new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()));
        if (guaranteed) {
            PolicyWalk.Result walk = new PolicyWalk(m, a.game().arena(), a.policy().orElseThrow()).run();
            assertThat(walk.lowestLevel()).isEqualTo(a.worstCaseMinimumUnits().getAsInt());
            assertThat(walk.situations()).hasSize(a.policy().get().size());
        } else {
            // quoted in missions/README.md: the start charge the heat map asks for
            ReserveAnalysis heat = ReserveSolver.analyse(m, ReserveOptions.defaults().withChargeNeeded(true)
                    .withHighestReserve(false));
            assertThat(heat.chargeNeeded().orElseThrow().unitsNeeded(m.start(), m.map().disturbances().budget(), 0))
                    .isEqualTo(need);
        }
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1) >= a.reserveUnits()).isEqualTo(guaranteed);
        // the estimate bounds the game from above, and (a later target is 20%) is within a factor of 2
        assertThat(a.estimate().vertices()).isBetween(a.productVertices(), 2 * a.productVertices());
        assertThat(a.estimate().edges()).isBetween(a.productEdges(), 2 * a.productEdges());
    }
}
