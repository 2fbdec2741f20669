package dockline.monitor;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Rational;
import dockline.model.Relation;
import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * The pair monitor against its definition, the synchronous product of two deterministic automata
 * (Hopcroft, Motwani, Ullman, "Introduction to Automata Theory, Languages, and Computation", the
 * product construction for intersection): on every word, the pair rejects exactly when one side
 * rejects, and otherwise its components are the two sides' own states.
 */
class PairMonitorTest {

    @Property(tries = 300)
    void pair_runsBothSidesInLockstep(@ForAll long seed, @ForAll @IntRange(min = 2, max = 4) int d) {
        Random rnd = new Random(seed);
        int mu = 1 + rnd.nextInt(4);
        ReserveMonitor battery = new ReserveMonitor(rnd.nextInt(10), 30, 10 + rnd.nextInt(21));
        Rational v = Rational.of(rnd.nextInt(21) - 10, 1 + rnd.nextInt(12));
        Relation rel = rnd.nextBoolean() ? Relation.AT_LEAST : Relation.ABOVE;
        DiscountedComparator alone = new DiscountedComparator(d, mu, v, rel);
        PairMonitor pair = new PairMonitor(battery, new DiscountedComparator(d, mu, v, rel));
        int a = battery.initialState();
        int b = alone.initialState();
        int p = pair.initialState();
        for (int i = 0; i < 12; i++) {
            int w = rnd.nextInt(2 * mu + 1) - mu;
            a = a == Monitor.REJECT ? a : battery.step(a, w);
            b = b == Monitor.REJECT ? b : alone.step(b, w);
            p = pair.step(p, w);
            if (a == Monitor.REJECT || b == Monitor.REJECT) {
                assertThat(p).isEqualTo(Monitor.REJECT);
                return;
            }
            assertThat(pair.firstOf(p)).isEqualTo(a);
            // the second side is a separate instance: compare what the states mean, not their numbers
            assertThat(pair.second().describe(pair.secondOf(p))).isEqualTo(alone.describe(b));
            assertThat(pair.acceptsAtCompletion(p))
                    .isEqualTo(battery.acceptsAtCompletion(a) && alone.acceptsAtCompletion(b));
        }
    }

    @Example
    void batteryBelowTheFloorAtTheStart_rejectsAtOnce() {
        PairMonitor pair = new PairMonitor(new ReserveMonitor(10, 30, 5),
                new DiscountedComparator(2, 3, Rational.of(0), Relation.AT_LEAST));
        assertThat(pair.initialState()).isEqualTo(Monitor.REJECT);
    }
}
