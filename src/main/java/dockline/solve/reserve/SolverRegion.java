package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.WinningRegion;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;

/**
 * The robot's winning region as the threshold solver found it: a situation (robot vertex, progress,
 * level) is winning when it already completes the mission at or above the floor, or when its product
 * triple is in the solver's winning region. On the stored route a situation the product build did not
 * reach from the start counts as not winning (the counterexample only asks about reached ones); the
 * implicit route's region covers every triple. O(1) per question.
 *
 * <p>No algorithm of its own: a look-up in the solver's result (Grädel, Thomas, Wilke 2002, ch. 2,
 * for the attractor that made it).
 */
final class SolverRegion implements WinningRegion {

    /** Whether the solver won the product triple (robot vertex, goal state, monitor state). */
    @FunctionalInterface
    interface TripleWins {
        boolean wins(int robotVertex, int goalState, int monitorState);
    }

    private final Arena arena;
    private final GoalAutomaton goal;
    private final ReserveMonitor monitor;
    private final TripleWins triples;

    private SolverRegion(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, TripleWins triples) {
        this.arena = arena;
        this.goal = goal;
        this.monitor = monitor;
        this.triples = triples;
    }

    /**
     * The region of a solved stored product.
     *
     * @throws IllegalArgumentException if the game's monitor is not a {@link ReserveMonitor}
     */
    static SolverRegion of(ProductGame game, Solution solution) {
        if (!(game.monitor() instanceof ReserveMonitor rm)) {
            throw new IllegalArgumentException("the counterexample needs the reserve objective's product");
        }
        return new SolverRegion(game.arena(), game.goal(), rm, (a, g, m) -> {
            int p = game.vertexOf(a, g, m);
            return p >= 0 && solution.winning(p);
        });
    }

    /**
     * The region of an implicit solve that ran to the end.
     *
     * @throws IllegalArgumentException if the solve stopped early (its region is partial)
     */
    static SolverRegion of(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, ImplicitReserveGame.Strategy solve) {
        if (!solve.complete()) {
            throw new IllegalArgumentException("the solve stopped once the start was won: its region is partial");
        }
        return new SolverRegion(arena, goal, monitor, solve::robotWins);
    }

    @Override
    public boolean robotWins(int robotVertex, int progressMask, int level) {
        if (level < monitor.floorUnits() || level > monitor.capacityUnits()) {
            return false;
        }
        int g = goal.stateOfMask(progressMask);
        if (g == GoalAutomaton.REJECT) {
            return false;
        }
        if (goal.accepting(g, arena.isDock(arena.cell(robotVertex)))) {
            return true;
        }
        int m = monitor.stateOf(level);
        return m != Monitor.REJECT && triples.wins(robotVertex, g, m);
    }
}
