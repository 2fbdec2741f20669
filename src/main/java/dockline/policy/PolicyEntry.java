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
 * @param closures   what the robot has observed of lasting events and at-most entries: the doors and
 *                   zones closed so far and the events used per at-most entry
 *                   ({@link dockline.arena.DisturbanceStates#key}); {@code ""} when nothing is closed
 *                   and the map has no at-most entry
 */
public record PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action, PolicyScore score,
                          String closures) {

    public PolicyEntry {
        if (closures == null) {
            closures = "";
        }
    }

    /** A row without closures. */
    public PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action, PolicyScore score) {
        this(cell, level, budgetLeft, progress, action, score, "");
    }

    /** A row of a reserve policy (no score memory, no closures). */
    public PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action) {
        this(cell, level, budgetLeft, progress, action, null, "");
    }

    /** Whether the row carries a score memory (a discounted policy). */
    public boolean scored() {
        return score != null;
    }

    /** The same situation with another action. */
    public PolicyEntry withAction(Action a) {
        return new PolicyEntry(cell, level, budgetLeft, progress, a, score, closures);
    }

    /** The same row with closures. */
    public PolicyEntry withClosures(String c) {
        return new PolicyEntry(cell, level, budgetLeft, progress, action, score, c);
    }
}
