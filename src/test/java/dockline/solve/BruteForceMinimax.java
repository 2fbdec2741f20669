package dockline.solve;

import dockline.fixtures.ModelMoves;
import dockline.fixtures.TaskBook;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import java.util.Arrays;
import java.util.List;

/**
 * An independent test oracle for the reserve objective: depth-bounded minimax over explicit game
 * states (cell, events left, battery level, tasks done), evaluated layer by layer ("what can the
 * robot force within d of its moves"). It reads only the map and mission records: the moves come
 * from {@link ModelMoves} (not the arena compiler), and task progress and battery arithmetic are
 * redone here from maps/README.md, "Game semantics"; it shares no code with the arena compiler,
 * the product game, the goal automaton, the monitors or the solvers.
 *
 * <p><b>Depth bound.</b> Reaching "mission complete" while staying at or above a floor is a
 * reachability game on the finite set S of states; such games are positionally determined, and a
 * winner can win within |S| of its moves (the attractor has at most |S| rounds; Grädel, Thomas,
 * Wilke (eds., 2002), "Automata, Logics, and Infinite Games", LNCS 2500, ch. 2). So depth |S|
 * answers exactly. Layer d+1 is a function of layer d alone, so once two consecutive layers agree
 * every later layer does too, and the evaluation may stop there; it never needs more than |S|+1
 * layers (checked).
 *
 * <p>For the highest guaranteed floor the layers hold a max-min value instead of a boolean: the
 * best lowest-level-along-the-play the robot can force (with floor 0), or -1. For each threshold f
 * this is the reachability game above, so the same depth bound holds.
 */
public final class BruteForceMinimax {

    private final Mission mission;
    private final BuildingMap map;
    private final int cap;
    private final int budget;
    private final int cells;
    /** Per (cell index, events left): the actions, each a list of outcomes (from the model). */
    private final List<List<ModelMoves.Outcome>>[] actions;
    // task progress by the model's own bookkeeping, shared with the other record-reading oracles
    private final TaskBook book;
    private final int masks;

    public BruteForceMinimax(Mission mission) {
        this.mission = mission;
        this.map = mission.map();
        this.cap = mission.capacityUnits();
        this.budget = map.disturbances().budget();
        this.cells = map.cellCount();
        this.book = new TaskBook(mission);
        this.masks = book.masks();
        @SuppressWarnings("unchecked")
        List<List<ModelMoves.Outcome>>[] a = new List[cells * (budget + 1)];
        ModelMoves moves = new ModelMoves(mission);
        for (int i = 0; i < cells; i++) {
            Cell c = Cell.ofIndex(i, map.width());
            if (map.isFree(c)) {
                for (int k = 0; k <= budget; k++) {
                    a[i * (budget + 1) + k] = moves.actions(c, k);
                }
            }
        }
        this.actions = a;
    }

    private int robot(Cell c, int k) {
        return c.index(map.width()) * (budget + 1) + k;
    }

    private int state(int robotVertex, int level, int mask) {
        // robotVertex = cell index * (budget + 1) + events left
        return (robotVertex * (cap + 1) + level) * masks + mask;
    }

    /** Whether the robot can guarantee the mission with the given floor from the mission's start. */
    public boolean wins(int floor) {
        return wins(floor, mission.startUnits());
    }

    /** Whether the robot can guarantee the mission with the given floor from the start cell at level {@code start}. */
    public boolean wins(int floor, int start) {
        if (start < floor) {
            return false;
        }
        int p0 = book.step(0, mission.start());
        if (p0 < 0) {
            return false;
        }
        if (book.complete(p0, mission.start())) {
            return true;
        }
        int n = actions.length * (cap + 1) * masks;
        boolean[] cur = new boolean[n];
        boolean[] next = new boolean[n];
        for (int d = 0; d <= n; d++) {
            boolean changed = false;
            for (int a = 0; a < actions.length; a++) {
                if (actions[a] == null) {
                    continue;
                }
                for (int level = floor; level <= cap; level++) {
                    for (int mask = 0; mask < masks; mask++) {
                        boolean any = false;
                        for (List<ModelMoves.Outcome> action : actions[a]) {
                            if (any) {
                                break;
                            }
                            boolean all = true;
                            for (ModelMoves.Outcome o : action) {
                                if (!all) {
                                    break;
                                }
                                int to = robot(o.to(), o.budgetLeft());
                                int l2 = Math.min(cap, level + o.delta());
                                if (l2 < floor) {
                                    all = false;
                                    break;
                                }
                                Cell c2 = o.to();
                                int m2 = book.step(mask, c2);
                                if (m2 < 0) {
                                    all = false;
                                } else if (!book.complete(m2, c2)) {
                                    all = cur[state(to, l2, m2)];
                                }
                            }
                            any = all;
                        }
                        int s = state(a, level, mask);
                        next[s] = any;
                        changed |= any != cur[s];
                    }
                }
            }
            boolean[] t = cur;
            cur = next;
            next = t;
            if (!changed) {
                return cur[state(robot(mission.start(), budget), start, p0)];
            }
        }
        throw new AssertionError("no fixpoint within |S|+1 layers: the depth bound argument is broken");
    }

    /** The highest floor that can be guaranteed from the start (the max-min lowest level), or -1. */
    public int highestFloor() {
        int start = mission.startUnits();
        int p0 = book.step(0, mission.start());
        if (p0 < 0) {
            return -1;
        }
        if (book.complete(p0, mission.start())) {
            return start;
        }
        int n = actions.length * (cap + 1) * masks;
        int[] cur = new int[n];
        int[] next = new int[n];
        Arrays.fill(cur, -1);
        for (int d = 0; d <= n; d++) {
            boolean changed = false;
            for (int a = 0; a < actions.length; a++) {
                if (actions[a] == null) {
                    continue;
                }
                for (int level = 0; level <= cap; level++) {
                    for (int mask = 0; mask < masks; mask++) {
                        int best = -1;
                        for (List<ModelMoves.Outcome> action : actions[a]) {
                            int worst = level;
                            for (ModelMoves.Outcome o : action) {
                                if (worst < 0) {
                                    break;
                                }
                                int to = robot(o.to(), o.budgetLeft());
                                int l2 = Math.min(cap, level + o.delta());
                                if (l2 < 0) {
                                    worst = -1;
                                    break;
                                }
                                Cell c2 = o.to();
                                int m2 = book.step(mask, c2);
                                int v;
                                if (m2 < 0) {
                                    v = -1;
                                } else if (book.complete(m2, c2)) {
                                    v = l2;
                                } else {
                                    v = cur[state(to, l2, m2)];
                                }
                                worst = Math.min(worst, v);
                            }
                            best = Math.max(best, worst);
                        }
                        int s = state(a, level, mask);
                        next[s] = best;
                        changed |= best != cur[s];
                    }
                }
            }
            int[] t = cur;
            cur = next;
            next = t;
            if (!changed) {
                return cur[state(robot(mission.start(), budget), start, p0)];
            }
        }
        throw new AssertionError("no fixpoint within |S|+1 layers: the depth bound argument is broken");
    }
}
