package dockline.util;

import java.util.Arrays;

/**
 * A directed graph in compressed sparse row (CSR) form, forward and reverse: the one shape of every
 * stored graph (the compiled arena, the stored game graphs, the patrol and deadline product). Vertices
 * are {@code 0 .. vertexCount()-1}; edges are numbered {@code 0 .. edgeCount()-1} in source order, so
 * the out-edges of v are {@code outBegin(v) .. outEnd(v)-1} and edge e goes to {@code target(e)}.
 * Parallel edges and self-loops are allowed.
 *
 * <p>The reverse index lists the in-edges of v in slots {@code inBegin(v) .. inEnd(v)-1}, in
 * increasing order of their edge ids. What a slot holds is chosen at construction ({@link Reverse}):
 * the source vertex ({@link #inSource}, one int per edge: what the backward sweeps of an attractor
 * read), or the edge id ({@link #inEdge}, with {@link #source} per edge: for graphs whose edges
 * carry data, such as weights). The accessor of the other kind fails at once rather than answer
 * wrongly.
 *
 * <p>Immutable after construction. The accessors are final one-line array reads that the JIT inlines;
 * a loop that wants the arrays themselves takes the read-only views ({@link #outStarts} etc.). The
 * arrays are taken without copying and may be longer than the counts (spare capacity of a builder is
 * kept rather than copied away, so the peak memory stays at one copy). Cost: O(n + m) time to check
 * the arrays and build the reverse index by a counting sort on the edge targets ({@link Csr}), no objects
 * per vertex or edge (CSR adjacency arrays are common practice).
 */
public class CsrGraph {

    /** What a slot of the reverse index holds. */
    public enum Reverse {
        /** The source vertex of the in-edge. */
        SOURCES,
        /** The id of the in-edge; the source of every edge is kept as well. */
        EDGES
    }

    private final int n;
    private final int m;
    private final int maxOutDegree;
    private final int[] outStart;
    private final int[] edgeTarget;
    private final int[] inStart;
    private final int[] inSource;
    private final int[] inEdge;
    private final int[] edgeSource;

    /**
     * @param n          the vertex count
     * @param m          the edge count
     * @param outStart   offsets, at least {@code n + 1} long, from 0 to m and non-decreasing
     * @param edgeTarget per edge its target in {@code 0 .. n-1}, at least m long
     * @param reverse    what the reverse index holds
     * @throws IllegalArgumentException if the arrays are inconsistent
     */
    public CsrGraph(int n, int m, int[] outStart, int[] edgeTarget, Reverse reverse) {
        if (n < 0 || m < 0 || outStart.length < n + 1 || edgeTarget.length < m) {
            throw new IllegalArgumentException("array lengths do not match the vertex and edge counts");
        }
        if (outStart[0] != 0 || outStart[n] != m) {
            throw new IllegalArgumentException("outStart must run from 0 to the edge count");
        }
        int maxDegree = 0;
        for (int v = 0; v < n; v++) {
            int degree = outStart[v + 1] - outStart[v];
            if (degree < 0) {
                throw new IllegalArgumentException("outStart must not decrease (vertex " + v + ")");
            }
            maxDegree = Math.max(maxDegree, degree);
        }
        for (int e = 0; e < m; e++) {
            if (edgeTarget[e] < 0 || edgeTarget[e] >= n) {
                throw new IllegalArgumentException("edge " + e + " has no valid target");
            }
        }
        this.n = n;
        this.m = m;
        this.maxOutDegree = maxDegree;
        this.outStart = outStart;
        this.edgeTarget = edgeTarget;
        this.inStart = Csr.reverseOffsets(n, m, edgeTarget);
        if (reverse == Reverse.SOURCES) {
            this.inSource = Csr.reverseSources(n, outStart, edgeTarget, inStart);
            this.inEdge = null;
            this.edgeSource = null;
        } else {
            this.inSource = null;
            this.inEdge = Csr.reverseEdges(n, edgeTarget, inStart);
            this.edgeSource = edgeSources(n, m, outStart);
        }
    }

    private static int[] edgeSources(int n, int m, int[] outStart) {
        int[] sources = new int[m];
        for (int v = 0; v < n; v++) {
            Arrays.fill(sources, outStart[v], outStart[v + 1], v);
        }
        return sources;
    }

    public final int vertexCount() {
        return n;
    }

    public final int edgeCount() {
        return m;
    }

    public final int outBegin(int v) {
        return outStart[v];
    }

    public final int outEnd(int v) {
        return outStart[v + 1];
    }

    public final int outDegree(int v) {
        return outStart[v + 1] - outStart[v];
    }

    /** The largest out-degree of any vertex (0 without vertices). */
    public final int maxOutDegree() {
        return maxOutDegree;
    }

    public final int target(int e) {
        return edgeTarget[e];
    }

    public final int inBegin(int v) {
        return inStart[v];
    }

    public final int inEnd(int v) {
        return inStart[v + 1];
    }

    /** The source vertex of reverse slot i ({@link Reverse#SOURCES} only). */
    public final int inSource(int i) {
        return inSource[i];
    }

    /** The edge id of reverse slot i ({@link Reverse#EDGES} only). */
    public final int inEdge(int i) {
        return inEdge[i];
    }

    /** The source vertex of edge e ({@link Reverse#EDGES} only). */
    public final int source(int e) {
        return edgeSource[e];
    }

    /** The offsets array itself (read only; may be longer than {@code vertexCount() + 1}). */
    public final int[] outStarts() {
        return outStart;
    }

    /** The targets array itself (read only; may be longer than {@code edgeCount()}). */
    public final int[] targets() {
        return edgeTarget;
    }

    /** The reverse offsets array itself (read only). */
    public final int[] inStarts() {
        return inStart;
    }

    /** The reverse sources array itself (read only; {@link Reverse#SOURCES} only, else null). */
    public final int[] inSources() {
        return inSource;
    }
}
