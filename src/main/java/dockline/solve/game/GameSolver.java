package dockline.solve.game;

import java.util.function.BooleanSupplier;

/**
 * Solves the reachability game of a {@link GameGraph}: which vertices the robot can force into the
 * target, the attractor rank of each, and a strategy that strictly decreases the rank.
 *
 * <p>Implementations are built with the graph (and a cancellation flag) and answer one query,
 * {@link #solve()}. Two exist here: {@link CompactAttractorSolver} (linear time, the default of
 * the stored reserve route), {@link AttractorSolver} (linear time, the reference implementation the
 * tests compare with); the tests add a naive fixpoint sweep for cross-checks. All give
 * the same winning sets and ranks; chosen edges may differ, and each strictly decreases the rank.
 *
 * <p>Algorithm: the attractor of a reachability game (Grädel, Thomas, Wilke 2002, "Automata, Logics,
 * and Infinite Games", ch. 2), O(|V| + |E|) in both implementations.
 */
public interface GameSolver {

    /**
     * @throws java.util.concurrent.CancellationException if the cancellation flag was raised
     */
    Solution solve();

    /** Makes a solver for a graph; {@code AttractorSolver::new} and {@code CompactAttractorSolver::new} fit. */
    @FunctionalInterface
    interface Factory {
        GameSolver create(GameGraph graph, BooleanSupplier cancelled);
    }
}
