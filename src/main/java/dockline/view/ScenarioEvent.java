package dockline.view;

import dockline.model.Cell;
import dockline.model.EventKind;
import java.util.Objects;

/**
 * A disturbance the user forces in a scenario: at the given step (the robot's action number,
 * 1 = first action) the event strikes the robot's move, if the map allows it there.
 *
 * @param step   action number, 1 or more
 * @param kind   the event
 * @param slipTo for a slip, the cell to slip to; {@code null} for "the only possible one" or other events
 */
public record ScenarioEvent(int step, EventKind kind, Cell slipTo) {

    public ScenarioEvent {
        if (step < 1) {
            throw new IllegalArgumentException("a forced event needs a step of 1 or more");
        }
        Objects.requireNonNull(kind, "kind");
        if (slipTo != null && kind != EventKind.SLIP) {
            throw new IllegalArgumentException("only a slip takes a cell to slip to");
        }
    }

    @Override
    public String toString() {
        return "step " + step + ": " + kind.word() + (slipTo != null ? " to " + slipTo : "");
    }
}
