package dockline.solve;

/**
 * An upper estimate of a product game's size, made before it is built (see
 * {@link dockline.solve.game.ProductGame#estimate}).
 *
 * @param vertices   product vertices, including the two sinks
 * @param edges      product edges
 * @param bytes      memory for building and solving it
 * @param denseSlots slots of the direct index if one would be used, else 0
 *
 * <p>Data only, with saturating arithmetic; O(1).
 */
public record SizeEstimate(long vertices, long edges, long bytes, long denseSlots) {

    /**
     * Bytes per product vertex: the decoded triple (12), CSR offsets forward and reverse (8), owner
     * and target flags (2), the hash index at load at most 1/2 (8 to 16), and the solver's rank,
     * chosen edge, counter and queue (16); rounded up for the spare capacity of growing arrays.
     */
    public static final long BYTES_PER_VERTEX = 64;
    /** Bytes per product edge: forward target and reverse source (8), plus growth slack. */
    public static final long BYTES_PER_EDGE = 12;
    /** Bytes per slot of the direct index. */
    public static final long BYTES_PER_DENSE_SLOT = 4;

    public static SizeEstimate of(long vertices, long edges, long denseSlots) {
        long bytes = satAdd(satMul(vertices, BYTES_PER_VERTEX), satAdd(satMul(edges, BYTES_PER_EDGE),
                satMul(denseSlots, BYTES_PER_DENSE_SLOT)));
        return new SizeEstimate(vertices, edges, bytes, denseSlots);
    }

    /** Saturating arithmetic: an estimate past Long.MAX_VALUE is simply "too big". */
    public static long satMul(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        if ((hi == 0 && lo >= 0) || (hi == -1 && lo < 0)) {
            return lo;
        }
        return Long.MAX_VALUE;
    }

    public static long satAdd(long a, long b) {
        long r = a + b;
        return ((a ^ r) & (b ^ r)) < 0 ? Long.MAX_VALUE : r;
    }

    /** The size in words, e.g. {@code 1.2 million vertices, 5.0 million edges, about 96 MB}. */
    public String describe() {
        return count(vertices) + " vertices, " + count(edges) + " edges, about " + megabytes(bytes);
    }

    static String count(long n) {
        if (n < 10_000) {
            return Long.toString(n);
        }
        if (n < 1_000_000) {
            return String.format(java.util.Locale.ROOT, "%.1f thousand", n / 1e3);
        }
        if (n < 1_000_000_000) {
            return String.format(java.util.Locale.ROOT, "%.1f million", n / 1e6);
        }
        return String.format(java.util.Locale.ROOT, "%.1f billion", n / 1e9);
    }

    static String megabytes(long bytes) {
        if (bytes == Long.MAX_VALUE) {
            return "more than can be counted (the estimate saturated)";
        }
        // round up without overflow: bytes + 2^20 - 1 could pass Long.MAX_VALUE
        long mb = (bytes >> 20) + ((bytes & ((1 << 20) - 1)) != 0 ? 1 : 0);
        return mb >= 10_000 ? String.format(java.util.Locale.ROOT, "%.1f GB", bytes / (double) (1L << 30))
                : mb + " MB";
    }
}
