package dockline.solve.game;

import java.util.Arrays;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The robot's attractor by the textbook fixpoint, computed naively: round r+1 sweeps over all
 * vertices and adds those the robot can force into the set of round r in one move (a robot vertex
 * with some successor in it, a disturbance vertex with all successors in it), until a round adds
 * nothing. The round in which a vertex joins is its rank.
 *
 * <p>O(|V| · (|V| + |E|)) in the worst case. Kept only as an independent second implementation that
 * tests compare with {@link AttractorSolver}; see Grädel, Thomas, Wilke (eds., 2002), "Automata,
 * Logics, and Infinite Games", LNCS 2500, chapter 2 (the attractor as a least fixpoint).
 */
public final class FixpointSweepSolver implements GameSolver {

    private final GameGraph g;
    private final BooleanSupplier cancelled;

    public FixpointSweepSolver(GameGraph graph) {
        this(graph, () -> false);
    }

    public FixpointSweepSolver(GameGraph graph, BooleanSupplier cancelled) {
        if (graph == null || cancelled == null) {
            throw new IllegalArgumentException("graph and cancellation flag are required");
        }
        this.g = graph;
        this.cancelled = cancelled;
    }

    @Override
    public Solution solve() {
        int n = g.vertexCount();
        int[] rank = new int[n];
        Arrays.fill(rank, Solution.LOSING);
        int[] strategy = new int[n];
        Arrays.fill(strategy, Solution.NONE);
        for (int v = 0; v < n; v++) {
            if (g.isTarget(v)) {
                rank[v] = 0;
            }
        }
        int round = 0;
        boolean changed = true;
        while (changed) {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("solving was cancelled");
            }
            changed = false;
            round++;
            // synchronous round: only vertices of earlier rounds count as won
            for (int v = 0; v < n; v++) {
                if (rank[v] != Solution.LOSING) {
                    continue;
                }
                if (g.isRobot(v)) {
                    for (int e = g.outBegin(v); e < g.outEnd(v); e++) {
                        int r = rank[g.target(e)];
                        if (r != Solution.LOSING && r < round) {
                            rank[v] = round;
                            strategy[v] = e;
                            changed = true;
                            break;
                        }
                    }
                } else {
                    boolean all = true;
                    for (int e = g.outBegin(v); e < g.outEnd(v) && all; e++) {
                        int r = rank[g.target(e)];
                        all = r != Solution.LOSING && r < round;
                    }
                    if (all) {
                        rank[v] = round;
                        changed = true;
                    }
                }
            }
        }
        return new Solution(rank, strategy);
    }
}
