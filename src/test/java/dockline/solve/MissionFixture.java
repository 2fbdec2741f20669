package dockline.solve;

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
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Builds missions programmatically for tests (invented data). Legend: {@code #} wall, {@code .}
 * tile, {@code c} carpet, {@code D} dock on tile, {@code d} door on tile.
 */
public final class MissionFixture {

    private final List<String> rows;
    private final Map<String, BigDecimal> moveWh = new HashMap<>(Map.of("tile", BigDecimal.ONE,
            "carpet", BigDecimal.valueOf(2)));
    private BigDecimal capacity = BigDecimal.valueOf(12);
    private BigDecimal resolution = BigDecimal.ONE;
    private BigDecimal waitWh = BigDecimal.ONE;
    private BigDecimal chargeWh = BigDecimal.ZERO;
    private Neighbourhood neighbourhood = Neighbourhood.FOUR;
    private Cell start = new Cell(0, 0);
    private Charge startCharge = Charge.wh(BigDecimal.valueOf(12));
    private Charge reserve = Charge.wh(BigDecimal.ZERO);
    private final Map<String, List<Cell>> zones = new LinkedHashMap<>();
    private final List<String> visit = new ArrayList<>();
    private boolean ordered = true;
    private final List<String> avoid = new ArrayList<>();
    private boolean finishOnDock = true;
    private final List<EventRule> rules = new ArrayList<>();
    private int budget;

    private MissionFixture(String... rows) {
        this.rows = List.of(rows);
    }

    public static MissionFixture grid(String... rows) {
        return new MissionFixture(rows);
    }

    public static Map<Character, Terrain> legend() {
        return Map.of('#', Terrain.wall('#'), '.', new Terrain('.', "tile", false, false),
                'c', new Terrain('c', "carpet", false, false), 'D', new Terrain('D', "tile", true, false),
                'd', new Terrain('d', "tile", false, true));
    }

    MissionFixture surface(String name, long wh) {
        moveWh.put(name, BigDecimal.valueOf(wh));
        return this;
    }

    public MissionFixture capacity(long wh) {
        capacity = BigDecimal.valueOf(wh);
        return this;
    }

    public MissionFixture resolution(String wh) {
        resolution = new BigDecimal(wh);
        return this;
    }

    public MissionFixture waitWh(long wh) {
        waitWh = BigDecimal.valueOf(wh);
        return this;
    }

    public MissionFixture chargeWh(long wh) {
        chargeWh = BigDecimal.valueOf(wh);
        return this;
    }

    MissionFixture eight() {
        neighbourhood = Neighbourhood.EIGHT;
        return this;
    }

    public MissionFixture start(int x, int y) {
        start = new Cell(x, y);
        return this;
    }

    public MissionFixture startWh(long wh) {
        startCharge = Charge.wh(BigDecimal.valueOf(wh));
        return this;
    }

    public MissionFixture reserveWh(long wh) {
        reserve = Charge.wh(BigDecimal.valueOf(wh));
        return this;
    }

    public MissionFixture zone(String name, Cell... cells) {
        zones.put(name, List.of(cells));
        return this;
    }

    public MissionFixture zone(String name, List<Cell> cells) {
        zones.put(name, List.copyOf(cells));
        return this;
    }

    MissionFixture visit(boolean inOrder, String... names) {
        ordered = inOrder;
        visit.addAll(List.of(names));
        return this;
    }

    public MissionFixture avoid(String... names) {
        avoid.addAll(List.of(names));
        return this;
    }

    MissionFixture finishAnywhere() {
        finishOnDock = false;
        return this;
    }

    public MissionFixture event(EventKind kind, long extraWh, Cell... cells) {
        rules.add(new EventRule(kind, kind.word(), List.of(cells), BigDecimal.valueOf(extraWh)));
        return this;
    }

    public MissionFixture event(EventKind kind, long extraWh, List<Cell> cells) {
        rules.add(new EventRule(kind, kind.word(), cells, BigDecimal.valueOf(extraWh)));
        return this;
    }

    public MissionFixture budget(int k) {
        budget = k;
        return this;
    }

    public Mission build() {
        List<Zone> zs = new ArrayList<>();
        zones.forEach((n, cs) -> zs.add(new Zone(n, cs)));
        Map<Cell, String> doorNames = new HashMap<>();
        BuildingMap map = new BuildingMap("test floor", null, BigDecimal.ONE, rows, legend(), zs, doorNames,
                new DisturbanceModel(budget, rules));
        RobotProfile robot = new RobotProfile(capacity, resolution, moveWh, waitWh, chargeWh, neighbourhood);
        return new Mission("test mission", null, map, robot, start, startCharge, reserve,
                new Tasks(visit, ordered, avoid, finishOnDock), new Objective.Reserve());
    }
}
