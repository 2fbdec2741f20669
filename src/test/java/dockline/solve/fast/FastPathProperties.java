package dockline.solve.fast;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.bench.TinyMissions;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.util.Optional;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The fast path as {@code check} uses it ({@link FastPath}) against the product route
 * ({@link ReserveSolver#analyse}, the reference) and the independent certificate checker, on
 * random small missions with and without charging (with charging it applies only when no dock is
 * reachable before completion). The highest floor is s − need(start) (MinChargeSolver's class
 * comment); the product route finds it by its own max-min fixpoint over the battery levels.
 */
class FastPathProperties {

    @Property(tries = 300)
    void fastPath_agreesWithTheProductRoute_andItsPolicyIsCertified(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        Optional<FastPath.Analysis> fast = FastPath.analyse(m, FastPath.DEFAULT_MAX_POLICY_ROWS, false);
        assertThat(fast.isPresent()).isEqualTo(FastPath.applies(m));
        if (!charging) {
            assertThat(fast).isPresent();
        }
        if (fast.isEmpty()) {
            return;
        }
        FastPath.Analysis a = fast.get();
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(a.verdict()).isEqualTo(ref.verdict());
        assertThat(a.highestGuaranteedReserveUnits()).as("highest floor").isEqualTo(ref.highestGuaranteedReserveUnits());
        if (a.guaranteed()) {
            // the policy of least need is the safest: its worst level is the highest floor, never below the
            // worst level of the product route's policy (which finishes in the fewest moves)
            assertThat(a.worstCaseMinimumUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
            assertThat(a.worstCaseMinimumUnits().getAsInt()).isGreaterThanOrEqualTo(ref.worstCaseMinimumUnits().getAsInt());
            assertThat(a.policy()).isPresent();
            Certificate cert = CertificateChecker.check(a.arena(), a.policy().get(), a.reserveUnits(), a.startUnits());
            assertThat(cert.ok()).as(cert.reason()).isTrue();
            assertThat(cert.worstMinimumUnits()).isEqualTo(a.worstCaseMinimumUnits().getAsInt());
            // with a bound below the loop's size, no policy is given, and the analysis says so
            if (a.policy().get().size() > 1) {
                FastPath.Analysis small = FastPath.analyse(m, 1, false).orElseThrow();
                assertThat(small.loopTooLarge()).isTrue();
                assertThat(small.policy()).isEmpty();
                assertThat(small.verdict()).isEqualTo(a.verdict());
            }
        } else {
            assertThat(a.worstCaseMinimumUnits()).isEmpty();
            assertThat(a.policy()).isEmpty();
        }
        FastPath.Analysis verdictOnly = FastPath.analyse(m, FastPath.DEFAULT_MAX_POLICY_ROWS, true).orElseThrow();
        assertThat(verdictOnly.verdict()).isEqualTo(ref.verdict());
        assertThat(verdictOnly.policy()).isEmpty();
    }

    /** The verdict-only route on the implicit product (early exit) decides as the full product route does. */
    @Property(tries = 300)
    void implicitVerdict_agreesWithTheProductRoute(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveSolver.ImplicitVerdict v = ReserveSolver.decideImplicitly(m, ProductOptions.defaults());
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false)
                .withRoute(ReserveOptions.Route.PRODUCT));
        assertThat(v.verdict()).isEqualTo(ref.verdict());
        assertThat(v.forecastVertices()).isGreaterThanOrEqualTo(ref.productVertices());
    }
}
