package dockline.solve.reserve;

import dockline.fixtures.LastingMoves;
import dockline.fixtures.StateTable;
import dockline.fixtures.TaskBook;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Test oracle for lasting events and at-most limits: the game of maps/README.md ("Game semantics")
 * played out on explicit states (cell, battery level, tasks done, budget left, set of closed doors and
 * zones, events used per limited rule), with move generation read straight from the map and mission
 * records ({@link LastingMoves}, the test layer it shares with the patrol oracle) and task progress by
 * {@link TaskBook}. It uses neither the arena compiler nor the goal automaton nor any solver; only the
 * model's unit rounding ({@link EnergyScale}) is shared, as that is the input's meaning.
 *
 * <p>The value of a state is the best lowest battery level along the play the robot can force until
 * the mission is complete (-1: it cannot complete without the level going negative or entering an
 * avoided zone): a max-min value, computed as the least fixpoint by sweeping all reachable states until
 * nothing changes (the attractor of a reachability game, Grädel, Thomas, Wilke (eds., 2002), "Automata,
 * Logics, and Infinite Games", LNCS 2500, ch. 2, applied per threshold). The highest floor guaranteed
 * from the start is the start's value; the mission is guaranteed iff the start level is at or above the
 * floor and the value is at least the floor. Exponential in the closable items; tiny maps only.
 */
final class LastingBruteForce {

    private final Mission m;
    private final int w;
    private final int cap;
    /** The moves with closed sets and counts (2 bits of events per limited rule). */
    private final LastingMoves moves;
    private final TaskBook tasks;

    private final StateTable states = new StateTable();

    LastingBruteForce(Mission mission) {
        this.m = mission;
        this.w = mission.map().width();
        this.cap = mission.capacityUnits();
        this.moves = new LastingMoves(mission, 2);
        if (moves.items() > 20 || moves.rules() > 8) {
            throw new IllegalArgumentException("too big for the brute force");
        }
        this.tasks = new TaskBook(mission);
    }

    // ---------------------------------------------------------------- states

    /**
     * The highest floor the robot can guarantee from the start (the max-min lowest level), or -1.
     */
    int highestFloor() {
        Cell s0 = m.start();
        int l0 = m.startUnits();
        int p0 = tasks.startMask();
        if (p0 < 0) {
            return -1;
        }
        if (tasks.complete(p0, s0)) {
            return l0;
        }
        // explore the reachable states, storing for each its actions' successors (or terminal values)
        List<int[][]> succ = new ArrayList<>();
        List<int[][]> term = new ArrayList<>();
        intern(s0, l0, p0, m.map().disturbances().budget(), 0, 0);
        for (int i = 0; i < states.size(); i++) {
            long[] st = states.get(i);
            Cell c = Cell.ofIndex((int) st[0], w);
            int level = (int) st[1];
            int mask = (int) st[2];
            List<List<LastingMoves.Outcome>> acts = moves.actions(c, (int) st[3], st[4], st[5]);
            int[][] sa = new int[acts.size()][];
            int[][] ta = new int[acts.size()][];
            for (int a = 0; a < acts.size(); a++) {
                List<LastingMoves.Outcome> os = acts.get(a);
                sa[a] = new int[os.size()];
                ta[a] = new int[os.size()];
                for (int j = 0; j < os.size(); j++) {
                    LastingMoves.Outcome o = os.get(j);
                    int l2 = Math.min(cap, level + o.delta());
                    int m2 = tasks.step(mask, o.cell());
                    if (l2 < 0 || m2 < 0) {
                        sa[a][j] = -1;
                        ta[a][j] = -1;
                    } else if (tasks.complete(m2, o.cell())) {
                        sa[a][j] = -1;
                        ta[a][j] = l2;
                    } else {
                        sa[a][j] = intern(o.cell(), l2, m2, o.k(), o.closedSet(), o.counts());
                        ta[a][j] = Integer.MIN_VALUE;
                    }
                }
            }
            succ.add(sa);
            term.add(ta);
        }
        int n = states.size();
        int[] val = new int[n];
        Arrays.fill(val, -1);
        boolean changed = true;
        int sweeps = 0;
        while (changed) {
            changed = false;
            // each sweep raises some value, and a value takes at most cap + 2 different values
            if (++sweeps > (long) n * (cap + 2) + 2) {
                throw new AssertionError("no fixpoint within |S| (cap + 2) + 2 sweeps");
            }
            for (int i = 0; i < n; i++) {
                int level = (int) states.get(i)[1];
                int best = -1;
                int[][] sa = succ.get(i);
                int[][] ta = term.get(i);
                for (int a = 0; a < sa.length; a++) {
                    int worst = level;
                    for (int j = 0; j < sa[a].length && worst >= 0; j++) {
                        int v = sa[a][j] >= 0 ? val[sa[a][j]] : ta[a][j];
                        worst = Math.min(worst, v);
                    }
                    best = Math.max(best, worst);
                }
                if (best != val[i]) {
                    val[i] = best;
                    changed = true;
                }
            }
        }
        return val[0];
    }

    /** Whether the mission is guaranteed at its own reserve floor. */
    boolean guaranteed() {
        return m.startUnits() >= m.reserveUnits() && highestFloor() >= m.reserveUnits();
    }

    /** Number of reachable states explored by the last {@link #highestFloor} call. */
    int stateCount() {
        return states.size();
    }

    /** Whether some reachable state has a door or zone closed. */
    boolean someClosure() {
        return states.any(s -> s[4] != 0);
    }

    private int intern(Cell c, int level, int mask, int k, long cl, long counts) {
        return states.intern(c.index(w), level, mask, k, cl, counts);
    }
}
