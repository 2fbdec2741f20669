package dockline.margin;

import dockline.model.Charge;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import dockline.solve.reserve.ReserveSolver;
import dockline.util.MonotoneSearch;

/**
 * The margins by bisection over the threshold solver (satisficing): each probe asks the solver
 * "guaranteed or not?" for one mission variant. Exact because winning is monotone in the start level
 * (more charge never hurts: saturation is monotone), in the floor (a run above f is above any lower
 * floor) and in the budget (fewer disturbances leave the disturbance fewer choices).
 * O(log range) solves each, through the one bisection helper {@link MonotoneSearch}.
 *
 * @param mission the mission whose variants are probed
 * @param options the product route's settings for every probe
 */
public record Bisection(Mission mission, ProductOptions options) {

    /** The mission with the floor and start level given in units (exact: k units are k·unit Wh). */
    static Mission variant(Mission m, int floorUnits, int startUnits) {
        return m.withReserve(Charge.wh(m.scale().toWh(floorUnits))).withStartCharge(Charge.wh(m.scale().toWh(startUnits)));
    }

    public boolean guaranteed(int floorUnits, int startUnits, int budget) {
        if (startUnits < floorUnits) {
            return false;
        }
        Mission v = variant(mission, floorUnits, startUnits);
        if (budget != mission.map().disturbances().budget()) {
            v = v.withBudget(budget);
        }
        return ReserveSolver.guaranteed(v, options);
    }

    /** The highest floor in 0..start that is guaranteed from {@code start}, or -1. */
    public int highestFloor(int start) {
        int k = mission.map().disturbances().budget();
        return MonotoneSearch.highest(-1, Math.min(start, mission.capacityUnits()), f -> guaranteed(f, start, k));
    }

    /** The lowest start level in floor..capacity that is guaranteed at {@code floor}, or -1. */
    public int lowestStart(int floor) {
        int k = mission.map().disturbances().budget();
        int cap = mission.capacityUnits();
        if (floor > cap || !guaranteed(floor, cap, k)) {
            return -1;
        }
        return MonotoneSearch.lowest(floor, cap, s -> guaranteed(floor, s, k)); // guaranteed at cap
    }

    /** The largest budget in 0..K-1 that is guaranteed at this floor and start, or -1. */
    public int largestBudgetBelow(int floor, int start) {
        return MonotoneSearch.highest(-1, mission.map().disturbances().budget() - 1, k -> guaranteed(floor, start, k));
    }
}
