package dockline.util;

/**
 * Where the core reports progress: a {@link ProgressListener} in force for the current thread
 * ({@link #listen}, for the length of a try-with-resources block), the stages of a job
 * ({@link #stage}: the planner's steps), and a {@link Tracker} per phase of work, which turns "done of
 * total" into whole per cents and tells the listener only when the per cent rises. With no listener
 * every tracker is {@link Tracker#NONE}, whose calls do nothing, so work that nobody watches pays one
 * field test per report. Hot loops report every few thousand steps ({@link #EVERY}), never per element.
 *
 * <p>A listener per thread rather than a parameter on every solver, because the same planner and
 * solvers run under the command line (which prints progress), the window (which shows it) and the tests
 * (which mostly do not), and a phase deep in a route (one solve of the highest-floor search) need not
 * know who asked.
 */
public final class Progress {

    /** Report once every this many steps of a hot loop ({@code (i & (EVERY - 1)) == 0}). */
    public static final int EVERY = 1 << 14;

    private static final ThreadLocal<ProgressListener> LISTENER = new ThreadLocal<>();

    private Progress() {
    }

    /** The listener for this thread until the returned scope is closed (the one before is restored then). */
    public static Scope listen(ProgressListener listener) {
        ProgressListener before = LISTENER.get();
        if (listener == null) {
            LISTENER.remove();
        } else {
            LISTENER.set(listener);
        }
        return new Scope(before);
    }

    /** Tells this thread's listener, if any, that a stage of its job begins ({@link ProgressListener#stage}). */
    public static void stage(int percent, String stage) {
        ProgressListener l = LISTENER.get();
        if (l != null) {
            l.stage(percent, stage);
        }
    }

    /**
     * Begins a phase of {@code total} steps (at least 1 is assumed): the listener hears 0 per cent now.
     * Returns {@link Tracker#NONE} when nobody listens on this thread.
     */
    public static Tracker phase(String name, long total) {
        ProgressListener l = LISTENER.get();
        if (l == null) {
            return Tracker.NONE;
        }
        l.phase(name, 0);
        return new Tracker(l, name, Math.max(1, total));
    }

    /** Restores the listener that was in force before {@link #listen}. */
    public static final class Scope implements AutoCloseable {
        private final ProgressListener before;

        private Scope(ProgressListener before) {
            this.before = before;
        }

        @Override
        public void close() {
            if (before == null) {
                LISTENER.remove();
            } else {
                LISTENER.set(before);
            }
        }
    }

    /** One phase: reports whole per cents, rising only, of {@code done / total}. */
    public static final class Tracker {

        /** Nobody listens: every call returns at once. */
        public static final Tracker NONE = new Tracker(null, "", 1);

        private final ProgressListener listener;
        private final String phase;
        private final long total;
        private int last;

        private Tracker(ProgressListener listener, String phase, long total) {
            this.listener = listener;
            this.phase = phase;
            this.total = total;
        }

        /** {@code done} of the phase's total steps are done (more than the total counts as 99 %). */
        public void at(long done) {
            if (listener == null) {
                return;
            }
            long d = Math.max(0, Math.min(done, total));
            // d * 100 could overflow for totals near Long.MAX_VALUE; dividing first keeps it exact enough
            int p = (int) (total > Long.MAX_VALUE / 100 ? d / (total / 100) : d * 100 / total);
            report(Math.min(p, 99));
        }

        /** The phase is complete: 100 %. */
        public void done() {
            if (listener != null) {
                report(100);
            }
        }

        private void report(int p) {
            if (p > last) {
                last = p;
                listener.phase(phase, p);
            }
        }
    }
}
