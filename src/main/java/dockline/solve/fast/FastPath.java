package dockline.solve.fast;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import dockline.util.VisitQueue;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.IntConsumer;

/**
 * The reserve question for missions without charging before the end, answered on arena × goal by
 * {@link MinChargeSolver} (Knuth 1977) instead of the product with the battery levels: the verdict,
 * the highest floor that can be guaranteed, the robot's policy of least need and the worst battery
 * level under it.
 *
 * <p><b>The figures</b> (start level s, floor f, n = need of the start, from
 * {@link MinChargeSolver#solveStart()}): guaranteed ⇔ s ≥ f and n ≤ s − f; the highest floor that can
 * be guaranteed is s − n when n ≤ s, none otherwise. The policy picks at every robot vertex the action
 * of least need (it does not depend on the level); its closed loop never cycles (each choice leads to a
 * vertex finalised earlier), and the most any play of it spends is exactly n, so the worst level under
 * it is s − n, reached at the end of the worst play (the level only falls). This is the safest policy:
 * its worst level is the highest floor itself.
 *
 * <p><b>The policy as rows.</b> A {@link Policy} row is a situation (cell, level, budget, tasks), so
 * the policy is written out for the situations its closed loop reaches from the start, found by a
 * search over (arena vertex, goal state, level). That loop can be far larger than arena × goal (one
 * situation per level a pair is reached with), so the rows are written only when the loop has at most
 * {@code maxPolicyRows} robot situations; otherwise the analysis says so ({@link Analysis#loopTooLarge()})
 * and no policy is given, never a policy that was not checked. A first search over the pairs alone
 * (no levels, a lower bound of the situations) skips the full search when it is already too large.
 *
 * <p>Cost: O(m·G·log(n·G)) for the solve (see {@link MinChargeSolver}), O(pairs of the loop) for the
 * first search, O(situations × out-degree) expected for the second (an open-addressing hash set of
 * packed longs).
 */
public final class FastPath {

    /** The default bound on the policy's rows (robot situations of its closed loop). */
    public static final int DEFAULT_MAX_POLICY_ROWS = 2_000_000;

    private FastPath() {
    }

    /**
     * What the fast path found. Energy figures in units of the mission's scale.
     *
     * @param mission                       the mission as analysed
     * @param arena                         its compiled arena (for certificates)
     * @param verdict                       the start verdict
     * @param startUnits                    starting level
     * @param reserveUnits                  reserve floor
     * @param capacityUnits                 capacity
     * @param startNeedUnits                the least energy the robot must be able to spend to finish from the
     *                                      start, {@link MinChargeSolver#INFINITE} when it cannot force completion
     *                                      (verdict only: also when it exceeds the energy available)
     * @param highestGuaranteedReserveUnits s − need, when need ≤ s (empty when verdict only)
     * @param worstCaseMinimumUnits         the worst level under the policy of least need, s − need, when guaranteed
     *                                      (empty when verdict only)
     * @param policy                        the policy's rows over its closed loop from the start, when guaranteed
     *                                      and the loop has at most {@code maxPolicyRows} robot situations
     * @param loopStates                    robot situations of the closed loop (when too large: the count at which
     *                                      the search stopped, a lower bound); 0 when not searched
     * @param loopTooLarge                  the loop has more than {@code maxPolicyRows} robot situations
     * @param maxPolicyRows                 the bound in force
     * @param exploredVertices              robot vertices of arena × goal the solver finalised
     * @param pairVertices                  vertices of arena × goal
     * @param verdictOnly                   only the verdict was asked ({@link MinChargeSolver#decide()})
     * @param solveMillis                   arena compile and solve
     * @param totalMillis                   everything, the policy rows included
     */
    public record Analysis(Mission mission, Arena arena, Verdict verdict, int startUnits, int reserveUnits,
                           int capacityUnits, int startNeedUnits, OptionalInt highestGuaranteedReserveUnits,
                           OptionalInt worstCaseMinimumUnits, Optional<Policy> policy, long loopStates,
                           boolean loopTooLarge, int maxPolicyRows, long exploredVertices, long pairVertices,
                           boolean verdictOnly, long solveMillis, long totalMillis) {

        public boolean guaranteed() {
            return verdict == Verdict.GUARANTEED;
        }
    }

    /** Whether the fast path applies to the mission (see {@link MinChargeSolver#applicable}). */
    public static boolean applies(Mission mission) {
        return MinChargeSolver.applicable(ArenaCompiler.compile(mission), GoalAutomaton.of(mission));
    }

    /**
     * Analyses the mission by the fast path; empty when it does not apply (the robot can charge
     * before the mission is complete).
     *
     * @param verdictOnly stop as soon as the verdict is known: no need, no highest floor, no policy
     * @throws ProductTooLargeException if arena × goal needs more than half the JVM's heap
     */
    public static Optional<Analysis> analyse(Mission mission, int maxPolicyRows, boolean verdictOnly) {
        long t0 = System.nanoTime();
        return analyseTimed(mission, ArenaCompiler.compile(mission), GoalAutomaton.of(mission), maxPolicyRows,
                verdictOnly, t0, 0, null);
    }

    /** As {@link #analyse(Mission, int, boolean)} on an arena and goal already compiled from the mission. */
    public static Optional<Analysis> analyse(Mission mission, Arena arena, GoalAutomaton goal, int maxPolicyRows,
                                             boolean verdictOnly) {
        return analyse(mission, arena, goal, maxPolicyRows, verdictOnly, 0);
    }

    /**
     * As {@link #analyse(Mission, Arena, GoalAutomaton, int, boolean)} within a memory budget.
     *
     * @param memoryBudgetBytes the budget ({@code --max-memory}), 0 for the default (half the JVM's heap)
     * @throws ProductTooLargeException if arena × goal needs more than the budget
     */
    public static Optional<Analysis> analyse(Mission mission, Arena arena, GoalAutomaton goal, int maxPolicyRows,
                                             boolean verdictOnly, long memoryBudgetBytes) {
        return analyseTimed(mission, arena, goal, maxPolicyRows, verdictOnly, System.nanoTime(), memoryBudgetBytes,
                null);
    }

    /**
     * The strengthened pass on an arena restricted to some closure phases
     * ({@link ArenaCompiler#compileWithin}): as {@link #analyse(Mission, Arena, GoalAutomaton, int, boolean, long)}
     * on the game in which an outcome into a left-out phase is not the building's to choose
     * ({@link MinChargeSolver#MinChargeSolver(Arena, GoalAutomaton, boolean)}), so its need is a lower bound of
     * the mission's and a start it cannot finish from is lost in the mission too. When the start's need is
     * finite (for the verdict alone: when it is guaranteed) the closed loop of its policy from the start is
     * walked, and every outcome into a left-out phase it meets is handed to {@code leftOutMet} (by arena edge).
     * If it meets none, that policy plays in the mission as it is, and the figures and the policy are the
     * mission's; if it meets one, the figures are bounds only and no policy is given (the rows are not built).
     * Whether one was met is for the caller to count.
     */
    public static Optional<Analysis> analyseStrengthened(Mission mission, Arena arena, GoalAutomaton goal,
                                                         int maxPolicyRows, boolean verdictOnly,
                                                         long memoryBudgetBytes, IntConsumer leftOutMet) {
        return analyseTimed(mission, arena, goal, maxPolicyRows, verdictOnly, System.nanoTime(), memoryBudgetBytes,
                java.util.Objects.requireNonNull(leftOutMet));
    }

    /**
     * Heap per pair of arena × goal while the fast path runs, about: the minimum-charge search's need,
     * flags and choice per robot pair and maximum and count per disturbance pair (5 to 6 bytes), with
     * room for its heap and the applicability search before it.
     */
    static final long BYTES_PER_PAIR = 8;

    /**
     * Refuses, before anything is allocated, an arena × goal over the memory budget, with its real size
     * and the budget that applied; past the int range of its arrays when the memory would fit (only with
     * a budget of more than 16 GB) it is refused for that range.
     */
    static void refuseIfTooLarge(Arena arena, GoalAutomaton goal, long memoryBudgetBytes) {
        long pairs = SizeEstimate.satMul(arena.vertexCount(), goal.stateCount());
        long edges = SizeEstimate.satMul(arena.edgeCount(), goal.stateCount());
        long bytes = SizeEstimate.satAdd(SizeEstimate.satMul(pairs, BYTES_PER_PAIR), 0);
        long budget = ProductOptions.budgetInForce(memoryBudgetBytes);
        SizeEstimate size = new SizeEstimate(pairs, edges, bytes, 0);
        if (bytes > budget) {
            throw new ProductTooLargeException(size, budget, false, "make the game smaller: fewer tasks in any order"
                    + " (each doubles it), a smaller disturbance budget K or a coarser cell size (fewer cells); the"
                    + " energy resolution does not change it");
        }
        if (pairs > Integer.MAX_VALUE - 16) {
            throw ProductTooLargeException.indexRange(size, pairs);
        }
    }

    private static Optional<Analysis> analyseTimed(Mission mission, Arena arena, GoalAutomaton goal, int maxPolicyRows,
                                                   boolean verdictOnly, long t0, long memoryBudgetBytes,
                                                   IntConsumer leftOutMet) {
        long budget = ProductOptions.budgetInForce(memoryBudgetBytes);
        long pairs = SizeEstimate.satMul(arena.vertexCount(), goal.stateCount());
        if (MinChargeSolver.canCharge(arena) && (SizeEstimate.satMul(pairs, 5) > budget
                || pairs > Integer.MAX_VALUE - 16)) {
            // too large even to search whether a charge comes before the end: the product route, whose
            // game is at least as large, decides and refuses with its own size
            return Optional.empty();
        }
        if (!MinChargeSolver.applicable(arena, goal)) {
            return Optional.empty();
        }
        refuseIfTooLarge(arena, goal, memoryBudgetBytes);
        int s = mission.startUnits();
        int f = mission.reserveUnits();
        int cap = mission.capacityUnits();
        MinChargeSolver solver = new MinChargeSolver(arena, goal, leftOutMet != null);
        if (verdictOnly) {
            MinChargeSolver.Values vs = solver.decideValues();
            MinChargeSolver.Result r = vs.result();
            if (leftOutMet != null && r.guaranteed()) {
                meetsLeftOut(arena, goal, vs, leftOutMet);
            }
            long ms = (System.nanoTime() - t0) / 1_000_000L;
            return Optional.of(new Analysis(mission, arena, Verdict.of(r.guaranteed()), s, f, cap, r.startNeed(),
                    OptionalInt.empty(), OptionalInt.empty(), Optional.empty(), 0, false, maxPolicyRows,
                    r.explored(), r.productVertices(), true, ms, ms));
        }
        MinChargeSolver.Values values = solver.solveStart();
        MinChargeSolver.Result r = values.result();
        long solved = System.nanoTime();
        int need = r.startNeed();
        OptionalInt highest = need != MinChargeSolver.INFINITE && need <= s ? OptionalInt.of(s - need)
                : OptionalInt.empty();
        OptionalInt worst = OptionalInt.empty();
        Optional<Policy> policy = Optional.empty();
        long states = 0;
        boolean tooLarge = false;
        boolean bounds = leftOutMet != null && need != MinChargeSolver.INFINITE
                && meetsLeftOut(arena, goal, values, leftOutMet);
        if (r.guaranteed() && !bounds) {
            worst = OptionalInt.of(s - need);
            Rows rows = rows(arena, goal, values, s, maxPolicyRows);
            states = rows.states;
            tooLarge = rows.entries == null;
            if (!tooLarge) {
                policy = Optional.of(new Policy(rows.entries));
            }
        }
        long t1 = System.nanoTime();
        return Optional.of(new Analysis(mission, arena, Verdict.of(r.guaranteed()), s, f, cap, need, highest, worst,
                policy, states, tooLarge, maxPolicyRows, r.explored(), r.productVertices(), false,
                (solved - t0) / 1_000_000L, (t1 - t0) / 1_000_000L));
    }

    /**
     * Whether the closed loop of the chosen actions from the start meets an outcome into a left-out phase; each
     * one met is handed to {@code leftOutMet}. The start's need must be finite.
     */
    private static boolean meetsLeftOut(Arena arena, GoalAutomaton goal, MinChargeSolver.Values values,
                                        IntConsumer leftOutMet) {
        int a0 = arena.startVertex();
        int g0 = goal.initial(arena.cellZones(arena.cell(a0)));
        if (g0 == GoalAutomaton.REJECT || goal.accepting(g0, arena.isDock(arena.cell(a0)))) {
            return false; // complete at the start: no loop
        }
        boolean[] met = new boolean[1];
        pairLoop(arena, goal, values, a0, g0, Integer.MAX_VALUE, e -> {
            met[0] = true;
            leftOutMet.accept(e);
        });
        return met[0];
    }

    /** The rows (null when over the bound) and the robot situations met. */
    record Rows(List<PolicyEntry> entries, long states) {
    }

    /**
     * The rows of the policy of least need over its closed loop from the start at level s, or
     * {@code entries == null} when the loop has more than {@code max} robot situations.
     *
     * <p>Every pair (robot vertex, goal state) the loop meets has a chosen action, and no outcome of that
     * action enters the reject sink, so {@code r * gc + g2} always names a pair of the numbering. Why: a
     * pair has a chosen action only once the search has settled it at a finite need, which it does only
     * when every outcome of the action has a finite need (Knuth's max over outcomes), and an outcome into an
     * avoided zone never has one (the search never counts it). So from a start with a chosen action (a
     * guaranteed one) the invariant holds by induction along the loop. It is still checked
     * ({@link #chosenAction}, and the reject test below), at one branch per pair: a break of it is an internal
     * error that names it, not a wrong row or an index out of bounds.
     *
     * @throws IllegalStateException if the start (or a pair of its loop) has no chosen action, e.g. when the
     *                               rows are asked for a start that is not guaranteed
     */
    static Rows rows(Arena arena, GoalAutomaton goal, MinChargeSolver.Values values, int s, int max) {
        int gc = goal.stateCount();
        int a0 = arena.startVertex();
        int g0 = goal.initial(arena.cellZones(arena.cell(a0)));
        if (goal.accepting(g0, arena.isDock(arena.cell(a0)))) {
            return new Rows(List.of(), 0); // complete at the start: nothing to do
        }
        chosenAction(arena, values, a0, g0); // the invariant at the start (a start that is not guaranteed fails it)
        // 1. the pairs (robot vertex, goal state) of the loop, without levels: a lower bound of its situations
        int pairs = pairLoop(arena, goal, values, a0, g0, max, null);
        if (pairs > max) {
            return new Rows(null, pairs);
        }
        // 2. the situations (pair, level); level = s − spent, packed as pair · (s + 1) + level
        long span = (long) s + 1;
        LongSet seen = new LongSet();
        long[] todo = new long[1024];
        int head = 0;
        int tail = 0;
        long k0 = (long) (a0 * gc + g0) * span + s;
        seen.add(k0);
        todo[tail++] = k0;
        List<PolicyEntry> entries = new ArrayList<>();
        while (head < tail) {
            long key = todo[head++];
            int p = (int) (key / span);
            int level = (int) (key - p * span);
            int v = p / gc;
            int g = p - v * gc;
            int d = chosenAction(arena, values, v, g);
            entries.add(new PolicyEntry(arena.cellOf(v), level, arena.budgetLeft(v), goal.progressMask(g),
                    arena.action(d), null, arena.closures(v)));
            for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                int r = arena.target(e);
                int g2 = goal.step(g, arena.cellZones(arena.cell(r)));
                int l2 = level + arena.weight(e); // weights are never positive on the fast path's choices
                if (goal.accepting(g2, arena.isDock(arena.cell(r))) || g2 == GoalAutomaton.REJECT || l2 < 0) {
                    // complete, or a breach the certificate will find (it cannot happen when guaranteed; the
                    // reject sink cannot either: step 1 met every pair this step meets and checked it)
                    continue;
                }
                long k = (long) (r * gc + g2) * span + l2;
                if (seen.add(k)) {
                    if (tail == todo.length) {
                        todo = Arrays.copyOf(todo, tail * 2);
                    }
                    todo[tail++] = k;
                    if (tail > max) {
                        return new Rows(null, tail);
                    }
                }
            }
        }
        return new Rows(entries, tail);
    }

    /**
     * Walks the pairs (robot vertex, goal state) of the closed loop of the chosen actions from the start pair
     * (a0, g0), which must not be complete, without levels (the choices do not depend on them), and stops once
     * more than {@code max} are met. With {@code leftOut} (on a restricted arena) an outcome into a left-out
     * closure phase ({@link ArenaCompiler#LEFT_OUT}) is handed to it by edge and not followed; without it every
     * outcome is followed. O(pairs of the loop × out-degree).
     *
     * @return the pairs met (more than {@code max}: the walk stopped there)
     */
    static int pairLoop(Arena arena, GoalAutomaton goal, MinChargeSolver.Values values, int a0, int g0, int max,
                        IntConsumer leftOut) {
        int gc = goal.stateCount();
        VisitQueue pairs = new VisitQueue(Math.multiplyExact(arena.robotCount(), gc));
        pairs.visit(a0 * gc + g0);
        while (pairs.hasNext()) {
            int p = pairs.next();
            int v = p / gc;
            int g = p - v * gc;
            int d = chosenAction(arena, values, v, g);
            for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                if (leftOut != null && arena.weight(e) == ArenaCompiler.LEFT_OUT) {
                    leftOut.accept(e);
                    continue;
                }
                int r = arena.target(e);
                int g2 = goal.step(g, arena.cellZones(arena.cell(r)));
                if (g2 == GoalAutomaton.REJECT) {
                    throw brokenLoop(v, g, "an outcome of its chosen action enters an avoided zone");
                }
                if (!goal.accepting(g2, arena.isDock(arena.cell(r))) && pairs.visit(r * gc + g2)
                        && pairs.visited() > max) {
                    return pairs.visited();
                }
            }
        }
        return pairs.visited();
    }

    /**
     * The arena vertex of the action the policy of least need takes at pair (v, g): the invariant of
     * {@link #rows} (a pair of the loop has a chosen action), checked.
     */
    private static int chosenAction(Arena arena, MinChargeSolver.Values values, int v, int g) {
        int e = g == GoalAutomaton.REJECT ? -1 : values.chosenEdge(v, g);
        if (e < 0) {
            throw brokenLoop(v, g, "it has no chosen action");
        }
        return arena.target(e);
    }

    private static IllegalStateException brokenLoop(int v, int g, String what) {
        return new IllegalStateException("internal: the fast path's policy rows met robot vertex " + v
                + " in goal state " + g + " and " + what + "; the rows are read only from a guaranteed start, whose"
                + " loop meets only pairs of finite need (FastPath.rows)");
    }

    /** An open-addressing hash set of non-negative longs (linear probing, load at most 1/2). */
    private static final class LongSet {
        private long[] slots = filled(1 << 10);
        private int size;

        private static long[] filled(int n) {
            long[] a = new long[n];
            Arrays.fill(a, -1L);
            return a;
        }

        /** Adds k; whether it was new. */
        boolean add(long k) {
            if (2 * (size + 1) > slots.length) {
                long[] old = slots;
                slots = filled(old.length * 2);
                for (long x : old) {
                    if (x >= 0) {
                        insert(x);
                    }
                }
            }
            if (insert(k)) {
                size++;
                return true;
            }
            return false;
        }

        private boolean insert(long k) {
            int mask = slots.length - 1;
            int i = (int) (mix(k) & mask);
            while (slots[i] >= 0) {
                if (slots[i] == k) {
                    return false;
                }
                i = (i + 1) & mask;
            }
            slots[i] = k;
            return true;
        }

        private static long mix(long k) {
            k *= 0x9E3779B97F4A7C15L;
            return k ^ (k >>> 29);
        }
    }
}
