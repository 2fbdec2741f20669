/**
 * Stored games: the product arena × goal automaton × monitor in CSR int arrays and the linear-time
 * attractor solvers over any {@link dockline.solve.game.GameGraph}.
 *
 * <p>Start at {@link dockline.solve.game.ProductGame#fromStart}, then {@link dockline.solve.game.AttractorSolver}
 * (or {@link dockline.solve.game.CompactAttractorSolver}) on its graph.
 */
package dockline.solve.game;
