package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.model.Mission;
import dockline.policy.Policy;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What {@link PatrolSolver} found for a patrol.
 *
 * @param mission         the mission
 * @param arena           its arena
 * @param guaranteed      every checkpoint visited infinitely often, never below the floor, whatever happens
 * @param reserveUnits    the floor
 * @param startUnits      the starting level
 * @param capacityUnits   the capacity
 * @param policy          the policy, when guaranteed
 * @param lowestLevelUnits the lowest level ever reached over the infinite play under the policy, when guaranteed
 * @param longestLapTicks the most turns one lap of the policy can take (from one completed lap to the next)
 * @param wayInTicks      the most turns until the first lap is complete
 * @param highestGuaranteedReserveUnits the highest floor at which the patrol is still guaranteed
 * @param policyFloorUnits the floor the policy was made for: the mission's, or the highest one (the safest policy)
 * @param productVertices vertices of the stored product
 * @param productEdges    its edges
 * @param boundVertices   the upper bound stated before the build
 * @param rounds          rounds of the Büchi fixpoint
 * @param loopStates      situations of the policy's closed loop
 * @param millis          time taken in all (the bisection included)
 */
public record PatrolAnalysis(Mission mission, Arena arena, boolean guaranteed, int reserveUnits, int startUnits,
                             int capacityUnits, Optional<Policy> policy, OptionalInt lowestLevelUnits,
                             OptionalInt longestLapTicks, OptionalInt wayInTicks,
                             OptionalInt highestGuaranteedReserveUnits, int policyFloorUnits, long productVertices,
                             long productEdges,
                             long boundVertices, int rounds, int loopStates, long millis) {
}
