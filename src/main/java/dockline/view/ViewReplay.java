package dockline.view;

import java.util.List;
import java.util.Objects;

/**
 * A run of the mission the view can play: the worst case under the policy, a counterexample when
 * the mission is not guaranteed, or a scenario the user forced.
 *
 * @param kind  which kind of run this is
 * @param title a name for the chooser, e.g. {@code worst case (lowest battery 7.2 Wh)}
 * @param steps the steps, step 0 first; never empty
 * @param notes plain-words lines on what happened and why (may be empty)
 * @param loopStart for a patrol's lasso, the first step of the lap that repeats for ever (the step
 *              after the last is this one again); -1 for a run that ends
 */
public record ViewReplay(Kind kind, String title, List<ViewStep> steps, List<String> notes, int loopStart) {

    /** Where a replay comes from. */
    public enum Kind {
        WORST_CASE("worst case"),
        COUNTEREXAMPLE("counterexample"),
        NOMINAL("run with no disturbance"),
        FORCED("forced scenario"),
        LASSO("patrol: way in, then the lap for ever");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    public ViewReplay {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(title, "title");
        steps = List.copyOf(steps);
        notes = notes == null ? List.of() : List.copyOf(notes);
        if (steps.isEmpty()) {
            throw new IllegalArgumentException("a replay has at least its start step");
        }
        if (loopStart < -1 || loopStart >= steps.size()) {
            throw new IllegalArgumentException("the loop must start at one of the run's steps");
        }
    }

    /** A run that ends. */
    public ViewReplay(Kind kind, String title, List<ViewStep> steps, List<String> notes) {
        this(kind, title, steps, notes, -1);
    }

    public ViewReplay(Kind kind, String title, List<ViewStep> steps) {
        this(kind, title, steps, List.of());
    }

    /** Whether the run ends in a lap that repeats for ever. */
    public boolean loops() {
        return loopStart >= 0;
    }

    /** The lowest battery level over the run, in units. */
    public int minimumUnits() {
        int min = Integer.MAX_VALUE;
        for (ViewStep s : steps) {
            min = Math.min(min, s.levelUnits());
        }
        return min;
    }

    /** Number of actions (steps after the start). */
    public int length() {
        return steps.size() - 1;
    }

    @Override
    public String toString() {
        return title;
    }
}
