package dockline.solve.reserve;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.RobotProfile;
import dockline.model.Terrain;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Test oracle for lasting events and at-most limits: the game of maps/README.md ("Game semantics")
 * played out on explicit states (cell, battery level, tasks done, budget left, set of closed doors and
 * zones, events used per limited rule), with its <em>own</em> move generation read straight from the
 * map and mission records. It uses neither the arena compiler nor the goal automaton nor any solver;
 * only the model's unit rounding ({@link EnergyScale}) is shared, as that is the input's meaning.
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
    private final BuildingMap map;
    private final int w;
    private final int h;
    private final int cap;
    private final int wait;
    private final int charge;
    private final boolean eight;
    private final List<EventRule> rules;
    // the closable items: door cells whose first door rule is lasting, lasting blockage rules
    private final List<Cell> doorItems = new ArrayList<>();
    private final List<Integer> blockItems = new ArrayList<>();
    private final List<String> visit;
    private final int masks;

    private final Map<Long, Integer> index = new HashMap<>();
    private final List<long[]> states = new ArrayList<>();

    LastingBruteForce(Mission mission) {
        this.m = mission;
        this.map = mission.map();
        this.w = map.width();
        this.h = map.height();
        this.cap = mission.capacityUnits();
        RobotProfile r = mission.robot();
        EnergyScale s = mission.scale();
        this.wait = s.consumption(r.waitWh());
        this.charge = s.gain(r.chargeWh());
        this.eight = r.neighbourhood() == Neighbourhood.EIGHT;
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
        if (doorItems.size() + blockItems.size() > 20 || rules.size() > 8) {
            throw new IllegalArgumentException("too big for the brute force");
        }
        this.visit = mission.tasks().visit();
        this.masks = 1 << visit.size();
    }

    // ---------------------------------------------------------------- the rules of maps/README.md

    private Terrain at(Cell c) {
        return map.terrainAt(c);
    }

    private boolean inside(int x, int y) {
        return x >= 0 && y >= 0 && x < w && y < h;
    }

    /** First rule of a kind covering the cell (door-shut only on door cells); for drag the largest extra. */
    private int first(EventKind kind, Cell c) {
        int best = -1;
        for (int i = 0; i < rules.size(); i++) {
            EventRule r = rules.get(i);
            if (r.kind() != kind || !r.covers(c)) {
                continue;
            }
            if (kind == EventKind.DOOR_SHUT && !at(c).door()) {
                continue;
            }
            if (kind == EventKind.DRAG) {
                if (best < 0 || units(r.extraWh()) > units(rules.get(best).extraWh())) {
                    best = i;
                }
            } else if (best < 0) {
                return i;
            }
        }
        return best;
    }

    private int units(BigDecimal wh) {
        return m.scale().consumption(wh);
    }

    private boolean closed(Cell c, long closedSet) {
        for (int i = 0; i < doorItems.size(); i++) {
            if ((closedSet >> i & 1) != 0 && doorItems.get(i).equals(c)) {
                return true;
            }
        }
        for (int j = 0; j < blockItems.size(); j++) {
            if ((closedSet >> (doorItems.size() + j) & 1) != 0 && rules.get(blockItems.get(j)).covers(c)) {
                return true;
            }
        }
        return false;
    }

    private boolean open(int x, int y, long closedSet) {
        return inside(x, y) && at(new Cell(x, y)).free() && !closed(new Cell(x, y), closedSet);
    }

    /** Open neighbours: N, E, S, W, then the diagonals that cut no wall or closed corner. */
    private List<Cell> neighbours(Cell c, long closedSet) {
        int[][] d = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}, {1, -1}, {1, 1}, {-1, 1}, {-1, -1}};
        List<Cell> out = new ArrayList<>();
        for (int i = 0; i < (eight ? 8 : 4); i++) {
            int nx = c.x() + d[i][0];
            int ny = c.y() + d[i][1];
            if (!open(nx, ny, closedSet)) {
                continue;
            }
            if (i >= 4 && (!open(nx, c.y(), closedSet) || !open(c.x(), ny, closedSet))) {
                continue;
            }
            out.add(new Cell(nx, ny));
        }
        return out;
    }

    private int moveCost(Cell from, Cell to) {
        BigDecimal wh = m.robot().moveWh().get(at(to).surface());
        boolean diagonal = from.x() != to.x() && from.y() != to.y();
        return diagonal ? m.scale().diagonalConsumption(wh) : m.scale().consumption(wh);
    }

    private int progress(int mask, Cell c) {
        List<String> names = map.zonesAt(c);
        for (String a : m.tasks().avoid()) {
            if (names.contains(a)) {
                return -1;
            }
        }
        if (m.tasks().ordered()) {
            int i = Integer.bitCount(mask);
            while (i < visit.size() && names.contains(visit.get(i))) {
                mask |= 1 << i;
                i++;
            }
        } else {
            for (int i = 0; i < visit.size(); i++) {
                if (names.contains(visit.get(i))) {
                    mask |= 1 << i;
                }
            }
        }
        return mask;
    }

    private boolean complete(int mask, Cell c) {
        return mask == masks - 1 && (!m.tasks().finishOnDock() || at(c).dock());
    }

    // ---------------------------------------------------------------- states

    /** Events used of rule i (2 bits each), packed. */
    private int used(long counts, int rule) {
        return (int) (counts >> (2 * rule) & 3);
    }

    /** The counts after an event of the rule (only limited rules are counted). */
    private long count(long counts, int rule) {
        return rules.get(rule).limited() ? counts + (1L << 2 * rule) : counts;
    }

    private boolean allowed(int k, long counts, int rule) {
        EventRule r = rules.get(rule);
        return k > 0 && (!r.limited() || used(counts, rule) < r.atMost());
    }

    private long pack(Cell c, int level, int mask, int k, long closedSet, long counts) {
        long key = c.y() * w + c.x();
        key = key * (cap + 1) + level;
        key = key * masks + mask;
        key = key * 4 + k;
        key = (key << 20) | closedSet;
        return (key << 16) | counts;
    }

    /** One outcome: where the robot ends, the level change, and the new disturbance part. */
    private record Outcome(Cell cell, int delta, int k, long closedSet, long counts) {
    }

    /** The robot's actions in a situation, each as the list of the building's answers. */
    private List<List<Outcome>> actions(Cell c, int k, long cl, long counts) {
        List<List<Outcome>> out = new ArrayList<>();
        for (Cell n : neighbours(c, cl)) {
            List<Outcome> o = new ArrayList<>();
            int enter = moveCost(c, n);
            o.add(new Outcome(n, -enter, k, cl, counts));
            int dr = first(EventKind.DOOR_SHUT, n);
            if (dr >= 0 && allowed(k, counts, dr)) {
                long cl2 = rules.get(dr).lasting() ? cl | 1L << doorItems.indexOf(n) : cl;
                o.add(new Outcome(c, -wait, k - 1, cl2, count(counts, dr)));
            }
            int br = first(EventKind.BLOCKAGE, n);
            if (br >= 0 && allowed(k, counts, br)) {
                long cl2 = rules.get(br).lasting() ? cl | 1L << (doorItems.size() + blockItems.indexOf(br)) : cl;
                o.add(new Outcome(c, -wait, k - 1, cl2, count(counts, br)));
            }
            int sr = first(EventKind.SLIP, c);
            if (sr < 0) {
                sr = first(EventKind.SLIP, n);
            }
            if (sr >= 0 && allowed(k, counts, sr)) {
                for (Cell s : neighbours(n, cl)) {
                    if (!s.equals(c)) {
                        o.add(new Outcome(s, -m.scale().consumption(m.robot().moveWh().get(at(s).surface())), k - 1, cl,
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

    /**
     * The highest floor the robot can guarantee from the start (the max-min lowest level), or -1.
     */
    int highestFloor() {
        Cell s0 = m.start();
        int l0 = m.startUnits();
        int p0 = progress(0, s0);
        if (p0 < 0) {
            return -1;
        }
        if (complete(p0, s0)) {
            return l0;
        }
        // explore the reachable states, storing for each its actions' successors (or terminal values)
        List<int[][]> succ = new ArrayList<>();
        List<int[][]> term = new ArrayList<>();
        intern(s0, l0, p0, map.disturbances().budget(), 0, 0);
        for (int i = 0; i < states.size(); i++) {
            long[] st = states.get(i);
            Cell c = Cell.ofIndex((int) st[0], w);
            int level = (int) st[1];
            int mask = (int) st[2];
            List<List<Outcome>> acts = actions(c, (int) st[3], st[4], st[5]);
            int[][] sa = new int[acts.size()][];
            int[][] ta = new int[acts.size()][];
            for (int a = 0; a < acts.size(); a++) {
                List<Outcome> os = acts.get(a);
                sa[a] = new int[os.size()];
                ta[a] = new int[os.size()];
                for (int j = 0; j < os.size(); j++) {
                    Outcome o = os.get(j);
                    int l2 = Math.min(cap, level + o.delta());
                    int m2 = progress(mask, o.cell());
                    if (l2 < 0 || m2 < 0) {
                        sa[a][j] = -1;
                        ta[a][j] = -1;
                    } else if (complete(m2, o.cell())) {
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
        return states.stream().anyMatch(s -> s[4] != 0);
    }

    private int intern(Cell c, int level, int mask, int k, long cl, long counts) {
        long key = pack(c, level, mask, k, cl, counts);
        Integer id = index.get(key);
        if (id != null) {
            return id;
        }
        int n = states.size();
        index.put(key, n);
        states.add(new long[] {c.index(w), level, mask, k, cl, counts});
        return n;
    }
}
