package dockline.raster;

/**
 * The exact squared Euclidean distance transform of a binary grid: for every point, the squared
 * distance {@code dx² + dy²} to the nearest site, as an integer (or {@link #NONE} when the grid has
 * no site).
 *
 * <p>Algorithm: the two-pass lower envelope of parabolas of P. F. Felzenszwalb and D. P.
 * Huttenlocher, "Distance Transforms of Sampled Functions", Theory of Computing 8 (2012), section 3:
 * a one-dimensional transform along every column, then along every row of the result. Unlike the
 * paper's floating-point version, the intersections of parabolas are kept as fractions and compared
 * by cross-multiplication in {@code long}, so the result is exact; points without a site in
 * their column are left out of the envelope instead of carrying an infinite value.
 *
 * <p>Cost: O(width x height) time; one {@code int} per point and O(max(width, height)) scratch.
 * Sides are at most {@link #MAX_SIDE}, which keeps every product below 2^62.
 */
public final class DistanceTransform {

    /** No site in the grid: the distance is unbounded. */
    public static final int NONE = Integer.MAX_VALUE;
    /** Longest side accepted. */
    public static final int MAX_SIDE = 1 << 14;

    private DistanceTransform() {
    }

    /**
     * Squared distances to the nearest {@code true} of {@code site} (row by row, {@code width} wide).
     */
    public static int[] squared(boolean[] site, int width, int height) {
        if (width < 1 || height < 1 || width > MAX_SIDE || height > MAX_SIDE || site.length != width * height) {
            throw new IllegalArgumentException("grid " + width + " x " + height);
        }
        int n = Math.max(width, height);
        long[] f = new long[n];
        long[] d = new long[n];
        int[] v = new int[n];
        int[] out = new int[width * height];
        // columns: distance along y to the nearest site in the same column
        for (int x = 0; x < width; x++) {
            for (int y = 0; y < height; y++) {
                f[y] = site[y * width + x] ? 0 : -1;
            }
            lowerEnvelope(f, height, d, v);
            for (int y = 0; y < height; y++) {
                out[y * width + x] = d[y] < 0 ? NONE : (int) d[y];
            }
        }
        // rows: the squared distance is the lowest (x - p)² + column distance at p
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int c = out[y * width + x];
                f[x] = c == NONE ? -1 : c;
            }
            lowerEnvelope(f, width, d, v);
            for (int x = 0; x < width; x++) {
                out[y * width + x] = d[x] < 0 ? NONE : (int) d[x];
            }
        }
        return out;
    }

    /**
     * One-dimensional transform: {@code d[q] = min over p with f[p] >= 0 of (q - p)² + f[p]}, or -1
     * when every {@code f[p]} is -1 (no site). {@code v} is scratch for the envelope's parabolas.
     */
    static void lowerEnvelope(long[] f, int n, long[] d, int[] v) {
        int k = -1;
        for (int q = 0; q < n; q++) {
            if (f[q] < 0) {
                continue;
            }
            // drop parabolas that the new one hides: their left boundary is not left of the new intersection
            while (k >= 1 && !crossesBefore(f, v[k - 1], v[k], q)) {
                k--;
            }
            v[++k] = q;
        }
        if (k < 0) {
            java.util.Arrays.fill(d, 0, n, -1);
            return;
        }
        int j = 0;
        for (int q = 0; q < n; q++) {
            // move on while the next parabola's intersection with this one lies left of q
            while (j < k && intersectionBelow(f, v[j], v[j + 1], q)) {
                j++;
            }
            long dq = q - v[j];
            d[q] = dq * dq + f[v[j]];
        }
    }

    /**
     * Whether the intersection of parabolas a and b lies strictly left of that of b and c (a < b < c):
     * {@code s(a,b) < s(b,c)} with {@code s(a,b) = ((f[b] + b²) - (f[a] + a²)) / (2(b - a))}.
     */
    private static boolean crossesBefore(long[] f, int a, int b, int c) {
        long nab = f[b] + (long) b * b - f[a] - (long) a * a;
        long dab = 2L * (b - a);
        long nbc = f[c] + (long) c * c - f[b] - (long) b * b;
        long dbc = 2L * (c - b);
        return nab * dbc < nbc * dab;
    }

    /** Whether {@code s(a,b) < q} (a < b). */
    private static boolean intersectionBelow(long[] f, int a, int b, int q) {
        long nab = f[b] + (long) b * b - f[a] - (long) a * a;
        long dab = 2L * (b - a);
        return nab < (long) q * dab;
    }
}
