package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The rule of thumb with a deadline: besides the energy (cheapest run with no disturbance plus a margin of 20 % or
 * 30 % of the capacity, common practice), the shortest run with no disturbance plus the same percentage of the
 * deadline as a buffer (a fixed schedule buffer, common practice) must fit in the deadline. Hand-made lanes whose
 * figures are worked out by hand below: a straight lane of 9 moves at 1 Wh each (resolution 1 Wh, so units are
 * Wh) from the start at x = 1 to a dock at x = 10, one turn of 4 s per move; capacity 100 Wh. With no disturbance
 * the shortest run is the 9 moves straight to the dock: 9 turns, 9 Wh.
 */
class ReportRuleOfThumbDeadlineTest {

    @TempDir
    Path dir;

    private static final Pictures NO_PICTURES = ReportRuleOfThumbTest.NO_PICTURES;

    /** The lane with a budget and one event rule on the lane's cells x = 2 .. 9 (invented test data). */
    private Path lane(String name, int budget, String event) throws Exception {
        return ReportRuleOfThumbTest.lane(dir, name, budget, event);
    }

    private Path mission(Path map, String name, int startPercent, int reservePercent, String deadline)
            throws Exception {
        return ReportRuleOfThumbTest.mission(dir, map, name, startPercent, reservePercent, deadline);
    }

    private static final String DRAG = "kind: drag\n      where: lane\n      extra: 1";

    /**
     * Worked by hand: deadline 32 s = 8 turns of 4 s. The shortest run with no disturbance takes 9 turns > 8, so
     * the rule says "not safe" at both margins whatever the energy (60 - 10 = 50 Wh above the floor covers 9 Wh +
     * 20 or 30 Wh); the robot cannot finish in 8 turns either, so the verdict is "not guaranteed" and the rule
     * agrees. Buffers: ceil(8 * 20 / 100) = ceil(1.6) = 2 turns, ceil(8 * 30 / 100) = ceil(2.4) = 3 turns.
     */
    @Test
    void shortestRunLongerThanTheDeadline_theRuleSaysNotSafe() throws Exception {
        MissionResult r = MissionChecker.check(mission(lane("short", 2, DRAG), "too-short", 60, 10, "32 s"), 0,
                NO_PICTURES);
        assertThat(r.errors()).isEmpty();
        MissionResult.Figures f = r.figures();
        assertThat(f.guaranteed()).isFalse();
        for (RuleOfThumb rule : f.rules()) {
            RuleOfThumb.Time t = rule.deadline().orElseThrow();
            assertThat(t.deadlineTicks()).isEqualTo(8);
            assertThat(t.shortestRunTicks()).hasValue(9);
            assertThat(t.shortestRunTooLong()).isTrue();
            assertThat(t.fits()).isFalse();
            assertThat(rule.nominalNeedUnits()).hasValue(9);
            assertThat(rule.saysSafe()).isFalse();
            assertThat(rule.flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        }
        assertThat(f.rules()).extracting(rule -> rule.deadline().orElseThrow().marginTicks()).containsExactly(2, 3);
        // no start charge makes 9 moves fit in 8 turns
        assertThat(f.lowestStartUnits()).isEmpty();
    }

    /**
     * Worked by hand: deadline 50 s = 12.5 turns, rounded down to 12 (against the robot). Drags cost energy, not
     * time: the worst case finishes in 9 turns with 60 - 9 - 2 * 1 = 49 Wh >= 10 Wh, guaranteed. Energy fits at
     * both margins (50 >= 9 + 20 and 50 >= 9 + 30). Time: 20 %: 9 + ceil(2.4) = 9 + 3 = 12 <= 12, safe (agrees);
     * 30 %: 9 + ceil(3.6) = 9 + 4 = 13 > 12, not safe: the rule turns down a guaranteed mission on time alone.
     * Lowest start (closed form of a corridor with one way through): 10 + 9 + 2 = 21 Wh.
     */
    @Test
    void timeBufferAtThirtyPercent_turnsDownAGuaranteedMission() throws Exception {
        MissionResult r = MissionChecker.check(mission(lane("drags", 2, DRAG), "drags-in-time", 60, 10, "50 s"), 0,
                NO_PICTURES);
        MissionResult.Figures f = r.figures();
        assertThat(f.guaranteed()).isTrue();
        RuleOfThumb at20 = f.rules().get(0);
        RuleOfThumb at30 = f.rules().get(1);
        assertThat(at20.deadline().orElseThrow().deadlineTicks()).isEqualTo(12);
        assertThat(at20.deadline().orElseThrow().marginTicks()).isEqualTo(3);
        assertThat(at20.deadline().orElseThrow().fits()).isTrue();
        assertThat(at20.flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        assertThat(at30.deadline().orElseThrow().marginTicks()).isEqualTo(4);
        assertThat(at30.deadline().orElseThrow().fits()).isFalse();
        assertThat(at30.flag()).isEqualTo(RuleOfThumb.Flag.REFUSES_GUARANTEED);
        assertThat(f.lowestStartUnits()).hasValue(21);
    }

    /**
     * Worked by hand: momentary blockages on the lane, up to 12 of them, each costing one turn of waiting (1 Wh);
     * deadline 80 s = 20 turns. The building can block 12 times: 9 + 12 = 21 turns > 20, not guaranteed (energy
     * 9 + 12 = 21 Wh is no problem: 55 Wh above the floor). The rule counts no waiting: 20 %: 9 + ceil(4.0) = 13 <= 20;
     * 30 %: 9 + 6 = 15 <= 20; energy 55 >= 9 + 20 and 9 + 30. So it calls the mission safe at both margins: wrong.
     */
    @Test
    void blockagesCostTime_theRuleCallsAnUnsafeMissionSafe() throws Exception {
        MissionResult r = MissionChecker.check(mission(lane("blocked", 12,
                "kind: blockage\n      where: lane\n      duration: momentary"), "blocked-lane", 60, 5, "80 s"), 0, NO_PICTURES);
        assertThat(r.errors()).isEmpty();
        MissionResult.Figures f = r.figures();
        assertThat(f.guaranteed()).isFalse();
        assertThat(f.rules()).extracting(rule -> rule.deadline().orElseThrow().marginTicks()).containsExactly(4, 6);
        for (RuleOfThumb rule : f.rules()) {
            assertThat(rule.deadline().orElseThrow().shortestRunTicks()).hasValue(9);
            assertThat(rule.saysSafe()).isTrue();
            assertThat(rule.flag()).isEqualTo(RuleOfThumb.Flag.CALLS_UNSAFE_SAFE);
        }
        assertThat(r.notes()).anyMatch(n -> n.contains("shortest run with no disturbance (9 turns = 36 s)"));
    }

    /** The time half's arithmetic alone (worked by hand): buffers round up, no finishing run never fits. */
    @Test
    void judge_withADeadline() {
        // 0 %: no buffer; the run of 10 turns fits a deadline of 10 exactly
        RuleOfThumb exact = RuleOfThumb.judge(0, 100, 50, 10, OptionalInt.of(5), OptionalInt.of(10), OptionalInt.of(10),
                true);
        assertThat(exact.deadline().orElseThrow().marginTicks()).isZero();
        assertThat(exact.saysSafe()).isTrue();
        // 20 % of 11 turns: ceil(2.2) = 3; 8 + 3 = 11 fits, 9 + 3 = 12 does not
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(5), OptionalInt.of(11), OptionalInt.of(8), true)
                .saysSafe()).isTrue();
        RuleOfThumb late = RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(5), OptionalInt.of(11), OptionalInt.of(9),
                true);
        assertThat(late.deadline().orElseThrow().marginTicks()).isEqualTo(3);
        assertThat(late.saysSafe()).isFalse();
        assertThat(late.deadline().orElseThrow().shortestRunTooLong()).isFalse();
        assertThat(late.flag()).isEqualTo(RuleOfThumb.Flag.REFUSES_GUARANTEED);
        // energy short (50 - 10 = 40 < 25 + 20 = 45) though time fits: not safe, and not guaranteed: agrees
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(25), OptionalInt.of(11), OptionalInt.of(1), false)
                .flag()).isEqualTo(RuleOfThumb.Flag.AGREES);
        // no run finishes: not safe, whatever the deadline
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(5), OptionalInt.of(100), OptionalInt.empty(), false)
                .deadline().orElseThrow().fits()).isFalse();
        // without a deadline there is no time half
        assertThat(RuleOfThumb.judge(20, 100, 50, 10, OptionalInt.of(5), false).deadline()).isEmpty();
    }
}
