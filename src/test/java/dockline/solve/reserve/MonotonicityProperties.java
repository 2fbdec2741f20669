package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Charge;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import java.math.BigDecimal;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * Monotonicity of the threshold question (README.md, "How it decides"): a fuller battery stays at least as full
 * after any step (saturation included), a lower floor rejects fewer plays, and a smaller budget K
 * leaves the disturbance a subset of its plays. So none of these changes may turn "guaranteed" into
 * "not guaranteed".
 */
class MonotonicityProperties {

    private static boolean guaranteed(Mission m) {
        return ReserveSolver.guaranteed(m, ProductOptions.defaults());
    }

    @Property(tries = 300)
    void moreStartingCharge_neverLosesTheGuarantee(@ForAll long seed, @ForAll @IntRange(min = 1, max = 6) int more) {
        Mission m = RandomMissions.tiny(seed);
        Mission fuller = m.withStartCharge(Charge.wh(m.startCharge().amount().add(BigDecimal.valueOf(more))));
        if (guaranteed(m)) {
            assertThat(guaranteed(fuller)).as(RandomMissions.describe(m)).isTrue();
        }
    }

    @Property(tries = 300)
    void lowerFloor_neverLosesTheGuarantee(@ForAll long seed, @ForAll @IntRange(min = 1, max = 6) int less) {
        Mission m = RandomMissions.tiny(seed);
        BigDecimal r = m.reserve().amount().subtract(BigDecimal.valueOf(less)).max(BigDecimal.ZERO);
        if (guaranteed(m)) {
            assertThat(guaranteed(m.withReserve(Charge.wh(r)))).as(RandomMissions.describe(m)).isTrue();
        }
    }

    @Property(tries = 300)
    void smallerBudget_neverLosesTheGuarantee(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed).withBudget(2);
        boolean[] g = new boolean[3];
        for (int k = 0; k <= 2; k++) {
            g[k] = guaranteed(m.withBudget(k));
        }
        assertThat(!g[2] || g[1]).as(RandomMissions.describe(m)).isTrue();
        assertThat(!g[1] || g[0]).as(RandomMissions.describe(m)).isTrue();
    }

    @Property(tries = 300)
    void highestReserve_isTheThresholdOfTheVerdict(@ForAll long seed) {
        // the verdict at every floor f is "f <= highest": bisection relies on it, checked here floor by floor
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        int highest = a.highestGuaranteedReserveUnits().orElse(-1);
        for (int f = 0; f <= m.capacityUnits(); f++) {
            Mission at = m.withReserve(Charge.wh(BigDecimal.valueOf(f)));
            assertThat(guaranteed(at)).as("floor %d, highest %d\n%s", f, highest, RandomMissions.describe(m))
                    .isEqualTo(f <= highest);
        }
    }
}
