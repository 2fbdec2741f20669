package dockline.certify;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.util.IntArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.jgrapht.Graph;
import org.jgrapht.alg.cycle.CycleDetector;
import org.jgrapht.graph.DefaultDirectedGraph;
import org.jgrapht.graph.DefaultEdge;

/**
 * The graph of a closed loop ({@link ClosedLoop}, {@link DiscountedClosedLoop}) as it is built
 * breadth-first: each node's parent in the search tree, and its successor slots (the successor
 * node, or a negative "lost" code, with the arena outcome edge) in compressed-sparse-row form.
 * Holds the graph questions both checkers ask: the path from the start, a topological order, a
 * cycle, and jgrapht's second opinion on acyclicity. Int arrays only; O(N + E) memory.
 *
 * <p>Nodes are added in order; the successors of node n are added after {@link #openSuccessors()}
 * was called n + 1 times, and {@link #closeSuccessors()} ends the last list.
 */
final class LoopGraph {

    private final IntArrayList parent = new IntArrayList(1024);
    private final IntArrayList parentEdge = new IntArrayList(1024);
    private final IntArrayList succStart = new IntArrayList(1024);
    private final IntArrayList succNode = new IntArrayList(4096);
    private final IntArrayList succEdge = new IntArrayList(4096);

    /** Records a new node's place in the search tree (-1, -1 for the start). */
    void addNode(int parentNode, int edgeFromParent) {
        parent.add(parentNode);
        parentEdge.add(edgeFromParent);
    }

    /** Starts the successor list of the next node. */
    void openSuccessors() {
        succStart.add(succNode.size());
    }

    /** Adds a successor slot to the open list: a node, or a lost code, reached by arena edge {@code edge}. */
    void addSuccessor(int node, int edge) {
        succNode.add(node);
        succEdge.add(edge);
    }

    /** Ends the last successor list (after a complete search). */
    void closeSuccessors() {
        succStart.add(succNode.size());
    }

    int parent(int node) {
        return parent.get(node);
    }

    int parentEdge(int node) {
        return parentEdge.get(node);
    }

    int succBegin(int node) {
        return succStart.get(node);
    }

    int succEnd(int node) {
        return node + 1 < succStart.size() ? succStart.get(node + 1) : succNode.size();
    }

    int succNode(int i) {
        return succNode.get(i);
    }

    int succEdge(int i) {
        return succEdge.get(i);
    }

    /** The nodes on the search-tree path from the start to the node, start first. */
    List<Integer> pathTo(int node) {
        List<Integer> path = new ArrayList<>();
        for (int n = node; n >= 0; n = parent.get(n)) {
            path.add(n);
        }
        Collections.reverse(path);
        return path;
    }

    /**
     * A topological order of the first {@code n} nodes (every edge goes from an earlier to a later
     * node), or {@code null} if there is a cycle. Kahn's algorithm (Kahn 1962, "Topological sorting
     * of large networks", CACM 5(11)), O(N + E); ties are taken in node order, so the order is
     * deterministic. Every successor slot must be a node (a complete loop).
     */
    int[] topologicalOrder(int n) {
        int[] indegree = indegrees(n);
        int[] order = new int[n];
        int tail = peelSources(n, indegree, order, null);
        return tail == n ? order : null;
    }

    /**
     * A cycle as nodes {@code n0, n1, ..., nk} with {@code nk == n0}, or an empty list if there is
     * none: peel off the sources (Kahn), then walk back from the first node left along its first
     * predecessor among the nodes left (each has one), which must close a cycle. O(N + E).
     */
    List<Integer> findCycle(int n) {
        int[] indegree = indegrees(n);
        boolean[] removed = new boolean[n];
        int tail = peelSources(n, indegree, new int[n], removed);
        if (tail == n) {
            return List.of();
        }
        // the smallest predecessor among the nodes left, for each node left
        int[] pred = new int[n];
        Arrays.fill(pred, -1);
        for (int v = 0; v < n; v++) {
            if (!removed[v]) {
                for (int i = succBegin(v); i < succEnd(v); i++) {
                    int t = succNode.get(i);
                    if (!removed[t] && pred[t] < 0) {
                        pred[t] = v;
                    }
                }
            }
        }
        int v = 0;
        while (removed[v]) {
            v++;
        }
        int[] seenAt = new int[n];
        Arrays.fill(seenAt, -1);
        List<Integer> back = new ArrayList<>();
        while (seenAt[v] < 0) {
            seenAt[v] = back.size();
            back.add(v);
            v = pred[v];
        }
        // back[seenAt[v]] .. back[end] was walked backwards from v along predecessors that return to v
        List<Integer> cycle = new ArrayList<>(back.subList(seenAt[v], back.size()));
        cycle.add(v);
        Collections.reverse(cycle);
        return cycle;
    }

    /** Second opinion on acyclicity of the first {@code n} nodes, from a reference library (jgrapht). */
    boolean jgraphtHasCycle(int n) {
        Graph<Integer, DefaultEdge> g = new DefaultDirectedGraph<>(DefaultEdge.class);
        for (int v = 0; v < n; v++) {
            g.addVertex(v);
        }
        for (int v = 0; v < n; v++) {
            for (int s = succBegin(v); s < succEnd(v); s++) {
                g.addEdge(v, succNode.get(s));
            }
        }
        return new CycleDetector<>(g).detectCycles();
    }

    /** The disturbance vertex of robot vertex {@code v} whose action equals {@code a}, or -1 if none (illegal). */
    static int legalChoice(Arena arena, int v, Action a) {
        for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
            int d = arena.target(e);
            if (arena.actionKind(d) == a.kind() && arena.action(d).target().equals(a.target())) {
                return d;
            }
        }
        return -1;
    }

    private int[] indegrees(int n) {
        int[] indegree = new int[n];
        for (int i = 0; i < succNode.size(); i++) {
            indegree[succNode.get(i)]++;
        }
        return indegree;
    }

    /** Kahn's peeling into {@code queue}; marks {@code removed} when given; returns how many were peeled. */
    private int peelSources(int n, int[] indegree, int[] queue, boolean[] removed) {
        int head = 0;
        int tail = 0;
        for (int v = 0; v < n; v++) {
            if (indegree[v] == 0) {
                queue[tail++] = v;
            }
        }
        while (head < tail) {
            int v = queue[head++];
            if (removed != null) {
                removed[v] = true;
            }
            for (int i = succBegin(v); i < succEnd(v); i++) {
                int t = succNode.get(i);
                if (--indegree[t] == 0) {
                    queue[tail++] = t;
                }
            }
        }
        return tail;
    }
}
