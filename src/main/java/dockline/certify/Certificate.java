package dockline.certify;

/**
 * The outcome of checking a policy independently of the solver.
 *
 * @param ok                 {@code true} when every run of the policy, under every disturbance choice,
 *                           keeps the battery at or above the floor, never enters an avoided zone and
 *                           completes the mission
 * @param reason             in words: what was checked, or what is wrong and where (with a trace)
 * @param statesChecked      number of closed-loop states (robot situations) explored
 * @param worstMinimumUnits  the lowest battery level over all runs of the closed loop (the start level
 *                           counts); on failure the lowest level seen before the search stopped,
 *                           including the breach
 * @param longestRunSteps    the most steps any run takes to complete, or -1 when not {@code ok}
 * @param floorUnits         the reserve floor checked against
 * @param startUnits         the starting level checked from
 */
public record Certificate(boolean ok, String reason, int statesChecked, int worstMinimumUnits,
                          int longestRunSteps, int floorUnits, int startUnits) {
}
