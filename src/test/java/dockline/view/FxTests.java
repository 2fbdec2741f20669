package dockline.view;

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
        MissionWindow window = new MissionWindow(new SolverAnalyzer(), new FileMissionSource(), null);
        stage.setScene(window.scene(width, height));
        window.attach(stage);
        stage.show();
        window.open(mission);
        return window;
    }

    /** Disposes the window on the FX thread (at most ten seconds). */
    static void dispose(MissionWindow window) throws Exception {
        WaitForAsyncUtils.asyncFx(window::dispose).get(10, TimeUnit.SECONDS);
    }
}
