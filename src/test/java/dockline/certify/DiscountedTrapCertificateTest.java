package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.policy.Policy;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The bundled demo missions/discounted-trap.yaml (invented data) is certified. The expected worst
 * score is hand-worked with the finite geometric sum (the definition of the discounted sum,
 * DS = sum w_i / d^i, as in Zwick & Paterson, TCS 158, 1996, with lambda = 1/d): one charge (+3 units) then 15
 * moves of -2 units with d = 2 give 3 - 2 (1/2 + ... + 1/2^15) = 3 - 2 (1 - 2^-15) = 16385/16384,
 * the figure missions/README.md quotes.
 */
class DiscountedTrapCertificateTest {

    @Test
    void trapDemo_isCertified_withTheHandWorkedWorstScore() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults());
        assertThat(a.guaranteed()).isTrue();
        Policy p = DiscountedPolicies.of(a);
        assertThat(p.scored()).isTrue();
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, p, o, true);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstScore().orElseThrow().sameValue(Rational.of(16385, 16384))).as(c.reason()).isTrue();
        assertThat(c.worstScore().get().sameValue(a.worstCaseScore().orElseThrow())).isTrue();
        assertThat(c.worstMinimumUnits()).isGreaterThanOrEqualTo(m.reserveUnits());
        // the figure missions/README.md quotes
        assertThat(c.statesChecked()).isEqualTo(27);
    }

    @Test
    void trapDemo_scoreOnly_isCertifiedWithoutTheFloor() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withKeepReserve(false));
        assertThat(a.guaranteed()).isTrue();
        DiscountedCertificate c = DiscountedCertificateChecker.check(m, DiscountedPolicies.of(a), o, false);
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.reserveKept()).isFalse();
        assertThat(c.worstScore().get().sameValue(a.worstCaseScore().orElseThrow())).isTrue();
    }
}
