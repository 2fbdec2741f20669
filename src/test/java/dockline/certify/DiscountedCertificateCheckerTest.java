package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.fixtures.TinyMission;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.PolicyScore;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Hand-worked examples of the discounted certificate (invented data, 1 unit = 1 Wh). Scores are
 * worked with the finite discounted sum DS = sum w_i / 2^i (the definition, weights 0 after
 * completion) and the gaps with s_{-1} = -v/d, s_{i+1} = d s_i + w_{i+1} (missions/README.md, "The discounted
 * objective").
 */
class DiscountedCertificateCheckerTest {

    private static final Action CHARGE = new Action(ActionKind.CHARGE, new Cell(0, 0));

    private static Action move(int x) {
        return new Action(ActionKind.MOVE, new Cell(x, 0));
    }

    private static PolicyEntry row(int x, int level, int budget, int progress, String score, Action a) {
        return new PolicyEntry(new Cell(x, 0), level, budget, progress, a, PolicyScore.parse(score));
    }

    private static Objective.Discounted ds(Rational v, Relation rel) {
        return new Objective.Discounted(2, v, rel);
    }

    /** A dock, then two tiles; moves 1 Wh, waits 1 Wh, charging +2 Wh; start on the dock with 10 Wh. No tasks. */
    private static Mission dockAndCorridor() {
        return TinyMission.plan("D..").costs(1, 1, 1, 2).capacity(20).start("0:0", 10).build();
    }

    /**
     * v = 3, {@code >=}: mu = 2 (the charge), B = 2. s_{-1} = -3/2: docked, no tasks, but the score is short,
     * so the robot goes on (the completion convention); charge: s_0 = 2 - 3 = -1; charge: s_1 = -2 + 2 = 0,
     * met, complete. DS = 2 + 2/2 = 3 exactly.
     */
    @Test
    void dockedButShort_goesOn_andTheWorstScoreIsTheFiniteSum() {
        Mission m = dockAndCorridor();
        Policy p = new Policy(List.of(row(0, 10, 0, 0, "-3/2", CHARGE), row(0, 12, 0, 0, "-1", CHARGE)));
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, p, ds(Rational.of(3), Relation.AT_LEAST), true);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstScore().orElseThrow().sameValue(Rational.of(3))).isTrue();
        assertThat(c.longestRunSteps()).isEqualTo(2);
        assertThat(c.worstMinimumUnits()).isEqualTo(10);
        // one row fewer: the docked robot with the score short needs a row, it is not complete
        DiscountedCertificate d = DiscountedCertificateChecker.check(m, new Policy(List.of(row(0, 10, 0, 0, "-3/2", CHARGE))),
                ds(Rational.of(3), Relation.AT_LEAST), true);
        assertThat(d.ok()).isFalse();
        assertThat(d.reason()).contains("no entry").contains("score gap -1");
    }

    /**
     * v = 3, {@code >}: s_1 = 0 is not above 0, so one more charge: s_2 = 0 + 2 = 2 (not beyond B = 2 for
     * {@code >}), met; DS = 2 + 1 + 1/2 = 7/2.
     */
    @Test
    void strictRelation_needsOneMoreCharge() {
        Mission m = dockAndCorridor();
        Objective.Discounted o = ds(Rational.of(3), Relation.ABOVE);
        List<PolicyEntry> two = List.of(row(0, 10, 0, 0, "-3/2", CHARGE), row(0, 12, 0, 0, "-1", CHARGE));
        assertThat(DiscountedCertificateChecker.check(m, new Policy(two), o, true).reason()).contains("score gap 0");
        List<PolicyEntry> three = new java.util.ArrayList<>(two);
        three.add(row(0, 14, 0, 0, "0", CHARGE));
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, new Policy(three), o, true);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstScore().orElseThrow().sameValue(Rational.of(7, 2))).isTrue();
    }

    /** v = 3: waiting first gives s_0 = -1 - 3 = -4 < -B = -2: no continuation can make up for it. */
    @Test
    void aGapBelowTheBound_isOutOfReach() {
        Mission m = dockAndCorridor();
        Policy p = new Policy(List.of(row(0, 10, 0, 0, "-3/2", new Action(ActionKind.WAIT, new Cell(0, 0)))));
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, p, ds(Rational.of(3), Relation.AT_LEAST), true);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("no continuation can reach a discounted score DS >= 3 (discount 2)");
        // v = 5 is above the best possible 2 + 1 + 1/2 + ... = 4: out of reach from the start
        DiscountedCertificate s = DiscountedCertificateChecker.check(m, p, ds(Rational.of(5), Relation.AT_LEAST), true);
        assertThat(s.reason()).contains("no run can reach");
    }

    /**
     * v = -10: -v/d = 5 is beyond B = 2, secured from the start; the task (the far tile) is never done when
     * the policy charges on a full battery for ever: the same situation again, a cycle.
     */
    @Test
    void chargingForEverOnAFullBattery_isACycle() {
        Mission m = TinyMission.plan("D..").costs(1, 1, 1, 2).capacity(20).start("0:0", 20).zone("far", "2:0")
                .visit(true, "far").build();
        Policy p = new Policy(List.of(row(0, 20, 0, 0, "secured", CHARGE)));
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, p, ds(Rational.of(-10), Relation.AT_LEAST), true);
        assertThat(c.ok()).isFalse();
        assertThat(c.reason()).contains("going round forever");
    }

    /**
     * A corridor tile, carpet, tile, dock; the rug on the carpet may drag once (3 Wh extra), so mu = 5 and
     * B = 5. v = -6: s_{-1} = 3. Nominal: -2, -1, -1 (s 4, then 7: secured); with the drag: -5, -1, -1
     * (s 1, 1, 1). Worst DS = -5 - 1/2 - 1/4 = -23/4.
     */
    @Test
    void drag_worstScoreIsTheMinimumOverTheOutcomes() {
        Mission m = TinyMission.plan(".c.D").costs(1, 2, 1, 0).capacity(20).start("0:0", 10).budget(1)
                .rule(EventKind.DRAG, "rug", TinyMission.cells("1:0"), BigDecimal.valueOf(3)).build();
        Policy p = new Policy(List.of(row(0, 10, 1, 0, "3", move(1)), row(1, 8, 1, 0, "4", move(2)),
                row(1, 5, 0, 0, "1", move(2)), row(2, 7, 1, 0, "secured", move(3)), row(2, 4, 0, 0, "1", move(3))));
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, p, ds(Rational.of(-6), Relation.AT_LEAST), true);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstScore().orElseThrow().sameValue(Rational.of(-23, 4))).isTrue();
        assertThat(c.worstMinimumUnits()).isEqualTo(3);
        // the floor: 4 units are not kept on the drag branch (10 - 5 - 1 - 1 = 3)
        Mission floor4 = m.withReserve(dockline.model.Charge.wh(BigDecimal.valueOf(4)));
        assertThat(DiscountedCertificateChecker.check(floor4, p, ds(Rational.of(-6), Relation.AT_LEAST), true).reason())
                .contains("below the reserve floor");
        assertThat(DiscountedCertificateChecker.check(floor4, p, ds(Rational.of(-6), Relation.AT_LEAST), false).ok())
                .isTrue();
        // a reserve policy has no score memory
        Policy plain = new Policy(List.of(new PolicyEntry(new Cell(0, 0), 10, 1, 0, move(1))));
        assertThat(DiscountedCertificateChecker.check(m, plain, ds(Rational.of(-6), Relation.AT_LEAST), true).reason())
                .contains("no score memory");
    }
}
