package dockline.model;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The zone labels a mission's game reads: one bit per distinct zone its tasks name (the zones to
 * visit, or a patrol's checkpoints, in the order listed, repeats once), and one more bit, after them,
 * set on every cell of any avoided zone. Zones no task names get no bit, so a map may have any
 * number of zones: only the mission's own task zones count, and those are at most
 * {@code 2 × 16} plus the avoid bit (a mission lists at most 16 zones to visit or checkpoints).
 *
 * <p>Every avoided zone shares the one avoid bit because the game only asks whether the robot is in
 * some avoided zone, never which one. The arena's {@code cellZones} and the goal and lap automata
 * read these bits; a test oracle rebuilds the same layout from this description.
 *
 * <p>Cost: O(tasks) to build; {@link #cellMasks} is O(cells of the named zones).
 */
public final class ZoneLabels {

    /** Most bits a label set may need: a 64-bit mask per cell. */
    public static final int MAX_BITS = 64;

    private final Map<String, Integer> bitOf;
    private final List<String> taskZones;
    private final List<String> avoid;
    private final long avoidMask;

    private ZoneLabels(List<String> taskZones, List<String> avoid) {
        this.taskZones = List.copyOf(taskZones);
        this.avoid = List.copyOf(avoid);
        this.bitOf = new HashMap<>();
        for (int i = 0; i < this.taskZones.size(); i++) {
            bitOf.put(this.taskZones.get(i), i);
        }
        this.avoidMask = avoid.isEmpty() ? 0 : 1L << this.taskZones.size();
    }

    /**
     * The labels of a mission's tasks.
     *
     * @throws IllegalArgumentException if the tasks name more distinct zones than a 64-bit mask holds
     *                                  (the loader's limit on tasks keeps far below that)
     */
    public static ZoneLabels of(Tasks tasks) {
        List<String> named = new ArrayList<>();
        for (List<String> list : List.of(tasks.visit(), tasks.patrol())) {
            for (String z : list) {
                if (!named.contains(z)) {
                    named.add(z);
                }
            }
        }
        if (named.size() + (tasks.avoid().isEmpty() ? 0 : 1) > MAX_BITS) {
            throw new IllegalArgumentException("the tasks name " + named.size() + " different zones; at most "
                    + (MAX_BITS - 1) + " fit a label mask");
        }
        return new ZoneLabels(named, tasks.avoid());
    }

    public static ZoneLabels of(Mission mission) {
        return of(mission.tasks());
    }

    /** The bit of a zone the tasks name (to visit or a checkpoint). */
    public long bit(String zone) {
        Integer i = bitOf.get(zone);
        if (i == null) {
            throw new IllegalArgumentException("zone '" + zone + "' is not named by the tasks");
        }
        return 1L << i;
    }

    /** The bit set on every cell of an avoided zone (0 when nothing is avoided). */
    public long avoidMask() {
        return avoidMask;
    }

    /** The zones with a bit of their own, in bit order. */
    public List<String> taskZones() {
        return taskZones;
    }

    /**
     * The label mask of every cell (row-major index) of the map.
     *
     * @throws IllegalArgumentException if the tasks name a zone the map does not have
     */
    public long[] cellMasks(BuildingMap map) {
        long[] masks = new long[map.width() * map.height()];
        for (String z : taskZones) {
            mark(map, z, 1L << bitOf.get(z), masks);
        }
        for (String z : avoid) {
            mark(map, z, avoidMask, masks);
        }
        return masks;
    }

    private static void mark(BuildingMap map, String name, long bit, long[] masks) {
        Zone zone = map.zone(name).orElseThrow(() -> new IllegalArgumentException("unknown zone '" + name + "'"));
        for (Cell c : zone.cells()) {
            if (map.inside(c)) {
                masks[c.index(map.width())] |= bit;
            }
        }
    }
}
