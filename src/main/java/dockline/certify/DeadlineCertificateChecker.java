package dockline.certify;

import dockline.arena.Arena;
import dockline.policy.Policy;

/**
 * Checks a deadline mission's policy on its own code path: the closed loop of the policy against every
 * disturbance choice ({@link CertificateChecker}: legal rows, never below the floor, never in an avoided zone,
 * no cycle, so every play completes), and then that its longest play, in turns, is within the deadline. One
 * turn is one step of the loop (a move, a wait or a charge, disturbed or not), so the longest play's length is
 * the longest path of the acyclic loop. Cost: that of {@link CertificateChecker}, O(N + E).
 */
public final class DeadlineCertificateChecker {

    private DeadlineCertificateChecker() {
    }

    /** Checks that every play of the policy docks within {@code deadlineTicks} turns and never breaks the floor. */
    public static RoundsCertificate check(Arena arena, Policy policy, int floor, int startLevel, int deadlineTicks) {
        Certificate c = CertificateChecker.check(arena, policy, floor, startLevel);
        if (!c.ok()) {
            return new RoundsCertificate(false, c.reason(), c.statesChecked(), c.worstMinimumUnits(), -1, 0);
        }
        if (c.longestRunSteps() > deadlineTicks) {
            return new RoundsCertificate(false, "a play of the policy takes " + c.longestRunSteps() + " turns, more than"
                    + " the deadline of " + deadlineTicks, c.statesChecked(), c.worstMinimumUnits(), -1, 0);
        }
        return new RoundsCertificate(true, c.reason() + "; every play completes within " + c.longestRunSteps()
                + " turns (deadline " + deadlineTicks + ")", c.statesChecked(), c.worstMinimumUnits(),
                c.longestRunSteps(), 0);
    }
}
