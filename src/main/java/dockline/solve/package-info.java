/**
 * Solving the product game arena × goal automaton × monitor by linear-time attractors, strategy
 * extraction, and the policy the robot runs.
 *
 * <p>Entry point for the reserve objective: {@link dockline.solve.ReserveSolver#analyse} (verdict,
 * policy, worst case, highest guaranteed floor, heat map {@link dockline.solve.ChargeNeeded}). For
 * any other {@link dockline.monitor.Monitor}: {@link dockline.solve.ProductGame#fromStart}, then
 * {@link dockline.solve.AttractorSolver} on its {@link dockline.solve.GameGraph}.
 *
 * <p>Entry point for the discounted objective: {@link dockline.solve.DiscountedSolver#analyse}; its
 * optimisation baseline is {@link dockline.solve.DiscountedValueIteration}, and
 * {@link dockline.solve.DiscountedBench} measures the two routes on the same instances.
 */
package dockline.solve;
