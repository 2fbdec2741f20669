package dockline.solve.discounted;

/**
 * Exact integer helpers for the discounted baseline: sign of a difference of two 64-bit products
 * computed in 128 bits ({@link Math#multiplyHigh}), so comparisons never overflow, and gcd
 * reduction of long fractions.
 *
 * <p>Exact integer arithmetic (common practice), O(1) per call.
 */
final class Exact {

    private Exact() {
    }

    /** Sign of {@code a*b - c*e}, exactly. */
    static int compareProducts(long a, long b, long c, long e) {
        long hi1 = Math.multiplyHigh(a, b);
        long hi2 = Math.multiplyHigh(c, e);
        if (hi1 != hi2) {
            return Long.compare(hi1, hi2);
        }
        return Long.compareUnsigned(a * b, c * e);
    }

    /** Sign of {@code a/b - c/e} for positive {@code b}, {@code e}, exactly. */
    static int compareFractions(long a, long b, long c, long e) {
        return compareProducts(a, e, c, b);
    }

    static long gcd(long a, long b) {
        a = Math.abs(a);
        b = Math.abs(b);
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a == 0 ? 1 : a;
    }
}
