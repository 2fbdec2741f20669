package dockline.solve.charging;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.BuildingGenerator;
import dockline.bench.MissionGenerator;
import dockline.bench.MissionSpec;
import dockline.goal.GoalAutomaton;
import dockline.model.EventDuration;
import dockline.model.Mission;
import dockline.plan.Method;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

/**
 * The charging route stops when its cancellation flag is raised (the window's Cancel), as the product routes
 * do: the pass ({@link FloorSweep}) polls it every few thousand queue pops, the rounds of
 * {@link ChargingSolver#solve} once per round, and the planner hands the plan's flag to the route. A flag
 * never raised changes nothing. The mission is a generated 32 x 32 building with docks (invented, the
 * benchmark's generator).
 */
class ChargingCancelTest {

    private static final Mission M = MissionGenerator.generate(BuildingGenerator.generate(32, 3, 2),
            MissionSpec.docking(1), 3);

    private static FloorSweep.Result pass(ChargingSolver s) {
        return FloorSweep.run(s, M.capacityUnits(), M.reserveUnits(), M.startUnits()).result();
    }

    @Test
    void theFlagIsPolledInThePass_andARaisedFlagStopsIt() {
        Arena arena = ArenaCompiler.compile(M);
        GoalAutomaton goal = GoalAutomaton.of(M);
        AtomicInteger polls = new AtomicInteger();
        FloorSweep.Result free = pass(new ChargingSolver(arena, goal, () -> polls.incrementAndGet() < 0));
        assertThat(polls.get()).as("polls of a whole pass").isGreaterThan(2);
        assertThat(free).isEqualTo(pass(new ChargingSolver(arena, goal)));
        // raised at the second poll: the pass stops there, not at its end
        AtomicInteger asked = new AtomicInteger();
        ChargingSolver late = new ChargingSolver(arena, goal, () -> asked.incrementAndGet() >= 2);
        assertThatThrownBy(() -> pass(late)).isInstanceOf(CancellationException.class);
        assertThat(asked.get()).isEqualTo(2);
    }

    @Test
    void aRaisedFlagStopsTheRounds() {
        ChargingSolver s = new ChargingSolver(ArenaCompiler.compile(M), GoalAutomaton.of(M), () -> true);
        assertThatThrownBy(() -> s.solve(M.capacityUnits() - M.reserveUnits()))
                .isInstanceOf(CancellationException.class);
    }

    @Test
    void thePlannerHandsThePlansFlagToTheChargingRoute() {
        AtomicInteger asked = new AtomicInteger();
        PlanOptions o = PlanOptions.of(Route.Charging.defaults()).withCancelled(() -> asked.incrementAndGet() > 0);
        assertThatThrownBy(() -> MissionPlanner.plan(M, o)).isInstanceOf(CancellationException.class);
        assertThat(asked.get()).isPositive();
        // the same plan with a flag never raised is the charging route's, as before
        AtomicInteger never = new AtomicInteger();
        assertThat(MissionPlanner.plan(M, PlanOptions.of(Route.Charging.defaults())
                .withCancelled(() -> never.incrementAndGet() < 0)).method()).isEqualTo(Method.CHARGING);
        assertThat(never.get()).as("asked during the pass").isPositive();
    }

    /**
     * With its door-shut events lasting the mission is planned phase by phase (plan.LastingPhases), with the
     * margins too; both poll the plan's flag in every pass.
     */
    @Test
    void thePhasesOfALastingMissionPollThePlansFlag() {
        Mission lasting = M.withDoorsAndBlockages(EventDuration.REST_OF_MISSION);
        for (Route r : new Route[] {Route.Charging.defaults(), new Route.Margins()}) {
            AtomicInteger asked = new AtomicInteger();
            PlanOptions o = PlanOptions.of(r).withCancelled(() -> asked.incrementAndGet() > 0);
            assertThatThrownBy(() -> MissionPlanner.plan(lasting, o)).as("%s", r)
                    .isInstanceOf(CancellationException.class);
            assertThat(asked.get()).as("%s", r).isPositive();
        }
        Plan p = MissionPlanner.plan(lasting, PlanOptions.of(Route.Charging.defaults()));
        assertThat(p.notes()).anyMatch(n -> n.startsWith("lasting closures phase by phase"));
    }
}
