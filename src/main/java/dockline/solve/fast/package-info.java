/**
 * The fast path for missions that cannot charge before the end: the minimum charge needed per vertex
 * by min-max Dijkstra on the AND-OR graph arena × goal (Knuth 1977), independent of the energy resolution.
 *
 * <p>Entry point: {@link dockline.solve.fast.FastPath}.
 */
package dockline.solve.fast;
