package dockline.arena;

import dockline.model.ResourceLimitException;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.RobotProfile;
import dockline.model.Terrain;
import dockline.model.ZoneLabels;
import dockline.util.IntArrayList;
import dockline.util.Progress;
import java.math.BigDecimal;
import java.util.Arrays;
import java.util.List;

/**
 * Compiles a mission (map + robot + disturbance model) into its {@link Arena}, following the
 * reference semantics of maps/README.md ("Game semantics").
 *
 * <p>A robot vertex is (free cell, disturbance state) ({@link DisturbanceStates}: budget left, doors and
 * zones closed by lasting events, events used per {@code at-most} entry); with no lasting rule and no
 * {@code at-most} the states are just the budget left 0..K and the numbering is the reference one.
 *
 * <p>Cost: O(F · D · A · S) time and memory, where F is the number of free cells, D the disturbance
 * states (K+1 without lasting rules), A ≤ 10 the actions per cell and S ≤ 8 the outcomes per action.
 * Energy figures are turned into units by {@link EnergyScale}, rounding against the robot.
 */
public final class ArenaCompiler {

    /** Neighbour offsets in the documented order: N, E, S, W, NE, SE, SW, NW. */
    static final int[] DX = {0, 1, 0, -1, 1, 1, -1, -1};
    static final int[] DY = {-1, 0, 1, 0, -1, 1, 1, -1};

    /**
     * Heap per robot vertex while compiling, about: its actions and outcomes in the growing lists and
     * the final forward and reverse CSR arrays (measured on the generated buildings, rounded up).
     */
    static final long BYTES_PER_ROBOT_VERTEX = 600;

    private ArenaCompiler() {
    }

    /**
     * The number of disturbance states of the mission's arena ({@link DisturbanceStates}), without
     * building the arena: O(cells + states · rules). The arena has this many robot vertices per free cell.
     * -1 when there are more than {@code maxStates}.
     */
    public static int disturbanceStateCount(Mission mission, int maxStates) {
        BuildingMap map = mission.map();
        int[][] cover = coverage(map);
        int[] doorRule = cover[0];
        int[] blockRule = cover[1];
        try {
            return DisturbanceStates.of(map, map.disturbances().budget(), doorRule, blockRule, maxStates,
                    renewsPerLap(mission)).count();
        } catch (DisturbanceStates.TooManyStates e) {
            return -1;
        }
    }

    /**
     * Builds the arena.
     *
     * @throws IllegalArgumentException if the mission breaks an invariant the loader checks
     *                                  (a task naming an unknown zone, start on a wall, a surface without energy)
     * @throws ArithmeticException      if the arena would have more than {@code Integer.MAX_VALUE} vertices or edges
     */
    /**
     * Heap the compile needs at its peak per robot vertex (free cell x budget level), with the growth
     * copies of its lists: measured on a 2048 x 2048 floor (4.2 million free cells, budget 0: 25 million
     * arena vertices, 42 million edges) it retained 1.4 GB, failed with 2 GB of heap and passed with 4 GB;
     * the whole {@code check} of that floor (fast path) ran out of memory with 3 GB, so the figure also
     * leaves room for the arena's life after the compile: the check is refused up front rather than
     * running out later.
     */
    static final long PEAK_BYTES_PER_ROBOT_VERTEX = 800;

    /**
     * Refuses, before anything is allocated, an arena whose estimated peak is more than the JVM's
     * maximum heap: the refusal names the size and the heap, instead of an out-of-memory error midway.
     */
    public static void refuseIfTooLarge(int freeCells, int budgetLevels) {
        refuseIfTooLarge(freeCells, freeCells, budgetLevels);
    }

    /** Heap per cell of the map (walls too) for the per-cell tables built before the vertices. */
    static final long BYTES_PER_CELL = 64;

    /**
     * As {@link #refuseIfTooLarge(int, int)}, counting the per-cell tables of all {@code cells} of the plan.
     * Past the int numbering of the arena's vertices (about 6 per robot position) it is refused for
     * that, with its own advice, when the memory alone would allow it.
     */
    public static void refuseIfTooLarge(int cells, int freeCells, int budgetLevels) {
        long robots = (long) freeCells * budgetLevels;
        long need = robots * PEAK_BYTES_PER_ROBOT_VERTEX + (long) cells * BYTES_PER_CELL;
        long heap = Runtime.getRuntime().maxMemory();
        String size = "the map's move graph would have " + robots + " robot positions (" + freeCells
                + " free cells x " + budgetLevels + " disturbance states) and need about " + (need >> 20)
                + " MB while it is built";
        if (need > heap) {
            throw new ResourceLimitException(size + ", more than the JVM's maximum heap of " + (heap >> 20)
                    + " MB (set by -Xmx)", "give the JVM more memory (java -Xmx" + Math.max(1, (need >> 30) + 1)
                    + "g ...), or make the game smaller: a smaller disturbance budget K or a coarser cell size"
                    + " (fewer cells)");
        }
        if (robots > Integer.MAX_VALUE / 8) {
            throw new ResourceLimitException(size + ", more vertices (about 6 per robot position) than the arena's"
                    + " int numbering holds (" + Integer.MAX_VALUE + ")", "make the game smaller: a smaller"
                    + " disturbance budget K or a coarser cell size (fewer cells); more memory does not help here");
        }
    }

    public static Arena compile(Mission mission) {
        return compile(mission, null, null);
    }

    /**
     * The energy change of an outcome into a phase that a restricted arena leaves out
     * ({@link #compileWithin}): so low that every product counts it below the floor, i.e. lost.
     */
    public static final int LEFT_OUT = -(Integer.MAX_VALUE / 4);

    /** The disturbance states of the mission's arena ({@link DisturbanceStates}), without building the arena. */
    public static DisturbanceStates states(Mission mission) {
        BuildingMap map = mission.map();
        int[][] cover = coverage(map);
        return DisturbanceStates.of(map, map.disturbances().budget(), cover[0], cover[1], Integer.MAX_VALUE / 2,
                renewsPerLap(mission));
    }

    /**
     * The arena restricted to the disturbance states kept ({@code keep[state]}, ids of {@code states}, which
     * must be {@link #states}'s for this mission): the robot vertices of the other states are left out, and an
     * outcome that would lead into one of them (a lasting closure) stays as an edge back to the robot's own
     * vertex with the energy change {@link #LEFT_OUT}, so that it loses in every product. The game on it is
     * therefore harder for the robot than the mission's: whatever it wins there it wins in the mission, with
     * a policy that never risks a left-out closure. The kept states are numbered in the order of their ids,
     * so that the base states 0..K keep their numbers when all of them are kept; {@link Arena#state} gives
     * the state's id in {@code states}. Cost: that of {@link #compile} on the kept states only.
     */
    public static Arena compileWithin(Mission mission, DisturbanceStates states, boolean[] keep) {
        return compile(mission, states, keep);
    }

    /** Per cell, the door-shut and the blockage rule that apply (first in the file wins), or -1. */
    private static int[][] coverage(BuildingMap map) {
        int w = map.width();
        int cells = w * map.height();
        List<EventRule> rules = map.disturbances().rules();
        int[] doorRule = filled(cells);
        int[] blockRule = filled(cells);
        for (int r = 0; r < rules.size(); r++) {
            EventRule rule = rules.get(r);
            for (Cell c : rule.cells()) {
                if (!map.inside(c)) {
                    continue;
                }
                int ci = c.index(w);
                if (rule.kind() == EventKind.DOOR_SHUT && doorRule[ci] < 0 && map.terrainAt(c).door()) {
                    doorRule[ci] = r;
                } else if (rule.kind() == EventKind.BLOCKAGE && blockRule[ci] < 0) {
                    blockRule[ci] = r;
                }
            }
        }
        return new int[][] {doorRule, blockRule};
    }

    private static Arena compile(Mission mission, DisturbanceStates given, boolean[] keep) {
        BuildingMap map = mission.map();
        RobotProfile robot = mission.robot();
        EnergyScale scale = mission.scale();
        int w = map.width();
        int h = map.height();
        int cells = w * h;
        int budget = map.disturbances().budget();
        boolean eight = robot.neighbourhood() == Neighbourhood.EIGHT;
        int dirs = eight ? 8 : 4;
        // refuse what cannot fit before the per-cell tables are allocated (they alone are about 60 bytes a
        // cell: 250 MB on the largest plan the reader accepts); the states counted later may refuse again
        int freeCells = 0;
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                if (map.terrainAt(new Cell(x, y)).free()) {
                    freeCells++;
                }
            }
        }
        refuseIfTooLarge(cells, freeCells, budget + 1);

        boolean[] free = new boolean[cells];
        boolean[] dock = new boolean[cells];
        int[] cost = new int[cells];
        int[] diagCost = new int[cells];
        int[] slot = new int[cells];
        Arrays.fill(slot, -1);
        int freeCount = 0;
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int c = y * w + x;
                Terrain t = map.terrainAt(new Cell(x, y));
                if (t.free()) {
                    free[c] = true;
                    dock[c] = t.dock();
                    BigDecimal wh = robot.moveWh().get(t.surface());
                    if (wh == null) {
                        throw new IllegalArgumentException("no move energy for surface '" + t.surface() + "'");
                    }
                    cost[c] = scale.consumption(wh);
                    diagCost[c] = scale.diagonalConsumption(wh);
                    slot[c] = freeCount++;
                }
            }
        }
        int[] slotCell = new int[freeCount];
        for (int c = 0; c < cells; c++) {
            if (slot[c] >= 0) {
                slotCell[slot[c]] = c;
            }
        }
        // only the zones the tasks name get a label bit, so the map may have any number of zones
        long[] zones = ZoneLabels.of(mission).cellMasks(map);
        // event coverage per cell: rule index (first rule wins; drag takes the largest extra)
        List<EventRule> rules = map.disturbances().rules();
        int[] doorRule = filled(cells);
        int[] blockRule = filled(cells);
        int[] slipRule = filled(cells);
        int[] dragRule = filled(cells);
        int[] dragExtra = new int[cells];
        for (int r = 0; r < rules.size(); r++) {
            EventRule rule = rules.get(r);
            int extra = rule.kind() == EventKind.DRAG ? scale.consumption(rule.extraWh()) : 0;
            for (Cell c : rule.cells()) {
                if (!map.inside(c)) {
                    continue;
                }
                int ci = c.index(w);
                switch (rule.kind()) {
                    case DOOR_SHUT -> {
                        if (doorRule[ci] < 0 && map.terrainAt(c).door()) {
                            doorRule[ci] = r;
                        }
                    }
                    case BLOCKAGE -> {
                        if (blockRule[ci] < 0) {
                            blockRule[ci] = r;
                        }
                    }
                    case SLIP -> {
                        if (slipRule[ci] < 0) {
                            slipRule[ci] = r;
                        }
                    }
                    case DRAG -> {
                        if (dragRule[ci] < 0 || extra > dragExtra[ci]) {
                            dragRule[ci] = r;
                            dragExtra[ci] = extra;
                        }
                    }
                }
            }
        }
        int waitCost = scale.consumption(robot.waitWh());
        int chargeGain = scale.gain(robot.chargeWh());

        Cell start = mission.start();
        if (!map.isFree(start)) {
            throw new IllegalArgumentException("start cell " + start + " is not a free cell");
        }
        long limit = Runtime.getRuntime().maxMemory() / 2;
        int maxStates = (int) Math.min(Integer.MAX_VALUE / 16, limit / BYTES_PER_ROBOT_VERTEX / Math.max(1, freeCount) + 1);
        DisturbanceStates states = given;
        if (states == null) {
            try {
                states = DisturbanceStates.of(map, budget, doorRule, blockRule, Math.max(maxStates, budget + 1),
                        renewsPerLap(mission));
            } catch (DisturbanceStates.TooManyStates e) {
                long robots = (long) freeCount * e.found;
                throw new ArenaTooLargeException(freeCount, e.found, robots, robots * BYTES_PER_ROBOT_VERTEX, limit,
                        true);
            }
        }
        // the kept states, numbered in the order of their ids (all of them for the mission's own arena)
        int[] local = new int[states.count()];
        int kk = 0;
        for (int k = 0; k < states.count(); k++) {
            local[k] = keep == null || keep[k] ? kk++ : -1;
        }
        int[] global = new int[kk];
        for (int k = 0; k < states.count(); k++) {
            if (local[k] >= 0) {
                global[local[k]] = k;
            }
        }
        if (local[budget] < 0) {
            throw new IllegalArgumentException("the start's state (full budget, nothing closed) must be kept");
        }
        if (!states.plain() || kk != states.count()) {
            // without lasting events the arena is as before (its size was never checked here); with them
            // the states multiply the cells, so refuse before allocating what cannot fit
            long robots = (long) freeCount * kk;
            long bytes = robots * BYTES_PER_ROBOT_VERTEX;
            if (bytes > limit || robots > Integer.MAX_VALUE / 16) {
                throw new ArenaTooLargeException(freeCount, kk, robots, bytes, limit, false);
            }
        }
        refuseIfTooLarge(cells, freeCount, kk);
        int robotCount = Math.multiplyExact(freeCount, kk);

        IntArrayList vCell = new IntArrayList(robotCount * 6);
        IntArrayList vBudget = new IntArrayList(robotCount * 6);
        IntArrayList vState = new IntArrayList(robotCount * 6);
        for (int s = 0; s < freeCount; s++) {
            for (int k = 0; k < kk; k++) {
                vCell.add(slotCell[s]);
                vBudget.add(states.budgetLeft(global[k]));
                vState.add(global[k]);
            }
        }
        boolean closable = states.itemCount() > 0;
        // robot edges first (to disturbance vertices numbered on the fly), outcomes after
        IntArrayList aKind = new IntArrayList(robotCount * 5);
        IntArrayList aTarget = new IntArrayList(robotCount * 5);
        IntArrayList robotOutStart = new IntArrayList(robotCount + 1);
        int next = robotCount;
        int[] nb = new int[8];
        Progress.Tracker progress = Progress.phase("building the move graph", 2L * robotCount);
        for (int r = 0; r < robotCount; r++) {
            if ((r & (Progress.EVERY - 1)) == 0) {
                progress.at(r);
            }
            robotOutStart.add(next - robotCount);
            int c = vCell.get(r);
            int n = closable ? neighbours(c, w, h, free, dirs, nb, states, vState.get(r))
                    : neighbours(c, w, h, free, dirs, nb);
            for (int i = 0; i < n; i++) {
                aKind.add(ActionKind.MOVE.ordinal());
                aTarget.add(nb[i]);
                next = Math.addExact(next, 1);
            }
            aKind.add(ActionKind.WAIT.ordinal());
            aTarget.add(c);
            next = Math.addExact(next, 1);
            if (dock[c] && chargeGain > 0) {
                aKind.add(ActionKind.CHARGE.ordinal());
                aTarget.add(c);
                next = Math.addExact(next, 1);
            }
        }
        robotOutStart.add(next - robotCount);
        int vertexCount = next;
        int distCount = vertexCount - robotCount;

        IntArrayList outStart = new IntArrayList(vertexCount + 1);
        IntArrayList eTarget = new IntArrayList(vertexCount * 2);
        IntArrayList eWeight = new IntArrayList(vertexCount * 2);
        IntArrayList eEvent = new IntArrayList(vertexCount * 2);
        IntArrayList eRule = new IntArrayList(vertexCount * 2);
        for (int r = 0; r < robotCount; r++) {
            outStart.add(eTarget.size());
            for (int d = robotOutStart.get(r); d < robotOutStart.get(r + 1); d++) {
                eTarget.add(robotCount + d);
                eWeight.add(0);
                eEvent.add(Arena.NOMINAL);
                eRule.add(-1);
            }
        }
        int[] mb = new int[8];
        int[] ownerOfD = new int[distCount];
        for (int r = 0; r < robotCount; r++) {
            for (int d = robotOutStart.get(r); d < robotOutStart.get(r + 1); d++) {
                ownerOfD[d] = r;
            }
        }
        for (int d = 0; d < distCount; d++) {
            if ((d & (Progress.EVERY - 1)) == 0) {
                // the outcomes take the second half; distCount is about 5 x robotCount
                progress.at(robotCount + (long) d * robotCount / distCount);
            }
            outStart.add(eTarget.size());
            int owner = ownerOfD[d];
            int c = vCell.get(owner);
            int k = vState.get(owner);
            int kl = local[k];
            int kind = aKind.get(d);
            int t = aTarget.get(d);
            int sOwn = slot[c];
            if (kind == ActionKind.WAIT.ordinal()) {
                add(eTarget, eWeight, eEvent, eRule, sOwn * kk + kl, -waitCost, Arena.NOMINAL, -1);
                continue;
            }
            if (kind == ActionKind.CHARGE.ordinal()) {
                add(eTarget, eWeight, eEvent, eRule, sOwn * kk + kl, chargeGain, Arena.NOMINAL, -1);
                continue;
            }
            boolean diagonal = (c % w) != (t % w) && (c / w) != (t / w);
            int enter = diagonal ? diagCost[t] : cost[t];
            int sT = slot[t];
            add(eTarget, eWeight, eEvent, eRule, sT * kk + kl, -enter, Arena.NOMINAL, -1);
            if (states.budgetLeft(k) == 0) {
                continue;
            }
            int dr = doorRule[t];
            if (dr >= 0) {
                int k1 = states.after(k, dr, rules.get(dr).lasting() ? states.doorItem(t) : -1);
                if (k1 >= 0) {
                    // into a left-out state: back to the robot's own vertex, lost in every product
                    add(eTarget, eWeight, eEvent, eRule, sOwn * kk + (local[k1] >= 0 ? local[k1] : kl),
                            local[k1] >= 0 ? -waitCost : LEFT_OUT, EventKind.DOOR_SHUT.ordinal(), dr);
                }
            }
            int br = blockRule[t];
            if (br >= 0) {
                int k1 = states.after(k, br, rules.get(br).lasting() ? states.blockageItem(br) : -1);
                if (k1 >= 0) {
                    add(eTarget, eWeight, eEvent, eRule, sOwn * kk + (local[k1] >= 0 ? local[k1] : kl),
                            local[k1] >= 0 ? -waitCost : LEFT_OUT, EventKind.BLOCKAGE.ordinal(), br);
                }
            }
            int slip = slipRule[c] >= 0 ? slipRule[c] : slipRule[t];
            if (slip >= 0) {
                int k1 = states.after(k, slip, -1);
                if (k1 >= 0 && local[k1] < 0) {
                    throw new IllegalStateException("a momentary event leads out of the kept states");
                }
                if (k1 >= 0) {
                    // a slip never lands on a closed cell: it is an obstacle like a wall
                    int mn = closable ? neighbours(t, w, h, free, dirs, mb, states, k) : neighbours(t, w, h, free, dirs, mb);
                    for (int i = 0; i < mn; i++) {
                        int m = mb[i];
                        if (m == c) {
                            continue;
                        }
                        add(eTarget, eWeight, eEvent, eRule, slot[m] * kk + local[k1], -cost[m], EventKind.SLIP.ordinal(),
                                slip);
                    }
                }
            }
            int gr = dragRule[t];
            if (gr >= 0) {
                int k1 = states.after(k, gr, -1);
                if (k1 >= 0 && local[k1] < 0) {
                    throw new IllegalStateException("a momentary event leads out of the kept states");
                }
                if (k1 >= 0) {
                    add(eTarget, eWeight, eEvent, eRule, sT * kk + local[k1], -Math.addExact(enter, dragExtra[t]),
                            EventKind.DRAG.ordinal(), gr);
                }
            }
        }
        outStart.add(eTarget.size());

        byte[] ak = new byte[distCount];
        for (int i = 0; i < distCount; i++) {
            ak[i] = (byte) aKind.get(i);
        }
        byte[] ev = new byte[eEvent.size()];
        for (int i = 0; i < ev.length; i++) {
            ev[i] = (byte) eEvent.get(i);
        }
        // disturbance vertices: cell and budget of their owner
        int[] cellArr = Arrays.copyOf(vCell.toArray(), vertexCount);
        int[] budgetArr = Arrays.copyOf(vBudget.toArray(), vertexCount);
        for (int d = 0; d < distCount; d++) {
            int owner = ownerOfD[d];
            cellArr[robotCount + d] = vCell.get(owner);
            budgetArr[robotCount + d] = vBudget.get(owner);
        }
        int[] stateArr = Arrays.copyOf(vState.toArray(), vertexCount);
        for (int d = 0; d < distCount; d++) {
            stateArr[robotCount + d] = vState.get(ownerOfD[d]);
        }
        progress.done();
        int startVertex = slot[start.index(w)] * kk + local[budget];
        return new Arena(mission, w, h, budget, states, kk, stateArr, robotCount, vertexCount, startVertex, cellArr,
                budgetArr, ak,
                aTarget.toArray(), outStart.toArray(), eTarget.toArray(), eWeight.toArray(), ev, eRule.toArray(),
                zones, dock, slot, slotCell);
    }

    private static void add(IntArrayList t, IntArrayList wt, IntArrayList ev, IntArrayList ru, int target, int weight, int event, int rule) {
        t.add(target);
        wt.add(weight);
        ev.add(event);
        ru.add(rule);
    }

    /**
     * Free neighbours of cell c in the documented order; a diagonal may not cut a wall corner
     * (both orthogonal cells beside it must be free).
     */
    static int neighbours(int c, int w, int h, boolean[] free, int dirs, int[] out) {
        return neighbours(c, w, h, free, dirs, out, null, 0);
    }

    /**
     * Free neighbours of cell c that are not closed in the disturbance state: a closed door or zone
     * is an obstacle like a wall, also for the corner rule of diagonals. With {@code st} null nothing
     * is closed.
     */
    static int neighbours(int c, int w, int h, boolean[] free, int dirs, int[] out, DisturbanceStates st, int state) {
        int x = c % w;
        int y = c / w;
        int n = 0;
        for (int i = 0; i < dirs; i++) {
            int nx = x + DX[i];
            int ny = y + DY[i];
            if (nx < 0 || ny < 0 || nx >= w || ny >= h || !open(ny * w + nx, free, st, state)) {
                continue;
            }
            if (i >= 4 && (!open(y * w + nx, free, st, state) || !open(ny * w + x, free, st, state))) {
                continue;
            }
            out[n++] = ny * w + nx;
        }
        return n;
    }

    private static boolean open(int cell, boolean[] free, DisturbanceStates st, int state) {
        return free[cell] && (st == null || !st.isClosed(state, cell));
    }

    /** A patrol whose budget starts afresh on every lap: its states need their renewals (closures kept). */
    static boolean renewsPerLap(Mission m) {
        return m.tasks().patrols() && m.map().disturbances().budgetPerLap();
    }

    private static int[] filled(int n) {
        int[] a = new int[n];
        Arrays.fill(a, -1);
        return a;
    }
}
