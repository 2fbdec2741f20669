package dockline.cli;

import dockline.model.Mission;
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

    static String mission(Mission m, Path file) {
        return "mission '" + m.name() + "' (" + file + ")";
    }
}
