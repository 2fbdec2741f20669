package dockline.view;

import dockline.model.Mission;
import dockline.util.ProgressListener;
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

    /**
     * Solves the mission and tells {@code progress} how far it has got (from the solving thread): the
     * stages with the per cent of the solve, and the solver's phases inside them. By default the progress
     * is not told.
     */
    default ViewData analyze(Mission mission, BooleanSupplier cancelled, ProgressListener progress) {
        return analyze(mission, cancelled);
    }
}
