package dockline.bench;

import dockline.solve.game.GameGraph;
import java.util.function.BooleanSupplier;

/**
 * Two baselines over a built {@link GameGraph}, for the benchmark only.
 *
 * <ul>
 *   <li>{@link #bfs}: plain breadth-first search over the forward edges from one vertex (E. F. Moore,
 *       1959, "The shortest path through a maze"), O(|V| + |E|): the memory-bound floor any solver
 *       that reads every edge once has to pay.</li>
 *   <li>{@link #sweep}: the attractor by naive repeated sweeps to a fixpoint: every sweep visits all
 *       vertices not yet won, in decreasing number, and adds, in place, a robot vertex with a won
 *       successor and a disturbance vertex whose successors are all won; until a sweep adds nothing.
 *       This is the least-fixpoint definition of the attractor (Grädel, Thomas, Wilke (eds.), 2002,
 *       "Automata, Logics, and Infinite Games", ch. 2) evaluated without a worklist:
 *       O(sweeps · (|V| + |E|)) with up to |V| sweeps.</li>
 * </ul>
 */
final class GraphBaselines {

    private GraphBaselines() {
    }

    /** Vertices and edges reached by a breadth-first search. */
    record Traversal(long vertices, long edges) {
    }

    static Traversal bfs(GameGraph g, int from) {
        int n = g.vertexCount();
        boolean[] seen = new boolean[n];
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        long edges = 0;
        seen[from] = true;
        queue[tail++] = from;
        while (head < tail) {
            int v = queue[head++];
            int end = g.outEnd(v);
            for (int e = g.outBegin(v); e < end; e++) {
                int t = g.target(e);
                if (!seen[t]) {
                    seen[t] = true;
                    queue[tail++] = t;
                }
            }
            edges += end - g.outBegin(v);
        }
        return new Traversal(tail, edges);
    }

    /** The robot's winning vertices by naive sweeps, and how many sweeps it took. */
    record Sweeps(boolean[] won, int sweeps) {
    }

    /**
     * @return the won flags, or {@code null} when {@code cancelled} turned true (polled once a sweep)
     */
    static Sweeps sweep(GameGraph g, BooleanSupplier cancelled) {
        int n = g.vertexCount();
        boolean[] won = new boolean[n];
        for (int v = 0; v < n; v++) {
            won[v] = g.isTarget(v);
        }
        int sweeps = 0;
        boolean changed = true;
        while (changed) {
            if (cancelled.getAsBoolean()) {
                return null;
            }
            changed = false;
            sweeps++;
            for (int v = n - 1; v >= 0; v--) {
                if (won[v]) {
                    continue;
                }
                int end = g.outEnd(v);
                boolean w;
                if (g.isRobot(v)) {
                    w = false;
                    for (int e = g.outBegin(v); e < end && !w; e++) {
                        w = won[g.target(e)];
                    }
                } else {
                    w = true;
                    for (int e = g.outBegin(v); e < end && w; e++) {
                        w = won[g.target(e)];
                    }
                }
                if (w) {
                    won[v] = true;
                    changed = true;
                }
            }
        }
        return new Sweeps(won, sweeps);
    }
}
