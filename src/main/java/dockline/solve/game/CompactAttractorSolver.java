package dockline.solve.game;

import dockline.util.IntArrayList;
import dockline.util.Progress;
import java.util.Arrays;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The robot's attractor to the target set, by the same linear-time backward search as
 * {@link AttractorSolver} (a FIFO queue of won vertices and a counter per vertex), laid out so the
 * hot loop touches one byte of memory at random per edge instead of five or six words.
 *
 * <p>The layout, and why:
 * <ul>
 *   <li>One counter per vertex, in a {@code byte[]}: a robot vertex starts at 1 (one won successor
 *       suffices), a disturbance vertex at its out-degree (all must be won), a target at 0; a vertex
 *       is won exactly when its counter reaches 0. The owner, the "already won" test and the counter
 *       are one load, and a byte array of n entries is a quarter of an int array, so for products of
 *       tens of millions of vertices it largely stays in the last-level cache. (Out-degrees above 127
 *       fall back to an {@code int[]} counter; product games have at most a dozen.)</li>
 *   <li>The main loop writes nothing but the counter, the queue and, once per won vertex, the
 *       successor that won it. Ranks follow from the queue, which holds the won vertices in
 *       non-decreasing rank (a breadth-first layering), so they are written in one pass afterwards;
 *       the robot's chosen edge (the first out-edge into the successor that won it, as in
 *       {@link AttractorSolver}) is found in a second pass in vertex order, whose reads are local
 *       because the product numbers vertices in discovery order.</li>
 * </ul>
 *
 * <p>O(|V| + |E|) time, 13 bytes per vertex (counter, queue, the successor that won each vertex,
 * rank; the chosen edges reuse the queue), against 16 for {@link AttractorSolver}. The winning set, the ranks and the chosen edges are those of
 * {@link AttractorSolver} (property-tested), so policies, worst cases and replays do not depend on
 * which of the two solved the game. See W. Zielonka (1998), "Infinite games on finitely coloured graphs with applications to
 * automata on infinite trees", Theoretical Computer Science 200; E. Grädel, W. Thomas, T. Wilke
 * (eds., 2002), "Automata, Logics, and Infinite Games", LNCS 2500, chapter 2.
 */
public final class CompactAttractorSolver implements GameSolver {

    private final GameGraph g;
    private final BooleanSupplier cancelled;
    private final int stopAt;

    public CompactAttractorSolver(GameGraph graph) {
        this(graph, () -> false);
    }

    public CompactAttractorSolver(GameGraph graph, BooleanSupplier cancelled) {
        this(graph, cancelled, -1);
    }

    /**
     * @param stopAt a vertex whose verdict is all that is asked, or -1: the search stops as soon as
     *               that vertex is won (its rank and the ranks of the vertices won so far are exact;
     *               vertices not reached yet are reported losing)
     */
    public CompactAttractorSolver(GameGraph graph, BooleanSupplier cancelled, int stopAt) {
        if (graph == null || cancelled == null) {
            throw new IllegalArgumentException("graph and cancellation flag are required");
        }
        if (stopAt < -1 || stopAt >= graph.vertexCount()) {
            throw new IllegalArgumentException("no vertex " + stopAt);
        }
        this.g = graph;
        this.cancelled = cancelled;
        this.stopAt = stopAt;
    }

    /** Vertices won by the last {@link #solve()} (with an early stop: won before stopping). */
    private int wonCount;

    /** How many vertices the last {@link #solve()} found won (all of the attractor unless it stopped early). */
    public int wonCount() {
        return wonCount;
    }

    @Override
    public Solution solve() {
        final int n = g.vertexCount();
        int[] queue = new int[n];
        int[] via = new int[n];
        int tail = g.maxOutDegree() <= Byte.MAX_VALUE ? searchBytes(queue, via) : searchInts(queue, via);
        wonCount = tail;
        return finish(queue, tail, via);
    }

    /** Fills the queue with the won vertices in the order they are won, records the layers; returns the count. */
    private int searchBytes(int[] queue, int[] via) {
        final int n = g.vertexCount();
        final byte[] owner = g.owner;
        final boolean[] target = g.target;
        final int[] outStart = g.outStarts();
        final int[] inStart = g.inStarts();
        final int[] inSource = g.inSources();
        final byte[] counter = new byte[n];
        for (int v = 0; v < n; v++) {
            if (!target[v]) {
                counter[v] = owner[v] == GameGraph.ROBOT ? 1 : (byte) (outStart[v + 1] - outStart[v]);
            }
        }
        int tail = seed(queue);
        int head = 0;
        int steps = 0;
        boolean stopped = stopAt >= 0 && target[stopAt];
        Progress.Tracker progress = Progress.phase("solving the stored game", n);
        while (head < tail && !stopped) {
            if ((head & (Progress.EVERY - 1)) == 0) {
                progress.at(head);
            }
            if (head == layerStarts.last()) {
                // the layer starting here is complete (its predecessors' layer is done): the next starts at tail
                layerStarts.add(tail);
            }
            int v = queue[head++];
            int end = inStart[v + 1];
            for (int i = inStart[v]; i < end; i++) {
                int u = inSource[i];
                int c = counter[u];
                if (c > 0) {
                    counter[u] = (byte) --c;
                    if (c == 0) {
                        queue[tail++] = u;
                        via[u] = v; // for a robot vertex: the successor that won it (read by finish)
                        if (u == stopAt) {
                            stopped = true;
                        }
                    }
                }
            }
            steps = poll(steps + end - inStart[v] + 1);
        }
        progress.done();
        return tail;
    }

    private int searchInts(int[] queue, int[] via) {
        final int n = g.vertexCount();
        final byte[] owner = g.owner;
        final boolean[] target = g.target;
        final int[] outStart = g.outStarts();
        final int[] inStart = g.inStarts();
        final int[] inSource = g.inSources();
        final int[] counter = new int[n];
        for (int v = 0; v < n; v++) {
            if (!target[v]) {
                counter[v] = owner[v] == GameGraph.ROBOT ? 1 : outStart[v + 1] - outStart[v];
            }
        }
        int tail = seed(queue);
        int head = 0;
        int steps = 0;
        boolean stopped = stopAt >= 0 && target[stopAt];
        Progress.Tracker progress = Progress.phase("solving the stored game", n);
        while (head < tail && !stopped) {
            if ((head & (Progress.EVERY - 1)) == 0) {
                progress.at(head);
            }
            if (head == layerStarts.last()) {
                // the layer starting here is complete (its predecessors' layer is done): the next starts at tail
                layerStarts.add(tail);
            }
            int v = queue[head++];
            int end = inStart[v + 1];
            for (int i = inStart[v]; i < end; i++) {
                int u = inSource[i];
                int c = counter[u];
                if (c > 0) {
                    counter[u] = --c;
                    if (c == 0) {
                        queue[tail++] = u;
                        via[u] = v;
                        if (u == stopAt) {
                            stopped = true;
                        }
                    }
                }
            }
            steps = poll(steps + end - inStart[v] + 1);
        }
        progress.done();
        return tail;
    }

    /**
     * Puts the targets in the queue (the first layer), then the disturbance vertices without moves
     * (won vacuously, rank 1); starts the layer marks. Returns the queue's tail.
     */
    private int seed(int[] queue) {
        final int n = g.vertexCount();
        final boolean[] target = g.target;
        int tail = 0;
        for (int v = 0; v < n; v++) {
            if (target[v]) {
                queue[tail++] = v;
            }
        }
        layerStarts = new IntArrayList();
        layerStarts.add(0);
        layerStarts.add(tail);
        for (int v = 0; v < n; v++) {
            if (!target[v] && !g.isRobot(v) && g.outDegree(v) == 0) {
                queue[tail++] = v;
            }
        }
        return tail;
    }

    /** The work count after a poll for cancellation: 0 once it reached the poll interval. */
    private int poll(int steps) {
        if (steps < AttractorSolver.POLL_INTERVAL) {
            return steps;
        }
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("solving was cancelled");
        }
        return 0;
    }

    private IntArrayList layerStarts;

    /**
     * Ranks from the layers of the queue, then the chosen edges in vertex order. A robot vertex's
     * chosen edge is the one {@link AttractorSolver} takes: the first out-edge into the successor that
     * won it ({@code via}, the one store the search adds per won vertex), because both solvers take
     * the vertices from their queues in the same order (same seeding, same in-edge order, same
     * joining rule). The scan in vertex order reads out-edges locally, since the product numbers
     * vertices in discovery order.
     */
    private Solution finish(int[] queue, int tail, int[] via) {
        final int n = g.vertexCount();
        int[] rank = new int[n];
        Arrays.fill(rank, Solution.LOSING);
        layerStarts.add(tail);
        // layer r (rank r) holds queue[layerStarts[r] .. layerStarts[r+1])
        for (int r = 0; r + 1 < layerStarts.size(); r++) {
            for (int i = layerStarts.get(r), end = layerStarts.get(r + 1); i < end; i++) {
                rank[queue[i]] = r;
            }
        }
        int[] strategy = queue; // reuse the queue's memory: it is no longer needed
        Arrays.fill(strategy, Solution.NONE);
        for (int u = 0; u < n; u++) {
            if (rank[u] > 0 && g.isRobot(u)) {
                int v = via[u];
                for (int e = g.outBegin(u); e < g.outEnd(u); e++) {
                    if (g.target(e) == v) {
                        strategy[u] = e;
                        break;
                    }
                }
            }
        }
        return new Solution(rank, strategy);
    }
}
