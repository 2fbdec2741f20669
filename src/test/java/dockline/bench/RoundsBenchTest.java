package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The patrol and deadline benchmark rows: they run on a generated floor, and the slope is least squares. */
class RoundsBenchTest {

    @Test
    void slope_ofAPowerLaw_isItsExponent() {
        // closed form: time = c · edges^1.25 on exact points gives a least-squares slope of exactly 1.25
        List<RoundsBench.Row> rows = List.of(new RoundsBench.Row(32, "patrol", 1, 1000, 3.0 * Math.pow(1000, 1.25), "g"),
                new RoundsBench.Row(48, "patrol", 1, 4000, 3.0 * Math.pow(4000, 1.25), "g"),
                new RoundsBench.Row(64, "patrol", 1, 9000, 3.0 * Math.pow(9000, 1.25), "g"));
        assertThat(RoundsBench.slope(rows, "patrol")).isCloseTo(1.25, within(1e-9));
        assertThat(RoundsBench.slope(rows, "deadline")).isNaN();
    }

    @Test
    void deadlineRow_runsOnTheSmallestFloor() {
        List<RoundsBench.Row> rows = RoundsBench.run(List.of(32), List.of("deadline"), 7, 2, 1, 1L << 31, s -> { });
        assertThat(rows).hasSize(1);
        assertThat(rows.get(0).edges()).isPositive();
        assertThat(rows.get(0).verdict()).isIn("guaranteed", "not-guaranteed");
        assertThat(rows.get(0).instance()).isEqualTo("deadline");
        assertThat(RoundsBench.table(rows, List.of("deadline"))).contains("| 32² | deadline |");
    }
}
