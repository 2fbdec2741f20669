/**
 * Solving a mission as a two-player game: the words every route shares (the {@link dockline.solve.Verdict},
 * the {@link dockline.solve.WinningRegion}, the size limits) and one sub-package per route.
 *
 * <p>Entry points: {@link dockline.solve.reserve.ReserveSolver#analyse} (reserve floor; the default),
 * {@link dockline.solve.fast.FastPath} (no charging before the end), {@link dockline.solve.discounted.DiscountedSolver#analyse}
 * (discounted score); {@link dockline.solve.game} holds the stored product and the attractor solvers they share.
 */
package dockline.solve;
