package dockline.replay;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.BruteForce;
import dockline.fixtures.RandomMissions;
import dockline.fixtures.ReplayChecks;
import dockline.model.Mission;
import dockline.solve.reserve.ReserveOptions;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

class MissionReplaysProperties {

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
    void worstReplay_matchesSolver_andCounterexamplesEndLost(@ForAll("missions") Mission m) {
        MissionReplays mr = MissionReplays.of(m, ReserveOptions.defaults());
        int floor = mr.analysis().reserveUnits();
        int start = mr.analysis().startUnits();
        Replay r = mr.worstCase();
        if (start >= floor) {
            ReplayChecks.assertIsARun(mr.arena(), r, start);
        }
        if (mr.guaranteed()) {
            Statistics.collect("guaranteed");
            assertThat(mr.certified()).isTrue();
            assertThat(r.minimumUnits()).isEqualTo(mr.analysis().worstCaseMinimumUnits().getAsInt());
            assertThat(r.ending()).isEqualTo(Replay.Ending.COMPLETE);
            return;
        }
        Statistics.collect(r.ending().word() + (mr.bestEffortFloor() >= 0 ? " (best effort)" : " (greedy)"));
        ReplayStep last = r.last();
        BruteForce bf = new BruteForce(mr.arena(), floor);
        int v = mr.arena().robotVertex(last.cell().index(mr.arena().width()), last.budgetLeft());
        boolean breach = r.ending() == Replay.Ending.BELOW_FLOOR && last.batteryUnits() < floor;
        boolean avoided = r.ending() == Replay.Ending.AVOIDED_ZONE;
        boolean stuck = r.ending() == Replay.Ending.REPEATS && !bf.wins(v, last.progressMask(), last.batteryUnits(), true);
        assertThat(breach || avoided || stuck).as(String.join("\n", r.explanation())).isTrue();
        if (mr.bestEffortFloor() >= 0) {
            assertThat(r.ending()).isEqualTo(Replay.Ending.BELOW_FLOOR);
            assertThat(r.minimumUnits()).isGreaterThanOrEqualTo(mr.bestEffortFloor());
        }
        long events = r.steps().stream().filter(s -> !s.event().nominal()).count();
        assertThat(events).isLessThanOrEqualTo(m.map().disturbances().budget());
    }
}
