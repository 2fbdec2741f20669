/**
 * Human-facing wording shared by every output: the safety caveats and report formatting.
 * Entry point: {@link dockline.report.Caveats}.
 */
package dockline.report;
