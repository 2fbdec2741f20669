package dockline.solve.charging;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.ModelMoves;
import dockline.fixtures.TaskBook;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.solve.RandomMissions;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The threshold policy replayed against every disturbance sequence (exhaustive enumeration of the closed
 * loop) on random tiny missions. Oracle: the game's moves read straight from the map and mission records
 * ({@link ModelMoves}, maps/README.md "Game semantics"), with this test's own task bookkeeping and battery
 * arithmetic (min(capacity, level + delta), lost below the floor); the arena is used only to turn a cell
 * and budget into the policy's look-up key. Every play must stay at or above the floor, never enter an
 * avoided zone and end in completion: the closed loop must have no cycle (a cycle is a play that never
 * completes) and every leaf must be a completion.
 */
class ThresholdPolicyReplayProperties {

    @Property(tries = 2000)
    void everyPlayStaysAboveFloorAndCompletes(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int cap = m.capacityUnits();
        int floor = Math.min(m.reserveUnits(), cap);
        ChargingRoute.Analysis a = ChargingRoute.analyse(new ChargingSolver(arena, goal), cap, floor, m.startUnits());
        boolean charging = m.scale().gain(m.robot().chargeWh()) > 0;
        Statistics.label("replayed").collect(a.guaranteed() ? (charging ? "charging" : "no charging") : "not guaranteed");
        Statistics.label("replayed").coverage(c -> c.check("charging").percentage(p -> p > 10));
        if (!a.guaranteed()) {
            return;
        }
        Closed loop = new Closed(m, arena, goal, a.values(), floor, cap);
        Cell s = m.start();
        int mask = loop.step(0, s);
        assertThat(mask).isNotNegative();
        loop.visit(s, arena.budget(), mask, m.startUnits());
        Statistics.label("charged in a play").collect(loop.charges > 0);
        Statistics.label("charged in a play").coverage(c -> c.check(true).count(n -> n >= 10));
    }

    /**
     * Any gauge reading: from every position a play can meet (its goal state already counts its own cell) and
     * every level from its need up to the capacity, the threshold policy at the mission's floor wins (same
     * exhaustive walk), both the one pass's ({@link FloorSweep}) and the rounds' at that floor
     * ({@link ChargingSolver#solve}); one unit below the rounds' need the brute-force sweep says the robot cannot
     * win. The pass may stop before it has added every dock good at the floor (once the start's need is 0), so
     * its needs elsewhere may be higher (never lower) than the rounds'; at the start they are equal.
     */
    @Property(tries = 600)
    void fromEveryPositionAndEveryLevelAtOrAboveItsNeed(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int cap = m.capacityUnits();
        int floor = Math.min(m.reserveUnits(), cap);
        ChargingSolver solver = new ChargingSolver(arena, goal);
        ChargingRoute.Analysis a = ChargingRoute.analyse(solver, cap, floor, m.startUnits());
        ChargingSolver.Values pass = a.values();
        ChargingSolver.Values rounds = solver.solve(cap - floor);
        if (solver.startGoal() != GoalAutomaton.REJECT) {
            assertThat(pass.startNeed()).isEqualTo(rounds.startNeed());
        }
        dockline.fixtures.BruteForce bf = new dockline.fixtures.BruteForce(m, floor);
        int masks = 1 << goal.taskCount();
        int started = 0;
        for (int r = 0; r < arena.robotCount(); r++) {
            Cell c = arena.cellOf(r);
            for (int mask = 0; mask < masks; mask++) {
                int g = goal.stateOfMask(mask);
                if (g == GoalAutomaton.REJECT || bf.book().step(mask, c) != mask
                        || goal.accepting(g, arena.isDock(arena.cell(r)))) {
                    continue;
                }
                int need = rounds.need(r, g);
                assertThat(pass.need(r, g)).isGreaterThanOrEqualTo(need);
                if (need == ChargingSolver.INFINITE) {
                    continue;
                }
                for (ChargingSolver.Values v : new ChargingSolver.Values[] {rounds, pass}) {
                    if (v.need(r, g) == ChargingSolver.INFINITE) {
                        continue;
                    }
                    for (int level = floor + v.need(r, g); level <= cap; level++) {
                        Closed loop = new Closed(m, arena, goal, v, floor, cap);
                        loop.visit(c, arena.budgetLeft(r), mask, level);
                        started++;
                    }
                }
                if (floor + need - 1 >= floor) {
                    assertThat(bf.wins(c, arena.budgetLeft(r), mask, floor + need - 1)).as("below the need at %s\n%s", c,
                            RandomMissions.describe(m)).isFalse();
                }
            }
        }
        Statistics.label("replays started").collect(started == 0 ? "none" : started < 10 ? "1-9" : "10 or more");
        Statistics.label("replays started").coverage(x -> x.check("10 or more").percentage(p -> p > 20));
    }

    /** Depth-first walk of the closed loop (cell, budget, task mask, level), with cycle detection. */
    private static final class Closed {
        private final Mission m;
        private final Arena arena;
        private final GoalAutomaton goal;
        private final ChargingSolver.Values values;
        private final ModelMoves moves;
        private final int floor;
        private final int cap;
        private final List<String> visit;
        private final TaskBook book;
        private final Map<Long, Boolean> state = new HashMap<>(); // false: on the stack, true: finished
        int charges;

        Closed(Mission m, Arena arena, GoalAutomaton goal, ChargingSolver.Values values, int floor, int cap) {
            this.m = m;
            this.arena = arena;
            this.goal = goal;
            this.values = values;
            this.moves = new ModelMoves(m);
            this.floor = floor;
            this.cap = cap;
            this.visit = m.tasks().visit();
            this.book = new TaskBook(m);
        }

        /** Task progress by the model's own bookkeeping ({@link TaskBook}): mask after occupying c, -1 for an avoided zone. */
        int step(int mask, Cell c) {
            return book.step(mask, c);
        }

        void visit(Cell c, int k, int mask, int level) {
            String where = String.format("at %s budget %d mask %d level %d%n%s", c, k, mask, level,
                    RandomMissions.describe(m));
            assertThat(level).as("below the floor " + where).isGreaterThanOrEqualTo(floor);
            assertThat(mask).as("avoided zone " + where).isNotNegative();
            boolean done = mask == (1 << visit.size()) - 1
                    && (!m.tasks().finishOnDock() || m.map().terrainAt(c).dock());
            if (done) {
                return;
            }
            long key = (((long) c.index(m.map().width()) * 8 + k) * 256 + mask) * 4096 + level;
            Boolean seen = state.get(key);
            assertThat(seen).as("a play that never completes (cycle) " + where).isNotEqualTo(Boolean.FALSE);
            if (seen != null) {
                return;
            }
            state.put(key, false);
            int v = arena.robotVertex(c.index(m.map().width()), k);
            int g = goal.stateOfMask(mask);
            int edge = values.action(v, g, level - floor);
            assertThat(edge).as("no action " + where).isNotNegative();
            Action act = arena.action(arena.target(edge));
            List<Cell> nbrs = moves.neighbours(c);
            int index = act.kind() == ActionKind.MOVE ? nbrs.indexOf(act.target())
                    : act.kind() == ActionKind.WAIT ? nbrs.size() : nbrs.size() + 1;
            List<List<ModelMoves.Outcome>> options = moves.actions(c, k);
            assertThat(index).as("policy action %s unknown to the model %s", act, where).isBetween(0, options.size() - 1);
            if (act.kind() == ActionKind.CHARGE) {
                charges++;
            }
            for (ModelMoves.Outcome o : options.get(index)) {
                visit(o.to(), o.budgetLeft(), step(mask, o.to()), Math.min(cap, level + o.delta()));
            }
            state.put(key, true);
        }
    }
}
