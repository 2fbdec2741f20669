package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.replay.Replay;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import dockline.solve.charging.FloorSweep;
import java.util.OptionalInt;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The charging route's plan of a mission with lasting closures, decided phase by phase by
 * {@code MissionPlanner} (weakened and strengthened passes on the kept closure phases, refined until they
 * agree), on random tiny maps with lasting and momentary doors and blockages, at-most limits, slips, drags and
 * budgets 0-3 ({@link LastingMissions}), against:
 * <ul>
 *   <li>{@link LastingBruteForce}, the separately written explicit-state oracle (own move generation, closure
 *       sets in its states, no arena compiler, goal automaton or solver): the verdict, the highest guaranteed
 *       floor and the lowest starting charge (the least start the oracle guarantees, found by bisection over
 *       the start, winning being upward closed in it);</li>
 *   <li>the charging route on the whole arena (every closure phase compiled): the same three figures;</li>
 *   <li>the independent certificate checker on the whole arena: the plan's threshold policy of a guaranteed
 *       mission plays every disturbance of the mission with its worst level the highest floor;</li>
 *   <li>for a mission that is not guaranteed, the counterexample ends in a loss and every step of it is a real
 *       move of the building (no outcome into a phase the restricted arena left out, whose energy change is
 *       {@link ArenaCompiler#LEFT_OUT}).</li>
 * </ul>
 */
class LastingChargingPlanProperties {

    @Property(tries = 1000)
    void phasedChargingPlan_matchesTheBruteForce_andTheWholeArena(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        int floor = m.reserveUnits();
        int highest = new LastingBruteForce(m).highestFloor();
        boolean guaranteed = m.startUnits() >= floor && highest >= floor;

        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Charging(true, false, true)));
        ChargingRoute.Analysis whole = ChargingRoute.analyse(m);
        OptionalInt oracleHighest = highest >= 0 ? OptionalInt.of(highest) : OptionalInt.empty();
        OptionalInt oracleLowest = lowestStart(m);

        assertThat(p.guaranteed()).as("verdict against the brute force\n%s", why).isEqualTo(guaranteed);
        assertThat(p.highestFloorUnits()).as("highest floor against the brute force\n%s", why).isEqualTo(oracleHighest);
        assertThat(p.lowestStartUnits()).as("lowest start against the brute force\n%s", why).isEqualTo(oracleLowest);
        assertThat(whole.guaranteed()).as("whole arena verdict\n%s", why).isEqualTo(guaranteed);
        assertThat(whole.highestFloorUnits()).as("whole arena highest floor\n%s", why).isEqualTo(oracleHighest);
        assertThat(whole.lowestStartUnits()).as("whole arena lowest start\n%s", why).isEqualTo(oracleLowest);

        Arena full = ArenaCompiler.compile(m);
        if (guaranteed) {
            assertThat(p.certification().ok()).as("certified\n%s", why).isTrue();
            var thresholds = ((Plan.Detail.Charging) p.detail()).thresholds();
            Certificate c = CertificateChecker.check(full, thresholds, floor, m.startUnits());
            assertThat(c.ok()).as("threshold policy on the whole arena: %s\n%s", c.reason(), why).isTrue();
            assertThat(c.worstMinimumUnits()).as("worst level on the whole arena\n%s", why).isEqualTo(highest);
        } else {
            Replay cx = p.replays().orElseThrow().worstCase();
            assertThat(cx.ending()).as("the counterexample ends in a loss\n%s", why)
                    .isNotEqualTo(Replay.Ending.COMPLETE);
            // a step into a left-out phase would show a drop of about 2^29 units, which no real move has
            assertThat(cx.minimumUnits()).as("every step of the counterexample is a real move\n%s", why)
                    .isGreaterThan(-10 * m.capacityUnits() - 100);
        }

        LastingMissions.phaseStatistics(m, p.notes(), guaranteed, why);
    }

    /**
     * The margins of a mission with lasting closures (the margin command's route, which decides each bisection
     * probe phase by phase on the product game and takes the minimum-credit figures from the charging route
     * phase by phase): both ways agree, and equal {@link LastingBruteForce}'s highest floor and lowest start
     * (the separately written oracle; the lowest start by bisection over the start, as above).
     */
    @Property(tries = 300)
    void phasedMargins_matchTheBruteForce(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        int highest = new LastingBruteForce(m).highestFloor();
        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Margins()));
        var r = ((Plan.Detail.Margins) p.detail()).report();
        assertThat(r.agree()).as("the two ways agree\n%s", why).isTrue();
        assertThat(p.highestFloorUnits()).as("highest floor against the brute force\n%s", why)
                .isEqualTo(highest >= 0 ? OptionalInt.of(highest) : OptionalInt.empty());
        assertThat(p.lowestStartUnits()).as("lowest start against the brute force\n%s", why).isEqualTo(lowestStart(m));
        boolean phased = LastingMissions.PHASES.matcher(String.join("\n", p.notes())).find();
        assertThat(phased).as("phase by phase\n%s", why).isEqualTo(ArenaCompiler.states(m).itemCount() > 0
                && m.reserveUnits() <= m.capacityUnits());
        Statistics.label("phase by phase").collect(phased);
        Statistics.label("phase by phase").coverage(c -> c.check(true).percentage(q -> q >= 30));
    }

    /**
     * The two passes of one round on their own, on the base phase only (nothing closed), against
     * {@link LastingBruteForce}: the strengthened pass's highest floor (a left-out closure not the building's) is
     * at least the mission's and the weakened one's (a left-out closure lost) at most; the weakened pass cut short
     * below a target floor ({@code FloorSweep.runReaching}) answers exactly when the full pass reaches it, with
     * the same figures.
     */
    @Property(tries = 500)
    void strengthenedAndWeakenedPassesBoundTheMission(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        int highest = new LastingBruteForce(m).highestFloor();
        DisturbanceStates st = ArenaCompiler.states(m);
        boolean[] keep = LastingMissions.basePhase(st);
        boolean partial = LastingMissions.leavesOut(keep);
        ChargingSolver solver = new ChargingSolver(ArenaCompiler.compileWithin(m, st, keep), GoalAutomaton.of(m));
        int cap = m.capacityUnits();
        int floor = m.reserveUnits();
        int start = m.startUnits();
        ChargingRoute.Analysis weak = ChargingRoute.analyse(solver, cap, floor, start, false);
        ChargingRoute.Analysis strong = ChargingRoute.analyse(solver, cap, floor, start, true);
        int hw = weak.highestFloorUnits().orElse(-1);
        int hs = strong.highestFloorUnits().orElse(-1);
        assertThat(hs).as("strengthened highest floor is an upper bound\n%s", why).isGreaterThanOrEqualTo(highest);
        assertThat(hw).as("weakened highest floor is a lower bound\n%s", why).isLessThanOrEqualTo(highest);
        for (int target : new int[] {0, Math.max(0, hw), hw + 1, Math.max(0, hs)}) {
            var cut = FloorSweep.runReaching(solver, cap, floor, start, target);
            assertThat(cut.isPresent()).as("cut short at %d\n%s", target, why).isEqualTo(hw >= target);
            if (cut.isPresent()) {
                assertThat(cut.get().result().highestFloorUnits()).isEqualTo(weak.highestFloorUnits());
                assertThat(cut.get().result().startNeed()).isEqualTo(weak.startNeed());
            }
        }
        Statistics.label("some phase left out").collect(partial);
        Statistics.label("the passes differ").collect(hw != hs);
        Statistics.label("the passes differ").coverage(c -> c.check(true).percentage(q -> q >= 5));
    }

    /**
     * The least starting charge from which the brute force guarantees the mission at its floor (winning is
     * upward closed in the start: a higher level dominates), or empty when even a full battery is not enough.
     * Shared with HeatBoundsProperties and the fast path's properties.
     */
    static OptionalInt lowestStart(Mission m) {
        int floor = m.reserveUnits();
        int cap = m.capacityUnits();
        if (!winsFrom(m, cap)) {
            return OptionalInt.empty();
        }
        int lo = floor - 1; // loses (below the floor)
        int hi = cap; // wins
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (winsFrom(m, mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return OptionalInt.of(hi);
    }

    private static boolean winsFrom(Mission m, int startUnits) {
        Mission s = m.withStartCharge(Charge.wh(m.scale().toWh(startUnits)));
        assertThat(s.startUnits()).as("start charge round trip").isEqualTo(startUnits);
        return startUnits >= s.reserveUnits() && new LastingBruteForce(s).highestFloor() >= s.reserveUnits();
    }
}
