package dockline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.BruteForce;
import dockline.fixtures.RandomMissions;
import dockline.fixtures.ReplayChecks;
import dockline.model.Mission;
import dockline.replay.Replay;
import dockline.replay.ReplayStep;
import dockline.solve.reserve.ReserveAnalysis;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

class PlanReplaysProperties {

    @Provide
    Arbitrary<Mission> missions() {
        return RandomMissions.missions();
    }

    /**
     * Oracles: the threshold solver's worst case (its own dynamic programme) for guaranteed missions;
     * the brute-force attractor (Grädel, Thomas, Wilke 2002, ch. 2) for the end of a counterexample —
     * below the floor, or a situation from which the robot cannot force completion; the arena's step
     * semantics for every row.
     */
    @Property(tries = 200)
    void worstReplay_matchesSolver_andCounterexamplesEndLost(@ForAll("missions") Mission m,
                                                             @ForAll PolicyChoice choice) {
        Plan plan = replays(m, choice);
        ReserveAnalysis an = ((Plan.Detail.Product) plan.detail()).analysis();
        PlanReplays mr = plan.replays().orElseThrow();
        int floor = an.reserveUnits();
        int start = an.startUnits();
        Replay r = mr.worstCase();
        if (start >= floor) {
            ReplayChecks.assertIsARun(an.arena(), r, start);
        }
        if (plan.guaranteed()) {
            Statistics.collect("guaranteed", choice);
            assertThat(plan.certification().ok()).isTrue();
            assertThat(r.minimumUnits()).isEqualTo(an.worstCaseMinimumUnits().getAsInt());
            assertThat(r.ending()).isEqualTo(Replay.Ending.COMPLETE);
            if (choice == PolicyChoice.SAFEST) {
                // the safest policy's worst case is the highest guaranteed floor
                assertThat(r.minimumUnits()).isEqualTo(plan.highestFloorUnits().getAsInt());
            }
            return;
        }
        Statistics.collect(r.ending().word() + (mr.bestEffortFloor() >= 0 ? " (best effort)" : " (greedy)"), choice);
        ReplayStep last = r.last();
        BruteForce bf = new BruteForce(m, floor);
        boolean breach = r.ending() == Replay.Ending.BELOW_FLOOR && last.batteryUnits() < floor;
        boolean avoided = r.ending() == Replay.Ending.AVOIDED_ZONE;
        boolean stuck = r.ending() == Replay.Ending.REPEATS && !bf.wins(last.cell(), last.budgetLeft(), last.progressMask(), last.batteryUnits());
        assertThat(breach || avoided || stuck).as(String.join("\n", r.explanation())).isTrue();
        if (mr.bestEffortFloor() >= 0) {
            assertThat(r.ending()).isEqualTo(Replay.Ending.BELOW_FLOOR);
            assertThat(r.minimumUnits()).isGreaterThanOrEqualTo(mr.bestEffortFloor());
        }
        long events = r.steps().stream().filter(s -> !s.event().nominal()).count();
        assertThat(events).isLessThanOrEqualTo(m.map().disturbances().budget());
    }

    /** The product route with its replays, as {@code replay} plans. */
    static Plan replays(Mission m, PolicyChoice choice) {
        return MissionPlanner.plan(m, PlanOptions.of(new Route.Product(choice, false, false, true, false)));
    }
}
