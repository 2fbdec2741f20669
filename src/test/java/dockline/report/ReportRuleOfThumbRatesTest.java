package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.RandomMissions;
import dockline.model.Mission;
import dockline.model.Timing;
import dockline.plan.Plan;
import dockline.replay.Replay;
import java.math.BigDecimal;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/**
 * The rule of thumb against the verdict on 400 random small missions (invented data, {@link RandomMissions}).
 * What must hold whatever the missions: with no margin the rule never turns down a guaranteed mission (a
 * budget of 0 is one of the disturbance sequences the verdict covers, so a guaranteed mission's cheapest
 * run with no disturbance fits above the floor), and a larger margin never calls safe what a smaller one
 * does not. The rates are printed as measured figures (they describe these random missions only). The same
 * holds for missions with a deadline, where the rule also sets the shortest run with no disturbance against the
 * deadline (the undisturbed play of a guaranteed policy is such a run, so it is no longer than the deadline).
 */
class ReportRuleOfThumbRatesTest {

    private static final Pictures NONE = new Pictures() {
        @Override
        public byte[] oneTrip(Plan plan) {
            return null;
        }

        @Override
        public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) {
            return null;
        }
    };

    @Test
    void noMargin_neverRefusesAGuaranteedMission_andMarginsAreMonotone() {
        int[] margins = {0, 20, 30};
        int guaranteed = 0;
        int unsafe = 0;
        int[] unsafeCalledSafe = new int[margins.length];
        int[] guaranteedRefused = new int[margins.length];
        for (long seed = 1; seed <= 400; seed++) {
            Mission m = RandomMissions.fromSeed(seed);
            MissionResult r = MissionChecker.check(m, 0, NONE);
            assertThat(r.errors()).as("seed %d", seed).isEmpty();
            MissionResult.Figures f = r.figures();
            OptionalInt need = f.rules().get(0).nominalNeedUnits();
            boolean previousSafe = true;
            for (int i = 0; i < margins.length; i++) {
                RuleOfThumb rule = RuleOfThumb.judge(margins[i], f.capacityUnits(), f.startUnits(), f.reserveUnits(),
                        need, f.guaranteed());
                assertThat(!rule.saysSafe() || previousSafe).as("seed %d: margins are monotone", seed).isTrue();
                previousSafe = rule.saysSafe();
                unsafeCalledSafe[i] += rule.flag() == RuleOfThumb.Flag.CALLS_UNSAFE_SAFE ? 1 : 0;
                guaranteedRefused[i] += rule.flag() == RuleOfThumb.Flag.REFUSES_GUARANTEED ? 1 : 0;
            }
            if (f.guaranteed()) {
                guaranteed++;
            } else {
                unsafe++;
            }
        }
        assertThat(guaranteedRefused[0]).as("no margin never refuses a guaranteed mission").isZero();
        // coverage: both verdicts occur often enough for the rates to mean something
        assertThat(guaranteed).isGreaterThan(40);
        assertThat(unsafe).isGreaterThan(40);
        StringBuilder sb = new StringBuilder("rule of thumb on 400 random small missions (" + guaranteed
                + " guaranteed, " + unsafe + " not):");
        for (int i = 0; i < margins.length; i++) {
            sb.append(String.format(java.util.Locale.ROOT, " margin %d %%: %d of %d unsafe called safe, %d of %d"
                    + " guaranteed refused;", margins[i], unsafeCalledSafe[i], unsafe, guaranteedRefused[i], guaranteed));
        }
        System.out.println(sb);
    }

    /**
     * 300 random small missions with a deadline of 1 to 12 turns of 1 s: with no margin the rule never refuses a
     * guaranteed one, margins are monotone, and the time half only ever turns "safe" into "not safe". Printed: how
     * often the rule calls an unsafe mission safe with and without its time half.
     */
    @Test
    void withADeadline_noMarginNeverRefusesAGuaranteedMission_andTheTimeHalfOnlyRemovesSafeCalls() {
        int[] margins = {0, 20, 30};
        int guaranteed = 0;
        int unsafe = 0;
        int tooLong = 0;
        int[] unsafeCalledSafe = new int[margins.length];
        int[] energyOnlyUnsafeCalledSafe = new int[margins.length];
        int[] guaranteedRefused = new int[margins.length];
        for (long seed = 1; seed <= 300; seed++) {
            Mission m = RandomMissions.fromSeed(seed);
            int t = 1 + new java.util.Random(seed * 31 + 7).nextInt(12);
            m = m.withTiming(new Timing(BigDecimal.ONE, BigDecimal.valueOf(t)));
            MissionResult r = MissionChecker.check(m, 0, NONE);
            assertThat(r.errors()).as("seed %d", seed).isEmpty();
            MissionResult.Figures f = r.figures();
            RuleOfThumb.Time time = f.rules().get(0).deadline().orElseThrow();
            assertThat(time.deadlineTicks()).as("seed %d: the deadline in whole turns of 1 s", seed).isEqualTo(t);
            OptionalInt need = f.rules().get(0).nominalNeedUnits();
            boolean previousSafe = true;
            for (int i = 0; i < margins.length; i++) {
                RuleOfThumb rule = RuleOfThumb.judge(margins[i], f.capacityUnits(), f.startUnits(), f.reserveUnits(),
                        need, OptionalInt.of(t), time.shortestRunTicks(), f.guaranteed());
                RuleOfThumb energyOnly = RuleOfThumb.judge(margins[i], f.capacityUnits(), f.startUnits(),
                        f.reserveUnits(), need, f.guaranteed());
                assertThat(!rule.saysSafe() || previousSafe).as("seed %d: margins are monotone", seed).isTrue();
                assertThat(!rule.saysSafe() || energyOnly.saysSafe()).as("seed %d: time only removes", seed).isTrue();
                previousSafe = rule.saysSafe();
                unsafeCalledSafe[i] += rule.flag() == RuleOfThumb.Flag.CALLS_UNSAFE_SAFE ? 1 : 0;
                energyOnlyUnsafeCalledSafe[i] += energyOnly.flag() == RuleOfThumb.Flag.CALLS_UNSAFE_SAFE ? 1 : 0;
                guaranteedRefused[i] += rule.flag() == RuleOfThumb.Flag.REFUSES_GUARANTEED ? 1 : 0;
            }
            tooLong += time.shortestRunTooLong() ? 1 : 0;
            if (f.guaranteed()) {
                guaranteed++;
            } else {
                unsafe++;
            }
        }
        assertThat(guaranteedRefused[0]).as("no margin never refuses a guaranteed mission").isZero();
        // coverage: both verdicts occur, and so do deadlines that even the undisturbed shortest run misses
        assertThat(guaranteed).isGreaterThan(30);
        assertThat(unsafe).isGreaterThan(30);
        assertThat(tooLong).isGreaterThan(10);
        StringBuilder sb = new StringBuilder("rule of thumb on 300 random small missions with a deadline (" + guaranteed
                + " guaranteed, " + unsafe + " not; " + tooLong + " where even the shortest run misses the deadline):");
        for (int i = 0; i < margins.length; i++) {
            sb.append(String.format(java.util.Locale.ROOT, " margin %d %%: %d of %d unsafe called safe (energy alone:"
                    + " %d), %d of %d guaranteed refused;", margins[i], unsafeCalledSafe[i], unsafe,
                    energyOnlyUnsafeCalledSafe[i], guaranteedRefused[i], guaranteed));
        }
        System.out.println(sb);
    }
}
