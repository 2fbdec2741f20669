package dockline.solve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.game.GameGraph;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;

/**
 * Invariant checks run after every solver test (the "validation listener" habit): whatever the
 * instance, a solution must satisfy the defining properties of an attractor and its strategy
 * (Grädel, Thomas, Wilke (eds., 2002), LNCS 2500, ch. 2).
 */
public final class SolutionChecks {

    private SolutionChecks() {
    }

    /**
     * The winning region is exactly the attractor: targets have rank 0; a winning robot vertex's
     * chosen edge leaves it and enters a vertex of strictly smaller rank; every successor of a
     * winning disturbance vertex is winning with smaller rank; a losing robot vertex has only losing
     * successors, a losing disturbance vertex has a losing one (so nothing more could be won).
     */
    public static void assertValidSolution(GameGraph g, Solution s) {
        check(s.vertexCount() == g.vertexCount(), "solution covers %d vertices, graph has %d", s.vertexCount(),
                g.vertexCount());
        for (int v = 0; v < g.vertexCount(); v++) {
            if (g.isTarget(v)) {
                check(s.rank(v) == 0, "target %d has rank %d", v, s.rank(v));
                continue;
            }
            if (s.winning(v)) {
                check(s.rank(v) > 0, "winning vertex %d has rank %d", v, s.rank(v));
                if (g.isRobot(v)) {
                    int e = s.strategyEdge(v);
                    check(e >= g.outBegin(v) && e < g.outEnd(v), "chosen edge %d does not leave %d", e, v);
                    int t = g.target(e);
                    check(s.winning(t), "strategy of %d leaves the winning region", v);
                    check(s.rank(t) < s.rank(v), "strategy of %d does not decrease the rank", v);
                } else {
                    for (int e = g.outBegin(v); e < g.outEnd(v); e++) {
                        int t = g.target(e);
                        check(s.winning(t), "winning region not closed under disturbance moves at %d", v);
                        check(s.rank(t) < s.rank(v), "disturbance successor of %d has no smaller rank", v);
                    }
                }
            } else {
                boolean someLosing = false;
                boolean allLosing = true;
                for (int e = g.outBegin(v); e < g.outEnd(v); e++) {
                    boolean l = !s.winning(g.target(e));
                    someLosing |= l;
                    allLosing &= l;
                }
                if (g.isRobot(v)) {
                    check(allLosing, "losing robot vertex %d has a winning successor", v);
                } else {
                    check(someLosing, "losing disturbance vertex %d has only winning successors", v);
                }
            }
        }
    }

    private static void check(boolean ok, String what, Object... args) {
        if (!ok) {
            fail(String.format(what, args));
        }
    }

    /**
     * {@link #assertValidSolution} plus, on the closed loop of the strategy from the start, the
     * battery redone by hand from the arena weights (level' = min(capacity, level + w)): it never
     * drops below the floor, every product edge lands on the level so computed, the loop never
     * enters LOSE, and every entry into WIN completes the mission on a dock.
     */
    public static void assertValidSolution(ProductGame game, Solution s, ReserveMonitor monitor) {
        GameGraph g = game.graph();
        assertValidSolution(g, s);
        assertThat(s.winning(ProductGame.LOSE)).isFalse();
        int start = game.start();
        if (!s.winning(start)) {
            return;
        }
        Arena arena = game.arena();
        Mission mission = arena.mission();
        GoalAutomaton goal = game.goal();
        int floor = monitor.floorUnits();
        int cap = monitor.capacityUnits();
        boolean[] seen = new boolean[g.vertexCount()];
        int[] stack = new int[g.vertexCount()];
        int top = 0;
        stack[top++] = start;
        seen[start] = true;
        while (top > 0) {
            int p = stack[--top];
            if (p == ProductGame.WIN) {
                continue;
            }
            if (p == ProductGame.LOSE) {
                fail("closed loop of the strategy enters LOSE");
            }
            int level = monitor.level(game.monitorState(p));
            assertThat(level).as("level at %s", game.describe(p)).isBetween(floor, cap);
            if (g.isRobot(p)) {
                int t = g.target(s.strategyEdge(p));
                assertThat(game.monitorState(t)).isEqualTo(game.monitorState(p));
                top = pushed(stack, seen, t, top);
                continue;
            }
            for (int e = g.outBegin(p); e < g.outEnd(p); e++) {
                int t = g.target(e);
                int ae = game.arenaEdge(p, e);
                int expected = Math.min(cap, level + arena.weight(ae));
                assertThat(expected).as("battery after an outcome at %s", game.describe(p)).isGreaterThanOrEqualTo(floor);
                if (t == ProductGame.WIN) {
                    Cell c = arena.cellOf(arena.target(ae));
                    int done = goal.progressMask(goal.step(game.goalState(p), arena.cellZones(c.index(arena.width()))));
                    assertThat(done).as("mission complete on entering WIN").isEqualTo((1 << goal.taskCount()) - 1);
                    if (mission.tasks().finishOnDock()) {
                        assertThat(mission.map().terrainAt(c).dock()).as("WIN entered on a dock").isTrue();
                    }
                } else if (t != ProductGame.LOSE) {
                    assertThat(monitor.level(game.monitorState(t))).as("level after outcome").isEqualTo(expected);
                    assertThat(game.arenaVertex(t)).isEqualTo(arena.target(ae));
                }
                top = pushed(stack, seen, t, top);
            }
        }
    }

    private static int pushed(int[] stack, boolean[] seen, int t, int top) {
        if (!seen[t]) {
            seen[t] = true;
            stack[top++] = t;
        }
        return top;
    }
}
