/**
 * Reading the input files: YAML maps and missions into the {@link dockline.model} records, with
 * every problem reported as {@code file:line:column: message (hint: ...)}, all at once.
 *
 * <p>Start with {@link dockline.io.MissionLoader} and {@link dockline.io.MapLoader}; bad input
 * raises {@link dockline.io.InputException} carrying {@link dockline.io.Problem}s.
 * {@link dockline.io.Quantities} parses charges and Wh figures (for command-line overrides too);
 * {@link dockline.io.AtomicFiles} writes every output file.
 */
package dockline.io;
