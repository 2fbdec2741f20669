package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.TinyMissions;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.fixtures.BruteForce;
import dockline.solve.WinningRegion;
import java.nio.file.Path;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The implicit route of {@link ReserveSolver#analyse} ({@link ReserveOptions.Route#IMPLICIT}) on random
 * small missions. Oracles: the brute-force solver {@link BruteForce} (the textbook attractor
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
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false)
                .withRoute(ReserveOptions.Route.PRODUCT));
        Arena arena = ArenaCompiler.compile(m);
        BruteForce brute = new BruteForce(m, m.reserveUnits());
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
        // both routes' policies finish in the fewest moves in the worst case (the attractor rank of the
        // start; Grädel, Thomas, Wilke 2002, ch. 2), so the longest run of the two closed loops is the same
        Certificate refCert = CertificateChecker.check(arena, ref.policy().orElseThrow(), ref.reserveUnits(),
                ref.startUnits());
        assertThat(cert.longestRunSteps()).isEqualTo(refCert.longestRunSteps());
    }

    /**
     * When not guaranteed, the implicit route keeps the whole winning region: it contains the stored
     * route's (which covers only the situations reached from the start) and excludes the start.
     */
    @Property(tries = 200)
    void implicitRoute_regionContainsTheStoredRoutesRegion(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveAnalysis imp = ReserveSolver.analyse(m, IMPLICIT);
        if (imp.guaranteed()) {
            return;
        }
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false)
                .withRoute(ReserveOptions.Route.PRODUCT));
        WinningRegion in = imp.region().orElseThrow();
        WinningRegion stored = ref.region().orElseThrow();
        Arena arena = imp.arena();
        int masks = 1 << m.tasks().visit().size();
        int wins = 0;
        for (int v = 0; v < arena.robotCount(); v++) {
            for (int mask = 0; mask < masks; mask++) {
                for (int level = 0; level <= m.capacityUnits(); level++) {
                    if (stored.robotWins(v, mask, level)) {
                        wins++;
                        assertThat(in.robotWins(v, mask, level)).as("vertex %d mask %d level %d", v, mask, level).isTrue();
                    }
                }
            }
        }
        int g0 = imp.goal().initial(arena.cellZones(arena.cell(arena.startVertex())));
        if (g0 != GoalAutomaton.REJECT) {
            assertThat(in.robotWins(arena.startVertex(), imp.goal().progressMask(g0), imp.startUnits())).isFalse();
        }
        net.jqwik.api.statistics.Statistics.label("stored region non-empty").collect(wins > 0);
    }

    /** The highest guaranteed floor (bisection over implicit verdicts) equals the product route's. */
    @Property(tries = 150)
    void implicitRoute_highestFloorAgrees(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        ReserveAnalysis imp = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.IMPLICIT));
        ReserveAnalysis ref = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT));
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

    /**
     * The demo missions on the implicit route (the default): the verdict, worst level and highest floor
     * quoted in missions/README.md, and a policy the checker certifies with the worst case the implicit
     * route reports. The worst level may differ from the stored route's by tie-breaking among equally
     * short choices (night-round: 47 units here, 49 on the stored route; supply-run: 24 on both).
     */
    @Example
    void demoMissions_implicitRoute() throws Exception {
        demoMission_implicitRoute("missions/night-round.yaml", true, 47, 83);
        demoMission_implicitRoute("missions/supply-run.yaml", true, 24, 40);
        demoMission_implicitRoute("missions/late-return.yaml", false, -1, -1);
        demoMission_implicitRoute("missions/vault-check.yaml", false, -1, 4);
    }

    private static void demoMission_implicitRoute(String file, boolean guaranteed, int worst, int highest)
            throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.IMPLICIT));
        assertThat(a.guaranteed()).as(file).isEqualTo(guaranteed);
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as(file).isEqualTo(highest);
        assertThat(a.worstCaseMinimumUnits().orElse(-1)).as(file).isEqualTo(worst);
        if (guaranteed) {
            Certificate cert = CertificateChecker.check(ArenaCompiler.compile(m), a.policy().orElseThrow(),
                    a.reserveUnits(), a.startUnits());
            assertThat(cert.ok()).as(cert.reason()).isTrue();
            assertThat(a.worstCaseMinimumUnits().getAsInt()).isEqualTo(cert.worstMinimumUnits());
            // a policy whose worst level is w guarantees the floor w, so w cannot exceed the highest floor
            assertThat(a.worstCaseMinimumUnits().getAsInt()).isBetween(a.reserveUnits(), highest);
        }
    }
}
