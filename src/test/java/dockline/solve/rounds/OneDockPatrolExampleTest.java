package dockline.solve.rounds;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.TinyMission;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A patrol with one checkpoint that is a dock and no disturbances is guaranteed exactly when the robot can
 * reach the dock above the floor and then stay charged there. Worked by hand (invented data, 1 unit = 1 Wh):
 *
 * <pre>
 *   #####
 *   #D..#     dock at 1:1 (the checkpoint "home"), tile at 2:1 and 3:1; every move and every wait costs 1 Wh
 *   #####     the robot starts at 3:1
 * </pre>
 *
 * <ul>
 *   <li>A. charge rate 1 Wh, start 5 Wh, floor 2 Wh: two moves to the dock (5 → 4 → 3, never below 2); on
 *       arrival the lap is complete; each charge step occupies the dock again, so a lap is one turn and the
 *       level climbs to the capacity and stays there. Guaranteed; lowest level 3; first lap within 2 turns,
 *       longest lap 1 turn. Highest floor: the way in ends at 5 − 2 = 3, so 3.</li>
 *   <li>B. the same with start 3 Wh: the second move ends at 1 &lt; 2. Not guaranteed; highest floor 3 − 2 = 1.</li>
 *   <li>C. no charging, wait 1 Wh: every turn costs at least 1 Wh and nothing gains any, so every infinite play
 *       drains the battery below any floor, even 0. Not guaranteed; no floor at all.</li>
 *   <li>D. no charging, wait 0 Wh: on the dock the robot waits for ever at 3 Wh, revisiting it every turn.
 *       Guaranteed with the floor 2; lowest level 3; highest floor 3.</li>
 * </ul>
 */
class OneDockPatrolExampleTest {

    private static final long BUDGET = 1L << 28;

    private static Mission patrol(int chargeWh, int waitWh, int startWh) {
        Mission m = TinyMission.plan("#####", "#D..#", "#####").zone("home", "1:1").costs(1, 1, waitWh, chargeWh)
                .capacity(10).start("3:1", startWh).reserve(2).build();
        BuildingMap map = m.map();
        return new Mission(m.name(), null, map, m.robot(), m.start(), m.startCharge(), m.reserve(),
                Tasks.patrol(List.of("home"), List.of()), m.objective(), new Timing(BigDecimal.valueOf(4), null));
    }

    @Test
    void reachableAndCharging_isGuaranteed() {
        PatrolAnalysis a = PatrolSolver.analyse(patrol(1, 1, 5), BUDGET);
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.lowestLevelUnits().getAsInt()).isEqualTo(3);
        assertThat(a.wayInTicks().getAsInt()).isEqualTo(2);
        assertThat(a.longestLapTicks().getAsInt()).isEqualTo(1);
        assertThat(a.highestGuaranteedReserveUnits().getAsInt()).isEqualTo(3);
    }

    @Test
    void notReachableAboveTheFloor_isNotGuaranteed() {
        PatrolAnalysis a = PatrolSolver.analyse(patrol(1, 1, 3), BUDGET);
        assertThat(a.guaranteed()).isFalse();
        assertThat(a.highestGuaranteedReserveUnits().getAsInt()).isEqualTo(1);
    }

    @Test
    void cannotStayCharged_isNotGuaranteedAtAnyFloor() {
        PatrolAnalysis a = PatrolSolver.analyse(patrol(0, 1, 5), BUDGET);
        assertThat(a.guaranteed()).isFalse();
        assertThat(a.highestGuaranteedReserveUnits()).isEmpty();
    }

    @Test
    void idleForFree_staysCharged() {
        PatrolAnalysis a = PatrolSolver.analyse(patrol(0, 0, 5), BUDGET);
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.lowestLevelUnits().getAsInt()).isEqualTo(3);
        assertThat(a.highestGuaranteedReserveUnits().getAsInt()).isEqualTo(3);
    }
}
