package dockline.bench;

import static dockline.fixtures.RandomMissions.pick;

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
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Random small missions for property tests (invented data): a plan of at most 6 × 6 cells with
 * walls, tile and carpet, docks and doors, one to three zones, every kind of event rule, a budget
 * of 0 to 2, and a battery of a few dozen units.
 */
public final class TinyMissions {

    private TinyMissions() {
    }

    /** A random mission; {@code charging} decides whether docks charge. */
    public static Mission random(long seed, boolean charging) {
        Random rnd = new Random(seed);
        int w = 2 + rnd.nextInt(5);
        int h = 2 + rnd.nextInt(5);
        Map<Character, Terrain> legend = Map.of(
                '#', Terrain.wall('#'),
                '.', new Terrain('.', "tile", false, false),
                '~', new Terrain('~', "carpet", false, false),
                'k', new Terrain('k', "tile", true, false),
                'd', new Terrain('d', "tile", false, true));
        char[][] g = new char[h][w];
        List<Cell> free = new ArrayList<>();
        List<Cell> doors = new ArrayList<>();
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int r = rnd.nextInt(20);
                g[y][x] = r < 3 ? '#' : r < 6 ? '~' : r < 8 ? 'k' : r < 10 ? 'd' : '.';
                if (g[y][x] != '#') {
                    free.add(new Cell(x, y));
                }
                if (g[y][x] == 'd') {
                    doors.add(new Cell(x, y));
                }
            }
        }
        if (free.isEmpty()) {
            g[0][0] = 'k';
            free.add(new Cell(0, 0));
        }
        List<String> rows = new ArrayList<>();
        for (char[] row : g) {
            rows.add(new String(row));
        }
        int zoneCount = 1 + rnd.nextInt(3);
        List<Zone> zones = new ArrayList<>();
        for (int i = 0; i < zoneCount; i++) {
            zones.add(new Zone("z" + i, pick(rnd, free, 1 + rnd.nextInt(3))));
        }
        List<EventRule> rules = new ArrayList<>();
        if (!doors.isEmpty() && rnd.nextBoolean()) {
            rules.add(new EventRule(EventKind.DOOR_SHUT, "doors", pick(rnd, doors, 1 + rnd.nextInt(doors.size())), BigDecimal.ZERO));
        }
        if (rnd.nextBoolean()) {
            rules.add(new EventRule(EventKind.BLOCKAGE, "block", pick(rnd, free, 1 + rnd.nextInt(3)), BigDecimal.ZERO));
        }
        if (rnd.nextBoolean()) {
            rules.add(new EventRule(EventKind.SLIP, "slip", pick(rnd, free, 1 + rnd.nextInt(3)), BigDecimal.ZERO));
        }
        if (rnd.nextBoolean()) {
            rules.add(new EventRule(EventKind.DRAG, "drag", pick(rnd, free, 1 + rnd.nextInt(3)),
                    BigDecimal.valueOf(rnd.nextInt(4), 1)));
        }
        int budget = rnd.nextInt(3);
        BuildingMap map = new BuildingMap("tiny " + seed, null, BigDecimal.ONE, rows, legend, zones, new HashMap<>(),
                new DisturbanceModel(budget, rules));
        Map<String, BigDecimal> move = Map.of("tile", BigDecimal.valueOf(1 + rnd.nextInt(3), 1),
                "carpet", BigDecimal.valueOf(1 + rnd.nextInt(5), 1));
        BigDecimal wait = BigDecimal.valueOf(rnd.nextInt(3), 1); // zero idle energy included on purpose
        BigDecimal charge = charging ? BigDecimal.valueOf(1 + rnd.nextInt(4), 1) : BigDecimal.ZERO;
        BigDecimal cap = BigDecimal.valueOf(10 + rnd.nextInt(31), 1);
        RobotProfile robot = new RobotProfile(cap, new BigDecimal("0.1"), move, wait, charge,
                rnd.nextInt(4) == 0 ? Neighbourhood.EIGHT : Neighbourhood.FOUR);
        List<String> visit = new ArrayList<>();
        List<String> avoid = new ArrayList<>();
        for (Zone z : zones) {
            int r = rnd.nextInt(4);
            if (r < 2) {
                visit.add(z.name());
            } else if (r == 2) {
                avoid.add(z.name());
            }
        }
        Tasks tasks = new Tasks(visit, rnd.nextBoolean(), avoid, rnd.nextInt(5) != 0);
        Cell start = free.get(rnd.nextInt(free.size()));
        Charge startCharge = Charge.percent(BigDecimal.valueOf(40 + rnd.nextInt(61)));
        Charge reserve = Charge.percent(BigDecimal.valueOf(rnd.nextInt(40)));
        return new Mission("tiny mission " + seed, null, map, robot, start, startCharge, reserve, tasks,
                new Objective.Reserve());
    }

    /**
     * A 1 × 4 strip {@code k...}: dock on the left, tile at 0.1 Wh a cell (1 unit), no disturbances,
     * zone {@code far} on the right-most cell; visit it and come back to the dock. Start 1 Wh, floor 0.
     */
    public static Mission strip() {
        Map<Character, Terrain> legend = Map.of('k', new Terrain('k', "tile", true, false),
                '.', new Terrain('.', "tile", false, false));
        BuildingMap map = new BuildingMap("strip", null, BigDecimal.ONE, List.of("k..."), legend,
                List.of(new Zone("far", List.of(new Cell(3, 0)))), Map.of(), DisturbanceModel.none());
        RobotProfile robot = new RobotProfile(BigDecimal.ONE, new BigDecimal("0.1"), Map.of("tile", new BigDecimal("0.1")),
                new BigDecimal("0.1"), BigDecimal.ZERO, Neighbourhood.FOUR);
        return new Mission("strip", null, map, robot, new Cell(0, 0), Charge.wh(BigDecimal.ONE),
                Charge.wh(BigDecimal.ZERO), new Tasks(List.of("far"), true, List.of(), true), new Objective.Reserve());
    }

}
