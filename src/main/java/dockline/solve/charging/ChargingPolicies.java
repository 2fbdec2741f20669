package dockline.solve.charging;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.policy.ThresholdPolicy;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntConsumer;

/**
 * The threshold policy of a charging solve as plain data ({@link ThresholdPolicy}): for every game
 * position (cell, budget left, closures, task progress) that a play from the start can meet while the
 * robot follows it, the position's whole threshold list in battery units (floor + threshold above the
 * floor), so that any gauge reading at those positions has its action.
 *
 * <p>The positions are found by a search over the situations (robot vertex, goal state, level) the
 * policy's plays meet, against every disturbance choice: O(situations × out-degree) expected time (an
 * open-addressing hash set of packed longs). Consecutive steps with the same action are merged (the
 * lower threshold stays), which changes no action at any level.
 */
public final class ChargingPolicies {

    private ChargingPolicies() {
    }

    /**
     * The threshold policy of {@code values} (a solve at floor {@code floor}) from the start at level
     * {@code start}.
     *
     * @throws IllegalArgumentException if the start does not win at that floor
     */
    public static ThresholdPolicy thresholds(ChargingSolver solver, ChargingSolver.Values values, int floor,
                                             int start, int capacity) {
        Arena arena = solver.arena();
        GoalAutomaton goal = solver.goal();
        int gc = goal.stateCount();
        IntArrayList posList = new IntArrayList(1 << 10);
        walk(solver, values, floor, start, capacity, posList::add, e -> { });
        List<ThresholdPolicy.Row> rows = new ArrayList<>(posList.size());
        for (int i = 0; i < posList.size(); i++) {
            int p = posList.get(i);
            int v = p / gc;
            int g = p - v * gc;
            int[][] t = values.thresholds(v, g);
            List<ThresholdPolicy.Step> steps = new ArrayList<>(t.length);
            for (int[] step : t) {
                Action a = arena.action(arena.target(step[1]));
                ThresholdPolicy.Step st = new ThresholdPolicy.Step(floor + step[0], a);
                if (!steps.isEmpty() && steps.get(steps.size() - 1).action().equals(a)) {
                    steps.set(steps.size() - 1, st); // same action further down: the lower threshold stays
                } else {
                    steps.add(st);
                }
            }
            rows.add(new ThresholdPolicy.Row(arena.cellOf(v), arena.budgetLeft(v), goal.progressMask(g),
                    arena.closures(v), steps));
        }
        return new ThresholdPolicy(rows);
    }

    /**
     * The outcomes into a left-out phase ({@link ArenaCompiler#LEFT_OUT}, on an arena of
     * {@link ArenaCompiler#compileWithin}) that the plays of the threshold policy of {@code values} (a solve at
     * floor {@code floor}) from the start at level {@code start} meet, each arena edge once per situation it is
     * met in; the plays do not go on through them (a strengthened solve counts them as won). None: the policy
     * never relies on a left-out phase, so it plays the same in the mission. O(situations × out-degree).
     *
     * @throws IllegalArgumentException if the start does not win at that floor
     */
    public static void leftOutOutcomes(ChargingSolver solver, ChargingSolver.Values values, int floor, int start,
                                       int capacity, IntConsumer edges) {
        walk(solver, values, floor, start, capacity, p -> { }, edges);
    }

    /**
     * The search of the class comment: every position met (once, in the order met) and every left-out outcome
     * of a chosen action (once per situation).
     */
    private static void walk(ChargingSolver solver, ChargingSolver.Values values, int floor, int start, int capacity,
                             IntConsumer newPosition, IntConsumer leftOut) {
        Arena arena = solver.arena();
        GoalAutomaton goal = solver.goal();
        int gc = goal.stateCount();
        int g0 = solver.startGoal();
        int s = Math.min(start, capacity);
        int v0 = arena.startVertex();
        if (g0 == GoalAutomaton.REJECT || s < floor || values.need(v0, g0) > s - floor) {
            throw new IllegalArgumentException("the start does not win at floor " + floor);
        }
        long levels = (long) capacity + 1;
        LongIntMap seen = new LongIntMap(1 << 12);
        LongIntMap positions = new LongIntMap(1 << 10);
        int positionCount = 0;
        IntArrayList qv = new IntArrayList(1 << 12);
        IntArrayList qg = new IntArrayList(1 << 12);
        IntArrayList ql = new IntArrayList(1 << 12);
        qv.add(v0);
        qg.add(g0);
        ql.add(s);
        seen.put(((long) v0 * gc + g0) * levels + s, 0);
        for (int i = 0; i < qv.size(); i++) {
            int v = qv.get(i);
            int g = qg.get(i);
            int l = ql.get(i);
            if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                continue;
            }
            int p = v * gc + g;
            if (positions.get(p) < 0) {
                positions.put(p, positionCount++);
                newPosition.accept(p);
            }
            int e = values.action(v, g, l - floor);
            if (e < 0) {
                throw new IllegalStateException("internal: the threshold policy has no action at a situation its plays"
                        + " meet (" + arena.cellOf(v) + ", level " + l + ")");
            }
            int d = arena.target(e);
            for (int f = arena.outBegin(d); f < arena.outEnd(d); f++) {
                if (arena.weight(f) == ArenaCompiler.LEFT_OUT) {
                    leftOut.accept(f);
                    continue; // lost in the weakened game, won in the strengthened one: the play ends either way
                }
                int u = arena.target(f);
                int g2 = goal.step(g, arena.cellZones(arena.cell(u)));
                if (g2 == GoalAutomaton.REJECT) {
                    continue; // the certificate checker reports it, on its own
                }
                int l2 = (int) Math.min(capacity, (long) l + arena.weight(f));
                if (l2 < floor) {
                    continue; // likewise
                }
                long key = ((long) u * gc + g2) * levels + l2;
                if (seen.get(key) < 0) {
                    seen.put(key, qv.size());
                    qv.add(u);
                    qg.add(g2);
                    ql.add(l2);
                }
            }
        }
    }
}
