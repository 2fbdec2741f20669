package dockline.monitor;

import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.util.LongIntMap;
import java.util.Arrays;

/**
 * The comparator automaton for a discounted sum against a rational threshold (missions/README.md, "The
 * discounted objective"): a
 * deterministic automaton over integer weights that accepts an infinite weight sequence w exactly
 * when {@code DS(w, d) R v}, for R one of {@code >=} and {@code >}.
 *
 * <h2>What it computes</h2>
 * The weights are read in order {@code w_0, w_1, ...} (one per robot step: the energy delta of the
 * step, in units, with {@code |w_i| <= mu}). The discounted sum is
 * {@code DS(w, d) = sum_{i >= 0} w_i / d^i} for an integer discount factor {@code d >= 2}, so the
 * first weight is not discounted. The threshold is {@code v = p/q} in lowest terms. After reading
 * {@code w_0 .. w_i} the automaton holds the scaled gap
 * <pre>
 *   s_i = d^i * (DS(w_0..w_i) - v) = sum_{j <= i} w_j d^(i-j)  -  d^i v        (i >= 0)
 * </pre>
 * which obeys {@code s_0 = w_0 - v} and {@code s_{i+1} = d * s_i + w_{i+1}}. (Formally
 * {@code s_{-1} = -v/d}; it is not stored as a number: the {@link #INITIAL} state stands for it,
 * and the first step maps it to {@code w_0 - v}.) Every {@code s_i} is a rational with denominator
 * {@code q}; a state stores the long numerator {@code n} with {@code s_i = n/q}.
 *
 * <p>The rest of the sequence moves {@code d^i * DS} by {@code R_i = sum_{k >= 1} w_{i+k} / d^k},
 * and {@code |R_i| <= B = mu/(d-1)}; since {@code DS - v = d^-i (s_i + R_i)}:
 * <ul>
 * <li>{@code s_i < -B} implies {@code DS < v}; {@code s_i > B} implies {@code DS > v};</li>
 * <li>{@code DS >= v} iff {@code s_i >= -B} for every i (a safety condition), and
 *     {@code DS > v} iff {@code s_i > B} for some i (a co-safety condition).</li>
 * </ul>
 * For {@code >=} the automaton rejects at {@code s < -B} and accepts (sink {@link #ACCEPT}) at
 * {@code s >= B}; for {@code >} it rejects at {@code s <= -B} (then {@code DS <= v}) and accepts at
 * {@code s > B}. Other values are states. After mission completion the weights are 0 forever, so
 * {@code DS} equals the partial sum and {@link #acceptsAtCompletion} decides exactly:
 * {@code s >= 0} for {@code >=}, {@code s > 0} for {@code >}.
 *
 * <h2>Size and cost</h2>
 * {@code s_i} is an integer minus {@code d^i v}, so its fractional part follows the remainders
 * {@code d^i p mod q}, i.e. the digits of the base-d expansion of v, which are eventually periodic.
 * At most {@code floor(2B) + 1} states share a fractional part, hence the reachable states number at
 * most {@code (floor(2 mu/(d-1)) + 1) * (preperiod + period) + 2} (the initial state and the
 * accepting sink; {@link #REJECT} is not a numbered state). States are numbered densely in the order
 * they are discovered, on the fly; {@link #step} is O(1) expected time (one open-addressing lookup,
 * no boxing), with overflow-checked long arithmetic; the constructor checks that no step can
 * overflow and throws {@link ArithmeticException} otherwise.
 *
 * <h2>Sources</h2>
 * The published work on comparator automata for discounted sums (2018; extended journal version
 * 2022): for integer discount factors the comparator is a finite deterministic automaton, with
 * safety / co-safety acceptance according to the relation; and the published work on satisficing
 * in quantitative games (2021): the threshold question is solved by the product of the game with
 * the comparator and a safety or reachability game, without computing the optimal value. The
 * bounds used here are re-derived in this javadoc from the geometric series.
 *
 * <p>State numbers are assigned as states are discovered, so instances are mutable and not
 * thread-safe; a given (state, weight) pair always steps to the same state.
 */
public final class DiscountedComparator implements Monitor {

    /** The state before any weight is read. */
    public static final int INITIAL = 0;
    /** The accepting sink: the comparison holds whatever the rest of the sequence is. */
    public static final int ACCEPT = 1;

    private static final int FIRST_NUMBERED = 2;
    /** Most iterations spent counting the period of the threshold's expansion in {@link #stateBound()}. */
    private static final int PERIOD_SEARCH_LIMIT = 1 << 22;

    private final int discount;
    private final int mu;
    private final Rational threshold;
    private final Relation relation;
    private final long p;
    private final long q;
    /** mu * q: the bound B = mu/(d-1) is compared as n*(d-1) against +-muQ. */
    private final long muQ;
    private final long dMinus1;

    private final LongIntMap index;
    private long[] numerators;
    private int count;

    /**
     * A comparator for {@code DS(w, discount) relation threshold} over weights with
     * {@code |w| <= maxAbsWeight}.
     *
     * @throws IllegalArgumentException if {@code discount < 2} or {@code maxAbsWeight < 0}
     * @throws ArithmeticException      if the threshold's numerator or denominator is so large that
     *                                  a step could overflow a long
     */
    public DiscountedComparator(int discount, int maxAbsWeight, Rational threshold, Relation relation) {
        if (discount < 2) {
            throw new IllegalArgumentException("discount factor must be an integer of at least 2, got " + discount);
        }
        if (maxAbsWeight < 0) {
            throw new IllegalArgumentException("weight bound must not be negative");
        }
        if (threshold == null || relation == null) {
            throw new IllegalArgumentException("threshold and relation are required");
        }
        this.discount = discount;
        this.mu = maxAbsWeight;
        this.threshold = threshold;
        this.relation = relation;
        this.p = threshold.num();
        this.q = threshold.den();
        this.dMinus1 = discount - 1L;
        try {
            this.muQ = Math.multiplyExact((long) mu, q);
            // headroom: a stored |n| <= mu q, so |d n + w q| <= (d + 1) mu q; the first step is
            // |w q - p| <= mu q + |p|; both are then multiplied by d - 1 in the bound test
            long stepMax = Math.multiplyExact(discount + 1L, muQ);
            long firstMax = Math.addExact(muQ, Math.absExact(p));
            Math.multiplyExact(Math.max(stepMax, firstMax), dMinus1);
        } catch (ArithmeticException e) {
            throw new ArithmeticException("threshold " + threshold + " with weights up to " + mu
                    + " units is too large for exact 64-bit comparator arithmetic");
        }
        this.index = new LongIntMap(64);
        this.numerators = new long[64];
        this.count = FIRST_NUMBERED;
    }

    /** The comparator of a mission's discounted objective, for weights up to {@code maxAbsWeight}. */
    public static DiscountedComparator of(Objective.Discounted objective, int maxAbsWeight) {
        return new DiscountedComparator(objective.discount(), maxAbsWeight, objective.threshold(), objective.relation());
    }

    public int discount() {
        return discount;
    }

    public int maxAbsWeight() {
        return mu;
    }

    public Rational threshold() {
        return threshold;
    }

    public Relation relation() {
        return relation;
    }

    @Override
    public int initialState() {
        return INITIAL;
    }

    /**
     * @throws IllegalArgumentException if {@code |w|} exceeds the weight bound (the bound is what
     *                                  makes the early verdicts sound)
     */
    @Override
    public int step(int s, int w) {
        if (s == REJECT || s == ACCEPT) {
            return s;
        }
        if (w > mu || w < -mu) {
            throw new IllegalArgumentException("weight " + w + " exceeds the comparator's bound " + mu);
        }
        long wq = Math.multiplyExact((long) w, q);
        long n = s == INITIAL ? Math.subtractExact(wq, p)
                : Math.addExact(Math.multiplyExact((long) discount, numerators[s]), wq);
        long t = Math.multiplyExact(n, dMinus1);
        if (relation == Relation.AT_LEAST) {
            if (t < -muQ) {
                return REJECT;
            }
            if (t >= muQ) {
                return ACCEPT;
            }
        } else {
            if (t <= -muQ) {
                return REJECT;
            }
            if (t > muQ) {
                return ACCEPT;
            }
        }
        return intern(n);
    }

    private int intern(long n) {
        int s = index.get(n);
        if (s != LongIntMap.ABSENT) {
            return s;
        }
        if (count == numerators.length) {
            numerators = Arrays.copyOf(numerators, numerators.length * 2);
        }
        s = count++;
        numerators[s] = n;
        index.put(n, s);
        return s;
    }

    @Override
    public boolean acceptsAtCompletion(int s) {
        if (s == REJECT) {
            return false;
        }
        if (s == ACCEPT) {
            return true;
        }
        if (s == INITIAL) {
            // nothing read: DS = 0
            int c = Long.signum(-p);
            return relation == Relation.AT_LEAST ? c >= 0 : c > 0;
        }
        long n = numerators[s];
        return relation == Relation.AT_LEAST ? n >= 0 : n > 0;
    }

    /**
     * The a-priori bound {@code (floor(2 mu/(d-1)) + 1) * (preperiod + period) + 2} on the states
     * (see the class comment); when the period of the threshold's base-d expansion is too long to
     * count quickly, {@code q} stands in for {@code preperiod + period} (there are only q remainders).
     */
    @Override
    public long stateBound() {
        long perClass = (2L * mu) / dMinus1 + 1;
        long classes = expansionLength(p, q, discount, PERIOD_SEARCH_LIMIT);
        if (classes < 0) {
            classes = q;
        }
        try {
            return Math.addExact(Math.multiplyExact(perClass, classes), FIRST_NUMBERED);
        } catch (ArithmeticException e) {
            return Long.MAX_VALUE;
        }
    }

    /**
     * preperiod + period of the remainder sequence {@code r_0 = p mod q, r_{i+1} = d r_i mod q} (the
     * base-d long division of p/q), by Brent's cycle detection (R. P. Brent, "An improved Monte Carlo
     * factorization algorithm", BIT 20, 1980) in O(preperiod + period) time and O(1) memory; -1 when
     * more than {@code limit} steps would be needed.
     */
    static long expansionLength(long p, long q, int d, int limit) {
        long x0 = Math.floorMod(p, q);
        // period lambda
        long power = 1;
        long lambda = 1;
        long tortoise = x0;
        long hare = next(x0, q, d);
        long steps = 0;
        while (tortoise != hare) {
            if (power == lambda) {
                tortoise = hare;
                power *= 2;
                lambda = 0;
            }
            hare = next(hare, q, d);
            lambda++;
            if (++steps > limit) {
                return -1;
            }
        }
        // preperiod: advance one pointer lambda steps, then walk both until they meet
        tortoise = x0;
        hare = x0;
        for (long i = 0; i < lambda; i++) {
            hare = next(hare, q, d);
        }
        long pre = 0;
        while (tortoise != hare) {
            tortoise = next(tortoise, q, d);
            hare = next(hare, q, d);
            pre++;
        }
        return pre + lambda;
    }

    private static long next(long r, long q, int d) {
        // r < q, so d * r is exact whenever q * d fits; fall back to 128-bit-safe modular multiply
        long hi = Math.multiplyHigh(r, d);
        if (hi == 0 && r * d >= 0) {
            return (r * d) % q;
        }
        return java.math.BigInteger.valueOf(r).multiply(java.math.BigInteger.valueOf(d))
                .mod(java.math.BigInteger.valueOf(q)).longValue();
    }

    /**
     * The gap state whose scaled gap is {@code numerator / q} (q the threshold's denominator), or -1
     * when no such state has been discovered: the lookup that inverts {@link #step} (for a weight w,
     * a gap state n steps to {@code d n + w q}), so that a backward search can find a state's
     * predecessors without storing the product's edges. O(1) expected time.
     */
    public int stateWithNumerator(long numerator) {
        int s = index.get(numerator);
        return s == LongIntMap.ABSENT ? -1 : s;
    }

    /** The numerator n of a gap state's scaled gap n/q (see {@link #gap}), without allocating. */
    public long numerator(int s) {
        if (!isGapState(s)) {
            throw new IllegalArgumentException("state " + s + " holds no gap value");
        }
        return numerators[s];
    }

    /** Number of states discovered so far, counting {@link #INITIAL} and {@link #ACCEPT}. */
    public int stateCount() {
        return count;
    }

    /** Whether {@code s} is a numbered gap state (not initial, not a sink). */
    public boolean isGapState(int s) {
        return s >= FIRST_NUMBERED && s < count;
    }

    /** The scaled gap {@code s_i} held by a gap state, exactly. */
    public Rational gap(int s) {
        if (!isGapState(s)) {
            throw new IllegalArgumentException("state " + s + " holds no gap value");
        }
        return new Rational(numerators[s], q);
    }

    @Override
    public String describe(int s) {
        if (s == REJECT) {
            return "discounted score can no longer " + (relation == Relation.AT_LEAST ? "reach " : "exceed ") + threshold;
        }
        if (s == ACCEPT) {
            return "discounted score " + relation.symbol() + " " + threshold + " whatever follows";
        }
        if (s == INITIAL) {
            return "no step yet";
        }
        return "scaled gap to the threshold " + gap(s);
    }
}
