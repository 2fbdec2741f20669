package dockline.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;

/**
 * What every subcommand starts from: the command line picocli hands it, whose writers (set by
 * {@link Main}) it prints to, and an exit code ({@link ExitCodes}) as its result.
 */
abstract class CommandBase implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Standard output of this command line. */
    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    /** Whether the command was asked for its JSON output ({@code --json}, when it has that option). */
    boolean jsonRequested() {
        CommandLine.Model.OptionSpec o = spec.findOption("--json");
        return o != null && Boolean.TRUE.equals(o.getValue());
    }

    /** Standard error of this command line. */
    PrintWriter err() {
        return spec.commandLine().getErr();
    }
}
