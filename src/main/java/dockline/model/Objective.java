package dockline.model;

/**
 * What "good" means for a run. The tasks (visit, avoid, dock) always apply on top of it.
 */
public sealed interface Objective permits Objective.Reserve, Objective.Discounted {

    /** Keep the battery at or above the reserve floor at every step. */
    record Reserve() implements Objective {
    }

    /**
     * The discounted sum of the energy deltas (in units), sum of w_i / d^i, compared with a rational
     * threshold.
     */
    record Discounted(int discount, Rational threshold, Relation relation) implements Objective {
        public Discounted {
            if (discount < 2) {
                throw new IllegalArgumentException("discount factor must be an integer of at least 2");
            }
        }
    }
}
