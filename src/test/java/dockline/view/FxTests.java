package dockline.view;

import dockline.model.Mission;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.stage.Stage;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Test support for the window tests: open the window on a mission with the real loader and solver, close it,
 * run on the FX thread and wait for it, wait for a condition.
 */
final class FxTests {

    private FxTests() {
    }

    /** {@code c} run on the FX thread, its result (at most a minute). */
    static <T> T fx(Callable<T> c) {
        try {
            return WaitForAsyncUtils.asyncFx(c).get(60, TimeUnit.SECONDS);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    /** Waits (at most three minutes) until {@code c} holds, then for the FX events it set off. */
    static void waitUntil(BooleanSupplier c) throws Exception {
        WaitForAsyncUtils.waitFor(180, TimeUnit.SECONDS, c::getAsBoolean);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /**
     * The window with the real solver and loader on {@code stage}, in a scene of the given size, shown, and
     * opening {@code mission} (the solve runs in the background). Called from a TestFX {@code @Start} method.
     */
    static MissionWindow openReal(Stage stage, int width, int height, Path mission) {
        MissionWindow window = show(stage, new MissionWindow(new SolverAnalyzer(), new FileMissionSource(), null), width,
                height);
        window.open(mission);
        return window;
    }

    /** {@code window} on {@code stage}, in a scene of the given size, shown. Called from a TestFX {@code @Start} method. */
    static MissionWindow show(Stage stage, MissionWindow window, int width, int height) {
        stage.setScene(window.scene(width, height));
        window.attach(stage);
        stage.show();
        return window;
    }

    /** A source that opens every path as {@code mission}: the window tests' stand-in for the loader. */
    static MissionSource always(Mission mission) {
        return p -> new MissionSource.Opened(p, mission, mission.map());
    }

    /** A new mission file in {@code dir} for a stand-in source to open (which ignores its content). */
    static Path standInFile(Path dir) throws IOException {
        Path file = Files.createTempFile(dir, "mission", ".yaml");
        Files.writeString(file, "# stand-in; the test source ignores the content\n");
        return file;
    }

    /** Whether the window has no task running and shows a solved mission (read on the FX thread). */
    static boolean solved(MissionWindow window) {
        return fx(() -> window.taskProperty().get() == null && window.dataProperty().get() != null
                && window.dataProperty().get().solved());
    }

    /** Disposes the window on the FX thread (at most ten seconds). */
    static void dispose(MissionWindow window) throws Exception {
        WaitForAsyncUtils.asyncFx(window::dispose).get(10, TimeUnit.SECONDS);
    }
}
