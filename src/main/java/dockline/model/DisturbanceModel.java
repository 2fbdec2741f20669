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

    /** The same rules with another budget (a `--budget` override). */
    public DisturbanceModel withBudget(int k) {
        return new DisturbanceModel(k, rules);
    }
}
