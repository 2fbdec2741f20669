package dockline.view;

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

/** Small invented floors for view tests (demo data only, no real building). */
final class TestMissions {

    private TestMissions() {
    }

    /** A two-room floor with a corridor, a door, a carpet room, a dock and a wet patch. */
    static Mission twoRooms() {
        List<EventRule> rules = List.of(
                new EventRule(EventKind.DOOR_SHUT, "door D1", List.of(new Cell(5, 3)), BigDecimal.ZERO),
                new EventRule(EventKind.DRAG, "thick rug", cells(8, 2, 9, 3), new BigDecimal("0.5")));
        return readingRoomVisit("test floor", "#....#cccccc##", Map.of(new Cell(5, 3), "D1"), rules,
                "read-room visit");
    }

    /**
     * The two-room floor with two doors between the rooms, D1 and D2, each of which may shut for the
     * rest of the mission (one event at most): a shut door leaves the other way open.
     */
    static Mission twoDoorsLasting() {
        List<EventRule> rules = List.of(
                new EventRule(EventKind.DOOR_SHUT, "fire doors", List.of(new Cell(5, 2), new Cell(5, 3)), BigDecimal.ZERO)
                        .withDuration(dockline.model.EventDuration.REST_OF_MISSION));
        return readingRoomVisit("two-door floor", "#....Dcccccc##", Map.of(new Cell(5, 2), "D2", new Cell(5, 3), "D1"),
                rules, "reading room by either door");
    }

    /**
     * The two-room floor (lobby on tile, reading room on carpet, a door D1 at (5, 3), a dock in each room)
     * whose third row is {@code row2} (a wall or a second door between the rooms), with the given door names
     * and event rules (one event at most), and the mission: from the lobby visit the reading room and finish
     * on a dock, starting at 90 % with a reserve floor of 20 %.
     */
    private static Mission readingRoomVisit(String floor, String row2, Map<Cell, String> doors, List<EventRule> rules,
            String name) {
        List<String> rows = List.of(
                "##############",
                "#....#ccccc=##",
                row2,
                "#....Dcccccc##",
                "#....#cccccc##",
                "#=...#########",
                "##############");
        Map<Character, Terrain> legend = Map.of(
                '#', Terrain.wall('#'),
                '.', new Terrain('.', "tile", false, false),
                'c', new Terrain('c', "carpet", false, false),
                'D', new Terrain('D', "tile", false, true),
                '=', new Terrain('=', "tile", true, false));
        List<Zone> zones = List.of(
                new Zone("lobby", cells(1, 1, 4, 5)),
                new Zone("reading-room", cells(6, 1, 11, 4)));
        BuildingMap map = new BuildingMap(floor, null, new BigDecimal("0.5"), rows, legend, zones, doors,
                new DisturbanceModel(1, rules));
        RobotProfile robot = new RobotProfile(new BigDecimal("40"), new BigDecimal("0.1"),
                Map.of("tile", new BigDecimal("0.4"), "carpet", new BigDecimal("0.7")), new BigDecimal("0.1"),
                new BigDecimal("2"), Neighbourhood.FOUR);
        return new Mission(name, null, map, robot, new Cell(2, 2), Charge.percent(new BigDecimal("90")),
                Charge.percent(new BigDecimal("20")), new Tasks(List.of("reading-room"), true, List.of(), true),
                new Objective.Reserve());
    }

    static List<Cell> cells(int x0, int y0, int x1, int y1) {
        List<Cell> out = new ArrayList<>();
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                out.add(new Cell(x, y));
            }
        }
        return out;
    }
}
