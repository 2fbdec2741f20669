package dockline.model;

import java.util.List;

/**
 * What the building can do to the robot: the event rules, and the budget (at most {@code budget}
 * events in one mission).
 */
public record DisturbanceModel(int budget, List<EventRule> rules) {

    public DisturbanceModel {
        if (budget < 0) {
            throw new IllegalArgumentException("budget must not be negative");
        }
        rules = List.copyOf(rules);
    }

    public static DisturbanceModel none() {
        return new DisturbanceModel(0, List.of());
    }

    /**
     * The same model with every door-shut and blockage rule given duration {@code d} (slip and drag
     * stay momentary): the momentary or the lasting reading of one map.
     */
    public DisturbanceModel withDoorsAndBlockages(EventDuration d) {
        return new DisturbanceModel(budget, rules.stream()
                .map(r -> r.kind() == EventKind.DOOR_SHUT || r.kind() == EventKind.BLOCKAGE ? r.withDuration(d) : r)
                .toList());
    }

    /** Whether some rule closes a door or zone for the rest of the mission. */
    public boolean anyLasting() {
        return rules.stream().anyMatch(EventRule::lasting);
    }

    /** Whether some rule has an {@code at-most} limit of its own. */
    public boolean anyLimited() {
        return rules.stream().anyMatch(EventRule::limited);
    }

    /** The same rules with another budget (a `--budget` override). */
    public DisturbanceModel withBudget(int k) {
        return new DisturbanceModel(k, rules);
    }
}
