package dockline.cli;

import java.io.PrintWriter;
import picocli.CommandLine.Mixin;

/**
 * What the commands that read one mission ({@code check}, {@code export}, {@code margin},
 * {@code replay}) share: the mission options and one frame around the command's work, which runs on
 * the command line's writers (with a progress line on standard error, {@link ProgressLine}), turns a bad input already reported into exit 2 and flushes both
 * writers whatever happens.
 */
abstract class MissionCommand extends CommandBase {

    @Mixin
    MissionOptions mission;

    @Mixin
    QuietOption quiet;

    @Override
    public final Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        try (ProgressLine.Frame progress = ProgressLine.open(out, err, jsonRequested(), quiet.quiet)) {
            return run(progress.out(), progress.err());
        } catch (MissionOptions.BadInput e) {
            return ExitCodes.BAD_INPUT;
        } finally {
            out.flush();
            err.flush();
        }
    }

    /** The command's work: prints to {@code out} and {@code err} and returns the exit code. */
    abstract int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput;
}
