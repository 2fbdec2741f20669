package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.RandomGameArenas;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.solve.discounted.DiscountedValueIteration;
import java.util.Random;
import net.jqwik.api.Assume;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

/**
 * {@link ImplicitDiscountedGame} (robot pairs only, disturbance pairs and edges generated from the
 * arena, predecessors by inverting the comparator's step) against two other computations: value
 * iteration ({@link DiscountedValueIteration#decide}, an independent optimisation: discounted games
 * have optimal positional strategies for both players, Shapley 1953 and Zwick &amp; Paterson 1996,
 * so the robot can force {@code DS R v} iff {@code val R v}), and the stored product
 * ({@link DiscountedThresholdGame}), whose vertex and edge counts it must match exactly.
 *
 * <p>As in ThresholdGameLayoutProperties, a comparator bound above the arena's largest weight and
 * denominators up to 400 put many comparator states on one arena vertex, so that chains overflow and
 * the pair arrays grow on small arenas; the thresholds near the optimal value make the attractor
 * deep, so that joins told backward (the inverted steps) decide the answer rather than the seeds.
 */
class ImplicitDiscountedGameProperties {

    @Property(tries = 500)
    void sameAnswerAsValueIteration_sameProductAsStored(
            @ForAll long seed,
            @ForAll @IntRange(min = 2, max = 4) int d,
            @ForAll @IntRange(min = 1, max = 8) int robots,
            @ForAll @IntRange(min = 0, max = 4) int mu,
            @ForAll @IntRange(min = 0, max = 12) int extraBound,
            @ForAll @IntRange(min = 1, max = 400) int q,
            @ForAll boolean strict,
            @ForAll boolean nearValue,
            @ForAll boolean shuffledActions) {
        Random rnd = new Random(seed);
        // shuffled: the actions are not numbered by their robot edges, so the owner is found by the in-edge
        Arena a = shuffledActions ? RandomGameArenas.arenaWithShuffledActions(rnd, robots, mu)
                : RandomGameArenas.arena(rnd, robots, mu);
        Assume.that(ImplicitDiscountedGame.applicable(a));
        int bound = a.maxAbsWeight() + extraBound;
        Rational v;
        if (nearValue) {
            // the exact optimal value, nudged by -1/q, 0 or +1/q: answers on both sides of the knife's edge
            Rational val = new DiscountedValueIteration(a, d).solve().exactValue();
            Rational nudge = Rational.of(rnd.nextInt(3) - 1, q);
            v = val.add(nudge);
        } else {
            long span = 2L * Math.max(1, a.maxAbsWeight()) * q;
            v = Rational.of(rnd.nextLong(2 * span + 1) - span, q);
        }
        Relation rel = strict ? Relation.ABOVE : Relation.AT_LEAST;
        boolean byValueIteration = new DiscountedValueIteration(a, d).decide(v, rel).holds();
        ImplicitDiscountedGame implicit = ImplicitDiscountedGame.solve(a, new DiscountedComparator(d, bound, v, rel));
        assertThat(implicit.robotWins()).as("v=%s %s, d=%d, comparator bound %d", v, rel.symbol(), d, bound)
                .isEqualTo(byValueIteration);
        DiscountedThresholdGame stored = DiscountedThresholdGame.build(a, new DiscountedComparator(d, bound, v, rel));
        if (implicit.stoppedEarly()) {
            // decided on the way: only part of the product explored
            assertThat(implicit.vertexCount()).as("product vertices").isLessThanOrEqualTo(stored.vertexCount());
            assertThat(implicit.edgeCount()).as("product edges").isLessThanOrEqualTo(stored.edgeCount());
        } else {
            assertThat(implicit.vertexCount()).as("product vertices").isEqualTo(stored.vertexCount());
            assertThat(implicit.edgeCount()).as("product edges").isEqualTo(stored.edgeCount());
            assertThat(implicit.comparatorStates()).isEqualTo(stored.comparatorStates());
        }
        Statistics.label("answer").collect(byValueIteration);
        Statistics.label("decided by the backward search").collect(implicit.joinedRobotPairs() > 1);
        Statistics.label("stopped early").collect(implicit.stoppedEarly());
        Statistics.label("actions numbered by edge").collect(a.actionsByEdge());
        Statistics.label("actions numbered by edge").coverage(c -> {
            c.check(true).percentage(p -> p >= 20);
            c.check(false).percentage(p -> p >= 20);
        });
        Statistics.label("many states on one vertex").collect(stored.overflowPairs() > 0);
        Statistics.label("answer").coverage(c -> {
            c.check(true).percentage(p -> p >= 20);
            c.check(false).percentage(p -> p >= 20);
        });
        Statistics.label("decided by the backward search").coverage(c -> c.check(true).percentage(p -> p >= 20));
        Statistics.label("many states on one vertex").coverage(c -> c.check(true).percentage(p -> p >= 3));
        Statistics.label("stopped early").coverage(c -> {
            c.check(true).percentage(p -> p >= 10);
            c.check(false).percentage(p -> p >= 10);
        });
    }

    /**
     * Generated buildings (hundreds of robot vertices, so dozens of bitmap words): the sweeps in both
     * directions, the look-back and joins told across rows are taken here, which the small random
     * arenas above (one bitmap word) never reach. Thresholds at, just below and just above the exact
     * optimal value, and a few units away, for both relations, against value iteration.
     */
    @Property(tries = 24)
    void generatedBuildings_sweepsAndLookBack_sameAnswerAsValueIteration(
            @ForAll @IntRange(min = 0, max = 1000) int seed,
            @ForAll @IntRange(min = 0, max = 2) int budget,
            @ForAll @IntRange(min = -2, max = 2) int offset,
            @ForAll boolean strict) {
        Arena a = ArenaCompiler.compile(dockline.bench.MissionGenerator.generate(
                dockline.bench.BuildingGenerator.generate(32, seed, budget),
                dockline.bench.MissionSpec.consumptionOnly(budget), seed));
        Assume.that(ImplicitDiscountedGame.applicable(a));
        Rational val = new DiscountedValueIteration(a, 2).solve().exactValue();
        // offsets of 1/64 pin the knife's edge, 2 units leave it
        Rational v = Math.abs(offset) == 2 ? val.add(Rational.of(offset, 1)) : val.add(Rational.of(offset, 64));
        Relation rel = strict ? Relation.ABOVE : Relation.AT_LEAST;
        boolean expected = new DiscountedValueIteration(a, 2).decide(v, rel).holds();
        ImplicitDiscountedGame g = ImplicitDiscountedGame.solve(a, new DiscountedComparator(2, a.maxAbsWeight(), v, rel));
        assertThat(g.robotWins()).as("seed %d, K %d, DS %s %s", seed, budget, rel.symbol(), v).isEqualTo(expected);
        assertThat(a.robotCount()).isGreaterThan(64 * 8);
        Statistics.label("answer").collect(expected);
        Statistics.label("answer").coverage(c -> {
            c.check(true).percentage(p -> p >= 15);
            c.check(false).percentage(p -> p >= 15);
        });
    }

    @Example
    void generatedFloors_agreeWithValueIterationAndTheStoredProduct() {
        for (int size : new int[] {4, 8, 12}) {
            Arena a = ArenaCompiler.compile(DiscountedBench.instance(size, 0x5eedL + size));
            assertThat(ImplicitDiscountedGame.applicable(a)).isTrue();
            Rational val = new DiscountedValueIteration(a, 2).solve().exactValue();
            for (Rational v : new Rational[] {val, val.add(Rational.of(1, 64))}) {
                for (Relation rel : Relation.values()) {
                    boolean expected = new DiscountedValueIteration(a, 2).decide(v, rel).holds();
                    ImplicitDiscountedGame g = ImplicitDiscountedGame.solve(a,
                            new DiscountedComparator(2, a.maxAbsWeight(), v, rel));
                    assertThat(g.robotWins()).as("%dx%d, DS %s %s", size, size, rel.symbol(), v).isEqualTo(expected);
                    DiscountedThresholdGame stored = DiscountedThresholdGame.build(a,
                            new DiscountedComparator(2, a.maxAbsWeight(), v, rel));
                    if (!g.stoppedEarly()) {
                        assertThat(g.vertexCount()).isEqualTo(stored.vertexCount());
                        assertThat(g.edgeCount()).isEqualTo(stored.edgeCount());
                    }
                }
            }
        }
    }

    @Example
    void weightAboveTheComparatorsBound_isRejected() {
        Arena a = ArenaCompiler.compile(DiscountedBench.instance(4, 1));
        int w = a.maxAbsWeight();
        assertThat(w).isPositive();
        assertThatThrownBy(() -> ImplicitDiscountedGame.solve(a, new DiscountedComparator(2, w - 1, Rational.of(0, 1),
                Relation.AT_LEAST))).isInstanceOf(IllegalArgumentException.class);
    }
}
