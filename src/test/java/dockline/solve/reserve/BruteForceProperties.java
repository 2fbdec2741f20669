package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.BruteForceMinimax;
import dockline.solve.PolicyWalk;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import dockline.solve.SolutionChecks;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * Both routes of {@link ReserveSolver#analyse} (the default implicit product and the stored CSR
 * product) against the brute-force depth-bounded minimax of {@link BruteForceMinimax} (independent
 * oracle, its depth bound justified there) on random tiny missions: at most 8 cells, budget at most 2,
 * capacity at most 12 units, random events and tasks.
 */
class BruteForceProperties {

    @Property(tries = 1000)
    void verdictAndHighestReserve_matchBruteForceMinimax_implicitRoute(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        check(m, ReserveSolver.analyse(m, ReserveOptions.defaults()));
    }

    @Property(tries = 1000)
    void verdictAndHighestReserve_matchBruteForceMinimax_storedRoute(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT));
        check(m, a);
        SolutionChecks.assertValidSolution(a.game(), a.solution(),
                new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()));
    }

    private static void check(Mission m, ReserveAnalysis a) {
        BruteForceMinimax oracle = new BruteForceMinimax(m);
        String why = RandomMissions.describe(m);

        assertThat(a.guaranteed()).as("verdict\n%s", why).isEqualTo(oracle.wins(m.reserveUnits()));
        int highest = oracle.highestFloor();
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as("highest reserve\n%s", why).isEqualTo(highest);
        assertThat(a.highestReserveSearched()).isTrue();
        if (a.guaranteed()) {
            // the policy keeps the battery at or above its worst case, which no policy can beat the optimum on
            assertThat(a.worstCaseMinimumUnits().getAsInt()).as("worst case\n%s", why)
                    .isBetween(a.reserveUnits(), highest);
        } else {
            assertThat(a.worstCaseMinimumUnits()).isEmpty();
        }
        if (a.guaranteed()) {
            // the exported policy, run against every disturbance choice by an independent walk
            PolicyWalk.Result walk = new PolicyWalk(m, a.arena(), a.policy().orElseThrow()).run();
            assertThat(walk.lowestLevel()).as("worst case by walking the policy\n%s", why)
                    .isEqualTo(a.worstCaseMinimumUnits().getAsInt());
            assertThat(a.policy().orElseThrow().entries().stream().map(PolicyWalk::key))
                    .as("policy rows are exactly the situations the robot can meet").containsExactlyInAnyOrderElementsOf(walk.situations());
        }
    }

    @Property(tries = 500)
    void safestPolicy_keepsTheHighestFloor(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withSafestPolicy(true)
                .withHighestReserve(false).withRoute(ReserveOptions.Route.PRODUCT));
        if (!a.guaranteed()) {
            return;
        }
        int highest = new BruteForceMinimax(m).highestFloor();
        String why = RandomMissions.describe(m);
        assertThat(a.worstCaseMinimumUnits().getAsInt()).as(why).isEqualTo(highest);
        assertThat(a.policyFloorUnits()).as(why).isIn(m.reserveUnits(), highest);
        PolicyWalk.Result walk = new PolicyWalk(m, a.arena(), a.policy().orElseThrow()).run();
        assertThat(walk.lowestLevel()).as(why).isEqualTo(highest);
        SolutionChecks.assertValidSolution(a.game(), a.solution(),
                new ReserveMonitor(a.policyFloorUnits(), m.capacityUnits(), m.startUnits()));
    }

    @Property(tries = 500)
    void verdictAtEveryFloor_matchesBruteForceMinimax(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        BruteForceMinimax oracle = new BruteForceMinimax(m);
        var arena = ArenaCompiler.compile(m);
        var goal = GoalAutomaton.of(m);
        for (int floor = 0; floor <= m.capacityUnits(); floor++) {
            ReserveMonitor monitor = new ReserveMonitor(floor, m.capacityUnits(), m.startUnits());
            ProductGame game = ProductGame.fromStart(arena, goal, monitor, ProductOptions.defaults());
            Solution s = new AttractorSolver(game.graph()).solve();
            SolutionChecks.assertValidSolution(game, s, monitor);
            assertThat(s.winning(game.start())).as("floor %d\n%s", floor, RandomMissions.describe(m))
                    .isEqualTo(oracle.wins(floor));
        }
    }
}
