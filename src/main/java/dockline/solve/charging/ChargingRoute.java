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
 * threshold policies at the mission's floor and at the highest floor, all from one {@link FloorSweep}
 * pass on arena × goal, with no battery levels in the game and no search over floors.
 *
 * <p>Verdict: guaranteed ⇔ the start cell is not avoided, start ≥ f and need(start) ≤ start − f at the
 * mission's floor f; the lowest starting charge is f + need(start) (at most the capacity), or none; the
 * highest floor is the pass's largest term (see {@link FloorSweep}).
 *
 * <p>Cost: one pass ({@link FloorSweep}), plus O(n + history) per threshold policy read out of it.
 */
public final class ChargingRoute {

    private ChargingRoute() {
    }

    /**
     * What the charging route found. Energies in units of the mission's scale.
     *
     * @param verdict           at the mission's floor and starting charge
     * @param startNeed         least charge above the floor needed at the start, or {@link ChargingSolver#INFINITE}
     * @param lowestStartUnits  floor + startNeed, empty when no starting charge wins
     * @param highestFloorUnits highest floor that can be guaranteed from the mission's starting charge, empty if none
     * @param pass              the pass (its history gives the threshold policies, see {@link #values()})
     * @param highest           needs and threshold policy at the highest floor, or null when there is none
     * @param solves            passes over the game (always 1: the figures come from the same pass)
     * @param rounds            batches of the pass (batch 0 plus one per dock added)
     * @param sweep             the pass's own figures
     * @param millis            wall time of the whole analysis
     *
     * <p>Data only.
     */
    public record Analysis(Verdict verdict, int startNeed, OptionalInt lowestStartUnits, OptionalInt highestFloorUnits,
                           FloorSweep pass, ChargingSolver.Values highest, int solves, int rounds,
                           FloorSweep.Result sweep, long millis) {
        public boolean guaranteed() {
            return verdict == Verdict.GUARANTEED;
        }

        /**
         * Needs and threshold policy at the mission's floor, read out of the pass on each call (O(n + history):
         * only a mission that is not guaranteed needs them, for its counterexample, so they are not kept). The
         * start's need is exact; elsewhere a need is exact when the pass added every dock good at the floor, and
         * otherwise (it stopped once the start's need was 0) an upper bound, with a policy that wins from it.
         */
        public ChargingSolver.Values values() {
            return pass.values(sweep.floorBatches(), sweep.capacityUnits() - sweep.floorUnits());
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
        return analyse(solver, capacity, floor, start, false);
    }

    /**
     * As {@link #analyse(ChargingSolver, int, int, int)}; with {@code leftOutWins} the pass solves the
     * strengthened game of a restricted arena (an outcome into a left-out phase is not the building's to choose:
     * {@link FloorSweep#run(ChargingSolver, int, int, int, boolean)}), whose figures bound the mission's from the
     * robot's side: its needs from below, its highest floor from above.
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static Analysis analyse(ChargingSolver solver, int capacity, int floor, int start, boolean leftOutWins) {
        long t0 = System.nanoTime();
        return of(FloorSweep.run(solver, capacity, floor, start, leftOutWins), t0);
    }

    /** The analysis of a pass already run, begun at {@code t0} ({@link System#nanoTime}). */
    public static Analysis of(FloorSweep sweep, long t0) {
        FloorSweep.Result r = sweep.result();
        int capacity = r.capacityUnits();
        int floor = r.floorUnits();
        int s = r.startUnits();
        int need = r.startNeed();
        boolean won = need != ChargingSolver.INFINITE && s >= floor && need <= s - floor;
        OptionalInt lowest = need == ChargingSolver.INFINITE ? OptionalInt.empty() : OptionalInt.of(floor + need);
        if (won != (r.highestFloorUnits().isPresent() && r.highestFloorUnits().getAsInt() >= floor)) {
            throw new IllegalStateException("internal: the charging pass's verdict at the floor and its highest floor"
                    + " disagree");
        }
        ChargingSolver.Values h = r.highestFloorUnits().isPresent()
                ? sweep.values(r.highestBatches(), capacity - r.highestFloorUnits().getAsInt()) : null;
        long millis = (System.nanoTime() - t0) / 1_000_000;
        return new Analysis(Verdict.of(won), need, lowest, r.highestFloorUnits(), sweep, h, 1, r.batches(), r, millis);
    }
}
