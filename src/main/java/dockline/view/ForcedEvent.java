package dockline.view;

/**
 * A disturbance the user wants to force in a scenario: at the given step (the robot's action
 * number, 1 = first move), the event rule with the given index in the map's disturbance model
 * strikes if it can apply there.
 *
 * @param step      action number, 1 or more
 * @param ruleIndex index into {@code map.disturbances().rules()}
 */
public record ForcedEvent(int step, int ruleIndex) {

    public ForcedEvent {
        if (step < 1) {
            throw new IllegalArgumentException("a forced event needs a step of 1 or more");
        }
        if (ruleIndex < 0) {
            throw new IllegalArgumentException("rule index must not be negative");
        }
    }
}
