package dockline.solve.rounds;

import dockline.util.MonotoneSearch;
import java.util.OptionalInt;
import java.util.function.IntPredicate;

/**
 * The lowest starting charge of a patrol or deadline mission: the least start level, from the floor up to the
 * capacity, from which the mission is guaranteed at its floor. Winning is monotone in the start (a robot with
 * more charge can play the same policy, and every level along the play is at least as high, the capacity cap
 * included), so a bisection ({@link MonotoneSearch}) finds it: O(log C) decisions for capacity C, the capacity
 * itself decided first when no guaranteed start is known.
 */
final class StartSearch {

    private StartSearch() {
    }

    /**
     * @param floor      the reserve floor (a start below it is lost at once)
     * @param capacity   the battery capacity (the highest start)
     * @param known      a start known to be guaranteed, or -1 when none is known
     * @param guaranteed whether the mission is guaranteed from a start level
     * @return the lowest guaranteed start, or empty when not even a full battery is
     */
    static OptionalInt lowest(int floor, int capacity, int known, IntPredicate guaranteed) {
        if (floor > capacity) {
            return OptionalInt.empty();
        }
        int top = known;
        if (top < 0) {
            if (!guaranteed.test(capacity)) {
                return OptionalInt.empty();
            }
            top = capacity;
        }
        return OptionalInt.of(MonotoneSearch.lowest(floor, top, guaranteed));
    }
}
