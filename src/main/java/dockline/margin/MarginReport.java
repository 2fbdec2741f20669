package dockline.margin;

import java.util.List;
import java.util.OptionalInt;

/**
 * The margins of one mission, computed two ways.
 *
 * @param guaranteed    whether the mission as written is guaranteed (by the solver)
 * @param floorUnits    the mission's reserve floor
 * @param startUnits    the mission's starting level
 * @param capacityUnits the capacity
 * @param bisection     by bisection over the threshold solver
 * @param fixpoint      by the minimum-credit fixpoint
 * @param suggestions   when not guaranteed: the changes that make it guaranteed, smallest first
 */
public record MarginReport(boolean guaranteed, int floorUnits, int startUnits, int capacityUnits, Method bisection,
                           Method fixpoint, List<Suggestion> suggestions) {

    public MarginReport {
        suggestions = List.copyOf(suggestions);
    }

    /**
     * One method's answers.
     *
     * @param highestReserveUnits the highest reserve floor guaranteed from the mission's start; empty if none
     * @param lowestStartUnits    the lowest starting level guaranteed at the mission's floor; empty if none
     * @param millis              wall-clock time of the two searches
     */
    public record Method(OptionalInt highestReserveUnits, OptionalInt lowestStartUnits, long millis) {
    }

    /** Whether both methods found the same two figures. */
    public boolean agree() {
        return bisection.highestReserveUnits().equals(fixpoint.highestReserveUnits())
                && bisection.lowestStartUnits().equals(fixpoint.lowestStartUnits());
    }

    public OptionalInt highestReserveUnits() {
        return bisection.highestReserveUnits();
    }

    public OptionalInt lowestStartUnits() {
        return bisection.lowestStartUnits();
    }
}
