package dockline.solve;

import static dockline.fixtures.RandomMissions.pick;

import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Random small missions for property tests (invented data, reproducible from a seed). */
public final class RandomMissions {

    private RandomMissions() {
    }

    /**
     * A tiny mission: at most 8 cells, budget at most 2, capacity at most 12 units, random surfaces,
     * docks, doors, events, tasks (visit in order or any order, avoid) and charging.
     */
    public static Mission tiny(long seed) {
        Random r = new Random(seed);
        int w = 1 + r.nextInt(4);
        int h = 1 + r.nextInt(Math.min(4, 8 / w));
        char[][] g = new char[h][w];
        List<Cell> free = new ArrayList<>();
        List<Cell> doors = new ArrayList<>();
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int k = r.nextInt(10);
                char c = k < 2 ? '#' : k < 5 ? '.' : k < 6 ? 'c' : k < 8 ? 'D' : 'd';
                g[y][x] = c;
                if (c != '#') {
                    free.add(new Cell(x, y));
                }
                if (c == 'd') {
                    doors.add(new Cell(x, y));
                }
            }
        }
        if (free.isEmpty()) {
            g[0][0] = 'D';
            free.add(new Cell(0, 0));
        }
        String[] rows = new String[h];
        for (int y = 0; y < h; y++) {
            rows[y] = new String(g[y]);
        }
        Cell start = free.get(r.nextInt(free.size()));
        int cap = 1 + r.nextInt(12);
        int startWh = r.nextInt(cap + 1);
        MissionFixture f = MissionFixture.grid(rows)
                .surface("tile", r.nextInt(4))
                .surface("carpet", 1 + r.nextInt(4))
                .waitWh(r.nextInt(3))
                .chargeWh(r.nextBoolean() ? 0 : 1 + r.nextInt(3))
                .capacity(cap)
                .startWh(startWh)
                .reserveWh(r.nextInt(5) == 0 ? r.nextInt(cap + 1) : r.nextInt(startWh + 1))
                .start(start.x(), start.y())
                .budget(r.nextInt(3));
        if (r.nextInt(5) == 0) {
            f.eight();
        }
        int zoneCount = r.nextInt(4);
        List<String> names = new ArrayList<>();
        for (int i = 0; i < zoneCount; i++) {
            String name = "z" + i;
            names.add(name);
            f.zone(name, pick(r, free, 1 + r.nextInt(3)));
        }
        List<String> visit = new ArrayList<>();
        for (String n : names) {
            if (visit.size() < 2 && r.nextInt(3) > 0) {
                visit.add(n);
            }
        }
        f.visit(r.nextBoolean(), visit.toArray(new String[0]));
        for (String n : names) {
            if (!visit.contains(n) && r.nextInt(4) == 0) {
                f.avoid(n);
            }
        }
        if (r.nextInt(8) == 0) {
            f.finishAnywhere();
        }
        if (!doors.isEmpty() && r.nextBoolean()) {
            f.event(EventKind.DOOR_SHUT, 0, doors);
        }
        if (r.nextInt(3) == 0) {
            f.event(EventKind.BLOCKAGE, 0, pick(r, free, 1 + r.nextInt(2)));
        }
        if (r.nextInt(3) == 0) {
            f.event(EventKind.SLIP, 0, pick(r, free, 1 + r.nextInt(2)));
        }
        if (r.nextInt(3) == 0) {
            f.event(EventKind.DRAG, r.nextInt(4), pick(r, free, 1 + r.nextInt(2)));
        }
        return f.build();
    }

    /** The mission in a few lines, for failure messages. */
    public static String describe(Mission m) {
        StringBuilder sb = new StringBuilder();
        m.map().rows().forEach(row -> sb.append(row).append('\n'));
        sb.append("start ").append(m.start()).append(" charge ").append(m.startUnits()).append(" reserve ")
                .append(m.reserveUnits()).append(" capacity ").append(m.capacityUnits())
                .append(" move ").append(m.robot().moveWh()).append(" wait ").append(m.robot().waitWh())
                .append(" charge/step ").append(m.robot().chargeWh()).append(' ').append(m.robot().neighbourhood())
                .append("\nzones ").append(m.map().zones()).append("\ntasks ").append(m.tasks())
                .append("\nbudget ").append(m.map().disturbances().budget()).append(" rules ")
                .append(m.map().disturbances().rules());
        return sb.toString();
    }
}
