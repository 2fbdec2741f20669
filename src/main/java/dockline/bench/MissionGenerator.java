package dockline.bench;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Makes a mission on a floor from {@link BuildingGenerator}, deterministically from a seed: the
 * robot starts on a dock, visits some {@code room-n} zones (in order or not), possibly avoids the
 * {@code quiet-area}, and finishes on any dock.
 *
 * <p>Robot figures (invented, for benchmarking): tile 0.1 Wh a cell, carpet 0.15 Wh, ramp 0.25 Wh,
 * 0.05 Wh per idle step, 4-neighbourhood; battery, resolution and charging from the {@link MissionSpec}.
 * Cost: O(zones + docks) after the map.
 */
public final class MissionGenerator {

    public static final Map<String, BigDecimal> MOVE_WH = Map.of(
            "tile", new BigDecimal("0.1"),
            "carpet", new BigDecimal("0.15"),
            "ramp", new BigDecimal("0.25"));
    public static final BigDecimal WAIT_WH = new BigDecimal("0.05");

    private MissionGenerator() {
    }

    /**
     * A mission on {@code map} following {@code spec}.
     *
     * @throws IllegalArgumentException if the map has no dock or too few {@code room-n} zones
     */
    public static Mission generate(BuildingMap map, MissionSpec spec, long seed) {
        Random rnd = new Random(seed);
        List<Cell> docks = map.docks();
        if (docks.isEmpty()) {
            throw new IllegalArgumentException("the map has no dock");
        }
        Cell start = docks.get(rnd.nextInt(docks.size()));
        List<Zone> rooms = new ArrayList<>();
        for (Zone z : map.zones()) {
            if (z.name().startsWith("room-")) {
                rooms.add(z);
            }
        }
        if (rooms.size() < spec.tasks()) {
            throw new IllegalArgumentException("the map has " + rooms.size() + " rooms, the mission needs " + spec.tasks());
        }
        List<Zone> pool = new ArrayList<>();
        if (spec.taskRadius() > 0) {
            for (Zone z : rooms) {
                if (distance(centre(z), start) <= spec.taskRadius()) {
                    pool.add(z);
                }
            }
        }
        if (pool.size() < spec.tasks()) {
            pool = new ArrayList<>(rooms);
            if (spec.taskRadius() > 0) {
                pool.sort(Comparator.comparingInt(z -> distance(centre(z), start)));
                pool = new ArrayList<>(pool.subList(0, spec.tasks()));
            }
        }
        List<String> visit = new ArrayList<>();
        for (int i = 0; i < spec.tasks(); i++) {
            visit.add(pool.remove(rnd.nextInt(pool.size())).name());
        }
        List<String> avoid = spec.avoidQuiet() && map.zone("quiet-area").isPresent() ? List.of("quiet-area") : List.of();
        RobotProfile robot = new RobotProfile(spec.capacityWh(), spec.resolutionWh(), MOVE_WH, WAIT_WH, spec.chargeWh(),
                Neighbourhood.FOUR);
        String name = "generated mission on " + map.name() + ", seed " + seed;
        return new Mission(name, null, map.withBudget(spec.budget()), robot, start, spec.startCharge(), spec.reserve(),
                new Tasks(visit, spec.ordered(), avoid, true), spec.objective());
    }

    private static Cell centre(Zone z) {
        long sx = 0;
        long sy = 0;
        for (Cell c : z.cells()) {
            sx += c.x();
            sy += c.y();
        }
        int n = z.cells().size();
        return new Cell((int) (sx / n), (int) (sy / n));
    }

    private static int distance(Cell a, Cell b) {
        return Math.abs(a.x() - b.x()) + Math.abs(a.y() - b.y());
    }
}
