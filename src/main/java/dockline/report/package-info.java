/**
 * Wording shared by all outputs (the safety caveats, {@link dockline.report.Caveats}) and the sign-off
 * report of {@code dockline report}: {@link dockline.report.ReportRun} checks many missions at once on a
 * bounded pool, each through {@link dockline.report.MissionChecker} (which asks the core,
 * {@link dockline.plan.MissionPlanner} or {@link dockline.plan.RoundsPlan}, and decides nothing itself),
 * {@link dockline.report.RuleOfThumb} sets the usual fixed-margin rule beside each verdict, and
 * {@link dockline.report.Html} and {@link dockline.report.JsonReport} write the results. Map pictures come
 * from a front end through {@link dockline.report.Pictures}: this package depends on neither the command
 * line nor the view.
 */
package dockline.report;
