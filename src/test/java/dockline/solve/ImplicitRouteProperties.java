package dockline.solve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.TinyMissions;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The implicit route of {@link ReserveSolver#analyse} ({@link ReserveOptions.Route#IMPLICIT}) on random
 * small missions. Oracles: the brute-force solver {@link BruteForceReserve} (the textbook attractor
 * characterisation, Grädel, Thomas, Wilke (eds.), 2002, "Automata, Logics, and Infinite Games", ch. 2)
 * for the verdict, and the independent {@link CertificateChecker} for the policy and its worst case
 * (the checker rebuilds the closed loop from the policy rows alone and computes its own minimum).
 */
class ImplicitRouteProperties {

    private static final ReserveOptions IMPLICIT =
            ReserveOptions.defaults().withHighestReserve(false).withRoute(ReserveOptions.Route.IMPLICIT);

    /** Same verdict as brute force and the product route; a policy the checker certifies, with the checker's worst case. */
    @Property(tries = 300)
    void implicitRoute_certifiedPolicyAndWorstCase(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveAnalysis imp = ReserveSolver.analyse(m, IMPLICIT);
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false));
        Arena arena = ArenaCompiler.compile(m);
        BruteForceReserve brute = new BruteForceReserve(arena, GoalAutomaton.of(m));
        assertThat(imp.guaranteed()).isEqualTo(brute.guaranteed());
        assertThat(imp.verdict()).isEqualTo(ref.verdict());
        assertThat(imp.policy().isPresent()).isEqualTo(imp.guaranteed());
        if (!imp.guaranteed()) {
            assertThat(imp.worstCaseMinimumUnits()).isEmpty();
            return;
        }
        Certificate cert = CertificateChecker.check(arena, imp.policy().orElseThrow(), imp.reserveUnits(),
                imp.startUnits());
        assertThat(cert.ok()).as(cert.reason()).isTrue();
        assertThat(imp.worstCaseMinimumUnits().getAsInt()).isEqualTo(cert.worstMinimumUnits());
        assertThat(imp.worstCaseMinimumUnits().getAsInt()).isGreaterThanOrEqualTo(imp.reserveUnits());
    }

    /** The highest guaranteed floor (bisection over implicit verdicts) equals the product route's. */
    @Property(tries = 150)
    void implicitRoute_highestFloorAgrees(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveAnalysis imp = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.IMPLICIT));
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(imp.highestGuaranteedReserveUnits()).isEqualTo(ref.highestGuaranteedReserveUnits());
    }

    /** The safest policy of the implicit route keeps the battery at or above the highest floor (checker). */
    @Property(tries = 150)
    void implicitRoute_safestPolicyCertifiedAtTheHighestFloor(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveAnalysis imp = ReserveSolver.analyse(m, ReserveOptions.defaults().withSafestPolicy(true)
                .withRoute(ReserveOptions.Route.IMPLICIT));
        if (!imp.guaranteed()) {
            return;
        }
        Certificate cert = CertificateChecker.check(ArenaCompiler.compile(m), imp.policy().orElseThrow(),
                imp.policyFloorUnits(), imp.startUnits());
        assertThat(cert.ok()).as(cert.reason()).isTrue();
        assertThat(imp.worstCaseMinimumUnits().getAsInt()).isEqualTo(cert.worstMinimumUnits());
        assertThat(imp.worstCaseMinimumUnits().getAsInt()).isEqualTo(imp.highestGuaranteedReserveUnits().getAsInt());
    }
}
