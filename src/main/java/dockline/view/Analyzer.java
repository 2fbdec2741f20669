package dockline.view;

import dockline.model.Mission;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * Solves a mission for the view. The window runs it in a background {@link SolveTask}; the
 * implementation must poll {@code cancelled} often and then stop by throwing
 * {@link CancellationException}.
 */
@FunctionalInterface
public interface Analyzer {

    /**
     * Solves the mission.
     *
     * @throws CancellationException    when {@code cancelled} turned true
     * @throws IllegalArgumentException when the mission cannot be solved as given (message for the user)
     */
    ViewData analyze(Mission mission, BooleanSupplier cancelled);

    /** How far a solve has got: a per cent of its stages and the stage now running, in words. */
    @FunctionalInterface
    interface Progress {
        void reached(int percent, String stage);
    }

    /**
     * Solves the mission and tells {@code progress} how far it has got (from the solving thread).
     * By default the progress is not told.
     */
    default ViewData analyze(Mission mission, BooleanSupplier cancelled, Progress progress) {
        return analyze(mission, cancelled);
    }
}
