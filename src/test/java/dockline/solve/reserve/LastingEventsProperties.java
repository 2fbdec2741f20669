package dockline.solve.reserve;

import dockline.policy.Policy;
import dockline.solve.fast.FastPath;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.model.EventDuration;
import dockline.model.Mission;
import java.util.Optional;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * Lasting door-shut and blockage events and at-most limits (maps/README.md, "Game semantics"), on
 * random tiny maps ({@link LastingMissions}: lasting and momentary doors and blockages, per-rule
 * limits, budgets 0-3).
 */
class LastingEventsProperties {

    /**
     * Oracle: {@link LastingBruteForce}, a separate explicit-state max-min fixpoint whose state
     * carries the closure set and the per-rule counts, with move generation read from the map and
     * mission records by the test layer fixtures/LastingMoves (no arena compiler, no goal automaton). Both production routes must agree on the
     * verdict and the highest guaranteed reserve; a guaranteed policy must pass the independent
     * certificate checker, and the fast path (when the robot cannot charge) must agree too.
     */
    @Property(tries = 2500)
    void verdictAndHighestReserve_matchTheBruteForceWithClosures(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        LastingBruteForce oracle = new LastingBruteForce(m);
        int highest = oracle.highestFloor();
        boolean guaranteed = m.startUnits() >= m.reserveUnits() && highest >= m.reserveUnits();
        String why = LastingMissions.describe(m);

        ReserveAnalysis implicit = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(implicit.guaranteed()).as("verdict, implicit route\n%s", why).isEqualTo(guaranteed);
        assertThat(implicit.highestGuaranteedReserveUnits().orElse(-1)).as("highest reserve, implicit route\n%s", why)
                .isEqualTo(highest);
        ReserveAnalysis stored = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT));
        assertThat(stored.guaranteed()).as("verdict, stored route\n%s", why).isEqualTo(guaranteed);
        assertThat(stored.highestGuaranteedReserveUnits().orElse(-1)).as("highest reserve, stored route\n%s", why)
                .isEqualTo(highest);
        if (guaranteed) {
            Certificate c = CertificateChecker.check(implicit.arena(), implicit.policy().orElseThrow(), m.reserveUnits());
            assertThat(c.ok()).as("certificate of the implicit route's policy: %s\n%s", c.reason(), why).isTrue();
            assertThat(c.worstMinimumUnits()).as(why).isEqualTo(implicit.worstCaseMinimumUnits().getAsInt());
        }
        Optional<FastPath.Analysis> fast = FastPath.analyse(m, FastPath.DEFAULT_MAX_POLICY_ROWS, false);
        fast.ifPresent(f -> {
            assertThat(f.guaranteed()).as("verdict, fast path\n%s", why).isEqualTo(guaranteed);
            assertThat(f.highestGuaranteedReserveUnits().orElse(-1)).as("highest reserve, fast path\n%s", why)
                    .isEqualTo(highest);
        });

        boolean lasting = m.map().disturbances().anyLasting() && m.map().disturbances().budget() > 0;
        Statistics.label("lasting rule with budget").collect(lasting);
        Statistics.label("a closure is reachable").collect(oracle.someClosure());
        Statistics.label("verdict").collect(guaranteed);
        Statistics.label("at-most").collect(m.map().disturbances().anyLimited());
        Statistics.label("fast path").collect(fast.isPresent());
        Statistics.label("a closure is reachable").coverage(c -> c.check(true).percentage(p -> p >= 30));
        Statistics.label("verdict").coverage(c -> {
            c.check(true).percentage(p -> p >= 15);
            c.check(false).percentage(p -> p >= 15);
        });
        Statistics.label("at-most").coverage(c -> c.check(true).percentage(p -> p >= 15));
    }

    /**
     * Dominance: without slip rules, a lasting door or blockage is the same event as a momentary one
     * plus the building's option to keep the cell closed; the robot's options only shrink (a closed cell
     * removes moves, and without slips a closure never removes a disturbance outcome), so a mission that
     * is not guaranteed under momentary events is not guaranteed under lasting ones, and the highest
     * floor never rises. Common practice in adversarial modelling: a stronger adversary never helps
     * the other player.
     */
    @Property(tries = 1500)
    void withoutSlips_lastingNeverTurnsNotGuaranteedIntoGuaranteed(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, false);
        Mission momentary = m.withDoorsAndBlockages(EventDuration.MOMENTARY);
        Mission lasting = m.withDoorsAndBlockages(EventDuration.REST_OF_MISSION);
        ReserveAnalysis a = ReserveSolver.analyse(momentary, ReserveOptions.defaults());
        ReserveAnalysis b = ReserveSolver.analyse(lasting, ReserveOptions.defaults());
        String why = LastingMissions.describe(lasting);
        if (!a.guaranteed()) {
            assertThat(b.guaranteed()).as(why).isFalse();
        }
        assertThat(b.highestGuaranteedReserveUnits().orElse(-1)).as(why)
                .isLessThanOrEqualTo(a.highestGuaranteedReserveUnits().orElse(-1));
        boolean differs = a.guaranteed() != b.guaranteed()
                || a.highestGuaranteedReserveUnits().orElse(-1) != b.highestGuaranteedReserveUnits().orElse(-1);
        Statistics.label("lasting is worse").collect(differs);
        Statistics.label("lasting is worse").coverage(c -> c.check(true).percentage(p -> p >= 3));
    }

    /** With budget 0 nothing can happen, so lasting and momentary readings are the same game. */
    @Property(tries = 500)
    void budgetZero_lastingAndMomentaryAreIdentical(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true).withBudget(0);
        ReserveAnalysis a = ReserveSolver.analyse(m.withDoorsAndBlockages(EventDuration.MOMENTARY), ReserveOptions.defaults());
        ReserveAnalysis b = ReserveSolver.analyse(m.withDoorsAndBlockages(EventDuration.REST_OF_MISSION),
                ReserveOptions.defaults());
        assertThat(b.guaranteed()).isEqualTo(a.guaranteed());
        assertThat(b.highestGuaranteedReserveUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        assertThat(b.worstCaseMinimumUnits()).isEqualTo(a.worstCaseMinimumUnits());
        assertThat(b.arena().vertexCount()).isEqualTo(a.arena().vertexCount());
        assertThat(b.arena().edgeCount()).isEqualTo(a.arena().edgeCount());
        assertThat(b.policy().map(Policy::entries)).isEqualTo(a.policy().map(Policy::entries));
    }
}
