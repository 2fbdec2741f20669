package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.BruteForce;
import dockline.fixtures.DiscountedPlayEnumerator;
import dockline.fixtures.RandomMissions;
import dockline.fixtures.ScoreGameBruteForce;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The discounted certificate on random small missions (invented data, {@link RandomMissions}) with
 * random discount factors, thresholds and relations.
 */
class DiscountedCertificateProperties {

    /** A random discounted objective for the mission; about half of them tight (see {@link #tight}). */
    static Objective.Discounted objective(Mission m, Random r) {
        int d = 2 + r.nextInt(2);
        Relation rel = r.nextBoolean() ? Relation.AT_LEAST : Relation.ABOVE;
        int mu = Math.max(1, ArenaCompiler.compile(m).maxAbsWeight());
        if (r.nextBoolean()) {
            Rational t = tight(m, d, r);
            if (t != null) {
                return new Objective.Discounted(d, t, rel);
            }
        }
        int q = 1 + r.nextInt(4);
        long lo = -2L * mu * q;
        long hi = (long) mu * q / 2;
        return new Objective.Discounted(d, Rational.of(lo + (long) r.nextInt((int) (hi - lo + 1)), q), rel);
    }

    /**
     * A threshold at, or one unit of 1/4 around, the worst score the solver's policy reaches when
     * the threshold is out of the way: there the score decides, not the tasks.
     */
    static Rational tight(Mission m, int d, Random r) {
        int mu = ArenaCompiler.compile(m).maxAbsWeight();
        Objective.Discounted loose = new Objective.Discounted(d, Rational.of(-(long) mu * d - 1), Relation.AT_LEAST);
        DiscountedAnalysis a = DiscountedSolver.analyse(m.withObjective(loose), loose, DiscountedOptions.defaults());
        if (!a.guaranteed() || a.worstCaseScore().isEmpty()) {
            return null;
        }
        return a.worstCaseScore().get().add(Rational.of(r.nextInt(3) - 1, 4));
    }

    /**
     * Oracles: (1) every guaranteed verdict must pass the independent certificate; (2) the
     * certificate's exact worst score equals the minimum over the closed loop's plays of the finite
     * discounted sum sum w_i / d^i, each play walked on its own by {@link DiscountedPlayEnumerator}
     * (the definition of the discounted sum, Zwick & Paterson, TCS 158, 1996, lambda = 1/d), and
     * the worst score the solver reports; (3) the verdict agrees with the naive explicit game
     * {@link ScoreGameBruteForce} (Grädel, Thomas, Wilke 2002, ch. 2) when the floor is kept.
     */
    @Property(tries = 300)
    void guaranteedVerdicts_areCertified_worstScoreMatchesPlayEnumeration(@ForAll long seed) {
        // the explicit game must decide most of the missions where the floor is kept
        Statistics.label("explicit game").coverage(c -> c.check("compared").percentage(p -> p > 80));
        Random r = new Random(seed);
        Mission base = RandomMissions.fromSeed(seed);
        Objective.Discounted o = objective(base, r);
        Mission m = base.withObjective(o);
        boolean keep = r.nextInt(4) > 0;
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withKeepReserve(keep));
        Arena arena = a.game().arena();
        Integer floor = keep ? m.reserveUnits() : null;
        if (keep) {
            try {
                ScoreGameBruteForce bf = new ScoreGameBruteForce(m, o, m.reserveUnits(), m.startUnits());
                assertThat(a.guaranteed()).as("verdict vs explicit game").isEqualTo(bf.robotWins());
                Statistics.label("explicit game").collect("compared");
            } catch (ScoreGameBruteForce.TooLarge e) {
                Statistics.label("explicit game").collect("too large");
            }
        }
        Statistics.label("verdict").collect(a.guaranteed() ? "guaranteed" : "not guaranteed");
        if (!a.guaranteed()) {
            return;
        }
        Policy p = DiscountedPolicies.of(a);
        Statistics.label("rows").collect(p.size() == 0 ? "0 (complete at the start)" : p.size() < 10 ? "1-9" : "10+");
        Statistics.label("secured rows").collect(p.entries().stream().anyMatch(x -> x.score().isSecured()));
        DiscountedCertificate c = DiscountedCertificateChecker.check(arena, p, o,
                keep ? OptionalInt.of(m.reserveUnits()) : OptionalInt.empty(), m.startUnits());
        assertThat(c.ok()).as(c.reason()).isTrue();
        ExactScore worst = c.worstScore().orElseThrow();
        a.worstCaseScore().ifPresent(s -> assertThat(worst.sameValue(s)).as("solver %s, certificate %s", s, worst).isTrue());
        int cmp = worst.compareTo(ExactScore.of(o.threshold()));
        assertThat(o.relation() == Relation.ABOVE ? cmp > 0 : cmp >= 0).isTrue();
        try {
            DiscountedPlayEnumerator.Result e = DiscountedPlayEnumerator.run(arena, p, o, floor, m.startUnits());
            assertThat(e.ok()).as(e.why()).isTrue();
            assertThat(e.worstIs(worst.num(), worst.den())).as("plays %s/%s, certificate %s", e.num(), e.den(), worst)
                    .isTrue();
            Statistics.label("plays").collect(e.plays() < 10 ? "<10" : e.plays() < 1000 ? "<1000" : ">=1000");
        } catch (DiscountedPlayEnumerator.TooManyPlays tooMany) {
            Statistics.label("plays").collect("too many to enumerate");
        }
    }

    /**
     * Oracle: the definition of a winning policy, checked play by play by {@link DiscountedPlayEnumerator}
     * (each play's finite discounted sum, a cycle when a play repeats a situation): on random, often
     * cyclic or failing policies the checker accepts exactly the policies whose every play completes
     * with its score meeting the threshold, and then its worst score is the minimum over the plays. The
     * loop's topological order must also agree with jgrapht's CycleDetector on a copy of the loop.
     */
    @Property(tries = 300)
    void randomPolicy_verdictAndWorstScore_matchPlayEnumeration(@ForAll long seed) {
        Random r = new Random(seed);
        Mission base = RandomMissions.fromSeed(seed);
        Objective.Discounted o = objective(base, r);
        Arena arena = ArenaCompiler.compile(base);
        boolean keep = r.nextBoolean();
        int floor = keep ? base.reserveUnits() : Integer.MIN_VALUE;
        int start = keep ? Math.max(base.reserveUnits(), base.startUnits()) : base.startUnits();
        Policy p = dockline.fixtures.RandomScoredPolicy.of(arena, o, floor, start, seed, 5_000);
        OptionalInt kept = keep ? OptionalInt.of(floor) : OptionalInt.empty();
        DiscountedClosedLoop loop = DiscountedCertificateChecker.closedLoop(arena, p, o, kept, start);
        DiscountedCertificate c = DiscountedCertificateChecker.certify(loop);
        if (loop.complete()) {
            org.jgrapht.Graph<Integer, org.jgrapht.graph.DefaultEdge> g =
                    new org.jgrapht.graph.DefaultDirectedGraph<>(org.jgrapht.graph.DefaultEdge.class);
            for (int v = 0; v < loop.nodeCount(); v++) {
                g.addVertex(v);
            }
            for (int v = 0; v < loop.nodeCount(); v++) {
                for (int s = loop.succBegin(v); s < loop.succEnd(v); s++) {
                    g.addEdge(v, loop.succNode(s));
                }
            }
            boolean cyclic = new org.jgrapht.alg.cycle.CycleDetector<>(g).detectCycles();
            assertThat(loop.topologicalOrder() == null).isEqualTo(cyclic);
            assertThat(loop.findCycle().isEmpty()).isEqualTo(!cyclic);
            Statistics.label("loop").collect(cyclic ? "cyclic" : "acyclic");
        }
        DiscountedPlayEnumerator.Result e;
        try {
            e = DiscountedPlayEnumerator.run(arena, p, o, keep ? floor : null, start);
        } catch (DiscountedPlayEnumerator.TooManyPlays tooMany) {
            Statistics.label("verdict").collect("too many plays to enumerate");
            return;
        }
        Statistics.label("verdict").collect(c.ok() ? "certified" : "rejected");
        assertThat(c.ok()).as("checker: %s; plays: %s", c.reason(), e.why()).isEqualTo(e.ok());
        if (c.ok()) {
            ExactScore worst = c.worstScore().orElseThrow();
            assertThat(e.worstIs(worst.num(), worst.den())).as("plays %s/%s, certificate %s", e.num(), e.den(), worst)
                    .isTrue();
        }
    }

    /**
     * Mutation test. Oracle: the naive explicit game {@link ScoreGameBruteForce} (Grädel, Thomas,
     * Wilke 2002, ch. 2) tells which actions lose a situation once the score counts, and the reserve
     * game {@link BruteForce} which still win without it. Take a certified policy, search for a row
     * and another legal action that loses with the score but would still finish safely on the battery
     * alone — an action that breaks the threshold — put it in, and the checker must reject the result.
     */
    @Property(tries = 250)
    void certifiedPolicy_withOneThresholdBreakingEntry_isRejected(@ForAll long seed) {
        // the mutation must happen often enough for the property to mean something
        Statistics.coverage(c -> c.check("mutated").count(n -> n >= 10));
        Random r = new Random(seed);
        Mission base = RandomMissions.fromSeed(seed);
        Objective.Discounted o = new Objective.Discounted(2 + r.nextInt(2), Rational.ZERO, Relation.AT_LEAST);
        Rational t = tight(base, o.discount(), r);
        if (t == null) {
            return;
        }
        o = new Objective.Discounted(o.discount(), t, r.nextBoolean() ? Relation.AT_LEAST : Relation.ABOVE);
        Mission m = base.withObjective(o);
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults());
        if (!a.guaranteed()) {
            Statistics.collect("not guaranteed");
            return;
        }
        Arena arena = a.game().arena();
        int floor = m.reserveUnits();
        int start = m.startUnits();
        Policy good = DiscountedPolicies.of(a);
        assertThat(DiscountedCertificateChecker.check(arena, good, o, OptionalInt.of(floor), start).ok()).isTrue();
        ScoreGameBruteForce game;
        try {
            game = new ScoreGameBruteForce(m, o, floor, start);
        } catch (ScoreGameBruteForce.TooLarge e) {
            Statistics.collect("explicit game too large");
            return;
        }
        BruteForce battery = new BruteForce(m, floor);
        List<PolicyEntry> entries = good.entries();
        int offset = r.nextInt(Math.max(1, entries.size()));
        for (int j = 0; j < entries.size(); j++) {
            int i = (offset + j) % entries.size();
            PolicyEntry e = entries.get(i);
            int x = game.situationOf(e);
            assertThat(x).as("row %s is a situation of the explicit game", e).isNotNegative();
            int v = arena.robotVertex(e.cell().index(arena.width()), e.budgetLeft());
            for (int re = arena.outBegin(v); re < arena.outEnd(v); re++) {
                int dv = arena.target(re);
                Action alt = arena.action(dv);
                if (alt.equals(e.action())) {
                    // the certified policy's own choice must win in the explicit game too
                    assertThat(game.actionWins(x, alt.kind().word(), alt.target())).as("row %s", e).isTrue();
                    continue;
                }
                if (game.actionWins(x, alt.kind().word(), alt.target())
                        || !winsOnTheBattery(arena, battery, dv, e, floor)) {
                    continue;
                }
                List<PolicyEntry> mutated = new ArrayList<>(entries);
                mutated.set(i, e.withAction(alt));
                DiscountedCertificate c = DiscountedCertificateChecker.check(arena, new Policy(mutated), o,
                        OptionalInt.of(floor), start);
                Statistics.collect("mutated");
                assertThat(c.ok()).as("row %s changed to %s", e, alt).isFalse();
                return;
            }
        }
        Statistics.collect("no threshold-breaking alternative");
    }

    /** Whether, after the action of dv, the robot still wins the reserve game (score ignored). */
    private static boolean winsOnTheBattery(Arena a, BruteForce bf, int dv, PolicyEntry e, int floor) {
        int cap = a.mission().capacityUnits();
        for (int f = a.outBegin(dv); f < a.outEnd(dv); f++) {
            int l = Math.min(cap, e.level() + a.weight(f));
            int u = a.target(f);
            int m2 = bf.book().step(e.progress(), a.cellOf(u));
            if (l < floor || m2 < 0 || !bf.wins(a.cellOf(u), a.budgetLeft(u), m2, l)) {
                return false;
            }
        }
        return true;
    }
}
