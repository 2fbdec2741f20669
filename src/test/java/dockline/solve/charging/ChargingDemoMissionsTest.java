package dockline.solve.charging;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.util.MonotoneSearch;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The charging route on the demo missions. Oracles: the figures quoted in missions/README.md (verdict, highest floor and,
 * where quoted, the lowest start; also held by the stored route's DemoMissionsTest), and the stored product route (product
 * in CSR arrays and the reference attractor, Grädel, Thomas, Wilke (eds., 2002), LNCS 2500, ch. 2) for the
 * lowest starting charge, found by bisection over its verdicts.
 */
class ChargingDemoMissionsTest {

    @ParameterizedTest
    @CsvSource({"missions/night-round.yaml, true, 83, -1", "missions/supply-run.yaml, true, 40, -1",
            // lasting fire doors (missions/README.md): no floor and no starting charge is enough
            "missions/late-return.yaml, false, -1, -2", "missions/aisle-return.yaml, true, 23, 67",
            // a lasting shut fire door: highest floor 4 units (missions/README.md)
            "missions/vault-check.yaml, false, 4, -1"})
    void demoMission_sameAnswersAsTheStoredRoute(String file, boolean guaranteed, int highest, int quotedLowest)
            throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        ChargingRoute.Analysis a = ChargingRoute.analyse(m);
        assertThat(a.guaranteed()).as(file).isEqualTo(guaranteed);
        assertThat(a.highestFloorUnits().orElse(-1)).as(file).isEqualTo(highest);

        if (quotedLowest == -2) {
            // quoted in missions/README.md: no starting charge helps (the stored product of every start is over the
            // memory budget here, so the quote is the oracle)
            assertThat(a.lowestStartUnits()).as(file).isEmpty();
            return;
        }
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int floor = m.reserveUnits();
        int cap = m.capacityUnits();
        int lowest = MonotoneSearch.lowest(floor, cap + 1, s -> {
            ProductGame game = ProductGame.fromStart(arena, goal, new ReserveMonitor(floor, cap, s),
                    ProductOptions.defaults());
            return new AttractorSolver(game.graph()).solve().winning(game.start());
        });
        assertThat(a.lowestStartUnits().orElse(cap + 1)).as(file).isEqualTo(lowest);
        if (quotedLowest >= 0) {
            // the lowest start quoted in missions/README.md
            assertThat(a.lowestStartUnits().orElse(-1)).as(file).isEqualTo(quotedLowest);
        }
    }
}
