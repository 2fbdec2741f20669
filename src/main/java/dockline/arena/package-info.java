/**
 * The turn-based arena: robot vertices (cell, budget left) and disturbance vertices (cell, action,
 * budget left), integer energy deltas on the edges, stored as compressed-sparse-row int arrays.
 *
 * <p>Entry point: {@link dockline.arena.ArenaCompiler#compile(dockline.model.Mission)}.
 */
package dockline.arena;
