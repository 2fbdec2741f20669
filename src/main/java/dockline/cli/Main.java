package dockline.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code dockline} command. Subcommands are listed in {@link #subcommands()}; each returns its
 * exit code. Errors are mapped to exit codes in one place and printed as messages, never as stack
 * traces.
 */
@Command(name = "dockline", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Checks that a battery-powered robot can always finish its tasks and dock without its battery"
                + " dropping below a reserve floor, under every disturbance the building model allows.",
        footerHeading = "%n", footer = "Run 'dockline COMMAND --help' for the options of a command.")
public final class Main implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs the command line and returns the exit code (used by tests). */
    public static int run(String... args) {
        return commandLine().execute(args);
    }

    /** The configured command line, with all subcommands and the error handlers. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        for (Object sub : subcommands()) {
            cl.addSubcommand(sub);
        }
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("dockline: " + ex.getMessage());
            if (ex instanceof CommandLine.UnmatchedArgumentException u
                    && u.getUnmatched().stream().anyMatch(w -> w.equalsIgnoreCase("wh") || w.equals("%"))) {
                // `--reserve 12 Wh` unquoted: the shell splits the amount in two
                c.getErr().println("An amount with a unit is one argument: write 12Wh, or '12 Wh' in quotes.");
            }
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help'.");
            return ExitCodes.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parseResult) -> {
            c.getErr().println("dockline: internal error: " + ex);
            c.getErr().println("Please report this with the input files.");
            return ExitCodes.INTERNAL;
        });
        return cl;
    }

    /** The subcommands, in the order --help lists them. */
    static Object[] subcommands() {
        return new Object[] {
            // each issue adds its subcommand here
            new ValidateCommand(),
            new CheckCommand(),
            new ExportCommand(),
            new ReplayCommand(),
            new MarginCommand(),
            new ViewCommand(),
            new RenderCommand(),
            new BenchCommand(),
            new ImportCommand(),
        };
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Reads the version from the jar manifest when there is one. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"dockline " + (v != null ? v : "0.1.0")};
        }
    }
}
