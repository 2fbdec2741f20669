package dockline.margin;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import java.util.function.BooleanSupplier;

/**
 * The margins of a mission from the minimum-credit solver of the charging route alone
 * ({@link dockline.solve.charging.FloorSweep}: the least charge per game position, every floor in one
 * pass): the lowest starting charge for the mission's floor and the highest floor for its starting
 * charge come from the same pass, with no search over floors.
 *
 * <p>Why this solver and no other: the project had two minimum-credit solvers, a fixpoint over energy
 * levels here (kept in the tests as an oracle, {@code MinimumCredit}) and the fast path's
 * {@code MinChargeSolver}. The charging route's is the one that handles charging and every floor at
 * once, so margins use it. The fast path keeps its own Knuth pass: it is the charging route's batch 0
 * with an early stop once the start is decided, and the routes of {@code solve} never use each other
 * (DEVELOPERS.md, "Layout"), so sharing it would put a route below another.
 *
 * <p>Cost: one pass per call (see {@link dockline.solve.charging.FloorSweep}).
 *
 * @throws IllegalArgumentException (from every method) if an energy gain other than a charge step on a
 *                                  dock makes the charging route inapplicable
 */
public final class FixpointMargins {

    private FixpointMargins() {
    }

    /**
     * Both margins at once.
     *
     * @param highestFloorUnits highest floor guaranteed from {@code start}, or -1
     * @param lowestStartUnits  least starting level that guarantees {@code floor}, or -1 if none up to the capacity
     */
    public record Both(int highestFloorUnits, int lowestStartUnits) {
    }

    /** Both margins of the mission's floor and a starting level, from one pass. */
    public static Both both(Arena arena, GoalAutomaton goal, int floor, int start) {
        return both(arena, goal, floor, start, () -> false);
    }

    /**
     * Both margins, the pass polling {@code cancelled} (a {@link java.util.concurrent.CancellationException}
     * when it is raised).
     */
    public static Both both(Arena arena, GoalAutomaton goal, int floor, int start, BooleanSupplier cancelled) {
        int cap = arena.mission().capacityUnits();
        ChargingRoute.Analysis a = ChargingRoute.analyse(new ChargingSolver(arena, goal, cancelled), cap, floor,
                start);
        return new Both(a.highestFloorUnits().orElse(-1), a.lowestStartUnits().orElse(-1));
    }

    /** The least starting level that guarantees the mission at this floor, or -1 if none up to the capacity. */
    public static int lowestStart(Arena arena, GoalAutomaton goal, int floor) {
        return both(arena, goal, floor, arena.mission().startUnits()).lowestStartUnits();
    }

    /** Whether starting with {@code start} units guarantees the mission at {@code floor}. */
    public static boolean wins(Arena arena, GoalAutomaton goal, int floor, int start) {
        int low = lowestStart(arena, goal, floor);
        return low >= 0 && start >= low;
    }

    /** The highest floor in 0..start that can be guaranteed from {@code start} units, or -1 if none. */
    public static int highestFloor(Arena arena, GoalAutomaton goal, int start) {
        return both(arena, goal, 0, start).highestFloorUnits();
    }
}
