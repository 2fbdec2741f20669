package dockline.certify;

/**
 * The outcome of checking a patrol's or a deadline mission's policy independently of the solver.
 *
 * @param ok                 every play of the policy keeps its promise (patrol: every checkpoint visited
 *                           again and again, never below the floor; deadline: completes in time, never
 *                           below the floor)
 * @param reason             in words: what was checked, or what is wrong and where
 * @param statesChecked      closed-loop situations explored
 * @param worstMinimumUnits  the lowest level of any play (the start counts); on failure the lowest seen
 * @param longestLapTicks    patrol: the most turns between two completed laps; deadline: the most turns any
 *                           play takes to complete; -1 when not {@code ok}
 * @param wayInTicks         patrol: the most turns until the first completed lap; deadline: 0
 */
public record RoundsCertificate(boolean ok, String reason, int statesChecked, int worstMinimumUnits,
                                int longestLapTicks, int wayInTicks) {
}
