package dockline.util;

import java.util.Arrays;

/**
 * The reverse of a graph in compressed sparse row form (per vertex v its edges are
 * {@code outStart[v]} to {@code outStart[v+1]}, edge e goes to {@code edgeTarget[e]}): the in-edges of
 * every vertex, found by a counting sort on the edge targets, so linear time O(n + m) and no objects
 * (counting sort as in Cormen, Leiserson, Rivest and Stein, "Introduction to Algorithms", 3rd ed.
 * 2009, section 8.2, from memory). {@link CsrGraph}, the shape of every stored graph, builds its reverse
 * index this way, for the backward sweeps of the attractors; any other int-array CSR may use it too.
 */
public final class Csr {

    private Csr() {
    }

    /**
     * Offsets of the reverse graph: the in-edges of v are slots {@code in[v]} to {@code in[v+1]}.
     *
     * @param n          the vertex count
     * @param m          the edge count (edgeTarget may be longer; the rest is spare capacity)
     * @param edgeTarget per edge its target, in 0..n-1
     */
    public static int[] reverseOffsets(int n, int m, int[] edgeTarget) {
        int[] inStart = new int[n + 1];
        for (int e = 0; e < m; e++) {
            inStart[edgeTarget[e] + 1]++;
        }
        for (int v = 0; v < n; v++) {
            inStart[v + 1] += inStart[v];
        }
        return inStart;
    }

    /** Per reverse slot, the source vertex of the in-edge; sources come out in increasing order. */
    public static int[] reverseSources(int n, int[] outStart, int[] edgeTarget, int[] inStart) {
        int[] inSource = new int[inStart[n]];
        int[] fill = Arrays.copyOf(inStart, n);
        for (int v = 0; v < n; v++) {
            for (int e = outStart[v]; e < outStart[v + 1]; e++) {
                inSource[fill[edgeTarget[e]]++] = v;
            }
        }
        return inSource;
    }

    /** Per reverse slot, the id of the in-edge; ids come out in increasing order. */
    public static int[] reverseEdges(int n, int[] edgeTarget, int[] inStart) {
        int[] inEdge = new int[inStart[n]];
        int[] fill = Arrays.copyOf(inStart, n);
        for (int e = 0; e < inEdge.length; e++) {
            inEdge[fill[edgeTarget[e]]++] = e;
        }
        return inEdge;
    }
}
