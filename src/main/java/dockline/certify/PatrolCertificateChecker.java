package dockline.certify;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.ZoneLabels;
import dockline.policy.Policy;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.KosarajuStrongConnectivityInspector;
import org.jgrapht.graph.DefaultDirectedGraph;
import org.jgrapht.graph.DefaultEdge;

/**
 * Checks a patrol policy on its own code path, trusting neither the solver nor its lap automaton: only the
 * model, the compiled arena and the policy's rows. Its lap bookkeeping is its own, read from the mission's
 * checkpoint names: the mask of checkpoints visited in the current lap, complete when every bit is set, and
 * empty again on the next cell (with {@code budget-per: lap} the budget and the at-most counts are full again on
 * completion, and what lasting events closed stays closed).
 *
 * <p>It builds the closed loop of the policy against every disturbance choice, breadth-first from the start,
 * and checks that (a) every situation reached has a legal policy row, (b) no outcome takes the battery below
 * the floor or the robot into an avoided zone, and (c) every cycle of the loop completes a lap. Because the
 * loop is finite and every situation has a successor, (c) is the same as: the loop without its lap-completing
 * situations has no cycle, i.e. each of its strongly connected components is one situation without a
 * self-loop. That is decided with jgrapht's {@link KosarajuStrongConnectivityInspector} (Kosaraju's algorithm
 * as in Sharir 1981) and cross-checked by Kahn's topological peeling (1962). Note that it is not enough that
 * every non-trivial component of the whole loop contains a completed lap: such a component may still hold a
 * cycle that avoids it, which the building could then repeat for ever; the check on the whole loop is made
 * too and reported.
 *
 * <p>The lowest level is the least level of the loop; the longest lap is a longest path over the acyclic
 * remainder from one completed lap to the next. Cost: O(N + E) plus jgrapht's copy of the loop.
 */
public final class PatrolCertificateChecker {

    /** Largest loop checked. */
    public static final int MAX_NODES = 5_000_000;

    private PatrolCertificateChecker() {
    }

    /** Checks the policy from the arena's start vertex, with the mission's floor and starting charge. */
    public static RoundsCertificate check(Arena arena, Policy policy, int floor, int startLevel) {
        return new Run(arena, policy, floor, startLevel).check();
    }

    private static final class Run {
        final Arena arena;
        final Policy policy;
        final int floor;
        final int startLevel;
        final int capacity;
        final long[] checkpointBits;
        final long avoidBits;
        final int full;
        final boolean perLap;
        final IntArrayList nodeVertex = new IntArrayList();
        final IntArrayList nodeLevel = new IntArrayList();
        final IntArrayList nodeMask = new IntArrayList();
        final IntArrayList succStart = new IntArrayList();
        final IntArrayList succ = new IntArrayList();
        final LongIntMap ids = new LongIntMap(1 << 12);

        Run(Arena arena, Policy policy, int floor, int startLevel) {
            this.arena = arena;
            this.policy = policy;
            this.floor = floor;
            this.startLevel = startLevel;
            Mission m = arena.mission();
            this.capacity = m.capacityUnits();
            BuildingMap map = m.map();
            List<String> cps = m.tasks().patrol();
            // the cells' label bits are the mission's ZoneLabels: one per checkpoint zone, one for every avoided zone
            ZoneLabels labels = ZoneLabels.of(m.tasks());
            this.checkpointBits = new long[cps.size()];
            for (int i = 0; i < cps.size(); i++) {
                known(map, cps.get(i));
                checkpointBits[i] = labels.bit(cps.get(i));
            }
            for (String a : m.tasks().avoid()) {
                known(map, a);
            }
            this.avoidBits = labels.avoidMask();
            this.full = (1 << cps.size()) - 1;
            this.perLap = map.disturbances().budgetPerLap();
        }

        private static void known(BuildingMap map, String zone) {
            if (map.zone(zone).isEmpty()) {
                throw new IllegalArgumentException("no zone '" + zone + "'");
            }
        }

        /** The lap mask after occupying a cell, or -1 in an avoided zone. */
        private int step(int mask, int cell) {
            long z = arena.cellZones(cell);
            if ((z & avoidBits) != 0) {
                return -1;
            }
            int s = mask == full ? 0 : mask;
            for (int i = 0; i < checkpointBits.length; i++) {
                if ((z & checkpointBits[i]) != 0) {
                    s |= 1 << i;
                }
            }
            return s;
        }

        private int node(int v, int level, int mask) {
            long k = ((long) v * (capacity + 1L) + level) * (full + 1L) + mask;
            int id = ids.get(k);
            if (id < 0) {
                if (nodeVertex.size() >= MAX_NODES) {
                    throw new ClosedLoop.TooLargeException(MAX_NODES);
                }
                id = nodeVertex.size();
                nodeVertex.add(v);
                nodeLevel.add(level);
                nodeMask.add(mask);
                ids.put(k, id);
            }
            return id;
        }

        private RoundsCertificate fail(String why, int lowest) {
            return new RoundsCertificate(false, why, nodeVertex.size(), lowest, -1, -1);
        }

        RoundsCertificate check() {
            int v0 = arena.startVertex();
            int m0 = step(0, arena.cell(v0));
            if (startLevel < floor) {
                return fail("the start level " + startLevel + " is below the floor " + floor, startLevel);
            }
            if (m0 < 0) {
                return fail("the start cell is in an avoided zone", startLevel);
            }
            node(v0, Math.min(capacity, startLevel), m0);
            int lowest = Integer.MAX_VALUE;
            for (int n = 0; n < nodeVertex.size(); n++) {
                succStart.add(succ.size());
                int v = nodeVertex.get(n);
                int level = nodeLevel.get(n);
                int mask = nodeMask.get(n);
                lowest = Math.min(lowest, level);
                Optional<Action> act = policy.lookup(arena.cellOf(v), level, arena.budgetLeft(v), mask, null,
                        arena.closures(v));
                if (act.isEmpty()) {
                    return fail("no policy row for " + arena.cellOf(v) + " at level " + level + " with "
                            + arena.budgetLeft(v) + " disturbances left" + (arena.closures(v).isEmpty() ? ""
                            : " (" + arena.closures(v) + ")") + " and lap mask " + mask, lowest);
                }
                int d = LoopGraph.legalChoice(arena, v, act.get());
                if (d < 0) {
                    return fail("the policy's action '" + act.get() + "' at " + arena.cellOf(v) + " is not possible",
                            lowest);
                }
                for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                    int u = arena.target(e);
                    long raw = (long) level + arena.weight(e);
                    if (raw < floor) {
                        return fail("at " + arena.cellOf(v) + " with level " + level + ", '" + act.get()
                                + "' can end at level " + raw + ", below the floor " + floor, (int) Math.max(raw,
                                Integer.MIN_VALUE));
                    }
                    int nm = step(mask, arena.cell(u));
                    if (nm < 0) {
                        return fail("at " + arena.cellOf(v) + ", '" + act.get() + "' can put the robot in an avoided"
                                + " zone at " + arena.cellOf(u), lowest);
                    }
                    if (perLap && nm == full) {
                        u = arena.renewedAtLap(u);
                    }
                    succ.add(node(u, (int) Math.min(capacity, raw), nm));
                }
            }
            succStart.add(succ.size());
            int n = nodeVertex.size();
            // (c) no cycle without a completed lap: Kahn's peeling of the loop with the completed laps cut out
            int[] order = peel(n);
            Boolean jgraphtCycle = n <= CertificateChecker.JGRAPHT_LIMIT ? cutHasCycleByJgrapht(n) : null;
            if (jgraphtCycle != null && jgraphtCycle != (order == null)) {
                return fail("internal: the two cycle checks disagree; the policy is not certified", lowest);
            }
            if (order == null) {
                return fail("a cycle of the closed loop completes no lap: the building can keep the robot from"
                        + " visiting " + missingOnCycle(n) + " for ever", lowest);
            }
            int[] len = new int[n];
            for (int k = n - 1; k >= 0; k--) {
                int x = order[k];
                int best = 0;
                for (int i = succStart.get(x); i < succStart.get(x + 1); i++) {
                    int y = succ.get(i);
                    best = Math.max(best, 1 + (nodeMask.get(y) == full ? 0 : len[y]));
                }
                len[x] = best;
            }
            int lap = 0;
            for (int x = 0; x < n; x++) {
                if (nodeMask.get(x) == full) {
                    lap = Math.max(lap, len[x]);
                }
            }
            int wayIn = nodeMask.get(0) == full ? 0 : len[0];
            int components = jgraphtCycle == null ? 0 : nonTrivialComponentsWithoutLap(n);
            return new RoundsCertificate(true, "every play of the policy completes a lap again and again and never"
                    + " goes below " + lowest + " units (floor " + floor + "); " + n + " situations checked, the loop"
                    + " without its completed laps has no cycle (" + (jgraphtCycle == null ? "Kahn's order; the loop is too"
                    + " large for the jgrapht copy" : "jgrapht strongly connected components and Kahn's order agree")
                    + "), " + (components == 0 ? "every" : "NOT every")
                    + " cycle-bearing component of the whole loop holds a completed lap", n, lowest, lap, wayIn);
        }

        private boolean cut(int y) {
            return nodeMask.get(y) == full;
        }

        private int[] peel(int n) {
            int[] indegree = new int[n];
            for (int x = 0; x < n; x++) {
                for (int i = succStart.get(x); i < succStart.get(x + 1); i++) {
                    if (!cut(succ.get(i))) {
                        indegree[succ.get(i)]++;
                    }
                }
            }
            int[] order = new int[n];
            int tail = 0;
            for (int x = 0; x < n; x++) {
                if (indegree[x] == 0) {
                    order[tail++] = x;
                }
            }
            for (int head = 0; head < tail; head++) {
                int x = order[head];
                for (int i = succStart.get(x); i < succStart.get(x + 1); i++) {
                    int y = succ.get(i);
                    if (!cut(y) && --indegree[y] == 0) {
                        order[tail++] = y;
                    }
                }
            }
            return tail == n ? order : null;
        }

        /** The loop without the completed laps, in jgrapht: does a strongly connected component hold a cycle? */
        private boolean cutHasCycleByJgrapht(int n) {
            Graph<Integer, DefaultEdge> g = graph(n, true);
            for (Set<Integer> c : new KosarajuStrongConnectivityInspector<>(g).stronglyConnectedSets()) {
                if (c.size() > 1) {
                    return true;
                }
                int x = c.iterator().next();
                if (g.containsEdge(x, x)) {
                    return true;
                }
            }
            return false;
        }

        /** On the whole loop: the cycle-bearing components that hold no completed lap. */
        private int nonTrivialComponentsWithoutLap(int n) {
            Graph<Integer, DefaultEdge> g = graph(n, false);
            int bad = 0;
            for (Set<Integer> c : new KosarajuStrongConnectivityInspector<>(g).stronglyConnectedSets()) {
                int x = c.iterator().next();
                boolean cyclic = c.size() > 1 || g.containsEdge(x, x);
                if (cyclic && c.stream().noneMatch(this::cut)) {
                    bad++;
                }
            }
            return bad;
        }

        private Graph<Integer, DefaultEdge> graph(int n, boolean withoutLaps) {
            Graph<Integer, DefaultEdge> g = new DefaultDirectedGraph<>(DefaultEdge.class);
            for (int x = 0; x < n; x++) {
                if (!withoutLaps || !cut(x)) {
                    g.addVertex(x);
                }
            }
            for (int x = 0; x < n; x++) {
                if (withoutLaps && cut(x)) {
                    continue;
                }
                for (int i = succStart.get(x); i < succStart.get(x + 1); i++) {
                    int y = succ.get(i);
                    if (!withoutLaps || !cut(y)) {
                        g.addEdge(x, y);
                    }
                }
            }
            return g;
        }

        /** Names of the checkpoints missing on some cycle that completes no lap (for the message). */
        private String missingOnCycle(int n) {
            Graph<Integer, DefaultEdge> g = graph(n, true);
            for (Set<Integer> c : new KosarajuStrongConnectivityInspector<>(g).stronglyConnectedSets()) {
                int x = c.iterator().next();
                if (c.size() > 1 || g.containsEdge(x, x)) {
                    int seen = full;
                    for (int y : c) {
                        seen &= nodeMask.get(y);
                    }
                    List<String> names = arena.mission().tasks().patrol();
                    StringBuilder b = new StringBuilder();
                    for (int i = 0; i < names.size(); i++) {
                        if ((seen & (1 << i)) == 0) {
                            b.append(b.length() == 0 ? "" : ", ").append(names.get(i));
                        }
                    }
                    return b.length() == 0 ? "a checkpoint" : "checkpoint(s) " + b;
                }
            }
            return "a checkpoint";
        }
    }
}
