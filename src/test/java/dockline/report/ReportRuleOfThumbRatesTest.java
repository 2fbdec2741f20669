package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.RandomMissions;
import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/**
 * The rule of thumb against the verdict on 400 random small missions (invented data, {@link RandomMissions}).
 * What must hold whatever the missions: with no margin the rule never turns down a guaranteed mission (a
 * budget of 0 is one of the disturbance sequences the verdict covers, so a guaranteed mission's cheapest
 * run with no disturbance fits above the floor), and a larger margin never calls safe what a smaller one
 * does not. The rates are printed as measured figures (they describe these random missions only).
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
}
