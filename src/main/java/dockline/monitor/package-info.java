/**
 * Comparator automata that watch the sequence of energy deltas and decide a threshold question:
 * the reserve monitor (battery level against the floor) and the discounted-sum comparator.
 * Both implement {@link dockline.monitor.Monitor}.
 */
package dockline.monitor;
