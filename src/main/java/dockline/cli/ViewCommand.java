package dockline.cli;

import dockline.view.FileMissionSource;
import dockline.view.MissionSource;
import dockline.view.SolverAnalyzer;
import dockline.view.ViewLauncher;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline view [FILE]}: opens the desktop window, with the mission (or map) file opened
 * when one is given. Returns when the window is closed. The window only reads mission and map
 * files; it writes nothing but its own recent-files list under the user's home.
 */
@Command(name = "view", mixinStandardHelpOptions = true,
        description = {"Opens the desktop window to look at a mission and replay its worst-case runs.",
                "It shows the map, the charge needed per cell, the policy, the reserve and starting-charge",
                "controls, and the worst-case replay with its battery chart.",
                "More missions and maps can be opened from the window."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:the window was closed", "2:the file has problems, or there is no display"})
public final class ViewCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "a mission or map file to open (YAML)")
    Path file;

    @Override
    public Integer call() throws InterruptedException {
        PrintWriter err = spec.commandLine().getErr();
        MissionSource source = new FileMissionSource();
        if (file != null) {
            try {
                source.open(file);
            } catch (MissionSource.OpenException e) {
                for (String line : e.messages()) {
                    err.println(line);
                }
                return ExitCodes.BAD_INPUT;
            }
        }
        try {
            ViewLauncher.show(file, new SolverAnalyzer(), source);
        } catch (ViewLauncher.NoDisplayException e) {
            err.println("dockline view: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.OK;
    }
}
