package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.util.MonotoneSearch;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * The two routes to the highest guaranteed floor agree: the one-pass incremental attractor over
 * falling thresholds, and plain bisection with a fresh product and attractor per probe (each probe
 * is the textbook attractor, Grädel, Thomas, Wilke (eds., 2002), LNCS 2500, ch. 2). Both are
 * compared with the brute force in {@link BruteForceProperties}; this adds starting the threshold
 * pass from any known-good floor f0.
 */
class HighestFloorProperties {

    @Property(tries = 1000)
    void thresholdPass_matchesBisection(@ForAll long seed, @ForAll @IntRange(min = 0, max = 12) int f0) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ReserveMonitor monitor = new ReserveMonitor(0, m.capacityUnits(), m.startUnits());
        int bisect = highestFloorByBisection(arena, goal, monitor);
        int pass = ReserveSolver.highestFloorByThresholds(arena, goal, monitor, ProductOptions.defaults());
        assertThat(pass).as(RandomMissions.describe(m)).isEqualTo(bisect);
        // from any floor f0 at or below the answer the pass finds the same; above it, nothing
        int from = Math.min(f0, m.capacityUnits());
        int again = ReserveSolver.highestFloorByThresholds(arena, goal, monitor.withFloor(from), ProductOptions.defaults());
        assertThat(again).as("from %d\n%s", from, RandomMissions.describe(m)).isEqualTo(from <= bisect ? bisect : -1);
    }

    /**
     * The highest floor f in 0..start that the robot wins, or -1: bisection (exact, as winning is
     * monotone in the floor) with one stored product and one reference attractor per probe.
     */
    private static int highestFloorByBisection(Arena arena, GoalAutomaton goal, ReserveMonitor monitor) {
        return MonotoneSearch.highest(-1, monitor.startUnits(), f -> {
            ProductGame game = ProductGame.fromStart(arena, goal, monitor.withFloor(f), ProductOptions.defaults());
            return new AttractorSolver(game.graph()).solve().winning(game.start());
        });
    }
}
