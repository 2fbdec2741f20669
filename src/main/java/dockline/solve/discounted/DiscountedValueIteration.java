package dockline.solve.discounted;

import dockline.arena.Arena;
import dockline.model.Rational;
import dockline.model.Relation;
import java.util.Arrays;

/**
 * The optimisation baseline for the discounted objective (missions/README.md, "The discounted objective"):
 * value iteration for the
 * optimal discounted value of the arena game, then a comparison with the threshold. The robot
 * maximises and the disturbance minimises {@code DS = sum_i w_i / d^i} over infinite plays, where
 * {@code w_i} is the energy delta of the i-th step (an action and its outcome). The dock goal is
 * <b>ignored</b>: this is the route that can pick a value-optimal policy that never completes the
 * mission, kept only as a cross-check and for the benchmark; the main route is the comparator
 * product.
 *
 * <h2>Algorithm</h2>
 * The value {@code val} is the unique fixed point of the Bellman operator
 * {@code (T x)(r) = max_{actions a of r} min_{outcomes (a -> r', w)} (w + x(r')/d)}, a contraction
 * with factor 1/d in the sup norm, so value iteration converges geometrically and its error after n
 * rounds from 0 is at most {@code mu / (d^(n-1) (d-1))} (U. Zwick, M. Paterson, "The complexity of
 * mean payoff games on graphs", Theoretical Computer Science 158, 1996, section on discounted
 * payoff games: the update and this stopping bound). Instead of starting from 0 we iterate a lower
 * and an upper bound from {@code -+ mu d/(d-1)} (the extreme discounted sums), which encloses
 * {@code val} at every round and realises the same bound.
 *
 * <p>Both bounds live on a fixed grid {@code 1/S} (S a power of two, as large as 64-bit headroom
 * allows), rounded against their side (floor for the lower, ceiling for the upper bound), so the
 * enclosure stays sound, no floating point is involved, and, as the bounds are monotone integers,
 * the iteration stops by itself once the grid is reached. The comparison with {@code v} is decided
 * as soon as the enclosure at the start vertex excludes v or pins the relation. Otherwise (v equal
 * to, or closer than the grid to, the value) the exact value is recovered: the positional
 * strategies read off the iterate (greedy for both players) are fixed, the value of every vertex
 * under that pair is computed exactly in rationals (each play is a lasso: the cycle's value follows
 * from the geometric series, the rest by back-substitution), and this vector is accepted only if it
 * is a fixed point of T, checked exactly; by uniqueness of the fixed point it is then the game value
 * (L. S. Shapley, "Stochastic games", PNAS 39, 1953; Zwick and Paterson 1996). If 64-bit rationals
 * do not suffice, an {@link ArithmeticException} says so (a resource limit, never a guess).
 *
 * <h2>Cost</h2>
 * O(log_d(S mu) + 2) sweeps of O(|E|) each over the part of the arena reachable from the start
 * (Gauss-Seidel order), plus one O(|E|) exact recovery when needed.
 */
public final class DiscountedValueIteration {

    private final Arena arena;
    private final int d;
    private final int mu;
    private final long scale;
    private final long bound0;
    /** Robot vertices reachable from the start vertex (the game is closed on them). */
    private final int[] reach;

    /**
     * @throws IllegalArgumentException if {@code discount < 2} or the arena is not a proper
     *                                  turn-based arena (a vertex without successors, a robot edge with a weight)
     */
    public DiscountedValueIteration(Arena arena, int discount) {
        if (discount < 2) {
            throw new IllegalArgumentException("discount factor must be an integer of at least 2, got " + discount);
        }
        this.arena = arena;
        this.d = discount;
        this.mu = arena.maxAbsWeight();
        long room = (1L << 60) / Math.multiplyExact((long) Math.max(1, mu), (long) d);
        if (room < 1) {
            throw new ArithmeticException("weights or discount factor too large for 64-bit value iteration");
        }
        this.scale = Long.highestOneBit(room);
        long span = Math.multiplyExact(Math.multiplyExact((long) mu, (long) d), scale);
        this.bound0 = Math.floorDiv(span + (d - 2), d - 1); // ceil(mu d S / (d-1))
        this.reach = reachableRobotVertices(arena);
    }

    private static int[] reachableRobotVertices(Arena a) {
        boolean[] seen = new boolean[a.robotCount()];
        int[] queue = new int[a.robotCount()];
        int head = 0;
        int tail = 0;
        int s = a.startVertex();
        seen[s] = true;
        queue[tail++] = s;
        while (head < tail) {
            int r = queue[head++];
            if (a.outBegin(r) == a.outEnd(r)) {
                throw new IllegalArgumentException("robot vertex " + r + " has no action");
            }
            for (int e = a.outBegin(r); e < a.outEnd(r); e++) {
                int x = a.target(e);
                if (a.isRobot(x) || a.weight(e) != 0) {
                    throw new IllegalArgumentException("robot edges must lead to disturbance vertices with weight 0");
                }
                if (a.outBegin(x) == a.outEnd(x)) {
                    throw new IllegalArgumentException("disturbance vertex " + x + " has no outcome");
                }
                for (int f = a.outBegin(x); f < a.outEnd(x); f++) {
                    int t = a.target(f);
                    if (!a.isRobot(t)) {
                        throw new IllegalArgumentException("outcomes must lead to robot vertices");
                    }
                    if (!seen[t]) {
                        seen[t] = true;
                        queue[tail++] = t;
                    }
                }
            }
        }
        return Arrays.copyOf(queue, tail);
    }

    public int discount() {
        return d;
    }

    /** The weight bound mu used (the arena's largest absolute energy delta). */
    public int maxAbsWeight() {
        return mu;
    }

    /**
     * Optimise, then compare: decides {@code val(start) relation threshold}, iterating only as far
     * as the decision needs.
     *
     * @throws ArithmeticException if the value must be pinned exactly and 64-bit rationals do not suffice
     */
    public Result decide(Rational threshold, Relation relation) {
        if (threshold == null || relation == null) {
            throw new IllegalArgumentException("threshold and relation are required");
        }
        Run run = new Run();
        int start = arena.startVertex();
        while (true) {
            int verdict = verdict(run.lo[start], run.hi[start], threshold, relation);
            if (verdict != 0) {
                return run.result(verdict > 0, null);
            }
            if (!run.sweep()) {
                break;
            }
        }
        Recovered exact = run.recover();
        int c = Exact.compareFractions(exact.num[start], exact.den[start], threshold.num(), threshold.den());
        boolean holds = relation == Relation.AT_LEAST ? c >= 0 : c > 0;
        return run.result(holds, exact);
    }

    /**
     * The exact optimal value at the start vertex, with optimal positional strategies for both
     * players (greedy on the converged iterate, verified as a fixed point).
     *
     * @throws ArithmeticException if 64-bit rationals do not suffice
     */
    public Result solve() {
        Run run = new Run();
        while (run.sweep()) {
            // iterate to the grid
        }
        Recovered exact = run.recover();
        return run.result(false, exact);
    }

    /** +1 decided true, -1 decided false, 0 undecided by the enclosure [lo/S, hi/S]. */
    private int verdict(long lo, long hi, Rational v, Relation rel) {
        // sign(lo/S - p/q) = sign(lo q - p S)
        int cLo = Exact.compareProducts(lo, v.den(), v.num(), scale);
        int cHi = Exact.compareProducts(hi, v.den(), v.num(), scale);
        if (rel == Relation.AT_LEAST) {
            return cLo >= 0 ? 1 : cHi < 0 ? -1 : 0;
        }
        return cLo > 0 ? 1 : cHi <= 0 ? -1 : 0;
    }

    private static final class Recovered {
        final long[] num;
        final long[] den;

        Recovered(int n) {
            num = new long[n];
            den = new long[n];
        }
    }

    /** The mutable state of one iteration run. */
    private final class Run {
        final long[] lo = new long[arena.robotCount()];
        final long[] hi = new long[arena.robotCount()];
        int sweeps;
        /** Greedy strategies fixed by {@link #recover}, or read off the iterate by {@link #result}. */
        int[] robotChoice;
        int[] outcomeChoice;

        Run() {
            for (int r : reach) {
                lo[r] = -bound0;
                hi[r] = bound0;
            }
        }

        /** One Gauss-Seidel round of T on both bounds; false when nothing changed (grid reached). */
        boolean sweep() {
            boolean changed = false;
            for (int r : reach) {
                long bestLo = Long.MIN_VALUE;
                long bestHi = Long.MIN_VALUE;
                for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                    int a = arena.target(e);
                    long worstLo = Long.MAX_VALUE;
                    long worstHi = Long.MAX_VALUE;
                    for (int f = arena.outBegin(a); f < arena.outEnd(a); f++) {
                        int t = arena.target(f);
                        long ws = arena.weight(f) * scale;
                        long cl = ws + Math.floorDiv(lo[t], d);
                        long ch = ws - Math.floorDiv(-hi[t], d);
                        if (cl < worstLo) {
                            worstLo = cl;
                        }
                        if (ch < worstHi) {
                            worstHi = ch;
                        }
                    }
                    if (worstLo > bestLo) {
                        bestLo = worstLo;
                    }
                    if (worstHi > bestHi) {
                        bestHi = worstHi;
                    }
                }
                // keep the bounds monotone: any mix of valid bounds is a valid bound
                if (bestLo > lo[r]) {
                    lo[r] = bestLo;
                    changed = true;
                }
                if (bestHi < hi[r]) {
                    hi[r] = bestHi;
                    changed = true;
                }
            }
            sweeps++;
            return changed;
        }

        /** Greedy choices on the midpoint iterate: robot action per robot vertex, outcome edge per disturbance vertex. */
        int[][] greedy() {
            int[] robotChoice = new int[arena.robotCount()];
            int[] outcomeChoice = new int[arena.vertexCount() - arena.robotCount()];
            Arrays.fill(robotChoice, -1);
            Arrays.fill(outcomeChoice, -1);
            int rc = arena.robotCount();
            long sd = scale * d;
            for (int r : reach) {
                long best = Long.MIN_VALUE;
                for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                    int a = arena.target(e);
                    long worst = Long.MAX_VALUE;
                    int worstEdge = -1;
                    for (int f = arena.outBegin(a); f < arena.outEnd(a); f++) {
                        int t = arena.target(f);
                        // d * (w + mid/d), on the grid: no rounding needed
                        long c = arena.weight(f) * sd + mid(t);
                        if (c < worst) {
                            worst = c;
                            worstEdge = f;
                        }
                    }
                    outcomeChoice[a - rc] = worstEdge;
                    if (worst > best) {
                        best = worst;
                        robotChoice[r] = a;
                    }
                }
            }
            return new int[][] {robotChoice, outcomeChoice};
        }

        long mid(int r) {
            return lo[r] + (hi[r] - lo[r]) / 2;
        }

        /**
         * Exact values of the greedy strategy pair, verified to be the fixed point of T.
         *
         * @throws ArithmeticException if they overflow or are not the fixed point
         */
        Recovered recover() {
            int[][] g = greedy();
            int[] robotChoice = g[0];
            int[] outcomeChoice = g[1];
            int rc = arena.robotCount();
            int n = rc;
            Recovered x = new Recovered(n);
            int[] succ = new int[n];
            int[] stepWeight = new int[n];
            for (int r : reach) {
                int f = outcomeChoice[robotChoice[r] - rc];
                succ[r] = arena.target(f);
                stepWeight[r] = arena.weight(f);
            }
            try {
                valuesOfFunctionalGraph(succ, stepWeight, x);
                verifyFixedPoint(x);
            } catch (ArithmeticException e) {
                throw new ArithmeticException("value iteration cannot pin the discounted value with 64-bit rationals"
                        + " (" + e.getMessage() + ")");
            }
            int s = arena.startVertex();
            if (Exact.compareProducts(lo[s], x.den[s], x.num[s], scale) > 0
                    || Exact.compareProducts(hi[s], x.den[s], x.num[s], scale) < 0) {
                throw new IllegalStateException("recovered value lies outside the value-iteration enclosure");
            }
            this.robotChoice = robotChoice;
            this.outcomeChoice = outcomeChoice;
            return x;
        }

        /** Each vertex's play under the fixed strategies is a lasso; values by the geometric series. */
        void valuesOfFunctionalGraph(int[] succ, int[] w, Recovered x) {
            byte[] state = new byte[succ.length]; // 0 new, 1 on the current path, 2 done
            int[] path = new int[succ.length];
            int[] pos = new int[succ.length];
            for (int r0 : reach) {
                if (state[r0] != 0) {
                    continue;
                }
                int len = 0;
                int r = r0;
                while (state[r] == 0) {
                    state[r] = 1;
                    pos[r] = len;
                    path[len++] = r;
                    r = succ[r];
                }
                int stop = len;
                if (state[r] == 1) {
                    // cycle path[k..len-1]: X(u0) = sum_j c_j d^(L-j) / (d^L - 1)
                    int k = pos[r];
                    int cycle = len - k;
                    long numer = 0;
                    long dl = 1;
                    for (int j = k; j < len; j++) {
                        numer = Math.addExact(Math.multiplyExact(numer, d), w[path[j]]);
                        dl = Math.multiplyExact(dl, d);
                    }
                    numer = Math.multiplyExact(numer, d);
                    set(x, path[k], numer, dl - 1);
                    state[path[k]] = 2;
                    // the rest of the cycle, backwards from its last vertex
                    for (int j = len - 1; j > k; j--) {
                        stepBack(x, path[j], w[path[j]], succ[path[j]]);
                        state[path[j]] = 2;
                    }
                    stop = k;
                }
                for (int j = stop - 1; j >= 0; j--) {
                    stepBack(x, path[j], w[path[j]], succ[path[j]]);
                    state[path[j]] = 2;
                }
            }
        }

        /** X(r) = w + X(next)/d. */
        void stepBack(Recovered x, int r, int w, int next) {
            long dd = Math.multiplyExact(x.den[next], d);
            set(x, r, Math.addExact(Math.multiplyExact(w, dd), x.num[next]), dd);
        }

        void set(Recovered x, int r, long num, long den) {
            long g = Exact.gcd(num, den);
            x.num[r] = num / g;
            x.den[r] = den / g;
        }

        void verifyFixedPoint(Recovered x) {
            for (int r : reach) {
                long bestN = 0;
                long bestD = 0;
                for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                    int a = arena.target(e);
                    long worstN = 0;
                    long worstD = 0;
                    for (int f = arena.outBegin(a); f < arena.outEnd(a); f++) {
                        int t = arena.target(f);
                        long dd = Math.multiplyExact(x.den[t], d);
                        long nn = Math.addExact(Math.multiplyExact(arena.weight(f), dd), x.num[t]);
                        if (worstD == 0 || Exact.compareFractions(nn, dd, worstN, worstD) < 0) {
                            worstN = nn;
                            worstD = dd;
                        }
                    }
                    if (bestD == 0 || Exact.compareFractions(worstN, worstD, bestN, bestD) > 0) {
                        bestN = worstN;
                        bestD = worstD;
                    }
                }
                if (Exact.compareFractions(bestN, bestD, x.num[r], x.den[r]) != 0) {
                    throw new ArithmeticException("greedy strategies are not optimal at the available precision");
                }
            }
        }

        Result result(boolean holds, Recovered exact) {
            int s = arena.startVertex();
            if (robotChoice == null) {
                int[][] g = greedy();
                robotChoice = g[0];
                outcomeChoice = g[1];
            }
            Rational value = exact == null ? null : new Rational(exact.num[s], exact.den[s]);
            return new Result(holds, new Rational(lo[s], scale), new Rational(hi[s], scale), value, sweeps,
                    exact != null, arena, robotChoice, outcomeChoice);
        }
    }

    /** A lasso play: {@code vertices[0..]} robot vertices from the start, repeating from {@code loopStart}. */
    public record Lasso(int[] vertices, int loopStart) {
        public int length() {
            return vertices.length;
        }
    }

    /**
     * What value iteration found at the start vertex.
     *
     * @param holds             the decision of {@link #decide} (false for {@link #solve})
     * @param lower             lower end of the enclosure of the value at the start vertex
     * @param upper             upper end of the enclosure
     * @param exactValue        the exact value at the start vertex, when it was recovered ({@code null} if
     *                          the enclosure sufficed)
     * @param sweeps            the sweeps run
     * @param strategiesOptimal whether the strategies are verified optimal (exact recovery took place)
     * @param robotChoices      per robot vertex the disturbance vertex (action) the robot goes to (do not modify)
     * @param outcomeChoices    per disturbance vertex {@code a}, at {@code a - robotCount}, the outcome edge id
     *                          the disturbance takes (do not modify)
     */
    public record Result(boolean holds, Rational lower, Rational upper, Rational exactValue, int sweeps,
                         boolean strategiesOptimal, Arena arena, int[] robotChoices, int[] outcomeChoices) {

        /** The robot's positional choice at robot vertex {@code r}: the disturbance vertex (action) it goes to. */
        public int robotChoice(int r) {
            return robotChoices[r];
        }

        /** The disturbance's positional choice at disturbance vertex {@code a}: the outcome edge id. */
        public int outcomeChoice(int a) {
            return outcomeChoices[a - arena.robotCount()];
        }

        /** The play from the start vertex when both players follow these strategies. */
        public Lasso play() {
            int[] seenAt = new int[arena.robotCount()];
            Arrays.fill(seenAt, -1);
            int[] seq = new int[arena.robotCount()];
            int len = 0;
            int r = arena.startVertex();
            while (seenAt[r] < 0) {
                seenAt[r] = len;
                seq[len++] = r;
                r = arena.target(outcomeChoice(robotChoices[r]));
            }
            return new Lasso(Arrays.copyOf(seq, len), seenAt[r]);
        }
    }
}
