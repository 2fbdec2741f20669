package dockline.view;

import java.nio.file.Path;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.framework.junit5.ApplicationExtension;

/**
 * Test support: the base of the window tests that open one mission with the real loader and solver
 * ({@link FxTests#openReal}) and close the window after each test. TestFX looks for the {@code @Start}
 * method on the test class itself only, so each such test keeps a one-line {@code @Start} calling
 * {@link #open}.
 */
@ExtendWith(ApplicationExtension.class)
abstract class RealWindowCase {

    /** The window of the current test, set by {@link #open}. */
    protected MissionWindow window;

    /** Opens {@code mission} in a window on {@code stage}, in a scene of the given size; the solve runs in the background. */
    protected final void open(Stage stage, int width, int height, Path mission) {
        window = FxTests.openReal(stage, width, height, mission);
    }

    /**
     * Opens a mission built in code (a generated one) in a window on {@code stage}, under the file name {@code name}
     * (nothing is read: the source hands out {@code mission} for every path).
     */
    protected final void open(Stage stage, int width, int height, dockline.model.Mission mission, Path name) {
        window = FxTests.show(stage, new MissionWindow(new SolverAnalyzer(), FxTests.always(mission), null), width,
                height);
        window.open(name);
    }

    @AfterEach
    final void disposeWindow() throws Exception {
        FxTests.dispose(window);
    }
}
