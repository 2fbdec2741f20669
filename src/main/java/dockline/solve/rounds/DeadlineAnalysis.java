package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.model.Mission;
import dockline.policy.Policy;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What {@link DeadlineSolver} found for a visit mission with a deadline.
 *
 * @param mission            the mission
 * @param arena              its arena
 * @param guaranteed         the robot can always finish and dock within the deadline, never below the floor
 * @param deadlineTicks      the deadline in whole turns (rounded down)
 * @param reserveUnits       the floor
 * @param startUnits         the starting level
 * @param capacityUnits      the capacity
 * @param tightestTicks      the fewest turns the robot can guarantee to finish in at this floor (the tightest
 *                           deadline still guaranteed); empty when it cannot force completion at all
 * @param worstFinishTicks   the most turns the policy's worst play takes (equals {@code tightestTicks} for the
 *                           policy of fewest turns; at most the deadline for the safest one)
 * @param policy             the policy, when guaranteed
 * @param worstCaseMinimumUnits the lowest level of any play of the policy, when guaranteed
 * @param highestGuaranteedReserveUnits the highest floor at which the deadline is still kept
 * @param policyFloorUnits   the floor the policy was made for: the mission's, or the highest one (the safest policy)
 * @param productVertices    vertices of the stored battery product
 * @param productEdges       its edges
 * @param boundVertices      the upper bound stated before the build
 * @param millis             time taken in all (the bisection included)
 */
public record DeadlineAnalysis(Mission mission, Arena arena, boolean guaranteed, int deadlineTicks, int reserveUnits,
                               int startUnits, int capacityUnits, OptionalInt tightestTicks,
                               OptionalInt worstFinishTicks, Optional<Policy> policy,
                               OptionalInt worstCaseMinimumUnits, OptionalInt highestGuaranteedReserveUnits,
                               int policyFloorUnits, long productVertices, long productEdges, long boundVertices, long millis) {

    /** Vertices of the product with the ticks-left monitor (battery product × (T + 1)), represented by ranks. */
    public long timedVertices() {
        return Math.multiplyExact(productVertices, (long) deadlineTicks + 1);
    }
}
