package dockline.model;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;

/**
 * Turns Wh figures into integer energy units, always rounding against the robot (missions/README.md, "robot"):
 * consumption and the reserve floor round <b>up</b>; capacity, starting charge and charging round
 * <b>down</b>. A "guaranteed" verdict in units is therefore guaranteed in Wh.
 *
 * <p>All arithmetic is exact ({@link BigDecimal}); a figure whose unit count does not fit in an
 * {@code int} raises {@link ArithmeticException}.
 */
public record EnergyScale(BigDecimal unitWh) {

    public EnergyScale {
        if (unitWh == null || unitWh.signum() <= 0) {
            throw new IllegalArgumentException("energy resolution must be positive");
        }
    }

    /** Energy used (a move, a wait): rounded up. */
    public int consumption(BigDecimal wh) {
        return toInt(wh.divide(unitWh, 0, RoundingMode.CEILING));
    }

    /**
     * Energy used by a diagonal move: {@code wh × √2}, rounded up. Exact: the least integer u with
     * u ≥ √2 · wh/unit, found with integer square roots, no floating point.
     */
    public int diagonalConsumption(BigDecimal wh) {
        if (wh.signum() == 0) {
            return 0;
        }
        // wh / unit = p / q exactly, with p and q integers on a common decimal scale.
        BigInteger p;
        BigInteger q;
        BigDecimal whS = wh.stripTrailingZeros();
        BigDecimal uS = unitWh.stripTrailingZeros();
        int scale = Math.max(Math.max(whS.scale(), uS.scale()), 0);
        p = whS.movePointRight(scale).toBigIntegerExact();
        q = uS.movePointRight(scale).toBigIntegerExact();
        // least u with u^2 * q^2 >= 2 p^2
        BigInteger num = p.multiply(p).shiftLeft(1);
        BigInteger den = q.multiply(q);
        BigInteger[] qr = num.divideAndRemainder(den);
        BigInteger floorRatio = qr[0];
        BigInteger u = floorRatio.sqrt();
        while (u.multiply(u).multiply(den).compareTo(num) < 0) {
            u = u.add(BigInteger.ONE);
        }
        return toInt(new BigDecimal(u));
    }

    /** Energy gained (charging per step): rounded down. */
    public int gain(BigDecimal wh) {
        return toInt(wh.divide(unitWh, 0, RoundingMode.FLOOR));
    }

    /** Battery capacity: rounded down. */
    public int capacity(BigDecimal wh) {
        return toInt(wh.divide(unitWh, 0, RoundingMode.FLOOR));
    }

    /** Starting charge: rounded down. */
    public int start(BigDecimal wh) {
        return toInt(wh.divide(unitWh, 0, RoundingMode.FLOOR));
    }

    /** Reserve floor: rounded up. */
    public int reserve(BigDecimal wh) {
        return toInt(wh.divide(unitWh, 0, RoundingMode.CEILING));
    }

    /** The Wh figure of a unit count (exact). */
    public BigDecimal toWh(long units) {
        return unitWh.multiply(BigDecimal.valueOf(units)).stripTrailingZeros();
    }

    /** The Wh figure as text, e.g. {@code 12.3 Wh}. */
    public String formatWh(long units) {
        return toWh(units).toPlainString() + " Wh";
    }

    /** The rounding stated in words, for every report. */
    public String describe() {
        return "1 unit = " + unitWh.stripTrailingZeros().toPlainString()
                + " Wh; consumption and reserve floor rounded up, capacity, starting charge and charging rounded down"
                + " (always against the robot)";
    }

    private static int toInt(BigDecimal v) {
        BigInteger b = v.toBigIntegerExact();
        if (b.bitLength() > 31) {
            throw new ArithmeticException("energy figure is too large: " + b + " units does not fit");
        }
        return b.intValueExact();
    }
}
