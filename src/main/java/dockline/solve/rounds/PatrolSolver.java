package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.util.MonotoneSearch;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Decides a patrol: can the robot visit every checkpoint infinitely often while its battery stays at or
 * above the reserve floor for ever, whatever the building's disturbance model allows (the budget for the
 * whole night, or afresh on every lap with {@code budget-per: lap})?
 *
 * <p>A game with a recurrence (Büchi) goal on the stored product of arena, {@link dockline.goal.LapAutomaton}
 * and reserve monitor ({@link RoundsProduct}): the accepting vertices are those where a lap has just been
 * completed, and the reserve monitor's sink is a losing vertex with a self-loop, so "always at or above the
 * floor" is part of the same game. Solved by the classical nested fixpoint of attractors for Büchi games
 * (Grädel, Thomas, Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500, 2002, chapter 2,
 * the Büchi game): in the current subgame, take the robot's attractor A of the accepting vertices; the
 * rest B is a trap where the disturbance keeps the robot from ever completing a lap; remove the
 * disturbance's attractor of B and repeat until B is empty. What remains is the robot's winning region.
 * At most N rounds of O(N + M) each: O(N · M) time for N vertices and M edges (in practice a few rounds),
 * O(N) memory besides the product.
 *
 * <p>The policy follows the last round's attractor: an action of least rank towards the next completed lap,
 * and at a completed lap the action of least rank towards the one after; ties between equally short choices go
 * to the one whose worst outcome leaves the most charge. The safest policy is that of the highest floor. The lowest level ever reached and
 * the longest lap are read off its closed loop ({@link PolicyLoop}). The highest floor is found by bisection
 * over the floor, one product per step.
 */
public final class PatrolSolver {

    private PatrolSolver() {
    }

    /** The analysis of a patrol at its own floor and starting charge, with the policy of shortest laps. */
    public static PatrolAnalysis analyse(Mission m, long budgetBytes) {
        return analyse(m, budgetBytes, false);
    }

    /**
     * The analysis of a patrol at its own floor and starting charge.
     *
     * @param safest take the policy of the highest floor that can be guaranteed (it never goes below that floor;
     *               its laps may be longer) instead of the one of shortest laps at the mission's floor
     */
    public static PatrolAnalysis analyse(Mission m, long budgetBytes, boolean safest) {
        if (!m.tasks().patrols()) {
            throw new IllegalArgumentException("not a patrol");
        }
        long t0 = System.nanoTime();
        Arena arena = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        int start = m.startUnits();
        Solved s = solve(arena, floor, start, budgetBytes);
        LoopFigures loop = s.guaranteed() ? LoopFigures.of(s) : LoopFigures.NONE;
        OptionalInt highest = highestFloor(arena, start, budgetBytes, s.guaranteed() ? floor : -1);
        int policyFloor = floor;
        if (safest && s.guaranteed() && highest.getAsInt() > floor) {
            policyFloor = highest.getAsInt();
            loop = LoopFigures.of(solve(arena, policyFloor, start, budgetBytes));
        }
        long millis = (System.nanoTime() - t0) / 1_000_000;
        return new PatrolAnalysis(m, arena, s.guaranteed(), floor, start, m.capacityUnits(), loop.policy, loop.lowest,
                loop.lap, loop.wayIn, highest, policyFloor, s.product.vertexCount(), s.product.edgeCount(),
                s.product.bound().vertices(), s.rounds, loop.size, millis);
    }

    /** The policy of a won patrol product and the figures of its closed loop (none when it is lost). */
    private record LoopFigures(Optional<Policy> policy, OptionalInt lowest, OptionalInt lap, OptionalInt wayIn,
                               int size) {
        static final LoopFigures NONE = new LoopFigures(Optional.empty(), OptionalInt.empty(), OptionalInt.empty(),
                OptionalInt.empty(), 0);

        static LoopFigures of(Solved s) {
            PolicyLoop loop = PolicyLoop.of(s.product, s.choice);
            return new LoopFigures(Optional.of(loop.policy(s.choice)), OptionalInt.of(loop.lowestLevel()),
                    OptionalInt.of(loop.longestLap()),
                    OptionalInt.of(s.product.lapDone(s.product.start()) ? 0 : loop.firstStretch()), loop.size());
        }
    }

    /** The verdict alone and the size of the product it was decided on (for benchmarks). */
    public record Decision(boolean guaranteed, long vertices, long edges, int rounds, double buildMillis) {
    }

    /** Builds the product at one floor and solves it: no policy, no bisection. O(N · M) at worst. */
    public static Decision decide(Arena arena, int floor, int startLevel, long budgetBytes) {
        long t0 = System.nanoTime();
        RoundsProduct p = RoundsProduct.build(arena, RoundsProduct.Kind.PATROL, floor, startLevel, budgetBytes);
        double build = (System.nanoTime() - t0) / 1e6;
        Solved s = solve(p);
        return new Decision(s.guaranteed(), p.vertexCount(), p.edgeCount(), s.rounds(), build);
    }

    /**
     * The solved product.
     *
     * @param product  the product
     * @param alive    the robot's winning region
     * @param choice   the robot's edge per winning robot vertex
     * @param removedIn per vertex: the round (1, 2, ...) in which it left the subgame, 0 if winning
     * @param firstRank the first round's attractor ranks (towards a completed lap, in the whole product)
     * @param oppChoice per disturbance vertex outside the winning region: the building's winning edge (into
     *                 the trap of its round, or one step closer to it); -1 elsewhere
     * @param rounds   the rounds of the fixpoint
     */
    record Solved(RoundsProduct product, boolean[] alive, int[] choice, int[] removedIn, int[] firstRank,
                  int[] oppChoice, int rounds) {
        boolean guaranteed() {
            return product.start() != RoundsProduct.LOST && alive[product.start()];
        }
    }

    static Solved solve(Arena arena, int floor, int startLevel, long budgetBytes) {
        RoundsProduct p = RoundsProduct.build(arena, RoundsProduct.Kind.PATROL, floor, startLevel, budgetBytes);
        return solve(p);
    }

    /** The Büchi fixpoint on a built product. */
    static Solved solve(RoundsProduct p) {
        int n = p.vertexCount();
        boolean[] alive = Attractor.everywhere(n);
        boolean[] accepting = new boolean[n];
        int[] removedIn = new int[n];
        for (int v = 0; v < n; v++) {
            accepting[v] = p.lapDone(v);
        }
        int[] choice = new int[n];
        int[] oppChoice = new int[n];
        java.util.Arrays.fill(oppChoice, -1);
        int[] firstRank = null;
        int round = 0;
        while (true) {
            round++;
            int[] rank = Attractor.of(p, true, alive, accepting, choice);
            if (firstRank == null) {
                firstRank = rank;
            }
            boolean[] trap = new boolean[n];
            boolean any = false;
            for (int v = 0; v < n; v++) {
                if (alive[v] && rank[v] == Attractor.OUT) {
                    trap[v] = true;
                    any = true;
                }
            }
            if (!any) {
                finishChoice(p, alive, rank, choice);
                Attractor.preferCharge(p, alive, rank, choice);
                return new Solved(p, alive, choice, removedIn, firstRank, oppChoice, round);
            }
            int[] lost = Attractor.of(p, false, alive, trap, null);
            for (int v = 0; v < n; v++) {
                if (alive[v] && lost[v] != Attractor.OUT && !p.isRobot(v)) {
                    // the building's strategy of this round: stay in the trap, or get one step closer to it
                    for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
                        int u = p.target(e);
                        if (alive[u] && (lost[v] == 0 ? trap[u] : lost[u] == lost[v] - 1)) {
                            oppChoice[v] = e;
                            break;
                        }
                    }
                }
            }
            for (int v = 0; v < n; v++) {
                if (alive[v] && lost[v] != Attractor.OUT) {
                    alive[v] = false;
                    removedIn[v] = round;
                }
            }
        }
    }

    /** At a completed lap the attractor gives no edge: take the winning action of least rank. */
    private static void finishChoice(RoundsProduct p, boolean[] alive, int[] rank, int[] choice) {
        for (int v = 0; v < p.vertexCount(); v++) {
            if (!alive[v] || !p.isRobot(v) || choice[v] >= 0) {
                continue;
            }
            int best = -1;
            for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
                int d = p.target(e);
                if (alive[d] && (best < 0 || rank[d] < rank[p.target(best)])) {
                    best = e;
                }
            }
            choice[v] = best;
        }
    }

    /**
     * The lowest starting charge (the floor .. the capacity) from which the analysed patrol is guaranteed at its
     * floor; empty when not even a full battery is. One product from every start level at once
     * ({@link RoundsProduct#buildFromEveryStart}) and one Büchi fixpoint, read at each level's root; when that
     * product passes the budget, bisection over the start instead ({@link StartSearch}, one product per step).
     *
     * @throws dockline.solve.ProductTooLargeException when a product of the bisection passes the budget too
     */
    public static OptionalInt lowestStart(PatrolAnalysis a, long budgetBytes) {
        try {
            RoundsProduct p = RoundsProduct.buildFromEveryStart(a.arena(), RoundsProduct.Kind.PATROL, a.reserveUnits(),
                    budgetBytes);
            boolean[] alive = solve(p).alive();
            return StartSearch.lowestRoot(p, a.reserveUnits(), root -> alive[root]);
        } catch (dockline.solve.ProductTooLargeException e) {
            return lowestStartByBisection(a, budgetBytes);
        }
    }

    /** The same by bisection over the start, one product from one start per step (each no larger than the one above). */
    static OptionalInt lowestStartByBisection(PatrolAnalysis a, long budgetBytes) {
        return StartSearch.lowest(a.reserveUnits(), a.capacityUnits(), a.guaranteed() ? a.startUnits() : -1,
                s -> solve(a.arena(), a.reserveUnits(), s, budgetBytes).guaranteed());
    }

    /**
     * The highest floor (0 .. start) at which the patrol is still guaranteed, by bisection
     * ({@link MonotoneSearch}); empty when not even a floor of 0 is.
     *
     * @param known a floor already known to be guaranteed, or -1
     */
    static OptionalInt highestFloor(Arena arena, int start, long budgetBytes, int known) {
        int f = MonotoneSearch.highest(known, start, floor -> solve(arena, floor, start, budgetBytes).guaranteed());
        return f < 0 ? OptionalInt.empty() : OptionalInt.of(f);
    }
}
