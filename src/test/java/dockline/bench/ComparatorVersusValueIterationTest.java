package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.RandomGameArenas;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.solve.RandomArenas;
import dockline.solve.TinyProductGame;
import dockline.solve.discounted.DiscountedValueIteration;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * Two independent routes to the same threshold question on random arenas without the dock goal:
 * the comparator product (safety game for {@code >=}, reachability game for {@code >}, solved by a
 * naive fixpoint, {@link TinyProductGame}; and the same question built by
 * {@link DiscountedThresholdGame} and solved by the linear-time attractor) against the optimisation
 * baseline (value iteration, then compare). All must agree with each other and with the exact value; discounted games have optimal
 * positional strategies for both players (Shapley 1953; Zwick & Paterson 1996), so the robot can
 * force {@code DS >= v} iff {@code val >= v} and {@code DS > v} iff {@code val > v}.
 */
class ComparatorVersusValueIterationTest {

    @Property(tries = 300)
    void onGridMaps_comparatorProduct_agreesWithValueIteration(@ForAll long seed,
                                                                @ForAll @IntRange(min = 2, max = 4) int d) {
        check(RandomArenas.arena(seed, 4, 3), d, seed);
    }

    @Property(tries = 300)
    void onAbstractGames_comparatorProduct_agreesWithValueIteration(@ForAll long seed,
                                                                     @ForAll @IntRange(min = 2, max = 4) int d,
                                                                     @ForAll @IntRange(min = 1, max = 8) int robots,
                                                                     @ForAll @IntRange(min = 0, max = 4) int mu) {
        check(RandomGameArenas.arena(new Random(seed), robots, mu), d, seed);
    }

    private static void check(Arena a, int d, long seed) {
        DiscountedValueIteration vi = new DiscountedValueIteration(a, d);
        Rational val = vi.solve().exactValue();
        int mu = a.maxAbsWeight();
        for (Rational v : thresholds(val, mu, new Random(seed ^ d))) {
            for (Relation rel : Relation.values()) {
                boolean expected = rel == Relation.AT_LEAST ? val.compareTo(v) >= 0 : val.compareTo(v) > 0;
                boolean byProduct = TinyProductGame.robotWinsWithoutGoal(a,
                        new DiscountedComparator(d, mu, v, rel), rel == Relation.AT_LEAST);
                boolean byIteration = vi.decide(v, rel).holds();
                boolean byAttractor = DiscountedThresholdGame.build(a, new DiscountedComparator(d, mu, v, rel)).robotWins();
                assertThat(byAttractor).as("linear-time attractor, val=%s v=%s %s", val, v, rel.symbol()).isEqualTo(expected);
                assertThat(byProduct).as("comparator, val=%s v=%s %s", val, v, rel.symbol()).isEqualTo(expected);
                assertThat(byIteration).as("value iteration, val=%s v=%s %s", val, v, rel.symbol()).isEqualTo(expected);
            }
        }
    }

    /** The value itself (ties), just above and below it, and two anywhere in the range, q up to 60. */
    static List<Rational> thresholds(Rational val, int mu, Random rnd) {
        List<Rational> out = new ArrayList<>();
        out.add(val);
        out.add(val.add(Rational.of(1, 2L * val.den())));
        out.add(val.subtract(Rational.of(1, 3L * val.den())));
        for (int i = 0; i < 2; i++) {
            int q = 1 + rnd.nextInt(60);
            long span = 2L * Math.max(mu, 1) * q;
            out.add(Rational.of(rnd.nextLong(2 * span + 1) - span, q));
        }
        return out;
    }
}
