package dockline.arena;

import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.util.CsrGraph;

/**
 * The compiled two-player arena of one mission (maps/README.md, "Game semantics"), in compressed-sparse-row int
 * arrays, forward and reverse.
 *
 * <p>Vertices {@code 0 .. robotCount-1} belong to the robot: (cell, disturbance state), the state
 * being the budget left plus, with lasting events, the doors and zones closed so far. Vertices
 * {@code robotCount .. vertexCount-1} belong to the disturbance: (cell, action, budget left). Every
 * robot edge goes to a disturbance vertex and carries weight 0; every disturbance edge (an
 * outcome) goes to a robot vertex and carries the energy delta in units (negative = consumption,
 * positive = charging) and the event that caused it (or none). Task labels live on cells:
 * {@link #cellZones(int)} is a bit mask of the zones the mission's tasks name
 * ({@link dockline.model.ZoneLabels}: one bit per task zone, one for all avoided zones).
 *
 * <p>Numbering is deterministic: robot vertex of free-cell slot s (row-major order of free cells)
 * and disturbance state d ({@link DisturbanceStates}) is {@code s * D + d} for D states; without lasting
 * rules and at-most limits d is the budget left k and D = K + 1, so it is {@code s * (K + 1) + k}; disturbance vertices follow in the order of their robot
 * vertex and, within it, of the actions (moves in neighbour order N, E, S, W, NE, SE, SW, NW, then
 * wait, then charge).
 *
 * <p>The graph itself (out-edges, targets, in-edges by edge id, sources) is a {@link CsrGraph}; the arena adds
 * per vertex its cell and disturbance state, per edge its energy delta, event and rule, and per cell its labels.
 * Instances are immutable after construction; the accessors return views of internal arrays through index
 * methods, so hot loops stay on primitive ints without copying.
 */
public final class Arena extends CsrGraph {

    /** Event code on nominal outcomes. */
    public static final int NOMINAL = -1;

    private final Mission mission;
    private final int width;
    private final int height;
    private final int budget;
    private final DisturbanceStates states;
    private final int stateCount;
    private final int[] vertexState;
    private final int robotCount;
    private final int startVertex;

    // per vertex
    private final int[] vertexCell;
    private final int[] vertexBudget;
    // per disturbance vertex (indexed v - robotCount)
    private final byte[] actionKind;
    private final int[] actionTarget;

    // per edge, beside the graph's targets and sources
    private final int[] edgeWeight;
    private final byte[] edgeEvent;
    private final int[] edgeRule;
    // layout facts, found once here so that solvers need not scan the arena per question
    private final boolean privateActions;
    private final boolean actionsByEdge;

    // per cell (row-major index)
    private final long[] cellZones;
    private final boolean[] cellDock;
    private final int[] cellSlot;
    private final int[] slotCell;

    Arena(Mission mission, int width, int height, int budget, int robotCount, int vertexCount, int startVertex,
          int[] vertexCell, int[] vertexBudget, byte[] actionKind, int[] actionTarget,
          int[] outStart, int[] edgeTarget, int[] edgeWeight, byte[] edgeEvent, int[] edgeRule,
          long[] cellZones, boolean[] cellDock, int[] cellSlot, int[] slotCell) {
        this(mission, width, height, budget, DisturbanceStates.plain(budget), budget + 1, vertexBudget, robotCount,
                vertexCount,
                startVertex, vertexCell, vertexBudget, actionKind, actionTarget, outStart, edgeTarget, edgeWeight,
                edgeEvent, edgeRule, cellZones, cellDock, cellSlot, slotCell);
    }

    Arena(Mission mission, int width, int height, int budget, DisturbanceStates states, int stateCount,
          int[] vertexState, int robotCount, int vertexCount, int startVertex,
          int[] vertexCell, int[] vertexBudget, byte[] actionKind, int[] actionTarget,
          int[] outStart, int[] edgeTarget, int[] edgeWeight, byte[] edgeEvent, int[] edgeRule,
          long[] cellZones, boolean[] cellDock, int[] cellSlot, int[] slotCell) {
        super(vertexCount, edgeTarget.length, outStart, edgeTarget, Reverse.EDGES);
        this.mission = mission;
        this.width = width;
        this.height = height;
        this.budget = budget;
        this.states = states;
        this.stateCount = stateCount;
        this.vertexState = vertexState;
        this.robotCount = robotCount;
        this.startVertex = startVertex;
        this.vertexCell = vertexCell;
        this.vertexBudget = vertexBudget;
        this.actionKind = actionKind;
        this.actionTarget = actionTarget;
        this.edgeWeight = edgeWeight;
        this.edgeEvent = edgeEvent;
        this.edgeRule = edgeRule;
        this.cellZones = cellZones;
        this.cellDock = cellDock;
        this.cellSlot = cellSlot;
        this.slotCell = slotCell;
        boolean byEdge = true;
        for (int x = 0; x < robotCount && byEdge; x++) {
            for (int e = outBegin(x); e < outEnd(x); e++) {
                byEdge &= target(e) == robotCount + e;
            }
        }
        boolean priv = true;
        for (int a = robotCount; a < vertexCount && priv; a++) {
            priv = inEnd(a) - inBegin(a) == 1 && source(inEdge(inBegin(a))) < robotCount;
        }
        this.privateActions = priv;
        this.actionsByEdge = byEdge && priv && outBegin(robotCount) == vertexCount - robotCount;
    }

    public Mission mission() {
        return mission;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** The disturbance budget K of the mission. */
    public int budget() {
        return budget;
    }

    public int robotCount() {
        return robotCount;
    }

    /** The robot vertex at the start cell with the full budget. */
    public int startVertex() {
        return startVertex;
    }

    public boolean isRobot(int v) {
        return v < robotCount;
    }

    /** Row-major cell index of the vertex's cell. */
    public int cell(int v) {
        return vertexCell[v];
    }

    public Cell cellOf(int v) {
        return Cell.ofIndex(vertexCell[v], width);
    }

    /** Disturbance budget left at the vertex. */
    public int budgetLeft(int v) {
        return vertexBudget[v];
    }

    /**
     * The robot vertex of a free cell (row-major index) and budget left with nothing closed and no
     * {@code at-most} entry used, or -1 if the cell is a wall.
     */
    public int robotVertex(int cellIndex, int budgetLeft) {
        // states 0 .. K are (budget left k, nothing closed, no entry used): DisturbanceStates numbers them first
        return robotVertexInState(cellIndex, budgetLeft);
    }

    /** The robot vertex of a free cell (row-major index) in a disturbance state, or -1 if the cell is a wall. */
    public int robotVertexInState(int cellIndex, int state) {
        int s = cellSlot[cellIndex];
        return s < 0 ? -1 : s * stateCount + state;
    }

    /**
     * Where a patrol with {@code budget-per: lap} goes on once robot vertex {@code v} completes a lap: the same
     * cell with the full budget and no at-most entry used, the doors and zones closed so far still closed
     * ({@link DisturbanceStates#renewed}; maps/README.md, "Game semantics").
     */
    public int renewedAtLap(int v) {
        return robotVertexInState(vertexCell[v], states.renewed(vertexState[v]));
    }

    /** The disturbance state of the vertex (an id of {@link #states()}; equal to the budget left when plain). */
    public int state(int v) {
        return vertexState[v];
    }

    /** The disturbance states: budget left, closed doors and zones, events per at-most entry. */
    public DisturbanceStates states() {
        return states;
    }

    /** Number of disturbance states (K + 1 without lasting rules and at-most limits). */
    public int stateCount() {
        return stateCount;
    }

    /** The situation key of the vertex beyond the budget ({@link DisturbanceStates#key}); "" when plain. */
    public String closures(int v) {
        return states.plain() ? "" : states.key(vertexState[v]);
    }

    /**
     * The closure item an outcome edge closes (a lasting door shut or blockage), or -1. O(K).
     */
    public int closedBy(int e) {
        int ev = edgeEvent[e];
        if (ev != EventKind.DOOR_SHUT.ordinal() && ev != EventKind.BLOCKAGE.ordinal() || states.itemCount() == 0) {
            return -1;
        }
        int[] before = states.closed(vertexState[source(e)]);
        int[] after = states.closed(vertexState[target(e)]);
        if (after.length == before.length) {
            return -1;
        }
        for (int i = 0; i < after.length; i++) {
            if (i >= before.length || before[i] != after[i]) {
                return after[i];
            }
        }
        return -1;
    }

    /** Number of free cells. */
    public int freeCellCount() {
        return slotCell.length;
    }

    /** Row-major cell index of the free cell with the given slot (0 .. freeCellCount-1). */
    public int freeCell(int slot) {
        return slotCell[slot];
    }

    /** The action of a disturbance vertex. */
    public ActionKind actionKind(int d) {
        return ActionKind.values()[actionKind[d - robotCount]];
    }

    /** The cell (row-major) the action of a disturbance vertex aims at. */
    public int actionTarget(int d) {
        return actionTarget[d - robotCount];
    }

    public Action action(int d) {
        return new Action(actionKind(d), Cell.ofIndex(actionTarget(d), width));
    }

    /** Energy delta of the edge in units (0 on robot edges). */
    public int weight(int e) {
        return edgeWeight[e];
    }

    /** {@link #NOMINAL} or the {@link EventKind} ordinal of the outcome. */
    public int event(int e) {
        return edgeEvent[e];
    }

    /** Index of the map's event rule that caused the outcome, or -1 when nominal. */
    public int rule(int e) {
        return edgeRule[e];
    }

    /** The cell's label bits ({@link dockline.model.ZoneLabels}): the task zones it is in, and the avoid bit. */
    public long cellZones(int cellIndex) {
        return cellZones[cellIndex];
    }

    public boolean isDock(int cellIndex) {
        return cellDock[cellIndex];
    }

    /**
     * Whether every disturbance vertex is private to one robot vertex: exactly one in-edge, from a
     * robot vertex (so a disturbance vertex is one robot vertex's action, as compiled arenas are built).
     */
    public boolean privateActions() {
        return privateActions;
    }

    /**
     * Whether the disturbance vertices are numbered by the robot edges into them: the target of robot
     * edge e is {@code robotCount + e} for every e (as compiled arenas are built). Then the action
     * vertex a belongs to robot vertex {@code source(a - robotCount)} and is its move number
     * {@code a - robotCount - outBegin(owner)}, both O(1).
     */
    public boolean actionsByEdge() {
        return actionsByEdge;
    }

    /** Largest absolute edge weight (the bound mu of the discounted comparator). */
    public int maxAbsWeight() {
        int mu = 0;
        for (int w : edgeWeight) {
            mu = Math.max(mu, Math.abs(w));
        }
        return mu;
    }
}
