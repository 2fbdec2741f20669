package dockline.report;

import dockline.model.Worded;
import java.util.OptionalInt;

/**
 * What the usual rule of thumb says about a mission (common practice, not a guarantee): the mission is
 * called safe when the charge above the reserve floor covers the energy of the cheapest run with no
 * disturbance plus a fixed margin of the capacity. The report sets it beside the verdict and flags where
 * the two disagree, because that is where the rule would have misled a site.
 *
 * <p>All figures are whole energy units; the margin is rounded up (against the robot), so the rule
 * never looks safer than it is because of rounding. Cost: O(1).
 *
 * @param marginPercent    the margin, in percent of the capacity
 * @param marginUnits      the margin in energy units, {@code ceil(capacity * percent / 100)}
 * @param nominalNeedUnits the energy the cheapest run with no disturbance draws from the battery (its
 *                         lowest level below the start); empty when no run with no disturbance finishes
 *                         from this start at all
 * @param saysSafe         whether the rule calls the mission safe
 * @param flag             how the rule compares with the verdict
 */
public record RuleOfThumb(int marginPercent, int marginUnits, OptionalInt nominalNeedUnits, boolean saysSafe,
                          Flag flag) {

    /** The margins the report shows (common practice: 20 % and 30 % of the capacity). */
    public static final int[] MARGINS = {20, 30};

    /** How the rule compares with the verdict; its {@link Worded#word} is the JSON output's. */
    public enum Flag implements Worded {
        /** The rule and the verdict agree. */
        AGREES,
        /** The rule calls safe a mission that is not guaranteed: the dangerous disagreement. */
        CALLS_UNSAFE_SAFE,
        /** The rule turns down a mission that is guaranteed: the costly disagreement. */
        REFUSES_GUARANTEED
    }

    /**
     * Judges one mission by the rule.
     *
     * @param percent          margin in percent of the capacity (0 to 100)
     * @param capacityUnits    the battery capacity
     * @param startUnits       the starting charge
     * @param reserveUnits     the reserve floor
     * @param nominalNeedUnits the cheapest run's need with no disturbance (empty: it cannot finish)
     * @param guaranteed       the verdict the rule is compared with
     */
    public static RuleOfThumb judge(int percent, int capacityUnits, int startUnits, int reserveUnits,
                                    OptionalInt nominalNeedUnits, boolean guaranteed) {
        if (percent < 0 || percent > 100) {
            throw new IllegalArgumentException("margin must be 0 to 100 percent");
        }
        long product = Math.multiplyExact((long) capacityUnits, percent);
        int margin = Math.toIntExact((product + 99) / 100);
        boolean safe = nominalNeedUnits.isPresent()
                && (long) startUnits - reserveUnits >= Math.addExact((long) nominalNeedUnits.getAsInt(), margin);
        Flag flag = safe == guaranteed ? Flag.AGREES : safe ? Flag.CALLS_UNSAFE_SAFE : Flag.REFUSES_GUARANTEED;
        return new RuleOfThumb(percent, margin, nominalNeedUnits, safe, flag);
    }

    /** The rule's answer and the flag in words, for the report. */
    public String words() {
        String says = saysSafe ? "safe" : "not safe";
        return switch (flag) {
            case AGREES -> says + " (agrees)";
            case CALLS_UNSAFE_SAFE -> says + " \u2014 WRONG: calls an unsafe mission safe";
            case REFUSES_GUARANTEED -> says + " \u2014 turns down a guaranteed mission";
        };
    }
}
