package dockline.margin;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.BruteForce;
import dockline.fixtures.RandomMissions;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import java.util.OptionalInt;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

class MarginsProperties {

    @Provide
    Arbitrary<Mission> missions() {
        return RandomMissions.missions();
    }

    /**
     * The two methods agree with each other, and with the brute-force attractor on the explicit game
     * (Grädel, Thomas, Wilke 2002, ch. 2) run for every floor and start level.
     */
    @Property(tries = 150)
    void bisectionAndFixpoint_agree_andMatchBruteForce(@ForAll("missions") Mission m) {
        MarginReport r = Margins.compute(m, ProductOptions.defaults());
        assertThat(r.agree()).as("%s", r).isTrue();
        Arena a = ArenaCompiler.compile(m);
        int start = m.startUnits();
        int high = -1;
        for (int f = 0; f <= start; f++) {
            if (new BruteForce(m, f).needAtStart() <= start) {
                high = f;
            }
        }
        int need = new BruteForce(m, m.reserveUnits()).needAtStart();
        assertThat(r.fixpoint().highestReserveUnits()).isEqualTo(high < 0 ? OptionalInt.empty() : OptionalInt.of(high));
        assertThat(r.fixpoint().lowestStartUnits())
                .isEqualTo(need == Integer.MAX_VALUE ? OptionalInt.empty() : OptionalInt.of(need));
        assertThat(r.guaranteed()).isEqualTo(need <= start);
        Statistics.collect(r.guaranteed() ? "guaranteed" : "not guaranteed, " + r.suggestions().size() + " suggestions");
    }

    /**
     * Each suggestion works and is the smallest of its kind. Oracle: the brute-force attractor on
     * the explicit game for the changed mission and for one step less.
     */
    @Property(tries = 150)
    void suggestions_workAndAreMinimal(@ForAll("missions") Mission m) {
        if (new BruteForce(m, m.reserveUnits()).needAtStart() <= m.startUnits()) {
            assertThat(Suggestions.find(m)).isEmpty();
            return;
        }
        for (Suggestion s : Suggestions.find(m)) {
            Statistics.collect(s.kind().word());
            switch (s.kind()) {
                case START_CHARGE -> {
                    assertThat(wins(m, m.reserveUnits(), s.to(), -1)).isTrue();
                    assertThat(wins(m, m.reserveUnits(), s.to() - 1, -1)).isFalse();
                }
                case RESERVE_FLOOR -> {
                    assertThat(wins(m, s.to(), m.startUnits(), -1)).isTrue();
                    assertThat(wins(m, s.to() + 1, m.startUnits(), -1)).isFalse();
                }
                case BUDGET -> {
                    assertThat(wins(m, m.reserveUnits(), m.startUnits(), s.to())).isTrue();
                    assertThat(wins(m, m.reserveUnits(), m.startUnits(), s.to() + 1)).isFalse();
                }
            }
        }
    }

    private static boolean wins(Mission m, int floor, int start, int budget) {
        Mission v = budget >= 0 ? m.withBudget(budget) : m;
        return start >= floor && new BruteForce(v, floor).needAtStart() <= start;
    }
}
