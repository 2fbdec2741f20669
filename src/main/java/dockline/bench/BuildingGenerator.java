package dockline.bench;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Terrain;
import dockline.model.Zone;
import dockline.util.VisitQueue;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Generates building floors of a given side length, deterministically from a seed, for tests and
 * the benchmark: a grid of two-cell-wide corridors every {@value #PITCH} cells, blocks between them
 * split into rooms (some carpeted) with doors onto the corridors, fire doors across corridors, a
 * ramp, docks at corridor crossings, and a disturbance model with doors that may shut, a blockage
 * lane, a slip patch and drag rugs.
 *
 * <p>The same (side, seed) always gives the same map: the only source of randomness is a
 * {@link Random} seeded with the seed, whose sequence the Java platform specifies. Every free cell
 * is reachable from every other one (checked, and repaired with extra doors, during generation).
 *
 * <p>Zones: up to {@value #MAX_ROOM_ZONES} rooms are named {@code room-1, room-2, ...} (spread over
 * the floor), one room is the {@code quiet-area} a mission may avoid, and {@code wet-floor} and
 * {@code loading-lane} mark the slip patch and the blockage lane. Surfaces are {@code tile},
 * {@code carpet} and {@code ramp}. The disturbance budget is {@code budget} (a mission may override it).
 *
 * <p>Cost: O(side²) time and memory. All figures are invented for benchmarking; they describe no
 * real building.
 */
public final class BuildingGenerator {

    /** Distance between corridor lines, in cells. */
    public static final int PITCH = 16;
    /** Corridor width in cells. */
    public static final int CORRIDOR = 2;
    /** Smallest side accepted. */
    public static final int MIN_SIDE = 32;
    /** Largest side accepted (a 4096² plan is 16 M characters). */
    public static final int MAX_SIDE = 4096;
    /** Most rooms that get a zone name (any number would do: only the zones a mission names get a label bit; 40 keeps the maps small). */
    public static final int MAX_ROOM_ZONES = 40;

    public static final char WALL = '#';
    public static final char TILE = '.';
    public static final char CARPET = '~';
    public static final char RAMP = '^';
    public static final char DOOR = 'd';
    public static final char DOCK = 'k';

    /** The legend of every generated map. */
    public static final Map<Character, Terrain> LEGEND = Map.of(
            WALL, Terrain.wall(WALL),
            TILE, new Terrain(TILE, "tile", false, false),
            CARPET, new Terrain(CARPET, "carpet", false, false),
            RAMP, new Terrain(RAMP, "ramp", false, false),
            DOOR, new Terrain(DOOR, "tile", false, true),
            DOCK, new Terrain(DOCK, "tile", true, false));

    /** Extra energy of a move dragged by a rug, in Wh. */
    public static final BigDecimal RUG_DRAG_WH = new BigDecimal("0.3");

    private static final int[] DX4 = {0, 1, 0, -1};
    private static final int[] DY4 = {-1, 0, 1, 0};

    private final int side;
    private final Random rnd;
    private final char[][] g;
    private final List<int[]> rooms = new ArrayList<>(); // x0, y0, x1, y1 of the room's floor (inclusive)
    private final List<Cell> fireDoors = new ArrayList<>();
    private final List<Cell> roomDoors = new ArrayList<>();
    private final List<Integer> lines = new ArrayList<>();

    private BuildingGenerator(int side, long seed) {
        this.side = side;
        this.rnd = new Random(seed);
        this.g = new char[side][side];
        for (char[] row : g) {
            Arrays.fill(row, WALL);
        }
    }

    /**
     * A generated floor of {@code side × side} cells with disturbance budget {@code budget}.
     *
     * @throws IllegalArgumentException if the side is outside {@value #MIN_SIDE}..{@value #MAX_SIDE}
     *                                  or the budget is negative
     */
    public static BuildingMap generate(int side, long seed, int budget) {
        if (side < MIN_SIDE || side > MAX_SIDE) {
            throw new IllegalArgumentException("side must be between " + MIN_SIDE + " and " + MAX_SIDE + ", got " + side);
        }
        if (budget < 0) {
            throw new IllegalArgumentException("budget must not be negative");
        }
        return new BuildingGenerator(side, seed).build(budget);
    }

    private BuildingMap build(int budget) {
        for (int p = 1; p + CORRIDOR <= side - 1; p += PITCH) {
            lines.add(p);
        }
        carveCorridors();
        List<int[]> blocks = blocks();
        for (int[] b : blocks) {
            splitIntoRooms(b[0] + 1, b[1] + 1, b[2] - 1, b[3] - 1, 0);
        }
        List<Boolean> carpet = new ArrayList<>();
        for (int[] r : rooms) {
            boolean c = rnd.nextInt(4) == 0;
            carpet.add(c);
            fill(r, c ? CARPET : TILE);
        }
        for (int i = 0; i < rooms.size(); i++) {
            placeRoomDoors(rooms.get(i));
        }
        placeFireDoors();
        int[] ramp = placeRamp();
        placeDocks();
        connect();

        Map<String, List<Cell>> zoneCells = new LinkedHashMap<>();
        List<Integer> named = pickSpread(rooms.size(), Math.min(MAX_ROOM_ZONES, rooms.size() - 1));
        for (int i = 0; i < named.size(); i++) {
            zoneCells.put("room-" + (i + 1), floorCells(rooms.get(named.get(i))));
        }
        int quiet = -1;
        for (int i = rooms.size() - 1; i >= 0; i--) {
            if (!named.contains(i)) {
                quiet = i;
                break;
            }
        }
        if (quiet >= 0) {
            zoneCells.put("quiet-area", floorCells(rooms.get(quiet)));
        }
        List<Cell> wet = wetPatch(ramp);
        zoneCells.put("wet-floor", wet);
        List<Cell> lane = loadingLane(ramp);
        zoneCells.put("loading-lane", lane);

        List<EventRule> rules = new ArrayList<>();
        // every fire door and every third room door may shut
        List<Cell> shutting = new ArrayList<>(fireDoors);
        for (int i = 0; i < roomDoors.size(); i += 3) {
            shutting.add(roomDoors.get(i));
        }
        rules.add(new EventRule(EventKind.DOOR_SHUT, "fire and room doors", shutting, BigDecimal.ZERO));
        rules.add(new EventRule(EventKind.BLOCKAGE, "loading-lane", lane, BigDecimal.ZERO));
        rules.add(new EventRule(EventKind.SLIP, "wet-floor", wet, BigDecimal.ZERO));
        int rugs = 0;
        for (int i = 0; i < rooms.size() && rugs < 4; i++) {
            if (carpet.get(i)) {
                int[] r = rooms.get(i);
                int w = Math.min(4, r[2] - r[0] + 1);
                int h = Math.min(3, r[3] - r[1] + 1);
                int x0 = r[0] + rnd.nextInt(r[2] - r[0] + 2 - w);
                int y0 = r[1] + rnd.nextInt(r[3] - r[1] + 2 - h);
                List<Cell> rug = new ArrayList<>();
                for (int y = y0; y < y0 + h; y++) {
                    for (int x = x0; x < x0 + w; x++) {
                        rug.add(new Cell(x, y));
                    }
                }
                rugs++;
                rules.add(new EventRule(EventKind.DRAG, "rug " + rugs, rug, RUG_DRAG_WH));
            }
        }

        List<String> rows = new ArrayList<>(side);
        for (char[] row : g) {
            rows.add(new String(row));
        }
        List<Zone> zones = new ArrayList<>();
        zoneCells.forEach((n, cs) -> zones.add(new Zone(n, cs)));
        Map<Cell, String> doorNames = new HashMap<>();
        for (int i = 0; i < fireDoors.size(); i++) {
            doorNames.put(fireDoors.get(i), "fire door " + (i / CORRIDOR + 1));
        }
        return new BuildingMap("generated floor " + side + "x" + side, null, new BigDecimal("0.5"), rows, LEGEND,
                zones, doorNames, new DisturbanceModel(budget, rules));
    }

    private void carveCorridors() {
        for (int p : lines) {
            for (int d = 0; d < CORRIDOR; d++) {
                for (int i = 1; i < side - 1; i++) {
                    g[p + d][i] = TILE;
                    g[i][p + d] = TILE;
                }
            }
        }
    }

    /** Rectangles between corridors, as x0, y0, x1, y1 inclusive, ring included; blocks under 5 cells stay wall. */
    private List<int[]> blocks() {
        List<int[]> spans = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            int a = lines.get(i) + CORRIDOR;
            int b = i + 1 < lines.size() ? lines.get(i + 1) - 1 : side - 2;
            if (b - a + 1 >= 5) {
                spans.add(new int[] {a, b});
            }
        }
        List<int[]> out = new ArrayList<>();
        for (int[] sy : spans) {
            for (int[] sx : spans) {
                out.add(new int[] {sx[0], sy[0], sx[1], sy[1]});
            }
        }
        return out;
    }

    /** Splits the floor rectangle x0..x1, y0..y1 by wall lines into rooms of at least 3 cells a side. */
    private void splitIntoRooms(int x0, int y0, int x1, int y1, int depth) {
        int w = x1 - x0 + 1;
        int h = y1 - y0 + 1;
        boolean canX = w >= 7;
        boolean canY = h >= 7;
        if (depth >= 2 || (!canX && !canY) || (depth == 1 && rnd.nextInt(3) == 0)) {
            rooms.add(new int[] {x0, y0, x1, y1});
            return;
        }
        boolean alongX = canX && (!canY || w > h || (w == h && rnd.nextBoolean()));
        if (alongX) {
            int cut = x0 + 3 + rnd.nextInt(w - 6); // wall column, at least 3 floor cells either side
            splitIntoRooms(x0, y0, cut - 1, y1, depth + 1);
            splitIntoRooms(cut + 1, y0, x1, y1, depth + 1);
        } else {
            int cut = y0 + 3 + rnd.nextInt(h - 6);
            splitIntoRooms(x0, y0, x1, cut - 1, depth + 1);
            splitIntoRooms(x0, cut + 1, x1, y1, depth + 1);
        }
    }

    private void fill(int[] r, char c) {
        for (int y = r[1]; y <= r[3]; y++) {
            for (int x = r[0]; x <= r[2]; x++) {
                g[y][x] = c;
            }
        }
    }

    private static List<Cell> floorCells(int[] r) {
        List<Cell> out = new ArrayList<>();
        for (int y = r[1]; y <= r[3]; y++) {
            for (int x = r[0]; x <= r[2]; x++) {
                out.add(new Cell(x, y));
            }
        }
        return out;
    }

    /** One door (sometimes two) from the room onto a corridor, in a wall cell between floor and corridor. */
    private void placeRoomDoors(int[] r) {
        List<int[]> cands = new ArrayList<>(); // wall x, y
        for (int x = r[0]; x <= r[2]; x++) {
            addDoorCandidate(cands, x, r[1] - 1, 0, -1);
            addDoorCandidate(cands, x, r[3] + 1, 0, 1);
        }
        for (int y = r[1]; y <= r[3]; y++) {
            addDoorCandidate(cands, r[0] - 1, y, -1, 0);
            addDoorCandidate(cands, r[2] + 1, y, 1, 0);
        }
        if (cands.isEmpty()) {
            return; // an inner room: connect() opens a door into a neighbour
        }
        int n = rnd.nextInt(3) == 0 ? 2 : 1;
        for (int i = 0; i < n; i++) {
            int[] c = cands.get(rnd.nextInt(cands.size()));
            if (g[c[1]][c[0]] == WALL) {
                g[c[1]][c[0]] = DOOR;
                roomDoors.add(new Cell(c[0], c[1]));
            }
        }
    }

    private void addDoorCandidate(List<int[]> cands, int x, int y, int dx, int dy) {
        int bx = x + dx;
        int by = y + dy;
        if (bx <= 0 || by <= 0 || bx >= side - 1 || by >= side - 1) {
            return;
        }
        if (g[y][x] == WALL && g[by][bx] == TILE && isCorridor(bx, by)) {
            cands.add(new int[] {x, y});
        }
    }

    private boolean isCorridor(int x, int y) {
        return onLine(x) || onLine(y);
    }

    private boolean onLine(int v) {
        for (int p : lines) {
            if (v >= p && v < p + CORRIDOR) {
                return true;
            }
        }
        return false;
    }

    /** Fire doors across some corridor stretches, halfway between two crossings. */
    private void placeFireDoors() {
        for (int i = 0; i + 1 < lines.size(); i++) {
            int mid = lines.get(i) + PITCH / 2 + 1;
            for (int j = 0; j < lines.size(); j++) {
                int p = lines.get(j);
                if (rnd.nextInt(3) == 0) { // across a horizontal corridor: a column of door cells
                    for (int d = 0; d < CORRIDOR; d++) {
                        g[p + d][mid] = DOOR;
                        fireDoors.add(new Cell(mid, p + d));
                    }
                }
                if (rnd.nextInt(3) == 0) { // across a vertical corridor
                    for (int d = 0; d < CORRIDOR; d++) {
                        g[mid][p + d] = DOOR;
                        fireDoors.add(new Cell(p + d, mid));
                    }
                }
            }
        }
    }

    /** A ramp over one stretch of the middle horizontal corridor; returns x0, x1, y of its first row. */
    private int[] placeRamp() {
        int row = lines.get(lines.size() / 2);
        int seg = rnd.nextInt(Math.max(1, lines.size() - 1));
        int x0 = lines.get(seg) + CORRIDOR + 1;
        int x1 = Math.min(side - 2, x0 + PITCH / 2 - 2);
        for (int d = 0; d < CORRIDOR; d++) {
            for (int x = x0; x <= x1; x++) {
                if (g[row + d][x] == TILE) {
                    g[row + d][x] = RAMP;
                }
            }
        }
        return new int[] {x0, x1, row};
    }

    /** A dock at every corridor crossing (one cell of it), so docks are {@value #PITCH} cells apart. */
    private void placeDocks() {
        for (int y : lines) {
            for (int x : lines) {
                g[y][x] = DOCK;
            }
        }
    }

    /** The slip patch: corridor cells in a vertical corridor near the middle of the floor. */
    private List<Cell> wetPatch(int[] ramp) {
        int col = lines.get(Math.max(0, lines.size() / 2 - 1));
        int y0 = lines.get(Math.max(0, lines.size() / 2 - 1)) + CORRIDOR + 2;
        List<Cell> out = new ArrayList<>();
        for (int y = y0; y < Math.min(side - 1, y0 + 4); y++) {
            for (int d = 0; d < CORRIDOR; d++) {
                if (g[y][col + d] != WALL) {
                    out.add(new Cell(col + d, y));
                }
            }
        }
        return out;
    }

    /** The blockage lane: a stretch of the first horizontal corridor. */
    private List<Cell> loadingLane(int[] ramp) {
        int row = lines.get(0);
        int x0 = lines.get(Math.min(1, lines.size() - 1)) + CORRIDOR + 1;
        List<Cell> out = new ArrayList<>();
        for (int x = x0; x < Math.min(side - 1, x0 + 6); x++) {
            for (int d = 0; d < CORRIDOR; d++) {
                if (g[row + d][x] != WALL) {
                    out.add(new Cell(x, row + d));
                }
            }
        }
        return out;
    }

    /**
     * Opens doors until every free cell is reachable from the first corridor cell (4-neighbourhood):
     * a wall cell with a reached free cell on one side and an unreached one opposite becomes a door,
     * and the region behind it is flooded at once, so each region costs one door.
     */
    private void connect() {
        VisitQueue seen = new VisitQueue(side * side);
        flood(lines.get(0), lines.get(0), seen);
        boolean added = true;
        while (added) {
            added = false;
            for (int y = 1; y < side - 1; y++) {
                for (int x = 1; x < side - 1; x++) {
                    if (g[y][x] != WALL) {
                        continue;
                    }
                    int[] behind = null;
                    if (free(x - 1, y) && free(x + 1, y) && seen.seen(y * side + x - 1) != seen.seen(y * side + x + 1)) {
                        behind = seen.seen(y * side + x - 1) ? new int[] {x + 1, y} : new int[] {x - 1, y};
                    } else if (free(x, y - 1) && free(x, y + 1)
                            && seen.seen((y - 1) * side + x) != seen.seen((y + 1) * side + x)) {
                        behind = seen.seen((y - 1) * side + x) ? new int[] {x, y + 1} : new int[] {x, y - 1};
                    }
                    if (behind != null) {
                        g[y][x] = DOOR;
                        roomDoors.add(new Cell(x, y));
                        seen.mark(y * side + x);
                        flood(behind[0], behind[1], seen);
                        added = true;
                    }
                }
            }
        }
    }

    private boolean free(int x, int y) {
        return g[y][x] != WALL;
    }

    /** Marks every free cell reachable from (sx, sy) through unmarked free cells (the queue is left empty). */
    private void flood(int sx, int sy, VisitQueue seen) {
        seen.visit(sy * side + sx);
        while (seen.hasNext()) {
            int c = seen.next();
            int x = c % side;
            int y = c / side;
            for (int i = 0; i < 4; i++) {
                int nx = x + DX4[i];
                int ny = y + DY4[i];
                if (g[ny][nx] != WALL) {
                    seen.visit(ny * side + nx);
                }
            }
        }
    }

    /** {@code k} indices out of {@code 0..n-1}, spread evenly (deterministic, then sorted). */
    private List<Integer> pickSpread(int n, int k) {
        List<Integer> out = new ArrayList<>();
        if (k <= 0) {
            return out;
        }
        for (int i = 0; i < k; i++) {
            int lo = (int) ((long) i * n / k);
            int hi = (int) ((long) (i + 1) * n / k);
            out.add(lo + rnd.nextInt(Math.max(1, hi - lo)));
        }
        return out;
    }
}
