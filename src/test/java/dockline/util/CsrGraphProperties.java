package dockline.util;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.jgrapht.Graph;
import org.jgrapht.graph.DirectedPseudograph;

/**
 * The compressed-sparse-row graph against jgrapht's {@link DirectedPseudograph} as the reference (the
 * general-purpose graph library, parallel edges and self-loops allowed): the same random edge list gives
 * the same out-edges, the same in-edges of every vertex (by source and by edge id) and the same sources.
 */
class CsrGraphProperties {

    @Property(tries = 300)
    void reverseIndex_agreesWithJgrapht(@ForAll @IntRange(min = 1, max = 30) int n,
                                        @ForAll @IntRange(min = 0, max = 120) int m, @ForAll long seed) {
        java.util.Random rnd = new java.util.Random(seed);
        // edges in source order, as CSR numbers them
        int[] outStart = new int[n + 1];
        int[] target = new int[m];
        int[] sourceOf = new int[m];
        List<Integer> sources = new ArrayList<>();
        for (int e = 0; e < m; e++) {
            sources.add(rnd.nextInt(n));
        }
        sources.sort(null);
        Graph<Integer, Integer> ref = new DirectedPseudograph<>(null, null, false);
        for (int v = 0; v < n; v++) {
            ref.addVertex(v);
        }
        for (int e = 0; e < m; e++) {
            sourceOf[e] = sources.get(e);
            target[e] = rnd.nextInt(n);
            outStart[sourceOf[e] + 1]++;
            ref.addEdge(sourceOf[e], target[e], e);
        }
        for (int v = 0; v < n; v++) {
            outStart[v + 1] += outStart[v];
        }
        CsrGraph bySource = new CsrGraph(n, m, outStart, target, CsrGraph.Reverse.SOURCES);
        CsrGraph byEdge = new CsrGraph(n, m, outStart, target, CsrGraph.Reverse.EDGES);
        int maxDegree = 0;
        for (int v = 0; v < n; v++) {
            maxDegree = Math.max(maxDegree, ref.outDegreeOf(v));
            List<Integer> out = new ArrayList<>();
            for (int e = byEdge.outBegin(v); e < byEdge.outEnd(v); e++) {
                out.add(e);
                assertThat(byEdge.source(e)).isEqualTo(v);
                assertThat(ref.getEdgeTarget(e)).isEqualTo(byEdge.target(e));
            }
            assertThat(out).containsExactlyInAnyOrderElementsOf(ref.outgoingEdgesOf(v));
            List<Integer> inEdges = new ArrayList<>();
            List<Integer> inSources = new ArrayList<>();
            for (int i = byEdge.inBegin(v); i < byEdge.inEnd(v); i++) {
                inEdges.add(byEdge.inEdge(i));
                inSources.add(bySource.inSource(i));
            }
            assertThat(inEdges).isSorted().containsExactlyInAnyOrderElementsOf(ref.incomingEdgesOf(v));
            List<Integer> refSources = new ArrayList<>();
            for (int e : ref.incomingEdgesOf(v)) {
                refSources.add(ref.getEdgeSource(e));
            }
            assertThat(inSources).isSorted().containsExactlyInAnyOrderElementsOf(refSources);
            assertThat(bySource.inEnd(v) - bySource.inBegin(v)).isEqualTo(ref.inDegreeOf(v));
        }
        assertThat(bySource.maxOutDegree()).isEqualTo(maxDegree);
        assertThat(bySource.edgeCount()).isEqualTo(ref.edgeSet().size());
    }

    @Example
    void theOtherKindOfReverseIndexFailsInsteadOfAnsweringWrongly() {
        CsrGraph g = new CsrGraph(2, 1, new int[] {0, 1, 1}, new int[] {1}, CsrGraph.Reverse.SOURCES);
        assertThat(g.inSource(g.inBegin(1))).isEqualTo(0);
        assertThatThrownBy(() -> g.inEdge(0)).isInstanceOf(NullPointerException.class);
        assertThatThrownBy(() -> g.source(0)).isInstanceOf(NullPointerException.class);
    }

    @Example
    void inconsistentArraysAreRefused() {
        assertThatThrownBy(() -> new CsrGraph(2, 1, new int[] {0, 1, 0}, new int[] {1}, CsrGraph.Reverse.SOURCES))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new CsrGraph(2, 1, new int[] {0, 1, 1}, new int[] {2}, CsrGraph.Reverse.SOURCES))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new CsrGraph(2, 2, new int[] {0, 3, 2}, new int[] {1, 0}, CsrGraph.Reverse.SOURCES))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
