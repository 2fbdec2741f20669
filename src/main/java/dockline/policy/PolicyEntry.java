package dockline.policy;

import dockline.arena.Action;
import dockline.model.Cell;

/**
 * One row of a robot policy: in this situation, do this.
 *
 * @param cell       where the robot is
 * @param level      battery level in units
 * @param budgetLeft disturbances the building may still throw
 * @param progress   task progress: bit i set when task i of the mission's visit list is done
 * @param action     what to do
 * @param score      for a discounted mission: the robot's score memory ({@link PolicyScore}, the scaled
 *                   gap to the threshold); {@code null} in a reserve policy
 */
public record PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action, PolicyScore score) {

    /** A row of a reserve policy (no score memory). */
    public PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action) {
        this(cell, level, budgetLeft, progress, action, null);
    }

    /** Whether the row carries a score memory (a discounted policy). */
    public boolean scored() {
        return score != null;
    }

    /** The same situation with another action. */
    public PolicyEntry withAction(Action a) {
        return new PolicyEntry(cell, level, budgetLeft, progress, a, score);
    }
}
