package dockline.solve.fast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Terrain;
import dockline.model.Zone;
import dockline.solve.ProductTooLargeException;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The fast path refuses an arena × goal that does not fit the memory budget before it allocates, with
 * its real size and the budget that applied, instead of failing on an int overflow (an internal
 * error) as it did with 16 tasks in any order on a 300 x 300 floor. Invented data.
 */
class FastPathLimitsTest {

    /** An open floor, a dock in the corner, 16 one-cell zones to visit in any order (2^16 goal states). */
    private static Mission sixteenAnyOrder(int side) {
        List<String> rows = new ArrayList<>();
        for (int y = 0; y < side; y++) {
            StringBuilder r = new StringBuilder();
            for (int x = 0; x < side; x++) {
                r.append(x == 0 || y == 0 || x == side - 1 || y == side - 1 ? '#' : x == 1 && y == 1 ? 'D' : '.');
            }
            rows.add(r.toString());
        }
        List<Zone> zones = new ArrayList<>();
        List<String> visit = new ArrayList<>();
        for (int i = 0; i < 16; i++) {
            zones.add(new Zone("z" + i, List.of(new Cell(2 + i % 4 * 3, 2 + i / 4 * 3))));
            visit.add("z" + i);
        }
        Map<Character, Terrain> legend = Map.of('#', Terrain.wall('#'), '.', new Terrain('.', "tile", false, false),
                'D', new Terrain('D', "tile", true, false));
        BuildingMap map = new BuildingMap("open floor", null, BigDecimal.ONE, rows, legend, zones, Map.of(),
                new DisturbanceModel(0, List.of()));
        RobotProfile robot = new RobotProfile(BigDecimal.valueOf(100), BigDecimal.ONE, Map.of("tile", BigDecimal.ONE),
                BigDecimal.ONE, BigDecimal.ZERO, Neighbourhood.FOUR);
        return new Mission("sixteen", null, map, robot, new Cell(1, 1), Charge.wh(BigDecimal.valueOf(100)),
                Charge.wh(BigDecimal.ZERO), new Tasks(visit, false, List.of(), true), new Objective.Reserve());
    }

    @Test
    void arenaTimesGoalOverTheBudget_isRefusedWithItsSize() {
        Mission m = sixteenAnyOrder(20);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        long pairs = (long) arena.vertexCount() * 65536;
        ProductTooLargeException e = catchThrowableOfType(ProductTooLargeException.class,
                () -> FastPath.analyse(m, arena, goal, FastPath.DEFAULT_MAX_POLICY_ROWS, false, 50L << 20));
        assertThat(e).as("refused").isNotNull();
        assertThat(e.getMessage()).contains("over the memory budget of 50 MB", "--max-memory")
                .contains(String.format(java.util.Locale.ROOT, "%.1f million vertices", pairs / 1e6));
        assertThat(e.advice()).contains("fewer tasks in any order").doesNotContain("energy resolution (");
        assertThat(e.budgetBytes()).isEqualTo(50L << 20);
    }

    @Test
    void pastTheIntRange_isRefusedForMemoryNotAsAnOverflow() {
        // 300 x 300: about 534 thousand arena vertices x 2^16 goal states, past 2^31 pairs
        Mission m = sixteenAnyOrder(300);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        assertThat((long) arena.vertexCount() * goal.stateCount()).isGreaterThan(Integer.MAX_VALUE);
        ProductTooLargeException e = catchThrowableOfType(ProductTooLargeException.class,
                () -> FastPath.analyse(m, arena, goal, FastPath.DEFAULT_MAX_POLICY_ROWS, false, 0));
        assertThat(e).as("refused").isNotNull();
        assertThat(e.getMessage()).contains("billion vertices", "half the JVM's maximum heap of "
                + (Runtime.getRuntime().maxMemory() >> 20) + " MB");
    }

    @Test
    void aBudgetAboveTheHeap_isTheHeap() {
        long heap = Runtime.getRuntime().maxMemory();
        assertThat(dockline.solve.ProductOptions.budgetInForce(heap * 4)).isEqualTo(heap);
        Mission m = sixteenAnyOrder(300);
        Arena arena = ArenaCompiler.compile(m);
        ProductTooLargeException e = catchThrowableOfType(ProductTooLargeException.class,
                () -> FastPath.analyse(m, arena, GoalAutomaton.of(m), FastPath.DEFAULT_MAX_POLICY_ROWS, false, heap * 4));
        assertThat(e.getMessage()).contains("the JVM's maximum heap, set by -Xmx, which is below the budget given"
                + " with --max-memory");
    }
}
