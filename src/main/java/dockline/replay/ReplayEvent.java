package dockline.replay;

import dockline.model.Cell;
import dockline.model.EventKind;

/**
 * What the disturbance did at one step of a replay.
 *
 * @param kind      the event, or {@code null} for the nominal outcome
 * @param ruleLabel the label of the map's event rule that allowed it ({@code ""} when nominal)
 * @param doorName  for a shut door: the door's name from the map; otherwise {@code ""}
 * @param cell      the cell the event concerns: the door or blocked cell, the cell slipped to, the
 *                  dragged cell; {@code null} when nominal
 */
public record ReplayEvent(EventKind kind, String ruleLabel, String doorName, Cell cell) {

    public static final ReplayEvent NONE = new ReplayEvent(null, "", "", null);

    public ReplayEvent {
        ruleLabel = ruleLabel == null ? "" : ruleLabel;
        doorName = doorName == null ? "" : doorName;
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
        return what + " (rule '" + ruleLabel + "')";
    }
}
