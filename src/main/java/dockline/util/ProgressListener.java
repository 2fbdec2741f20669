package dockline.util;

/**
 * Receives the progress of long work, the one progress type of the project, at its two grains:
 * <ul>
 * <li>a <b>stage</b> is one of the few named steps of a whole job (a plan: solving, certifying, the
 * replays, the heat map; a report: one mission done), told with the per cent of the job done when it
 * begins (stage boundaries, not time: the stages differ in cost from mission to mission), rising only;</li>
 * <li>a <b>phase</b> is one loop inside the stage now running (building the move graph, solving the game
 * at one floor), told with its own per cent: one report of 0 when it begins, then rising only, at most to
 * 100. A phase's name may come again later (a solve at another floor is a new phase).</li>
 * </ul>
 * Both are called on the thread doing the work (a report's workers: one at a time), so they must be
 * quick (the command line prints at most a few lines a second). A listener that wants only one grain
 * leaves the other method as it is (it does nothing). Jobs on the calling thread tell the listener in
 * force for it ({@link Progress#listen}); a job that spreads over threads takes the listener as a
 * parameter and tells it from its workers.
 */
public interface ProgressListener {

    /** Nobody listens. */
    ProgressListener NONE = new ProgressListener() { };

    /** A stage begins: {@code percent} of the whole job is done, and {@code stage} says what runs now. */
    default void stage(int percent, String stage) {
    }

    /** A phase of the current stage is at {@code percent} of its own steps. */
    default void phase(String phase, int percent) {
    }
}
