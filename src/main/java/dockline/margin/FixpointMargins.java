package dockline.margin;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.util.MonotoneSearch;

/**
 * The margins of a mission from the minimum-credit fixpoint ({@link MinimumCredit}) alone.
 *
 * <p>The lowest starting charge for a floor is the fixpoint's need at the start: one run. The highest
 * floor for a starting charge s is found by running the fixpoint per candidate floor; since winning is
 * monotone in the floor (a run that stays at or above f stays at or above any lower floor), the
 * candidates are probed by bisection over 0..s: O(log s) fixpoint runs.
 */
public final class FixpointMargins {

    private FixpointMargins() {
    }

    /** The least starting level that guarantees the mission at this floor, or -1 if none up to the capacity. */
    public static int lowestStart(Arena arena, GoalAutomaton goal, int floor) {
        int need = MinimumCredit.solve(arena, goal, floor).needAtStart();
        return need == MinimumCredit.INFINITE ? -1 : need;
    }

    /** Whether starting with {@code start} units guarantees the mission at {@code floor}. */
    public static boolean wins(Arena arena, GoalAutomaton goal, int floor, int start) {
        return start >= floor && MinimumCredit.solve(arena, goal, floor).needAtStart() <= start;
    }

    /** The highest floor in 0..start that can be guaranteed from {@code start} units, or -1 if none. */
    public static int highestFloor(Arena arena, GoalAutomaton goal, int start) {
        return MonotoneSearch.highest(-1, start, f -> wins(arena, goal, f, start));
    }
}
