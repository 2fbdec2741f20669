package dockline.margin;

import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalInt;

/**
 * What would make a mission that is not guaranteed guaranteed: for each of the start charge, the
 * reserve floor and the disturbance budget K, the smallest change of that one figure that works,
 * found by the threshold solver ({@link Bisection}): the lowest start charge, the highest reserve
 * floor, the largest budget below K.
 *
 * <p>They are listed smallest first, comparing each change relative to its range — energy changes as
 * a fraction of the capacity, a budget change as a fraction of K — exactly, by cross-multiplication;
 * on a tie the start charge comes first, then the floor, then the budget.
 */
public final class Suggestions {

    private Suggestions() {
    }

    /** The suggestions for the mission, smallest change first; empty when it is already guaranteed. */
    public static List<Suggestion> find(Mission mission) {
        return find(mission, ProductOptions.defaults());
    }

    public static List<Suggestion> find(Mission mission, ProductOptions options) {
        return find(mission, options, OptionalInt.empty());
    }

    /**
     * As {@link #find(Mission, ProductOptions)}, reusing the highest guaranteed floor when the caller
     * already has it from the solver (saves its bisection).
     */
    public static List<Suggestion> find(Mission mission, ProductOptions options, OptionalInt highestFloorKnown) {
        Bisection b = new Bisection(mission, options);
        int floor = mission.reserveUnits();
        int start = mission.startUnits();
        int k = mission.map().disturbances().budget();
        if (b.guaranteed(floor, start, k)) {
            return List.of();
        }
        int high = highestFloorKnown.isPresent() ? highestFloorKnown.getAsInt() : b.highestFloor(start);
        return find(mission, b.lowestStart(floor), high, b.largestBudgetBelow(floor, start));
    }

    /** The suggestions from already computed margins (-1: none of that kind). */
    public static List<Suggestion> find(Mission mission, int lowestStart, int highestFloor, int largestBudget) {
        EnergyScale s = mission.scale();
        int cap = mission.capacityUnits();
        int floor = mission.reserveUnits();
        int start = mission.startUnits();
        int k = mission.map().disturbances().budget();
        List<Suggestion> out = new ArrayList<>();
        if (lowestStart >= 0 && lowestStart > start) {
            out.add(new Suggestion(Suggestion.Kind.START_CHARGE, start, lowestStart,
                    "start with at least " + charge(s, lowestStart, cap) + " instead of " + charge(s, start, cap)));
        }
        if (highestFloor >= 0 && highestFloor < floor) {
            out.add(new Suggestion(Suggestion.Kind.RESERVE_FLOOR, floor, highestFloor,
                    "lower the reserve floor to " + charge(s, highestFloor, cap) + " from " + charge(s, floor, cap)));
        }
        if (largestBudget >= 0 && largestBudget < k) {
            out.add(new Suggestion(Suggestion.Kind.BUDGET, k, largestBudget, largestBudget == 0
                    ? "the mission is guaranteed only if no disturbance happens (the map allows " + k + " per mission)"
                    : "the mission is guaranteed if at most " + largestBudget + " disturbance"
                            + (largestBudget == 1 ? " happens" : "s happen") + " per mission (the map allows " + k + ")"));
        }
        out.sort(Comparator.comparing((Suggestion x) -> x, (x, y) -> {
            // x.change/range(x) vs y.change/range(y), exactly
            long lhs = (long) x.change() * range(y, cap, k);
            long rhs = (long) y.change() * range(x, cap, k);
            return lhs != rhs ? Long.compare(lhs, rhs) : Integer.compare(x.kind().ordinal(), y.kind().ordinal());
        }));
        return List.copyOf(out);
    }

    private static long range(Suggestion x, int cap, int k) {
        return Math.max(1, x.kind() == Suggestion.Kind.BUDGET ? k : cap);
    }

    /** {@code 61 units (30.5 Wh, 50.8% of capacity)}; the percentage is for display only. */
    static String charge(EnergyScale s, int units, int cap) {
        BigDecimal pct = cap == 0 ? BigDecimal.ZERO
                : BigDecimal.valueOf(units * 100L).divide(BigDecimal.valueOf(cap), 1, RoundingMode.HALF_UP);
        return units + (units == 1 ? " unit (" : " units (") + s.formatWh(units) + ", "
                + pct.stripTrailingZeros().toPlainString() + "% of capacity)";
    }
}
