package dockline.solve.game;

import dockline.util.CsrGraph;

/**
 * A finite two-player turn-based game graph with a reachability target, as the solvers read it:
 * vertices {@code 0 .. vertexCount()-1}, each owned by the robot (the reaching player) or by the
 * disturbance, on a {@link CsrGraph} whose reverse index holds the predecessors (sources), built by a
 * counting sort in O(|V|+|E|).
 *
 * <p>Edges are numbered {@code 0 .. edgeCount()-1} in source order: the out-edges of {@code v}
 * are {@code outBegin(v) .. outEnd(v)-1}. Parallel edges are allowed (the product keeps one edge
 * per arena edge). Every vertex should have at least one out-edge; a disturbance vertex without
 * one would be won vacuously by the robot.
 *
 * <p>Immutable after construction. Package-private owner and target arrays, and the graph's read-only
 * array views, let the solvers' hot loops run on the arrays directly.
 */
public final class GameGraph extends CsrGraph {

    static final byte ROBOT = 0;
    static final byte DISTURBANCE = 1;

    final byte[] owner;
    final boolean[] target;

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
        super(n, m, outStart, edgeTarget, Reverse.SOURCES);
        if (target.length < n || owner.length < n) {
            throw new IllegalArgumentException("array lengths do not match the vertex and edge counts");
        }
        this.owner = owner;
        this.target = target;
    }

    private static byte[] ownerBytes(boolean[] robotOwned) {
        byte[] o = new byte[robotOwned.length];
        for (int i = 0; i < o.length; i++) {
            o[i] = robotOwned[i] ? ROBOT : DISTURBANCE;
        }
        return o;
    }

    public boolean isRobot(int v) {
        return owner[v] == ROBOT;
    }

    public boolean isTarget(int v) {
        return target[v];
    }
}
