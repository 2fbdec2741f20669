package dockline.bench;

import dockline.arena.Arena;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.Monitor;
import dockline.solve.discounted.DiscountedSolver;
import dockline.solve.discounted.DiscountedValueIteration;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.util.LongIntMap;
import java.util.Arrays;

/**
 * The comparator route for the discounted threshold question <b>without</b> the dock goal: the
 * product of the arena with a {@link DiscountedComparator}, over infinite plays. It answers exactly
 * the question {@link DiscountedValueIteration#decide} answers by optimisation, so the two are
 * cross-checked in tests and compared in {@link DiscountedBench}. (Missions, with their tasks and
 * dock, go through {@link DiscountedSolver} and the generic {@link ProductGame}.)
 *
 * <p>Vertices: {@link #ACCEPTED} (the comparator's accepting sink) and {@link #REJECTED} (its
 * losing sink), each with a self-loop, then the pairs (arena vertex, comparator state) reachable
 * from (start, initial), numbered in breadth-first order. A robot pair (x, s) has one edge per
 * action, to (action, s): choosing reads no weight. A disturbance pair (a, s) has one edge per
 * outcome a -> x' of weight w, to the sink the comparator reaches on w or to (x', s').
 *
 * <p>For {@code >} the robot must reach {@link #ACCEPTED} (co-safety): the robot's attractor. For
 * {@code >=} the robot must avoid {@link #REJECTED} for ever (safety): the robot wins exactly
 * outside the disturbance's attractor to {@link #REJECTED}; both are the same classical
 * linear-time backward search with the roles swapped (Grädel, Thomas, Wilke (eds.), "Automata,
 * Logics, and Infinite Games", LNCS 2500, 2002, ch. 2: safety and reachability games are dual;
 * the counter-based search as in {@link AttractorSolver}). The method follows the published work
 * on satisficing (threshold) problems in quantitative games (2021).
 *
 * <p>Layout, for large arenas: the comparator has few states (a handful to a few hundred) while the
 * arena has millions of vertices, so pairs are found through a per-arena-vertex chain ({@code head}
 * indexed by the arena vertex, {@code next} by the pair) rather than a hash table over all pairs:
 * the lookup touches an array in the arena's own order instead of a random slot of a table twice the
 * product's size. A chain holds at most {@value #CHAIN_LIMIT} pairs; further pairs of the same arena
 * vertex go to an open-addressing table, so a lookup stays O(1). Comparator steps are memoised per
 * (state, weight) in an int array. The arrays start at the arena's size (the product is often no
 * larger: most plays soon leave the comparator's band) and grow by half only when needed; the
 * in-degrees are counted while building, so {@link #robotWins()} builds the predecessor lists by one
 * counting-sort pass and no array is copied to trim it. No owner array is written: a pair is the
 * robot's iff its arena vertex is, which is kept per pair anyway; the predecessor offsets are summed in
 * place in the spent per-pair array; chain links are 1-based so that no array needs a fill; a robot
 * pair's moves into private actions neither step the comparator nor look anything up. Each pair is expanded by its own method call, so that the compiled code dropped
 * when a rare path (overflow, growth) is first taken is compiled again within the same build.
 *
 * <p>Cost: O(|V| + |E|) expected time and memory in the product, which has at most (arena vertices)
 * x (comparator states) vertices, plus one int per arena vertex for the chain heads; the attractor
 * stops as soon as the start is decided.
 */
final class DiscountedThresholdGame extends ProductCounts {

    public static final int ACCEPTED = 0;
    public static final int REJECTED = 1;
    private static final int START = 2;

    /** Pairs per arena vertex kept in its chain; more go to the overflow table. */
    static final int CHAIN_LIMIT = 4;

    private final Relation relation;
    // arrays may be longer than vertexCount (+1) / edgeCount: spare capacity is kept rather than copied away
    /** Per pair its arena vertex; the pair is the robot's iff that is below {@link #robotCount}. */
    private final int[] pairVertex;
    private final int robotCount;
    private final int[] outStart;
    private final int[] edgeTarget;
    /** Offsets of the predecessor lists (reverse CSR), from the in-degrees counted while building. */
    private final int[] inStart;
    private final int overflowPairs;
    private final long buildNanos;

    private DiscountedThresholdGame(Relation relation, int n, int m, int[] pairVertex, int robotCount, int[] outStart,
                                    int[] edgeTarget, int[] inStart, int comparatorStates, int overflowPairs,
                                    long buildNanos) {
        super(n, m, comparatorStates);
        this.relation = relation;
        this.pairVertex = pairVertex;
        this.robotCount = robotCount;
        this.outStart = outStart;
        this.edgeTarget = edgeTarget;
        this.inStart = inStart;
        this.overflowPairs = overflowPairs;
        this.buildNanos = buildNanos;
    }

    /**
     * Builds the product from the start vertex.
     *
     * @throws IllegalArgumentException if an arena weight exceeds the comparator's bound
     * @throws ArithmeticException      if the product would have more than {@code Integer.MAX_VALUE} vertices or edges
     */
    public static DiscountedThresholdGame build(Arena arena, DiscountedComparator comparator) {
        return build(arena, comparator, true);
    }

    /**
     * The same, and with {@code usePrivateActions} false every pair is indexed (as for arenas whose
     * actions are shared): for tests, which compare both ways.
     */
    static DiscountedThresholdGame build(Arena arena, DiscountedComparator comparator, boolean usePrivateActions) {
        long t0 = System.nanoTime();
        Builder b = new Builder(arena, comparator, usePrivateActions && privateActions(arena));
        b.run();
        int n = b.n;
        int[] pair = b.pair;
        // the predecessor offsets by prefix sums over the in-degrees, in place in the pair array (it is spent:
        // step v writes slot v, whose in-degree, if any, was read at step v / 2, and reads slot 2 v + 1 > v)
        int[] inStart = pair;
        int acc = 0;
        for (int v = 0; v < n; v++) {
            int d = pair[2 * v + 1];
            inStart[v] = acc;
            acc += d;
        }
        inStart[n] = acc;
        return new DiscountedThresholdGame(comparator.relation(), n, b.m, b.vA, b.robotCount, b.outStart, b.edgeTarget,
                inStart, comparator.stateCount(), b.overflow == null ? 0 : b.overflow.size(), System.nanoTime() - t0);
    }

    /**
     * The product under construction. Each pair is expanded by its own method call rather than in one
     * loop of one large method: the rare paths (overflow table, growth) are first taken at some size, the
     * just-in-time compiler then drops its compiled code for the method that holds them, and a method
     * called once per pair is compiled again within the same build, where a method called once per build
     * would run slowly for several builds.
     */
    private static final class Builder {
        final Arena arena;
        final DiscountedComparator comparator;
        final boolean privateActions;
        final int robotCount;
        /** The comparator's steps, memoised per (state, weight). */
        final ComparatorSteps steps;
        /** Per pair its arena vertex (which also tells its owner, so no owner array is written). */
        int[] vA;
        /**
         * Per pair, side by side: [2 id] its comparator state, [2 id + 1] its in-degree so far (one cache
         * line serves both the chain test and the count on each edge).
         */
        int[] pair;
        /** Chain links, 1-based (0 ends a chain) so that the fresh arrays need no filling. */
        int[] next;
        int[] outStart;
        int[] edgeTarget;
        /** Chain heads per arena vertex, 1-based like next; with private actions robot vertices only. */
        final int[] head;
        LongIntMap overflow;
        int n;
        int m;

        Builder(Arena arena, DiscountedComparator comparator, boolean privateActions) {
            this.arena = arena;
            this.comparator = comparator;
            this.privateActions = privateActions;
            this.robotCount = arena.robotCount();
            int cap = Math.addExact(arena.vertexCount(), START + 1);
            vA = new int[cap];
            pair = new int[Math.multiplyExact(cap, 2)];
            next = new int[cap];
            outStart = new int[cap + 1];
            edgeTarget = new int[Math.addExact(arena.edgeCount(), START)];
            // with private actions only robot vertices are ever looked up: the heads cover just those
            head = new int[privateActions ? robotCount : arena.vertexCount()];
            steps = new ComparatorSteps(comparator);
        }

        void run() {
            // sinks: self-loops; owners as if robot (ACCEPTED) and disturbance (REJECTED) vertices
            vA[ACCEPTED] = -1;
            vA[REJECTED] = Integer.MAX_VALUE;
            for (int v = 0; v < START; v++) {
                outStart[v] = v;
                edgeTarget[v] = v;
                pair[2 * v + 1] = 1;
            }
            m = START;
            int x0 = arena.startVertex();
            vA[START] = x0;
            pair[2 * START] = comparator.initialState();
            head[x0] = START + 1;
            n = START + 1;
            for (int v = START; v < n; v++) {
                int x = vA[v];
                expand(v, x);
            }
            outStart[n] = m;
        }

        /** Room for {@code more} edges after the current ones, and as many pairs after the current ones. */
        private void ensure(int more) {
            if (Math.addExact(m, more) > edgeTarget.length) {
                edgeTarget = Arrays.copyOf(edgeTarget, Math.max(Math.addExact(m, more), Math.addExact(m, m / 2)));
            }
            if (Math.addExact(n, more) > vA.length) {
                int c = Math.max(Math.addExact(n, more), Math.addExact(n, n / 2));
                vA = Arrays.copyOf(vA, c);
                pair = Arrays.copyOf(pair, Math.multiplyExact(c, 2));
                next = Arrays.copyOf(next, c);
                outStart = Arrays.copyOf(outStart, c + 1);
            }
        }

        /**
         * A pair's moves, each to a sink or to its pair, found in the chain or the overflow table, or new. A
         * robot pair's moves into private actions (see privateActions) each reach a pair that no other
         * product edge reaches, as this robot pair is expanded once and moving keeps the state, so the pair
         * is new and never looked up again: it is neither looked up nor indexed (and gets no link).
         */
        private void expand(int v, int x) {
            int eBegin = arena.outBegin(x);
            int eEnd = arena.outEnd(x);
            ensure(eEnd - eBegin);
            int[] vA = this.vA;
            int[] pair = this.pair;
            int[] next = this.next;
            int[] head = this.head;
            int[] edgeTarget = this.edgeTarget;
            int n = this.n;
            int m = this.m;
            int s = pair[2 * v];
            boolean robotMoves = x < robotCount;
            boolean fresh = privateActions && robotMoves;
            outStart[v] = m;
            for (int e = eBegin; e < eEnd; e++) {
                int t = arena.target(e);
                int s2 = robotMoves ? s : steps.step(s, arena.weight(e));
                int id;
                if (fresh) {
                    // room was made for every move of v; the in-degree (from 0) is counted below
                    id = n++;
                    vA[id] = t;
                    pair[2 * id] = s2;
                } else if (s2 == Monitor.REJECT) {
                    id = REJECTED;
                } else if (s2 == DiscountedComparator.ACCEPT) {
                    id = ACCEPTED;
                } else {
                    id = head[t] - 1;
                    int walked = 0;
                    while (id >= 0 && pair[2 * id] != s2) {
                        id = next[id] - 1;
                        walked++;
                    }
                    if (id < 0 && walked == CHAIN_LIMIT) {
                        id = overflowGet(t, s2);
                    }
                    if (id < 0) {
                        // room was made for every move of v
                        id = n++;
                        vA[id] = t;
                        pair[2 * id] = s2;
                        if (walked < CHAIN_LIMIT) {
                            next[id] = head[t];
                            head[t] = id + 1;
                        } else {
                            overflow.put(key(t, s2), id);
                        }
                    }
                }
                edgeTarget[m] = id;
                pair[2 * id + 1]++;
                m++;
            }
            this.n = n;
            this.m = m;
        }

        private int overflowGet(int t, int s2) {
            if (overflow == null) {
                overflow = new LongIntMap(64);
            }
            return overflow.get(key(t, s2));
        }
    }

    /**
     * Whether every disturbance vertex of the arena is private to one robot vertex: exactly one
     * in-edge, from a robot vertex, and the start is a robot vertex. The compiled arenas are so built
     * (a disturbance vertex is one robot vertex's action); then a disturbance pair is reached only by
     * the one robot move into it and needs no index. O(1): the arena found it when it was built.
     */
    static boolean privateActions(Arena arena) {
        return arena.isRobot(arena.startVertex()) && arena.privateActions();
    }

    private static long key(int arenaVertex, int state) {
        return ((long) arenaVertex << 32) | (state & 0xffffffffL);
    }

    /**
     * Whether the robot can force {@code DS relation v} from the start, by one linear-time attractor:
     * the reaching player's attractor to its target sink ({@link #ACCEPTED} for {@code >}, the robot
     * reaching; {@link #REJECTED} for {@code >=}, the disturbance reaching), on the predecessor lists
     * built here by a counting sort. The search stops as soon as the start joins, as that already
     * decides the answer. O(|V| + |E|) time, three int arrays of the product's size besides the graph.
     * May be called more than once (it does not change the game).
     */
    public boolean robotWins() {
        boolean safety = relation == Relation.AT_LEAST;
        final int n = vertexCount();
        final int m = edgeCount();
        final int[] pv = pairVertex;
        final int robots = robotCount;
        final int[] out = outStart;
        final int[] to = edgeTarget;
        // reverse CSR by counting sort on the target, on the offsets computed while building
        final int[] inStart = this.inStart;
        int[] inSource = new int[m];
        // fill[v] starts at inStart[v]; kept in the array that becomes the counters below
        int[] fill = Arrays.copyOf(inStart, n);
        for (int v = 0; v < n; v++) {
            for (int e = out[v]; e < out[v + 1]; e++) {
                inSource[fill[to[e]]++] = v;
            }
        }
        // count[v]: moves of v not yet known to enter the attractor that v still needs before it joins
        // (1 for the reaching player's vertices, all its out-edges for the other player's); 0 once joined
        int[] count = fill;
        int[] queue = new int[n];
        int head = 0;
        int tail = 0;
        int goal = safety ? REJECTED : ACCEPTED;
        for (int v = 0; v < n; v++) {
            boolean reacher = safety != (pv[v] < robots);
            count[v] = v == goal ? 0 : reacher ? 1 : out[v + 1] - out[v];
            if (count[v] == 0) {
                // the goal itself, or a vertex of the other player without moves: won vacuously
                queue[tail++] = v;
            }
        }
        boolean startJoins = count[START] == 0;
        while (head < tail && !startJoins) {
            int v = queue[head++];
            for (int i = inStart[v]; i < inStart[v + 1]; i++) {
                int u = inSource[i];
                if (count[u] > 0 && --count[u] == 0) {
                    queue[tail++] = u;
                    if (u == START) {
                        startJoins = true;
                        break;
                    }
                }
            }
        }
        return safety != startJoins;
    }

    /** Pairs found through the overflow table (arena vertices with over {@value #CHAIN_LIMIT} comparator states); for tests. */
    int overflowPairs() {
        return overflowPairs;
    }

    public long buildNanos() {
        return buildNanos;
    }
}
