package dockline.solve.discounted;

import dockline.arena.Arena;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.Monitor;
import dockline.monitor.PairMonitor;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.PolicyScore;
import dockline.solve.game.GameGraph;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import dockline.util.LongIntMap;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The robot's policy for a guaranteed discounted mission, read off the winning strategy of
 * {@link DiscountedSolver}: one row per situation the robot meets when it follows the strategy and
 * the disturbance plays every outcome, keyed by (cell, battery level, budget left, task progress,
 * {@link PolicyScore score memory}) — all of which the robot observes or computes itself.
 *
 * <p>The strategy is memoryless on the product arena x goal x comparator (x battery), so a product
 * vertex fixes the row: its arena vertex gives the cell and budget, its goal state the progress, the
 * battery monitor the level and the comparator state the score memory (a gap state its exact gap
 * n/q, the accepting sink {@link PolicyScore#SECURED}, the initial state the gap {@code -v/d} before
 * the first step, or {@code secured} when that is already beyond the bound). With the score alone
 * ({@code --score-only}) the product holds no battery level, so the walk carries the level the
 * gauge would show ({@code min(capacity, level + delta)}, no floor) next to the product vertex.
 *
 * <p>The closed loop of the strategy is acyclic (the chosen edge lowers the attractor rank, see
 * {@link Solution}), so the walk ends; it is O(rows + their outcome edges) with one hash look-up
 * per edge. Two product vertices with the same row key can only be the start and a vertex with
 * the same gap as {@code -v/d}; they have the same successors, hence the same attractor rank, so
 * one never lies in the other's closed loop — checked, and an {@link IllegalStateException} if not.
 *
 * <p>Source: attractor strategies lower the rank at every robot step (Grädel, Thomas, Wilke 2002,
 * "Automata, Logics, and Infinite Games", ch. 2), which is why the walk ends.
 */
public final class DiscountedPolicies {

    /** Most rows written; beyond, an {@link ArithmeticException} (reported as over a resource limit). */
    public static final int MAX_ROWS = 20_000_000;

    private DiscountedPolicies() {
    }

    /**
     * The policy of a guaranteed analysis.
     *
     * @throws IllegalArgumentException if the analysis is not guaranteed
     * @throws ArithmeticException      if the gap {@code -v/d} does not fit 64-bit rationals, or the
     *                                  policy would have more than {@link #MAX_ROWS} rows
     */
    public static Policy of(DiscountedAnalysis a) {
        if (!a.guaranteed()) {
            throw new IllegalArgumentException("the mission is not guaranteed: there is no policy to export");
        }
        ProductGame game = a.game();
        Solution sol = a.solution();
        GameGraph g = game.graph();
        Arena arena = game.arena();
        Mission m = a.mission();
        Monitor monitor = game.monitor();
        ReserveMonitor battery = null;
        DiscountedComparator comparator;
        PairMonitor pair = null;
        if (monitor instanceof PairMonitor pm) {
            pair = pm;
            battery = (ReserveMonitor) pm.first();
            comparator = (DiscountedComparator) pm.second();
        } else {
            comparator = (DiscountedComparator) monitor;
        }
        PolicyScore initial = startScore(a.objective(), a.maxAbsWeight());
        int capacity = m.capacityUnits();

        List<PolicyEntry> entries = new ArrayList<>();
        Set<List<Object>> keys = new HashSet<>();
        int start = game.start();
        if (start == ProductGame.WIN) {
            return new Policy(entries);
        }
        LongIntMap seen = new LongIntMap(1024);
        int[] todoP = new int[64];
        int[] todoL = new int[64];
        int tail = 0;
        todoP[tail] = start;
        // with the battery in the product the level is part of the vertex: carry 0 beside it
        todoL[tail++] = battery != null ? 0 : Math.min(capacity, m.startUnits());
        seen.put(pack(start, todoL[0]), 0);
        for (int head = 0; head < tail; head++) {
            int p = todoP[head];
            int level = todoL[head];
            int e = sol.strategyEdge(p);
            if (!g.isRobot(p) || e < 0) {
                throw new IllegalStateException("the strategy's closed loop meets a robot vertex without a choice: "
                        + game.describe(p));
            }
            int d = g.target(e);
            int ms = game.monitorState(p);
            int cs = pair != null ? pair.secondOf(ms) : ms;
            int shown = battery != null ? battery.level(pair.firstOf(ms)) : level;
            PolicyScore score = cs == DiscountedComparator.INITIAL ? initial
                    : cs == DiscountedComparator.ACCEPT ? PolicyScore.SECURED : PolicyScore.gap(comparator.gap(cs));
            int av = game.arenaVertex(p);
            PolicyEntry row = new PolicyEntry(arena.cellOf(av), shown, arena.budgetLeft(av), game.progressMask(p),
                    arena.action(game.arenaVertex(d)), score, arena.closures(av));
            if (!keys.add(List.of(row.cell(), row.level(), row.budgetLeft(), row.progress(), score, row.closures()))) {
                throw new IllegalStateException("two situations of the strategy share one row of the policy: "
                        + game.describe(p));
            }
            entries.add(row);
            for (int f = g.outBegin(d); f < g.outEnd(d); f++) {
                int t = g.target(f);
                if (t == ProductGame.WIN) {
                    continue;
                }
                if (t == ProductGame.LOSE) {
                    throw new IllegalStateException("the strategy's closed loop reaches the losing sink");
                }
                int next = battery != null ? 0
                        : (int) Math.min(capacity, (long) level + arena.weight(game.arenaEdge(d, f)));
                long k = pack(t, next);
                if (seen.get(k) == LongIntMap.ABSENT) {
                    if (tail == MAX_ROWS) {
                        throw new ArithmeticException("the policy has more than " + MAX_ROWS + " rows");
                    }
                    seen.put(k, tail);
                    if (tail == todoP.length) {
                        todoP = java.util.Arrays.copyOf(todoP, tail * 2);
                        todoL = java.util.Arrays.copyOf(todoL, tail * 2);
                    }
                    todoP[tail] = t;
                    todoL[tail++] = next;
                }
            }
        }
        return new Policy(entries);
    }

    private static long pack(int p, int level) {
        return ((long) p << 32) | (level & 0xffffffffL);
    }

    /**
     * The score memory before the first step: the gap {@code -v/d}, or {@link PolicyScore#SECURED} when
     * it is already beyond {@code B = mu/(d-1)} (then every first step leads to the comparator's
     * accepting sink). Compared exactly in BigInteger.
     *
     * @throws ArithmeticException if {@code -v/d} does not fit a 64-bit rational
     */
    static PolicyScore startScore(Objective.Discounted o, int mu) {
        long p = o.threshold().num();
        long q = o.threshold().den();
        long d = o.discount();
        // -p/(q d) against mu/(d-1): compare -p (d-1) with mu q d
        BigInteger lhs = BigInteger.valueOf(p).negate().multiply(BigInteger.valueOf(d - 1));
        BigInteger rhs = BigInteger.valueOf(mu).multiply(BigInteger.valueOf(q)).multiply(BigInteger.valueOf(d));
        int c = lhs.compareTo(rhs);
        if (o.relation() == Relation.AT_LEAST ? c >= 0 : c > 0) {
            return PolicyScore.SECURED;
        }
        long gcd = BigInteger.valueOf(p).gcd(BigInteger.valueOf(d)).longValueExact();
        long g = gcd == 0 ? 1 : gcd;
        return PolicyScore.gap(new Rational(Math.negateExact(p / g), Math.multiplyExact(q, d / g)));
    }
}
