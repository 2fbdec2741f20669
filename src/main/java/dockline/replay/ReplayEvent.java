package dockline.replay;

import dockline.model.Cell;
import dockline.model.EventKind;
import java.util.List;

/**
 * What the disturbance did at one step of a replay.
 *
 * @param kind      the event, or {@code null} for the nominal outcome
 * @param ruleLabel the label of the map's event rule that allowed it ({@code ""} when nominal)
 * @param doorName  for a shut door: the door's name from the map; otherwise {@code ""}
 * @param cell      the cell the event concerns: the door or blocked cell, the cell slipped to, the
 *                  dragged cell; {@code null} when nominal
 * @param closed    for a lasting door shut or blockage: what stays closed for the rest of the mission
 *                  ({@code door NAME} or {@code zone NAME}); {@code ""} for a momentary event
 * @param closedCells the cells closed from this step on (the door cell, or every cell of the zone);
 *                  empty for a momentary event
 */
public record ReplayEvent(EventKind kind, String ruleLabel, String doorName, Cell cell, String closed,
                          List<Cell> closedCells) {

    public static final ReplayEvent NONE = new ReplayEvent(null, "", "", null);

    public ReplayEvent {
        ruleLabel = ruleLabel == null ? "" : ruleLabel;
        doorName = doorName == null ? "" : doorName;
        closed = closed == null ? "" : closed;
        closedCells = closedCells == null ? List.of() : List.copyOf(closedCells);
    }

    /** A momentary event (nothing stays closed). */
    public ReplayEvent(EventKind kind, String ruleLabel, String doorName, Cell cell) {
        this(kind, ruleLabel, doorName, cell, "", List.of());
    }

    /** Whether the event closed a door or zone for the rest of the mission. */
    public boolean lasting() {
        return !closed.isEmpty();
    }

    public boolean nominal() {
        return kind == null;
    }

    /** {@code none}, {@code door-shut}, {@code blockage}, {@code slip} or {@code drag}. */
    public String word() {
        return kind == null ? "none" : kind.word();
    }

    /** In words, e.g. {@code door D2 shut (rule 'fire doors')}; empty when nominal. */
    public String describe() {
        if (kind == null) {
            return "";
        }
        String what = switch (kind) {
            case DOOR_SHUT -> (doorName.startsWith("door ") ? doorName : "door " + doorName) + " shut";
            case BLOCKAGE -> "blockage at " + cell;
            case SLIP -> "slip to " + cell;
            case DRAG -> "drag entering " + cell;
        };
        return what + (lasting() ? " for the rest of the mission" : "") + " (rule '" + ruleLabel + "')";
    }
}
