package dockline.certify;

import dockline.model.Rational;
import java.math.BigInteger;

/**
 * An exact discounted score as a fraction of big integers in lowest terms ({@code den > 0}), so
 * that no run is too long for it: the checker's own bookkeeping, independent of the 64-bit
 * {@link Rational} the solver reports with.
 *
 * @param num numerator
 * @param den denominator, positive, coprime to the numerator
 */
public record ExactScore(BigInteger num, BigInteger den) implements Comparable<ExactScore> {

    public ExactScore {
        if (den.signum() == 0) {
            throw new ArithmeticException("denominator is zero");
        }
        if (den.signum() < 0) {
            num = num.negate();
            den = den.negate();
        }
        BigInteger g = num.gcd(den);
        if (!g.equals(BigInteger.ONE) && g.signum() != 0) {
            num = num.divide(g);
            den = den.divide(g);
        }
    }

    public static ExactScore of(Rational r) {
        return new ExactScore(BigInteger.valueOf(r.num()), BigInteger.valueOf(r.den()));
    }

    /** Whether this is exactly the value of {@code r}. */
    public boolean sameValue(Rational r) {
        return num.equals(BigInteger.valueOf(r.num())) && den.equals(BigInteger.valueOf(r.den()));
    }

    @Override
    public int compareTo(ExactScore o) {
        return num.multiply(o.den).compareTo(o.num.multiply(den));
    }

    /** {@code n/q}, or {@code n} when q = 1 (as {@link Rational#toString()}). */
    @Override
    public String toString() {
        return den.equals(BigInteger.ONE) ? num.toString() : num + "/" + den;
    }
}
