/**
 * The command line (picocli): validate, check, export, replay and margin (and view, render, bench,
 * import),
 * one {@code Callable<Integer>} per subcommand returning the exit code of {@link dockline.cli.ExitCodes}.
 *
 * <p>Entry point: {@link dockline.cli.Main}. The mission commands share {@code MissionOptions} (the
 * mission file, the overrides, output-path checks and the mapping of solver failures to exit codes)
 * and {@code Json} (every {@code --json} output, with its {@code caveats} array).
 */
package dockline.cli;
