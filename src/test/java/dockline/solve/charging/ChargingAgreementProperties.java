package dockline.solve.charging;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.BruteForce;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The charging route against two other computations on random tiny missions with charging, capacity
 * saturation and disturbances ({@link RandomMissions#tiny}):
 * <ul>
 * <li>the stored product route: arena × goal × battery levels in CSR arrays ({@link ProductGame}) solved
 *     by the reference attractor ({@link AttractorSolver}; Grädel, Thomas, Wilke (eds., 2002), "Automata,
 *     Logics, and Infinite Games", LNCS 2500, ch. 2), once per starting charge and once per floor, so the
 *     lowest start and the highest floor are found by plain scans, not by the route's own search;</li>
 * <li>the brute-force fixpoint sweep over (robot vertex, task mask, level) with its own task bookkeeping
 *     ({@link BruteForce}), position by position.</li>
 * </ul>
 */
class ChargingAgreementProperties {

    @Property(tries = 3000)
    void agreesWithStoredProduct(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int cap = m.capacityUnits();
        int floor = Math.min(m.reserveUnits(), cap);
        int start = m.startUnits();
        ChargingRoute.Analysis a = ChargingRoute.analyse(new ChargingSolver(arena, goal), cap, floor, start);

        boolean stored = storedWins(arena, goal, floor, cap, start);
        int lowest = -1;
        for (int s = floor; s <= cap && lowest < 0; s++) {
            if (storedWins(arena, goal, floor, cap, s)) {
                lowest = s;
            }
        }
        int highest = -1;
        for (int f = Math.min(start, cap); f >= 0 && highest < 0; f--) {
            if (storedWins(arena, goal, f, cap, start)) {
                highest = f;
            }
        }
        String why = RandomMissions.describe(m);
        assertThat(a.guaranteed()).as("verdict\n%s", why).isEqualTo(stored);
        assertThat(a.lowestStartUnits().orElse(-1)).as("lowest start\n%s", why).isEqualTo(lowest);
        assertThat(a.highestFloorUnits().orElse(-1)).as("highest floor\n%s", why).isEqualTo(highest);

        boolean charging = m.scale().gain(m.robot().chargeWh()) > 0;
        Statistics.label("charging").collect(charging);
        Statistics.label("verdict").collect(charging ? (stored ? "charging, guaranteed" : "charging, not guaranteed")
                : (stored ? "no charging, guaranteed" : "no charging, not guaranteed"));
        Statistics.label("reloads").collect(a.values().goodDocks() > 0 ? "good docks" : "no good dock");
        Statistics.label("rounds").collect(Math.min(a.rounds(), 4));
        Statistics.label("verdict").coverage(c -> {
            c.check("charging, guaranteed").percentage(p -> p > 10);
            c.check("charging, not guaranteed").percentage(p -> p > 5);
            c.check("no charging, guaranteed").percentage(p -> p > 5);
        });
        Statistics.label("rounds").coverage(c -> c.check(3).count(n -> n > 10));
    }

    /**
     * Every position a play can meet (its goal state already counts its own cell) has the need of the
     * brute-force sweep's least winning level, at the mission's floor.
     */
    @Property(tries = 1500)
    void needPerPosition_matchesBruteForce(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int cap = m.capacityUnits();
        int floor = Math.min(m.reserveUnits(), cap);
        BruteForce bf = new BruteForce(m, floor);
        ChargingSolver.Values v = new ChargingSolver(arena, goal).solve(cap - floor);
        int masks = 1 << goal.taskCount();
        for (int r = 0; r < arena.robotCount(); r++) {
            for (int mask = 0; mask < masks; mask++) {
                int g = goal.stateOfMask(mask);
                if (g == GoalAutomaton.REJECT || bf.book().step(mask, arena.cellOf(r)) != mask) {
                    continue; // only positions a play can meet: the cell's own tasks are already counted
                }
                int expected = ChargingSolver.INFINITE;
                for (int l = cap; l >= floor; l--) {
                    if (bf.wins(arena.cellOf(r), arena.budgetLeft(r), mask, l)) {
                        expected = l - floor;
                    }
                }
                assertThat(v.need(r, g)).as("vertex %d mask %d\n%s", r, mask, RandomMissions.describe(m))
                        .isEqualTo(expected);
            }
        }
    }

    /** The stored route's verdict: product game at (floor, capacity, start), reference attractor. */
    static boolean storedWins(Arena arena, GoalAutomaton goal, int floor, int cap, int start) {
        ProductGame game = ProductGame.fromStart(arena, goal, new ReserveMonitor(floor, cap, start),
                ProductOptions.defaults());
        return new AttractorSolver(game.graph()).solve().winning(game.start());
    }
}
