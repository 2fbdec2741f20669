package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.model.Cell;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.util.IntArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The closed loop of a robot choice on a {@link RoundsProduct}: the robot vertices reachable from the
 * start when the robot takes its chosen edge and the disturbance any outcome, with what the reports
 * need: the lowest level reached, the policy rows, and the longest stretch of turns between two stops
 * (a stop is a completed lap of a patrol, or the completed mission of a visit).
 *
 * <p>The longest stretch is a longest path in the loop with the stops cut out, which must be acyclic
 * for a winning choice (otherwise the disturbance could keep the robot from stopping for ever); it is a
 * dynamic programme in reverse topological order (Kahn 1962). Cost O(N + M) for the N robot vertices
 * and M outcomes of the loop.
 */
final class PolicyLoop {

    private final RoundsProduct p;
    private final int[] node;          // loop node -> product robot vertex
    private final int[] succStart;     // loop node -> its outcomes (loop nodes)
    private final int[] succ;
    private final int lowest;
    private final int[] stretch;       // longest number of turns from the node to the next stop

    private PolicyLoop(RoundsProduct p, int[] choice) {
        this.p = p;
        int n = p.vertexCount();
        int[] id = new int[n];
        Arrays.fill(id, -1);
        IntArrayList nodes = new IntArrayList();
        IntArrayList starts = new IntArrayList();
        IntArrayList succs = new IntArrayList();
        int s = p.start();
        if (s == RoundsProduct.LOST) {
            throw new IllegalStateException("the start is lost");
        }
        id[s] = 0;
        nodes.add(s);
        int low = Integer.MAX_VALUE;
        for (int i = 0; i < nodes.size(); i++) {
            int v = nodes.get(i);
            starts.add(succs.size());
            low = Math.min(low, p.level(v));
            if (p.complete(v)) {
                continue;
            }
            int d = p.target(choice[v]);
            for (int e = p.outBegin(d); e < p.outEnd(d); e++) {
                int u = p.target(e);
                if (u == RoundsProduct.LOST) {
                    throw new IllegalStateException("the chosen action can lose at product vertex " + v);
                }
                if (id[u] < 0) {
                    id[u] = nodes.size();
                    nodes.add(u);
                }
                succs.add(id[u]);
            }
        }
        starts.add(succs.size());
        this.node = nodes.toArray();
        this.succStart = starts.toArray();
        this.succ = succs.toArray();
        this.lowest = low;
        this.stretch = stretches();
    }

    /** The loop of the robot's choice (an edge id per robot vertex, to a disturbance vertex). */
    static PolicyLoop of(RoundsProduct p, int[] choice) {
        return new PolicyLoop(p, choice);
    }

    private boolean stop(int loopNode) {
        int v = node[loopNode];
        return p.lapDone(v) || p.complete(v);
    }

    private int[] stretches() {
        int n = node.length;
        int[] indegree = new int[n];
        for (int x = 0; x < n; x++) {
            for (int i = succStart[x]; i < succStart[x + 1]; i++) {
                if (!stop(succ[i])) {
                    indegree[succ[i]]++;
                }
            }
        }
        int[] order = new int[n];
        int tail = 0;
        for (int x = 0; x < n; x++) {
            if (indegree[x] == 0) {
                order[tail++] = x;
            }
        }
        for (int head = 0; head < tail; head++) {
            int x = order[head];
            for (int i = succStart[x]; i < succStart[x + 1]; i++) {
                int y = succ[i];
                if (!stop(y) && --indegree[y] == 0) {
                    order[tail++] = y;
                }
            }
        }
        if (tail < n) {
            throw new IllegalStateException("the closed loop has a cycle without a stop");
        }
        int[] len = new int[n];
        for (int k = n - 1; k >= 0; k--) {
            int x = order[k];
            int best = 0;
            for (int i = succStart[x]; i < succStart[x + 1]; i++) {
                int y = succ[i];
                best = Math.max(best, 1 + (stop(y) ? 0 : len[y]));
            }
            len[x] = best;
        }
        return len;
    }

    int size() {
        return node.length;
    }

    int lowestLevel() {
        return lowest;
    }

    /** The most turns from the start until the first stop (a completed lap, or the completed mission). */
    int firstStretch() {
        return stretch[0];
    }

    /** The most turns any lap takes, from one completed lap to the next (0 when no lap is ever completed). */
    int longestLap() {
        int best = 0;
        for (int x = 0; x < node.length; x++) {
            if (p.lapDone(node[x])) {
                best = Math.max(best, stretch[x]);
            }
        }
        return best;
    }

    /** The policy rows: one per robot vertex of the loop that is not complete. */
    Policy policy(int[] choice) {
        Arena a = p.arena();
        List<PolicyEntry> rows = new ArrayList<>(node.length);
        for (int v : node) {
            if (p.complete(v)) {
                continue;
            }
            int av = p.arenaVertex(v);
            int d = p.arenaVertex(p.target(choice[v]));
            rows.add(new PolicyEntry(Cell.ofIndex(a.cell(av), a.width()), p.level(v), a.budgetLeft(av),
                    p.progressMask(v), a.action(d), null, a.closures(av)));
        }
        return new Policy(rows);
    }
}
