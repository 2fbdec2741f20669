package dockline.model;

/**
 * An exact rational p/q in lowest terms with q &gt; 0, on longs; all arithmetic is overflow-checked
 * ({@link Math#multiplyExact}, {@link Math#addExact}) and throws {@link ArithmeticException} rather
 * than wrap.
 */
public record Rational(long num, long den) implements Comparable<Rational> {

    public static final Rational ZERO = new Rational(0, 1);

    public Rational {
        if (den == 0) {
            throw new ArithmeticException("denominator is zero");
        }
        if (den < 0) {
            num = Math.negateExact(num);
            den = Math.negateExact(den);
        }
        long g = gcd(Math.abs(num), den);
        if (g > 1) {
            num /= g;
            den /= g;
        }
    }

    public static Rational of(long n) {
        return new Rational(n, 1);
    }

    public static Rational of(long n, long d) {
        return new Rational(n, d);
    }

    /**
     * Parses {@code p/q}, an integer, or a decimal such as {@code -0.75}.
     *
     * @throws NumberFormatException if the text is not a rational
     */
    public static Rational parse(String text) {
        String t = text.trim();
        int slash = t.indexOf('/');
        if (slash >= 0) {
            long p = Long.parseLong(t.substring(0, slash).trim());
            long q = Long.parseLong(t.substring(slash + 1).trim());
            if (q == 0) {
                throw new NumberFormatException("denominator is zero");
            }
            return new Rational(p, q);
        }
        java.math.BigDecimal bd = new java.math.BigDecimal(t);
        int scale = Math.max(0, bd.scale());
        if (scale > 18) {
            throw new NumberFormatException("too many decimals");
        }
        java.math.BigInteger n = bd.movePointRight(scale).toBigIntegerExact();
        return new Rational(n.longValueExact(), pow10(scale));
    }

    private static long pow10(int k) {
        long r = 1;
        for (int i = 0; i < k; i++) {
            r = Math.multiplyExact(r, 10L);
        }
        return r;
    }

    static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a == 0 ? 1 : a;
    }

    public Rational add(Rational o) {
        return new Rational(Math.addExact(Math.multiplyExact(num, o.den), Math.multiplyExact(o.num, den)),
                Math.multiplyExact(den, o.den));
    }

    public Rational subtract(Rational o) {
        return add(o.negate());
    }

    public Rational negate() {
        return new Rational(Math.negateExact(num), den);
    }

    public Rational multiply(Rational o) {
        return new Rational(Math.multiplyExact(num, o.num), Math.multiplyExact(den, o.den));
    }

    public Rational multiply(long k) {
        return new Rational(Math.multiplyExact(num, k), den);
    }

    public Rational divide(Rational o) {
        if (o.num == 0) {
            throw new ArithmeticException("division by zero");
        }
        return new Rational(Math.multiplyExact(num, o.den), Math.multiplyExact(den, o.num));
    }

    public int signum() {
        return Long.signum(num);
    }

    /** Exact comparison (through BigInteger, so no product can overflow). */
    @Override
    public int compareTo(Rational o) {
        return compareExact(o);
    }

    private int compareExact(Rational o) {
        return java.math.BigInteger.valueOf(num).multiply(java.math.BigInteger.valueOf(o.den))
                .compareTo(java.math.BigInteger.valueOf(o.num).multiply(java.math.BigInteger.valueOf(den)));
    }

    @Override
    public String toString() {
        return den == 1 ? Long.toString(num) : num + "/" + den;
    }
}
