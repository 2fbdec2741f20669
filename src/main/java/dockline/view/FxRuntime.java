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

    /**
     * The JUL logger JavaFX's start-up warns through. Held here so that its filter is not lost when
     * the logging framework drops an unreferenced logger.
     */
    private static final java.util.logging.Logger FX_LOG = java.util.logging.Logger.getLogger("javafx");

    /** The start of the one warning {@link #quietUnnamedModuleWarning()} drops. */
    static final String UNNAMED_MODULE_WARNING = "Unsupported JavaFX configuration";

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
        quietUnnamedModuleWarning();
        try {
            Platform.startup(() -> { });
        } catch (IllegalStateException alreadyRunning) {
            // started elsewhere (a test harness or an Application launch): use it as it is
        }
        Platform.setImplicitExit(false);
        started = true;
    }

    /**
     * Drops JavaFX's "Unsupported JavaFX configuration: classes were loaded from 'unnamed module'"
     * warning, and only that one. Its cause: dockline ships as one runnable jar on the class path, so
     * the JavaFX classes load into the unnamed module instead of the named modules
     * {@code javafx.graphics} and friends, and {@code PlatformImpl.startup} warns about every such
     * start. The fix at the cause, a module path with the JavaFX jars, cannot be had from a single
     * {@code java -jar} file; the class-path set-up is the one this project builds and tests (its
     * renderer and window run on it, see DEVELOPERS.md), so the warning tells the user nothing they can
     * act on. Every other JavaFX message still goes through.
     */
    static void quietUnnamedModuleWarning() {
        java.util.logging.Filter previous = FX_LOG.getFilter();
        if (previous instanceof UnnamedModuleFilter) {
            return;
        }
        FX_LOG.setFilter(new UnnamedModuleFilter(previous));
    }

    /** Rejects the unnamed-module warning; passes everything else on to the filter that was there. */
    private record UnnamedModuleFilter(java.util.logging.Filter previous) implements java.util.logging.Filter {
        @Override
        public boolean isLoggable(java.util.logging.LogRecord r) {
            String msg = r.getMessage();
            if (msg != null && msg.startsWith(UNNAMED_MODULE_WARNING)) {
                return false;
            }
            return previous == null || previous.isLoggable(r);
        }
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
