package dockline.margin;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Test oracle (it was the margins' cross-check until the charging route's pass replaced it; see
 * {@link FixpointMargins}): the minimum initial credit of the reserve objective, computed directly by a fixpoint over energy
 * levels (the optimisation baseline, kept as a cross-check of the threshold solver): for every vertex of arena
 * × goal automaton
 * reachable from the start, {@code need(x)} is the least battery level with which the robot, standing
 * at x, can force mission completion while the level never drops below the floor.
 *
 * <p>The equations, in the style of the minimum-initial-credit iteration for energy games of Brim,
 * Chaloupka, Doyen, Gentilini and Raskin (2011, "Faster algorithms for mean-payoff games", Formal
 * Methods in System Design 38), adapted to a capacity with saturation and to the reach-the-dock goal:
 * <ul>
 *   <li>completed robot vertex (tasks done, on a dock when required): {@code need = floor};</li>
 *   <li>other robot vertex: {@code need = min over actions of need(disturbance vertex)};</li>
 *   <li>disturbance vertex: {@code need = max(floor, max over outcomes (need(target) - delta))}, where an
 *       outcome into an avoided zone counts as infinite;</li>
 *   <li>any value above the capacity is infinite.</li>
 * </ul>
 * Saturation needs no special case: for a target value {@code t <= capacity},
 * {@code min(capacity, l + delta) >= t} exactly when {@code l + delta >= t}. Winning is monotone in the
 * level, so the robot wins from (x, l) exactly when {@code need(x) <= l <= capacity}.
 *
 * <p>The iteration starts from "infinite" everywhere except at completed vertices and only lowers
 * values (a least fixpoint of the winning sets, as for a reachability game), driven by a worklist of
 * vertices whose value fell; each value falls at most {@code capacity - floor + 2} times, so the cost is
 * O((C - F + 2) · Σ in-degree · out-degree) for capacity C and floor F, in int arrays.
 *
 * <p>Every fall of a value gets a time stamp. At a robot vertex the strategy for level l takes the
 * action that first brought the value to l or below; along any play the stamps then strictly fall, so
 * the strategy completes the mission (the classical rank argument for attractor strategies, Grädel,
 * Thomas and Wilke 2002, "Automata, Logics, and Infinite Games", ch. 2).
 */
public final class MinimumCredit {

    /** An infinite need: no level up to the capacity suffices. */
    public static final int INFINITE = Integer.MAX_VALUE;

    private static final int LOSE = -1;

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int floor;
    private final int capacity;
    private final int goalStates;

    private final LongIntMap ids = new LongIntMap(1 << 12);
    private final IntArrayList nodeVertex = new IntArrayList(1 << 12);
    private final IntArrayList nodeGoal = new IntArrayList(1 << 12);
    private int[] outStart;
    private int[] outTarget;
    private int[] outWeight;
    private int[] need;
    // per robot node: the history of falls (value, chosen disturbance node), in CSR once built
    private int[] histStart;
    private int[] histValue;
    private int[] histChoice;
    private int startNode = -1;

    private MinimumCredit(Arena arena, GoalAutomaton goal, int floor) {
        this.arena = arena;
        this.goal = goal;
        this.floor = floor;
        this.capacity = arena.mission().capacityUnits();
        this.goalStates = goal.stateCount();
    }

    /**
     * Computes the fixpoint for the given floor.
     *
     * @param floor the reserve floor in units (non-negative)
     */
    public static MinimumCredit solve(Arena arena, GoalAutomaton goal, int floor) {
        if (floor < 0) {
            throw new IllegalArgumentException("floor must not be negative");
        }
        MinimumCredit mc = new MinimumCredit(arena, goal, floor);
        mc.build();
        mc.iterate();
        return mc;
    }

    /** Convenience: compiles nothing, builds the goal automaton of the arena's mission. */
    public static MinimumCredit solve(Arena arena, int floor) {
        return solve(arena, GoalAutomaton.of(arena.mission()), floor);
    }

    private void build() {
        int v0 = arena.startVertex();
        int g0 = goal.initial(arena.cellZones(arena.cell(v0)));
        if (g0 == GoalAutomaton.REJECT) {
            outStart = new int[] {0};
            outTarget = new int[0];
            outWeight = new int[0];
            need = new int[0];
            histStart = new int[] {0};
            histValue = new int[0];
            histChoice = new int[0];
            return;
        }
        startNode = node(v0, g0);
        IntArrayList os = new IntArrayList(1 << 12);
        IntArrayList ot = new IntArrayList(1 << 14);
        IntArrayList ow = new IntArrayList(1 << 14);
        for (int x = 0; x < nodeVertex.size(); x++) {
            os.add(ot.size());
            int v = nodeVertex.get(x);
            int g = nodeGoal.get(x);
            if (arena.isRobot(v)) {
                if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                    continue;
                }
                for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                    ot.add(node(arena.target(e), g));
                    ow.add(0);
                }
            } else {
                for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                    int u = arena.target(e);
                    int g2 = goal.step(g, arena.cellZones(arena.cell(u)));
                    ot.add(g2 == GoalAutomaton.REJECT ? LOSE : node(u, g2));
                    ow.add(arena.weight(e));
                }
            }
        }
        os.add(ot.size());
        outStart = os.toArray();
        outTarget = ot.toArray();
        outWeight = ow.toArray();
    }

    private int node(int v, int g) {
        long key = Math.addExact(Math.multiplyExact((long) v, goalStates), g);
        int id = ids.get(key);
        if (id < 0) {
            id = nodeVertex.size();
            nodeVertex.add(v);
            nodeGoal.add(g);
            ids.put(key, id);
        }
        return id;
    }

    private void iterate() {
        int n = nodeVertex.size();
        need = new int[n];
        Arrays.fill(need, INFINITE);
        if (n == 0) {
            return;
        }
        // reverse CSR (edges into LOSE are dropped: it never changes)
        int[] inStart = new int[n + 1];
        for (int t : outTarget) {
            if (t >= 0) {
                inStart[t + 1]++;
            }
        }
        for (int i = 0; i < n; i++) {
            inStart[i + 1] += inStart[i];
        }
        int[] inSource = new int[inStart[n]];
        int[] fill = Arrays.copyOf(inStart, n);
        for (int x = 0; x < n; x++) {
            for (int i = outStart[x]; i < outStart[x + 1]; i++) {
                int t = outTarget[i];
                if (t >= 0) {
                    inSource[fill[t]++] = x;
                }
            }
        }
        IntArrayList hNode = new IntArrayList(n);
        IntArrayList hValue = new IntArrayList(n);
        IntArrayList hChoice = new IntArrayList(n);
        int[] queue = new int[n];
        boolean[] queued = new boolean[n];
        int head = 0;
        int size = 0;
        for (int x = 0; x < n; x++) {
            int v = nodeVertex.get(x);
            if (arena.isRobot(v) && goal.accepting(nodeGoal.get(x), arena.isDock(arena.cell(v))) && floor <= capacity) {
                need[x] = floor;
                hNode.add(x);
                hValue.add(floor);
                hChoice.add(-1);
                queue[(head + size++) % n] = x;
                queued[x] = true;
            }
        }
        while (size > 0) {
            int x = queue[head];
            head = (head + 1) % n;
            size--;
            queued[x] = false;
            for (int i = inStart[x]; i < inStart[x + 1]; i++) {
                int p = inSource[i];
                int value;
                if (arena.isRobot(nodeVertex.get(p))) {
                    value = need[x];
                } else {
                    value = disturbanceValue(p);
                }
                if (value < need[p]) {
                    need[p] = value;
                    if (arena.isRobot(nodeVertex.get(p))) {
                        hNode.add(p);
                        hValue.add(value);
                        hChoice.add(x);
                    }
                    if (!queued[p]) {
                        queue[(head + size++) % n] = p;
                        queued[p] = true;
                    }
                }
            }
        }
        // group the history by node, keeping the order of the falls (a stable counting sort)
        histStart = new int[n + 1];
        for (int i = 0; i < hNode.size(); i++) {
            histStart[hNode.get(i) + 1]++;
        }
        for (int i = 0; i < n; i++) {
            histStart[i + 1] += histStart[i];
        }
        histValue = new int[hNode.size()];
        histChoice = new int[hNode.size()];
        int[] hf = Arrays.copyOf(histStart, n);
        for (int i = 0; i < hNode.size(); i++) {
            int at = hf[hNode.get(i)]++;
            histValue[at] = hValue.get(i);
            histChoice[at] = hChoice.get(i);
        }
    }

    private int disturbanceValue(int p) {
        long value = floor;
        for (int i = outStart[p]; i < outStart[p + 1]; i++) {
            int t = outTarget[i];
            if (t < 0 || need[t] == INFINITE) {
                return INFINITE;
            }
            value = Math.max(value, (long) need[t] - outWeight[i]);
        }
        return value > capacity ? INFINITE : (int) value;
    }

    /** The floor the fixpoint was computed for. */
    public int floor() {
        return floor;
    }

    /** The least starting level that guarantees the mission, or {@link #INFINITE}. */
    public int needAtStart() {
        return startNode < 0 ? INFINITE : need[startNode];
    }

    /**
     * The need of arena vertex v with goal state g (the state after occupying v's cell), or
     * {@link #INFINITE} if that pair is not reachable from the start or cannot be won.
     */
    public int need(int v, int g) {
        if (g < 0) {
            return INFINITE;
        }
        int x = ids.get(Math.addExact(Math.multiplyExact((long) v, goalStates), g));
        return x < 0 ? INFINITE : need[x];
    }

    /**
     * Whether the robot wins at robot vertex v with the given task-progress mask (after occupying v's
     * cell) and level: {@code need <= level <= capacity}.
     */
    public boolean robotWins(int v, int progressMask, int level) {
        int g = goal.stateOfMask(progressMask);
        return g >= 0 && level <= capacity && need(v, g) <= level;
    }

    /** Number of arena × goal vertices reachable from the start. */
    public int productSize() {
        return nodeVertex.size();
    }

    /**
     * The robot's action at robot vertex v, goal state g and level l from the time-stamped strategy,
     * as the arena disturbance vertex, or -1 if (v, g, l) is not winning.
     */
    public int choice(int v, int g, int level) {
        if (g < 0) {
            return -1;
        }
        int x = ids.get(Math.addExact(Math.multiplyExact((long) v, goalStates), g));
        if (x < 0 || need[x] > level || level > capacity) {
            return -1;
        }
        // values fall along the history: take the first entry at or below the level
        for (int i = histStart[x]; i < histStart[x + 1]; i++) {
            if (histValue[i] <= level) {
                int c = histChoice[i];
                return c < 0 ? -1 : nodeVertex.get(c);
            }
        }
        return -1;
    }

    /**
     * The winning policy from the start with the given level: one entry per robot situation reachable
     * when the robot follows the time-stamped strategy against every disturbance choice.
     *
     * @throws IllegalArgumentException if the level does not win ({@code level < needAtStart()} or above capacity)
     */
    public Policy policy(int startLevel) {
        if (startLevel < needAtStart() || startLevel > capacity) {
            throw new IllegalArgumentException("start level " + startLevel + " does not win (need " + needAtStart() + ")");
        }
        List<PolicyEntry> entries = new ArrayList<>();
        LongIntMap seen = new LongIntMap(1 << 10);
        IntArrayList qv = new IntArrayList(1 << 10);
        IntArrayList qg = new IntArrayList(1 << 10);
        IntArrayList ql = new IntArrayList(1 << 10);
        qv.add(nodeVertex.get(startNode));
        qg.add(nodeGoal.get(startNode));
        ql.add(startLevel);
        seen.put(situationKey(qv.get(0), qg.get(0), startLevel), 0);
        for (int i = 0; i < qv.size(); i++) {
            int v = qv.get(i);
            int g = qg.get(i);
            int l = ql.get(i);
            if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                continue;
            }
            int d = choice(v, g, l);
            if (d < 0) {
                throw new IllegalStateException("strategy left the winning region at " + arena.cellOf(v));
            }
            Cell c = arena.cellOf(v);
            Action a = arena.action(d);
            entries.add(new PolicyEntry(c, l, arena.budgetLeft(v), goal.progressMask(g), a, null, arena.closures(v)));
            for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                int u = arena.target(e);
                int g2 = goal.step(g, arena.cellZones(arena.cell(u)));
                int l2 = (int) Math.min(capacity, (long) l + arena.weight(e));
                long key = situationKey(u, g2, l2);
                if (seen.get(key) < 0) {
                    seen.put(key, qv.size());
                    qv.add(u);
                    qg.add(g2);
                    ql.add(l2);
                }
            }
        }
        return new Policy(entries);
    }

    private long situationKey(int v, int g, int level) {
        return Math.addExact(Math.multiplyExact(Math.addExact(Math.multiplyExact((long) v, goalStates), g),
                (long) capacity + 1), level);
    }
}
