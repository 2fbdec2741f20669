package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.goal.LapAutomaton;
import dockline.model.Mission;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.util.CsrGraph;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;

/**
 * The product of the arena, a goal automaton and the reserve monitor (battery level from the floor to
 * the capacity, and a losing sink) for the missions beyond one trip, stored in compressed-sparse-row int
 * arrays, forward and reverse, and built breadth-first from the start.
 *
 * <p>A vertex is (arena vertex, goal state, level); vertex 0 is the losing sink {@link #LOST} (battery
 * below the floor, or an avoided zone occupied), with a self-loop so that every vertex has a successor.
 * A robot vertex's edges go to the disturbance vertex of each of its actions (goal state and level
 * unchanged); a disturbance vertex's edges are the outcomes: the level becomes
 * {@code min(capacity, level + delta)}, the goal reads the zones of the cell reached. Two goals:
 * <ul>
 *   <li>{@link Kind#VISIT}: the mission's {@link GoalAutomaton}; a robot vertex where it accepts (tasks
 *       done, on a dock when required) is a target and has no successors (the mission is complete);</li>
 *   <li>{@link Kind#PATROL}: the {@link LapAutomaton}; a robot vertex in its lap-done state is accepting
 *       (a Büchi vertex) and the play goes on. With {@code budget-per: lap} the disturbance budget starts
 *       afresh there: the arena vertex becomes the same cell with the full budget and no at-most entry used,
 *       with the same doors and zones closed ({@link Arena#renewedAtLap}).</li>
 * </ul>
 *
 * <p>The graph itself is a {@link CsrGraph} whose reverse index holds the sources (the predecessors the
 * attractors sweep back over); the product adds per vertex its arena vertex, goal state and level, and per
 * edge its arena edge.
 *
 * <p>Size: at most (arena vertices × goal states × levels) vertices, stated before the build as an upper
 * bound; the build stops with {@link ProductTooLargeException} (exit 3) as soon as the vertices and edges
 * found need more than the memory budget, at {@link SizeEstimate#BYTES_PER_VERTEX} and
 * {@link SizeEstimate#BYTES_PER_EDGE}. Cost: O(N + M) time and memory for N vertices and M edges found,
 * plus one hash look-up per edge.
 */
public final class RoundsProduct extends CsrGraph {

    /** The goal of the product. */
    public enum Kind { VISIT, PATROL }

    /** The losing sink. */
    public static final int LOST = 0;

    private final Exploration x;

    private RoundsProduct(Exploration x) {
        super(x.vArena.length, x.edgeTarget.length, x.outStart, x.edgeTarget, Reverse.SOURCES);
        this.x = x;
    }

    /**
     * Builds the product reachable from the arena's start vertex at the given start level.
     *
     * @param floor       the reserve floor in units (levels below it are lost)
     * @param startLevel  the starting level in units
     * @param budgetBytes memory budget
     * @throws ProductTooLargeException when the vertices and edges found pass the budget
     */
    public static RoundsProduct build(Arena arena, Kind kind, int floor, int startLevel, long budgetBytes) {
        Exploration x = new Exploration(arena, kind, floor);
        x.explore(startLevel < floor ? 0 : 1, Math.min(x.capacity, startLevel), budgetBytes);
        return new RoundsProduct(x);
    }

    /**
     * Builds the product reachable from the arena's start vertex at every start level from the floor to the
     * capacity at once: one root per level, the root of level {@code l} is {@link #rootAt}{@code (l)}. Whether a
     * vertex is won depends only on what is reachable from it, so one solve of this product answers every starting
     * charge (the lowest start without a search over the start). At most the size bound, as {@link #build}.
     *
     * @throws ProductTooLargeException when the vertices and edges found pass the budget
     */
    public static RoundsProduct buildFromEveryStart(Arena arena, Kind kind, int floor, long budgetBytes) {
        Exploration x = new Exploration(arena, kind, floor);
        x.explore(Math.max(0, x.capacity - floor + 1), x.capacity, budgetBytes);
        return new RoundsProduct(x);
    }

    private static long satMul(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return (hi == 0 && lo >= 0) || (hi == -1 && lo < 0) ? lo : Long.MAX_VALUE;
    }

    private static long satAdd(long a, long b) {
        long r = a + b;
        return ((a ^ r) & (b ^ r)) < 0 ? Long.MAX_VALUE : r;
    }

    /**
     * The product's setting (arena, goal, floor, capacity, size bound) and what the breadth-first exploration
     * from the start found: per vertex its arena vertex, goal state and level, the forward CSR arrays and per
     * edge its arena edge. Not changed after {@link #explore}.
     */
    private static final class Exploration {
        final Arena arena;
        final Kind kind;
        final int floor;
        final int capacity;
        final int goalStates;
        final GoalAutomaton visitGoal;
        final LapAutomaton lapGoal;
        final boolean budgetPerLap;
        final SizeEstimate bound;

        int[] vArena;
        int[] vGoal;
        int[] vLevel;
        int[] outStart;
        int[] edgeTarget;
        int[] edgeArena;
        int start;

        Exploration(Arena arena, Kind kind, int floor) {
            this.arena = arena;
            this.kind = kind;
            this.floor = floor;
            Mission m = arena.mission();
            this.capacity = m.capacityUnits();
            if (kind == Kind.PATROL) {
                this.lapGoal = LapAutomaton.of(m);
                this.visitGoal = null;
                this.goalStates = lapGoal.stateCount();
                this.budgetPerLap = m.map().disturbances().budgetPerLap();
            } else {
                this.visitGoal = GoalAutomaton.of(m);
                this.lapGoal = null;
                this.goalStates = visitGoal.stateCount();
                this.budgetPerLap = false;
            }
            long levels = Math.max(0, capacity - floor + 1);
            long perArena = satMul(goalStates, levels);
            long v = satMul(arena.vertexCount(), perArena) + 1;
            long e = satMul(arena.edgeCount(), perArena) + 1;
            this.bound = new SizeEstimate(v, e, satAdd(satMul(v, SizeEstimate.BYTES_PER_VERTEX),
                    satMul(e, SizeEstimate.BYTES_PER_EDGE)), 0);
        }

        private long key(int av, int g, int level) {
            long k = Math.addExact(Math.multiplyExact((long) av, goalStates), g);
            return Math.addExact(Math.multiplyExact(k, (long) capacity - floor + 1), level - floor);
        }

        private int goalStep(int g, long zones) {
            return kind == Kind.PATROL ? lapGoal.step(g, zones) : visitGoal.step(g, zones);
        }

        private int goalInitial(long zones) {
            return kind == Kind.PATROL ? lapGoal.initial(zones) : visitGoal.initial(zones);
        }

        /**
         * Explores breadth-first from {@code count} roots at the start vertex: the levels {@code top - count + 1} ..
         * {@code top} (ids 1 .. count in that order); none when {@code count} is 0. The start is the root of {@code top}.
         */
        private void explore(int count, int top, long budgetBytes) {
            // sized from the bound (capped), so that small games stay small and large ones grow less often
            int guess = (int) Math.max(16, Math.min(bound.vertices() / 4, 1 << 21));
            IntArrayList va = new IntArrayList(guess);
            IntArrayList vg = new IntArrayList(guess);
            IntArrayList vl = new IntArrayList(guess);
            IntArrayList out = new IntArrayList(guess);
            IntArrayList tgt = new IntArrayList(2 * guess);
            IntArrayList ea = new IntArrayList(2 * guess);
            LongIntMap ids = new LongIntMap(guess);
            va.add(-1);
            vg.add(-1);
            vl.add(-1);
            int v0 = arena.startVertex();
            int g0 = goalInitial(arena.cellZones(arena.cell(v0)));
            if (count == 0 || g0 == GoalAutomaton.REJECT) {
                start = LOST;
            } else {
                for (int level = top - count + 1; level <= top; level++) {
                    ids.put(key(v0, g0, level), va.size());
                    va.add(v0);
                    vg.add(g0);
                    vl.add(level);
                }
                start = count;
            }
            for (int x = 0; x < va.size(); x++) {
                out.add(tgt.size());
                if (x == LOST) {
                    tgt.add(LOST);
                    ea.add(-1);
                    continue;
                }
                int av = va.get(x);
                int g = vg.get(x);
                int level = vl.get(x);
                boolean robot = arena.isRobot(av);
                if (robot && completes(g, arena.cell(av))) {
                    continue; // absorbed: the mission is complete
                }
                for (int e = arena.outBegin(av); e < arena.outEnd(av); e++) {
                    int u = arena.target(e);
                    int ng = g;
                    int nl = level;
                    if (!robot) {
                        long raw = (long) level + arena.weight(e);
                        if (raw < floor) {
                            tgt.add(LOST);
                            ea.add(e);
                            continue;
                        }
                        nl = (int) Math.min(capacity, raw);
                        ng = goalStep(g, arena.cellZones(arena.cell(u)));
                        if (ng == GoalAutomaton.REJECT) {
                            tgt.add(LOST);
                            ea.add(e);
                            continue;
                        }
                        if (budgetPerLap && ng == lapGoal.lapDone()) {
                            // new events are counted afresh; what a lasting event closed stays closed
                            u = arena.renewedAtLap(u);
                        }
                    }
                    long k = key(u, ng, nl);
                    int id = ids.get(k);
                    if (id < 0) {
                        id = va.size();
                        va.add(u);
                        vg.add(ng);
                        vl.add(nl);
                        ids.put(k, id);
                        if ((id & 0xFFFF) == 0) {
                            check(id, tgt.size(), budgetBytes);
                        }
                    }
                    tgt.add(id);
                    ea.add(e);
                }
            }
            out.add(tgt.size());
            check(va.size(), tgt.size(), budgetBytes);
            vArena = va.toArray();
            vGoal = vg.toArray();
            vLevel = vl.toArray();
            outStart = out.toArray();
            edgeTarget = tgt.toArray();
            edgeArena = ea.toArray();
        }

        /** Whether a robot vertex with this goal state on this cell ends the mission (visit goals only). */
        boolean completes(int g, int cell) {
            return kind == Kind.VISIT && visitGoal.accepting(g, arena.isDock(cell));
        }

        private void check(long vertices, long edges, long budgetBytes) {
            long bytes = satAdd(satMul(vertices, SizeEstimate.BYTES_PER_VERTEX),
                    satMul(edges, SizeEstimate.BYTES_PER_EDGE));
            if (bytes > budgetBytes) {
                throw new ProductTooLargeException(new SizeEstimate(vertices, edges, bytes, 0), budgetBytes, true);
            }
        }
    }

    public Arena arena() {
        return x.arena;
    }

    public Kind kind() {
        return x.kind;
    }

    public int floor() {
        return x.floor;
    }

    public int capacity() {
        return x.capacity;
    }

    /** The upper bound on the size stated before the build (arena vertices × goal states × levels). */
    public SizeEstimate bound() {
        return x.bound;
    }

    /**
     * The start vertex ({@link #LOST} when the start itself breaks the floor or is avoided); for a product from every
     * start, the root of a full battery.
     */
    public int start() {
        return x.start;
    }

    /**
     * The root of start level {@code level} in a product from every start ({@link #buildFromEveryStart}), or
     * {@link #LOST} when that level is below the floor or the start cell is avoided. In a product from one start,
     * the root of that start's level only.
     */
    public int rootAt(int level) {
        if (x.start == LOST || level > x.vLevel[x.start]) {
            return LOST;
        }
        int id = x.start - (x.vLevel[x.start] - level); // the roots are ids 1 .. start, one level apart
        return id < 1 ? LOST : id;
    }

    /** Whether the vertex belongs to the robot (the sink counts as the robot's: it has one move). */
    public boolean isRobot(int v) {
        return v == LOST || x.arena.isRobot(x.vArena[v]);
    }

    public int arenaVertex(int v) {
        return x.vArena[v];
    }

    public int goal(int v) {
        return x.vGoal[v];
    }

    public int level(int v) {
        return x.vLevel[v];
    }

    /** A patrol's accepting vertex: a robot vertex whose lap has just been completed. */
    public boolean lapDone(int v) {
        return x.kind == Kind.PATROL && v != LOST && x.vGoal[v] == x.lapGoal.lapDone() && x.arena.isRobot(x.vArena[v]);
    }

    /** A visit mission's target: a robot vertex where the mission is complete. */
    public boolean complete(int v) {
        return v != LOST && x.arena.isRobot(x.vArena[v]) && x.completes(x.vGoal[v], x.arena.cell(x.vArena[v]));
    }

    /** The arena edge of a product edge (-1 on the sink's self-loop). */
    public int arenaEdge(int e) {
        return x.edgeArena[e];
    }

    /** The goal automaton (visit missions) or null. */
    public GoalAutomaton visit() {
        return x.visitGoal;
    }

    /** Task progress of a vertex as a bit mask over the tasks (visit) or checkpoints of the lap (patrol). */
    public int progressMask(int v) {
        return x.kind == Kind.PATROL ? x.vGoal[v] : x.visitGoal.progressMask(x.vGoal[v]);
    }
}
