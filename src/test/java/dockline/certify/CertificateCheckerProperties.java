package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.BruteForce;
import dockline.fixtures.PlayEnumerator;
import dockline.fixtures.RandomMissions;
import dockline.fixtures.RandomPolicy;
import dockline.margin.MinimumCredit;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import org.jgrapht.Graph;
import org.jgrapht.alg.cycle.CycleDetector;
import org.jgrapht.graph.DefaultDirectedGraph;
import org.jgrapht.graph.DefaultEdge;

class CertificateCheckerProperties {

    @Provide
    Arbitrary<Mission> missions() {
        return RandomMissions.missions();
    }

    /**
     * Oracle: the definition of a winning policy, checked play by play by depth-first enumeration
     * ({@link PlayEnumerator}): the checker accepts exactly the policies whose every play completes
     * without a breach, and its worst minimum equals the minimum over all plays.
     */
    @Property(tries = 300)
    void randomPolicy_verdictAndWorstMinimum_matchPlayEnumeration(@ForAll("missions") Mission m, @ForAll long seed) {
        Arena a = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        int start = Math.max(floor, m.startUnits());
        Policy p = RandomPolicy.of(a, floor, start, seed);
        Certificate c = CertificateChecker.check(a, p, floor, start);
        Integer oracle = PlayEnumerator.worstMinimum(a, p, floor, start);
        Statistics.collect(c.ok() ? "certified" : "rejected");
        assertThat(c.ok()).as(c.reason()).isEqualTo(oracle != null);
        if (oracle != null) {
            assertThat(c.worstMinimumUnits()).isEqualTo(oracle);
        }
    }

    /**
     * Oracle: jgrapht's CycleDetector on a copy of the closed loop — the topological order exists
     * exactly when it finds no cycle, and every cycle the loop reports is a real cycle of edges.
     */
    @Property(tries = 300)
    void topologicalOrder_agreesWithJgrapht_andCyclesAreReal(@ForAll("missions") Mission m, @ForAll long seed) {
        Arena a = ArenaCompiler.compile(m);
        int start = m.capacityUnits();
        Policy p = RandomPolicy.of(a, 0, start, seed);
        ClosedLoop loop = CertificateChecker.closedLoop(a, p, 0, start);
        if (!loop.complete()) {
            return;
        }
        Graph<Integer, DefaultEdge> g = new DefaultDirectedGraph<>(DefaultEdge.class);
        for (int v = 0; v < loop.nodeCount(); v++) {
            g.addVertex(v);
        }
        for (int v = 0; v < loop.nodeCount(); v++) {
            for (int s = loop.succBegin(v); s < loop.succEnd(v); s++) {
                g.addEdge(v, loop.succNode(s));
            }
        }
        boolean cyclic = new CycleDetector<>(g).detectCycles();
        Statistics.collect(cyclic ? "cyclic" : "acyclic");
        int[] order = loop.topologicalOrder();
        assertThat(order == null).isEqualTo(cyclic);
        List<Integer> cycle = loop.findCycle();
        assertThat(cycle.isEmpty()).isEqualTo(!cyclic);
        for (int i = 0; i + 1 < cycle.size(); i++) {
            assertThat(g.containsEdge(cycle.get(i), cycle.get(i + 1))).isTrue();
        }
        if (!cycle.isEmpty()) {
            assertThat(cycle.get(0)).isEqualTo(cycle.get(cycle.size() - 1));
        }
        if (order != null) {
            int[] pos = new int[order.length];
            for (int i = 0; i < order.length; i++) {
                pos[order[i]] = i;
            }
            for (DefaultEdge e : g.edgeSet()) {
                assertThat(pos[g.getEdgeSource(e)]).isLessThan(pos[g.getEdgeTarget(e)]);
            }
        }
    }

    /**
     * Mutation test. Oracle: the brute-force attractor of the explicit game (Grädel, Thomas, Wilke
     * 2002, ch. 2) tells which actions lose from a situation. Take a certified policy, replace one
     * entry by such a losing action, and the checker must reject the result.
     */
    @Property(tries = 300)
    void certifiedPolicy_withOneLosingEntry_isRejected(@ForAll("missions") Mission m, @ForAll long seed) {
        Arena a = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        MinimumCredit mc = MinimumCredit.solve(a, floor);
        if (mc.needAtStart() == MinimumCredit.INFINITE) {
            return;
        }
        int start = mc.needAtStart();
        Policy good = mc.policy(start);
        assertThat(CertificateChecker.check(a, good, floor, start).ok()).isTrue();
        BruteForce bf = new BruteForce(m, floor);
        List<PolicyEntry> entries = good.entries();
        java.util.Random r = new java.util.Random(seed);
        int offset = r.nextInt(Math.max(1, entries.size()));
        for (int j = 0; j < entries.size(); j++) {
            int i = (offset + j) % entries.size();
            PolicyEntry e = entries.get(i);
            int v = a.robotVertex(e.cell().index(a.width()), e.budgetLeft());
            for (int re = a.outBegin(v); re < a.outEnd(v); re++) {
                int d = a.target(re);
                if (!losing(a, bf, d, e.level(), e.progress(), floor)) {
                    continue;
                }
                List<PolicyEntry> mutated = new ArrayList<>(entries);
                Action bad = a.action(d);
                mutated.set(i, new PolicyEntry(e.cell(), e.level(), e.budgetLeft(), e.progress(), bad));
                Certificate c = CertificateChecker.check(a, new Policy(mutated), floor, start);
                Statistics.collect("mutated");
                assertThat(c.ok()).as("entry %s changed to %s", e, bad).isFalse();
                return;
            }
        }
        Statistics.collect("no losing alternative");
    }

    /** Whether the disturbance wins from disturbance vertex d at this level and mask (brute force). */
    private static boolean losing(Arena a, BruteForce bf, int d, int level, int mask, int floor) {
        int cap = a.mission().capacityUnits();
        for (int e = a.outBegin(d); e < a.outEnd(d); e++) {
            int l = Math.min(cap, level + a.weight(e));
            int u = a.target(e);
            int m2 = bf.book().step(mask, a.cellOf(u));
            if (l < floor || m2 < 0 || !bf.wins(a.cellOf(u), a.budgetLeft(u), m2, l)) {
                return true;
            }
        }
        return false;
    }
}
