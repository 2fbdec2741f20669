package dockline.margin;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.fixtures.BruteForce;
import dockline.fixtures.RandomMissions;
import dockline.model.Mission;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

class MinimumCreditProperties {

    @Provide
    Arbitrary<Mission> missions() {
        return RandomMissions.missions();
    }

    /**
     * Oracle: the brute-force attractor on the explicit (cell, events left, tasks, level) game, read from the model records (textbook
     * definition, Grädel, Thomas, Wilke 2002, ch. 2): the fixpoint's need at the start is the least
     * level the brute force wins with, for every floor.
     */
    @Property(tries = 200)
    void needAtStart_matchesBruteForce(@ForAll("missions") Mission m) {
        Arena a = ArenaCompiler.compile(m);
        for (int floor = 0; floor <= 4; floor++) {
            MinimumCredit mc = MinimumCredit.solve(a, floor);
            BruteForce bf = new BruteForce(m, floor);
            assertThat(mc.needAtStart()).as("floor %d", floor).isEqualTo(bf.needAtStart());
            if (floor == 1) {
                net.jqwik.api.statistics.Statistics.collect(mc.needAtStart() == MinimumCredit.INFINITE ? "no level wins"
                        : mc.needAtStart() == floor ? "floor suffices" : "needs more than the floor");
            }
        }
    }

    /**
     * Oracle: brute force, state by state — every robot vertex reachable in the product has need
     * equal to the least winning level of the explicit game.
     */
    @Property(tries = 100)
    void everyNeed_matchesBruteForce(@ForAll("missions") Mission m) {
        Arena a = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        MinimumCredit mc = MinimumCredit.solve(a, floor);
        BruteForce bf = new BruteForce(m, floor);
        dockline.goal.GoalAutomaton goal = dockline.goal.GoalAutomaton.of(m);
        for (int v = 0; v < a.robotCount(); v++) {
            for (int g = 0; g < goal.stateCount(); g++) {
                int need = mc.need(v, g);
                if (need == MinimumCredit.INFINITE) {
                    continue; // unreachable pairs are not in the product
                }
                int mask = goal.progressMask(g);
                for (int l = 0; l <= m.capacityUnits(); l++) {
                    assertThat(bf.wins(a.cellOf(v), a.budgetLeft(v), mask, l)).as("vertex %d mask %d level %d need %d", v, mask, l, need)
                            .isEqualTo(l >= need);
                }
            }
        }
    }

    /**
     * Oracle: the independent certificate checker — the time-stamped strategy extracted at the least
     * winning level is certified, and its worst minimum never goes below the floor.
     */
    @Property(tries = 200)
    void extractedPolicy_isCertified(@ForAll("missions") Mission m) {
        Arena a = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        MinimumCredit mc = MinimumCredit.solve(a, floor);
        if (mc.needAtStart() == MinimumCredit.INFINITE) {
            return;
        }
        for (int start = mc.needAtStart(); start <= m.capacityUnits(); start += 3) {
            Certificate c = CertificateChecker.check(a, mc.policy(start), floor, start);
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(c.worstMinimumUnits()).isGreaterThanOrEqualTo(floor);
        }
    }
}
