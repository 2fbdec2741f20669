package dockline.replay;

import dockline.arena.Action;
import dockline.model.Cell;
import java.math.BigDecimal;
import java.util.Optional;

/**
 * One row of a replay. Row 0 is the start; row i (i &ge; 1) is the robot's i-th action, what the
 * disturbance did, and the situation after the step.
 *
 * @param step           0 for the start, then 1, 2, ...
 * @param cell           where the robot is after the step
 * @param taken          the action taken, as the arena has it; {@code null} on row 0 (the start)
 * @param event          what the disturbance did
 * @param batteryUnits   battery level after the step, in units
 * @param batteryWh      the same in Wh (exact)
 * @param budgetLeft     disturbances the building may still throw
 * @param progressMask   bit i set when task i of the visit list is done
 * @param progressWords  the progress in words
 */
public record ReplayStep(int step, Cell cell, Action taken, ReplayEvent event, int batteryUnits, BigDecimal batteryWh,
                         int budgetLeft, int progressMask, String progressWords) {

    /** The action taken, empty on row 0 (the start). */
    public Optional<Action> action() {
        return Optional.ofNullable(taken);
    }

    /** The action for display: {@code start} on row 0, else {@code move x:y}, {@code wait}, {@code charge}. */
    public String actionText() {
        return taken == null ? "start" : taken.toString();
    }
}
