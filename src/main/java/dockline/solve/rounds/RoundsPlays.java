package dockline.solve.rounds;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.Mission;
import dockline.util.IntArrayList;
import java.util.Arrays;
import java.util.Optional;

/**
 * The plays that replays show for patrols and deadline missions, read off the solved product.
 *
 * <ul>
 *   <li>A guaranteed patrol: the lasso of its policy that passes the lowest level ever reached: the shortest way
 *       (breadth-first over the policy's closed loop) to that situation, then the nominal outcomes until a
 *       situation repeats; the repeating part completes at least one lap (every cycle of the loop does).</li>
 *   <li>A patrol that is not guaranteed: the building's winning strategy of the Büchi fixpoint (stay in the
 *       trap of the round in which the situation left the game, or get closer to it) against the robot's best
 *       effort (head for the situations that held out longest, then for the next completed lap): it ends below
 *       the floor, in an avoided zone, or in a loop in which some checkpoint is never visited.</li>
 *   <li>A deadline mission the robot can finish at all: its policy against the building's choices that delay it
 *       most (an outcome of greatest rank), so the play takes exactly the worst finishing time.</li>
 * </ul>
 * Cost: one product build and solve at the mission's floor, then O(N + M).
 */
public final class RoundsPlays {

    private RoundsPlays() {
    }

    /** Whether the patrol is guaranteed, and its worst lasso or its counterexample. */
    public record PatrolPlay(boolean guaranteed, RoundsPlay play) {
    }

    /**
     * @param safest for a guaranteed patrol, the lasso of the safest policy (that of the highest floor), else of
     *               the policy of shortest laps at the mission's floor
     */
    public static PatrolPlay patrol(Mission m, long budgetBytes, boolean safest) {
        Arena arena = ArenaCompiler.compile(m);
        PatrolSolver.Solved s = PatrolSolver.solve(arena, m.reserveUnits(), m.startUnits(), budgetBytes);
        if (safest && s.guaranteed()) {
            int h = PatrolSolver.highestFloor(arena, m.startUnits(), budgetBytes, m.reserveUnits()).getAsInt();
            s = PatrolSolver.solve(arena, h, m.startUnits(), budgetBytes);
        }
        RoundsProduct p = s.product();
        if (p.start() == RoundsProduct.LOST) {
            return new PatrolPlay(false, startLost(m, arena));
        }
        if (s.guaranteed()) {
            return new PatrolPlay(true, worstLasso(p, s.choice()));
        }
        int[] robot = bestEffort(p, s);
        return new PatrolPlay(false, walk(p, robot, s.oppChoice()));
    }

    /** The deadline mission's slowest play under its policy, or empty when the robot cannot force completion. */
    /**
     * @param safest when the deadline is kept, the play of the safest policy (that of the highest floor that
     *               keeps it), else of the policy of fewest turns at the mission's floor
     */
    public static Optional<RoundsPlay> deadline(Mission m, long budgetBytes, boolean safest) {
        Arena arena = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        if (safest) {
            DeadlineSolver.Solved s = DeadlineSolver.solve(arena, floor, m.startUnits(), budgetBytes);
            if (s.turns() >= 0 && s.turns() <= m.timing().deadlineTicks()) {
                floor = DeadlineSolver.highestFloor(arena, m.startUnits(), m.timing().deadlineTicks(), budgetBytes,
                        floor).getAsInt();
            }
        }
        DeadlineSolver.Solved solved = DeadlineSolver.solve(arena, floor, m.startUnits(), budgetBytes);
        RoundsProduct p = solved.product();
        int n = p.vertexCount();
        int[] choice = solved.choice();
        int[] rank = solved.rank();
        if (p.start() == RoundsProduct.LOST || rank[p.start()] == Attractor.OUT) {
            return Optional.empty();
        }
        int[] opp = new int[n];
        Arrays.fill(opp, -1);
        for (int d = 0; d < n; d++) {
            if (p.isRobot(d) || rank[d] == Attractor.OUT) {
                continue;
            }
            int best = -1;
            for (int e = p.outBegin(d); e < p.outEnd(d); e++) {
                int u = p.target(e);
                if (best < 0 || rank[u] > rank[p.target(best)]
                        || (rank[u] == rank[p.target(best)] && p.level(u) < p.level(p.target(best)))) {
                    best = e;
                }
            }
            opp[d] = best;
        }
        return Optional.of(walk(p, choice, opp));
    }

    private static RoundsPlay startLost(Mission m, Arena a) {
        int v0 = a.startVertex();
        return new RoundsPlay(new int[] {a.cell(v0)}, new int[] {m.startUnits()}, new int[] {a.budgetLeft(v0)},
                new int[] {0}, new int[] {-1}, new int[] {-1}, -1, m.startUnits() < m.reserveUnits()
                ? RoundsPlay.Ending.BELOW_FLOOR : RoundsPlay.Ending.AVOIDED_ZONE);
    }

    /** The robot's best effort where it cannot win: the successor that held out longest, then nearest a lap. */
    private static int[] bestEffort(RoundsProduct p, PatrolSolver.Solved s) {
        int n = p.vertexCount();
        int[] choice = new int[n];
        Arrays.fill(choice, -1);
        for (int v = 0; v < n; v++) {
            if (!p.isRobot(v) || v == RoundsProduct.LOST) {
                continue;
            }
            int best = -1;
            long bestKey = Long.MIN_VALUE;
            for (int e = p.outBegin(v); e < p.outEnd(v); e++) {
                int d = p.target(e);
                long held = s.removedIn()[d] == 0 ? Integer.MAX_VALUE : s.removedIn()[d];
                long near = s.firstRank()[d] == Attractor.OUT ? Integer.MAX_VALUE : s.firstRank()[d];
                long key = (held << 32) - near;
                if (key > bestKey) {
                    bestKey = key;
                    best = e;
                }
            }
            choice[v] = best;
        }
        return choice;
    }

    /**
     * The play of the robot's choice against the building's choice from the start, until the mission is
     * complete, a turn is lost, or a situation repeats.
     */
    private static RoundsPlay walk(RoundsProduct p, int[] robot, int[] building) {
        Rows r = new Rows();
        int[] seen = new int[p.vertexCount()];
        Arrays.fill(seen, -1);
        int v = p.start();
        r.add(p, v, -1, -1);
        seen[v] = 0;
        while (true) {
            if (p.complete(v)) {
                return r.play(-1, RoundsPlay.Ending.COMPLETE);
            }
            int d = p.target(robot[v]);
            int e = building[d] >= 0 ? building[d] : p.outBegin(d);
            int u = p.target(e);
            int ae = p.arenaEdge(e);
            if (u == RoundsProduct.LOST) {
                return r.lost(p, v, d, ae);
            }
            r.add(p, u, p.arenaVertex(d), ae);
            if (seen[u] >= 0) {
                r.dropLast();
                return r.play(seen[u], RoundsPlay.Ending.REPEATS);
            }
            seen[u] = r.size() - 1;
            v = u;
        }
    }

    /** The policy's lasso through the lowest level of its closed loop. */
    private static RoundsPlay worstLasso(RoundsProduct p, int[] choice) {
        int n = p.vertexCount();
        int[] parent = new int[n];
        int[] parentEdge = new int[n];
        Arrays.fill(parent, -2);
        IntArrayList queue = new IntArrayList();
        int s = p.start();
        parent[s] = -1;
        queue.add(s);
        int lowest = s;
        for (int i = 0; i < queue.size(); i++) {
            int v = queue.get(i);
            if (p.level(v) < p.level(lowest)) {
                lowest = v;
            }
            int d = p.target(choice[v]);
            for (int e = p.outBegin(d); e < p.outEnd(d); e++) {
                int u = p.target(e);
                if (parent[u] == -2) {
                    parent[u] = v;
                    parentEdge[u] = e;
                    queue.add(u);
                }
            }
        }
        IntArrayList path = new IntArrayList();
        for (int v = lowest; v != -1; v = parent[v]) {
            path.add(v);
        }
        Rows r = new Rows();
        int[] seen = new int[n];
        Arrays.fill(seen, -1);
        for (int i = path.size() - 1; i >= 0; i--) {
            int v = path.get(i);
            if (i == path.size() - 1) {
                r.add(p, v, -1, -1);
            } else {
                int e = parentEdge[v];
                r.add(p, v, p.arenaVertex(p.target(choice[parent[v]])), p.arenaEdge(e));
            }
            seen[v] = r.size() - 1;
        }
        int v = lowest;
        while (true) {
            int d = p.target(choice[v]);
            int e = p.outBegin(d); // the nominal outcome comes first
            int u = p.target(e);
            r.add(p, u, p.arenaVertex(d), p.arenaEdge(e));
            if (seen[u] >= 0) {
                r.dropLast();
                return r.play(seen[u], RoundsPlay.Ending.REPEATS);
            }
            seen[u] = r.size() - 1;
            v = u;
        }
    }

    /** Rows being collected. */
    private static final class Rows {
        final IntArrayList cell = new IntArrayList();
        final IntArrayList level = new IntArrayList();
        final IntArrayList budget = new IntArrayList();
        final IntArrayList mask = new IntArrayList();
        final IntArrayList action = new IntArrayList();
        final IntArrayList edge = new IntArrayList();
        int drop;

        void add(RoundsProduct p, int v, int actionVertex, int arenaEdge) {
            Arena a = p.arena();
            int av = p.arenaVertex(v);
            cell.add(a.cell(av));
            level.add(p.level(v));
            budget.add(a.budgetLeft(av));
            mask.add(p.progressMask(v));
            action.add(actionVertex);
            edge.add(arenaEdge);
        }

        void dropLast() {
            drop = 1;
        }

        int size() {
            return cell.size() - drop;
        }

        RoundsPlay lost(RoundsProduct p, int v, int d, int arenaEdge) {
            Arena a = p.arena();
            int u = a.target(arenaEdge);
            long raw = (long) p.level(v) + a.weight(arenaEdge);
            boolean below = raw < p.floor();
            cell.add(a.cell(u));
            level.add((int) Math.max(Integer.MIN_VALUE, Math.min(p.capacity(), raw)));
            budget.add(a.budgetLeft(u));
            mask.add(p.progressMask(v));
            action.add(p.arenaVertex(d));
            edge.add(arenaEdge);
            return play(-1, below ? RoundsPlay.Ending.BELOW_FLOOR : RoundsPlay.Ending.AVOIDED_ZONE);
        }

        RoundsPlay play(int loopStart, RoundsPlay.Ending ending) {
            int n = cell.size() - drop;
            return new RoundsPlay(Arrays.copyOf(cell.toArray(), n), Arrays.copyOf(level.toArray(), n),
                    Arrays.copyOf(budget.toArray(), n), Arrays.copyOf(mask.toArray(), n),
                    Arrays.copyOf(action.toArray(), n), Arrays.copyOf(edge.toArray(), n), loopStart, ending);
        }
    }
}
