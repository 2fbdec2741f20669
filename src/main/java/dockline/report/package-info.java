/**
 * The safety caveats every human-facing output carries, in one place: as a text block, as lines
 * for the view and the JSON outputs, and as one short line for pictures.
 * Entry point: {@link dockline.report.Caveats}.
 */
package dockline.report;
