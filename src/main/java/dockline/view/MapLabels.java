package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Zone;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

/**
 * Where the map's words go at one zoom: a greedy placement by priority in map pixels (origin at the
 * map's top-left corner, cells of {@code s} pixels). First the symbols that must stay visible are
 * reserved (docks, the start, doors: their cells), then door names, then zone names, and, for a
 * replay, the disturbance labels; each label takes the first of its candidate places that overlaps
 * nothing placed before it, and is dropped when none is free. So no two boxes ever intersect, and
 * text is never smaller than {@link #MIN_FONT} pixels: at small zooms labels are dropped, not shrunk.
 *
 * <p>Cost: O(labels × candidates × boxes nearby), with a bucket grid over the placed boxes.
 */
final class MapLabels {

    /** The smallest text drawn on the map, in pixels. */
    static final double MIN_FONT = 9;
    /** Door names are shown from this cell size up (below, the door symbols speak for themselves). */
    static final double DOOR_NAMES_FROM = 16;
    private static final int MAX_CANDIDATES = 160;

    /** What a box is. */
    enum Kind { SYMBOL, DOOR, ZONE, MARK, EVENT }

    /**
     * One placed box in map pixels.
     *
     * @param text   the words ({@code ""} for a reserved symbol)
     * @param zone   index of the zone for a zone name (its colour), else -1
     * @param font   text size in pixels (0 for a symbol)
     */
    record Box(Kind kind, String text, double x, double y, double w, double h, int zone, double font) {
        boolean overlaps(Box b) {
            return x < b.x + b.w && b.x < x + w && y < b.y + b.h && b.y < y + h;
        }
    }

    private final double s;
    private final double mapW;
    private final double mapH;
    private final List<Box> boxes = new ArrayList<>();
    private final Map<Long, List<Box>> grid = new HashMap<>();
    private static final double BUCKET = 64;

    private MapLabels(double s, double mapW, double mapH) {
        this.s = s;
        this.mapW = mapW;
        this.mapH = mapH;
    }

    static double zoneFont(double s) {
        return Math.max(MIN_FONT, Math.min(15, s * 0.42));
    }

    static double doorFont(double s) {
        return Math.max(MIN_FONT, Math.min(12, s * 0.3));
    }

    static double eventFont(double s) {
        return Math.max(MIN_FONT, Math.min(13, s * 0.36));
    }

    static Font font(double size) {
        return Font.font("DejaVu Sans", FontWeight.BOLD, size);
    }

    /** The static words of a map at cell size {@code s}: symbols reserved, door names, zone names. */
    static MapLabels of(BuildingMap map, Cell start, double s) {
        MapLabels l = new MapLabels(s, map.width() * s, map.height() * s);
        // 1. symbols that must stay visible: docks, the start, doors
        for (Cell d : map.docks()) {
            l.add(new Box(Kind.SYMBOL, "", d.x() * s, d.y() * s, s, s, -1, 0));
        }
        if (start != null && map.inside(start)) {
            l.add(new Box(Kind.SYMBOL, "", start.x() * s, start.y() * s, s, s, -1, 0));
        }
        List<Cell> doors = new ArrayList<>();
        for (int y = 0; y < map.height(); y++) {
            for (int x = 0; x < map.width(); x++) {
                Cell c = new Cell(x, y);
                if (map.terrainAt(c).door()) {
                    doors.add(c);
                    l.addIfFree(new Box(Kind.SYMBOL, "", x * s, y * s, s, s, -1, 0));
                }
            }
        }
        // 2. door names (only doors the map names), beside the door
        if (s >= DOOR_NAMES_FROM) {
            double f = doorFont(s);
            for (Cell c : doors) {
                String name = map.doorNames().get(c);
                if (name == null) {
                    continue;
                }
                double[] wh = measure(name, f);
                double x = c.x() * s;
                double y = c.y() * s;
                double[][] at = {{x + s + 1, y + (s - wh[1]) / 2}, {x - wh[0] - 1, y + (s - wh[1]) / 2},
                    {x + (s - wh[0]) / 2, y - wh[1] - 1}, {x + (s - wh[0]) / 2, y + s + 1}};
                l.placeFirst(Kind.DOOR, name, at, wh, -1, f);
            }
        }
        // 3. zone names, each inside its zone, the zone's top-left cells first
        double f = zoneFont(s);
        List<Zone> zones = map.zones();
        for (int i = 0; i < zones.size(); i++) {
            Zone z = zones.get(i);
            if (z.cells().isEmpty()) {
                continue;
            }
            double[] wh = measure(z.name(), f);
            List<Cell> cells = z.cells();
            int stride = Math.max(1, cells.size() / MAX_CANDIDATES);
            List<double[]> at = new ArrayList<>();
            for (int k = 0; k < cells.size(); k += stride) {
                Cell c = cells.get(k);
                at.add(new double[] {c.x() * s + 2, c.y() * s + 2});
            }
            l.placeFirst(Kind.ZONE, z.name(), at.toArray(double[][]::new), wh, i, f);
        }
        return l;
    }

    /**
     * A copy with the disturbance labels of a replay placed too (beside each event marker, to the
     * right first, then below, left and above; dropped when no place is free).
     *
     * @param markers per marker cell its label, in the order they are to be placed
     */
    MapLabels withEvents(Map<Cell, String> markers) {
        MapLabels l = new MapLabels(s, mapW, mapH);
        for (Box b : boxes) {
            l.add(b);
        }
        double f = eventFont(s);
        double r = markerRadius(s);
        // the markers first, so that no event label covers another event's marker
        for (Cell c : markers.keySet()) {
            double cx = (c.x() + 0.78) * s;
            double cy = (c.y() + 0.22) * s;
            l.add(new Box(Kind.MARK, "", cx - r, cy - r, 2 * r, 2 * r, -1, 0));
        }
        for (Map.Entry<Cell, String> e : markers.entrySet()) {
            Cell c = e.getKey();
            double cx = (c.x() + 0.78) * s;
            double cy = (c.y() + 0.22) * s;
            double[] wh = measure(e.getValue(), f);
            double tw = wh[0];
            double th = wh[1];
            double[][] at = {{cx + r + 1, cy - th / 2}, {cx - tw / 2, cy + r + 1}, {cx - r - 1 - tw, cy - th / 2},
                {cx - tw / 2, cy - r - 1 - th}, {cx + r + 1, cy + r + 1}, {cx + r + 1, cy - r - 1 - th}};
            l.placeFirst(Kind.EVENT, e.getValue(), at, wh, -1, f);
        }
        return l;
    }

    /** Radius of a disturbance marker at cell size {@code s}. */
    static double markerRadius(double s) {
        return Math.max(5, s * 0.22);
    }

    /** Every box, reserved symbols included, in the order placed. */
    List<Box> boxes() {
        return List.copyOf(boxes);
    }

    /** The boxes of one kind. */
    List<Box> boxes(Kind k) {
        return boxes.stream().filter(b -> b.kind() == k).toList();
    }

    double cellPx() {
        return s;
    }

    /** Width and height of a label's box (text plus a margin) in pixels. */
    static double[] measure(String text, double size) {
        Text probe = new Text(text);
        probe.setFont(font(size));
        return new double[] {Math.ceil(probe.getLayoutBounds().getWidth()) + 6, Math.ceil(size * 1.3)};
    }

    private void placeFirst(Kind kind, String text, double[][] at, double[] wh, int zone, double f) {
        for (double[] p : at) {
            Box b = new Box(kind, text, p[0], p[1], wh[0], wh[1], zone, f);
            if (b.x >= 0 && b.y >= 0 && b.x + b.w <= mapW && b.y + b.h <= mapH && free(b)) {
                add(b);
                return;
            }
        }
    }

    private void addIfFree(Box b) {
        if (free(b)) {
            add(b);
        }
    }

    private boolean free(Box b) {
        for (long key : keys(b)) {
            List<Box> in = grid.get(key);
            if (in != null) {
                for (Box o : in) {
                    if (o.overlaps(b)) {
                        return false;
                    }
                }
            }
        }
        return true;
    }

    private void add(Box b) {
        boxes.add(b);
        for (long key : keys(b)) {
            grid.computeIfAbsent(key, k -> new ArrayList<>()).add(b);
        }
    }

    private static long[] keys(Box b) {
        int x0 = (int) Math.floor(b.x / BUCKET);
        int y0 = (int) Math.floor(b.y / BUCKET);
        int x1 = (int) Math.floor((b.x + b.w) / BUCKET);
        int y1 = (int) Math.floor((b.y + b.h) / BUCKET);
        long[] out = new long[(x1 - x0 + 1) * (y1 - y0 + 1)];
        int i = 0;
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                out[i++] = ((long) y << 32) ^ (x & 0xffffffffL);
            }
        }
        return out;
    }
}
