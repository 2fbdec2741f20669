package dockline.monitor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.model.Rational;
import dockline.model.Relation;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Example;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;

/**
 * The discounted comparator against exact rational arithmetic on closed forms of discounted sums.
 *
 * <p>Oracle: the geometric-series closed form of the discounted sum of a lasso, written out in
 * {@link DiscountedClosedForms} ({@code DS(u x^omega) = sum_{i<m} u_i/d^i + d^-m (sum_j x_j d^(L-j))/(d^L-1)},
 * constant c: {@code c d/(d-1)}). The comparator's verdict on every lasso must equal {@code DS R v}
 * evaluated in exact rationals.
 */
class DiscountedComparatorTest {

    static Rational lassoValue(int[] u, int[] x, int d) {
        return DiscountedClosedForms.lassoValue(u, x, d);
    }

    static boolean holds(Rational ds, Rational v, Relation rel) {
        int c = ds.compareTo(v);
        return rel == Relation.AT_LEAST ? c >= 0 : c > 0;
    }

    /**
     * Runs a deterministic automaton over u x^omega: after u, the state at each start of x is
     * recorded; the run is periodic once a state repeats there. Safety (>=): accepted iff REJECT is
     * never met; co-safety (>): accepted iff ACCEPT is met.
     */
    static boolean verdictOnLasso(DiscountedComparator c, int[] u, int[] x) {
        int s = c.initialState();
        for (int w : u) {
            s = c.step(s, w);
        }
        Map<Integer, Boolean> seenAtLoopStart = new HashMap<>();
        while (true) {
            if (s == Monitor.REJECT) {
                return false;
            }
            if (s == DiscountedComparator.ACCEPT) {
                return true;
            }
            if (seenAtLoopStart.put(s, Boolean.TRUE) != null) {
                // periodic without a verdict: safety holds, co-safety fails
                return c.relation() == Relation.AT_LEAST;
            }
            for (int w : x) {
                s = c.step(s, w);
                if (s == Monitor.REJECT || s == DiscountedComparator.ACCEPT) {
                    break;
                }
            }
        }
    }

    record Case(int d, int mu, int[] u, int[] x, Rational v) {
        @Override
        public String toString() {
            return "d=" + d + " mu=" + mu + " u=" + java.util.Arrays.toString(u) + " x=" + java.util.Arrays.toString(x)
                    + " v=" + v;
        }
    }

    @Provide
    Arbitrary<Case> lassos() {
        Arbitrary<Integer> ds = Arbitraries.of(2, 3, 4);
        Arbitrary<Integer> mus = Arbitraries.integers().between(1, 6);
        return Combinators.combine(ds, mus, Arbitraries.integers().between(1, 60), Arbitraries.longs())
                .flatAs((d, mu, q, seed) -> {
                    java.util.Random rnd = new java.util.Random(seed);
                    int[] u = new int[rnd.nextInt(7)];
                    int[] x = new int[1 + rnd.nextInt(5)];
                    for (int i = 0; i < u.length; i++) {
                        u[i] = rnd.nextInt(2 * mu + 1) - mu;
                    }
                    for (int i = 0; i < x.length; i++) {
                        x[i] = rnd.nextInt(2 * mu + 1) - mu;
                    }
                    Rational exact = lassoValue(u, x, d);
                    // half the thresholds near the value (ties included), half anywhere in the range
                    long p;
                    long qq = q;
                    switch (rnd.nextInt(4)) {
                        case 0 -> {
                            p = exact.num();
                            qq = exact.den();
                        }
                        case 1 -> p = Math.floorDiv(exact.num() * q, exact.den()) + rnd.nextInt(3) - 1;
                        default -> p = rnd.nextInt((int) (4L * mu * q) + 1) - 2L * mu * q;
                    }
                    return Arbitraries.just(new Case(d, mu, u, x, Rational.of(p, qq)));
                });
    }

    @Property(tries = 1500)
    void lassoVerdict_matchesExactClosedForm(@ForAll("lassos") Case c) {
        Rational ds = lassoValue(c.u(), c.x(), c.d());
        for (Relation rel : Relation.values()) {
            DiscountedComparator comp = new DiscountedComparator(c.d(), c.mu(), c.v(), rel);
            assertThat(verdictOnLasso(comp, c.u(), c.x()))
                    .as("%s %s, DS = %s", c, rel.symbol(), ds)
                    .isEqualTo(holds(ds, c.v(), rel));
        }
    }

    @Property(tries = 800)
    void completionVerdict_matchesExactPartialSum(@ForAll("lassos") Case c) {
        // after completion the weights are 0 forever: the lasso u 0^omega, DS = sum u_i / d^i
        Rational ds = lassoValue(c.u(), new int[0], c.d());
        for (Relation rel : Relation.values()) {
            DiscountedComparator comp = new DiscountedComparator(c.d(), c.mu(), c.v(), rel);
            int s = comp.initialState();
            for (int w : c.u()) {
                s = comp.step(s, w);
            }
            assertThat(comp.acceptsAtCompletion(s)).as("%s %s", c, rel.symbol()).isEqualTo(holds(ds, c.v(), rel));
            // and the same as running the automaton on 0^omega
            assertThat(verdictOnLasso(comp, c.u(), new int[] {0})).isEqualTo(holds(ds, c.v(), rel));
        }
    }

    @Example
    void constantSequence_hasClosedForm_c_d_over_d_minus_1() {
        // DS(c^omega, d) = c d/(d-1) (geometric series): c = 3, d = 2 gives exactly 6
        DiscountedComparator atLeast6 = new DiscountedComparator(2, 3, Rational.of(6), Relation.AT_LEAST);
        DiscountedComparator above6 = new DiscountedComparator(2, 3, Rational.of(6), Relation.ABOVE);
        assertThat(verdictOnLasso(atLeast6, new int[0], new int[] {3})).isTrue();
        assertThat(verdictOnLasso(above6, new int[0], new int[] {3})).isFalse();
        // c = -1, d = 3: -3/2
        DiscountedComparator m = new DiscountedComparator(3, 2, Rational.of(-3, 2), Relation.AT_LEAST);
        assertThat(verdictOnLasso(m, new int[0], new int[] {-1})).isTrue();
        DiscountedComparator m2 = new DiscountedComparator(3, 2, Rational.of(-149, 100), Relation.AT_LEAST);
        assertThat(verdictOnLasso(m2, new int[0], new int[] {-1})).isFalse();
    }

    @Example
    void firstWeight_isNotDiscounted() {
        // DS(5, 0, 0, ...) = 5 with w_0 undiscounted: >= 5 holds, > 5 fails
        assertThat(verdictOnLasso(new DiscountedComparator(2, 5, Rational.of(5), Relation.AT_LEAST),
                new int[] {5}, new int[] {0})).isTrue();
        assertThat(verdictOnLasso(new DiscountedComparator(2, 5, Rational.of(5), Relation.ABOVE),
                new int[] {5}, new int[] {0})).isFalse();
    }

    @Example
    void weightAboveBound_isRefused() {
        DiscountedComparator c = new DiscountedComparator(2, 3, Rational.of(3, 4), Relation.AT_LEAST);
        assertThatThrownBy(() -> c.step(c.initialState(), 4)).isInstanceOf(IllegalArgumentException.class);
    }

    @Example
    void hugeThreshold_isAResourceLimitNotAWrap() {
        assertThatThrownBy(() -> new DiscountedComparator(4, 1000, Rational.of(1, Long.MAX_VALUE / 3), Relation.ABOVE))
                .isInstanceOf(ArithmeticException.class);
    }

    // ---- state count -------------------------------------------------------------------------

    /**
     * preperiod + period of the base-d expansion of the fractional part of p/q, by schoolbook long
     * division: the digit after remainder r is floor(d r / q), the next remainder d r mod q; the
     * expansion repeats from the first remainder seen twice (common practice).
     */
    static int[] prePeriodAndPeriod(long p, long q, int d) {
        Map<Long, Integer> firstSeen = new HashMap<>();
        long r = Math.floorMod(p, q);
        int i = 0;
        while (!firstSeen.containsKey(r)) {
            firstSeen.put(r, i++);
            r = (r * d) % q;
        }
        int pre = firstSeen.get(r);
        return new int[] {pre, i - pre};
    }

    @Example
    void longDivision_knownExpansions() {
        // 1/7 in base 10 = 0.(142857): period 6 (textbook); 1/6 = 0.1(6): preperiod 1, period 1
        assertThat(prePeriodAndPeriod(1, 7, 10)).containsExactly(0, 6);
        assertThat(prePeriodAndPeriod(1, 6, 10)).containsExactly(1, 1);
        // 3/4 in base 2 = 0.11(0)
        assertThat(prePeriodAndPeriod(3, 4, 2)).containsExactly(2, 1);
    }

    /** All states reachable from the initial state over every weight in [-mu, mu], by breadth-first search. */
    static java.util.Set<Integer> exploreAll(DiscountedComparator c) {
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        queue.add(c.initialState());
        seen.add(c.initialState());
        while (!queue.isEmpty()) {
            int s = queue.poll();
            for (int w = -c.maxAbsWeight(); w <= c.maxAbsWeight(); w++) {
                int t = c.step(s, w);
                if (t != Monitor.REJECT && seen.add(t)) {
                    queue.add(t);
                }
            }
        }
        return seen;
    }

    @Provide
    Arbitrary<long[]> longPeriodThresholds() {
        // q among values with long base-d periods (primes where small d have large order) and
        // pre-periods (powers of d times such primes), numerators across the range
        Arbitrary<Integer> qs = Arbitraries.of(59, 53, 47, 43, 37, 29, 19, 11, 7, 5, 3, 1, 12, 24, 40, 44, 52, 54, 56, 58, 60);
        return Combinators.combine(Arbitraries.of(2, 3, 4), Arbitraries.integers().between(0, 5), qs,
                Arbitraries.integers().between(-200, 200)).as((d, mu, q, p) -> new long[] {d, mu, p, q});
    }

    @Property(tries = 300)
    void reachableStates_withinPeriodBound(@ForAll("longPeriodThresholds") long[] c) {
        int d = (int) c[0];
        int mu = (int) c[1];
        Rational v = Rational.of(c[2], c[3]);
        int[] pp = prePeriodAndPeriod(v.num(), v.den(), d);
        // bound: (floor(2 mu/(d-1)) + 1) per fractional class, one class per remainder of the long
        // division, plus the initial state and the accepting sink
        long bound = ((2L * mu) / (d - 1) + 1) * (pp[0] + pp[1]) + 2;
        for (Relation rel : Relation.values()) {
            DiscountedComparator comp = new DiscountedComparator(d, mu, v, rel);
            java.util.Set<Integer> reached = exploreAll(comp);
            assertThat((long) reached.size()).as("d=%d mu=%d v=%s %s", d, mu, v, rel.symbol()).isLessThanOrEqualTo(bound);
            // every discovered state was reached; the accepting sink is always numbered
            assertThat(comp.stateCount()).isEqualTo(reached.size() + (reached.contains(DiscountedComparator.ACCEPT) ? 0 : 1));
            assertThat(comp.stateBound()).isEqualTo(bound);
        }
    }

    @Property(tries = 200)
    void expansionLength_matchesLongDivision(@ForAll @IntRange(min = 1, max = 5000) int q,
                                             @ForAll @IntRange(min = -9000, max = 9000) int p,
                                             @ForAll @IntRange(min = 2, max = 12) int d) {
        int[] pp = prePeriodAndPeriod(p, q, d);
        assertThat(DiscountedComparator.expansionLength(p, q, d, 1 << 20)).isEqualTo(pp[0] + pp[1]);
    }

    @Example
    void states_areNumberedDenselyInDiscoveryOrder() {
        DiscountedComparator c = new DiscountedComparator(2, 2, Rational.of(3, 4), Relation.AT_LEAST);
        List<Integer> found = new ArrayList<>();
        int s = c.initialState();
        for (int w : new int[] {1, 0, -1}) {
            s = c.step(s, w);
            found.add(s);
        }
        // s_0 = 1 - 3/4 = 1/4, s_1 = 1/2, s_2 = 0: three new states 2, 3, 4
        assertThat(found).containsExactly(2, 3, 4);
        assertThat(c.gap(2)).isEqualTo(Rational.of(1, 4));
        assertThat(c.gap(3)).isEqualTo(Rational.of(1, 2));
        assertThat(c.gap(4)).isEqualTo(Rational.ZERO);
        assertThat(c.step(c.initialState(), 1)).isEqualTo(2);
        assertThat(c.stateCount()).isEqualTo(5);
    }
}
