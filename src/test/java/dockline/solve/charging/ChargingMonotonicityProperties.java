package dockline.solve.charging;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.RandomMissions;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

/**
 * Monotonicity of the charging route on random tiny missions. Oracle: the game's own order (common
 * practice for games with a consumable resource): a higher starting charge and a lower floor only widen
 * the robot's options, since min(capacity, level + delta) is monotone in the level and a lower floor
 * loses later; so a higher start never loses and a lower floor never loses, and the reported lowest start
 * and highest floor are exactly where the verdict turns.
 */
class ChargingMonotonicityProperties {

    @Property(tries = 1500)
    void higherStartAndLowerFloorNeverLose(@ForAll long seed, @ForAll @IntRange(min = 0, max = 12) int f,
                                           @ForAll @IntRange(min = 0, max = 12) int s) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        ChargingSolver solver = new ChargingSolver(arena, GoalAutomaton.of(m));
        int cap = m.capacityUnits();
        int floor = Math.min(f, cap);
        int start = Math.min(s, cap);
        ChargingRoute.Analysis a = ChargingRoute.analyse(solver, cap, floor, start);
        Statistics.label("guaranteed").collect(a.guaranteed());
        Statistics.label("guaranteed").coverage(c -> c.check(true).percentage(p -> p > 10));
        if (start < cap) {
            boolean higher = ChargingRoute.analyse(solver, cap, floor, start + 1).guaranteed();
            assertThat(!a.guaranteed() || higher).as("a higher start lost\n%s", RandomMissions.describe(m)).isTrue();
        }
        if (floor > 0) {
            boolean lower = ChargingRoute.analyse(solver, cap, floor - 1, start).guaranteed();
            assertThat(!a.guaranteed() || lower).as("a lower floor lost\n%s", RandomMissions.describe(m)).isTrue();
        }
        // the lowest start and the highest floor are where the verdict turns
        a.lowestStartUnits().ifPresent(low -> {
            assertThat(ChargingRoute.analyse(solver, cap, floor, low).guaranteed()).isTrue();
            if (low > floor) {
                assertThat(ChargingRoute.analyse(solver, cap, floor, low - 1).guaranteed()).isFalse();
            }
        });
        a.highestFloorUnits().ifPresent(hf -> {
            assertThat(ChargingRoute.analyse(solver, cap, hf, start).guaranteed()).isTrue();
            if (hf < start) {
                assertThat(ChargingRoute.analyse(solver, cap, hf + 1, start).guaranteed()).isFalse();
            }
        });
        assertThat(a.guaranteed()).isEqualTo(a.lowestStartUnits().isPresent() && a.lowestStartUnits().getAsInt() <= start
                && start >= floor);
    }

    /**
     * Fewer disturbances never lose, and the highest floor and the lowest start only get better with a smaller
     * budget (the building has fewer choices);  Oracle: the route's own answers compared across budgets, each from its own
     * compiled arena.
     */
    @Property(tries = 1500)
    void smallerBudgetNeverLoses(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        int k = m.map().disturbances().budget();
        Statistics.label("budget").collect(k);
        Statistics.label("budget").coverage(c -> c.check(2).count(n -> n > 100));
        if (k == 0) {
            return;
        }
        ChargingRoute.Analysis a = ChargingRoute.analyse(m);
        ChargingRoute.Analysis b = ChargingRoute.analyse(m.withBudget(k - 1));
        String why = RandomMissions.describe(m);
        assertThat(!a.guaranteed() || b.guaranteed()).as("a smaller budget lost\n%s", why).isTrue();
        assertThat(b.highestFloorUnits().orElse(-1)).as(why).isGreaterThanOrEqualTo(a.highestFloorUnits().orElse(-1));
        if (a.lowestStartUnits().isPresent()) {
            assertThat(b.lowestStartUnits()).as(why).isPresent();
            assertThat(b.lowestStartUnits().getAsInt()).as(why).isLessThanOrEqualTo(a.lowestStartUnits().getAsInt());
        }
        Statistics.label("budget matters").collect(a.guaranteed() != b.guaranteed()
                || !a.highestFloorUnits().equals(b.highestFloorUnits()));
        Statistics.label("budget matters").coverage(c -> c.check(true).count(n -> n >= 15));
    }
}
