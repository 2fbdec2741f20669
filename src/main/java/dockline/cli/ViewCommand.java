package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.view.FileMissionSource;
import dockline.view.MissionSource;
import dockline.view.SolverAnalyzer;
import dockline.view.ViewLauncher;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline view [FILE]}: opens the desktop window, with the mission (or map) file opened
 * when one is given. Returns when the window is closed. The window only reads mission and map
 * files; it writes nothing but its own recent-files list under the user's home.
 */
@Command(name = "view",
        description = {"Opens the desktop window to look at a mission and replay its worst-case runs.",
                "It shows the map, the charge needed per cell, the policy, the reserve and starting-charge",
                "controls, and the worst-case replay with its battery chart.",
                "More missions and maps can be opened from the window."},
        exitCodeList = {"0:the window was closed", "2:the file has problems, or there is no display"})
public final class ViewCommand extends CommandBase {

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "a mission or map file to open (YAML)")
    Path file;

    @Option(names = "--json", description = "print the messages (the problems that stopped it, or none once the"
            + " window is closed) as one JSON object on standard output instead of text")
    boolean json;

    @Override
    int run(PrintWriter out, PrintWriter err) {
        MissionSource source = new FileMissionSource();
        if (file != null) {
            try {
                source.open(file);
            } catch (MissionSource.OpenException e) {
                return finish(false, e.messages(), err);
            }
        }
        try {
            ViewLauncher.show(file, new SolverAnalyzer(), source);
        } catch (ViewLauncher.NoDisplayException e) {
            return finish(false, List.of("dockline view: " + e.getMessage()), err);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while the window was open", e);
        }
        return finish(true, List.of(), err);
    }

    /** Prints the messages (as text on stderr, or one JSON object on stdout) and returns the exit code. */
    private int finish(boolean ok, List<String> messages, PrintWriter err) {
        if (json) {
            PrintWriter out = out();
            ObjectNode o = Json.object();
            o.put("ok", ok);
            o.put("file", file == null ? null : file.toString());
            ArrayNode a = o.putArray("messages");
            messages.forEach(a::add);
            out.println(Json.withCaveats(o));
            out.flush();
        } else {
            messages.forEach(err::println);
            err.flush();
        }
        return ok ? ExitCodes.OK : ExitCodes.BAD_INPUT;
    }
}
