package dockline.report;

import dockline.model.Worded;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What the usual rule of thumb says about a mission (common practice, not a guarantee): the mission is
 * called safe when the charge above the reserve floor covers the energy of the cheapest run with no
 * disturbance plus a fixed margin of the capacity. The report sets it beside the verdict and flags where
 * the two disagree, because that is where the rule would have misled a site.
 *
 * <p>A mission with a deadline is also judged on time, as a planner would estimate it: the shortest run with
 * no disturbance (the fewest turns in which the robot can finish and dock when nothing happens) plus a time
 * buffer of the same percentage of the deadline must fit in the deadline. So when even the undisturbed shortest
 * run is longer than the deadline the rule says "not safe" at every margin; it never counts the turns a
 * disturbance costs (a shut door, a blockage), which is where it can still be wrong. A fixed percentage buffer on
 * a schedule is common practice, as the energy margin is; the deadline is in whole turns, rounded down as
 * everywhere (maps/README.md), and the buffer is rounded up.
 *
 * <p>All figures are whole energy units and whole turns; the margins are rounded up (against the robot), so the
 * rule never looks safer than it is because of rounding. Cost: O(1).
 *
 * @param marginPercent    the margin, in percent of the capacity
 * @param marginUnits      the margin in energy units, {@code ceil(capacity * percent / 100)}
 * @param nominalNeedUnits the energy the cheapest run with no disturbance draws from the battery (its
 *                         lowest level below the start); empty when no run with no disturbance finishes
 *                         from this start at all
 * @param deadline         the time half of the rule, for a mission with a deadline
 * @param saysSafe         whether the rule calls the mission safe (energy and, with a deadline, time)
 * @param flag             how the rule compares with the verdict
 */
public record RuleOfThumb(int marginPercent, int marginUnits, OptionalInt nominalNeedUnits, Optional<Time> deadline,
                          boolean saysSafe, Flag flag) {

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
     * The time half of the rule for a mission with a deadline.
     *
     * @param deadlineTicks    the deadline in whole turns
     * @param marginTicks      the time buffer, {@code ceil(deadline * percent / 100)} turns
     * @param shortestRunTicks the fewest turns of a run with no disturbance; empty when no such run finishes
     * @param fits             whether that run plus the buffer fits in the deadline
     */
    public record Time(int deadlineTicks, int marginTicks, OptionalInt shortestRunTicks, boolean fits) {

        /** Whether even the shortest run with no disturbance, with no buffer, is longer than the deadline. */
        public boolean shortestRunTooLong() {
            return shortestRunTicks.isPresent() && shortestRunTicks.getAsInt() > deadlineTicks;
        }
    }

    /**
     * Judges one mission without a deadline by the rule (energy alone).
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
        return judge(percent, capacityUnits, startUnits, reserveUnits, nominalNeedUnits, OptionalInt.empty(),
                OptionalInt.empty(), guaranteed);
    }

    /**
     * Judges one mission by the rule: energy, and time when it has a deadline.
     *
     * @param percent          margin in percent of the capacity, and of the deadline (0 to 100)
     * @param capacityUnits    the battery capacity
     * @param startUnits       the starting charge
     * @param reserveUnits     the reserve floor
     * @param nominalNeedUnits the cheapest run's need with no disturbance (empty: it cannot finish)
     * @param deadlineTicks    the deadline in whole turns; empty for a mission without one
     * @param shortestRunTicks the fewest turns of a run with no disturbance (empty: it cannot finish); read only
     *                         with a deadline
     * @param guaranteed       the verdict the rule is compared with
     */
    public static RuleOfThumb judge(int percent, int capacityUnits, int startUnits, int reserveUnits,
                                    OptionalInt nominalNeedUnits, OptionalInt deadlineTicks,
                                    OptionalInt shortestRunTicks, boolean guaranteed) {
        if (percent < 0 || percent > 100) {
            throw new IllegalArgumentException("margin must be 0 to 100 percent");
        }
        int margin = percentUp(capacityUnits, percent);
        boolean safe = nominalNeedUnits.isPresent()
                && (long) startUnits - reserveUnits >= Math.addExact((long) nominalNeedUnits.getAsInt(), margin);
        Optional<Time> time = Optional.empty();
        if (deadlineTicks.isPresent()) {
            int t = deadlineTicks.getAsInt();
            int buffer = percentUp(t, percent);
            boolean fits = shortestRunTicks.isPresent()
                    && Math.addExact((long) shortestRunTicks.getAsInt(), buffer) <= t;
            time = Optional.of(new Time(t, buffer, shortestRunTicks, fits));
            safe = safe && fits;
        }
        Flag flag = safe == guaranteed ? Flag.AGREES : safe ? Flag.CALLS_UNSAFE_SAFE : Flag.REFUSES_GUARANTEED;
        return new RuleOfThumb(percent, margin, nominalNeedUnits, time, safe, flag);
    }

    /** {@code ceil(whole * percent / 100)} for a whole of at least 0, exactly. */
    private static int percentUp(int whole, int percent) {
        long product = Math.multiplyExact((long) whole, percent);
        return Math.toIntExact((product + 99) / 100);
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
