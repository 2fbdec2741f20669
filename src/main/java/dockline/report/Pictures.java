package dockline.report;

import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import java.io.IOException;

/**
 * Draws the map pictures of a report as PNG bytes. The report package draws no map itself: a front end
 * hands in the drawing code it already uses for {@code dockline render} (the view's picture renderer),
 * so that this package depends on neither the command line nor the view.
 */
public interface Pictures {

    /**
     * The map with the worst-case run (or the counterexample) of a one-trip mission.
     *
     * @param plan a plan with replays and a heat map: the plan of the route the exported policy comes from, with
     *             its heat bounds ({@code dockline.plan.PictureRoute})
     */
    byte[] oneTrip(Plan plan) throws IOException;

    /**
     * The map with a given run, for patrols and deadline missions.
     *
     * @param mission    the mission
     * @param run        the run to draw (the patrol's lasso or the slowest play of a deadline mission)
     * @param guaranteed the verdict
     * @param headline   the verdict in words, drawn above the map
     */
    byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) throws IOException;
}
