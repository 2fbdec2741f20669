/**
 * The discounted-score question: the product with a discounted-sum comparator solved by attractor,
 * its policy with the score memory, and value iteration as the optimisation baseline.
 *
 * <p>Entry point: {@link dockline.solve.discounted.DiscountedSolver#analyse} with {@link dockline.solve.discounted.DiscountedOptions}.
 */
package dockline.solve.discounted;
