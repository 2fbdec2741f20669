package dockline.solve.rounds;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Terrain;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Test oracle for patrols with lasting events, at-most limits and {@code budget-per: lap}, written apart from
 * the production route and from {@link RoundsBruteForce}: the game of maps/README.md ("Game semantics",
 * "Patrols") on explicit states (cell, battery level, checkpoints of the current lap, budget left, set of
 * closed doors and zones, events used per limited rule), with its own move generation read from the map and
 * mission records. It uses neither the arena compiler, nor its disturbance states, nor the lap automaton; only
 * the model's unit rounding ({@link EnergyScale}).
 *
 * <p>The lap rule with a budget per lap, as maps/README.md words it: on the move that completes a lap the
 * budget left goes back to the full budget and every limited rule's count to 0, while the closed doors and
 * zones stay closed. The recurrence set is the nested fixpoint νZ. μY. (F ∩ CPre(Z)) ∪ CPre(Y) of the
 * μ-calculus for Büchi games (Emerson and Jutla 1991; Grädel, Thomas, Wilke (eds.), "Automata, Logics, and
 * Infinite Games", LNCS 2500, 2002), swept until nothing changes, over the states reachable from the start.
 * The state space is built once with every level; a floor f makes the states below f losing. Exponential
 * in the closable items; tiny maps only.
 */
final class LastingPatrolBruteForce {

    private final Mission m;
    private final BuildingMap map;
    private final int w;
    private final int h;
    private final int cap;
    private final int wait;
    private final int charge;
    private final boolean eight;
    private final boolean perLap;
    private final int budget;
    private final List<EventRule> rules;
    private final List<Cell> doorItems = new ArrayList<>();
    private final List<Integer> blockItems = new ArrayList<>();
    private final List<String> checkpoints;
    private final int full;

    private final Map<List<Long>, Integer> index = new HashMap<>();
    private final List<long[]> states = new ArrayList<>();
    /** state -> action -> outcome states (-1: lost whatever the floor: an avoided zone, or below 0). */
    private final List<int[][]> succ = new ArrayList<>();
    private final int start;

    LastingPatrolBruteForce(Mission mission) {
        this.m = mission;
        this.map = mission.map();
        this.w = map.width();
        this.h = map.height();
        this.cap = mission.capacityUnits();
        EnergyScale s = mission.scale();
        this.wait = s.consumption(mission.robot().waitWh());
        this.charge = s.gain(mission.robot().chargeWh());
        this.eight = mission.robot().neighbourhood() == Neighbourhood.EIGHT;
        this.perLap = map.disturbances().budgetPerLap();
        this.budget = map.disturbances().budget();
        this.rules = map.disturbances().rules();
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                Cell c = new Cell(x, y);
                int dr = first(EventKind.DOOR_SHUT, c);
                if (dr >= 0 && rules.get(dr).lasting()) {
                    doorItems.add(c);
                }
            }
        }
        for (int i = 0; i < rules.size(); i++) {
            if (rules.get(i).kind() == EventKind.BLOCKAGE && rules.get(i).lasting()) {
                blockItems.add(i);
            }
        }
        if (doorItems.size() + blockItems.size() > 30 || rules.size() > 12) {
            throw new IllegalArgumentException("too big for the brute force");
        }
        this.checkpoints = mission.tasks().patrol();
        this.full = (1 << checkpoints.size()) - 1;
        int m0 = lap(0, mission.start());
        this.start = m0 < 0 ? -1 : intern(mission.start(), Math.min(cap, mission.startUnits()), m0, budget, 0L, 0L);
        for (int i = 0; i < states.size(); i++) {
            expand(i);
        }
    }

    // ---------------------------------------------------------------- the rules of maps/README.md

    private Terrain at(Cell c) {
        return map.terrainAt(c);
    }

    /** First rule of a kind covering the cell (door-shut only on door cells); for drag the largest extra. */
    private int first(EventKind kind, Cell c) {
        int best = -1;
        for (int i = 0; i < rules.size(); i++) {
            EventRule r = rules.get(i);
            if (r.kind() != kind || !r.covers(c) || kind == EventKind.DOOR_SHUT && !at(c).door()) {
                continue;
            }
            if (kind != EventKind.DRAG) {
                return i;
            }
            if (best < 0 || units(r.extraWh()) > units(rules.get(best).extraWh())) {
                best = i;
            }
        }
        return best;
    }

    private int units(BigDecimal wh) {
        return m.scale().consumption(wh);
    }

    private boolean closed(Cell c, long set) {
        int i = doorItems.indexOf(c);
        if (i >= 0 && (set >> i & 1) != 0) {
            return true;
        }
        for (int j = 0; j < blockItems.size(); j++) {
            if ((set >> (doorItems.size() + j) & 1) != 0 && rules.get(blockItems.get(j)).covers(c)) {
                return true;
            }
        }
        return false;
    }

    private boolean open(int x, int y, long set) {
        return x >= 0 && y >= 0 && x < w && y < h && at(new Cell(x, y)).free() && !closed(new Cell(x, y), set);
    }

    /** Open neighbours: N, E, S, W, then the diagonals that cut no wall or closed corner. */
    private List<Cell> neighbours(Cell c, long set) {
        int[][] d = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}, {1, -1}, {1, 1}, {-1, 1}, {-1, -1}};
        List<Cell> out = new ArrayList<>();
        for (int i = 0; i < (eight ? 8 : 4); i++) {
            int nx = c.x() + d[i][0];
            int ny = c.y() + d[i][1];
            if (open(nx, ny, set) && (i < 4 || open(nx, c.y(), set) && open(c.x(), ny, set))) {
                out.add(new Cell(nx, ny));
            }
        }
        return out;
    }

    /** The lap's checkpoints after occupying a cell (afresh after a completed lap), or -1 in an avoided zone. */
    private int lap(int mask, Cell c) {
        List<String> names = map.zonesAt(c);
        for (String a : m.tasks().avoid()) {
            if (names.contains(a)) {
                return -1;
            }
        }
        int s = mask == full ? 0 : mask;
        for (int i = 0; i < checkpoints.size(); i++) {
            if (names.contains(checkpoints.get(i))) {
                s |= 1 << i;
            }
        }
        return s;
    }

    private boolean allowed(int k, long counts, int rule) {
        EventRule r = rules.get(rule);
        return k > 0 && (!r.limited() || (counts >> (4 * rule) & 15) < r.atMost());
    }

    private long count(long counts, int rule) {
        return rules.get(rule).limited() ? counts + (1L << 4 * rule) : counts;
    }

    /** One outcome before the lap rule: where the robot ends, the level change, the disturbance part. */
    private record Outcome(Cell cell, int delta, int k, long closedSet, long counts) {
    }

    private List<List<Outcome>> actions(Cell c, int k, long cl, long counts) {
        List<List<Outcome>> out = new ArrayList<>();
        for (Cell n : neighbours(c, cl)) {
            List<Outcome> o = new ArrayList<>();
            boolean diagonal = c.x() != n.x() && c.y() != n.y();
            BigDecimal wh = m.robot().moveWh().get(at(n).surface());
            int enter = diagonal ? m.scale().diagonalConsumption(wh) : m.scale().consumption(wh);
            o.add(new Outcome(n, -enter, k, cl, counts));
            int dr = first(EventKind.DOOR_SHUT, n);
            if (dr >= 0 && allowed(k, counts, dr)) {
                o.add(new Outcome(c, -wait, k - 1, rules.get(dr).lasting() ? cl | 1L << doorItems.indexOf(n) : cl,
                        count(counts, dr)));
            }
            int br = first(EventKind.BLOCKAGE, n);
            if (br >= 0 && allowed(k, counts, br)) {
                o.add(new Outcome(c, -wait, k - 1, rules.get(br).lasting()
                        ? cl | 1L << (doorItems.size() + blockItems.indexOf(br)) : cl, count(counts, br)));
            }
            int sr = first(EventKind.SLIP, c) >= 0 ? first(EventKind.SLIP, c) : first(EventKind.SLIP, n);
            if (sr >= 0 && allowed(k, counts, sr)) {
                for (Cell s : neighbours(n, cl)) {
                    if (!s.equals(c)) {
                        o.add(new Outcome(s, -units(m.robot().moveWh().get(at(s).surface())), k - 1, cl,
                                count(counts, sr)));
                    }
                }
            }
            int gr = first(EventKind.DRAG, n);
            if (gr >= 0 && allowed(k, counts, gr)) {
                o.add(new Outcome(n, -(enter + units(rules.get(gr).extraWh())), k - 1, cl, count(counts, gr)));
            }
            out.add(o);
        }
        out.add(List.of(new Outcome(c, -wait, k, cl, counts)));
        if (at(c).dock() && charge > 0) {
            out.add(List.of(new Outcome(c, charge, k, cl, counts)));
        }
        return out;
    }

    // ---------------------------------------------------------------- states and the fixpoint

    private int intern(Cell c, int level, int mask, int k, long cl, long counts) {
        List<Long> key = List.of((long) c.index(w), (long) level, (long) mask, (long) k, cl, counts);
        Integer id = index.get(key);
        if (id != null) {
            return id;
        }
        int n = states.size();
        index.put(key, n);
        states.add(new long[] {c.index(w), level, mask, k, cl, counts});
        return n;
    }

    private void expand(int i) {
        long[] st = states.get(i);
        Cell c = Cell.ofIndex((int) st[0], w);
        int level = (int) st[1];
        List<List<Outcome>> acts = actions(c, (int) st[3], st[4], st[5]);
        int[][] sa = new int[acts.size()][];
        for (int a = 0; a < acts.size(); a++) {
            List<Outcome> os = acts.get(a);
            sa[a] = new int[os.size()];
            for (int j = 0; j < os.size(); j++) {
                Outcome o = os.get(j);
                int l2 = Math.min(cap, level + o.delta());
                int m2 = lap((int) st[2], o.cell());
                if (l2 < 0 || m2 < 0) {
                    sa[a][j] = -1;
                } else if (m2 == full && perLap) {
                    // a completed lap: new events are counted afresh, what is closed stays closed
                    sa[a][j] = intern(o.cell(), l2, m2, budget, o.closedSet(), 0L);
                } else {
                    sa[a][j] = intern(o.cell(), l2, m2, o.k(), o.closedSet(), o.counts());
                }
            }
        }
        succ.add(sa);
    }

    private boolean cpre(int s, boolean[] in, int floor) {
        for (int[] outs : succ.get(s)) {
            boolean all = true;
            for (int u : outs) {
                if (u < 0 || !in[u] || states.get(u)[1] < floor) {
                    all = false;
                    break;
                }
            }
            if (all) {
                return true;
            }
        }
        return false;
    }

    /** Whether the patrol is won at this floor: νZ. μY. (F ∩ CPre(Z)) ∪ CPre(Y), by sweeps. */
    boolean won(int floor) {
        if (start < 0 || m.startUnits() < floor) {
            return false;
        }
        int n = states.size();
        boolean[] z = new boolean[n];
        for (int s = 0; s < n; s++) {
            z[s] = states.get(s)[1] >= floor;
        }
        while (true) {
            boolean[] y = new boolean[n];
            boolean changed = true;
            while (changed) {
                changed = false;
                for (int s = 0; s < n; s++) {
                    if (!y[s] && z[s] && ((states.get(s)[2] == full && cpre(s, z, floor)) || cpre(s, y, floor))) {
                        y[s] = true;
                        changed = true;
                    }
                }
            }
            if (java.util.Arrays.equals(y, z)) {
                return z[start];
            }
            z = y;
        }
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
        return states.stream().anyMatch(s -> Long.bitCount(s[4]) > budget);
    }

    /** Whether some reachable state has something closed. */
    boolean someClosure() {
        return states.stream().anyMatch(s -> s[4] != 0);
    }

    int stateCount() {
        return states.size();
    }
}
