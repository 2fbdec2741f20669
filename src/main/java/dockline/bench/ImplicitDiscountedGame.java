package dockline.bench;

import dockline.arena.Arena;
import dockline.model.Relation;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.Monitor;
import dockline.util.LongIntMap;
import java.util.Arrays;

/**
 * The comparator route for the discounted threshold question without the dock goal, with the
 * product's disturbance pairs and all its edges left implicit: the same game as
 * {@link DiscountedThresholdGame} (same vertices, same edges, same answer), but only the robot
 * pairs (arena robot vertex, comparator state) are stored. A disturbance pair (a, s) is identified
 * by its owner robot pair (x, s) and the index of action a among x's moves, which is possible
 * because every disturbance vertex of a compiled arena is private to one robot vertex
 * ({@link DiscountedThresholdGame#privateActions}); its moves are generated from the arena's CSR
 * arrays and the memoised comparator steps, forward to find pairs and backward to tell
 * predecessors of a join (by inverting the comparator's step, {@link ComparatorSteps}).
 *
 * <p>Why: the stored product costs about 44 bytes per pair in arrays allocated afresh for every
 * question (pairs, chains, forward and reverse edges, counters, queue), several times the arena's
 * own cache footprint; here the cost is 16 bytes per robot pair and one byte per disturbance pair,
 * and a compiled arena has about five disturbance vertices per robot vertex. The search visits the
 * arena in sweeps along its numbering (see Search), so that its arrays are read nearly in order.
 *
 * <p>Solving: for {@code >=} the robot wins iff the start stays outside the disturbance's attractor
 * to the rejecting sink (safety); for {@code >} iff the start is in the robot's attractor to the
 * accepting sink (co-safety). Both by the classical counter-based backward search (Grädel, Thomas,
 * Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500, 2002, ch. 2) over the implicit
 * product, run on the fly while the product is found: one counter per robot pair and one byte per
 * disturbance pair (moves still needed before the vertex joins), a disturbance pair's joining
 * counted at once against its owner, and a join told at once to the predecessors already expanded
 * (later ones count it themselves). The search stops as soon as the start joins, so the answer may
 * come before the whole product is found.
 * The method follows the published work on satisficing (threshold) problems in quantitative games
 * (2021).
 *
 * <p>Cost: O(|V| + |E| + k |R| / 64) expected time, for the product's vertices V and edges E, the
 * arena's robot vertices R and k sweeps (each reads a bit per robot vertex; k is at most the number of
 * robot pairs, and a handful on floor plans, where the look-back catches pairs found just behind).
 * Memory: a 16-byte record per arena robot vertex (its first pair's, used or not) and per further pair,
 * one byte per disturbance pair and one bit per robot vertex, grown by half when the product outgrows
 * the arena. Requires {@link #applicable}: private disturbance vertices and out-degrees of at most
 * {@value #MAX_DEGREE} (counters are bytes).
 */
final class ImplicitDiscountedGame extends ProductCounts {

    /** Pairs per arena vertex kept in its chain; more go to the overflow table. */
    static final int CHAIN_LIMIT = 4;
    /** Largest out-degree a byte counter holds. */
    static final int MAX_DEGREE = Byte.MAX_VALUE;

    private final boolean robotWins;
    private final boolean stoppedEarly;
    private final int robotPairs;
    private final int joined;

    private ImplicitDiscountedGame(boolean robotWins, boolean stoppedEarly, int robotPairs, int vertexCount,
                                   int edgeCount, int comparatorStates, int joined) {
        super(vertexCount, edgeCount, comparatorStates);
        this.robotWins = robotWins;
        this.stoppedEarly = stoppedEarly;
        this.robotPairs = robotPairs;
        this.joined = joined;
    }

    /**
     * Whether this route can decide the arena: the start is a robot vertex, every disturbance
     * vertex has exactly one in-edge, from a robot vertex, and no vertex has more than
     * {@value #MAX_DEGREE} moves. O(1): the arena found these when it was built.
     */
    public static boolean applicable(Arena arena) {
        return DiscountedThresholdGame.privateActions(arena) && arena.maxOutDegree() <= MAX_DEGREE;
    }

    /**
     * Builds the reachable robot pairs from (start, initial) and decides the question.
     *
     * @throws IllegalArgumentException if the arena is not {@link #applicable}, or an arena weight
     *                                  exceeds the comparator's bound
     * @throws ArithmeticException      if the product would have more than {@code Integer.MAX_VALUE} vertices or edges
     */
    public static ImplicitDiscountedGame solve(Arena arena, DiscountedComparator comparator) {
        if (!applicable(arena)) {
            throw new IllegalArgumentException("the arena has shared disturbance vertices or more than "
                    + MAX_DEGREE + " moves at a vertex; use DiscountedThresholdGame");
        }
        Search s = new Search(arena, new ComparatorSteps(comparator));
        boolean startJoins = s.run();
        boolean safety = comparator.relation() == Relation.AT_LEAST;
        long vertices = 2L + s.n + s.na;
        long edges = 2L + s.na + s.outcomes;
        return new ImplicitDiscountedGame(safety != startJoins, startJoins, s.n, Math.toIntExact(vertices),
                Math.toIntExact(edges), comparator.stateCount(), s.joined);
    }

    /**
     * The search state: the product is built and solved in one pass. Robot pairs are expanded in
     * sweeps over the arena, alternately up and down its numbering (a bit per arena robot vertex marks
     * pairs still to expand), rather than in the order they are found: a compiled arena numbers robot
     * vertices by cell, row by row, so a sweep reads the arena's arrays and the pairs' records almost
     * in order, where a breadth-first order from the start jumps a row's length between consecutive
     * pairs and misses the cache at every step once the arena outgrows it. Pairs found a few floor
     * rows behind the sweep are expanded at once (a look-back, while their neighbourhood is still in
     * the cache); pairs found further behind wait for the next sweep. On the generated floors a
     * handful of sweeps suffice.
     *
     * <p>The attractor is computed on the fly (the counter-based search, run while the product is
     * found): an expansion counts the moves into pairs already joined, and a pair that joins at once
     * tells its expanded predecessors (found by the inverted comparator step), which are its
     * neighbours on the floor and so still in the cache; a pair not expanded yet is left to count the
     * move itself when it is. Every move into a joined pair is so counted exactly once, as the joins
     * are propagated to the end before the next expansion. The search stops as soon as the start
     * joins.
     *
     * <p>Each robot vertex is expanded by its own method call, for the reason given in
     * DiscountedThresholdGame's builder (compiled code dropped on a rare path is compiled again
     * within the same build).
     */
    private static final class Search {
        /** Ints per robot pair in {@link #pair}. */
        private static final int STRIDE = 4;
        /** The pair's comparator state plus one (0: the record is not in use). */
        private static final int STATE = 0;
        /** The next pair of the same arena vertex, plus one (0 ends the chain). */
        private static final int NEXT = 1;
        /**
         * Where the pair's disturbance pairs are in {@link #actionNeed}, less the number of the first
         * robot edge of its vertex: the pair's move along robot edge g has the slot ACTIONS + g, so a
         * predecessor's slot needs no read of the arena's offsets.
         */
        private static final int ACTIONS = 2;
        /** Moves still needed before the pair joins the attractor (0 once joined); -1 until it is expanded. */
        private static final int NEED = 3;

        final Arena arena;
        final ComparatorSteps steps;
        final boolean safety;
        /** The sink whose attractor is computed: rejecting for {@code >=}, accepting for {@code >}. */
        final int targetSink;
        final int otherSink;
        final int startVertex;
        final int initialState;
        final boolean byEdge;
        final int robots;
        /**
         * Per robot pair, side by side (one cache line serves a lookup and an expansion): see STATE ..
         * NEED. The first pair found at arena robot vertex x has the record number x, so that a lookup
         * reads the arena's neighbourhood in the same order as the arena; further pairs of x follow the
         * arena's robot vertices, chained from x's record.
         */
        int[] pair;
        /** Per disturbance pair (slot ACTIONS of its owner + robot edge): moves still needed before it joins. */
        byte[] actionNeed;
        /** One bit per arena robot vertex: has pairs not expanded yet. */
        final long[] pending;
        /** Joined pairs whose predecessors are still to be told: (arena vertex, pair) side by side. */
        int[] joins = new int[64];
        LongIntMap overflow;
        /** Robot pairs found; records past the arena's robot vertices in use. */
        int n;
        int extra;
        int na;
        long outcomes;
        int joined;
        /** Pairs expanded so far. */
        long expanded;
        /** Lowest and highest bitmap word marked since the sweep last looked back. */
        int dirtyLow;
        int dirtyHigh;

        Search(Arena arena, ComparatorSteps steps) {
            this.arena = arena;
            this.steps = steps;
            this.safety = steps.comparator().relation() == Relation.AT_LEAST;
            this.targetSink = safety ? Monitor.REJECT : DiscountedComparator.ACCEPT;
            this.otherSink = safety ? DiscountedComparator.ACCEPT : Monitor.REJECT;
            this.startVertex = arena.startVertex();
            this.initialState = steps.comparator().initialState();
            this.byEdge = arena.actionsByEdge();
            int robots = this.robots = arena.robotCount();
            // most plays soon leave the comparator's band, so most vertices have one pair, in its own record
            pair = new int[Math.multiplyExact(Math.addExact(robots, Math.max(16, robots / 8)), STRIDE)];
            actionNeed = new byte[Math.max(16, arena.vertexCount() - robots)];
            pending = new long[(robots + 63) >>> 6];
        }

        /** Builds and solves; whether the start joined the attractor. */
        boolean run() {
            find(startVertex, initialState, true);
            int words = pending.length;
            // a look-back of a few floor rows: pairs found just behind the sweep are expanded at once, while
            // their neighbourhood is still in the cache, rather than a whole sweep later
            int window = Math.max(4, (int) (3L * robots / Math.max(1, arena.height()) / 64) + 1);
            boolean up = true;
            while (true) {
                long before = expanded;
                dirtyLow = Integer.MAX_VALUE;
                dirtyHigh = -1;
                for (int i = 0; i < words; i++) {
                    int w = up ? i : words - 1 - i;
                    if (expandWord(w, up)) {
                        return true;
                    }
                    if (up) {
                        while (dirtyLow < w) {
                            int from = Math.max(dirtyLow, w - window);
                            dirtyLow = Integer.MAX_VALUE;
                            for (int k = from; k < w; k++) {
                                if (expandWord(k, true)) {
                                    return true;
                                }
                            }
                        }
                    } else {
                        while (dirtyHigh > w) {
                            int from = Math.min(dirtyHigh, w + window);
                            dirtyHigh = -1;
                            for (int k = from; k > w; k--) {
                                if (expandWord(k, false)) {
                                    return true;
                                }
                            }
                        }
                    }
                }
                if (expanded == before) {
                    return false;
                }
                up = !up;
            }
        }

        /** Expands the pending pairs of the 64 robot vertices of bitmap word w, in the sweep's direction; whether the start joined. */
        private boolean expandWord(int w, boolean up) {
            long[] pending = this.pending;
            long bits;
            while ((bits = pending[w]) != 0) {
                int b = up ? Long.numberOfTrailingZeros(bits) : 63 - Long.numberOfLeadingZeros(bits);
                pending[w] = bits & ~(1L << b);
                if (expandVertex((w << 6) + b)) {
                    return true;
                }
            }
            return false;
        }

        /**
         * Expands the pairs of robot vertex x not expanded yet; whether the start joined. They are x's
         * own record and the head of the chain after it, as further pairs are put first in that chain;
         * expanding one may add more (a wait returns to x with another state).
         */
        private boolean expandVertex(int x) {
            boolean more = true;
            while (more) {
                more = false;
                if (pair[STRIDE * x + NEED] < 0) {
                    if (expand(x, x)) {
                        return true;
                    }
                    more = true;
                }
                for (int id = pair[STRIDE * x + NEXT] - 1; id >= 0 && pair[STRIDE * id + NEED] < 0;
                     id = pair[STRIDE * id + NEXT] - 1) {
                    if (expand(x, id)) {
                        return true;
                    }
                    more = true;
                }
            }
            return false;
        }

        /** Expands robot pair v of arena vertex x; whether the start joined. */
        private boolean expand(int x, int v) {
            final Arena arena = this.arena;
            expanded++;
            int s = pair[STRIDE * v + STATE] - 1;
            int eBegin = arena.outBegin(x);
            int eEnd = arena.outEnd(x);
            int moves = eEnd - eBegin;
            if (na + moves > actionNeed.length) {
                actionNeed = Arrays.copyOf(actionNeed, Math.max(Math.addExact(na, moves), Math.addExact(na, na / 2)));
            }
            int base = na;
            int need = safety ? moves : 1;
            // with the actions numbered by edge, the robot edges' targets need not be read
            int shift = byEdge ? robots : 0;
            for (int e = eBegin; e < eEnd; e++) {
                int a = byEdge ? shift + e : arena.target(e);
                int fBegin = arena.outBegin(a);
                int fEnd = arena.outEnd(a);
                int actionNeeds = safety ? 1 : fEnd - fBegin;
                for (int f = fBegin; f < fEnd; f++) {
                    int s2 = steps.step(s, arena.weight(f));
                    if (s2 == targetSink) {
                        if (actionNeeds > 0) {
                            actionNeeds--;
                        }
                    } else if (s2 != otherSink) {
                        int t = find(arena.target(f), s2, true);
                        // a move into a pair that joined before this expansion is counted here, not by that pair
                        if (actionNeeds > 0 && pair[STRIDE * t + NEED] == 0) {
                            actionNeeds--;
                        }
                    }
                }
                outcomes += fEnd - fBegin;
                actionNeed[na++] = (byte) actionNeeds;
                if (actionNeeds == 0 && need > 0) {
                    need--;
                }
            }
            int[] pair = this.pair;
            pair[STRIDE * v + ACTIONS] = base - eBegin;
            pair[STRIDE * v + NEED] = need;
            return need == 0 && joins(x, v);
        }

        private void markPending(int t) {
            int w = t >>> 6;
            pending[w] |= 1L << t;
            if (w < dirtyLow) {
                dirtyLow = w;
            }
            if (w > dirtyHigh) {
                dirtyHigh = w;
            }
        }

        /**
         * The robot pair (t, s2): found in t's record, the chain after it or the overflow table, or (if
         * {@code add}) new; -1 if absent. A chain holds every pair of its vertex; a lookup walks at most
         * {@value #CHAIN_LIMIT} of them, and a longer chain has all its pairs in the overflow table.
         */
        private int find(int t, int s2, boolean add) {
            int[] pair = this.pair;
            int key = s2 + 1;
            int st = pair[STRIDE * t + STATE];
            if (st == key) {
                return t;
            }
            if (st == 0) {
                if (!add) {
                    return -1;
                }
                pair[STRIDE * t + STATE] = key;
                pair[STRIDE * t + NEED] = -1;
                markPending(t);
                n++;
                return t;
            }
            int id = pair[STRIDE * t + NEXT] - 1;
            int walked = 1;
            while (id >= 0 && walked < CHAIN_LIMIT) {
                if (pair[STRIDE * id + STATE] == key) {
                    return id;
                }
                id = pair[STRIDE * id + NEXT] - 1;
                walked++;
            }
            boolean longChain = id >= 0;
            if (longChain) {
                int found = overflow.get(key(t, s2));
                if (found >= 0) {
                    return found;
                }
            }
            if (!add) {
                return -1;
            }
            int robots = this.robots;
            if (STRIDE * ((long) robots + extra + 1) > pair.length) {
                long c = robots + Math.max(extra + 16L, extra + (robots + (long) extra) / 2);
                pair = this.pair = Arrays.copyOf(pair, Math.toIntExact(STRIDE * c));
            }
            id = robots + extra++;
            n++;
            pair[STRIDE * id + STATE] = key;
            pair[STRIDE * id + NEXT] = pair[STRIDE * t + NEXT];
            pair[STRIDE * id + NEED] = -1;
            pair[STRIDE * t + NEXT] = id + 1;
            markPending(t);
            if (longChain) {
                overflow.put(key(t, s2), id);
            } else if (walked == CHAIN_LIMIT) {
                // the chain just outgrew the walk: from now on its lookups go to the table, which gets all its pairs
                if (overflow == null) {
                    overflow = new LongIntMap(64);
                }
                overflow.put(key(t, pair[STRIDE * t + STATE] - 1), t);
                for (int p = id; p >= 0; p = pair[STRIDE * p + NEXT] - 1) {
                    overflow.put(key(t, pair[STRIDE * p + STATE] - 1), p);
                }
            }
            return id;
        }

        /**
         * Robot pair v of arena vertex x has just joined: tells its expanded predecessors, and theirs
         * in turn when they join, before anything else is expanded; whether the start joined. The
         * predecessors of a pair (x', s') are the disturbance pairs (a, s) for the arena's in-edges
         * a -> x' of weight w with s stepping to s' on w: those of the owner's pairs (owner(a), s) with
         * s the gap predecessor or (for the start only) the initial state.
         */
        private boolean joins(int x, int v) {
            joined++;
            if (v == startVertex) {
                // the start's pair is the first found at its vertex
                return true;
            }
            final Arena arena = this.arena;
            final boolean byEdge = this.byEdge;
            final int robots = this.robots;
            int top = 0;
            joins[top++] = x;
            joins[top++] = v;
            while (top > 0) {
                int v2 = joins[--top];
                int x2 = joins[--top];
                int s2 = pair[STRIDE * v2 + STATE] - 1;
                if (s2 == initialState) {
                    // no step leads back to the initial state
                    continue;
                }
                for (int i = arena.inBegin(x2), end = arena.inEnd(x2); i < end; i++) {
                    int f = arena.inEdge(i);
                    int w = arena.weight(f);
                    // the predecessor states first: where there is none, the move's owner need not be read
                    int s = steps.gapPredecessor(s2, w);
                    boolean fromStart = steps.initialPredecessor(s2, w);
                    if (s < 0 && !fromStart) {
                        continue;
                    }
                    int a = arena.source(f);
                    // the robot move into a: by a's number where the arena is so laid out, else a's one in-edge
                    int g = byEdge ? a - robots : arena.inEdge(arena.inBegin(a));
                    int xu = arena.source(g);
                    int u = s >= 0 ? find(xu, s, false) : -1;
                    if (u >= 0 && hit(u, g)) {
                        if (top + 2 > joins.length) {
                            joins = Arrays.copyOf(joins, 2 * joins.length);
                        }
                        joins[top++] = xu;
                        joins[top++] = u;
                    }
                    if (fromStart && xu == startVertex && hit(startVertex, g)) {
                        return true;
                    }
                }
            }
            return false;
        }

        /**
         * One move of robot pair u reaches a joined pair: its disturbance pair along robot edge g needs
         * one move fewer; whether u joins by it (then counted). A pair not expanded yet is left alone:
         * it counts the move when it is expanded.
         */
        private boolean hit(int u, int g) {
            int[] pair = this.pair;
            if (pair[STRIDE * u + NEED] <= 0) {
                return false;
            }
            int slot = pair[STRIDE * u + ACTIONS] + g;
            if (actionNeed[slot] > 0 && --actionNeed[slot] == 0 && --pair[STRIDE * u + NEED] == 0) {
                joined++;
                return true;
            }
            return false;
        }
    }

    private static long key(int arenaVertex, int state) {
        return ((long) arenaVertex << 32) | (state & 0xffffffffL);
    }

    /** Whether the robot can force {@code DS relation v} from the start. */
    public boolean robotWins() {
        return robotWins;
    }

    /**
     * Whether the search stopped once the start was decided, before the whole product was found; the
     * sizes ({@link #vertexCount()}, {@link #edgeCount()}, {@link #comparatorStates()}) are then those of the part explored.
     */
    public boolean stoppedEarly() {
        return stoppedEarly;
    }

    /** Robot pairs stored (the product's robot vertices without the sinks). */
    public int robotPairs() {
        return robotPairs;
    }

    /** Robot pairs that joined the attractor before the search stopped. */
    public int joinedRobotPairs() {
        return joined;
    }
}
