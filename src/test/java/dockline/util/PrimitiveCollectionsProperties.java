package dockline.util;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Example;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.jgrapht.Graph;
import org.jgrapht.graph.DefaultDirectedGraph;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.traverse.BreadthFirstIterator;

/**
 * The primitive collections against the JDK's own collections as the reference ({@link HashMap},
 * {@link ArrayList}), and the visit queue against jgrapht's breadth-first iterator: the same sequence
 * of operations gives the same answers.
 */
class PrimitiveCollectionsProperties {

    @Provide
    Arbitrary<Long> keys() {
        // few distinct keys (so puts replace), extremes included (Long.MIN_VALUE was an "empty" marker once)
        return Arbitraries.oneOf(Arbitraries.longs().between(-40, 40),
                Arbitraries.of(Long.MIN_VALUE, Long.MAX_VALUE, 0L, -1L, 1L << 40));
    }

    @Property(tries = 200)
    void longIntMap_agreesWithHashMap(@ForAll @Size(max = 300) List<@IntRange(min = 0, max = 1000) Integer> values,
                                      @ForAll("keysList") List<Long> keys, @ForAll @IntRange(min = 0, max = 40) int expected) {
        LongIntMap m = new LongIntMap(expected);
        Map<Long, Integer> ref = new HashMap<>();
        for (int i = 0; i < Math.min(values.size(), keys.size()); i++) {
            long k = keys.get(i);
            if (i % 3 == 2) {
                assertThat(m.get(k)).isEqualTo(ref.getOrDefault(k, LongIntMap.ABSENT));
            } else {
                m.put(k, values.get(i));
                ref.put(k, values.get(i));
            }
            assertThat(m.size()).isEqualTo(ref.size());
        }
        for (Map.Entry<Long, Integer> e : ref.entrySet()) {
            assertThat(m.get(e.getKey())).isEqualTo(e.getValue());
        }
    }

    @Provide
    Arbitrary<List<Long>> keysList() {
        return keys().list().ofMaxSize(300);
    }

    @Property(tries = 200)
    void intArrayList_agreesWithArrayList(@ForAll @Size(max = 500) List<Integer> values,
                                          @ForAll @IntRange(min = 0, max = 10) int capacity) {
        IntArrayList a = new IntArrayList(capacity);
        List<Integer> ref = new ArrayList<>();
        for (int v : values) {
            a.add(v);
            ref.add(v);
            assertThat(a.last()).isEqualTo(v);
        }
        if (!ref.isEmpty()) {
            a.set(ref.size() / 2, 7);
            ref.set(ref.size() / 2, 7);
        }
        assertThat(a.size()).isEqualTo(ref.size());
        assertThat(a.toArray()).containsExactly(ref.stream().mapToInt(Integer::intValue).toArray());
        for (int i = 0; i < ref.size(); i++) {
            assertThat(a.get(i)).isEqualTo(ref.get(i));
        }
    }

    /**
     * The visit queue's breadth-first search against jgrapht's {@link BreadthFirstIterator} (the reference
     * library's own breadth-first order): the same ints in the same order, marked ints never entered. Up to
     * 3,000 ints, so the queue grows past its first 1,024 slots.
     */
    @Property(tries = 100)
    void visitQueue_agreesWithJgraphtBreadthFirst(@ForAll @IntRange(min = 1, max = 3000) int n,
                                                  @ForAll @IntRange(min = 0, max = 4) int degree,
                                                  @ForAll long seed) {
        java.util.Random rnd = new java.util.Random(seed);
        Graph<Integer, DefaultEdge> graph = new DefaultDirectedGraph<>(DefaultEdge.class);
        List<List<Integer>> out = new ArrayList<>();
        boolean[] marked = new boolean[n];
        for (int v = 0; v < n; v++) {
            out.add(new ArrayList<>());
            marked[v] = v > 0 && rnd.nextInt(10) == 0;
            if (!marked[v]) {
                graph.addVertex(v);
            }
        }
        for (int v = 0; v < n; v++) {
            for (int k = 0; k < degree; k++) {
                int t = rnd.nextInt(n);
                out.get(v).add(t);
                if (!marked[v] && !marked[t]) {
                    graph.addEdge(v, t);
                }
            }
        }
        List<Integer> expected = new ArrayList<>();
        new BreadthFirstIterator<>(graph, 0).forEachRemaining(expected::add);

        VisitQueue queue = new VisitQueue(n);
        for (int v = 0; v < n; v++) {
            if (marked[v]) {
                queue.mark(v);
            }
        }
        assertThat(queue.visit(0)).isTrue();
        List<Integer> order = new ArrayList<>();
        while (queue.hasNext()) {
            int v = queue.next();
            order.add(v);
            for (int t : out.get(v)) {
                queue.visit(t);
            }
        }
        assertThat(order).containsExactlyElementsOf(expected);
        assertThat(queue.visited()).isEqualTo(expected.size());
        assertThat(queue.visit(0)).isFalse();
        java.util.Set<Integer> reached = new java.util.HashSet<>(expected);
        for (int v = 0; v < n; v++) {
            assertThat(queue.seen(v)).isEqualTo(marked[v] || reached.contains(v));
        }
    }

    @Example
    void negativeValues_areRejected_soTheyCannotPassForEmptySlots() {
        assertThatThrownBy(() -> new LongIntMap(4).put(1, -1)).isInstanceOf(IllegalArgumentException.class);
    }
}
