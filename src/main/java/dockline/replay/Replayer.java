package dockline.replay;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.certify.CertificateChecker;
import dockline.certify.ClosedLoop;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.solve.WinningRegion;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeMap;

/**
 * Replays of a robot policy: the worst case, the nominal run, a scenario with forced events, and the
 * counterexample of a mission that is not guaranteed.
 *
 * <p>The certified replays walk the policy's {@link ClosedLoop} (from the certificate checker), which
 * is acyclic. The worst case is a dynamic programme over it in reverse topological order: per node the
 * lowest level any continuation reaches; ties go to the longer run, then to the first outcome in arena
 * order, so the replay is deterministic. O(N + E) for a loop of N nodes and E edges.
 *
 * <p>The counterexample plays the disturbance's winning strategy, which stays outside the robot's
 * {@link WinningRegion} at the mission's floor (the complement of an attractor is a trap for the robot:
 * Grädel, Thomas, Wilke 2002, "Automata, Logics, and Infinite Games", ch. 2), against the robot's best
 * effort: the certified policy for the highest floor that can still be guaranteed. That policy always
 * completes, and completion with the level at or above the floor would be winning, so the run must
 * cross the floor first; among outcomes that stay outside the region the disturbance takes the one
 * that reaches the breach in the fewest steps (a second dynamic programme over the loop), then the
 * lowest level. When no floor at all can be guaranteed, the robot instead takes, step by step, the
 * action whose answer from the disturbance leaves the most charge, until a loss or a repeated situation.
 */
public final class Replayer {

    private Replayer() {
    }

    // ------------------------------------------------------------------ certified replays

    /** The worst case of the policy from the mission's start; the policy must be certified at the floor. */
    public static Replay worstCase(Arena arena, Policy policy, int floor, int start) {
        return worstCase(certifiedLoop(arena, policy, floor, start));
    }

    /** The worst case over an acyclic, complete closed loop. */
    public static Replay worstCase(ClosedLoop loop) {
        int[] order = requireAcyclic(loop);
        int n = loop.nodeCount();
        // the outcome towards the lowest level reachable, the longer run on a tie
        int[] worst = loop.lowestLevels(order);
        int[] length = new int[n];
        int[] best = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            int v = order[i];
            int pick = -1;
            for (int s = loop.succBegin(v); s < loop.succEnd(v); s++) {
                int t = loop.succNode(s);
                if (pick < 0 || worst[t] < worst[loop.succNode(pick)]
                        || worst[t] == worst[loop.succNode(pick)] && length[t] > length[loop.succNode(pick)]) {
                    pick = s;
                }
            }
            length[v] = pick < 0 ? 0 : length[loop.succNode(pick)] + 1;
            best[v] = pick;
        }
        Walk w = walkLoop(loop, (node, step) -> best[node], loop.floor());
        return new Explainer(loop.arena(), loop.floor()).finish(Replay.Kind.WORST, w, -1);
    }

    /** The run with no events. */
    public static Replay nominal(Arena arena, Policy policy, int floor, int start) {
        return nominal(certifiedLoop(arena, policy, floor, start));
    }

    public static Replay nominal(ClosedLoop loop) {
        return nominal(loop, loop.floor());
    }

    /**
     * The run with no events, judged against {@code judgeFloor} (the run ends where it first drops
     * below it); for the best-effort policy of a mission that is not guaranteed.
     */
    public static Replay nominal(ClosedLoop loop, int judgeFloor) {
        requireAcyclic(loop);
        Walk w = walkLoop(loop, (node, step) -> nominalSlot(loop, node), judgeFloor);
        return new Explainer(loop.arena(), judgeFloor).finish(Replay.Kind.NOMINAL, w,
                judgeFloor > loop.floor() ? loop.floor() : -1);
    }

    /**
     * The run with the given events forced at their steps and the nominal outcome elsewhere; the
     * policy answers every event.
     *
     * @throws ForcedEventException if an event cannot happen at its step (the message says why)
     */
    public static Replay forced(Arena arena, Policy policy, int floor, int start, List<ForcedEvent> events)
            throws ForcedEventException {
        return forced(certifiedLoop(arena, policy, floor, start), events);
    }

    public static Replay forced(ClosedLoop loop, List<ForcedEvent> events) throws ForcedEventException {
        return forced(loop, events, loop.floor());
    }

    /** Forced events, judged against {@code judgeFloor} (see {@link #nominal(ClosedLoop, int)}). */
    public static Replay forced(ClosedLoop loop, List<ForcedEvent> events, int judgeFloor) throws ForcedEventException {
        requireAcyclic(loop);
        TreeMap<Integer, ForcedEvent> byStep = new TreeMap<>();
        List<ForcedEvent> placed = new ArrayList<>();
        for (ForcedEvent f : events) {
            if (f.atPlace()) {
                placed.add(f);
                continue;
            }
            if (byStep.put(f.step(), f) != null) {
                throw new ForcedEventException("step " + f.step() + " is named twice");
            }
        }
        Arena arena = loop.arena();
        List<Integer> slots = new ArrayList<>();
        int node = 0;
        int step = 1;
        int lastStep = byStep.isEmpty() ? 0 : byStep.lastKey();
        boolean breached = false;
        List<ForcedEvent> pending = new ArrayList<>(placed);
        while (!loop.isComplete(node) && !breached) {
            ForcedEvent f = byStep.get(step);
            int slot = -1;
            if (f == null) {
                for (int i = 0; i < pending.size() && slot < 0; i++) {
                    slot = placedSlot(loop, node, pending.get(i));
                    if (slot >= 0) {
                        pending.remove(i);
                    }
                }
            }
            if (slot < 0) {
                slot = f == null ? nominalSlot(loop, node) : forcedSlot(loop, node, f);
            }
            slots.add(slot);
            node = loop.succNode(slot);
            breached = loop.level(node) < judgeFloor;
            step++;
        }
        if (lastStep >= step) {
            throw new ForcedEventException("step " + lastStep + ": the run is already over ("
                    + (breached ? "below the reserve floor" : "mission complete") + " at step " + (step - 1) + " at "
                    + arena.cellOf(loop.vertex(node)) + ")");
        }
        if (!pending.isEmpty()) {
            List<String> names = new ArrayList<>();
            for (ForcedEvent p : pending) {
                names.add(p.toString());
            }
            throw new ForcedEventException(String.join(", ", names) + ": the policy's run never tries to enter "
                    + (pending.size() == 1 ? "that place" : "those places") + " while the event can still happen"
                    + " (check the name against the map's doors and zones, and the budget)");
        }
        Walk w = walkLoop(loop, (n, s) -> slots.get(s - 1), judgeFloor);
        return new Explainer(arena, judgeFloor).finish(Replay.Kind.FORCED, w,
                judgeFloor > loop.floor() ? loop.floor() : -1);
    }

    private static int forcedSlot(ClosedLoop loop, int node, ForcedEvent f) throws ForcedEventException {
        Arena arena = loop.arena();
        int d = loop.choice(node);
        String at = "step " + f.step() + ": " + f.kind().word() + " cannot happen there: ";
        String where = "the robot is at " + loop.cell(node) + " and its policy says '" + arena.action(d) + "'";
        if (arena.actionKind(d) != ActionKind.MOVE) {
            throw new ForcedEventException(at + where + "; events act on moves only");
        }
        if (loop.budgetLeft(node) == 0) {
            throw new ForcedEventException(at + where + ", but no disturbance budget is left (the map allows "
                    + arena.budget() + ")");
        }
        List<Integer> matching = new ArrayList<>();
        for (int s = loop.succBegin(node); s < loop.succEnd(node); s++) {
            int e = loop.succEdge(s);
            if (arena.event(e) == f.kind().ordinal()) {
                matching.add(s);
            }
        }
        Cell target = arena.action(d).target();
        if (matching.isEmpty()) {
            String limit = limitReason(arena, f.kind(), loop.cell(node), target);
            if (limit != null) {
                throw new ForcedEventException(at + where + ", and " + limit);
            }
            String why = switch (f.kind()) {
                case DOOR_SHUT -> target + " is not a door that may shut";
                case BLOCKAGE -> target + " is not in a blockage zone";
                case SLIP -> "neither " + loop.cell(node) + " nor " + target + " is in a slip zone, or no cell beside "
                        + target + " to slip to";
                case DRAG -> target + " is not in a drag zone";
            };
            throw new ForcedEventException(at + where + ", and " + why);
        }
        if (f.kind() != EventKind.SLIP) {
            return matching.get(0);
        }
        List<String> cells = new ArrayList<>();
        for (int s : matching) {
            Cell to = arena.cellOf(arena.target(loop.succEdge(s)));
            cells.add(to.toString());
            if (to.equals(f.cell())) {
                return s;
            }
        }
        if (f.cell() == null && matching.size() == 1) {
            return matching.get(0);
        }
        if (f.cell() == null) {
            throw new ForcedEventException("step " + f.step() + ": the slip can end in " + String.join(", ", cells)
                    + "; name one, e.g. " + f.step() + ":slip@" + cells.get(0));
        }
        throw new ForcedEventException(at + where + ", and a slip cannot end in " + f.cell() + "; it can end in "
                + String.join(", ", cells));
    }

    /**
     * Why an event of a kind some rule places at this move does not happen, when every such rule has an
     * {@code at-most} limit of its own (a limit of 0, or one the run has used up); null when a rule without a
     * limit covers the move or none covers it (the caller then says that the place takes no such event).
     */
    private static String limitReason(Arena arena, EventKind kind, Cell from, Cell target) {
        List<String> limits = new ArrayList<>();
        for (EventRule rule : arena.mission().map().disturbances().rules()) {
            boolean covers = rule.covers(target) || kind == EventKind.SLIP && rule.covers(from);
            if (rule.kind() != kind || !covers) {
                continue;
            }
            if (!rule.limited()) {
                return null;
            }
            limits.add((rule.label() == null || rule.label().isBlank() ? kind.word() : rule.label())
                    + " (at-most: " + rule.atMost() + ")");
        }
        if (limits.isEmpty()) {
            return null;
        }
        return target + " takes " + kind.word() + " events only under " + String.join(", ", limits)
                + ", and " + (limits.size() == 1 ? "that limit allows" : "those limits allow")
                + " no more of them at this step (a limit of 0 allows none; else the run's earlier events used it up)";
    }

    /**
     * The successor slot of an event at a named door or zone, when the policy's move at the node
     * enters it and that event can happen there; else -1.
     */
    private static int placedSlot(ClosedLoop loop, int node, ForcedEvent f) {
        Arena arena = loop.arena();
        int d = loop.choice(node);
        if (arena.actionKind(d) != ActionKind.MOVE) {
            return -1;
        }
        Cell target = arena.action(d).target();
        var map = arena.mission().map();
        for (int s = loop.succBegin(node); s < loop.succEnd(node); s++) {
            int e = loop.succEdge(s);
            if (arena.event(e) != f.kind().ordinal()) {
                continue;
            }
            EventRule rule = map.disturbances().rules().get(arena.rule(e));
            boolean match = f.kind() == EventKind.DOOR_SHUT
                    ? f.place().equals(map.doorName(target)) || ("door " + f.place()).equals(map.doorName(target))
                            || f.place().equals(target.toString())
                    : f.place().equals(rule.label()) || map.zonesAt(target).contains(f.place());
            if (match) {
                return s;
            }
        }
        return -1;
    }

    private static int nominalSlot(ClosedLoop loop, int node) {
        for (int s = loop.succBegin(node); s < loop.succEnd(node); s++) {
            if (loop.arena().event(loop.succEdge(s)) == Arena.NOMINAL) {
                return s;
            }
        }
        throw new IllegalStateException("no nominal outcome at " + loop.cell(node));
    }

    private static ClosedLoop certifiedLoop(Arena arena, Policy policy, int floor, int start) {
        return CertificateChecker.closedLoop(arena, policy, floor, start);
    }

    private static int[] requireAcyclic(ClosedLoop loop) {
        if (!loop.complete()) {
            throw new IllegalArgumentException("the policy is not certified: " + loop.problem().get().kind());
        }
        int[] order = loop.topologicalOrder();
        if (order == null) {
            throw new IllegalArgumentException("the policy is not certified: its closed loop has a cycle");
        }
        return order;
    }

    // ------------------------------------------------------------------ counterexample

    /**
     * The counterexample of a mission that is not guaranteed at {@code floor} from {@code start}.
     *
     * @param region          the robot's winning region at {@code floor}; must not contain the start
     * @param bestEffort      the closed loop of the robot's certified policy for the highest floor that can
     *                        be guaranteed from {@code start} (below {@code floor}), or {@code null} when no
     *                        floor can be guaranteed
     * @param bestEffortFloor that highest floor, or -1
     * @throws IllegalArgumentException if the start is winning (the mission is guaranteed)
     */
    public static Replay counterexample(Arena arena, int floor, int start, WinningRegion region, ClosedLoop bestEffort,
                                        int bestEffortFloor) {
        GoalAutomaton goal = GoalAutomaton.of(arena.mission());
        int g0 = goal.initial(arena.cellZones(arena.cell(arena.startVertex())));
        if (start >= floor && g0 != GoalAutomaton.REJECT
                && region.robotWins(arena.startVertex(), goal.progressMask(g0), start)) {
            throw new IllegalArgumentException("the mission is guaranteed: there is no counterexample");
        }
        Explainer ex = new Explainer(arena, floor);
        if (start < floor || g0 == GoalAutomaton.REJECT) {
            Walk w = new Walk();
            w.rows.add(ex.row(0, arena.startVertex(), null, ReplayEvent.NONE, start,
                    g0 == GoalAutomaton.REJECT ? 0 : goal.progressMask(g0)));
            w.ending = start < floor ? Replay.Ending.BELOW_FLOOR : Replay.Ending.AVOIDED_ZONE;
            return ex.finish(Replay.Kind.COUNTEREXAMPLE, w, bestEffortFloor);
        }
        if (bestEffort != null) {
            return ex.finish(Replay.Kind.COUNTEREXAMPLE, counterWalk(bestEffort, floor, region), bestEffortFloor);
        }
        return ex.finish(Replay.Kind.COUNTEREXAMPLE, greedyWalk(arena, goal, floor, start, region), -1);
    }

    private static Walk counterWalk(ClosedLoop loop, int floor, WinningRegion region) {
        int[] order = requireAcyclic(loop);
        int n = loop.nodeCount();
        final int far = Integer.MAX_VALUE / 2;
        int[] toBreach = new int[n];
        int[] pick = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            int v = order[i];
            pick[v] = -1;
            if (loop.level(v) < floor) {
                toBreach[v] = 0;
                continue;
            }
            toBreach[v] = far;
            for (int s = loop.succBegin(v); s < loop.succEnd(v); s++) {
                int t = loop.succNode(s);
                boolean outside = loop.level(t) < floor || !region.robotWins(loop.vertex(t), loop.progress(t), loop.level(t));
                if (!outside) {
                    continue;
                }
                int d = toBreach[t] >= far ? far : toBreach[t] + 1;
                if (pick[v] < 0 || d < toBreach[v]
                        || d == toBreach[v] && loop.level(t) < loop.level(loop.succNode(pick[v]))) {
                    pick[v] = s;
                    toBreach[v] = d;
                }
            }
        }
        if (toBreach[0] >= far) {
            throw new IllegalStateException("internal: the disturbance strategy does not reach the floor against the"
                    + " best-effort policy; the winning region and the policy disagree");
        }
        return walkLoop(loop, (node, step) -> pick[node], floor);
    }

    /** Robot greedy for charge, disturbance outside the region: until a loss or a repeated situation. */
    private static Walk greedyWalk(Arena arena, GoalAutomaton goal, int floor, int start, WinningRegion region) {
        Explainer ex = new Explainer(arena, floor);
        int cap = arena.mission().capacityUnits();
        Walk w = new Walk();
        int v = arena.startVertex();
        int g = goal.initial(arena.cellZones(arena.cell(v)));
        int level = start;
        w.rows.add(ex.row(0, v, null, ReplayEvent.NONE, level, goal.progressMask(g)));
        Set<List<Integer>> seen = new HashSet<>();
        seen.add(List.of(v, g, level));
        for (int step = 1; ; step++) {
            if (goal.accepting(g, arena.isDock(arena.cell(v)))) {
                w.ending = Replay.Ending.COMPLETE; // cannot happen outside the region; kept for safety
                return w;
            }
            int bestD = -1;
            int bestE = -1;
            long bestScore = Long.MIN_VALUE;
            for (int re = arena.outBegin(v); re < arena.outEnd(v); re++) {
                int d = arena.target(re);
                int e = disturbanceAnswer(arena, goal, d, g, level, floor, region, cap);
                long score = lossOf(arena, goal, e, g, level, floor, cap) ? Long.MIN_VALUE + 1
                        : Math.min(cap, (long) level + arena.weight(e));
                if (score > bestScore) {
                    bestScore = score;
                    bestD = d;
                    bestE = e;
                }
            }
            int u = arena.target(bestE);
            int l2 = (int) Math.min(cap, (long) level + arena.weight(bestE));
            int g2 = goal.step(g, arena.cellZones(arena.cell(u)));
            w.rows.add(ex.row(step, u, arena.action(bestD), ex.event(bestE), l2,
                    g2 == GoalAutomaton.REJECT ? goal.progressMask(g) : goal.progressMask(g2)));
            if (l2 < floor) {
                w.ending = Replay.Ending.BELOW_FLOOR;
                return w;
            }
            if (g2 == GoalAutomaton.REJECT) {
                w.ending = Replay.Ending.AVOIDED_ZONE;
                return w;
            }
            v = u;
            g = g2;
            level = l2;
            if (!seen.add(List.of(v, g, level))) {
                w.ending = Replay.Ending.REPEATS;
                return w;
            }
        }
    }

    private static boolean lossOf(Arena arena, GoalAutomaton goal, int e, int g, int level, int floor, int cap) {
        long l2 = Math.min(cap, (long) level + arena.weight(e));
        return l2 < floor || goal.step(g, arena.cellZones(arena.cell(arena.target(e)))) == GoalAutomaton.REJECT;
    }

    /**
     * The disturbance's answer at d: a loss if it can (lowest level), else an outcome outside the region (lowest
     * level); never an outcome into a left-out phase of a restricted arena ({@link ArenaCompiler#compileWithin}),
     * whose region must then be one whose losses are real without it.
     */
    private static int disturbanceAnswer(Arena arena, GoalAutomaton goal, int d, int g, int level, int floor,
                                         WinningRegion region, int cap) {
        int best = -1;
        long bestKey = Long.MAX_VALUE;
        for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
            if (arena.weight(e) == ArenaCompiler.LEFT_OUT) {
                continue; // a closure into a phase a restricted arena left out is not a move the building can show
            }
            long l2 = Math.min(cap, (long) level + arena.weight(e));
            int u = arena.target(e);
            int g2 = goal.step(g, arena.cellZones(arena.cell(u)));
            long key;
            if (l2 < floor || g2 == GoalAutomaton.REJECT) {
                key = l2 - (1L << 40); // losses first
            } else if (!region.robotWins(u, goal.progressMask(g2), (int) l2)) {
                key = l2;
            } else {
                key = (1L << 40) + l2; // inside the region: only if nothing else (the robot would win)
            }
            if (key < bestKey) {
                bestKey = key;
                best = e;
            }
        }
        return best;
    }

    // ------------------------------------------------------------------ walking

    @FunctionalInterface
    private interface Chooser {
        int slot(int node, int step);
    }

    /** Rows of a run and how it ended. */
    static final class Walk {
        final List<ReplayStep> rows = new ArrayList<>();
        Replay.Ending ending;
    }

    private static Walk walkLoop(ClosedLoop loop, Chooser chooser, int judgeFloor) {
        Arena arena = loop.arena();
        Explainer ex = new Explainer(arena, judgeFloor);
        Walk w = new Walk();
        int node = 0;
        w.rows.add(ex.row(0, loop.vertex(0), null, ReplayEvent.NONE, loop.level(0), loop.progress(0)));
        for (int step = 1; ; step++) {
            if (loop.isComplete(node)) {
                w.ending = Replay.Ending.COMPLETE;
                return w;
            }
            int s = chooser.slot(node, step);
            int e = loop.succEdge(s);
            int t = loop.succNode(s);
            w.rows.add(ex.row(step, loop.vertex(t), arena.action(loop.choice(node)), ex.event(e),
                    loop.level(t), loop.progress(t)));
            if (loop.level(t) < judgeFloor) {
                w.ending = Replay.Ending.BELOW_FLOOR;
                return w;
            }
            node = t;
        }
    }

    /** Builds rows and words. */
    static final class Explainer {
        private final Arena arena;
        private final Mission mission;
        private final int floor;

        Explainer(Arena arena, int floor) {
            this.arena = arena;
            this.mission = arena.mission();
            this.floor = floor;
        }

        /** A row; {@code action} is {@code null} for the start row. */
        ReplayStep row(int step, int vertex, Action action, ReplayEvent event, int level, int mask) {
            return new ReplayStep(step, arena.cellOf(vertex), action, event, level, mission.scale().toWh(level),
                    arena.budgetLeft(vertex), mask, progressWords(mission, mask));
        }

        ReplayEvent event(int e) {
            int ev = arena.event(e);
            if (ev == Arena.NOMINAL) {
                return ReplayEvent.NONE;
            }
            EventKind k = EventKind.values()[ev];
            EventRule rule = mission.map().disturbances().rules().get(arena.rule(e));
            Cell target = arena.action(arena.source(e)).target();
            Cell cell = k == EventKind.SLIP ? arena.cellOf(arena.target(e)) : target;
            String door = k == EventKind.DOOR_SHUT ? mission.map().doorName(target) : "";
            int item = arena.closedBy(e);
            if (item < 0) {
                return new ReplayEvent(k, rule.label(), door, cell);
            }
            List<Cell> closed = new ArrayList<>();
            for (int c : arena.states().itemCells(item)) {
                closed.add(Cell.ofIndex(c, arena.width()));
            }
            return new ReplayEvent(k, rule.label(), door, cell, arena.states().itemName(item), closed);
        }

        Replay finish(Replay.Kind kind, Walk w, int bestEffortFloor) {
            int min = Integer.MAX_VALUE;
            for (ReplayStep s : w.rows) {
                min = Math.min(min, s.batteryUnits());
            }
            Replay draft = new Replay(kind, w.rows, w.ending, min, floor, List.of());
            return new Replay(kind, w.rows, w.ending, min, floor,
                    Explanation.lines(mission, draft, bestEffortFloor));
        }
    }

    /** {@code 1 unit (0.1 Wh)}, {@code 12 units (1.2 Wh)}. */
    static String units(int u, dockline.model.EnergyScale scale) {
        return u + (u == 1 || u == -1 ? " unit (" : " units (") + scale.formatWh(u) + ")";
    }

    /** Task progress in words, e.g. {@code 1 of 2 tasks done (pharmacy)}. */
    static String progressWords(Mission mission, int mask) {
        return CertificateChecker.progressWords(mission, mask);
    }
}
