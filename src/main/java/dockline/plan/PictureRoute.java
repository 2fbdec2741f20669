package dockline.plan;

import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.solve.charging.ChargingSolver;
import dockline.solve.charging.NeedBounds;
import dockline.util.Progress;
import java.util.function.BooleanSupplier;

/**
 * The route of the pictures ({@code render}, the window, the report's pictures) of a one-trip mission: the verdict,
 * the safest policy, its replays and a heat map. The policy and the replays are those of the route {@code export}
 * writes its policy from ({@link Route.Charging#exportedPolicy}), so the run a picture shows is a run of the very
 * policy in the exported file (among equally safe moves the product game may choose others).
 *
 * <p>The heat map comes from the charging route's {@link NeedBounds}: exact on an arena that leaves no closure
 * phase out (the figure of {@code dockline.solve.reserve.ChargeNeeded}, the product game's heat map). On a mission
 * with lasting closures the policy is found on the kept closure phases only; while the whole closure arena has at
 * most {@link #MAX_WHOLE_ROBOT_VERTICES} robot vertices the heat map is then computed on the whole arena all the
 * same (exact, one more pass without battery levels), above that on the kept phases (exact where its two bounds
 * agree, a range elsewhere): on the 64² lasting reserve instance of the benchmark, 3.08 M robot vertices, the
 * product game on the whole arena took about 197 s.
 *
 * <p>Cost: O(cells + disturbance states up to the threshold's share) to choose.
 */
public final class PictureRoute {

    /**
     * Robot vertices of the whole closure arena (free cells × disturbance states) up to which the heat map is
     * computed on the whole arena. Measured on the shared machine (DEVELOPERS.md, "Lasting doors", the pictures):
     * every bundled demo is below it (the largest, late-return, 18,048), and the 32² lasting reserve instance of the
     * benchmark (61,938) is above it.
     */
    public static final long MAX_WHOLE_ROBOT_VERTICES = 50_000;

    private PictureRoute() {
    }

    /**
     * The route of a picture of a one-trip mission: the exported policy's, with replays and heat bounds.
     *
     * @throws IllegalArgumentException for a patrol or a deadline mission (pictured through {@link RoundsPlan})
     */
    public static Route of(Mission mission) {
        if (mission.beyondOneTrip()) {
            throw new IllegalArgumentException("a patrol or a deadline mission is pictured through its rounds plan");
        }
        return Route.Charging.exportedPolicy(true, true);
    }

    /**
     * Whether the heat map of the mission's picture is drawn from the kept closure phases (bounds) rather than the
     * whole arena: the mission has a lasting rule with a budget and its whole arena has more than
     * {@link #MAX_WHOLE_ROBOT_VERTICES} robot vertices.
     */
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

    /**
     * The plan with the heat bounds when the route asks for them ({@link NeedBounds}: its cost): on the solver's
     * arena, or, when the route says {@link Route.Charging#wholeHeat}, on the whole closure arena when the solver's
     * leaves phases out and the whole one is small ({@link #phased}), so that the heat map is exact there. The plan's
     * policy and replays are not touched.
     */
    static Plan withBounds(Route.Charging route, ChargingSolver solver, BooleanSupplier cancelled, Plan plan) {
        if (!route.heatBounds()) {
            return plan;
        }
        Progress.stage(75, "the charge needed on every cell");
        Mission m = plan.mission();
        ChargingSolver heat = solver;
        if (route.wholeHeat() && NeedBounds.leavesOut(solver.arena()) && !phased(m)) {
            heat = new ChargingSolver(ArenaCompiler.compile(m), GoalAutomaton.of(m), cancelled);
        }
        return plan.withHeatBounds(NeedBounds.of(heat, m.capacityUnits(), m.reserveUnits()));
    }
}
