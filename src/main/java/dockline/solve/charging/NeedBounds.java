package dockline.solve.charging;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;

/**
 * A heat map that claims no more than is known: per robot position with nothing closed yet (cell, disturbances
 * left, tasks done) a lower and an upper bound of the least battery level, in units, from which the robot can be
 * sure to complete the mission without going below the floor (the figure {@code dockline.solve.reserve.ChargeNeeded}
 * gives exactly on the whole arena).
 *
 * <p>On an arena restricted to some closure phases ({@link ArenaCompiler#compileWithin}) the two games of
 * {@link FloorSweep#run(ChargingSolver, int, int, int, boolean)} bound the mission's from both sides at every
 * position, not only at the start: in the weakened game (a closure into a left-out phase loses) the building can
 * do more than in the mission, so its need is enough charge (a sure upper bound); in the strengthened game (such a
 * closure is not the building's to choose) it can do less, so its need is a lower bound. Where they agree the
 * figure is exact. On an arena without left-out outcomes both games are the mission's and every figure is exact.
 * This is the two-sided abstraction of T. A. Henzinger, R. Jhala and R. Majumdar, "Counterexample-guided control"
 * (ICALP 2003), read per position.
 *
 * <p>Cost: one or two passes ({@link FloorSweep#needsAtFloor}) on the given arena, each up to the floor only; two
 * ints per (robot vertex, goal state) of the table.
 */
public final class NeedBounds {

    /** No starting level completes the mission safely from this position (both bounds agree). */
    public static final int IMPOSSIBLE = -1;
    /** {@link #atMostUnits}: no level is known to be enough (the weakened game wins nothing there; the strengthened does). */
    public static final int UNBOUNDED = Integer.MAX_VALUE;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int floor;
    private final int[] low;  // per robot vertex * goal states + goal state: units above the floor, or INFINITE
    private final int[] high;
    private final boolean restricted;

    private NeedBounds(Arena arena, GoalAutomaton goal, int floor, int[] low, int[] high, boolean restricted) {
        this.arena = arena;
        this.goal = goal;
        this.floor = floor;
        this.low = low;
        this.high = high;
        this.restricted = restricted;
    }

    /**
     * The bounds at the floor on the solver's arena: the strengthened and the weakened pass when the arena leaves
     * out some closure phase, one pass otherwise.
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static NeedBounds of(ChargingSolver solver, int capacity, int floor) {
        Arena a = solver.arena();
        boolean restricted = leavesOut(a);
        int[] high = table(FloorSweep.needsAtFloor(solver, capacity, floor, false), a, solver.goal());
        int[] low = restricted ? table(FloorSweep.needsAtFloor(solver, capacity, floor, true), a, solver.goal()) : high;
        return new NeedBounds(a, solver.goal(), floor, low, high, restricted);
    }

    /** Whether the arena leaves some closure phase out (an outcome of energy change {@link ArenaCompiler#LEFT_OUT}). O(edges). */
    public static boolean leavesOut(Arena a) {
        for (int e = 0; e < a.edgeCount(); e++) {
            if (a.weight(e) == ArenaCompiler.LEFT_OUT) {
                return true;
            }
        }
        return false;
    }

    private static int[] table(ChargingSolver.Values v, Arena a, GoalAutomaton goal) {
        int gs = goal.stateCount();
        int[] t = new int[Math.multiplyExact(a.robotCount(), gs)];
        for (int r = 0; r < a.robotCount(); r++) {
            for (int g = 0; g < gs; g++) {
                t[r * gs + g] = v.need(r, g);
            }
        }
        return t;
    }

    /**
     * The lower bound (units) at the cell with the given disturbances left and tasks done, nothing closed; see
     * {@link #atMostUnits} for the reading of a position and the errors.
     */
    public int atLeastUnits(int cellIndex, int budgetLeft, int progressMask) {
        return units(low, cellIndex, budgetLeft, progressMask);
    }

    /**
     * Enough charge (units): a sure upper bound of the least level from which the robot completes the mission
     * safely when it occupies the cell (its own zones counted, as on arrival) with the given disturbances left and
     * tasks done, nothing closed yet and no at-most entry used; {@link #UNBOUNDED} when no level is known to be
     * enough, {@link #IMPOSSIBLE} when even the lower bound is that no level will do (then none will), and for a
     * wall or a position inside an avoided zone.
     *
     * @throws IllegalArgumentException if the cell, the budget or the progress mask is out of range
     */
    public int atMostUnits(int cellIndex, int budgetLeft, int progressMask) {
        int u = units(high, cellIndex, budgetLeft, progressMask);
        return u == IMPOSSIBLE && atLeastUnits(cellIndex, budgetLeft, progressMask) != IMPOSSIBLE ? UNBOUNDED : u;
    }

    /** Whether the two bounds agree at that position (the figure is exact). */
    public boolean exact(int cellIndex, int budgetLeft, int progressMask) {
        return atLeastUnits(cellIndex, budgetLeft, progressMask) == atMostUnits(cellIndex, budgetLeft, progressMask);
    }

    private int units(int[] table, int cellIndex, int budgetLeft, int progressMask) {
        if (budgetLeft < 0 || budgetLeft > arena.budget() || cellIndex < 0 || cellIndex >= arena.width() * arena.height()) {
            throw new IllegalArgumentException("no position at cell " + cellIndex + " with " + budgetLeft
                    + " disturbances left (budget 0.." + arena.budget() + ")");
        }
        int g = goal.stateOfMask(progressMask);
        if (g == GoalAutomaton.REJECT) {
            throw new IllegalArgumentException("progress " + progressMask + " is not a state of the tasks");
        }
        int v = arena.robotVertex(cellIndex, budgetLeft);
        int gn = v < 0 ? GoalAutomaton.REJECT : goal.step(g, arena.cellZones(cellIndex));
        if (gn == GoalAutomaton.REJECT) {
            return IMPOSSIBLE;
        }
        int x = table[v * goal.stateCount() + gn];
        return x == ChargingSolver.INFINITE ? IMPOSSIBLE : Math.addExact(floor, x);
    }

    /** Whether some closure phase was left out (the bounds may then differ). */
    public boolean restricted() {
        return restricted;
    }
}
