package dockline.monitor;

import dockline.model.Rational;

/**
 * Closed forms of discounted sums, in exact rationals (the geometric series; any calculus text).
 * For a lasso {@code u x^omega} with {@code |u| = m}, {@code |x| = L}:
 * <pre>
 *   DS(u x^omega, d) = sum_{i<m} u_i / d^i  +  d^-m * (sum_{j<L} x_j d^(L-j)) / (d^L - 1)
 * </pre>
 * since the loop contributes {@code sum_{k>=0} d^(-kL) * sum_j x_j d^-j = d^L/(d^L-1) * sum_j x_j d^-j};
 * a constant sequence c has {@code DS = c d / (d - 1)}; an empty loop means zeros forever.
 */
public final class DiscountedClosedForms {

    private DiscountedClosedForms() {
    }

    public static Rational lassoValue(int[] u, int[] x, int d) {
        Rational sum = Rational.ZERO;
        long pow = 1;
        for (int ui : u) {
            sum = sum.add(Rational.of(ui, pow));
            pow = Math.multiplyExact(pow, d);
        }
        if (x.length == 0) {
            return sum;
        }
        long num = 0;
        long dl = 1;
        for (int xj : x) {
            num = Math.addExact(Math.multiplyExact(num, d), xj);
            dl = Math.multiplyExact(dl, d);
        }
        num = Math.multiplyExact(num, d);
        Rational loop = Rational.of(num, dl - 1);
        return sum.add(loop.multiply(Rational.of(1, pow)));
    }
}
