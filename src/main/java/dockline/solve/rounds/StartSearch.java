package dockline.solve.rounds;

import dockline.util.MonotoneSearch;
import java.util.OptionalInt;
import java.util.function.IntPredicate;

/**
 * The lowest starting charge of a patrol or deadline mission: the least start level, from the floor up to the
 * capacity, from which the mission is guaranteed at its floor. Read off one product from every start
 * ({@link #lowestRoot}), or, when that product is too large, found by bisection: winning is monotone in the start
 * (a robot with more charge can play the same policy, and every level along the play is at least as high, the
 * capacity cap included), so {@link MonotoneSearch} finds it in O(log C) decisions for capacity C, the capacity
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

    /**
     * The lowest start level whose root in a product from every start ({@link RoundsProduct#buildFromEveryStart})
     * is won, reading the roots from the floor up: O(C) for capacity C, no monotonicity assumed.
     *
     * @param won whether the robot wins from a product vertex
     */
    static OptionalInt lowestRoot(RoundsProduct p, int floor, IntPredicate won) {
        for (int level = floor; level <= p.capacity(); level++) {
            int root = p.rootAt(level);
            if (root != RoundsProduct.LOST && won.test(root)) {
                return OptionalInt.of(level);
            }
        }
        return OptionalInt.empty();
    }
}
