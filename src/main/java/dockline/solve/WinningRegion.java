package dockline.solve;

/**
 * Where the robot wins the reserve game at a given floor: whether, standing at an arena robot vertex
 * with the given task progress and battery level, the robot can force mission completion without
 * the level ever dropping below the floor. The counterexample's disturbance strategy stays outside
 * this region.
 *
 * <p>No algorithm of its own: a question answered from a solver's result, O(1) per question.
 */
@FunctionalInterface
public interface WinningRegion {

    /**
     * @param robotVertex  arena robot vertex (cell, budget left)
     * @param progressMask bit i set when task i is done (after occupying the vertex's cell)
     * @param level        battery level in units
     */
    boolean robotWins(int robotVertex, int progressMask, int level);
}
