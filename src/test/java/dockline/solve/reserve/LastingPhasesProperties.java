package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.solve.ProductOptions;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * {@link PhasedLastingSolver} (closure phases built only where the strengthened game's strategy relies on
 * them, a closure into a left-out phase counted as won, refined until that strategy meets none or the start
 * is lost) against {@link LastingBruteForce}, the separately written
 * explicit-state oracle with closure sets and per-rule counts, on random tiny maps with lasting and momentary
 * doors and blockages, at-most limits, slips and budgets 0-3: the same verdict at the mission's floor and at
 * the brute force's highest floor and one above it. A guaranteed policy of the restricted game must pass the
 * independent certificate checker on the mission's whole arena (every closure phase present).
 */
class LastingPhasesProperties {

    @Property(tries = 2000)
    void phasedVerdict_matchesTheBruteForce_andItsPolicyIsCertifiedOnTheWholeArena(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        LastingBruteForce oracle = new LastingBruteForce(m);
        int highest = oracle.highestFloor();
        String why = LastingMissions.describe(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ProductOptions po = ProductOptions.defaults();
        int rounds = 0;
        boolean partial = false;
        for (int floor : floors(m, highest)) {
            boolean expected = highest >= floor;
            ReserveMonitor mon = new ReserveMonitor(floor, m.capacityUnits(), m.startUnits());
            PhasedLastingSolver.Result r = PhasedLastingSolver.solve(m, goal, mon, po);
            assertThat(r.startWon()).as("verdict at floor %d\n%s", floor, why).isEqualTo(expected);
            rounds = Math.max(rounds, r.rounds());
            partial |= r.keptStates() < r.totalStates();
            if (r.startWon() && r.game().start() >= 0) {
                Policy p = r.game().policy(r.strategy());
                Certificate c = CertificateChecker.check(ArenaCompiler.compile(m), p, floor);
                assertThat(c.ok()).as("certificate on the whole arena at floor %d: %s\n%s", floor, c.reason(), why)
                        .isTrue();
                assertThat(c.worstMinimumUnits()).isEqualTo(r.game().worstCaseMinimum(r.strategy()));
            }
        }
        Statistics.label("refined (more than one round)").collect(rounds > 1);
        Statistics.label("guaranteed at the mission's floor").collect(highest >= m.reserveUnits());
        Statistics.label("some phase left out").collect(partial);
        Statistics.label("lasting rule with budget").collect(m.map().disturbances().anyLasting()
                && m.map().disturbances().budget() > 0);
        Statistics.label("refined (more than one round)").coverage(c -> c.check(true).percentage(p -> p >= 5));
        Statistics.label("some phase left out").coverage(c -> c.check(true).percentage(p -> p >= 10));
    }

    /**
     * The two abstractions of one round on their own, against {@link LastingBruteForce}: with only the phases
     * without closures compiled, the game with every left-out closure lost (weakened) may only win where the
     * mission is won, and the game with every left-out closure won (strengthened) may only lose where it is
     * lost, at the mission's floor, at the oracle's highest floor and one above it.
     */
    @Property(tries = 1000)
    void weakenedWinsAndStrengthenedLossesAreReal(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        int highest = new LastingBruteForce(m).highestFloor();
        String why = LastingMissions.describe(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        DisturbanceStates st = ArenaCompiler.states(m);
        boolean[] keep = LastingMissions.basePhase(st);
        boolean partial = LastingMissions.leavesOut(keep);
        Arena base = ArenaCompiler.compileWithin(m, st, keep);
        boolean apart = false;
        for (int floor : floors(m, highest)) {
            boolean expected = highest >= floor;
            ReserveMonitor mon = new ReserveMonitor(floor, m.capacityUnits(), m.startUnits());
            boolean weak = new ImplicitReserveGame(base, goal, mon, false).solve(false).startWon();
            boolean strong = new ImplicitReserveGame(base, goal, mon, true).solve(false).startWon();
            if (weak) {
                assertThat(expected).as("weakened game won at floor %d, mission lost\n%s", floor, why).isTrue();
            }
            if (!strong) {
                assertThat(expected).as("strengthened game lost at floor %d, mission won\n%s", floor, why).isFalse();
            }
            apart |= weak != strong;
        }
        Statistics.label("some phase left out").collect(partial);
        Statistics.label("weakened and strengthened differ").collect(apart);
        Statistics.label("weakened and strengthened differ").coverage(c -> c.check(true).percentage(p -> p >= 5));
    }

    /** The floors tried: the mission's, the oracle's highest and one above it, those the mission allows. */
    private static int[] floors(Mission m, int highest) {
        return java.util.stream.IntStream.of(m.reserveUnits(), Math.max(0, highest), highest + 1)
                .filter(f -> f <= m.startUnits() && f <= m.capacityUnits()).toArray();
    }
}
