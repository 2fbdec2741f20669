package dockline.solve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.plan.Certification;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The core entry point ({@link MissionPlanner#plan}) on random tiny missions, against the brute-force
 * depth-bounded minimax of {@link BruteForceMinimax} (independent oracle: it shares no code with the
 * arena compiler's product, the goal automaton or the solvers) and an independent walk of the exported
 * policy ({@link PolicyWalk}): the verdict, the highest guaranteed floor, and that the default (safest)
 * policy's worst case is exactly that floor, whichever route the plan takes (fast path or product).
 * Lives beside the oracles it uses.
 */
class MissionPlannerProperties {

    @Property(tries = 1000)
    void defaultPlan_matchesBruteForce_andItsWorstCaseIsTheHighestFloor(@ForAll long seed,
                                                                        @ForAll PolicyChoice choice) {
        Mission m = RandomMissions.tiny(seed);
        String why = RandomMissions.describe(m);
        BruteForceMinimax oracle = new BruteForceMinimax(m);
        int highest = oracle.highestFloor();
        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Auto(choice)));
        Statistics.collect(p.method().word(), choice, p.guaranteed() ? "guaranteed" : "not guaranteed");
        // every route and both policies must have been taken on guaranteed missions (the safest policy of a
        // mission with charging comes from the charging route, the policy of fewest moves from the product route)
        Statistics.coverage(c -> {
            for (PolicyChoice pc : PolicyChoice.values()) {
                c.check("fast", pc, "guaranteed").count(n -> n >= 3);
            }
            c.check("charging", PolicyChoice.SAFEST, "guaranteed").count(n -> n >= 3);
            c.check("product", PolicyChoice.FEWEST_MOVES, "guaranteed").count(n -> n >= 3);
        });
        assertThat(p.guaranteed()).as("verdict\n%s", why).isEqualTo(oracle.wins(m.reserveUnits()));
        assertThat(p.highestFloorUnits().orElse(-1)).as("highest floor\n%s", why).isEqualTo(highest);
        if (!p.guaranteed()) {
            assertThat(p.policy()).isEmpty();
            return;
        }
        assertThat(p.certification()).isInstanceOf(Certification.Reserve.class);
        assertThat(p.certification().ok()).as(why).isTrue();
        int lowest = p.lowestLevelUnits().getAsInt();
        if (choice == PolicyChoice.SAFEST || p.method().word().equals("fast")) {
            assertThat(lowest).as("the safest policy's worst case\n%s", why).isEqualTo(highest);
        } else {
            assertThat(lowest).as("worst case\n%s", why).isBetween(m.reserveUnits(), highest);
        }
        PolicyWalk.Result walk = new PolicyWalk(m, arena(p), p.policy().orElseThrow()).run();
        assertThat(walk.lowestLevel()).as("worst case by walking the policy\n%s", why).isEqualTo(lowest);
    }

    /** The stored reference route gives the same verdict, highest floor and safest worst case as the default. */
    @Property(tries = 200)
    void storedRoute_agreesWithTheDefault(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Plan auto = MissionPlanner.plan(m, PlanOptions.of(new Route.Product(PolicyChoice.SAFEST, true, false, false,
                false)));
        Plan stored = MissionPlanner.plan(m, PlanOptions.of(new Route.Stored(PolicyChoice.SAFEST, null)));
        Statistics.collect(auto.guaranteed() ? "guaranteed" : "not guaranteed");
        assertThat(stored.verdict()).isEqualTo(auto.verdict());
        assertThat(stored.highestFloorUnits()).isEqualTo(auto.highestFloorUnits());
        assertThat(stored.lowestLevelUnits()).isEqualTo(auto.lowestLevelUnits());
    }

    /** The arena the plan's policy is for (the fast path's or the product route's). */
    private static dockline.arena.Arena arena(Plan p) {
        if (p.detail() instanceof Plan.Detail.Fast f) {
            return f.analysis().arena();
        }
        if (p.detail() instanceof Plan.Detail.Charging) {
            return dockline.arena.ArenaCompiler.compile(p.mission());
        }
        return ((Plan.Detail.Product) p.detail()).analysis().arena();
    }
}
