/**
 * Solving the product game arena × goal automaton × monitor by linear-time attractors, strategy
 * extraction, and the policy the robot runs.
 *
 * <p>Entry point for the reserve objective: {@link dockline.solve.reserve.ReserveSolver#analyse} (verdict,
 * policy, worst case, highest guaranteed floor, heat map {@link dockline.solve.reserve.ChargeNeeded}). For
 * any other {@link dockline.monitor.Monitor}: {@link dockline.solve.game.ProductGame#fromStart}, then
 * {@link dockline.solve.game.AttractorSolver} on its {@link dockline.solve.game.GameGraph}.
 *
 * <p>Entry point for the discounted objective: {@link dockline.solve.discounted.DiscountedSolver#analyse}; its
 * optimisation baseline is {@link dockline.solve.discounted.DiscountedValueIteration}, and
 * {@link dockline.bench.DiscountedBench} measures the two routes on the same instances.
 */
package dockline.solve;
