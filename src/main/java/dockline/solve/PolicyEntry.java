package dockline.solve;

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
 */
public record PolicyEntry(Cell cell, int level, int budgetLeft, int progress, Action action) {
}
