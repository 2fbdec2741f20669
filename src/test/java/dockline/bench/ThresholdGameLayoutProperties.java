package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.RandomGameArenas;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.solve.discounted.DiscountedValueIteration;
import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

/**
 * {@link DiscountedThresholdGame}'s own layout (per-arena-vertex chains with an overflow table,
 * memoised comparator steps, arrays that start at the arena's size and grow, private actions not
 * indexed, or every pair indexed) gives the same answer
 * as value iteration, an independent computation ({@link DiscountedValueIteration#decide}: the
 * optimal value by value iteration, then compared; discounted games have optimal positional
 * strategies for both players, Shapley 1953 and Zwick &amp; Paterson 1996, so the robot can force
 * {@code DS R v} iff {@code val R v}).
 *
 * <p>To reach the overflow table and the growth paths on small arenas, the comparator is given a
 * weight bound above the arena's largest weight (still a sound bound, so the answer must not change)
 * and thresholds with denominators up to 400: many comparator states then meet on one arena vertex,
 * and the product is larger than the arena. The coverage checks make sure those paths are taken.
 */
class ThresholdGameLayoutProperties {

    @Property(tries = 400)
    void widerComparator_manyStatesPerVertex_sameAnswerAsValueIteration(
            @ForAll long seed,
            @ForAll @IntRange(min = 2, max = 4) int d,
            @ForAll @IntRange(min = 1, max = 8) int robots,
            @ForAll @IntRange(min = 0, max = 4) int mu,
            @ForAll @IntRange(min = 0, max = 12) int extraBound,
            @ForAll @IntRange(min = 1, max = 400) int q,
            @ForAll boolean strict) {
        Random rnd = new Random(seed);
        Arena a = RandomGameArenas.arena(rnd, robots, mu);
        int bound = a.maxAbsWeight() + extraBound;
        long span = 2L * Math.max(1, a.maxAbsWeight()) * q;
        Rational v = Rational.of(rnd.nextLong(2 * span + 1) - span, q);
        Relation rel = strict ? Relation.ABOVE : Relation.AT_LEAST;
        DiscountedThresholdGame game = DiscountedThresholdGame.build(a, new DiscountedComparator(d, bound, v, rel));
        boolean byValueIteration = new DiscountedValueIteration(a, d).decide(v, rel).holds();
        assertThat(game.robotWins()).as("v=%s %s, d=%d, comparator bound %d", v, rel.symbol(), d, bound)
                .isEqualTo(byValueIteration);
        // every pair indexed (the way for arenas whose actions are shared): the same answer and product
        DiscountedThresholdGame indexed = DiscountedThresholdGame.build(a, new DiscountedComparator(d, bound, v, rel), false);
        assertThat(indexed.robotWins()).as("every pair indexed").isEqualTo(byValueIteration);
        assertThat(indexed.vertexCount()).isEqualTo(game.vertexCount());
        assertThat(indexed.edgeCount()).isEqualTo(game.edgeCount());
        // asking twice gives the same answer (robotWins does not change the game)
        assertThat(game.robotWins()).isEqualTo(byValueIteration);
        Statistics.label("overflow table used").collect(game.overflowPairs() > 0);
        Statistics.label("product larger than the arena").collect(game.vertexCount() > a.vertexCount() + 3);
        Statistics.label("private actions").collect(DiscountedThresholdGame.privateActions(a));
        Statistics.label("private actions").coverage(c -> c.check(true).percentage(p -> p >= 50));
        Statistics.label("overflow table used").coverage(c -> c.check(true).percentage(p -> p >= 5));
        Statistics.label("product larger than the arena").coverage(c -> c.check(true).percentage(p -> p >= 5));
    }

    @Example
    void weightAboveTheComparatorsBound_isRejected() {
        Arena a = RandomGameArenas.arena(new Random(11), 4, 3);
        int w = a.maxAbsWeight();
        assertThat(w).isPositive();
        // the bound mu is what makes the comparator's early verdicts sound (missions/README.md, "The
        // discounted objective"), so a
        // weight above it must not be read, memoised or not
        assertThatThrownBy(() -> DiscountedThresholdGame.build(a, new DiscountedComparator(2, w - 1, Rational.of(0, 1),
                Relation.AT_LEAST))).isInstanceOf(IllegalArgumentException.class);
    }
}
