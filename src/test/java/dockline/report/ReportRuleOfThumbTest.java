package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The rule of thumb beside the verdict (common practice: the cheapest run with no disturbance plus a fixed
 * margin of 20 % or 30 % of the capacity must fit in the charge above the floor), on hand-made missions
 * whose figures have a closed form: a straight lane of 9 moves at 1 Wh each (resolution 1 Wh, so units are
 * Wh) to a dock at its end, with drags of a fixed extra on the lane and a budget of K = 2. The cheapest run
 * with no disturbance needs 9 Wh; the worst case is 9 + K * extra Wh below the start, and the mission is
 * guaranteed exactly when start - 9 - K * extra >= floor (closed form of a corridor with one way through).
 */
class ReportRuleOfThumbTest {

    @TempDir
    Path dir;

    /** Pictures that draw nothing (the rule of thumb tests read figures only). */
    static final Pictures NO_PICTURES = new Pictures() {
        @Override
        public byte[] oneTrip(Plan plan) {
            return new byte[] {1};
        }

        @Override
        public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) {
            return new byte[] {1};
        }
    };

    static Path lane(Path dir, String name, int extraWh) throws Exception {
        return lane(dir, name, 2, "kind: drag\n      where: lane\n      extra: " + extraWh);
    }

    /**
     * The lane with a disturbance budget and one event rule ({@code event}: its keys, the first line after the
     * list's dash, the others indented by six spaces), e.g. on the zone {@code lane} of the cells x = 2 .. 9.
     */
    static Path lane(Path dir, String name, int budget, String event) throws Exception {
        Path map = dir.resolve(name + ".yaml");
        Files.writeString(map, """
                # a hand-made test lane (invented data)
                name: Test lane
                cell-size: 1
                legend:
                  "#": wall
                  ".": tile
                  "C": {surface: tile, dock: true}
                plan: |
                  ############
                  #.........C#
                  ############
                zones:
                  lane: {from: [2, 1], to: [9, 1]}
                disturbances:
                  budget: %d
                  events:
                    - %s
                """.formatted(budget, event));
        return map;
    }

    static Path mission(Path dir, Path map, String name, int startPercent, int reservePercent) throws Exception {
        return mission(dir, map, name, startPercent, reservePercent, null);
    }

    /** The lane's mission; with a {@code deadline} (e.g. {@code 50 s}) also a tick of 4 s. */
    static Path mission(Path dir, Path map, String name, int startPercent, int reservePercent, String deadline)
            throws Exception {
        Path m = dir.resolve(name + ".yaml");
        Files.writeString(m, """
                name: %s
                map: %s
                robot:
                  capacity: 100
                  resolution: 1
                  move-energy:
                    tile: 1
                  wait-energy: 1
                  charge-rate: 1
                  neighbourhood: 4
                %sstart:
                  cell: [1, 1]
                  charge: %d%%
                reserve: %d%%
                %stasks:
                  finish-on-dock: true
                objective:
                  kind: reserve
                """.formatted(name, map.getFileName(), deadline == null ? "" : "  tick: 4 s\n", startPercent,
                reservePercent, deadline == null ? "" : "deadline: " + deadline + "\n"));
        return m;
    }

    /** Heavy drags (25 Wh each): 60 Wh start, 5 Wh floor; the rule at 20 % and 30 % calls it safe, it is not. */
    @Test
    void heavyDrags_theRuleCallsAnUnsafeMissionSafe_atBothMargins() throws Exception {
        Path m = mission(dir, lane(dir, "heavy", 25), "heavy-run", 60, 5);
        MissionResult r = MissionChecker.check(m, 0, NO_PICTURES);
        assertThat(r.errors()).isEmpty();
        MissionResult.Figures f = r.figures();
        // closed form: 60 - 9 - 2 * 25 = 1 < 5, not guaranteed; the highest floor is that 1 Wh
        assertThat(f.guaranteed()).isFalse();
        assertThat(f.highestFloorUnits()).hasValue(1);
        for (RuleOfThumb rule : f.rules()) {
            assertThat(rule.nominalNeedUnits()).hasValue(9);
            assertThat(rule.saysSafe()).as("%d %%: 55 >= 9 + margin", rule.marginPercent()).isTrue();
            assertThat(rule.flag()).isEqualTo(RuleOfThumb.Flag.CALLS_UNSAFE_SAFE);
        }
        assertThat(f.rules()).extracting(RuleOfThumb::marginUnits).containsExactly(20, 30);
    }

    /**
     * Light drags (1 Wh each): 40 Wh start, 10 Wh floor: guaranteed with a worst case of 40 - 9 - 2 = 29 Wh;
     * the rule says safe at 20 % (30 >= 9 + 20) and turns it down at 30 % (30 < 9 + 30).
     */
    @Test
    void lightDrags_theRuleAtThirtyPercentTurnsDownAGuaranteedMission() throws Exception {
        Path m = mission(dir, lane(dir, "light", 1), "light-run", 40, 10);
        MissionResult r = MissionChecker.check(m, 0, NO_PICTURES);
        MissionResult.Figures f = r.figures();
        assertThat(f.guaranteed()).isTrue();
        assertThat(f.lowestLevelUnits()).hasValue(29);
        assertThat(f.rules().get(0).flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        assertThat(f.rules().get(0).saysSafe()).isTrue();
        assertThat(f.rules().get(1).flag()).isEqualTo(RuleOfThumb.Flag.REFUSES_GUARANTEED);
        assertThat(f.rules().get(1).saysSafe()).isFalse();
        // the lowest start that guarantees the floor: 10 + 9 + 2 = 21 Wh (closed form)
        assertThat(f.lowestStartUnits()).hasValue(21);
        assertThat(r.status()).isEqualTo(MissionResult.Status.GUARANTEED);
        assertThat(r.disturbances()).contains("Up to 2 disturbances").contains("drag");
    }

    /** The rule's arithmetic alone: the margin rounds up (against the robot), and a run that cannot finish is unsafe. */
    @Test
    void judge_roundsTheMarginUp_andHasFourOutcomes() {
        assertThat(RuleOfThumb.judge(20, 101, 100, 0, OptionalInt.of(0), true).marginUnits()).isEqualTo(21);
        assertThat(RuleOfThumb.judge(30, 10, 10, 0, OptionalInt.of(0), true).marginUnits()).isEqualTo(3);
        // exactly enough: 50 - 10 = 40 = 20 + 20
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(20), true).flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(21), true).flag())
                .isEqualTo(RuleOfThumb.Flag.REFUSES_GUARANTEED);
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(20), false).flag())
                .isEqualTo(RuleOfThumb.Flag.CALLS_UNSAFE_SAFE);
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.empty(), false).flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.empty(), false).saysSafe()).isFalse();
    }
}
