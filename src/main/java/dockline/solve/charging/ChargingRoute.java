package dockline.solve.charging;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.Verdict;
import java.util.OptionalInt;

/**
 * The charging route for reserve missions (entry of {@code dockline.solve.charging}): the verdict, the
 * least charge needed at the start, the lowest starting charge, the highest guaranteed floor and the
 * threshold policy, from {@link ChargingSolver} on arena × goal, with no battery levels in the game.
 *
 * <p><b>Verdict and lowest start</b> come from one solve at the mission's floor f (usable range
 * U = capacity − f): guaranteed ⇔ the start cell is not avoided, start ≥ f and need(start) ≤ start − f;
 * the lowest starting charge is f + need(start) (at most the capacity), or none.
 *
 * <p><b>Highest floor.</b> The good docks depend on U, hence on the floor, so it does not follow
 * from the solve at the mission's floor alone. It is the highest f in 0..start with
 * need<sub>capacity−f</sub>(start) ≤ start − f, a predicate monotone in f (a lower floor gives a larger
 * U, so every need can only fall). A winning solve at floor f with start need n also bounds the answer
 * from above by start − n (a higher floor never needs less), so the search first tries that bound, and
 * then bisects, each winning probe lowering the bound again: two solves when the good docks are the same
 * at both floors, else at most about log2(start) + 3. Honestly: the number of solves for the highest
 * floor grows with the resolution, logarithmically (about 10 solves at 1,000 levels, 13 at 10,000),
 * while each solve's cost does not; a parametric pass (the least usable range at which each dock turns
 * good, found in increasing order) would remove the logarithm but needs one Dijkstra per distinct
 * threshold, and is not done.
 */
public final class ChargingRoute {

    private ChargingRoute() {
    }

    /**
     * What the charging route found. Energies in units of the mission's scale.
     *
     * @param verdict          at the mission's floor and starting charge
     * @param startNeed        least charge above the floor needed at the start, or {@link ChargingSolver#INFINITE}
     * @param lowestStartUnits floor + startNeed, empty when no starting charge wins
     * @param highestFloorUnits highest floor that can be guaranteed from the mission's starting charge, empty if none
     * @param values           the solve at the mission's floor (needs and threshold policy)
     * @param solves           solver runs in all (one for the verdict, the rest for the highest floor)
     * @param rounds           Dijkstra rounds of the verdict's solve
     * @param millis           wall time of the whole analysis
     *
     * <p>Data only.
     */
    public record Analysis(Verdict verdict, int startNeed, OptionalInt lowestStartUnits, OptionalInt highestFloorUnits,
                           ChargingSolver.Values values, int solves, int rounds, long millis) {
        public boolean guaranteed() {
            return verdict == Verdict.GUARANTEED;
        }
    }

    /** Analyses a reserve mission (its objective field is not consulted). */
    public static Analysis analyse(Mission mission) {
        Arena arena = ArenaCompiler.compile(mission);
        return analyse(new ChargingSolver(arena, GoalAutomaton.of(mission)), mission.capacityUnits(),
                mission.reserveUnits(), mission.startUnits());
    }

    /**
     * Analyses with explicit figures (units).
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static Analysis analyse(ChargingSolver solver, int capacity, int floor, int start) {
        if (floor < 0 || floor > capacity) {
            throw new IllegalArgumentException("reserve floor " + floor + " units is outside 0.." + capacity);
        }
        long t0 = System.nanoTime();
        int s = Math.min(start, capacity);
        boolean startOk = solver.startGoal() != GoalAutomaton.REJECT;
        ChargingSolver.Values v = solver.solve(capacity - floor);
        int need = startOk ? v.startNeed() : ChargingSolver.INFINITE;
        boolean won = need != ChargingSolver.INFINITE && s >= floor && need <= s - floor;
        OptionalInt lowest = need == ChargingSolver.INFINITE ? OptionalInt.empty() : OptionalInt.of(floor + need);

        Search search = new Search(solver, capacity, s);
        search.record(floor, won, need);
        if (search.lo < 0 && search.hi >= 0 && floor != 0) {
            search.probe(0);
        }
        // one optimistic probe at the upper bound (enough when the good docks are the same there), then bisection
        if (search.lo < search.hi && !search.probe(search.hi)) {
            while (search.lo < search.hi) {
                search.probe(search.lo + (search.hi - search.lo + 1) / 2);
            }
        }
        OptionalInt highest = search.lo >= 0 ? OptionalInt.of(search.lo) : OptionalInt.empty();
        long millis = (System.nanoTime() - t0) / 1_000_000;
        return new Analysis(Verdict.of(won), need, lowest, highest, v, 1 + search.solves, v.rounds(), millis);
    }

    /** The state of the highest-floor search: lo wins (or -1), the answer is at most hi. */
    private static final class Search {
        private final ChargingSolver solver;
        private final int capacity;
        private final int start;
        int lo = -1;
        int hi;
        int solves;

        Search(ChargingSolver solver, int capacity, int start) {
            this.solver = solver;
            this.capacity = capacity;
            this.start = start;
            this.hi = solver.startGoal() == GoalAutomaton.REJECT ? -1 : start;
        }

        boolean probe(int f) {
            solves++;
            int need = solver.solve(capacity - f).startNeed();
            boolean won = need != ChargingSolver.INFINITE && need <= start - f;
            record(f, won, need);
            return won;
        }

        void record(int f, boolean won, int need) {
            if (won) {
                lo = Math.max(lo, f);
                hi = Math.min(hi, start - need);
            } else {
                hi = Math.min(hi, f - 1);
            }
        }
    }
}
