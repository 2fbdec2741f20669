package dockline.solve.game;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.util.PackedMinHeap;
import dockline.util.Progress;
import java.util.Arrays;

/**
 * The backward search both consumption routes run on arena × goal automaton (no battery levels in
 * the game): the generalisation of Dijkstra's algorithm to AND-OR graphs with superior cost
 * functions (D. E. Knuth, 1977, "A generalization of Dijkstra's algorithm", Information Processing
 * Letters 6(1):1-5). A robot position p = (robot vertex, goal state) is numbered {@code r · G + g},
 * a disturbance position {@code (d − robotCount) · G + g}.
 *
 * <p><b>What it computes.</b> Per robot position the least energy (units) the robot must be able to
 * spend to reach a target from it against every disturbance choice: targets are worth 0 (the caller
 * puts them in the queue), a disturbance position the maximum over its outcomes of (need of the
 * outcome − its delta), a robot position the minimum over its actions; values above a cap, and
 * plays that never reach a target, are {@link #INFINITE}. Charge steps (positive deltas) are left
 * out: the routes handle them on their own (the fast path has none before the end, the charging route
 * makes charging docks targets).
 *
 * <p><b>The walk.</b> {@link #drain} takes robot positions from a 4-ary heap of packed longs in
 * increasing value (lazy deletion); each one settled ({@link #settle}) is handed, for every
 * disturbance position before it (arena in-edges of non-positive delta, times the goal states
 * {@link GoalPredecessors} gives), to {@link #relax} with its value minus the delta. How a relaxation
 * values the disturbance position is the subclass's: {@link Counting} keeps a running maximum and a
 * count of settled outcomes (Knuth's rule: a disturbance position is final when all its outcomes
 * are), the charging route's floor sweep recomputes it from its outcomes (a label-correcting pass that
 * may lower values again after new targets are added). Either way every value set comes from values
 * already settled, so keys leave the heap in increasing order.
 *
 * <p><b>Cost.</b> O(m·G·log(n·G)) time for an arena of n vertices and m edges and G goal states
 * (one settle per robot position, one relaxation per predecessor pair), 4 bytes of value per robot
 * position and 8 per heap entry (at most one per improvement), plus what the subclass keeps.
 */
public abstract class MinMaxSearch {

    /** Value of a position from which no target can be forced (within the cap). */
    public static final int INFINITE = Integer.MAX_VALUE;

    protected final Arena arena;
    protected final GoalAutomaton goal;
    protected final GoalPredecessors inverse;
    /** Goal states G. */
    protected final int gc;
    /** Robot vertices of the arena. */
    protected final int rc;
    /** Per robot position its current value ({@link #INFINITE} until one is found). */
    protected final int[] need;
    /** Per robot position its chosen action: 1 + its out-edge offset (0: none); out-degrees are small. */
    protected final byte[] choice;
    protected final PackedMinHeap heap;

    /**
     * @throws ArithmeticException if arena × goal has more than {@code Integer.MAX_VALUE} positions
     */
    protected MinMaxSearch(Arena arena, GoalAutomaton goal, GoalPredecessors inverse) {
        this.arena = arena;
        this.goal = goal;
        this.inverse = inverse;
        this.gc = goal.stateCount();
        this.rc = arena.robotCount();
        Math.multiplyExact(arena.vertexCount(), gc);
        int robotN = Math.multiplyExact(rc, gc);
        this.need = new int[robotN];
        this.choice = new byte[robotN];
        this.heap = new PackedMinHeap(Math.min(robotN, 1 << 20));
    }

    /**
     * Settles the robot positions in the heap in increasing value until it is empty, the least value
     * left exceeds {@code stopAbove}, or position {@code stopAt} is settled (-1: none).
     *
     * @return robot positions settled
     */
    protected final long drain(int stopAbove, int stopAt, Progress.Tracker progress) {
        long settled = 0;
        while (!heap.isEmpty()) {
            long top = heap.peek();
            int x = (int) (top >>> 32);
            if (x > stopAbove) {
                break;
            }
            heap.poll();
            int u = (int) top;
            if (!settle(u, x)) {
                continue; // a stale entry
            }
            settled++;
            if ((settled & (Progress.EVERY - 1)) == 0) {
                progress.at(settled);
            }
            if (u == stopAt) {
                break;
            }
            int r = u / gc;
            int g2 = u - r * gc;
            int cellR = arena.cell(r);
            int gFrom = inverse.begin(cellR, g2);
            int gTo = inverse.end(cellR, g2);
            if (gFrom == gTo) {
                continue;
            }
            for (int i = arena.inBegin(r), end = arena.inEnd(r); i < end; i++) {
                int e = arena.inEdge(i);
                int w = arena.weight(e);
                if (w > 0) {
                    continue; // a charge step: the route's business (class comment)
                }
                long cost = (long) x - w;
                if (w == ArenaCompiler.LEFT_OUT) {
                    if (skipsLeftOut()) {
                        continue; // counted as settled from the start (Counting's strengthened game)
                    }
                    cost = INFINITE; // a closure into a left-out phase loses (the weakened game)
                }
                int d = arena.source(e);
                int dIdx = (d - rc) * gc;
                for (int j = gFrom; j < gTo; j++) {
                    int g = inverse.state(j);
                    relax(d, dIdx + g, g, cost);
                }
            }
        }
        return settled;
    }

    /**
     * Whether an outcome into a left-out closure phase ({@link ArenaCompiler#LEFT_OUT}, on a restricted arena) is
     * left out of the disturbance positions' maximum, i.e. never handed to {@link #relax}; when false it is handed
     * on as {@link #INFINITE} (lost).
     */
    protected boolean skipsLeftOut() {
        return false;
    }

    /**
     * Takes robot position {@code u} with heap key {@code x}: whether the entry is current (then the
     * position is settled at value x and its predecessors are relaxed), false for a stale entry.
     */
    protected abstract boolean settle(int u, int x);

    /**
     * One outcome of disturbance vertex {@code d} in goal state {@code g} (disturbance position
     * {@code dp}) is settled, with {@code cost} = its value minus its delta.
     */
    protected abstract void relax(int d, int dp, int g, long cost);

    /** The robot vertex that owns disturbance vertex {@code d} (its only in-edge). */
    protected final int ownerEdge(int d) {
        return arena.inEdge(arena.inBegin(d));
    }

    /**
     * Lowers robot position {@code rp} (of robot vertex {@code owner}) to {@code y} through out-edge
     * {@code edge} and queues it.
     */
    protected void improve(int rp, int owner, int edge, int y) {
        need[rp] = y;
        choice[rp] = (byte) (1 + edge - arena.outBegin(owner));
        heap.push(y, rp);
    }

    /** Robot vertices × goal states. */
    public final int positions() {
        return need.length;
    }

    public final Arena arena() {
        return arena;
    }

    public final int goalCount() {
        return gc;
    }

    /**
     * Whether robot position p completes the mission: its goal state accepts on its cell (all tasks done,
     * on a dock when the mission asks for one).
     */
    public final boolean completes(int p) {
        int r = p / gc;
        return goal.accepting(p - r * gc, arena.isDock(arena.cell(r)));
    }

    /** The current value of robot position p. */
    public final int need(int p) {
        return need[p];
    }

    /** The arena out-edge of robot position p's chosen action, or -1 when it has none. */
    public final int chosenEdge(int p) {
        int c = choice[p];
        return c > 0 ? arena.outBegin(p / gc) + c - 1 : -1;
    }

    /**
     * Knuth's counting form: a disturbance position keeps the largest cost of its settled outcomes
     * and how many are settled; when all are, it is final and its owner may improve. Values above the
     * cap are {@link #INFINITE}. A robot position is settled at most once per {@link #reset}. 5 bytes
     * per disturbance position, 2 more per robot position (settled flag, choice).
     */
    public static final class Counting extends MinMaxSearch {
        private final int[] distMax;
        private final byte[] processed;
        private final boolean[] done;
        private int cap = INFINITE;

        private final boolean leftOutSkipped;

        public Counting(Arena arena, GoalAutomaton goal, GoalPredecessors inverse) {
            this(arena, goal, inverse, false);
        }

        /**
         * @param leftOutSkipped the strengthened game of a restricted arena: an outcome into a left-out closure
         *                       phase is not the building's to choose, so it is counted as settled before the search
         *                       and never enters the maximum (false: it is lost, as {@link #INFINITE})
         */
        public Counting(Arena arena, GoalAutomaton goal, GoalPredecessors inverse, boolean leftOutSkipped) {
            super(arena, goal, inverse);
            int distN = Math.multiplyExact(arena.vertexCount() - rc, gc);
            this.distMax = new int[distN];
            this.processed = new byte[distN];
            this.done = new boolean[need.length];
            this.leftOutSkipped = leftOutSkipped;
            Arrays.fill(need, INFINITE);
            countLeftOut();
        }

        @Override
        protected boolean skipsLeftOut() {
            return leftOutSkipped;
        }

        /** In the strengthened game, the left-out outcomes of every disturbance position count as settled. */
        private void countLeftOut() {
            if (!leftOutSkipped) {
                return;
            }
            for (int d = rc; d < arena.vertexCount(); d++) {
                int n = 0;
                for (int f = arena.outBegin(d); f < arena.outEnd(d); f++) {
                    n += arena.weight(f) == ArenaCompiler.LEFT_OUT ? 1 : 0;
                }
                if (n > 0) {
                    Arrays.fill(processed, (d - rc) * gc, (d - rc + 1) * gc, (byte) n);
                }
            }
        }

        /** Forgets every value, choice and count (for another round with other targets). */
        public void reset() {
            Arrays.fill(need, INFINITE);
            Arrays.fill(distMax, 0);
            Arrays.fill(processed, (byte) 0);
            Arrays.fill(done, false);
            Arrays.fill(choice, (byte) 0);
            countLeftOut();
        }

        /** Makes robot position p a target: value 0, queued. */
        public void addTarget(int p) {
            need[p] = 0;
            heap.push(0, p);
        }

        /**
         * Runs the search from the targets queued (see {@link MinMaxSearch#drain}); values above
         * {@code cap} count as {@link #INFINITE}.
         *
         * @return robot positions settled
         */
        public long run(int cap, int stopAbove, int stopAt, Progress.Tracker progress) {
            this.cap = cap;
            return drain(stopAbove, stopAt, progress);
        }

        /** Whether robot position p is settled: its value and choice are final. */
        public boolean isFinal(int p) {
            return done[p];
        }

        /** The values, as the live array (the caller may keep it once it is done with the search). */
        public int[] needs() {
            return need;
        }

        @Override
        protected boolean settle(int u, int x) {
            if (done[u] || x != need[u]) {
                return false;
            }
            done[u] = true;
            return true;
        }

        @Override
        protected void relax(int d, int dp, int g, long cost) {
            int c = cost > cap ? INFINITE : (int) cost;
            if (c > distMax[dp]) {
                distMax[dp] = c;
            }
            if (++processed[dp] == arena.outEnd(d) - arena.outBegin(d)) {
                // every outcome is settled: the disturbance position is worth distMax; its owner may improve
                int y = distMax[dp];
                if (y == INFINITE) {
                    return;
                }
                int ownerEdge = ownerEdge(d);
                int owner = arena.source(ownerEdge);
                int rp = owner * gc + g;
                if (y < need[rp] && !done[rp]) {
                    improve(rp, owner, ownerEdge, y);
                }
            }
        }
    }
}
