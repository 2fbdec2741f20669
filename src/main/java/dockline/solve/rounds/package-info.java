/**
 * Missions beyond one trip: patrols (a recurrence goal, every checkpoint visited infinitely often) and
 * visit missions with a deadline (a ticks-left monitor beside the reserve monitor), on a stored product of
 * arena × goal × battery levels of their own ({@link dockline.solve.rounds.RoundsProduct}).
 *
 * <p>Entry points: {@link dockline.solve.rounds.PatrolSolver#analyse} (Büchi game, nested attractors) and
 * {@link dockline.solve.rounds.DeadlineSolver#analyse} (attractor ranks as the ticks-left monitor).
 */
package dockline.solve.rounds;
