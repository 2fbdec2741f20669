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
 */
public record Tasks(List<String> visit, boolean ordered, List<String> avoid, boolean finishOnDock) {

    public Tasks {
        visit = List.copyOf(visit);
        avoid = List.copyOf(avoid);
    }

    public static Tasks justDock() {
        return new Tasks(List.of(), true, List.of(), true);
    }
}
