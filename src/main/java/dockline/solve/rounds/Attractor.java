package dockline.solve.rounds;

import java.util.Arrays;

/**
 * The attractor of one player to a target set inside a subgame of a {@link RoundsProduct}: the vertices
 * from which that player can force a visit to the target, with the number of edges needed (its rank)
 * and, for the player's own vertices, an edge that lowers the rank. Zielonka's and McNaughton's
 * attractor as in Grädel, Thomas, Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500
 * (2002), chapter 2: a backward breadth-first search with one counter of unattracted successors per
 * vertex of the other player.
 *
 * <p>Breadth-first order makes the rank exact: a vertex of the player gets 1 + the least rank of its
 * successors, a vertex of the other player 1 + the greatest, so the rank is the fewest edges the player
 * can force the target within. Cost O(N + M) time, four int arrays of N.
 */
final class Attractor {

    /** Rank of a vertex outside the attractor (or outside the subgame). */
    static final int OUT = -1;

    private Attractor() {
    }

    /** The whole product as a subgame: every one of the {@code n} vertices alive. */
    static boolean[] everywhere(int n) {
        boolean[] alive = new boolean[n];
        Arrays.fill(alive, true);
        return alive;
    }

    /**
     * @param p       the product
     * @param robot   {@code true}: the robot's attractor; {@code false}: the disturbance's
     * @param alive   the subgame (vertices with {@code alive[v]}); every vertex of it must keep a successor
     *                in it; edges leaving it are ignored
     * @param target  the target vertices (only those alive count)
     * @param choice  out: for the player's vertices in the attractor but not in the target, an edge id to a
     *                successor of lower rank; -1 elsewhere (may be null)
     * @return the rank of every vertex ({@link #OUT} outside the attractor)
     */
    static int[] of(RoundsProduct p, boolean robot, boolean[] alive, boolean[] target, int[] choice) {
        int n = p.vertexCount();
        int[] rank = new int[n];
        Arrays.fill(rank, OUT);
        if (choice != null) {
            Arrays.fill(choice, -1);
        }
        int[] count = new int[n];
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        for (int v = 0; v < n; v++) {
            if (!alive[v]) {
                continue;
            }
            if (target[v]) {
                rank[v] = 0;
                queue[tail++] = v;
            } else if (p.isRobot(v) != robot) {
                int c = 0;
                for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
                    if (alive[p.target(e)]) {
                        c++;
                    }
                }
                count[v] = c;
            }
        }
        while (head < tail) {
            int u = queue[head++];
            for (int i = p.inBegin(u); i < p.inEnd(u); i++) {
                int v = p.inSource(i);
                if (!alive[v] || rank[v] != OUT) {
                    continue;
                }
                if (p.isRobot(v) == robot) {
                    rank[v] = rank[u] + 1;
                    queue[tail++] = v;
                    if (choice != null) {
                        choice[v] = edgeTo(p, v, u, alive);
                    }
                } else if (--count[v] == 0) {
                    rank[v] = rank[u] + 1;
                    queue[tail++] = v;
                }
            }
        }
        return rank;
    }

    /**
     * Re-chooses, at every robot vertex with a choice, among the edges to successors of the least rank (the
     * same number of moves to the target), one whose worst outcome leaves the most charge: ties between
     * equally short plans are broken towards the battery. Ranks, and so the fewest-moves promise, are kept.
     * O(M).
     *
     * @param alive the subgame the successors must lie in
     */
    static void preferCharge(RoundsProduct p, boolean[] alive, int[] rank, int[] choice) {
        for (int v = 0; v < p.vertexCount(); v++) {
            if (!p.isRobot(v) || choice[v] < 0) {
                continue;
            }
            int bestRank = rank[p.target(choice[v])];
            int best = choice[v];
            int bestLevel = worstLevel(p, p.target(best));
            for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
                int d = p.target(e);
                if (alive[d] && rank[d] == bestRank) {
                    int l = worstLevel(p, d);
                    if (l > bestLevel) {
                        best = e;
                        bestLevel = l;
                    }
                }
            }
            choice[v] = best;
        }
    }

    private static int worstLevel(RoundsProduct p, int d) {
        int low = Integer.MAX_VALUE;
        for (int e = p.outBegin(d); e < p.outEnd(d); e++) {
            int u = p.target(e);
            low = Math.min(low, u == RoundsProduct.LOST ? Integer.MIN_VALUE : p.level(u));
        }
        return low;
    }

    /** The first edge from v to u (there is one: u is a successor of v). */
    private static int edgeTo(RoundsProduct p, int v, int u, boolean[] alive) {
        for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
            if (p.target(e) == u) {
                return e;
            }
        }
        throw new IllegalStateException("no edge from " + v + " to " + u);
    }
}
