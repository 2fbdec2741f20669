package dockline.view;

import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.CountDownLatch;
import javafx.application.Platform;
import javafx.stage.Stage;

/**
 * Opens the desktop window and waits until it is closed. Starts the toolkit with
 * {@code Platform.startup} rather than through an {@code Application} subclass, so the runnable
 * fat jar works from the plain class path (see the JavaFX notes in DEVELOPERS.md).
 */
public final class ViewLauncher {

    /** There is no display to open a window on. */
    public static final class NoDisplayException extends Exception {
        NoDisplayException(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private ViewLauncher() {
    }

    /**
     * Shows the window (with the given mission or map file opened, if not {@code null}) and blocks
     * until the user closes it.
     *
     * @throws NoDisplayException when the toolkit cannot open a display
     */
    public static void show(Path file, Analyzer analyzer, MissionSource source) throws NoDisplayException, InterruptedException {
        Objects.requireNonNull(analyzer, "analyzer");
        Objects.requireNonNull(source, "source");
        try {
            FxRuntime.start();
        } catch (UnsupportedOperationException | IllegalStateException | UnsatisfiedLinkError e) {
            throw new NoDisplayException("cannot open a window (" + e.getMessage() + "); there seems to be no display."
                    + " Use 'dockline render' for a picture without one.", e);
        }
        CountDownLatch closed = new CountDownLatch(1);
        Platform.runLater(() -> {
            try {
                Stage stage = new Stage();
                MissionWindow w = new MissionWindow(analyzer, source, RecentFiles.defaultStore());
                javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getVisualBounds();
                stage.setScene(w.scene(Math.min(1280, screen.getWidth() - 20), Math.min(900, screen.getHeight() - 40)));
                w.attach(stage);
                stage.setOnHidden(e -> {
                    w.dispose();
                    closed.countDown();
                });
                stage.show();
                if (file != null) {
                    w.open(file);
                }
            } catch (RuntimeException e) {
                System.err.println("dockline: could not open the window: " + e.getMessage());
                closed.countDown();
            }
        });
        closed.await();
        Platform.exit();
    }
}
