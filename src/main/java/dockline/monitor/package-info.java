/**
 * Comparator automata that watch the sequence of energy deltas and decide a threshold question:
 * the reserve monitor (battery level against the floor) and the discounted-sum comparator.
 * Both implement {@link dockline.monitor.Monitor}.
 *
 * <p>Entry points: {@link dockline.monitor.ReserveMonitor}, {@link dockline.monitor.DiscountedComparator}
 * (the discounted sum against a rational threshold), {@link dockline.monitor.PairMonitor} (two
 * monitors side by side, e.g. score and battery).
 */
package dockline.monitor;
