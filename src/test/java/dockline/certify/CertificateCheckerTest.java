package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.TinyMission;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class CertificateCheckerTest {

    /** A corridor tile, carpet, tile, dock; a rug on the carpet may drag once (3 Wh extra). 1 unit = 1 Wh. */
    private static Mission corridor(int waitWh) {
        return TinyMission.plan(".c.D")
                .costs(1, 2, waitWh, 0)
                .capacity(20)
                .start("0:0", 10)
                .budget(1)
                .rule(EventKind.DRAG, "rug", TinyMission.cells("1:0"), BigDecimal.valueOf(3))
                .build();
    }

    private static Action move(int x, int y) {
        return new Action(ActionKind.MOVE, new Cell(x, y));
    }

    private static PolicyEntry at(int x, int level, int budget, Action a) {
        return new PolicyEntry(new Cell(x, 0), level, budget, 0, a);
    }

    /** The hand-written policy "drive east to the dock" for every situation it can reach. */
    private static List<PolicyEntry> eastbound() {
        return new ArrayList<>(List.of(
                at(0, 10, 1, move(1, 0)),
                at(1, 8, 1, move(2, 0)),
                at(1, 5, 0, move(2, 0)),
                at(2, 7, 1, move(3, 0)),
                at(2, 4, 0, move(3, 0))));
    }

    /**
     * Worked by hand from the step semantics of maps/README.md, "Game semantics": nominal run 10 → 8 → 7 → 6;
     * with the
     * drag on entering the carpet 10 → 5 → 4 → 3. So 7 situations, longest run 3 steps, worst minimum 3.
     */
    @Test
    void corridor_handWorkedExample_isCertifiedWithWorstMinimumThree() {
        Certificate c = CertificateChecker.check(corridor(1), new Policy(eastbound()), 0);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstMinimumUnits()).isEqualTo(3);
        assertThat(c.statesChecked()).isEqualTo(7);
        assertThat(c.longestRunSteps()).isEqualTo(3);
        assertThat(c.reason()).contains("never drops below 3 units (3 Wh)");
    }

    /** Same hand-worked run: the drag run reaches 3 units, so a floor of 4 must be rejected. */
    @Test
    void corridor_floorAboveWorstCase_isRejectedWithTheBreach() {
        Certificate c = CertificateChecker.check(corridor(1), new Policy(eastbound()), 4);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("below the reserve floor 4 units").contains("rug");
        assertThat(c.worstMinimumUnits()).isEqualTo(3);
    }

    @Test
    void missingEntry_isRejected() {
        List<PolicyEntry> p = eastbound();
        p.remove(2); // (1:0, 5 units, budget 0): reached only after the drag
        Certificate c = CertificateChecker.check(corridor(1), new Policy(p), 0);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("no entry").contains("1:0 with 5 units");
    }

    @Test
    void illegalAction_isRejected() {
        List<PolicyEntry> p = eastbound();
        p.set(0, at(0, 10, 1, new Action(ActionKind.CHARGE, new Cell(0, 0)))); // no dock at 0:0
        Certificate c = CertificateChecker.check(corridor(1), new Policy(p), 0);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("'charge' is not allowed");
        List<PolicyEntry> q = eastbound();
        q.set(0, at(0, 10, 1, move(2, 0))); // not a neighbour
        assertThat(CertificateChecker.check(corridor(1), new Policy(q), 0).ok()).isFalse();
    }

    /** Waiting costs nothing here, so "wait" at the start repeats the same situation forever. */
    @Test
    void waitingForever_isACycle_andRejected() {
        List<PolicyEntry> p = eastbound();
        p.set(0, at(0, 10, 1, new Action(ActionKind.WAIT, new Cell(0, 0))));
        Certificate c = CertificateChecker.check(corridor(0), new Policy(p), 0);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("going round forever");
    }

    /** A slip on the way can put the robot into the keep-out cell 1:1. */
    @Test
    void slipIntoAvoidedZone_isRejected() {
        Mission m = TinyMission.plan(".c.D", "#.##")
                .costs(1, 2, 1, 0).capacity(20).start("0:0", 10).budget(1)
                .rule(EventKind.SLIP, "wet", TinyMission.cells("1:0"), BigDecimal.ZERO)
                .zone("lab", "1:1").avoid("lab")
                .build();
        List<PolicyEntry> p = eastbound();
        Certificate c = CertificateChecker.check(m, new Policy(p), 0);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("avoided zone 'lab'");
    }

    @Test
    void startBelowFloor_isRejected() {
        Arena a = ArenaCompiler.compile(corridor(1));
        Certificate c = CertificateChecker.check(a, new Policy(eastbound()), 11, 10);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("starting charge 10 units (10 Wh) is below the reserve floor 11 units");
    }

    /** Tasks: the robot must visit the far cell first; the eastbound policy docks without it, so at the dock it has no entry. */
    @Test
    void dockingBeforeTheTasks_isNotCompletion() {
        Mission m = TinyMission.plan(".c.D.")
                .costs(1, 2, 1, 0).capacity(20).start("0:0", 10)
                .zone("store", "4:0").visit(true, "store")
                .build();
        Certificate c = CertificateChecker.check(m, new Policy(List.of(
                at(0, 10, 0, move(1, 0)), at(1, 8, 0, move(2, 0)), at(2, 7, 0, move(3, 0)))), 0);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("no entry for").contains("3:0 with 6 units");
        Certificate ok = CertificateChecker.check(m, new Policy(List.of(
                at(0, 10, 0, move(1, 0)), at(1, 8, 0, move(2, 0)), at(2, 7, 0, move(3, 0)),
                at(3, 6, 0, move(4, 0)), new PolicyEntry(new Cell(4, 0), 5, 0, 1, move(3, 0)))), 0);
        assertThat(ok.ok()).as(ok.reason()).isTrue();
        assertThat(ok.worstMinimumUnits()).isEqualTo(4); // by hand: 10-2-1-1-1-1
    }
}
