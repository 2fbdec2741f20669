package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.util.MonotoneSearch;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Decides a visit mission with a deadline: can the robot always finish its tasks and dock within
 * {@code T} turns (the deadline in whole ticks, rounded down) without its battery dropping below the
 * reserve floor, whatever the building's disturbance model allows?
 *
 * <p>Two monitors read the play together: the reserve monitor (the battery level, a sink below the
 * floor) inside the stored {@link RoundsProduct}, and a ticks-left monitor (T, T-1, ..., 0, a sink when
 * a turn is taken at 0). The product with the ticks-left monitor is not stored: its vertex (v, t) is won
 * by the robot exactly when the reachability attractor of the completed mission in the battery product
 * reaches v within t turns, because the attractor's i-th layer is the set of vertices from which the
 * robot forces the target within i moves (Grädel, Thomas, Wilke (eds.), "Automata, Logics, and Infinite
 * Games", LNCS 2500, 2002, chapter 2). So one breadth-first attractor ({@link Attractor}, O(N + M))
 * answers the deadline for every T at once: the mission is guaranteed iff the start's rank in turns is
 * at most T, and that rank is the tightest deadline still guaranteed. The composed product has
 * N × (T + 1) vertices; {@link DeadlineAnalysis#timedVertices()} states that figure.
 *
 * <p>The policy takes, in each situation, an action of least rank; its worst finishing time is the rank
 * of the start. The highest floor that keeps both thresholds is found by bisection over the floor (the
 * winning set shrinks as the floor rises), one product per step: O((N + M) log C) for capacity C.
 */
public final class DeadlineSolver {

    private DeadlineSolver() {
    }

    /** The analysis of a visit mission with a deadline at its own floor and starting charge (fewest turns). */
    public static DeadlineAnalysis analyse(Mission m, long budgetBytes) {
        return analyse(m, budgetBytes, false);
    }

    /**
     * The analysis of a visit mission with a deadline at its own floor and starting charge.
     *
     * @param safest take the policy of the highest floor that still keeps the deadline (it never goes below that
     *               floor; it may take more turns, never more than the deadline) instead of the one of fewest turns
     */
    public static DeadlineAnalysis analyse(Mission m, long budgetBytes, boolean safest) {
        if (!m.timing().hasDeadline() || m.tasks().patrols()) {
            throw new IllegalArgumentException("not a visit mission with a deadline");
        }
        long t0 = System.nanoTime();
        Arena arena = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        int start = m.startUnits();
        int deadline = m.timing().deadlineTicks();
        Solved s = solve(arena, floor, start, budgetBytes);
        boolean ok = s.turns >= 0 && s.turns <= deadline;
        Optional<Policy> policy = Optional.empty();
        OptionalInt worstLevel = OptionalInt.empty();
        OptionalInt worstTurns = OptionalInt.empty();
        int rows = 0;
        if (s.turns >= 0) {
            PolicyLoop loop = PolicyLoop.of(s.product, s.choice);
            worstTurns = OptionalInt.of(loop.firstStretch());
            if (loop.firstStretch() != s.turns) {
                throw new IllegalStateException("the policy's worst finishing time " + loop.firstStretch()
                        + " differs from the attractor's rank " + s.turns);
            }
            if (ok) {
                policy = Optional.of(loop.policy(s.choice));
                worstLevel = OptionalInt.of(loop.lowestLevel());
            }
        }
        OptionalInt highest = highestFloor(arena, start, deadline, budgetBytes, ok ? floor : -1);
        int policyFloor = floor;
        if (safest && ok && highest.getAsInt() > floor) {
            policyFloor = highest.getAsInt();
            Solved hs = solve(arena, policyFloor, start, budgetBytes);
            PolicyLoop loop = PolicyLoop.of(hs.product, hs.choice);
            policy = Optional.of(loop.policy(hs.choice));
            worstLevel = OptionalInt.of(loop.lowestLevel());
            worstTurns = OptionalInt.of(loop.firstStretch());
        }
        long millis = (System.nanoTime() - t0) / 1_000_000;
        return new DeadlineAnalysis(m, arena, ok, deadline, floor, start, m.capacityUnits(), s.turns < 0
                ? OptionalInt.empty() : OptionalInt.of(s.turns), worstTurns, policy, worstLevel, highest, policyFloor,
                s.product.vertexCount(), s.product.edgeCount(), s.product.bound().vertices(), millis);
    }

    /**
     * Builds the product at one floor and solves it: the fewest turns the robot can guarantee to finish in
     * (-1: never) and the product's size, as {vertices, edges, turns}. No policy, no bisection. O(N + M).
     */
    public static long[] decide(Arena arena, int floor, int startLevel, long budgetBytes) {
        Solved s = solve(arena, floor, startLevel, budgetBytes);
        return new long[] {s.product.vertexCount(), s.product.edgeCount(), s.turns};
    }

    /** The solved battery product: the start's rank in turns (-1: the robot cannot force completion). */
    record Solved(RoundsProduct product, int[] choice, int[] rank, int turns) {
    }

    static Solved solve(Arena arena, int floor, int startLevel, long budgetBytes) {
        return solve(RoundsProduct.build(arena, RoundsProduct.Kind.VISIT, floor, startLevel, budgetBytes));
    }

    /** The attractor of the completed mission on a built product, with the start's rank in turns. O(N + M). */
    static Solved solve(RoundsProduct p) {
        int n = p.vertexCount();
        boolean[] alive = Attractor.everywhere(n);
        boolean[] target = new boolean[n];
        for (int v = 0; v < n; v++) {
            target[v] = p.complete(v);
        }
        int[] choice = new int[n];
        int[] rank = Attractor.of(p, true, alive, target, choice);
        Attractor.preferCharge(p, alive, rank, choice);
        int r = p.start() == RoundsProduct.LOST ? Attractor.OUT : rank[p.start()];
        // ranks count edges; a turn is two (the robot's action, then the building's outcome)
        return new Solved(p, choice, rank, r == Attractor.OUT ? -1 : r / 2);
    }

    /**
     * The lowest starting charge (the floor .. the capacity) from which the analysed mission is guaranteed at its
     * floor within its deadline; empty when not even a full battery is. One product from every start level at once
     * ({@link RoundsProduct#buildFromEveryStart}) and one attractor: a root is won within the deadline when its rank
     * in turns is at most the deadline; when that product passes the budget, bisection over the start instead
     * ({@link StartSearch}, one product per step).
     *
     * @throws dockline.solve.ProductTooLargeException when a product of the bisection passes the budget too
     */
    public static OptionalInt lowestStart(DeadlineAnalysis a, long budgetBytes) {
        try {
            Solved s = solve(RoundsProduct.buildFromEveryStart(a.arena(), RoundsProduct.Kind.VISIT, a.reserveUnits(),
                    budgetBytes));
            return StartSearch.lowestRoot(s.product, a.reserveUnits(), root -> s.rank[root] != Attractor.OUT
                    && s.rank[root] / 2 <= a.deadlineTicks());
        } catch (dockline.solve.ProductTooLargeException e) {
            return lowestStartByBisection(a, budgetBytes);
        }
    }

    /** The same by bisection over the start, one product from one start per step. */
    static OptionalInt lowestStartByBisection(DeadlineAnalysis a, long budgetBytes) {
        return StartSearch.lowest(a.reserveUnits(), a.capacityUnits(), a.guaranteed() ? a.startUnits() : -1, s -> {
            int turns = solve(a.arena(), a.reserveUnits(), s, budgetBytes).turns;
            return turns >= 0 && turns <= a.deadlineTicks();
        });
    }

    /**
     * The fewest turns in which the robot can be sure to finish and dock from the mission's start at its floor,
     * with no deadline (one product and one attractor, O(N + M)); empty when it cannot be sure to finish at all.
     * With a disturbance budget of 0 this is the undisturbed shortest run the rule of thumb sets against the
     * deadline.
     */
    public static OptionalInt fewestTurns(Mission m, long budgetBytes) {
        if (m.tasks().patrols()) {
            throw new IllegalArgumentException("a patrol has no finishing time");
        }
        int turns = solve(ArenaCompiler.compile(m), m.reserveUnits(), m.startUnits(), budgetBytes).turns;
        return turns < 0 ? OptionalInt.empty() : OptionalInt.of(turns);
    }

    /**
     * The highest floor (0 .. start) at which the mission is still guaranteed within the deadline, by
     * bisection ({@link MonotoneSearch}); empty when not even a floor of 0 is.
     *
     * @param known a floor already known to be guaranteed, or -1
     */
    static OptionalInt highestFloor(Arena arena, int start, int deadline, long budgetBytes, int known) {
        int f = MonotoneSearch.highest(known, start, floor -> {
            int turns = solve(arena, floor, start, budgetBytes).turns;
            return turns >= 0 && turns <= deadline;
        });
        return f < 0 ? OptionalInt.empty() : OptionalInt.of(f);
    }
}
