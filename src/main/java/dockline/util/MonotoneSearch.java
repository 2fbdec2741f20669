package dockline.util;

import java.util.function.IntPredicate;

/**
 * Bisection over a monotone integer predicate: the one binary search of the code base (margins,
 * highest floor, line look-up). Binary search as in Knuth, "The Art of Computer Programming",
 * vol. 3, section 6.2.1 (from memory); O(log(hi − lo)) calls of the predicate, no allocation.
 *
 * <p>The predicate must be monotone over the range searched: {@link #highest} needs "true up to
 * some point, then false", {@link #lowest} "false up to some point, then true". The bounds are
 * never probed: the caller already knows (or assumes) the answer at the bound it passes as known.
 */
public final class MonotoneSearch {

    private MonotoneSearch() {
    }

    /**
     * The highest x in {@code known+1 .. hi} with {@code holds(x)}, or {@code known} if there is none.
     * {@code known} is a value at which the predicate holds, or a sentinel below the range (such as -1).
     */
    public static int highest(int known, int hi, IntPredicate holds) {
        int lo = known;
        while (lo < hi) {
            int mid = lo + (int) (((long) hi - lo + 1) >>> 1);
            if (holds.test(mid)) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * The lowest x in {@code lo .. known-1} with {@code holds(x)}, or {@code known} if there is none.
     * {@code known} is a value at which the predicate holds (or a sentinel above the range).
     */
    public static int lowest(int lo, int known, IntPredicate holds) {
        int hi = known;
        while (lo < hi) {
            int mid = lo + (int) (((long) hi - lo) >>> 1);
            if (holds.test(mid)) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return hi;
    }
}
