package dockline.arena;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Terrain;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Hand-worked arenas: every expected count and weight below was worked out by hand from the
 * reference semantics in maps/README.md, "Game semantics" (no outside source; the semantics are ours).
 */
class ArenaCompilerTest {

    private static final Map<Character, Terrain> LEGEND = Map.of(
            '#', Terrain.wall('#'),
            '.', new Terrain('.', "tile", false, false),
            ',', new Terrain(',', "carpet", false, false),
            'D', new Terrain('D', "tile", false, true),
            'C', new Terrain('C', "tile", true, false));

    static Mission mission(List<String> rows, DisturbanceModel dm, Neighbourhood nb, Cell start) {
        BuildingMap map = new BuildingMap("test", null, BigDecimal.ONE, rows, LEGEND,
                List.of(new Zone("room", List.of(new Cell(1, 1)))), Map.of(), dm);
        RobotProfile robot = new RobotProfile(new BigDecimal("10"), new BigDecimal("0.5"),
                Map.of("tile", new BigDecimal("1"), "carpet", new BigDecimal("1.2")),
                new BigDecimal("0.2"), new BigDecimal("1.5"), nb);
        return new Mission("m", null, map, robot, start, Charge.wh(BigDecimal.TEN), Charge.wh(BigDecimal.ONE),
                Tasks.justDock(), new Objective.Reserve());
    }

    @Test
    void corridor_withoutDisturbances_hasOneOutcomePerAction() {
        // .,C  : three free cells in a row, budget 0
        Arena a = ArenaCompiler.compile(mission(List.of(".,C"), DisturbanceModel.none(), Neighbourhood.FOUR, new Cell(0, 0)));
        assertThat(a.robotCount()).isEqualTo(3);
        // actions: cell0: E, wait; cell1: E, W, wait; cell2: W, wait, charge  -> 8 disturbance vertices
        assertThat(a.vertexCount()).isEqualTo(3 + 8);
        assertThat(a.edgeCount()).isEqualTo(8 + 8);
        int r0 = a.robotVertex(0, 0);
        int moveEast = a.target(a.outBegin(r0));
        assertThat(a.action(moveEast)).isEqualTo(new Action(ActionKind.MOVE, new Cell(1, 0)));
        // entering carpet: 1.2 Wh at 0.5 Wh per unit = 2.4 -> 3 units, rounded up
        assertThat(a.weight(a.outBegin(moveEast))).isEqualTo(-3);
        int r2 = a.robotVertex(2, 0);
        int charge = a.target(a.outEnd(r2) - 1);
        assertThat(a.actionKind(charge)).isEqualTo(ActionKind.CHARGE);
        // charging 1.5 Wh per step = 3 units, rounded down (exact here)
        assertThat(a.weight(a.outBegin(charge))).isEqualTo(3);
        int wait = a.target(a.outBegin(r2) + 1);
        // waiting 0.2 Wh = 0.4 units -> 1 unit, rounded up
        assertThat(a.weight(a.outBegin(wait))).isEqualTo(-1);
    }

    /** The layout facts the solvers rely on hold for compiled arenas, and fail where they should. */
    @Test
    void layoutFacts_compiledArena_andShuffledOne() {
        EventRule door = new EventRule(EventKind.DOOR_SHUT, "door D1", List.of(new Cell(1, 0)), BigDecimal.ZERO);
        Arena a = ArenaCompiler.compile(mission(List.of(".DC"), new DisturbanceModel(1, List.of(door)),
                Neighbourhood.FOUR, new Cell(0, 0)));
        assertThat(a.privateActions()).isTrue();
        assertThat(a.actionsByEdge()).isTrue();
        // the largest out-degree, counted here independently
        int most = 0;
        for (int v = 0; v < a.vertexCount(); v++) {
            most = Math.max(most, a.outEnd(v) - a.outBegin(v));
        }
        assertThat(a.maxOutDegree()).isEqualTo(most).isPositive();
        // a fixed seed whose permutation is not the identity
        Arena shuffled = RandomGameArenas.arenaWithShuffledActions(new java.util.Random(3), 6, 2);
        assertThat(shuffled.privateActions()).isTrue();
        assertThat(shuffled.actionsByEdge()).isFalse();
    }

    @Test
    void doorShut_and_drag_spendBudgetAndStayOrPayExtra() {
        EventRule door = new EventRule(EventKind.DOOR_SHUT, "door D1", List.of(new Cell(1, 0)), BigDecimal.ZERO);
        EventRule drag = new EventRule(EventKind.DRAG, "rug", List.of(new Cell(1, 0)), new BigDecimal("0.7"));
        Arena a = ArenaCompiler.compile(mission(List.of(".DC"), new DisturbanceModel(1, List.of(door, drag)),
                Neighbourhood.FOUR, new Cell(0, 0)));
        int r = a.robotVertex(0, 1);
        assertThat(a.budgetLeft(r)).isEqualTo(1);
        int move = a.target(a.outBegin(r));
        List<String> outcomes = new ArrayList<>();
        for (int e = a.outBegin(move); e < a.outEnd(move); e++) {
            outcomes.add(a.cellOf(a.target(e)) + "/" + a.budgetLeft(a.target(e)) + "/" + a.weight(e) + "/" + a.event(e));
        }
        // nominal: arrive 1:0, pay 2 units; shut: stay 0:0, pay idle 1; drag: arrive, pay 2 + ceil(0.7/0.5)=2 -> 4
        assertThat(outcomes).containsExactly(
                "1:0/1/-2/-1",
                "0:0/0/-1/" + EventKind.DOOR_SHUT.ordinal(),
                "1:0/0/-4/" + EventKind.DRAG.ordinal());
        // with no budget left, only the nominal outcome remains
        int r0 = a.robotVertex(0, 0);
        int move0 = a.target(a.outBegin(r0));
        assertThat(a.outEnd(move0) - a.outBegin(move0)).isEqualTo(1);
    }

    @Test
    void slip_landsBesideTheTarget_neverBackOnTheSource() {
        // 3x3 open room, slip everywhere
        EventRule slip = new EventRule(EventKind.SLIP, "wet", List.of(new Cell(1, 1)), BigDecimal.ZERO);
        Arena a = ArenaCompiler.compile(mission(List.of("...", "...", "..C"), new DisturbanceModel(1, List.of(slip)),
                Neighbourhood.FOUR, new Cell(1, 0)));
        int r = a.robotVertex(new Cell(1, 0).index(3), 1);
        // first action from 1:0 in N,E,S,W order: E (1:0 has no north), then S, W
        int moveSouth = -1;
        for (int e = a.outBegin(r); e < a.outEnd(r); e++) {
            int d = a.target(e);
            if (a.action(d).equals(new Action(ActionKind.MOVE, new Cell(1, 1)))) {
                moveSouth = d;
            }
        }
        List<Cell> slipTargets = new ArrayList<>();
        for (int e = a.outBegin(moveSouth); e < a.outEnd(moveSouth); e++) {
            if (a.event(e) == EventKind.SLIP.ordinal()) {
                slipTargets.add(a.cellOf(a.target(e)));
            }
        }
        // neighbours of 1:1 in N,E,S,W order, minus the source 1:0
        assertThat(slipTargets).containsExactly(new Cell(2, 1), new Cell(1, 2), new Cell(0, 1));
    }

    @Test
    void diagonal_mayNotCutAWallCorner_andCostsRootTwo() {
        Arena a = ArenaCompiler.compile(mission(List.of("..", "#C"), DisturbanceModel.none(), Neighbourhood.EIGHT,
                new Cell(0, 0)));
        int r = a.robotVertex(0, 0);
        List<Action> actions = new ArrayList<>();
        for (int e = a.outBegin(r); e < a.outEnd(r); e++) {
            actions.add(a.action(a.target(e)));
        }
        // 0:0 -> 1:1 would cut the wall corner at 0:1: not allowed
        assertThat(actions).containsExactly(new Action(ActionKind.MOVE, new Cell(1, 0)), new Action(ActionKind.WAIT, new Cell(0, 0)));
        Arena open = ArenaCompiler.compile(mission(List.of("..", ".C"), DisturbanceModel.none(), Neighbourhood.EIGHT,
                new Cell(0, 0)));
        int r0 = open.robotVertex(0, 0);
        for (int e = open.outBegin(r0); e < open.outEnd(r0); e++) {
            int d = open.target(e);
            if (open.action(d).target().equals(new Cell(1, 1))) {
                // 1 Wh = 2 units straight; diagonal 2*sqrt2 = 2.83 -> 3 units
                assertThat(open.weight(open.outBegin(d))).isEqualTo(-3);
            }
        }
    }

    @Test
    void sameInput_sameArena() {
        Mission m = mission(List.of("...", ".#.", "..C"), new DisturbanceModel(2, List.of(
                new EventRule(EventKind.BLOCKAGE, "hall", List.of(new Cell(2, 1)), BigDecimal.ZERO))),
                Neighbourhood.EIGHT, new Cell(0, 0));
        Arena a = ArenaCompiler.compile(m);
        Arena b = ArenaCompiler.compile(m);
        assertThat(a.vertexCount()).isEqualTo(b.vertexCount());
        for (int e = 0; e < a.edgeCount(); e++) {
            assertThat(a.target(e)).isEqualTo(b.target(e));
            assertThat(a.weight(e)).isEqualTo(b.weight(e));
        }
        // reverse CSR lists every edge exactly once, under its target
        int seen = 0;
        for (int v = 0; v < a.vertexCount(); v++) {
            for (int i = a.inBegin(v); i < a.inEnd(v); i++) {
                assertThat(a.target(a.inEdge(i))).isEqualTo(v);
                seen++;
            }
        }
        assertThat(seen).isEqualTo(a.edgeCount());
    }
}
