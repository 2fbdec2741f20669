package dockline.view;

import dockline.arena.Action;
import dockline.model.Cell;
import dockline.model.EventKind;
import java.util.Objects;

/**
 * One step of a replay as the view shows it. Step 0 is the start (no action, no event); step i &gt; 0
 * is the situation after the i-th action and its outcome.
 *
 * @param step        the step number (0 = start)
 * @param cell        where the robot is after the step
 * @param action      the action taken to get here ({@code null} at step 0)
 * @param event       the disturbance that hit this step, or {@code null} for the nominal outcome
 * @param eventLabel  the event in words, e.g. {@code door D2 shut (rule 'fire doors')}; empty when no event
 * @param eventCell   the cell the event concerns (the door, the blocked or dragged cell, the cell slipped to);
 *                    {@code null} when no event, or to mean the cell the action aimed at
 * @param levelUnits  the battery level after the step, in units
 * @param budgetLeft  disturbances the building may still throw
 * @param progress    task progress bit mask after the step
 * @param closedCells cells a lasting event closed at this step, for the rest of the mission (empty otherwise)
 */
public record ViewStep(int step, Cell cell, Action action, EventKind event, String eventLabel, Cell eventCell,
                       int levelUnits, int budgetLeft, int progress, java.util.List<Cell> closedCells) {

    public ViewStep {
        Objects.requireNonNull(cell, "cell");
        if (step < 0) {
            throw new IllegalArgumentException("step must not be negative");
        }
        eventLabel = eventLabel == null ? "" : eventLabel;
        closedCells = closedCells == null ? java.util.List.of() : java.util.List.copyOf(closedCells);
    }

    /** A step that closes nothing. */
    public ViewStep(int step, Cell cell, Action action, EventKind event, String eventLabel, Cell eventCell,
                    int levelUnits, int budgetLeft, int progress) {
        this(step, cell, action, event, eventLabel, eventCell, levelUnits, budgetLeft, progress, java.util.List.of());
    }

    public boolean hasEvent() {
        return event != null;
    }
}
