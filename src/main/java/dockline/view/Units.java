package dockline.view;

import dockline.model.Mission;
import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Energy figures for people: units shown as Wh and as a percentage of the capacity. Display only;
 * no decision is taken on these numbers (the solver works in integer units).
 */
final class Units {

    private Units() {
    }

    static String wh(Mission m, long units) {
        return m.scale().formatWh(units);
    }

    /** Percentage of the capacity, one decimal, e.g. {@code 23.5 %}. */
    static String percent(Mission m, long units) {
        BigDecimal cap = m.scale().toWh(m.capacityUnits());
        if (cap.signum() == 0) {
            return "? %";
        }
        BigDecimal p = m.scale().toWh(units).multiply(BigDecimal.valueOf(100)).divide(cap, 1, RoundingMode.HALF_UP);
        return p.stripTrailingZeros().toPlainString() + " %";
    }

    /** {@code 12.4 Wh (31 %)}. */
    static String both(Mission m, long units) {
        return wh(m, units) + " (" + percent(m, units) + ")";
    }

    static double whValue(Mission m, long units) {
        return m.scale().toWh(units).doubleValue();
    }
}
