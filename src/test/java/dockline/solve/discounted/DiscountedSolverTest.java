package dockline.solve.discounted;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.PairMonitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.RandomArenas;
import dockline.solve.TinyProductGame;
import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * The discounted solver with the tasks and the dock: the generic product and linear-time attractor
 * against the naive explicit product and fixpoint of {@link TinyProductGame} (two independent
 * implementations of the same game, Grädel, Thomas, Wilke 2002, ch. 2), and the worst-case score
 * of the winning strategy against the threshold it must meet.
 */
class DiscountedSolverTest {

    @Property(tries = 150)
    void verdict_matchesNaiveProduct(@ForAll long seed, @ForAll @IntRange(min = 2, max = 4) int d,
                                     @ForAll @IntRange(min = 1, max = 60) int q, @ForAll boolean keepReserve) {
        Random rnd = new Random(seed);
        Mission base = RandomArenas.mission(rnd, 4, 3, true);
        Arena arena = ArenaCompiler.compile(base);
        int mu = arena.maxAbsWeight();
        long span = 2L * Math.max(1, mu) * q;
        Rational v = Rational.of(rnd.nextLong(2 * span + 1) - span, q);
        // a reserve that sometimes binds: start 50 units, floor between 0 and 49
        Mission m = base.withReserve(dockline.model.Charge.wh(java.math.BigDecimal.valueOf(rnd.nextInt(50))));
        for (Relation rel : Relation.values()) {
            Objective.Discounted o = new Objective.Discounted(d, v, rel);
            DiscountedAnalysis got = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withKeepReserve(keepReserve));
            DiscountedComparator c = new DiscountedComparator(d, mu, v, rel);
            boolean expected = TinyProductGame.robotWinsWithGoal(arena,
                    keepReserve ? new PairMonitor(new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()), c) : c,
                    GoalAutomaton.of(m));
            assertThat(got.guaranteed()).as("v=%s %s reserve=%s", v, rel.symbol(), keepReserve).isEqualTo(expected);
            if (got.guaranteed()) {
                // the strategy's worst case must itself meet the threshold
                Rational worst = got.worstCaseScore().orElseThrow();
                int cmp = worst.compareTo(v);
                assertThat(rel == Relation.AT_LEAST ? cmp >= 0 : cmp > 0).as("worst %s vs %s", worst, v).isTrue();
            }
        }
    }

    @Property(tries = 100)
    void keepingTheReserve_onlyEverTakesGuaranteesAway(@ForAll long seed, @ForAll @IntRange(min = 2, max = 3) int d) {
        // the pair accepts a subset of what the comparator alone accepts (intersection of languages)
        Random rnd = new Random(seed);
        Mission m = RandomArenas.mission(rnd, 4, 3, true)
                .withReserve(dockline.model.Charge.wh(java.math.BigDecimal.valueOf(rnd.nextInt(50))));
        Objective.Discounted o = new Objective.Discounted(d, Rational.of(rnd.nextInt(9) - 6, 1 + rnd.nextInt(8)),
                Relation.AT_LEAST);
        boolean both = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults()).guaranteed();
        boolean scoreOnly = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withKeepReserve(false)).guaranteed();
        if (both) {
            assertThat(scoreOnly).isTrue();
        }
    }

    @Example
    void trapCorridor_guaranteedWithAPlanThatChargesThenDocks() {
        Mission m = DiscountedTrapExampleTest.corridor(Rational.of(3, 4));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withAlsoOptimise(true));
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.nominalPlan().get(0).kind()).isEqualTo(dockline.arena.ActionKind.CHARGE);
        assertThat(a.worstCaseScore().orElseThrow().compareTo(Rational.of(3, 4))).isGreaterThanOrEqualTo(0);
        DiscountedAnalysis.Baseline b = a.baseline().orElseThrow();
        assertThat(b.holds()).isTrue();
        assertThat(b.optimalValue()).contains(Rational.of(6));
        assertThat(b.optimalPlayCompletes()).contains(false);
    }
}
