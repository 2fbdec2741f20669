package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.game.GameSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import java.util.Arrays;

/**
 * The heat map: for every robot position (cell, disturbances left, task progress), the least
 * battery level in units from which the robot can still complete the mission without ever going
 * below the reserve floor, whatever the disturbances do; {@link #IMPOSSIBLE} when no level will do.
 *
 * <p>Computed from one solve of the product over all arena vertices and all levels
 * ({@link ProductGame#everywhere}): winning is monotone in the level (a fuller battery stays at
 * least as full after any step, saturation included), so the least winning level per position is
 * the answer. O(product) time and memory; the table itself is one int per (robot vertex, goal state).
 *
 * <p>Positions are read as "the robot occupies this cell with this progress": the progress is first
 * updated with the cell's own zones (as the product does on arrival). A position in an avoided zone
 * is {@link #IMPOSSIBLE}; a position that already completes the mission needs only the floor.
 *
 * <p>Algorithm: one attractor over every triple (Grädel, Thomas, Wilke 2002, "Automata, Logics, and
 * Infinite Games", ch. 2), then a minimum per position; the least winning level is the minimum
 * initial credit of energy games (Brim, Chaloupka, Doyen, Gentilini and Raskin 2011).
 */
public final class ChargeNeeded {

    /** No starting level completes the mission safely from this position. */
    public static final int IMPOSSIBLE = -1;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int floor;
    private final int capacity;
    private final int[] needed; // [robot vertex * goal states + goal state], normalised states only

    private ChargeNeeded(Arena arena, GoalAutomaton goal, int floor, int capacity, int[] needed) {
        this.arena = arena;
        this.goal = goal;
        this.floor = floor;
        this.capacity = capacity;
        this.needed = needed;
    }

    /**
     * Builds and solves the product over all positions and levels, then reads off the least winning
     * level per position.
     *
     * @throws ProductTooLargeException if that product is over the memory budget
     */
    public static ChargeNeeded compute(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, ProductOptions options,
                                       GameSolver.Factory solver) {
        ProductGame game = ProductGame.everywhere(arena, goal, monitor, options);
        Solution sol = solver.create(game.graph(), options.cancelled()).solve();
        return of(game, sol, monitor);
    }

    /**
     * The same table from the product without storing it ({@link ImplicitReserveGame#solveRegion}: half
     * a byte per triple instead of the stored product's 60 to 170 bytes per vertex); the default of
     * the solver and the view, property-tested against {@link #compute}. O(product) time.
     *
     * @throws ProductTooLargeException if the counters, or the worklist while solving, pass the memory budget
     */
    public static ChargeNeeded computeImplicitly(Arena arena, GoalAutomaton goal, ReserveMonitor monitor,
                                                ProductOptions options) {
        ImplicitReserveGame game = ReserveSolver.implicitGame(arena, goal, monitor, options);
        ImplicitReserveGame.Strategy region = game.solveRegion(options.cancelled());
        return table(arena, goal, monitor, region::robotWins);
    }

    /** Reads the table off a solved {@link ProductGame#everywhere} product. */
    static ChargeNeeded of(ProductGame game, Solution sol, ReserveMonitor monitor) {
        return table(game.arena(), game.goal(), monitor, (a, g, m) -> {
            int p = game.vertexOf(a, g, m);
            return p >= 0 && sol.winning(p);
        });
    }

    /**
     * The table from the solver's winning triples: per robot vertex and normalised goal state the least
     * winning level (winning is monotone in the level, so the first one found upwards).
     */
    private static ChargeNeeded table(Arena arena, GoalAutomaton goal, ReserveMonitor monitor,
                                      SolverRegion.TripleWins wins) {
        int gs = goal.stateCount();
        int levels = (int) monitor.stateBound();
        int[] needed = new int[Math.multiplyExact(arena.robotCount(), gs)];
        Arrays.fill(needed, IMPOSSIBLE);
        for (int a = 0; a < arena.robotCount(); a++) {
            int c = arena.cell(a);
            long zones = arena.cellZones(c);
            boolean dock = arena.isDock(c);
            for (int g = 0; g < gs; g++) {
                if (goal.step(g, zones) != g) {
                    continue; // not normalised (or avoided): answered through its normal form
                }
                if (goal.accepting(g, dock)) {
                    needed[a * gs + g] = monitor.floorUnits();
                    continue;
                }
                for (int m = 0; m < levels; m++) {
                    if (wins.wins(a, g, m)) {
                        needed[a * gs + g] = monitor.level(m);
                        break;
                    }
                }
            }
        }
        return new ChargeNeeded(arena, goal, monitor.floorUnits(), monitor.capacityUnits(), needed);
    }

    /**
     * The least battery level (units) from which the mission can still be completed safely when
     * the robot occupies the cell with the given disturbances left and tasks done (and, with lasting
     * events, nothing closed yet and no at-most entry used), or
     * {@link #IMPOSSIBLE} (also for a wall cell).
     *
     * @param cellIndex    row-major cell index
     * @param budgetLeft   disturbances the building may still throw, 0 .. K
     * @param progressMask bit i set when task i of the visit list is done
     * @throws IllegalArgumentException if the budget or the progress mask is out of range
     */
    public int unitsNeeded(int cellIndex, int budgetLeft, int progressMask) {
        if (budgetLeft < 0 || budgetLeft > arena.budget()) {
            throw new IllegalArgumentException("budget left must be in 0.." + arena.budget() + ": " + budgetLeft);
        }
        if (cellIndex < 0 || cellIndex >= arena.width() * arena.height()) {
            throw new IllegalArgumentException("no cell " + cellIndex);
        }
        int g = goal.stateOfMask(progressMask);
        if (g == GoalAutomaton.REJECT) {
            throw new IllegalArgumentException("progress " + progressMask + " is not a state of the tasks");
        }
        int a = arena.robotVertex(cellIndex, budgetLeft);
        if (a < 0) {
            return IMPOSSIBLE;
        }
        int gn = goal.step(g, arena.cellZones(cellIndex));
        if (gn == GoalAutomaton.REJECT) {
            return IMPOSSIBLE;
        }
        return needed[a * goal.stateCount() + gn];
    }

    public int unitsNeeded(Cell cell, int budgetLeft, int progressMask) {
        return unitsNeeded(cell.index(arena.width()), budgetLeft, progressMask);
    }

    public Arena arena() {
        return arena;
    }

    public GoalAutomaton goal() {
        return goal;
    }

    public int floorUnits() {
        return floor;
    }

    public int capacityUnits() {
        return capacity;
    }

    public int budget() {
        return arena.budget();
    }

    public EnergyScale scale() {
        return arena.mission().scale();
    }

    /** The largest finite value in the table (the top of a colour scale), or the floor if none. */
    public int maxUnitsNeeded() {
        int m = floor;
        for (int v : needed) {
            m = Math.max(m, v);
        }
        return m;
    }
}
