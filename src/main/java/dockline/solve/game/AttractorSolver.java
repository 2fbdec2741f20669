package dockline.solve.game;

import java.util.Arrays;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The robot's attractor to the target set, by the classical linear-time backward search: a FIFO
 * queue of vertices known to be won, and per disturbance vertex a counter of its out-edges not yet
 * known to lead into the attractor. A robot predecessor joins as soon as one successor is won (its
 * chosen edge is that edge), a disturbance predecessor when its counter reaches zero. Vertices
 * leave the queue in non-decreasing rank, so the rank given on joining is the least round of the
 * attractor fixpoint in which the vertex appears.
 *
 * <p>O(|V| + |E|) time and O(|V|) extra memory. See W. Zielonka (1998), "Infinite games on finitely
 * coloured graphs with applications to automata on infinite trees", Theoretical Computer Science
 * 200; and E. Grädel, W. Thomas, T. Wilke (eds., 2002), "Automata, Logics, and Infinite Games",
 * LNCS 2500, chapter 2.
 *
 * <p>The cancellation flag is polled every {@value #POLL_INTERVAL} steps; when it is raised,
 * {@link #solve()} throws {@link CancellationException}.
 */
public final class AttractorSolver implements GameSolver {

    public static final int POLL_INTERVAL = 4096;

    private final GameGraph g;
    private final BooleanSupplier cancelled;

    public AttractorSolver(GameGraph graph) {
        this(graph, () -> false);
    }

    public AttractorSolver(GameGraph graph, BooleanSupplier cancelled) {
        if (graph == null || cancelled == null) {
            throw new IllegalArgumentException("graph and cancellation flag are required");
        }
        this.g = graph;
        this.cancelled = cancelled;
    }

    @Override
    public Solution solve() {
        final int n = g.vertexCount();
        int[] rank = new int[n];
        Arrays.fill(rank, Solution.LOSING);
        int[] strategy = new int[n];
        Arrays.fill(strategy, Solution.NONE);
        // counter[v]: for a disturbance vertex, out-edges not yet known to lead into the attractor
        int[] counter = new int[n];
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        for (int v = 0; v < n; v++) {
            if (g.isTarget(v)) {
                rank[v] = 0;
                queue[tail++] = v;
            } else if (!g.isRobot(v)) {
                counter[v] = g.outDegree(v);
            }
        }
        // a disturbance vertex without moves is won vacuously, in round 1 (as in the fixpoint definition)
        for (int v = 0; v < n; v++) {
            if (!g.isTarget(v) && !g.isRobot(v) && counter[v] == 0) {
                rank[v] = 1;
                queue[tail++] = v;
            }
        }
        int steps = 0;
        while (head < tail) {
            int v = queue[head++];
            int next = rank[v] + 1;
            for (int i = g.inBegin(v); i < g.inEnd(v); i++) {
                if (++steps == POLL_INTERVAL) {
                    steps = 0;
                    if (cancelled.getAsBoolean()) {
                        throw new CancellationException("solving was cancelled");
                    }
                }
                int u = g.inSource(i);
                if (rank[u] != Solution.LOSING) {
                    continue;
                }
                if (g.isRobot(u)) {
                    rank[u] = next;
                    strategy[u] = edgeTo(u, v);
                    queue[tail++] = u;
                } else if (--counter[u] == 0) {
                    rank[u] = next;
                    queue[tail++] = u;
                }
            }
        }
        return new Solution(rank, strategy);
    }

    /** The first out-edge of u that enters v; scanned once per robot vertex, so O(|E|) in total. */
    private int edgeTo(int u, int v) {
        for (int e = g.outBegin(u); e < g.outEnd(u); e++) {
            if (g.target(e) == v) {
                return e;
            }
        }
        throw new IllegalStateException("reverse CSR lists " + u + " as a predecessor of " + v + " without an edge");
    }
}
