package dockline.solve.game;

import dockline.solve.reserve.ReserveOptions;
import java.util.function.BooleanSupplier;

/**
 * Solves the reachability game of a {@link GameGraph}: which vertices the robot can force into the
 * target, the attractor rank of each, and a strategy that strictly decreases the rank.
 *
 * <p>Implementations are built with the graph (and a cancellation flag) and answer one query,
 * {@link #solve()}. Three exist: {@link CompactAttractorSolver} (linear time, the default of
 * {@link ReserveOptions}), {@link AttractorSolver} (linear time, the reference implementation the
 * tests compare with) and {@link FixpointSweepSolver} (naive, for cross-checks in tests). All give
 * the same winning sets and ranks; chosen edges may differ, and each strictly decreases the rank.
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
