package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Rational;
import dockline.model.Relation;
import org.junit.jupiter.api.Test;

/**
 * The benchmark rows are correct, not fast (no timing is asserted): on every instance the
 * comparator route and the optimisation route give the same answer, and at each instance's exact
 * optimum with {@code >=} that answer is "yes" (the robot can reach its own optimal value, as
 * optimal positional strategies exist; Shapley 1953).
 */
class DiscountedBenchTest {

    @Test
    void rows_agree_andTheOptimumIsReachable() {
        for (DiscountedBench.Row r : DiscountedBench.run(3, 5, 8)) {
            assertThat(r.sameAnswer()).as("%s", r).isTrue();
            assertThat(r.comparatorAnswer()).as("%s", r).isTrue();
            assertThat(r.productVertices()).isPositive();
        }
    }

    @Test
    void fixedThreshold_rowsAgree() {
        for (Relation rel : Relation.values()) {
            for (DiscountedBench.Row r : DiscountedBench.run(new int[] {4, 6}, 3, Rational.of(-7, 5), rel)) {
                assertThat(r.sameAnswer()).as("%s", r).isTrue();
            }
        }
    }
}
