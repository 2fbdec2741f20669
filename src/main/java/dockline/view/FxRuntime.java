package dockline.view;

import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import javafx.application.Platform;

/**
 * Starts the JavaFX toolkit once and runs work on its thread. For pictures without a display,
 * {@link #startHeadless()} selects the Monocle headless glass and the software renderer
 * <em>before</em> the toolkit starts (they are read only at start-up).
 */
public final class FxRuntime {

    private static boolean started;

    private FxRuntime() {
    }

    /** Starts the toolkit with the headless Monocle glass and software rendering (idempotent). */
    public static synchronized void startHeadless() {
        if (started) {
            return;
        }
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        System.setProperty("java.awt.headless", "true");
        start();
    }

    /** Starts the toolkit with the platform's normal glass (idempotent). */
    public static synchronized void start() {
        if (started) {
            return;
        }
        try {
            Platform.startup(() -> { });
        } catch (IllegalStateException alreadyRunning) {
            // started elsewhere (a test harness or an Application launch): use it as it is
        }
        Platform.setImplicitExit(false);
        started = true;
    }

    /** Runs the work on the FX thread and waits for its result; exceptions are rethrown here. */
    public static <T> T call(Callable<T> work) throws Exception {
        if (Platform.isFxApplicationThread()) {
            return work.call();
        }
        CompletableFuture<T> f = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                f.complete(work.call());
            } catch (Throwable t) {
                f.completeExceptionally(t);
            }
        });
        try {
            return f.get();
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof Exception ex) {
                throw ex;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw e;
        }
    }
}
