package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.solve.game.ProductGame;
import dockline.util.LongIntMap;
import dockline.util.PagedBytes;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * What is read off an {@link ImplicitReserveGame} without solving it again: the policy and the
 * worst-case level of a recorded strategy's closed loop (from the start, robot follows its choice,
 * disturbance plays every outcome), and the vertices reachable from the start. Each is one search
 * over the implicit product's numbering (long numbers), O(what it visits), with a bit per slot or a hash map.
 */
final class ImplicitWalks {

    private ImplicitWalks() {
    }

    /**
     * The policy of the recorded choices: one row per robot triple of the closed loop from the start
     * (robot follows its choice, disturbance plays every outcome), the same rows as
     * {@link ProductGame#policy} gives for the same choices. O(closed loop); a bit per slot for the visited set.
     *
     * @throws IllegalArgumentException if the robot does not win from the start
     */
    static Policy policy(ImplicitReserveGame game, ImplicitReserveGame.Strategy strategy) {
        requireStartWon(strategy);
        final Arena arena = game.arena;
        final GoalAutomaton goal = game.goal;
        final ReserveMonitor monitor = game.monitor;
        final int rc = arena.robotCount();
        List<PolicyEntry> entries = new ArrayList<>();
        forEachInLoop(game, strategy, p -> {
            int x = game.vertexOf(p);
            if (x < rc) {
                int d = arena.target(arena.outBegin(x) + strategy.choice(p));
                entries.add(new PolicyEntry(arena.cellOf(x), monitor.level(game.levelOf(p)), arena.budgetLeft(x),
                        goal.progressMask(game.goalOf(p)), arena.action(d), null, arena.closures(x)));
            }
        });
        return new Policy(entries);
    }

    /**
     * Every triple of the closed loop of the recorded choices from the start (robot follows its choice,
     * disturbance plays every outcome), once each, in depth-first order; nothing when the start is lost or
     * already complete. O(closed loop); a bit per slot for the visited set.
     */
    static void forEachInLoop(ImplicitReserveGame game, ImplicitReserveGame.Strategy strategy,
                              java.util.function.LongConsumer visit) {
        long start = game.start();
        if (start < 0) {
            return;
        }
        PagedBytes seen = PagedBytes.bits(game.slotCount);
        long[] todo = new long[1 << 10];
        int tail = 0;
        seen.setBit(start);
        todo[tail++] = start;
        long[] succ = new long[16];
        while (tail > 0) {
            long p = todo[--tail];
            visit.accept(p);
            int k = loopSuccessors(game, strategy, p, succ, null);
            for (int i = 0; i < k; i++) {
                long q = succ[i];
                if (!seen.getBit(q)) {
                    seen.setBit(q);
                    if (tail == todo.length) {
                        todo = Arrays.copyOf(todo, tail * 2);
                    }
                    todo[tail++] = q;
                }
            }
        }
    }

    /**
     * The lowest battery level along any play of the closed loop of the recorded choices from the
     * start, the level on arrival at completion included: W(robot p) = min(level p, W(chosen
     * successor)); W(disturbance d) = min(level d, over outcomes W(successor) or the level on arrival
     * when the outcome completes the mission). The closed loop is acyclic, so a depth-first
     * post-order evaluates it in O(closed loop) (a hash map holds W).
     */
    static int worstCaseMinimum(ImplicitReserveGame game, ImplicitReserveGame.Strategy strategy) {
        requireStartWon(strategy);
        final ReserveMonitor monitor = game.monitor;
        long start = game.start();
        if (start == -2) {
            return monitor.level(monitor.initialState());
        }
        LongIntMap worst = new LongIntMap(1 << 10);
        long[] stack = new long[1 << 10];
        int sp = 0;
        stack[sp++] = start;
        long[] succ = new long[16];
        int[] arrive = new int[16];
        while (sp > 0) {
            long p = stack[sp - 1];
            if (worst.get(p) != LongIntMap.ABSENT) {
                sp--;
                continue;
            }
            int k = loopSuccessors(game, strategy, p, succ, arrive);
            int w = monitor.level(game.levelOf(p));
            boolean ready = true;
            for (int i = 0; i < k; i++) {
                if (arrive[i] >= 0) {
                    w = Math.min(w, arrive[i]);
                    continue;
                }
                int v = worst.get(succ[i]);
                if (v == LongIntMap.ABSENT) {
                    ready = false;
                    if (sp == stack.length) {
                        stack = Arrays.copyOf(stack, sp * 2);
                    }
                    stack[sp++] = succ[i];
                } else {
                    w = Math.min(w, v);
                }
            }
            if (ready) {
                worst.put(p, w);
                sp--;
            }
        }
        return worst.get(start);
    }

    private static void requireStartWon(ImplicitReserveGame.Strategy strategy) {
        if (!strategy.startWon()) {
            throw new IllegalArgumentException("the robot does not win from the start");
        }
    }

    /**
     * The successors of triple {@code p} in the closed loop of the strategy, into {@code succ}: the
     * robot's recorded choice, or every outcome of a disturbance triple (with {@code arrive} as in
     * {@link ImplicitReserveGame#outcomes}; -1 for a choice). Returns how many were written.
     */
    private static int loopSuccessors(ImplicitReserveGame game, ImplicitReserveGame.Strategy strategy, long p,
                                      long[] succ, int[] arrive) {
        int s = game.levelOf(p);
        int g = game.goalOf(p);
        int x = game.vertexOf(p);
        if (x < game.arena.robotCount()) {
            int d = game.arena.target(game.arena.outBegin(x) + strategy.choice(p));
            succ[0] = game.id(d, g, s);
            if (arrive != null) {
                arrive[0] = -1;
            }
            return 1;
        }
        return game.outcomes(x, g, s, succ, arrive);
    }

    /** Breadth-first search over the implicit product from the start: vertices reached and edges scanned. */
    static ImplicitReserveGame.Result bfs(ImplicitReserveGame game) {
        final Arena arena = game.arena;
        final GoalAutomaton goal = game.goal;
        final ReserveMonitor monitor = game.monitor;
        final long vertexCount = game.vertexCount;
        long start = game.start();
        if (start < 0) {
            return new ImplicitReserveGame.Result(start == -2, 0, 0, false, vertexCount);
        }
        final int rc = arena.robotCount();
        final PagedBytes seen = PagedBytes.bits(game.slotCount);
        LongQueue queue = new LongQueue();
        seen.setBit(start);
        queue.add(start);
        long edges = 0;
        long head = 0;
        while (head < queue.size()) {
            long p = queue.get(head++);
            int s = game.levelOf(p);
            int g = game.goalOf(p);
            int x = game.vertexOf(p);
            int from = arena.outBegin(x);
            int to = arena.outEnd(x);
            edges += to - from;
            if (x < rc) {
                for (int e = from; e < to; e++) {
                    long q = game.id(arena.target(e), g, s);
                    if (!seen.getBit(q)) {
                        seen.setBit(q);
                        queue.add(q);
                    }
                }
                continue;
            }
            for (int e = from; e < to; e++) {
                int s2 = monitor.step(s, arena.weight(e));
                if (s2 == Monitor.REJECT) {
                    continue;
                }
                int a2 = arena.target(e);
                int c2 = arena.cell(a2);
                int g2 = goal.step(g, arena.cellZones(c2));
                if (g2 == GoalAutomaton.REJECT || goal.accepting(g2, arena.isDock(c2))) {
                    continue; // a sink (LOSE or WIN): nothing to explore
                }
                long q = game.id(a2, g2, s2);
                if (!seen.getBit(q)) {
                    seen.setBit(q);
                    queue.add(q);
                }
            }
        }
        return new ImplicitReserveGame.Result(false, queue.size(), edges, false, vertexCount);
    }

    /**
     * A growable queue of longs in blocks of 2^20 (no boxing, and no copy when it grows, so its peak memory
     * is its size rather than 2.5 times it); indexed by long, as a search may pass 2^31 vertices.
     */
    private static final class LongQueue {
        private static final int SHIFT = 20;
        private static final int MASK = (1 << SHIFT) - 1;
        private long[][] blocks = new long[16][];
        private long size;

        void add(long v) {
            int b = (int) (size >>> SHIFT);
            if (b == blocks.length) {
                blocks = Arrays.copyOf(blocks, b * 2);
            }
            if (blocks[b] == null) {
                blocks[b] = new long[1 << SHIFT];
            }
            blocks[b][(int) (size & MASK)] = v;
            size++;
        }

        long get(long i) {
            return blocks[(int) (i >>> SHIFT)][(int) (i & MASK)];
        }

        long size() {
            return size;
        }
    }
}
