package dockline.solve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;

/**
 * Test oracle: the reserve game solved by brute force on the explicit product arena × goal ×
 * battery level, straight from the reference semantics of maps/README.md, "Game semantics" (level ← min(capacity,
 * level + delta), lost below the floor, lost in an avoided zone, won on completion), by naive
 * repetition of the one-step rule until nothing changes: a robot vertex wins if some action wins,
 * a disturbance vertex if every outcome wins. This is the textbook attractor characterisation of
 * reachability games (Grädel, Thomas, Wilke (eds.), 2002, "Automata, Logics, and Infinite Games",
 * ch. 2), computed in the slowest, most obviously correct way. For small instances only.
 */
public final class BruteForceReserve {

    private final Arena arena;
    private final GoalAutomaton goal;
    private final int floor;
    private final int cap;
    private final int levels;
    private final int gc;
    private final boolean[] win;

    public BruteForceReserve(Arena arena, GoalAutomaton goal) {
        this.arena = arena;
        this.goal = goal;
        Mission m = arena.mission();
        this.floor = m.reserveUnits();
        this.cap = m.capacityUnits();
        this.levels = Math.max(0, cap - floor + 1);
        this.gc = goal.stateCount();
        int n = arena.vertexCount() * gc * levels;
        this.win = new boolean[n];
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int v = 0; v < arena.vertexCount(); v++) {
                for (int g = 0; g < gc; g++) {
                    for (int l = floor; l <= cap; l++) {
                        int p = index(v, g, l);
                        if (!win[p] && wins(v, g, l)) {
                            win[p] = true;
                            changed = true;
                        }
                    }
                }
            }
        }
    }

    private int index(int v, int g, int level) {
        return (v * gc + g) * levels + (level - floor);
    }

    private boolean wins(int v, int g, int l) {
        if (arena.isRobot(v)) {
            if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                return true;
            }
            for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                if (win[index(arena.target(e), g, l)]) { // robot edges carry weight 0
                    return true;
                }
            }
            return false;
        }
        for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
            int l2 = Math.min(cap, l + arena.weight(e));
            if (l2 < floor) {
                return false;
            }
            int r = arena.target(e);
            int g2 = goal.step(g, arena.cellZones(arena.cell(r)));
            if (g2 == GoalAutomaton.REJECT || !win[index(r, g2, l2)]) {
                return false;
            }
        }
        return true;
    }

    /** Whether the robot wins from robot vertex v in goal state g with battery level l. */
    public boolean winsAt(int v, int g, int level) {
        return level >= floor && level <= cap && win[index(v, g, level)];
    }

    /** The start verdict. */
    public boolean guaranteed() {
        Mission m = arena.mission();
        int s = arena.startVertex();
        int g0 = goal.initial(arena.cellZones(arena.cell(s)));
        int l0 = m.startUnits();
        return g0 != GoalAutomaton.REJECT && l0 >= floor && l0 <= cap && win[index(s, g0, l0)];
    }

    public int floor() {
        return floor;
    }

    public int cap() {
        return cap;
    }
}
