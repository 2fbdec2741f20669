package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.margin.Suggestions;
import dockline.model.Mission;
import dockline.plan.Method;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import dockline.solve.ProductOptions;
import dockline.solve.fast.FastPath;
import dockline.solve.fast.MinChargeSolver;
import java.util.Optional;
import java.util.OptionalInt;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The fast path (no charging before the end) on a mission with lasting closures, decided phase by phase by
 * {@code MissionPlanner} (the strengthened minimum-charge search on the kept closure phases, refined until its
 * policy's plays meet no left-out closure), on random tiny maps with lasting and momentary doors and blockages,
 * at-most limits, slips, drags and budgets 0-3 ({@link LastingMissions}), against:
 * <ul>
 *   <li>{@link LastingBruteForce}, the separately written explicit-state oracle (own move generation, closure
 *       sets in its states, no arena compiler, goal automaton or solver): the verdict, the highest guaranteed
 *       floor and the lowest starting charge (floor + the start's need; the oracle's by bisection over the
 *       start);</li>
 *   <li>the fast path on the whole arena (every closure phase compiled): verdict, need, highest floor, worst
 *       level, and the suggestions of the product game's bisections ({@code Suggestions.find} on the whole
 *       mission, its probes decided by the product route);</li>
 *   <li>the independent certificate checker on the whole arena: the plan's policy of a guaranteed mission plays
 *       every disturbance of the mission with its worst level the highest floor.</li>
 * </ul>
 * A mission whose robot can charge before the end on the whole arena must not be taken by the fast path.
 */
class LastingFastPlanProperties {

    @Property(tries = 1000)
    void phasedFastPlan_matchesTheBruteForce_andTheWholeArena(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        Optional<FastPath.Analysis> whole = FastPath.analyse(m, FastPath.DEFAULT_MAX_POLICY_ROWS, false);
        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Auto(PolicyChoice.SAFEST)));
        Statistics.label("the fast path applies").collect(whole.isPresent());
        Statistics.label("the fast path applies").coverage(c -> c.check(true).percentage(q -> q >= 40));
        if (whole.isEmpty()) {
            // a charge before the end on the whole arena: the automatic route must not take the fast path
            assertThat(p.method()).as("not the fast path\n%s", why).isNotEqualTo(Method.FAST);
            return;
        }
        FastPath.Analysis w = whole.get();
        int floor = m.reserveUnits();
        int start = m.startUnits();
        int highest = new LastingBruteForce(m).highestFloor();
        boolean guaranteed = start >= floor && highest >= floor;
        OptionalInt oracleHighest = highest >= 0 ? OptionalInt.of(highest) : OptionalInt.empty();

        assertThat(p.method()).as("the fast path\n%s", why).isEqualTo(Method.FAST);
        FastPath.Analysis a = ((Plan.Detail.Fast) p.detail()).analysis();
        assertThat(p.guaranteed()).as("verdict against the brute force\n%s", why).isEqualTo(guaranteed);
        assertThat(p.highestFloorUnits()).as("highest floor against the brute force\n%s", why).isEqualTo(oracleHighest);
        assertThat(lowestStart(m, a)).as("lowest start against the brute force\n%s", why)
                .isEqualTo(LastingChargingPlanProperties.lowestStart(m));
        assertThat(w.guaranteed()).as("whole arena verdict\n%s", why).isEqualTo(guaranteed);
        assertThat(a.startNeedUnits()).as("need against the whole arena\n%s", why).isEqualTo(w.startNeedUnits());
        assertThat(p.highestFloorUnits()).as("highest floor against the whole arena\n%s", why)
                .isEqualTo(w.highestGuaranteedReserveUnits());
        assertThat(p.lowestLevelUnits()).as("worst level against the whole arena\n%s", why)
                .isEqualTo(w.worstCaseMinimumUnits());

        if (guaranteed) {
            assertThat(p.certification().ok()).as("certified\n%s", why).isTrue();
            Certificate c = CertificateChecker.check(ArenaCompiler.compile(m), p.policy().orElseThrow(), floor, start);
            assertThat(c.ok()).as("policy on the whole arena: %s\n%s", c.reason(), why).isTrue();
            assertThat(c.worstMinimumUnits()).as("worst level on the whole arena\n%s", why).isEqualTo(highest);
        } else {
            assertThat(p.suggestions()).as("suggestions against the product game's bisections\n%s", why)
                    .isEqualTo(Suggestions.find(m, ProductOptions.defaults(), oracleHighest.isPresent()
                            ? oracleHighest : OptionalInt.of(-1)));
        }
        // the fast route and the verdict alone take the same phases
        Plan f = MissionPlanner.plan(m, PlanOptions.of(Route.Fast.defaults()));
        assertThat(f.highestFloorUnits()).as("the fast route\n%s", why).isEqualTo(oracleHighest);
        Plan v = MissionPlanner.plan(m, PlanOptions.of(new Route.VerdictOnly(Route.VerdictOnly.Where.FAST)));
        assertThat(v.guaranteed()).as("the verdict alone\n%s", why).isEqualTo(guaranteed);

        boolean phased = LastingMissions.phaseStatistics(m, p.notes(), guaranteed, why);
        assertThat(LastingMissions.PHASES.matcher(String.join("\n", v.notes())).find()).as("the verdict phase by phase\n%s", why)
                .isEqualTo(phased);
    }

    /**
     * The two minimum-charge passes on the base phase only (nothing closed), against {@link LastingBruteForce}:
     * the strengthened pass (a left-out closure not the building's) needs at most what the mission needs, so its
     * highest floor is an upper bound, and the weakened one (a left-out closure lost) at least, a lower bound.
     */
    @Property(tries = 500)
    void strengthenedAndWeakenedNeedsBoundTheMission(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        DisturbanceStates st = ArenaCompiler.states(m);
        boolean[] keep = LastingMissions.basePhase(st);
        Arena a = ArenaCompiler.compileWithin(m, st, keep);
        GoalAutomaton goal = GoalAutomaton.of(m);
        boolean applies = MinChargeSolver.applicable(a, goal);
        Statistics.label("the fast path applies").collect(applies);
        Statistics.label("the fast path applies").coverage(c -> c.check(true).percentage(q -> q >= 40));
        if (!applies) {
            return;
        }
        int highest = new LastingBruteForce(m).highestFloor();
        int s = m.startUnits();
        int strong = highestOf(new MinChargeSolver(a, goal, true).solveStart().result().startNeed(), s);
        int weak = highestOf(new MinChargeSolver(a, goal, false).solveStart().result().startNeed(), s);
        assertThat(strong).as("strengthened highest floor is an upper bound\n%s", why).isGreaterThanOrEqualTo(highest);
        assertThat(weak).as("weakened highest floor is a lower bound\n%s", why).isLessThanOrEqualTo(highest);
        Statistics.label("some phase left out").collect(LastingMissions.leavesOut(keep));
        Statistics.label("the passes differ").collect(strong != weak);
        Statistics.label("the passes differ").coverage(c -> c.check(true).percentage(q -> q >= 3));
    }

    /** The highest floor from the start's need: start − need when it is at most the start, else -1. */
    private static int highestOf(int need, int start) {
        return need != MinChargeSolver.INFINITE && need <= start ? start - need : -1;
    }

    /** The lowest start the fast path's need gives: floor + need when within the capacity. */
    private static OptionalInt lowestStart(Mission m, FastPath.Analysis a) {
        long need = a.startNeedUnits();
        long lowest = m.reserveUnits() + need;
        return need != MinChargeSolver.INFINITE && lowest <= m.capacityUnits() ? OptionalInt.of((int) lowest)
                : OptionalInt.empty();
    }
}
