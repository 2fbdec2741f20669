package dockline.certify;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.ThresholdPolicy;
import java.util.ArrayList;
import java.util.List;

/**
 * Checks a robot policy against the mission on its own code path, trusting neither the solver nor
 * the goal automaton: only the model, the compiled arena and the policy's data.
 *
 * <p>It builds the {@link ClosedLoop} of the policy against every disturbance choice from the start
 * and checks (a) no reachable situation has the battery below the floor or the robot in an avoided
 * zone, (c) every robot situation reached has a policy entry whose action is legal there, and (b) no
 * cycle of the loop avoids mission completion. Since the loop is finite and the disturbance controls
 * every branch, (b) holds exactly when the loop is acyclic; it is decided by a topological order
 * (Kahn 1962) and, for loops of up to {@value #JGRAPHT_LIMIT} states, cross-checked with jgrapht's
 * {@link CycleDetector} on a {@link DefaultDirectedGraph} copy of the loop. The worst minimum level is
 * then a dynamic programme over the acyclic loop in reverse topological order:
 * {@code worst(s) = min(level(s), min over successors worst(t))}.
 *
 * <p>Cost: O(N + E) time and memory for a loop of N states and E outcome edges (plus the jgrapht copy
 * for small loops).
 */
public final class CertificateChecker {

    /** Largest loop also copied into jgrapht for the second cycle check. */
    public static final int JGRAPHT_LIMIT = 300_000;

    private CertificateChecker() {
    }

    /** Checks the policy on the mission's arena, from the mission's starting charge. */
    public static Certificate check(Mission mission, Policy policy, int floorUnits) {
        return check(ArenaCompiler.compile(mission), policy, floorUnits);
    }

    /** Checks the policy from the arena's start vertex and the mission's starting charge. */
    public static Certificate check(Arena arena, Policy policy, int floorUnits) {
        return check(arena, policy, floorUnits, arena.mission().startUnits());
    }

    /**
     * Checks the policy from the arena's start vertex with the given starting level.
     *
     * @throws ClosedLoop.TooLargeException if the loop exceeds {@link ClosedLoop#DEFAULT_MAX_NODES}
     */
    public static Certificate check(Arena arena, Policy policy, int floorUnits, int startUnits) {
        ClosedLoop loop = closedLoop(arena, policy, floorUnits, startUnits);
        return certify(loop);
    }

    /** The closed loop of the policy (possibly stopped at its first problem), for replays and views. */
    public static ClosedLoop closedLoop(Arena arena, Policy policy, int floorUnits, int startUnits) {
        return ClosedLoop.build(arena, policy, floorUnits, startUnits, ClosedLoop.DEFAULT_MAX_NODES);
    }

    /** The closed loop of a threshold policy (possibly stopped at its first problem). */
    public static ClosedLoop closedLoop(Arena arena, ThresholdPolicy policy, int floorUnits, int startUnits) {
        return ClosedLoop.build(arena, policy, floorUnits, startUnits, ClosedLoop.DEFAULT_MAX_NODES);
    }

    /**
     * Checks a threshold policy from the arena's start vertex with the given starting level: the same
     * closed loop and checks as for rows, the action at every level a play meets read off the thresholds.
     *
     * @throws ClosedLoop.TooLargeException if the loop exceeds {@link ClosedLoop#DEFAULT_MAX_NODES}
     */
    public static Certificate check(Arena arena, ThresholdPolicy policy, int floorUnits, int startUnits) {
        return certify(closedLoop(arena, policy, floorUnits, startUnits));
    }

    /** The certificate of an already built loop. */
    public static Certificate certify(ClosedLoop loop) {
        Words w = new Words(loop);
        int floor = loop.floor();
        int start = loop.startLevel();
        if (loop.problem().isPresent()) {
            ClosedLoop.Problem p = loop.problem().get();
            int worst = Math.min(p.level(), loop.minLevelSeen());
            return new Certificate(false, w.problem(p), loop.nodeCount(), worst, -1, floor, start);
        }
        int[] order = loop.topologicalOrder();
        Boolean jgraphtCycle = loop.nodeCount() <= JGRAPHT_LIMIT ? loop.graph().jgraphtHasCycle(loop.nodeCount()) : null;
        if (jgraphtCycle != null && jgraphtCycle != (order == null)) {
            return new Certificate(false, "internal: the two cycle checks disagree (topological order says "
                    + (order == null ? "cyclic" : "acyclic") + ", jgrapht says " + (jgraphtCycle ? "cyclic" : "acyclic")
                    + "); the policy is not certified", loop.nodeCount(), loop.minLevelSeen(), -1, floor, start);
        }
        if (order == null) {
            return new Certificate(false, w.cycle(loop.findCycle()), loop.nodeCount(), loop.minLevelSeen(), -1,
                    floor, start);
        }
        int n = loop.nodeCount();
        int[] worst = loop.lowestLevels(order);
        int[] longest = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            int v = order[i];
            for (int s = loop.succBegin(v); s < loop.succEnd(v); s++) {
                longest[v] = Math.max(longest[v], longest[loop.succNode(s)] + 1);
            }
        }
        EnergyScale scale = loop.arena().mission().scale();
        String reason = "every run of the policy from " + loop.cell(0) + " with " + w.units(start)
                + " completes the mission under every disturbance the model allows; the battery never drops below "
                + w.units(worst[0]) + " (reserve floor " + w.units(floor) + "); " + n + " states checked, longest run "
                + longest[0] + " steps; " + scale.describe();
        return new Certificate(true, reason, n, worst[0], longest[0], floor, start);
    }

    /**
     * Task progress in words, e.g. {@code 1 of 2 tasks done (pharmacy)}: the checker's wording, which the
     * replays use too, so that a step reads the same in a certificate's reason and in a replay.
     */
    public static String progressWords(Mission mission, int mask) {
        List<String> visit = mission.tasks().visit();
        List<String> done = new ArrayList<>();
        for (int i = 0; i < visit.size(); i++) {
            if ((mask & (1 << i)) != 0) {
                done.add(visit.get(i));
            }
        }
        return done.size() + " of " + visit.size() + " tasks done" + (done.isEmpty() ? "" : " (" + String.join(", ", done) + ")");
    }

    /** Wording of states, steps and problems for the certificate's reason. */
    static final class Words extends LoopWords<ClosedLoop> {

        Words(ClosedLoop loop) {
            super(loop);
        }

        String state(int node) {
            return loop.cell(node) + " with " + units(loop.level(node)) + ", budget left " + loop.budgetLeft(node)
                    + (loop.closures(node).isEmpty() ? "" : " (" + loop.closures(node) + ")")
                    + ", " + tasks(loop.progress(node));
        }

        String tasks(int mask) {
            return progressWords(mission, mask);
        }

        String outcome(int e) {
            int ev = arena.event(e);
            Cell to = arena.cellOf(arena.target(e));
            if (ev == Arena.NOMINAL) {
                return "the nominal outcome (arrive at " + to + ")";
            }
            EventKind k = EventKind.values()[ev];
            BuildingMap map = mission.map();
            EventRule rule = map.disturbances().rules().get(arena.rule(e));
            String what = switch (k) {
                case DOOR_SHUT -> {
                    String d = map.doorName(arena.action(arena.source(e)).target());
                    yield (d.startsWith("door ") ? d : "door " + d) + " shut";
                }
                case BLOCKAGE -> "a blockage at " + arena.action(arena.source(e)).target();
                case SLIP -> "a slip to " + to;
                case DRAG -> "drag on entering " + to;
            };
            return what + " (rule '" + rule.label() + "')";
        }

        String trace(int node) {
            List<Integer> path = loop.pathTo(node);
            StringBuilder sb = new StringBuilder();
            int from = Math.max(0, path.size() - 1 - TRACE_STEPS);
            if (from > 0) {
                sb.append("… ");
            } else {
                sb.append("start ");
            }
            for (int i = from; i < path.size(); i++) {
                int n = path.get(i);
                if (i > from) {
                    int e = loop.parentEdge(n);
                    sb.append(" -").append(arena.action(arena.source(e)));
                    if (arena.event(e) != Arena.NOMINAL) {
                        sb.append(", ").append(EventKind.values()[arena.event(e)].word()).append(" '")
                                .append(mission.map().disturbances().rules().get(arena.rule(e)).label()).append("'");
                    }
                    sb.append("-> ");
                }
                sb.append(loop.cell(n)).append(" (").append(loop.level(n)).append(")");
            }
            return sb.toString();
        }

        String problem(ClosedLoop.Problem p) {
            int n = p.node();
            String where = "after " + (loop.pathTo(n).size() - 1) + " steps [" + trace(n) + "], at " + state(n);
            return switch (p.kind()) {
                case START_BELOW_FLOOR -> "the starting charge " + units(p.level()) + " is below the reserve floor "
                        + units(loop.floor());
                case START_IN_AVOIDED_ZONE -> "the start cell " + loop.cell(0) + " lies in an avoided zone";
                case MISSING_ENTRY -> "the policy has no entry for a situation the robot can reach: " + where;
                case ILLEGAL_ACTION -> {
                    var a = loop.lookup(loop.vertex(n), loop.level(n), loop.progress(n));
                    yield "the policy's action '" + a.map(Object::toString).orElse("?") + "' is not allowed " + where;
                }
                case BELOW_FLOOR -> where + ": the policy says '" + arena.action(loop.choice(n)) + "' and "
                        + outcome(p.edge()) + " leaves " + units(p.level()) + ", below the reserve floor "
                        + units(loop.floor());
                case AVOIDED_ZONE -> where + ": the policy says '" + arena.action(loop.choice(n)) + "' and "
                        + outcome(p.edge()) + " puts the robot at " + arena.cellOf(arena.target(p.edge()))
                        + " in avoided zone " + String.join(", ", avoidedAt(arena.cellOf(arena.target(p.edge()))));
            };
        }

        private List<String> avoidedAt(Cell c) {
            List<String> out = new ArrayList<>();
            for (String z : mission.map().zonesAt(c)) {
                if (mission.tasks().avoid().contains(z)) {
                    out.add("'" + z + "'");
                }
            }
            return out;
        }

        String cycle(List<Integer> cycle) {
            StringBuilder sb = cycleStart(cycle);
            for (int i = 0; i + 1 < cycle.size(); i++) {
                int a = cycle.get(i);
                int b = cycle.get(i + 1);
                sb.append(i == 0 ? "" : " ").append(loop.cell(a)).append(" (").append(loop.level(a)).append(") -")
                        .append(arena.action(loop.choice(a))).append("->");
                if (i + 2 == cycle.size()) {
                    sb.append(" ").append(loop.cell(b)).append(" (").append(loop.level(b)).append(")");
                }
            }
            sb.append(" and the same situation again");
            return sb.toString();
        }
    }
}
