package dockline.solve.rounds;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.certify.PatrolCertificateChecker;
import dockline.certify.RoundsCertificate;
import dockline.model.BuildingMap;
import dockline.model.DisturbanceModel;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import dockline.model.Zone;
import dockline.solve.reserve.LastingMissions;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * Patrols with lasting doors and blockages, at-most limits and the budget for the whole night or per lap
 * (with the budget per lap the count of new events starts afresh on every lap while closures persist;
 * maps/README.md, "Game semantics"): {@link PatrolSolver} against the separately written
 * {@link LastingPatrolBruteForce} on thousands of random tiny maps, verdict and highest floor; every guaranteed
 * policy also passes the independent {@link PatrolCertificateChecker} (jgrapht's strongly connected components)
 * with the solver's figures.
 */
class LastingPatrolProperties {

    private static final long BUDGET = 1L << 30;

    /** A random tiny lasting-events mission (LastingMissions) turned into a patrol, per lap two times in three. */
    static Mission patrolOf(long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        Random r = new Random(seed ^ 0x2545F4914F6CDD1DL);
        BuildingMap map = m.map();
        List<Zone> zones = new ArrayList<>(map.zones());
        List<String> cps = new ArrayList<>(m.tasks().visit());
        if (cps.isEmpty() || r.nextInt(4) == 0) {
            zones.add(new Zone("home", List.of(map.docks().get(0))));
            cps.add("home");
        }
        List<String> avoid = new ArrayList<>(m.tasks().avoid());
        cps.removeAll(avoid);
        if (cps.isEmpty()) {
            avoid.clear();
            cps = List.of("home");
            if (zones.stream().noneMatch(z -> z.name().equals("home"))) {
                zones.add(new Zone("home", List.of(map.docks().get(0))));
            }
        }
        List<EventRule> rules = map.disturbances().rules();
        DisturbanceModel d = new DisturbanceModel(map.disturbances().budget(), rules, r.nextInt(3) > 0);
        BuildingMap pm = new BuildingMap(map.name(), map.source(), map.cellSizeMetres(), map.rows(), map.legend(),
                zones, map.doorNames(), d);
        return new Mission(m.name(), null, pm, m.robot(), m.start(), m.startCharge(), m.reserve(),
                Tasks.patrol(cps, avoid), m.objective(), new Timing(BigDecimal.ONE, null));
    }

    // Oracle: LastingPatrolBruteForce (moves with closure sets and counts read from the records by the test
    // layer fixtures/LastingMoves, own lap rule, the νZ.μY fixpoint for Büchi games, Emerson and Jutla 1991);
    // certificate: PatrolCertificateChecker.
    @Property(tries = 2000)
    void lastingPatrol_agreesWithBruteForce(@ForAll long seed) {
        Mission m = patrolOf(seed);
        LastingPatrolBruteForce bf = new LastingPatrolBruteForce(m);
        PatrolAnalysis a = PatrolSolver.analyse(m, BUDGET);
        String what = LastingMissions.describe(m) + "\nper lap " + m.map().disturbances().budgetPerLap()
                + " checkpoints " + m.tasks().patrol();
        assertThat(a.guaranteed()).as("verdict\n" + what).isEqualTo(bf.won(m.reserveUnits()));
        int highest = bf.highestFloor();
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as("highest floor\n" + what).isEqualTo(highest);
        if (a.guaranteed()) {
            RoundsCertificate c = PatrolCertificateChecker.check(a.arena(), a.policy().orElseThrow(), a.reserveUnits(),
                    a.startUnits());
            assertThat(c.ok()).as(c.reason() + "\n" + what).isTrue();
            assertThat(c.worstMinimumUnits()).isEqualTo(a.lowestLevelUnits().getAsInt());
            assertThat(c.longestLapTicks()).isEqualTo(a.longestLapTicks().getAsInt());
        }
        boolean perLap = m.map().disturbances().budgetPerLap();
        boolean lasting = m.map().disturbances().rules().stream().anyMatch(EventRule::lasting);
        Statistics.label("verdict").collect(a.guaranteed());
        Statistics.label("per lap with lasting events").collect(perLap && lasting && m.map().disturbances().budget() > 0);
        Statistics.label("closures beyond the budget (piled up over laps)").collect(bf.closuresBeyondBudget());
        Statistics.label("some closure reachable").collect(bf.someClosure());
        Statistics.label("a floor but not the mission's").collect(!a.guaranteed() && highest >= 0);
        Statistics.label("verdict").coverage(c -> {
            c.check(true).percentage(p -> p >= 10);
            c.check(false).percentage(p -> p >= 10);
        });
        Statistics.label("per lap with lasting events").coverage(c -> c.check(true).percentage(p -> p >= 30));
        Statistics.label("closures beyond the budget (piled up over laps)").coverage(c -> c.check(true)
                .percentage(p -> p >= 3));
        Statistics.label("some closure reachable").coverage(c -> c.check(true).percentage(p -> p >= 30));
        Statistics.label("a floor but not the mission's").coverage(c -> c.check(true).percentage(p -> p >= 1));
    }

    // Oracle: the same brute force. With budget 0 nothing ever happens, so a budget per lap or for the night,
    // lasting or momentary, is the same game.
    @Property(tries = 500)
    void budgetZero_perLapAndLastingChangeNothing(@ForAll long seed) {
        Mission m = patrolOf(seed);
        DisturbanceModel d = m.map().disturbances();
        Mission zero = withModel(m, new DisturbanceModel(0, d.rules(), d.budgetPerLap()));
        Mission zeroMission = withModel(m, new DisturbanceModel(0, d.rules(), false));
        PatrolAnalysis a = PatrolSolver.analyse(zero, BUDGET);
        PatrolAnalysis b = PatrolSolver.analyse(zeroMission, BUDGET);
        assertThat(a.guaranteed()).isEqualTo(b.guaranteed()).isEqualTo(new LastingPatrolBruteForce(zero)
                .won(zero.reserveUnits()));
        assertThat(a.highestGuaranteedReserveUnits()).isEqualTo(b.highestGuaranteedReserveUnits());
        Statistics.label("verdict").collect(a.guaranteed());
        Statistics.label("verdict").coverage(c -> c.check(true).percentage(p -> p >= 10));
    }

    private static Mission withModel(Mission m, DisturbanceModel d) {
        BuildingMap map = m.map();
        BuildingMap pm = new BuildingMap(map.name(), map.source(), map.cellSizeMetres(), map.rows(), map.legend(),
                map.zones(), map.doorNames(), d);
        return new Mission(m.name(), null, pm, m.robot(), m.start(), m.startCharge(), m.reserve(), m.tasks(),
                m.objective(), m.timing());
    }
}
