package dockline.solve.rounds;

import dockline.fixtures.GameSweeps;
import dockline.fixtures.LapBook;
import dockline.fixtures.LastingMoves;
import dockline.fixtures.StateTable;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.List;

/**
 * Test oracle for patrols with lasting events, at-most limits and {@code budget-per: lap}, written apart from
 * the production route and from {@link RoundsBruteForce} (with which it shares only the textbook sweeps of
 * {@link GameSweeps}): the game of maps/README.md ("Game semantics",
 * "Patrols") on explicit states (cell, battery level, checkpoints of the current lap, budget left, set of
 * closed doors and zones, events used per limited rule), with move generation read from the map and mission
 * records ({@link LastingMoves}, the test layer it shares with the one-trip oracle of lasting events) and the
 * lap's checkpoints by {@link LapBook}. It uses neither the arena compiler, nor its disturbance states, nor the
 * lap automaton; only the model's unit rounding ({@link EnergyScale}).
 *
 * <p>The lap rule with a budget per lap, as maps/README.md words it: on the move that completes a lap the
 * budget left goes back to the full budget and every limited rule's count to 0, while the closed doors and
 * zones stay closed. The recurrence set is the nested fixpoint νZ. μY. (F ∩ CPre(Z)) ∪ CPre(Y) of the
 * μ-calculus for Büchi games (Emerson and Jutla 1991; Grädel, Thomas, Wilke (eds.), "Automata, Logics, and
 * Infinite Games", LNCS 2500, 2002), swept until nothing changes ({@link GameSweeps#recurrence}), over the
 * states reachable from the start.
 * The state space is built once with every level; a floor f makes the states below f losing. Exponential
 * in the closable items; tiny maps only.
 */
final class LastingPatrolBruteForce {

    private final Mission m;
    private final int w;
    private final int cap;
    private final boolean perLap;
    private final int budget;
    /** The moves with closed sets and counts (4 bits of events per limited rule). */
    private final LastingMoves moves;
    private final LapBook laps;

    private final StateTable states = new StateTable();
    /** state -> action -> outcome states (-1: lost whatever the floor: an avoided zone, or below 0). */
    private final List<int[][]> succ = new ArrayList<>();
    private final int start;

    LastingPatrolBruteForce(Mission mission) {
        this.m = mission;
        this.w = mission.map().width();
        this.cap = mission.capacityUnits();
        this.perLap = mission.map().disturbances().budgetPerLap();
        this.budget = mission.map().disturbances().budget();
        this.moves = new LastingMoves(mission, 4);
        if (moves.items() > 30 || moves.rules() > 12) {
            throw new IllegalArgumentException("too big for the brute force");
        }
        this.laps = new LapBook(mission);
        int m0 = laps.step(0, mission.start());
        this.start = m0 < 0 ? -1 : intern(mission.start(), Math.min(cap, mission.startUnits()), m0, budget, 0L, 0L);
        for (int i = 0; i < states.size(); i++) {
            expand(i);
        }
    }

    // ---------------------------------------------------------------- states and the fixpoint

    private int intern(Cell c, int level, int mask, int k, long cl, long counts) {
        return states.intern(c.index(w), level, mask, k, cl, counts);
    }

    private void expand(int i) {
        long[] st = states.get(i);
        Cell c = Cell.ofIndex((int) st[0], w);
        int level = (int) st[1];
        List<List<LastingMoves.Outcome>> acts = moves.actions(c, (int) st[3], st[4], st[5]);
        int[][] sa = new int[acts.size()][];
        for (int a = 0; a < acts.size(); a++) {
            List<LastingMoves.Outcome> os = acts.get(a);
            sa[a] = new int[os.size()];
            for (int j = 0; j < os.size(); j++) {
                LastingMoves.Outcome o = os.get(j);
                int l2 = Math.min(cap, level + o.delta());
                int m2 = laps.step((int) st[2], o.cell());
                if (l2 < 0 || m2 < 0) {
                    sa[a][j] = -1;
                } else if (m2 == laps.full() && perLap) {
                    // a completed lap: new events are counted afresh, what is closed stays closed
                    sa[a][j] = intern(o.cell(), l2, m2, budget, o.closedSet(), 0L);
                } else {
                    sa[a][j] = intern(o.cell(), l2, m2, o.k(), o.closedSet(), o.counts());
                }
            }
        }
        succ.add(sa);
    }

    /** Whether the patrol is won at this floor: the Büchi fixpoint over the states at or above the floor. */
    boolean won(int floor) {
        if (start < 0 || m.startUnits() < floor) {
            return false;
        }
        int n = states.size();
        boolean[] live = new boolean[n];
        boolean[] lapDone = new boolean[n];
        for (int s = 0; s < n; s++) {
            live[s] = states.get(s)[1] >= floor;
            lapDone[s] = states.get(s)[2] == laps.full();
        }
        return GameSweeps.recurrence(succ.toArray(new int[0][][]), live, lapDone)[start];
    }

    /** The highest floor at which the patrol is won, by trying every floor from the start level down; -1 if none. */
    int highestFloor() {
        for (int f = Math.min(cap, m.startUnits()); f >= 0; f--) {
            if (won(f)) {
                return f;
            }
        }
        return -1;
    }

    /** Whether some reachable state has more doors and zones closed than the budget (closures piled up over laps). */
    boolean closuresBeyondBudget() {
        return states.any(s -> Long.bitCount(s[4]) > budget);
    }

    /** Whether some reachable state has something closed. */
    boolean someClosure() {
        return states.any(s -> s[4] != 0);
    }

    int stateCount() {
        return states.size();
    }
}
