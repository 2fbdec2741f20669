package dockline.bench;

import dockline.monitor.DiscountedComparator;
import java.util.Arrays;

/**
 * The steps of one {@link DiscountedComparator}, memoised per (state, weight) in flat int arrays,
 * forward ({@link #step}) and backward ({@link #gapPredecessor}, {@link #initialPredecessor}), for
 * the product builders of the discounted threshold question. A comparator has few states (a handful
 * to a few hundred) and the weights lie in {@code [-mu, mu]}, so a step read from the memo costs one
 * array read where the comparator itself hashes a long.
 *
 * <p>The backward step inverts the comparator's recurrence {@code s' = d s + w q} (numerators over
 * the threshold's denominator q; DiscountedComparator's class comment): for a weight w, a gap state
 * s' has at most one gap-state predecessor, {@code (s' - w q) / d} when that division is exact and
 * that state has been discovered, and the initial state precedes it iff {@code s' = w q - p}. So a
 * backward search over the product needs no stored edges.
 *
 * <p>Memory: at most {@value #MEMO_MAX_ENTRIES} ints per direction (16 MB); a state or weight past
 * the memo's reach is stepped directly. Not thread-safe, like the comparator.
 *
 * <p>Source: the comparator automaton for discounted sums (published work on comparator automata,
 * 2018); memoisation, O(1) per memoised step.
 */
final class ComparatorSteps {

    /** Memoise only when a state's row of weights is at most this long. */
    private static final int MEMO_MAX_WIDTH = 1 << 12;
    /** ... and only up to this many (state, weight) entries per direction. */
    private static final int MEMO_MAX_ENTRIES = 1 << 22;
    /** A memo entry not computed yet (forward steps are at least Monitor.REJECT, backward ones at least -2). */
    private static final int UNKNOWN = Integer.MIN_VALUE;
    /** Backward memo: no gap value steps to the state on the weight (the division is not exact). */
    private static final int NO_PREDECESSOR = -2;

    private final DiscountedComparator comparator;
    private final int mu;
    private final int width;
    private final long q;
    private final long p;
    private final long d;
    private int[] forward;
    private int[] backward;

    ComparatorSteps(DiscountedComparator comparator) {
        this.comparator = comparator;
        this.mu = comparator.maxAbsWeight();
        this.width = 2 * mu + 1;
        this.q = comparator.threshold().den();
        this.p = comparator.threshold().num();
        this.d = comparator.discount();
        if (width <= MEMO_MAX_WIDTH) {
            forward = new int[width * Math.min(64, MEMO_MAX_ENTRIES / width)];
            Arrays.fill(forward, UNKNOWN);
        }
    }

    DiscountedComparator comparator() {
        return comparator;
    }

    /** The comparator's step from {@code s} on weight {@code w} (a weight out of bound throws, as the comparator does). */
    int step(int s, int w) {
        long slot = (long) s * width + (w + mu);
        int s2;
        if (forward != null && w >= -mu && w <= mu && slot < forward.length) {
            s2 = forward[(int) slot];
            if (s2 == UNKNOWN) {
                s2 = comparator.step(s, w);
                forward[(int) slot] = s2;
                forward = grow(forward, comparator.stateCount(), width);
            }
        } else {
            s2 = comparator.step(s, w);
            if (forward != null) {
                forward = grow(forward, comparator.stateCount(), width);
            }
        }
        return s2;
    }

    /**
     * The gap state that steps to the gap state {@code s2} on weight {@code w}, or -1 when none has
     * been discovered yet. May be called while states are still being discovered: only answers that
     * cannot change are memoised (a state found, or no gap value that steps to s2), while "not
     * discovered yet" is looked up again next time.
     */
    int gapPredecessor(int s2, int w) {
        if (width <= MEMO_MAX_WIDTH && w >= -mu && w <= mu) {
            long slot = (long) s2 * width + (w + mu);
            if (backward == null || slot >= backward.length) {
                backward = backward == null ? fresh(comparator.stateCount(), width)
                        : grow(backward, Math.max(s2 + 1, comparator.stateCount()), width);
            }
            if (slot < backward.length) {
                int s = backward[(int) slot];
                if (s >= 0) {
                    return s;
                }
                if (s == NO_PREDECESSOR) {
                    return -1;
                }
                s = invert(s2, w);
                if (s != -1) {
                    backward[(int) slot] = s;
                }
                return s < 0 ? -1 : s;
            }
        }
        int s = invert(s2, w);
        return s < 0 ? -1 : s;
    }

    /** The gap-state predecessor, -1 when its value is not a state yet, or {@link #NO_PREDECESSOR} when no value steps to s2. */
    private int invert(int s2, int w) {
        long r = Math.subtractExact(comparator.numerator(s2), Math.multiplyExact(w, q));
        return r % d != 0 ? NO_PREDECESSOR : comparator.stateWithNumerator(r / d);
    }

    private static int[] fresh(int states, int width) {
        int[] m = new int[(int) Math.min((long) Math.max(states, 1) * width, MEMO_MAX_ENTRIES / width * (long) width)];
        Arrays.fill(m, UNKNOWN);
        return m;
    }

    /** Whether the initial state steps to the gap state {@code s2} on weight {@code w}. */
    boolean initialPredecessor(int s2, int w) {
        return comparator.numerator(s2) == Math.subtractExact(Math.multiplyExact(w, q), p);
    }

    /** The memo with a row for every state discovered so far (up to its cap), new entries unknown. */
    private static int[] grow(int[] memo, int states, int width) {
        long want = (long) states * width;
        if (want <= memo.length || memo.length >= MEMO_MAX_ENTRIES / width * width) {
            return memo;
        }
        int grown = (int) Math.min(MEMO_MAX_ENTRIES / width * (long) width, Math.max(2L * memo.length, want));
        int old = memo.length;
        int[] g = Arrays.copyOf(memo, grown);
        Arrays.fill(g, old, grown, UNKNOWN);
        return g;
    }
}
