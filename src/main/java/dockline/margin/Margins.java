package dockline.margin;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import java.util.List;
import java.util.OptionalInt;

/**
 * The margins of a mission — the highest reserve floor that can be guaranteed from its starting
 * charge, and the lowest starting charge that guarantees its floor — each computed two ways, so that
 * each checks the other:
 * <ul>
 *   <li>by bisection over the threshold solver ({@link Bisection}: satisficing, O(log C) solves);</li>
 *   <li>by the charging route's minimum-credit pass ({@link FixpointMargins}, optimisation: both figures
 *       from one pass over arena × goal, no search over floors; the same solver {@code check} uses for
 *       missions with charging).</li>
 * </ul>
 * When the mission is not guaranteed, the report also carries the {@link Suggestions}.
 */
public final class Margins {

    private Margins() {
    }

    public static MarginReport compute(Mission mission, ProductOptions options) {
        return compute(mission, ArenaCompiler.compile(mission), GoalAutomaton.of(mission), options);
    }

    /**
     * As {@link #compute(Mission, ProductOptions)}, the fixpoint on an arena and goal already compiled
     * from the mission (the bisection solves mission variants, each compiled on its own).
     */
    public static MarginReport compute(Mission mission, Arena arena, GoalAutomaton goal, ProductOptions options) {
        int floor = mission.reserveUnits();
        int start = mission.startUnits();
        return compute(mission, () -> floor > mission.capacityUnits()
                ? new FixpointMargins.Both(FixpointMargins.both(arena, goal, 0, start, options.cancelled())
                        .highestFloorUnits(), -1)
                : FixpointMargins.both(arena, goal, floor, start, options.cancelled()), options);
    }

    /**
     * As {@link #compute(Mission, Arena, GoalAutomaton, ProductOptions)}, with the minimum-credit figures from
     * the caller's pass (for a mission with lasting closures, the charging route decided phase by phase on
     * the closure phases it needs, so that the whole closure arena is never built); they are timed here.
     */
    public static MarginReport compute(Mission mission, java.util.function.Supplier<FixpointMargins.Both> fixpoint,
                                       ProductOptions options) {
        int floor = mission.reserveUnits();
        int start = mission.startUnits();
        int cap = mission.capacityUnits();
        int k = mission.map().disturbances().budget();

        long t0 = System.nanoTime();
        Bisection b = new Bisection(mission, options);
        int bHigh = b.highestFloor(start);
        int bLow = b.lowestStart(floor);
        long t1 = System.nanoTime();
        FixpointMargins.Both both = fixpoint.get();
        int fHigh = both.highestFloorUnits();
        int fLow = both.lowestStartUnits();
        long t2 = System.nanoTime();

        boolean guaranteed = bLow >= 0 && bLow <= start;
        List<Suggestion> suggestions = guaranteed ? List.of()
                : Suggestions.find(mission, bLow, bHigh, b.largestBudgetBelow(floor, start));
        return new MarginReport(guaranteed, floor, start, cap,
                new MarginReport.Method(opt(bHigh), opt(bLow), (t1 - t0) / 1_000_000L),
                new MarginReport.Method(opt(fHigh), opt(fLow), (t2 - t1) / 1_000_000L), suggestions);
    }

    private static OptionalInt opt(int v) {
        return v < 0 ? OptionalInt.empty() : OptionalInt.of(v);
    }
}
