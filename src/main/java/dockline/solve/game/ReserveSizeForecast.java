package dockline.solve.game;

import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import java.util.Arrays;

/**
 * A forecast of the size of {@link ProductGame#fromStart} for the reserve monitor, made before the
 * build in O(arena × goal) time and memory, without the levels: the part of arena × goal the start
 * reaches, and for each pair the highest battery level it can be reached with; the levels from the
 * floor up to that one are counted as reachable.
 *
 * <p>The highest level is the least <i>deficit</i> (capacity − level) over the plays reaching the
 * pair: a robot edge keeps it, an outcome of weight w adds −w (a play whose level would fall below
 * the floor ends in the losing sink and reaches nothing), and a robot vertex on a dock with a charge
 * action (mission not complete) has deficit 0, since the robot can charge there until full. The
 * deficits are the least fixpoint of these rules, found by a label-correcting search with a FIFO
 * queue (E. F. Moore, 1959, "The shortest path through a maze"; the resets at docks rule out a
 * plain Dijkstra order). Completion vertices become ProductGame's WIN sink and are not counted.
 *
 * <p>Every level between the floor and the highest one is counted. The reachable levels of a pair
 * lie in that range, so the forecast is an upper bound on the real size; it is exact when every
 * level below the highest is reachable too, which holds when waiting costs exactly one unit (wait
 * is available everywhere and has no disturbance outcome, so the robot can lower its level one unit
 * at a time), as in the generated buildings. With other idle costs some levels may be missing.
 */
public final class ReserveSizeForecast {

    private static final int NONE = Integer.MAX_VALUE;

    /** The forecast: product vertices and edges (the two sinks included, as in ProductGame). */
    public record Forecast(long vertices, long edges) {
    }

    private ReserveSizeForecast() {
    }

    /**
     * @throws ArithmeticException if arena × goal has more than {@code Integer.MAX_VALUE} pairs
     */
    public static Forecast of(Arena arena, GoalAutomaton goal, ReserveMonitor monitor) {
        int gc = goal.stateCount();
        int n = Math.multiplyExact(arena.vertexCount(), gc);
        int a0 = arena.startVertex();
        int c0 = arena.cell(a0);
        int g0 = goal.initial(arena.cellZones(c0));
        int m0 = monitor.initialState();
        if (g0 == GoalAutomaton.REJECT || m0 == Monitor.REJECT || goal.accepting(g0, arena.isDock(c0))) {
            return new Forecast(2, 2);
        }
        int floor = monitor.floorUnits();
        int cap = monitor.capacityUnits();
        int maxDeficit = cap - floor;
        boolean[] charges = new boolean[arena.robotCount()];
        for (int r = 0; r < arena.robotCount(); r++) {
            for (int e = arena.outBegin(r); e < arena.outEnd(r); e++) {
                if (arena.actionKind(arena.target(e)) == ActionKind.CHARGE) {
                    charges[r] = true;
                }
            }
        }
        int[] deficit = new int[n];
        Arrays.fill(deficit, NONE);
        boolean[] queued = new boolean[n];
        Ring ring = new Ring(Math.max(16, Math.min(n, 1 << 22)));
        int p0 = a0 * gc + g0;
        deficit[p0] = charges[a0] ? 0 : cap - monitor.level(m0);
        ring.push(p0);
        queued[p0] = true;
        while (ring.size > 0) {
            int p = ring.pop();
            queued[p] = false;
            int v = p / gc;
            int g = p - v * gc;
            int dv = deficit[p];
            if (arena.isRobot(v)) {
                if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                    continue;
                }
                for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                    lower(arena.target(e) * gc + g, dv, deficit, queued, ring);
                }
                continue;
            }
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                int w = arena.weight(e);
                long d2 = Math.max(0L, (long) dv - w);
                if (d2 > maxDeficit) {
                    continue; // below the floor: the losing sink
                }
                int a2 = arena.target(e);
                int g2 = goal.step(g, arena.cellZones(arena.cell(a2)));
                if (g2 == GoalAutomaton.REJECT) {
                    continue;
                }
                int nd = (int) d2;
                if (charges[a2] && !goal.accepting(g2, arena.isDock(arena.cell(a2)))) {
                    nd = 0;
                }
                lower(a2 * gc + g2, nd, deficit, queued, ring);
            }
        }
        long vertices = 2;
        long edges = 2;
        for (int p = 0; p < n; p++) {
            int dv = deficit[p];
            if (dv == NONE) {
                continue;
            }
            int v = p / gc;
            int g = p - v * gc;
            if (arena.isRobot(v) && goal.accepting(g, arena.isDock(arena.cell(v)))) {
                continue;
            }
            long levels = (long) maxDeficit - dv + 1;
            vertices += levels;
            edges += levels * (arena.outEnd(v) - arena.outBegin(v));
        }
        return new Forecast(vertices, edges);
    }

    /** Lowers the deficit of pair {@code q} to {@code d} if that is lower, queueing it once. */
    private static void lower(int q, int d, int[] deficit, boolean[] queued, Ring ring) {
        if (d < deficit[q]) {
            deficit[q] = d;
            if (!queued[q]) {
                ring.push(q);
                queued[q] = true;
            }
        }
    }

    /** A first-in first-out queue of pair numbers in a growable ring of ints (no boxing). */
    private static final class Ring {
        private int[] a;
        private int head;
        int size;

        Ring(int capacity) {
            a = new int[capacity];
        }

        void push(int q) {
            if (size == a.length) {
                int[] bigger = new int[a.length * 2];
                for (int i = 0; i < size; i++) {
                    bigger[i] = a[(head + i) % a.length];
                }
                a = bigger;
                head = 0;
            }
            a[(head + size) % a.length] = q;
            size++;
        }

        int pop() {
            int p = a[head];
            head = head + 1 == a.length ? 0 : head + 1;
            size--;
            return p;
        }
    }
}
