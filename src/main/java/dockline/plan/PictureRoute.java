package dockline.plan;

import dockline.arena.ArenaCompiler;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.solve.charging.ChargingSolver;
import dockline.solve.charging.NeedBounds;
import dockline.util.Progress;

/**
 * The route of the pictures ({@code render}, the window, the report's pictures): what they need is the verdict,
 * the safest policy, its replays and a heat map. Today's exact route is the product game on the whole arena
 * ({@link Route.Product} with the heat map, {@code dockline.solve.reserve.ChargeNeeded}); on a mission with lasting
 * closures that arena holds every closure phase, and its product with every battery level is what makes a picture
 * of a large building slow (on the 64² lasting reserve instance of the benchmark, 3.08 M robot vertices, about
 * 197 s). Above {@link #MAX_WHOLE_ROBOT_VERTICES} robot vertices of the whole arena such a mission takes the
 * charging route phase by phase instead ({@link Route.Charging} with replays and heat bounds: {@link LastingPhases},
 * {@link NeedBounds}), whose heat map is exact where its two bounds agree and a range elsewhere.
 *
 * <p>Cost: O(cells + disturbance states up to the threshold's share) to choose.
 */
public final class PictureRoute {

    /**
     * Robot vertices of the whole closure arena (free cells × disturbance states) up to which the exact route is
     * kept. Measured on the shared machine (DEVELOPERS.md, "Lasting doors", the pictures): every bundled demo is
     * below it (the largest, late-return, 18,048: its exact picture takes a few seconds), and the 32² lasting
     * reserve instance of the benchmark (61,938: 7 to 11 s on the exact route, under half a second phase by
     * phase) is above it.
     */
    public static final long MAX_WHOLE_ROBOT_VERTICES = 50_000;

    private PictureRoute() {
    }

    /**
     * The route of a picture of a one-trip mission: {@code exact} (the product route with replays and heat map),
     * or the charging route phase by phase with replays and heat bounds when the mission has a lasting rule with a
     * budget and its whole arena has more than {@link #MAX_WHOLE_ROBOT_VERTICES} robot vertices.
     */
    public static Route of(Mission mission, Route.Product exact) {
        return phased(mission) ? new Route.Charging(true, false, true, true) : exact;
    }

    /** Whether the picture of the mission is drawn from the phase-by-phase route ({@link #of}). */
    public static boolean phased(Mission mission) {
        if (!mission.map().disturbances().anyLasting() || mission.map().disturbances().budget() == 0) {
            return false;
        }
        int free = 0;
        for (int i = 0; i < mission.map().cellCount(); i++) {
            free += mission.map().isFree(Cell.ofIndex(i, mission.map().width())) ? 1 : 0;
        }
        if (free == 0) {
            return false;
        }
        // the states are counted only up to the threshold's share of a cell: more means too many robot vertices
        int maxStates = (int) Math.min(Integer.MAX_VALUE / 2, MAX_WHOLE_ROBOT_VERTICES / free);
        int states = ArenaCompiler.disturbanceStateCount(mission, maxStates);
        return states < 0 || (long) states * free > MAX_WHOLE_ROBOT_VERTICES;
    }

    /** The plan with the heat bounds on the solver's arena when the route asks for them ({@link NeedBounds}: its cost). */
    static Plan withBounds(Route.Charging route, ChargingSolver solver, Plan plan) {
        if (!route.heatBounds()) {
            return plan;
        }
        Progress.stage(75, "the charge needed on every cell");
        Mission m = plan.mission();
        return plan.withHeatBounds(NeedBounds.of(solver, m.capacityUnits(), m.reserveUnits()));
    }
}
