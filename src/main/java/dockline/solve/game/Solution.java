package dockline.solve.game;

/**
 * The result of solving a reachability game ({@link GameSolver}): per vertex, whether the robot
 * wins (can force a visit to the target), the attractor rank, and the robot's chosen edge.
 *
 * <p>Rank 0 is the target; a winning vertex of rank r &gt; 0 is one the robot can force into the
 * target within r moves of either player. Losing vertices have rank {@link #LOSING}. For a winning
 * robot vertex of rank r &gt; 0 the chosen edge leads to a vertex of rank &lt; r, so the closed
 * loop of the strategy is acyclic and every play in it reaches the target; other vertices have
 * chosen edge {@link #NONE}.
 *
 * <p>Data only: the attractor ranks and choices of Grädel, Thomas, Wilke (2002, "Automata, Logics,
 * and Infinite Games", ch. 2), in int arrays; O(1) per query.
 */
public final class Solution {

    /** Rank of a vertex the robot does not win. */
    public static final int LOSING = -1;
    /** Chosen edge of a vertex where the robot has no choice to make. */
    public static final int NONE = -1;

    private final int[] rank;
    private final int[] strategy;

    /**
     * @param rank     per vertex: attractor rank, or {@link #LOSING}
     * @param strategy per vertex: chosen edge id, or {@link #NONE}
     */
    public Solution(int[] rank, int[] strategy) {
        if (rank.length != strategy.length) {
            throw new IllegalArgumentException("rank and strategy must cover the same vertices");
        }
        this.rank = rank;
        this.strategy = strategy;
    }

    public int vertexCount() {
        return rank.length;
    }

    public boolean winning(int v) {
        return rank[v] != LOSING;
    }

    public int rank(int v) {
        return rank[v];
    }

    /** The robot's chosen edge at {@code v}, or {@link #NONE}. */
    public int strategyEdge(int v) {
        return strategy[v];
    }

    public int winningCount() {
        int c = 0;
        for (int r : rank) {
            if (r != LOSING) {
                c++;
            }
        }
        return c;
    }

    /** The largest rank of a winning vertex (0 when only the target is won, -1 when nothing is). */
    public int maxRank() {
        int m = LOSING;
        for (int r : rank) {
            m = Math.max(m, r);
        }
        return m;
    }

    /**
     * The disturbance's counter-strategy at a losing disturbance vertex: the first out-edge to a
     * losing vertex (one exists, or the vertex would be winning); {@link #NONE} elsewhere.
     */
    public int disturbanceEdge(GameGraph g, int v) {
        if (g.isRobot(v) || winning(v)) {
            return NONE;
        }
        for (int e = g.outBegin(v); e < g.outEnd(v); e++) {
            if (!winning(g.target(e))) {
                return e;
            }
        }
        return NONE;
    }
}
