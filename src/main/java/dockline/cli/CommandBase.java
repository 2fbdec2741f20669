package dockline.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;

/**
 * What every subcommand starts from: the command line picocli hands it, whose writers (set by
 * {@link Main}) it prints to, and one frame around its work ({@link #call}): the work runs on those
 * writers, a bad input already reported ({@link MissionOptions.BadInput}) is exit 2, and both writers
 * are flushed whatever happens. The result is an exit code ({@link ExitCodes}).
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

    @Override
    public final Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        try {
            return frame(out, err);
        } catch (MissionOptions.BadInput e) {
            return ExitCodes.BAD_INPUT;
        } finally {
            out.flush();
            err.flush();
        }
    }

    /** Runs {@link #run} on the writers; a command that shows progress wraps it ({@link MissionCommand}). */
    int frame(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        return run(out, err);
    }

    /** The command's work: prints to {@code out} and {@code err} and returns the exit code. */
    abstract int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput;
}
