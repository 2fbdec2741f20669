package dockline.view;

import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import org.testfx.util.WaitForAsyncUtils;

/** Test support for the window tests: run on the FX thread and wait for it, wait for a condition. */
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
}
