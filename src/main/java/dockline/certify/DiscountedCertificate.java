package dockline.certify;

import dockline.model.Objective;
import java.util.Optional;

/**
 * The outcome of checking a policy for a discounted mission independently of the solver.
 *
 * @param ok                {@code true} when every run of the policy, under every disturbance choice,
 *                          completes the mission with its discounted score meeting the threshold (and,
 *                          when {@code reserveKept}, the battery never below the floor) and never
 *                          enters an avoided zone
 * @param reason            in words: what was checked, or what is wrong and where (with a trace)
 * @param statesChecked     closed-loop situations explored
 * @param worstScore        when {@code ok}: the exact lowest discounted score over all runs
 * @param worstMinimumUnits when {@code ok}: the lowest battery level over all runs (the start counts);
 *                          otherwise the lowest level seen before the search stopped
 * @param longestRunSteps   the most steps any run takes to complete, or -1 when not {@code ok}
 * @param objective         discount, threshold and relation checked against
 * @param reserveKept       whether the reserve floor was checked
 * @param floorUnits        the floor checked against (0 when not kept)
 * @param startUnits        the starting level checked from
 */
public record DiscountedCertificate(boolean ok, String reason, int statesChecked, Optional<ExactScore> worstScore,
                                    int worstMinimumUnits, int longestRunSteps, Objective.Discounted objective,
                                    boolean reserveKept, int floorUnits, int startUnits) {
}
