/**
 * The command line (picocli): one {@code Callable<Integer>} per subcommand returning the exit code.
 * Entry point: {@link dockline.cli.Main}.
 */
package dockline.cli;
