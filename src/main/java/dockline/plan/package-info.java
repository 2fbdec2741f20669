/**
 * The one core entry point every front end uses: mission and options in, one immutable result out
 * (verdict, method and why, policy, certificate, worst case, highest floor, lowest start,
 * suggestions, replays, sizes and timings, notes).
 *
 * <p>Start at {@link dockline.plan.MissionPlanner#plan}; the options are {@link dockline.plan.PlanOptions}
 * with one {@link dockline.plan.Route} (each route carries only the settings it reads), the result is a
 * {@link dockline.plan.Plan}. This package uses the solvers, the certificate checkers, the margins and the
 * replays; it never uses {@code cli} or {@code view}, which only parse, print and show.
 */
package dockline.plan;
