package dockline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.replay.Replay;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The planner's charging route on the demo missions with charging. Oracles: the figures quoted in
 * missions/README.md (verdict, worst level of the safest policy, highest floor), and the stored product route
 * ({@code --method stored}: arena × goal × battery levels in CSR arrays, compact attractor) on the same mission.
 * Also the replays made from the charging route: the worst case of the certified threshold policy reaches the
 * highest floor, and a mission that is not guaranteed gets a counterexample that breaches the floor.
 */
class ChargingDemoPlanTest {

    @ParameterizedTest
    @CsvSource({"missions/night-round.yaml, true, 83, 83", "missions/supply-run.yaml, true, 40, 40",
            // a lasting shut fire door: not guaranteed, highest floor 4 units (missions/README.md)
            "missions/vault-check.yaml, false, -1, 4"})
    void demo_quotedFigures_andTheStoredRoute(String file, boolean guaranteed, int worst, int highest)
            throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        Plan ch = MissionPlanner.plan(m, PlanOptions.of(new Route.Charging(true, true, false)));
        assertThat(ch.method()).isEqualTo(Method.CHARGING);
        assertThat(MissionPlanner.plan(m, PlanOptions.defaults(m)).method()).as("default route").isEqualTo(Method.CHARGING);
        assertThat(ch.guaranteed()).as(file).isEqualTo(guaranteed);
        assertThat(ch.highestFloorUnits().orElse(-1)).as(file).isEqualTo(highest);
        assertThat(ch.lowestLevelUnits().orElse(-1)).as(file).isEqualTo(worst);

        Plan st = MissionPlanner.plan(m, PlanOptions.of(new Route.Stored(PolicyChoice.SAFEST, null)));
        assertThat(st.guaranteed()).as(file).isEqualTo(ch.guaranteed());
        assertThat(st.highestFloorUnits()).as(file).isEqualTo(ch.highestFloorUnits());
        assertThat(st.lowestLevelUnits()).as(file).isEqualTo(ch.lowestLevelUnits());
        assertThat(ch.suggestions().stream().map(s -> s.kind()).toList()).as(file)
                .isEqualTo(st.suggestions().stream().map(s -> s.kind()).toList());
        assertThat(ch.suggestions().stream().map(s -> s.to()).toList()).as(file)
                .isEqualTo(st.suggestions().stream().map(s -> s.to()).toList());

        Replay r = ch.replays().orElseThrow().worstCase();
        if (guaranteed) {
            assertThat(ch.certification().ok()).as(file).isTrue();
            assertThat(r.minimumUnits()).as(file).isEqualTo(worst);
            assertThat(r.ending()).isEqualTo(Replay.Ending.COMPLETE);
        } else {
            assertThat(r.kind()).isEqualTo(Replay.Kind.COUNTEREXAMPLE);
            assertThat(r.ending()).isNotEqualTo(Replay.Ending.COMPLETE);
        }
    }
}
