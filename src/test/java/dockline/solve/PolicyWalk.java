package dockline.solve;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.fixtures.TaskBook;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Runs an exported {@link Policy} against every disturbance choice, by depth-first search over
 * situations (cell, level, budget left, tasks done), with the battery redone here and the task progress
 * by {@link TaskBook}, both from maps/README.md, "Game semantics" (independent of the product game).
 * Fails on a situation the policy does not cover, a level below the floor, an avoided zone, or a cycle
 * (a play that never completes).
 * Reports the lowest level over all plays and the situations met.
 */
public final class PolicyWalk {

    public record Result(int lowestLevel, Set<String> situations) {
    }

    private final Mission mission;
    private final Arena arena;
    private final Policy policy;
    private final int floor;
    private final int cap;
    private final TaskBook tasks;
    private final Map<String, Integer> done = new HashMap<>();
    private final Set<String> onPath = new HashSet<>();

    public PolicyWalk(Mission mission, Arena arena, Policy policy) {
        this.mission = mission;
        this.arena = arena;
        this.policy = policy;
        this.floor = mission.reserveUnits();
        this.cap = mission.capacityUnits();
        this.tasks = new TaskBook(mission);
    }

    public Result run() {
        Cell s = mission.start();
        int p = tasks.startMask();
        int level = mission.startUnits();
        if (p < 0 || level < floor) {
            throw new AssertionError("start is already lost");
        }
        int low = tasks.complete(p, s) ? level : visit(s, level, mission.map().disturbances().budget(), p);
        return new Result(low, done.keySet());
    }

    private int visit(Cell c, int level, int k, int prog) {
        String key = c + "/" + level + "/" + k + "/" + prog;
        Integer memo = done.get(key);
        if (memo != null) {
            return memo;
        }
        if (!onPath.add(key)) {
            throw new AssertionError("the policy can cycle through " + key + " without completing the mission");
        }
        Optional<Action> act = policy.lookup(c, level, k, prog);
        if (act.isEmpty()) {
            throw new AssertionError("the policy has no action for " + key);
        }
        int rv = arena.robotVertex(c.index(arena.width()), k);
        int d = -1;
        for (int e = arena.outBegin(rv); e < arena.outEnd(rv); e++) {
            if (arena.action(arena.target(e)).equals(act.get())) {
                d = arena.target(e);
            }
        }
        if (d < 0) {
            throw new AssertionError("the policy's action " + act.get() + " is not available at " + key);
        }
        int low = level;
        for (int o = arena.outBegin(d); o < arena.outEnd(d); o++) {
            int to = arena.target(o);
            int l2 = Math.min(cap, level + arena.weight(o));
            if (l2 < floor) {
                throw new AssertionError("level " + l2 + " below the floor after " + act.get() + " at " + key);
            }
            Cell c2 = arena.cellOf(to);
            int p2 = tasks.step(prog, c2);
            if (p2 < 0) {
                throw new AssertionError("avoided zone entered from " + key);
            }
            low = Math.min(low, tasks.complete(p2, c2) ? l2 : visit(c2, l2, arena.budgetLeft(to), p2));
        }
        onPath.remove(key);
        done.put(key, low);
        return low;
    }

    /** The situation key of a policy entry, as {@link #visit} writes it. */
    public static String key(PolicyEntry e) {
        return e.cell() + "/" + e.level() + "/" + e.budgetLeft() + "/" + e.progress();
    }
}
