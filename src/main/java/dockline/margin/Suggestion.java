package dockline.margin;

import dockline.model.Worded;
/**
 * One change that makes a mission guaranteed.
 *
 * @param kind  what to change
 * @param from  the value now (units for charges, events for the budget)
 * @param to    the value that works (the smallest change of this kind)
 * @param text  the change in words, with Wh and percent of capacity
 */
public record Suggestion(Kind kind, int from, int to, String text) {

    /** What a suggestion changes. */
    public enum Kind implements Worded {
        /** Start with more charge. */
        START_CHARGE,
        /** Keep back less charge. */
        RESERVE_FLOOR,
        /** Allow fewer disturbances per mission. */
        BUDGET;
    }

    /** The size of the change, |to - from|. */
    public int change() {
        return Math.abs(to - from);
    }
}
