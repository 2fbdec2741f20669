package dockline.solve.rounds;

import dockline.fixtures.GameSweeps;
import dockline.fixtures.LapBook;
import dockline.fixtures.TaskBook;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.RobotProfile;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Test oracle, written apart from the production route: the game of a patrol or a deadline mission on
 * the explicit state space (cell, disturbances left, task or lap mask, battery level), with its own move
 * generation read straight from the map and mission records by the game rules of maps/README.md ("Game
 * semantics"), task and lap bookkeeping redone from the records ({@link TaskBook}, {@link LapBook}), and
 * naive fixpoint sweeps ({@link GameSweeps}) instead of worklist attractors. It uses neither the arena
 * compiler nor the goal or lap automaton; only the model records and their {@link EnergyScale} rounding.
 *
 * <ul>
 *   <li>Deadline: W_0 = complete states; W_{t+1} = W_t ∪ {s : some action has every outcome safe and in
 *       W_t}, the textbook "force within t steps" layers with the ticks left as an explicit counter;</li>
 *   <li>Patrol: the recurrence set as the nested fixpoint νZ. μY. (F ∩ CPre(Z)) ∪ CPre(Y) of the
 *       μ-calculus (Emerson and Jutla 1991; the Büchi game in Grädel, Thomas, Wilke (eds.), "Automata,
 *       Logics, and Infinite Games", LNCS 2500, 2002), swept until nothing changes.</li>
 * </ul>
 * Cubic or worse; only for tiny games.
 */
final class RoundsBruteForce {

    /** One outcome of an action: the state reached, or -1 when it is lost (below the floor, or avoided). */
    private final int[][][] outcomes; // state -> action -> outcome states
    private final boolean[] complete; // visit missions: tasks done (and on a dock if required)
    private final boolean[] lapDone;  // patrols: every checkpoint of the lap visited
    private final int start;          // -1 when the start is lost

    private final int w;
    private final int h;
    private final int cells;
    private final int k1;
    private final int masks;
    private final int levels;
    private final int floor;
    private final TaskBook tasks;
    private final LapBook laps;

    RoundsBruteForce(Mission m, int floor) {
        this.floor = floor;
        this.tasks = new TaskBook(m);
        this.laps = new LapBook(m);
        BuildingMap map = m.map();
        RobotProfile robot = m.robot();
        EnergyScale scale = m.scale();
        boolean patrol = m.tasks().patrols();
        this.w = map.width();
        this.h = map.height();
        this.cells = w * h;
        int budget = map.disturbances().budget();
        this.k1 = budget + 1;
        List<String> tasks = patrol ? m.tasks().patrol() : m.tasks().visit();
        this.masks = 1 << tasks.size();
        int cap = m.capacityUnits();
        this.levels = cap + 1;
        int n = cells * k1 * masks * levels;
        outcomes = new int[n][][];
        complete = new boolean[n];
        lapDone = new boolean[n];
        int full = masks - 1;
        int wait = scale.consumption(robot.waitWh());
        int gain = scale.gain(robot.chargeWh());
        boolean eight = robot.neighbourhood() == Neighbourhood.EIGHT;
        List<EventRule> rules = map.disturbances().rules();
        for (int c = 0; c < cells; c++) {
            Cell cell = new Cell(c % w, c / w);
            if (!map.isFree(cell)) {
                continue;
            }
            for (int k = 0; k < k1; k++) {
                for (int mask = 0; mask < masks; mask++) {
                    for (int level = 0; level < levels; level++) {
                        int s = id(c, k, mask, level);
                        if (level < floor) {
                            continue;
                        }
                        boolean dock = map.terrainAt(cell).dock();
                        if (!patrol) {
                            complete[s] = mask == full && (dock || !m.tasks().finishOnDock());
                        } else {
                            lapDone[s] = mask == full;
                        }
                        List<int[]> acts = new ArrayList<>();
                        // wait: stay, pay the wait energy
                        acts.add(new int[] {after(m, cell, k, mask, level, -wait, patrol)});
                        if (dock && gain >= 1) {
                            acts.add(new int[] {after(m, cell, k, mask, level, gain, patrol)});
                        }
                        for (Cell nb : neighbours(map, cell, eight)) {
                            boolean diagonal = nb.x() != cell.x() && nb.y() != cell.y();
                            BigDecimal wh = robot.moveWh().get(map.terrainAt(nb).surface());
                            int enter = diagonal ? scale.diagonalConsumption(wh) : scale.consumption(wh);
                            List<Integer> outs = new ArrayList<>();
                            outs.add(after(m, nb, k, mask, level, -enter, patrol));
                            if (k > 0) {
                                boolean door = false;
                                boolean block = false;
                                boolean slip = false;
                                int drag = -1;
                                for (EventRule r : rules) {
                                    if (r.kind() == EventKind.DOOR_SHUT && r.covers(nb) && map.terrainAt(nb).door()) {
                                        door = true;
                                    }
                                    if (r.kind() == EventKind.BLOCKAGE && r.covers(nb)) {
                                        block = true;
                                    }
                                    if (r.kind() == EventKind.SLIP && (r.covers(cell) || r.covers(nb))) {
                                        slip = true;
                                    }
                                    if (r.kind() == EventKind.DRAG && r.covers(nb)) {
                                        drag = Math.max(drag, scale.consumption(r.extraWh()));
                                    }
                                }
                                if (door) {
                                    outs.add(after(m, cell, k - 1, mask, level, -wait, patrol));
                                }
                                if (block) {
                                    outs.add(after(m, cell, k - 1, mask, level, -wait, patrol));
                                }
                                if (slip) {
                                    // the free neighbours of the target other than the robot's cell; as for moves
                                    // (with 8 neighbours a diagonal does not cut a wall corner), straight cost
                                    for (Cell mm : neighbours(map, nb, eight)) {
                                        if (!mm.equals(cell)) {
                                            int cost = scale.consumption(robot.moveWh().get(map.terrainAt(mm).surface()));
                                            outs.add(after(m, mm, k - 1, mask, level, -cost, patrol));
                                        }
                                    }
                                }
                                if (drag >= 0) {
                                    outs.add(after(m, nb, k - 1, mask, level, -(enter + drag), patrol));
                                }
                            }
                            acts.add(outs.stream().mapToInt(Integer::intValue).toArray());
                        }
                        outcomes[s] = acts.toArray(new int[0][]);
                    }
                }
            }
        }
        int sc = m.start().y() * w + m.start().x();
        int m0 = progress(0, m.start(), patrol);
        int l0 = Math.min(cap, m.startUnits());
        this.start = m0 < 0 || l0 < floor ? -1 : id(sc, budget, m0, l0);
    }

    private int id(int c, int k, int mask, int level) {
        return ((c * k1 + k) * masks + mask) * levels + level;
    }

    /** The state after occupying {@code cell} with the energy change {@code delta}, or -1 when lost. */
    private int after(Mission m, Cell cell, int k, int mask, int level, int delta, boolean patrol) {
        long raw = (long) level + delta;
        if (raw < floor) {
            return -1;
        }
        int nl = (int) Math.min(levels - 1, raw);
        int nm = progress(mask, cell, patrol);
        if (nm < 0) {
            return -1;
        }
        int nk = k;
        if (patrol && nm == masks - 1 && m.map().disturbances().budgetPerLap()) {
            nk = k1 - 1; // the budget starts afresh on a completed lap
        }
        return id(cell.y() * w + cell.x(), nk, nm, nl);
    }

    /** Task (visit, in order or any order) or lap (patrol) progress after occupying a cell; -1 avoided. */
    private int progress(int mask, Cell cell, boolean patrol) {
        return patrol ? laps.step(mask, cell) : tasks.step(mask, cell);
    }

    /** Free neighbours in the order N, E, S, W (then the diagonals, not cutting a wall corner). */
    private static List<Cell> neighbours(BuildingMap map, Cell c, boolean eight) {
        int[][] d4 = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}};
        int[][] d8 = {{1, -1}, {1, 1}, {-1, 1}, {-1, -1}};
        List<Cell> out = new ArrayList<>();
        for (int[] d : d4) {
            Cell n = new Cell(c.x() + d[0], c.y() + d[1]);
            if (map.inside(n) && map.isFree(n)) {
                out.add(n);
            }
        }
        if (eight) {
            for (int[] d : d8) {
                Cell n = new Cell(c.x() + d[0], c.y() + d[1]);
                if (map.inside(n) && map.isFree(n) && map.isFree(new Cell(c.x() + d[0], c.y()))
                        && map.isFree(new Cell(c.x(), c.y() + d[1]))) {
                    out.add(n);
                }
            }
        }
        return out;
    }

    /** The fewest turns the robot can force completion within, or -1 if never (up to {@code maxTurns}). */
    int fewestTurns(int maxTurns) {
        if (start < 0) {
            return -1;
        }
        boolean[] win = complete.clone();
        for (int t = 0; t <= maxTurns; t++) {
            if (win[start]) {
                return t;
            }
            boolean[] next = win.clone();
            for (int s = 0; s < win.length; s++) {
                if (!win[s] && outcomes[s] != null && GameSweeps.cpre(outcomes[s], win)) {
                    next[s] = true;
                }
            }
            win = next;
        }
        return -1;
    }

    /** Whether the robot can force completion within {@code deadline} turns (ticks left counted down). */
    boolean deadlineWon(int deadline) {
        int t = fewestTurns(deadline);
        return t >= 0 && t <= deadline;
    }

    /** Whether the patrol is won: νZ. μY. (F ∩ CPre(Z)) ∪ CPre(Y), by sweeps over the states at or above the floor. */
    boolean patrolWon() {
        if (start < 0) {
            return false;
        }
        boolean[] live = new boolean[outcomes.length];
        for (int s = 0; s < outcomes.length; s++) {
            live[s] = outcomes[s] != null;
        }
        return GameSweeps.recurrence(outcomes, live, lapDone)[start];
    }
}
