package dockline.solve.charging;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.policy.ThresholdPolicy;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;
import java.util.ArrayList;
import java.util.List;

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
        int g0 = solver.startGoal();
        int s = Math.min(start, capacity);
        int v0 = arena.startVertex();
        if (g0 == GoalAutomaton.REJECT || s < floor || values.need(v0, g0) > s - floor) {
            throw new IllegalArgumentException("the start does not win at floor " + floor);
        }
        long levels = (long) capacity + 1;
        LongIntMap seen = new LongIntMap(1 << 12);
        LongIntMap positions = new LongIntMap(1 << 10);
        IntArrayList posList = new IntArrayList(1 << 10);
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
                positions.put(p, posList.size());
                posList.add(p);
            }
            int e = values.action(v, g, l - floor);
            if (e < 0) {
                throw new IllegalStateException("internal: the threshold policy has no action at a situation its plays"
                        + " meet (" + arena.cellOf(v) + ", level " + l + ")");
            }
            int d = arena.target(e);
            for (int f = arena.outBegin(d); f < arena.outEnd(d); f++) {
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
}
