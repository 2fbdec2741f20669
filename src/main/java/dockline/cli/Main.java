package dockline.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
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

    @CommandLine.Option(names = "--debug", description = "on an internal error, print the stack trace on standard"
            + " error instead of writing it to a log file (may also follow the command's name)")
    boolean debugOption;

    /** Removes {@code --debug} (before a {@code --}) from the arguments and turns it on. */
    static String[] takeDebug(String[] args) {
        List<String> out = new ArrayList<>();
        boolean options = true;
        boolean found = false;
        for (String a : args) {
            if (options && a.equals("--")) {
                options = false;
            }
            if (options && a.equals("--debug")) {
                found = true;
            } else {
                out.add(a);
            }
        }
        Failures.debug = found;
        return out.toArray(new String[0]);
    }

    /** Whether the arguments ask for JSON output (before a {@code --}). */
    static boolean wantsJson(String[] args) {
        for (String a : args) {
            if (a.equals("--")) {
                return false;
            }
            if (a.equals("--json")) {
                return true;
            }
        }
        return false;
    }

    /**
     * Runs the command; on an exit code of 2 or more with {@code --json}, when the command printed
     * nothing on standard output, prints its errors as one JSON object there too
     * ({@link Failures#jsonErrors}); they stay on standard error as text as well.
     */
    private static int execute(CommandLine.ParseResult parsed) {
        CommandLine.ParseResult last = parsed;
        while (last.hasSubcommand()) {
            last = last.subcommand();
        }
        CommandLine sub = last.commandSpec().commandLine();
        boolean json = last.hasMatchedOption("--json");
        PrintWriter origOut = sub.getOut();
        PrintWriter origErr = sub.getErr();
        Failures.Tee tee = new Failures.Tee(origErr);
        Failures.Counting counted = new Failures.Counting(origOut);
        PrintWriter err = new PrintWriter(tee, true);
        PrintWriter out = new PrintWriter(counted, true);
        sub.setErr(err);
        sub.setOut(out);
        int code;
        try {
            code = new CommandLine.RunLast().execute(parsed);
        } catch (CommandLine.ExecutionException | Error ex) {
            // a command's exception, or an Error picocli lets through (a class missing from the jar,
            // a stack overflow): by type, never as a bare trace
            Throwable cause = ex instanceof CommandLine.ExecutionException && ex.getCause() != null ? ex.getCause() : ex;
            code = Failures.report(cause, null, err);
        } finally {
            out.flush();
            err.flush();
            sub.setErr(origErr);
            sub.setOut(origOut);
        }
        if (json && code >= ExitCodes.BAD_INPUT && counted.count == 0) {
            origOut.println(Json.withCaveats(Failures.jsonErrors(tee.copy.toString(), code)));
            origOut.flush();
        }
        return code;
    }

    /** The configured command line, with all subcommands and the error handlers. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main()) {
            @Override
            public int execute(String... args) {
                return super.execute(takeDebug(args));
            }
        };
        for (Object sub : subcommands()) {
            cl.addSubcommand(sub);
        }
        // what every subcommand's help has, set once: -h/--help and -V/--version (the tool's version), and the
        // heading of its exit codes
        for (CommandLine sub : cl.getSubcommands().values()) {
            CommandLine.Model.CommandSpec spec = sub.getCommandSpec();
            spec.mixinStandardHelpOptions(true);
            spec.versionProvider(new Version());
            spec.usageMessage().exitCodeListHeading("%nExit codes:%n");
        }
        cl.setExecutionStrategy(Main::execute);
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("dockline: " + ex.getMessage());
            if (ex instanceof CommandLine.UnmatchedArgumentException u
                    && u.getUnmatched().stream().anyMatch(w -> w.equalsIgnoreCase("wh") || w.equals("%"))) {
                // `--reserve 12 Wh` unquoted: the shell splits the amount in two
                c.getErr().println("An amount with a unit is one argument: write 12Wh, or '12 Wh' in quotes.");
            }
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help'.");
            if (wantsJson(args)) {
                c.getOut().println(Json.withCaveats(Failures.jsonErrors("dockline: " + ex.getMessage() + " (hint: see '"
                        + c.getCommandSpec().qualifiedName() + " --help')", ExitCodes.BAD_INPUT)));
                c.getOut().flush();
            }
            return ExitCodes.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parseResult) -> Failures.internal(ex, c.getErr()));
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
            new ReportCommand(),
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
