package dockline.solve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;

/**
 * The robot's winning region as the threshold solver found it: a situation (robot vertex, progress,
 * level) is winning when its product vertex is in the solution's winning region, or when it already
 * completes the mission at or above the floor. A situation the product build did not reach from the
 * start counts as not winning; the counterexample only asks about reached ones.
 */
public final class SolverRegion implements WinningRegion {

    private final ProductGame game;
    private final Solution solution;
    private final ReserveMonitor monitor;
    private final GoalAutomaton goal;
    private final Arena arena;

    /**
     * @throws IllegalArgumentException if the game's monitor is not a {@link ReserveMonitor}
     */
    public SolverRegion(ProductGame game, Solution solution) {
        if (!(game.monitor() instanceof ReserveMonitor rm)) {
            throw new IllegalArgumentException("the counterexample needs the reserve objective's product");
        }
        this.game = game;
        this.solution = solution;
        this.monitor = rm;
        this.goal = game.goal();
        this.arena = game.arena();
    }

    public int floorUnits() {
        return monitor.floorUnits();
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
        if (m == Monitor.REJECT) {
            return false;
        }
        int p = game.vertexOf(robotVertex, g, m);
        return p >= 0 && solution.winning(p);
    }
}
