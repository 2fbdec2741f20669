/**
 * The reserve-floor question: verdict, policy, worst case, highest guaranteed floor and heat map, on
 * the product generated on demand (default) or stored.
 *
 * <p>Entry point: {@link dockline.solve.reserve.ReserveSolver#analyse} with {@link dockline.solve.reserve.ReserveOptions}.
 */
package dockline.solve.reserve;
