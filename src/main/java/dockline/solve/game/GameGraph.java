package dockline.solve.game;

import dockline.util.Csr;

/**
 * A finite two-player turn-based game graph with a reachability target, as the solvers read it:
 * vertices {@code 0 .. vertexCount()-1}, each owned by the robot (the reaching player) or by the
 * disturbance; forward edges in compressed-sparse-row int arrays, and the reverse (predecessor)
 * CSR built from them by a counting sort in O(|V|+|E|).
 *
 * <p>Edges are numbered {@code 0 .. edgeCount()-1} in source order: the out-edges of {@code v}
 * are {@code outBegin(v) .. outEnd(v)-1}. Parallel edges are allowed (the product keeps one edge
 * per arena edge). Every vertex should have at least one out-edge; a disturbance vertex without
 * one would be won vacuously by the robot.
 *
 * <p>Immutable after construction. Package-private fields let the solvers' hot loops run on the
 * arrays directly.
 *
 * <p>Data structure: compressed-sparse-row adjacency arrays, the reverse built by a counting sort
 * (common practice; counting sort as in Cormen, Leiserson, Rivest and Stein, "Introduction to
 * Algorithms", 3rd ed. 2009, section 8.2, from memory).
 */
public final class GameGraph {

    static final byte ROBOT = 0;
    static final byte DISTURBANCE = 1;

    final int n;
    final int m;
    final byte[] owner;
    final boolean[] target;
    final int[] outStart;
    final int[] edgeTarget;
    final int[] inStart;
    final int[] inSource;

    /**
     * @param robotOwned per vertex: {@code true} for the robot, {@code false} for the disturbance
     * @param target     per vertex: part of the set the robot wants to reach
     * @param outStart   CSR offsets, length {@code n+1}, non-decreasing, {@code outStart[0] == 0}
     * @param edgeTarget per edge: its target vertex
     * @throws IllegalArgumentException if the arrays are inconsistent
     */
    public GameGraph(boolean[] robotOwned, boolean[] target, int[] outStart, int[] edgeTarget) {
        this(ownerBytes(robotOwned), exactLength(target, robotOwned.length).clone(),
                exactLength(outStart, robotOwned.length + 1).clone(), edgeTarget.clone(), robotOwned.length,
                edgeTarget.length);
    }

    private static boolean[] exactLength(boolean[] a, int len) {
        if (a.length != len) {
            throw new IllegalArgumentException("expected " + len + " target flags, got " + a.length);
        }
        return a;
    }

    private static int[] exactLength(int[] a, int len) {
        if (a.length != len) {
            throw new IllegalArgumentException("expected " + len + " CSR offsets, got " + a.length);
        }
        return a;
    }

    /**
     * Trusted constructor for the product builder: takes the arrays without copying; they may be
     * longer than {@code n} / {@code m} (spare capacity is kept rather than copied away, so the
     * peak memory stays at one copy).
     */
    GameGraph(byte[] owner, boolean[] target, int[] outStart, int[] edgeTarget, int n, int m) {
        if (target.length < n || owner.length < n || outStart.length < n + 1 || edgeTarget.length < m) {
            throw new IllegalArgumentException("array lengths do not match the vertex and edge counts");
        }
        if (outStart[0] != 0 || outStart[n] != m) {
            throw new IllegalArgumentException("outStart must run from 0 to the edge count");
        }
        for (int v = 0; v < n; v++) {
            if (outStart[v + 1] < outStart[v]) {
                throw new IllegalArgumentException("outStart must not decrease (vertex " + v + ")");
            }
        }
        for (int e = 0; e < m; e++) {
            if (edgeTarget[e] < 0 || edgeTarget[e] >= n) {
                throw new IllegalArgumentException("edge " + e + " has no valid target");
            }
        }
        this.n = n;
        this.m = m;
        this.owner = owner;
        this.target = target;
        this.outStart = outStart;
        this.edgeTarget = edgeTarget;
        // reverse CSR by counting sort on the target: linear time, sources come out in increasing order
        this.inStart = Csr.reverseOffsets(n, m, edgeTarget);
        this.inSource = Csr.reverseSources(n, outStart, edgeTarget, inStart);
    }

    private static byte[] ownerBytes(boolean[] robotOwned) {
        byte[] o = new byte[robotOwned.length];
        for (int i = 0; i < o.length; i++) {
            o[i] = robotOwned[i] ? ROBOT : DISTURBANCE;
        }
        return o;
    }

    public int vertexCount() {
        return n;
    }

    public int edgeCount() {
        return m;
    }

    public boolean isRobot(int v) {
        return owner[v] == ROBOT;
    }

    public boolean isTarget(int v) {
        return target[v];
    }

    public int outBegin(int v) {
        return outStart[v];
    }

    public int outEnd(int v) {
        return outStart[v + 1];
    }

    public int outDegree(int v) {
        return outStart[v + 1] - outStart[v];
    }

    public int target(int e) {
        return edgeTarget[e];
    }

    public int inBegin(int v) {
        return inStart[v];
    }

    public int inEnd(int v) {
        return inStart[v + 1];
    }

    /** The source vertex of the i-th incoming edge slot ({@code inBegin(v) <= i < inEnd(v)}); one slot per edge. */
    public int inSource(int i) {
        return inSource[i];
    }
}
