package dockline.solve.rounds;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.certify.DeadlineCertificateChecker;
import dockline.certify.PatrolCertificateChecker;
import dockline.certify.RoundsCertificate;
import dockline.fixtures.RandomMissions;
import dockline.model.BuildingMap;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The production routes for patrols ({@link PatrolSolver}: Büchi nested attractors on the stored product) and
 * deadlines ({@link DeadlineSolver}: attractor ranks as the ticks-left monitor) against a separately written
 * brute force ({@link RoundsBruteForce}: its own move generation from the records by maps/README.md's rules,
 * the μ-calculus fixpoint for Büchi games and an explicit ticks-left counter), on random tiny games: the same
 * verdict, the same highest floor, and for deadlines the same tightest deadline. Every guaranteed policy also
 * passes its independent certificate with the solver's figures.
 */
class RoundsAgreementProperties {

    private static final long BUDGET = 1L << 30;

    /** A random tiny mission turned into a patrol over its task zones (or a zone at a dock). */
    static Mission patrolOf(long seed) {
        Mission m = RandomMissions.fromSeed(seed);
        Random r = new Random(seed ^ 0x5DEECE66DL);
        BuildingMap map = m.map();
        List<Zone> zones = new ArrayList<>(map.zones());
        List<String> cps = new ArrayList<>(m.tasks().visit());
        if (cps.isEmpty() || r.nextInt(4) == 0) {
            zones.add(new Zone("home", List.of(map.docks().get(0))));
            cps = new ArrayList<>(cps);
            cps.add("home");
        }
        cps.removeAll(m.tasks().avoid());
        List<String> avoid = new ArrayList<>(m.tasks().avoid());
        if (avoid.contains("home") || cps.isEmpty()) {
            avoid.clear();
            cps = List.of("home");
        }
        DisturbanceModel d = new DisturbanceModel(map.disturbances().budget(), map.disturbances().rules(),
                r.nextBoolean());
        BuildingMap pm = new BuildingMap(map.name(), map.source(), map.cellSizeMetres(), map.rows(), map.legend(),
                zones, map.doorNames(), d);
        Mission out = new Mission(m.name(), null, pm, m.robot(), m.start(), m.startCharge(), m.reserve(),
                Tasks.patrol(cps, avoid), m.objective(), new Timing(BigDecimal.ONE, null));
        return out;
    }

    /** A random tiny mission with a deadline of 1 to 12 turns of 1 s. */
    static Mission deadlineOf(long seed) {
        Mission m = RandomMissions.fromSeed(seed);
        int t = 1 + new Random(seed * 31 + 7).nextInt(12);
        return m.withTiming(new Timing(BigDecimal.ONE, BigDecimal.valueOf(t)));
    }

    private static int bruteHighestPatrolFloor(Mission m) {
        for (int f = m.startUnits(); f >= 0; f--) {
            if (new RoundsBruteForce(m, f).patrolWon()) {
                return f;
            }
        }
        return -1;
    }

    private static int bruteHighestDeadlineFloor(Mission m, int deadline) {
        for (int f = m.startUnits(); f >= 0; f--) {
            if (new RoundsBruteForce(m, f).deadlineWon(deadline)) {
                return f;
            }
        }
        return -1;
    }

    // Oracle: RoundsBruteForce (own move generation, νZ.μY fixpoint of the μ-calculus for Büchi games,
    // Emerson and Jutla 1991 / Grädel, Thomas, Wilke 2002); certificate: PatrolCertificateChecker (jgrapht SCCs).
    @Property(tries = 1500)
    void patrol_agreesWithBruteForce(@ForAll long seed) {
        Mission m = patrolOf(seed);
        PatrolAnalysis a = PatrolSolver.analyse(m, BUDGET);
        RoundsBruteForce bf = new RoundsBruteForce(m, m.reserveUnits());
        assertThat(a.guaranteed()).as("verdict").isEqualTo(bf.patrolWon());
        int highest = bruteHighestPatrolFloor(m);
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as("highest floor").isEqualTo(highest);
        Statistics.label("verdict").collect(a.guaranteed());
        Statistics.label("budget per lap").collect(m.map().disturbances().budgetPerLap());
        Statistics.label("disturbances").collect(m.map().disturbances().budget() > 0);
        Statistics.label("a floor but not the mission's").collect(!a.guaranteed() && highest >= 0);
        if (a.guaranteed()) {
            RoundsCertificate c = PatrolCertificateChecker.check(a.arena(), a.policy().orElseThrow(), a.reserveUnits(),
                    a.startUnits());
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(c.worstMinimumUnits()).isEqualTo(a.lowestLevelUnits().getAsInt());
            assertThat(c.longestLapTicks()).isEqualTo(a.longestLapTicks().getAsInt());
            assertThat(c.wayInTicks()).isEqualTo(a.wayInTicks().getAsInt());
        }
        Statistics.label("verdict").coverage(c -> {
            c.check(true).percentage(p -> p >= 15);
            c.check(false).percentage(p -> p >= 15);
        });
        Statistics.label("budget per lap").coverage(c -> c.check(true).percentage(p -> p >= 30));
        Statistics.label("disturbances").coverage(c -> c.check(true).percentage(p -> p >= 40));
        Statistics.label("a floor but not the mission's").coverage(c -> c.check(true).percentage(p -> p >= 1));
    }

    // Oracle: RoundsBruteForce's explicit ticks-left layers W_0 ⊆ W_1 ⊆ ... (force within t turns);
    // certificate: DeadlineCertificateChecker (closed loop, longest path).
    @Property(tries = 1500)
    void deadline_agreesWithBruteForce(@ForAll long seed) {
        Mission m = deadlineOf(seed);
        int deadline = m.timing().deadlineTicks();
        DeadlineAnalysis a = DeadlineSolver.analyse(m, BUDGET);
        RoundsBruteForce bf = new RoundsBruteForce(m, m.reserveUnits());
        assertThat(a.guaranteed()).as("verdict").isEqualTo(bf.deadlineWon(deadline));
        int fewest = bf.fewestTurns(10_000);
        assertThat(a.tightestTicks().orElse(-1)).as("tightest deadline").isEqualTo(fewest);
        int highest = bruteHighestDeadlineFloor(m, deadline);
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as("highest floor").isEqualTo(highest);
        boolean onlyDeadline = !a.guaranteed() && fewest >= 0;
        Statistics.label("verdict").collect(a.guaranteed());
        Statistics.label("missed only by the deadline").collect(onlyDeadline);
        if (a.guaranteed()) {
            RoundsCertificate c = DeadlineCertificateChecker.check(a.arena(), a.policy().orElseThrow(), a.reserveUnits(),
                    a.startUnits(), deadline);
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(c.longestLapTicks()).isEqualTo(a.worstFinishTicks().getAsInt());
        }
        Statistics.label("verdict").coverage(c -> {
            c.check(true).percentage(p -> p >= 15);
            c.check(false).percentage(p -> p >= 15);
        });
        Statistics.label("missed only by the deadline").coverage(c -> c.check(true).percentage(p -> p >= 5));
    }

    // Oracle: the certificate checkers (independent closed loops) and the brute force's highest floor above.
    @Property(tries = 300)
    void safestPolicies_neverGoBelowTheHighestFloor(@ForAll long seed) {
        Mission p = patrolOf(seed);
        PatrolAnalysis a = PatrolSolver.analyse(p, BUDGET, true);
        if (a.guaranteed()) {
            int h = a.highestGuaranteedReserveUnits().getAsInt();
            assertThat(a.policyFloorUnits()).isEqualTo(h);
            RoundsCertificate c = PatrolCertificateChecker.check(a.arena(), a.policy().orElseThrow(), h, a.startUnits());
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(a.lowestLevelUnits().getAsInt()).isEqualTo(c.worstMinimumUnits()).isGreaterThanOrEqualTo(h);
        }
        Mission d = deadlineOf(seed);
        DeadlineAnalysis b = DeadlineSolver.analyse(d, BUDGET, true);
        if (b.guaranteed()) {
            int h = b.highestGuaranteedReserveUnits().getAsInt();
            RoundsCertificate c = DeadlineCertificateChecker.check(b.arena(), b.policy().orElseThrow(), h, b.startUnits(),
                    b.deadlineTicks());
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(b.worstCaseMinimumUnits().getAsInt()).isGreaterThanOrEqualTo(h);
            assertThat(b.worstFinishTicks().getAsInt()).isLessThanOrEqualTo(b.deadlineTicks());
        }
        Statistics.label("safest above the mission's floor").collect(a.guaranteed()
                && a.policyFloorUnits() > a.reserveUnits());
        Statistics.label("safest above the mission's floor").coverage(c -> c.check(true).percentage(q -> q >= 10));
    }
}
