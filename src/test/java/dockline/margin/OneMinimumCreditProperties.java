package dockline.margin;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.RandomMissions;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The margins' minimum-credit figures did not change when the fixpoint over energy levels
 * ({@link MinimumCredit}, now test code) was replaced by the charging route's one pass
 * ({@link FixpointMargins}): on random tiny missions with charging, saturation and disturbances, the lowest
 * start at the mission's floor and the highest floor from its start are the old fixpoint's (the highest floor
 * by scanning every floor with it). Oracle: the old fixpoint, in the style of the minimum-initial-credit
 * iteration of Brim, Chaloupka, Doyen, Gentilini and Raskin (2011).
 */
class OneMinimumCreditProperties {

    @Property(tries = 1500)
    void marginsOfTheOnePass_areThoseOfTheOldFixpoint(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int floor = Math.min(m.reserveUnits(), m.capacityUnits());
        int start = m.startUnits();
        FixpointMargins.Both both = FixpointMargins.both(arena, goal, floor, start);
        int need = MinimumCredit.solve(arena, goal, floor).needAtStart();
        int oldLowest = need == MinimumCredit.INFINITE ? -1 : need;
        int oldHighest = -1;
        for (int f = start; f >= 0 && oldHighest < 0; f--) {
            if (MinimumCredit.solve(arena, goal, f).needAtStart() <= start) {
                oldHighest = f;
            }
        }
        String why = RandomMissions.describe(m);
        assertThat(both.lowestStartUnits()).as("lowest start\n%s", why).isEqualTo(oldLowest);
        assertThat(both.highestFloorUnits()).as("highest floor\n%s", why).isEqualTo(oldHighest);
        Statistics.label("lowest start").collect(oldLowest < 0 ? "none" : "some");
        Statistics.label("lowest start").coverage(c -> c.check("some").percentage(p -> p > 20));
    }
}
