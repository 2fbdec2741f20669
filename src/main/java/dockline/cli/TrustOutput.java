package dockline.cli;

import dockline.io.InputException;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.model.Mission;
import java.io.PrintWriter;
import java.nio.file.Path;

/** Small helpers shared by the {@code replay} and {@code margin} commands. */
final class TrustOutput {

    private TrustOutput() {
    }

    /** Thrown to leave a command with an exit code after its message was printed. */
    static final class Exit extends Exception {
        private static final long serialVersionUID = 1L;
        final int code;

        Exit(int code) {
            super(null, null, false, false);
            this.code = code;
        }
    }

    /** Loads the mission, or prints every problem as {@code file:line:column: message} and exits 2. */
    static Mission load(Path file, PrintWriter err) throws Exit {
        try {
            return MissionLoader.load(file);
        } catch (InputException e) {
            for (Problem p : e.problems()) {
                err.println(p.format());
            }
            err.flush();
            throw new Exit(ExitCodes.BAD_INPUT);
        }
    }

    static String mission(Mission m, Path file) {
        return "mission '" + m.name() + "' (" + file + ")";
    }
}
