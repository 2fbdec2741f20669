package dockline.solve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
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
import java.util.Random;

/**
 * Small random missions for property tests (invented data): grids of up to {@code maxW x maxH}
 * cells with walls, two surfaces, docks and doors, random energy figures in whole units, a budget of
 * 0..2 and random disturbance rules.
 */
public final class RandomArenas {

    private static final Map<Character, Terrain> LEGEND = Map.of(
            '#', Terrain.wall('#'),
            '.', new Terrain('.', "tile", false, false),
            ',', new Terrain(',', "carpet", false, false),
            'D', new Terrain('D', "tile", false, true),
            'C', new Terrain('C', "tile", true, false));

    private RandomArenas() {
    }

    public static Mission mission(long seed, int maxW, int maxH) {
        return mission(new Random(seed), maxW, maxH, true);
    }

    public static Mission mission(Random rnd, int maxW, int maxH, boolean withTask) {
        int w = 1 + rnd.nextInt(maxW);
        int h = 1 + rnd.nextInt(maxH);
        char[] kinds = {'.', '.', '.', ',', ',', '#', 'D', 'C'};
        List<String> rows = new ArrayList<>();
        List<Cell> free = new ArrayList<>();
        for (int y = 0; y < h; y++) {
            StringBuilder sb = new StringBuilder();
            for (int x = 0; x < w; x++) {
                char c = kinds[rnd.nextInt(kinds.length)];
                sb.append(c);
                if (c != '#') {
                    free.add(new Cell(x, y));
                }
            }
            rows.add(sb.toString());
        }
        if (free.isEmpty()) {
            rows.set(0, "C" + rows.get(0).substring(1));
            free.add(new Cell(0, 0));
        }
        Cell start = free.get(rnd.nextInt(free.size()));
        List<EventRule> rules = new ArrayList<>();
        for (EventKind k : EventKind.values()) {
            if (rnd.nextInt(3) == 0) {
                List<Cell> cells = new ArrayList<>();
                for (Cell c : free) {
                    if (rnd.nextBoolean()) {
                        cells.add(c);
                    }
                }
                rules.add(new EventRule(k, k.word(), cells, k == EventKind.DRAG ? BigDecimal.valueOf(rnd.nextInt(3)) : null));
            }
        }
        List<Zone> zones = new ArrayList<>();
        List<String> visit = new ArrayList<>();
        if (withTask && rnd.nextBoolean()) {
            zones.add(new Zone("task", List.of(free.get(rnd.nextInt(free.size())))));
            visit.add("task");
        }
        BuildingMap map = new BuildingMap("random", null, BigDecimal.ONE, rows, LEGEND, zones, Map.of(),
                new DisturbanceModel(rnd.nextInt(3), rules));
        RobotProfile robot = new RobotProfile(BigDecimal.valueOf(100), BigDecimal.ONE,
                Map.of("tile", BigDecimal.valueOf(rnd.nextInt(3)), "carpet", BigDecimal.valueOf(1 + rnd.nextInt(3))),
                BigDecimal.valueOf(rnd.nextInt(3)), BigDecimal.valueOf(rnd.nextInt(4)),
                rnd.nextInt(4) == 0 ? Neighbourhood.EIGHT : Neighbourhood.FOUR);
        return new Mission("random", null, map, robot, start, Charge.wh(BigDecimal.valueOf(50)),
                Charge.wh(BigDecimal.ZERO), new Tasks(visit, true, List.of(), true), new Objective.Reserve());
    }

    public static Arena arena(long seed, int maxW, int maxH) {
        return ArenaCompiler.compile(mission(seed, maxW, maxH));
    }
}
