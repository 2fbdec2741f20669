package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.RandomMissions;
import dockline.model.Mission;
import dockline.model.Timing;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
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

    private static final Pictures NONE = NoPictures.NONE;

    /** The margins the rates are measured at: none, and the report's two. */
    private static final int[] MARGINS = {0, 20, 30};

    /** The rule's answers at each margin over a run of missions, with the checks that hold for every mission. */
    private static final class Tally {
        int guaranteed;
        int unsafe;
        final int[] unsafeCalledSafe = new int[MARGINS.length];
        final int[] guaranteedRefused = new int[MARGINS.length];

        /** One mission's rules, one per margin of {@link #MARGINS} in order: they must be monotone. */
        void add(long seed, boolean verdict, List<RuleOfThumb> rules) {
            boolean previousSafe = true;
            for (int i = 0; i < MARGINS.length; i++) {
                RuleOfThumb rule = rules.get(i);
                assertThat(!rule.saysSafe() || previousSafe).as("seed %d: margins are monotone", seed).isTrue();
                previousSafe = rule.saysSafe();
                unsafeCalledSafe[i] += rule.flag() == RuleOfThumb.Flag.CALLS_UNSAFE_SAFE ? 1 : 0;
                guaranteedRefused[i] += rule.flag() == RuleOfThumb.Flag.REFUSES_GUARANTEED ? 1 : 0;
            }
            if (verdict) {
                guaranteed++;
            } else {
                unsafe++;
            }
        }

        /** With no margin the rule never refuses a guaranteed mission; both verdicts occur often enough. */
        void checkNoMarginNeverRefuses(int atLeastEach) {
            assertThat(guaranteedRefused[0]).as("no margin never refuses a guaranteed mission").isZero();
            assertThat(guaranteed).isGreaterThan(atLeastEach);
            assertThat(unsafe).isGreaterThan(atLeastEach);
        }

        /** The rate at margin {@code i} in words, with {@code alsoCalledSafe} (or null) beside the unsafe count. */
        String rate(int i, String alsoCalledSafe) {
            return String.format(java.util.Locale.ROOT, " margin %d %%: %d of %d unsafe called safe%s, %d of %d"
                    + " guaranteed refused;", MARGINS[i], unsafeCalledSafe[i], unsafe,
                    alsoCalledSafe == null ? "" : " (" + alsoCalledSafe + ")", guaranteedRefused[i], guaranteed);
        }
    }

    @Test
    void noMargin_neverRefusesAGuaranteedMission_andMarginsAreMonotone() {
        Tally tally = new Tally();
        for (long seed = 1; seed <= 400; seed++) {
            Mission m = RandomMissions.fromSeed(seed);
            MissionResult r = MissionChecker.check(m, 0, NONE);
            assertThat(r.errors()).as("seed %d", seed).isEmpty();
            MissionResult.Figures f = r.figures();
            OptionalInt need = f.rules().get(0).nominalNeedUnits();
            List<RuleOfThumb> rules = new ArrayList<>();
            for (int pct : MARGINS) {
                rules.add(RuleOfThumb.judge(pct, f.capacityUnits(), f.startUnits(), f.reserveUnits(), need,
                        f.guaranteed()));
            }
            tally.add(seed, f.guaranteed(), rules);
        }
        tally.checkNoMarginNeverRefuses(40);
        StringBuilder sb = new StringBuilder("rule of thumb on 400 random small missions (" + tally.guaranteed
                + " guaranteed, " + tally.unsafe + " not):");
        for (int i = 0; i < MARGINS.length; i++) {
            sb.append(tally.rate(i, null));
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
        Tally tally = new Tally();
        Tally energyOnly = new Tally();
        int tooLong = 0;
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
            List<RuleOfThumb> rules = new ArrayList<>();
            List<RuleOfThumb> energy = new ArrayList<>();
            for (int pct : MARGINS) {
                RuleOfThumb rule = RuleOfThumb.judge(pct, f.capacityUnits(), f.startUnits(), f.reserveUnits(), need,
                        OptionalInt.of(t), time.shortestRunTicks(), f.guaranteed());
                RuleOfThumb alone = RuleOfThumb.judge(pct, f.capacityUnits(), f.startUnits(), f.reserveUnits(), need,
                        f.guaranteed());
                assertThat(!rule.saysSafe() || alone.saysSafe()).as("seed %d: time only removes", seed).isTrue();
                rules.add(rule);
                energy.add(alone);
            }
            tally.add(seed, f.guaranteed(), rules);
            energyOnly.add(seed, f.guaranteed(), energy);
            tooLong += time.shortestRunTooLong() ? 1 : 0;
        }
        tally.checkNoMarginNeverRefuses(30);
        // coverage: deadlines that even the undisturbed shortest run misses occur too
        assertThat(tooLong).isGreaterThan(10);
        StringBuilder sb = new StringBuilder("rule of thumb on 300 random small missions with a deadline ("
                + tally.guaranteed + " guaranteed, " + tally.unsafe + " not; " + tooLong + " where even the shortest"
                + " run misses the deadline):");
        for (int i = 0; i < MARGINS.length; i++) {
            sb.append(tally.rate(i, "energy alone: " + energyOnly.unsafeCalledSafe[i]));
        }
        System.out.println(sb);
    }
}
