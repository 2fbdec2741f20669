package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.SizeEstimate;
import java.util.Arrays;

/**
 * The size estimate of a {@link ProductGame} made before it is built (see
 * {@link ProductGame#estimate(Arena, GoalAutomaton, Monitor, boolean)}): O(arena) time for the coarse
 * bound (goal states per cell x levels per arena vertex, the levels cut by the least consumption,
 * Dijkstra 1959 on the arena), plus {@link ReserveSizeForecast} for the reserve monitor from the start.
 */
final class ProductSizeEstimate {

    private ProductSizeEstimate() {
    }

    static SizeEstimate estimate(Arena arena, GoalAutomaton goal, Monitor monitor, boolean everywhere,
                                 ProductOptions.IndexKind kind) {
        long ms = Math.max(0, monitor.stateBound());
        int av = arena.vertexCount();
        long vertices = 2;
        long edges = 2;
        int[] goals = goalStatesPerCell(arena, goal, monitor instanceof ReserveMonitor);
        int[] levels = levelBounds(arena, monitor, everywhere, ms, goals);
        for (int a = 0; a < av; a++) {
            long per = SizeEstimate.satMul(goals[arena.cell(a)], levels[a] < 0 ? ms : levels[a]);
            vertices = SizeEstimate.satAdd(vertices, per);
            edges = SizeEstimate.satAdd(edges, SizeEstimate.satMul(per, arena.outEnd(a) - arena.outBegin(a)));
        }
        if (!everywhere && monitor instanceof ReserveMonitor rm) {
            // the forecast over arena x goal with the highest level per pair: also an upper bound, and
            // exact when waiting costs one unit (the coarse bound above is 1.2-3.7 times the real size)
            try {
                ReserveSizeForecast.Forecast f = ReserveSizeForecast.of(arena, goal, rm);
                vertices = Math.min(vertices, f.vertices());
                edges = Math.min(edges, f.edges());
            } catch (ArithmeticException tooManyPairs) {
                // arena x goal past the int range: keep the coarse bound (the build is refused anyway)
            }
        }
        long slots = denseSlots(arena, goal, monitor);
        boolean dense = switch (kind) {
            case HASH -> false;
            case DENSE -> true;
            case AUTO -> monitor instanceof ReserveMonitor && slots <= ProductGame.MAX_ARRAY
                    && slots <= SizeEstimate.satMul(4, vertices);
        };
        return SizeEstimate.of(vertices, edges, dense ? slots : 0);
    }


    private static long denseSlots(Arena arena, GoalAutomaton goal, Monitor monitor) {
        return SizeEstimate.satMul(SizeEstimate.satMul(arena.vertexCount(), goal.stateCount()),
                Math.max(0, monitor.stateBound()));
    }

    /** Above this many goal states the estimate does not look at them cell by cell. */
    private static final int GOAL_SCAN_LIMIT = 1024;

    /**
     * Per cell: how many goal states a product triple there can have. The goal state of a triple is
     * always updated with its own cell's zones, so it is a fixpoint of goal.step for that cell (never
     * the avoid sink); and when every run that completes the mission is accepted (the reserve
     * monitor), a triple is never complete, because arriving complete goes to WIN instead.
     */
    private static int[] goalStatesPerCell(Arena arena, GoalAutomaton goal, boolean completionAlwaysAccepted) {
        int cells = arena.width() * arena.height();
        int gs = goal.stateCount();
        int[] out = new int[cells];
        for (int c = 0; c < cells; c++) {
            if (gs > GOAL_SCAN_LIMIT) {
                out[c] = gs;
                continue;
            }
            long zones = arena.cellZones(c);
            boolean dock = arena.isDock(c);
            for (int g = 0; g < gs; g++) {
                if (goal.step(g, zones) == g && !(completionAlwaysAccepted && goal.accepting(g, dock))) {
                    out[c]++;
                }
            }
        }
        return out;
    }

    /**
     * Per arena vertex: how many monitor states it can carry in the product (0 = unreachable), or
     * -1 for "any of the monitor's states".
     *
     * <p>For the reserve monitor the level at an arena vertex a is at most
     * max(start − c_s(a), capacity − c_c(a)), where c_s is the least consumption from the start and
     * c_c the least consumption since the last charging step (the level is at most the capacity
     * right after one): plays with no charging step are bounded by the first term, the others by
     * the second. Consumption is summed over edges with cost max(0, −weight), so both are lower
     * bounds of what any play spends, found by Dijkstra (1959).
     */
    private static int[] levelBounds(Arena arena, Monitor monitor, boolean everywhere, long ms, int[] goals) {
        int av = arena.vertexCount();
        int[] levels = new int[av];
        if (everywhere) {
            Arrays.fill(levels, -1);
            return levels;
        }
        if (monitor instanceof ReserveMonitor rm) {
            int top = rm.initialState();
            if (top == Monitor.REJECT) {
                return levels; // the start is lost: nothing but the sinks
            }
            long full = rm.capacityUnits() - rm.floorUnits();
            long[] fromStart = new long[av];
            Arrays.fill(fromStart, -1);
            fromStart[arena.startVertex()] = 0;
            leastConsumption(arena, fromStart, top, goals);
            // charging steps the start can reach without going below the floor; then, round by round,
            // those reachable after an earlier charge (a charge resets the bound to the capacity)
            long[] sinceCharge = new long[av];
            Arrays.fill(sinceCharge, -1);
            boolean added = addChargeTargets(arena, fromStart, sinceCharge);
            while (added) {
                leastConsumption(arena, sinceCharge, full, goals);
                added = addChargeTargets(arena, sinceCharge, sinceCharge);
            }
            for (int a = 0; a < av; a++) {
                long best = -1;
                if (fromStart[a] >= 0) {
                    best = top - fromStart[a];
                }
                if (sinceCharge[a] >= 0) {
                    best = Math.max(best, full - sinceCharge[a]);
                }
                levels[a] = best < 0 ? 0 : (int) Math.min(ms, best + 1);
            }
            return levels;
        }
        boolean[] seen = reachable(arena);
        for (int a = 0; a < av; a++) {
            levels[a] = seen[a] ? -1 : 0;
        }
        return levels;
    }

    /**
     * Marks with 0 in {@code sources} the targets of charging edges (weight &gt; 0) whose source is
     * reached in {@code reached}; returns whether any mark is new.
     */
    private static boolean addChargeTargets(Arena arena, long[] reached, long[] sources) {
        boolean added = false;
        for (int e = 0; e < arena.edgeCount(); e++) {
            if (arena.weight(e) > 0 && reached[arena.source(e)] >= 0 && sources[arena.target(e)] != 0) {
                sources[arena.target(e)] = 0;
                added = true;
            }
        }
        return added;
    }

    /** Arena vertices reachable from the start (breadth-first search). */
    private static boolean[] reachable(Arena arena) {
        boolean[] seen = new boolean[arena.vertexCount()];
        int[] queue = new int[arena.vertexCount()];
        int head = 0;
        int tail = 0;
        seen[arena.startVertex()] = true;
        queue[tail++] = arena.startVertex();
        while (head < tail) {
            int v = queue[head++];
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int t = arena.target(e);
                if (!seen[t]) {
                    seen[t] = true;
                    queue[tail++] = t;
                }
            }
        }
        return seen;
    }

    /**
     * Multi-source Dijkstra (1959) over the arena with edge cost max(0, −weight), not going past
     * {@code limit} (a play that spends more is below the floor): on entry {@code dist} holds 0 at
     * the sources and -1 or an earlier bound elsewhere; on return the least cost from any source
     * (-1 where none reaches within the limit). Plays do not pass through cells where no triple can
     * exist ({@code goals[cell] == 0}). A binary heap of packed longs; O(E log E).
     */
    private static void leastConsumption(Arena arena, long[] dist, long limit, int[] goals) {
        int av = arena.vertexCount();
        long[] heap = new long[16];
        int size = 0;
        boolean[] done = new boolean[av];
        for (int v = 0; v < av; v++) {
            if (dist[v] == 0) {
                if (size == heap.length) {
                    heap = Arrays.copyOf(heap, heap.length * 2);
                }
                heap[size] = pack(0, v);
                siftUp(heap, size++);
            }
        }
        while (size > 0) {
            long top = heap[0];
            heap[0] = heap[--size];
            siftDown(heap, size, 0);
            int v = (int) (top & 0xffffffffL);
            if (done[v]) {
                continue;
            }
            done[v] = true;
            if (goals[arena.cell(v)] == 0) {
                continue; // no triple here is ever expanded (e.g. a dock when there are no tasks)
            }
            long dv = top >>> 32;
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int t = arena.target(e);
                long nd = dv + Math.max(0, -arena.weight(e));
                if (!done[t] && (dist[t] < 0 || nd < dist[t]) && nd <= limit) {
                    dist[t] = nd;
                    if (size == heap.length) {
                        heap = Arrays.copyOf(heap, heap.length * 2);
                    }
                    heap[size] = pack(nd, t);
                    siftUp(heap, size++);
                }
            }
        }
    }

    private static long pack(long d, int v) {
        return (d << 32) | (v & 0xffffffffL);
    }

    private static void siftUp(long[] h, int i) {
        long x = h[i];
        while (i > 0) {
            int p = (i - 1) >>> 1;
            if (h[p] <= x) {
                break;
            }
            h[i] = h[p];
            i = p;
        }
        h[i] = x;
    }

    private static void siftDown(long[] h, int size, int i) {
        if (size == 0) {
            return;
        }
        long x = h[i];
        while (true) {
            int c = 2 * i + 1;
            if (c >= size) {
                break;
            }
            if (c + 1 < size && h[c + 1] < h[c]) {
                c++;
            }
            if (h[c] >= x) {
                break;
            }
            h[i] = h[c];
            i = c;
        }
        h[i] = x;
    }
}
