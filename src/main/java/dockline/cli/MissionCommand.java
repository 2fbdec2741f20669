package dockline.cli;

import java.io.PrintWriter;
import picocli.CommandLine.Mixin;

/**
 * What the commands that read one mission ({@code check}, {@code export}, {@code margin},
 * {@code replay}) share: the mission options, {@code --quiet}, and a progress line on standard error
 * ({@link ProgressLine}) around the command's work, inside the frame of {@link CommandBase}.
 */
abstract class MissionCommand extends CommandBase {

    @Mixin
    MissionOptions mission;

    @Mixin
    QuietOption quiet;

    @Override
    final int frame(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        try (ProgressLine.Frame progress = ProgressLine.open(out, err, jsonRequested(), quiet.quiet)) {
            return run(progress.out(), progress.err());
        }
    }
}
