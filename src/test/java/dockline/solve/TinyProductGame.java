package dockline.solve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.Monitor;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Test-only oracle, deliberately naive and independent of the production solver: the explicit
 * product arena x (goal) x monitor over robot vertices, solved by iterating the one-step
 * controllable-predecessor operator to its fixpoint (greatest for safety, least for reachability;
 * Grädel, Thomas, Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500, 2002, ch. 2),
 * O(n * m) per round and at most n rounds. Only for tiny arenas.
 */
public final class TinyProductGame {

    private static final int LOSE = -1;
    private static final int WIN = -2;

    private final List<int[][]> actions = new ArrayList<>();
    private final int startCode;

    private TinyProductGame(Arena a, Monitor m, GoalAutomaton goal) {
        Map<List<Integer>, Integer> index = new HashMap<>();
        ArrayDeque<int[]> queue = new ArrayDeque<>();
        int s = a.startVertex();
        int g0 = goal == null ? 0 : goal.initial(a.cellZones(a.cell(s)));
        int m0 = m.initialState();
        if (goal != null && g0 == GoalAutomaton.REJECT) {
            startCode = LOSE;
            return;
        }
        if (goal != null && goal.accepting(g0, a.isDock(a.cell(s))) && m.acceptsAtCompletion(m0)) {
            startCode = WIN;
            return;
        }
        startCode = node(index, queue, s, g0, m0);
        while (!queue.isEmpty()) {
            int[] x = queue.poll();
            int r = x[0];
            int[][] acts = new int[a.outEnd(r) - a.outBegin(r)][];
            for (int e = a.outBegin(r); e < a.outEnd(r); e++) {
                int act = a.target(e);
                int[] succ = new int[a.outEnd(act) - a.outBegin(act)];
                for (int f = a.outBegin(act); f < a.outEnd(act); f++) {
                    int t = a.target(f);
                    int ms = m.step(x[2], a.weight(f));
                    int code;
                    if (ms == Monitor.REJECT) {
                        code = LOSE;
                    } else if (goal == null) {
                        code = m instanceof DiscountedComparator && ms == DiscountedComparator.ACCEPT ? WIN
                                : node(index, queue, t, 0, ms);
                    } else {
                        int gs = goal.step(x[1], a.cellZones(a.cell(t)));
                        if (gs == GoalAutomaton.REJECT) {
                            code = LOSE;
                        } else if (goal.accepting(gs, a.isDock(a.cell(t))) && m.acceptsAtCompletion(ms)) {
                            code = WIN;
                        } else {
                            code = node(index, queue, t, gs, ms);
                        }
                    }
                    succ[f - a.outBegin(act)] = code;
                }
                acts[e - a.outBegin(r)] = succ;
            }
            actions.set(x[3], acts);
        }
    }

    private int node(Map<List<Integer>, Integer> index, ArrayDeque<int[]> queue, int r, int g, int m) {
        List<Integer> key = List.of(r, g, m);
        Integer id = index.get(key);
        if (id == null) {
            id = index.size();
            index.put(key, id);
            actions.add(null);
            queue.add(new int[] {r, g, m, id});
        }
        return id;
    }

    int nodeCount() {
        return actions.size();
    }

    /**
     * Without a goal: the robot keeps the monitor out of REJECT forever (safety, for {@code >=}) or
     * forces the comparator's accepting sink (reachability, for {@code >}).
     */
    public static boolean robotWinsWithoutGoal(Arena a, Monitor m, boolean safety) {
        return new TinyProductGame(a, m, null).solve(safety);
    }

    /**
     * With the goal: reach a moment where the tasks are done, the robot is on a dock and the monitor
     * accepts at completion; never REJECT. As in the product the tool uses, being on a dock with the
     * tasks done but the monitor not (yet) accepting does not end the play: the robot may go on.
     */
    public static boolean robotWinsWithGoal(Arena a, Monitor m, GoalAutomaton goal) {
        return new TinyProductGame(a, m, goal).solve(false);
    }

    private boolean solve(boolean safety) {
        if (startCode == WIN || startCode == LOSE) {
            return startCode == WIN;
        }
        int n = actions.size();
        boolean[] in = new boolean[n];
        java.util.Arrays.fill(in, safety);
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int x = 0; x < n; x++) {
                boolean ok = false;
                for (int[] succ : actions.get(x)) {
                    boolean all = true;
                    for (int c : succ) {
                        if (c == LOSE || (c >= 0 && !in[c])) {
                            all = false;
                            break;
                        }
                    }
                    if (all) {
                        ok = true;
                        break;
                    }
                }
                if (ok != in[x]) {
                    in[x] = ok;
                    changed = true;
                }
            }
        }
        return in[startCode];
    }
}
