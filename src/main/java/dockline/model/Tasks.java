package dockline.model;

import java.util.List;

/**
 * What the robot must do: visit zones (in the given order, or in any order), never occupy an
 * avoided zone, and (normally) finish on a dock.
 *
 * @param visit        zone names to visit
 * @param ordered      {@code true}: in the order given; {@code false}: in any order
 * @param avoid        zone names never to occupy (even by a slip)
 * @param finishOnDock the mission is complete only on a dock
 * @param patrol       checkpoint zones of a patrol, each to be visited again and again for ever (empty: not a
 *                     patrol; a patrol has nothing to visit once and never finishes)
 */
public record Tasks(List<String> visit, boolean ordered, List<String> avoid, boolean finishOnDock,
                    List<String> patrol) {

    public Tasks {
        visit = List.copyOf(visit);
        avoid = List.copyOf(avoid);
        patrol = List.copyOf(patrol);
        if (!patrol.isEmpty() && !visit.isEmpty()) {
            throw new IllegalArgumentException("a patrol has checkpoints, not zones to visit once");
        }
    }

    /** Tasks of one trip (no patrol). */
    public Tasks(List<String> visit, boolean ordered, List<String> avoid, boolean finishOnDock) {
        this(visit, ordered, avoid, finishOnDock, List.of());
    }

    /** A patrol over the checkpoints, never entering the avoided zones. */
    public static Tasks patrol(List<String> checkpoints, List<String> avoid) {
        return new Tasks(List.of(), false, avoid, false, checkpoints);
    }

    /** Whether these are the rounds of a patrol. */
    public boolean patrols() {
        return !patrol.isEmpty();
    }

    public static Tasks justDock() {
        return new Tasks(List.of(), true, List.of(), true);
    }
}
