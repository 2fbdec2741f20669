package dockline.solve;

import java.util.function.BooleanSupplier;

/**
 * Solves the reachability game of a {@link GameGraph}: which vertices the robot can force into the
 * target, the attractor rank of each, and a strategy that strictly decreases the rank.
 *
 * <p>Implementations are built with the graph (and a cancellation flag) and answer one query,
 * {@link #solve()}. Two exist: {@link AttractorSolver} (linear time, the one the tool uses) and
 * {@link FixpointSweepSolver} (naive, for cross-checks in tests). Both give the same winning sets
 * and ranks; chosen edges may differ.
 */
public interface GameSolver {

    /**
     * @throws java.util.concurrent.CancellationException if the cancellation flag was raised
     */
    Solution solve();

    /** Makes a solver for a graph; {@code AttractorSolver::new} and {@code FixpointSweepSolver::new} fit. */
    @FunctionalInterface
    interface Factory {
        GameSolver create(GameGraph graph, BooleanSupplier cancelled);
    }
}
