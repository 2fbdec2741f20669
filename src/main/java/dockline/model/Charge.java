package dockline.model;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * An amount of charge given either in Wh or as a percentage of the battery capacity, exactly as
 * the user wrote it ({@code 20%}, {@code 12.5 Wh}).
 */
public record Charge(BigDecimal amount, boolean percent) {

    private static final BigDecimal HUNDRED = BigDecimal.valueOf(100);

    public Charge {
        if (amount == null || amount.signum() < 0) {
            throw new IllegalArgumentException("charge must not be negative");
        }
    }

    public static Charge wh(BigDecimal wh) {
        return new Charge(wh, false);
    }

    public static Charge percent(BigDecimal pct) {
        return new Charge(pct, true);
    }

    /** The amount in Wh for a battery of the given capacity (exact: percentages are decimal). */
    public BigDecimal toWh(BigDecimal capacityWh) {
        return percent ? amount.multiply(capacityWh).divide(HUNDRED, MathContext.UNLIMITED) : amount;
    }

    @Override
    public String toString() {
        return percent ? amount.stripTrailingZeros().toPlainString() + "%" : amount.stripTrailingZeros().toPlainString() + " Wh";
    }
}
