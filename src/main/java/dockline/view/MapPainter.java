package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Terrain;
import dockline.model.Zone;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;

/**
 * Draws a {@link MapLayers} snapshot in two parts. The static part ({@link #paintStatic}): surfaces
 * (colour, pattern and the map's own legend character), walls (hatched), the heat map, the grid,
 * doors, docks, the start cell, zone outlines and the placed words of {@link MapLabels}. The dynamic
 * part ({@link #paintDynamic}): the replay path, closures, policy glyphs (above the path), the
 * disturbance markers and their labels, the robot (dock and start stay visible under it) and the
 * hovered cell. The window keeps the static part in images and redraws only the dynamic part on a
 * replay step or a hover; {@code render} draws both onto one canvas ({@link #paint}).
 *
 * <p>Only the cells inside the visible rectangle are drawn: O(visible cells) for the static part,
 * O(visible cells + replay length) for the dynamic part.
 */
final class MapPainter {

    private MapPainter() {
    }

    /**
     * Paints both parts with the map's top-left corner at ({@code ox}, {@code oy}) and cells of
     * {@code s} pixels, clipped to a {@code width} × {@code height} canvas.
     */
    static void paint(GraphicsContext g, MapLayers layers, double ox, double oy, double s, double width, double height) {
        MapLabels labels = MapLabels.of(layers.map(), layers.start(), s);
        g.setFill(Palette.BACKGROUND);
        g.fillRect(0, 0, width, height);
        paintStatic(g, layers, labels, ox, oy, s, width, height);
        paintDynamic(g, layers, eventLabels(layers, labels), ox, oy, s, width, height);
    }

    /** The static words with the replay's disturbance labels placed as well (the same labels without a replay). */
    static MapLabels eventLabels(MapLayers layers, MapLabels labels) {
        return layers.replay() == null ? labels : labels.withEvents(eventMarkers(layers.replay()));
    }

    /** One marker per cell with events, its label listing the steps and kinds there, e.g. {@code 40, 41 drag}. */
    static Map<Cell, String> eventMarkers(ViewReplay replay) {
        Map<Cell, List<ViewStep>> byCell = new java.util.LinkedHashMap<>();
        for (ViewStep st : replay.steps()) {
            if (st.hasEvent()) {
                byCell.computeIfAbsent(eventCell(st), c -> new java.util.ArrayList<>()).add(st);
            }
        }
        Map<Cell, String> out = new java.util.LinkedHashMap<>();
        byCell.forEach((c, here) -> out.put(c, eventLabel(here)));
        return out;
    }

    /** Visible cell range {x0, y0, x1, y1} (inclusive) of a {@code width} × {@code height} area. */
    private static int[] visible(BuildingMap map, double ox, double oy, double s, double width, double height) {
        int w = map.width();
        int h = map.height();
        return new int[] {clamp((int) Math.floor(-ox / s), 0, w - 1), clamp((int) Math.floor(-oy / s), 0, h - 1),
            clamp((int) Math.ceil((width - ox) / s), 0, w - 1), clamp((int) Math.ceil((height - oy) / s), 0, h - 1)};
    }

    /**
     * The static part: everything that changes only with the map, the start, the heat values or the
     * zoom. Leaves the area outside the map untouched (the caller clears it).
     */
    static void paintStatic(GraphicsContext g, MapLayers layers, MapLabels labels, double ox, double oy, double s,
                            double width, double height) {
        BuildingMap map = layers.map();
        int w = map.width();
        int[] v = visible(map, ox, oy, s, width, height);
        int x0 = v[0];
        int y0 = v[1];
        int x1 = v[2];
        int y1 = v[3];
        g.save();
        Map<String, Palette.SurfaceStyle> styles = new HashMap<>();
        for (Palette.SurfaceStyle st : Palette.surfaces(map)) {
            styles.put(st.surface(), st);
        }
        // 1. base: fills in runs of one row, then patterns and characters per cell
        for (int y = y0; y <= y1; y++) {
            int x = x0;
            while (x <= x1) {
                Terrain t = map.terrainAt(new Cell(x, y));
                int e = x + 1;
                while (e <= x1 && sameFill(t, map.terrainAt(new Cell(e, y)))) {
                    e++;
                }
                g.setFill(t.wall() ? Palette.WALL : styles.get(t.surface()).fill());
                g.fillRect(ox + x * s, oy + y * s, (e - x) * s, s);
                x = e;
            }
        }
        if (s >= 6) {
            for (int y = y0; y <= y1; y++) {
                String row = map.rows().get(y);
                for (int x = x0; x <= x1; x++) {
                    Terrain t = map.terrainAt(new Cell(x, y));
                    double px = ox + x * s;
                    double py = oy + y * s;
                    if (t.wall()) {
                        paintWallHatch(g, px, py, s);
                    } else {
                        paintSurfaceMarks(g, styles.get(t.surface()), row.charAt(x), px, py, s);
                    }
                }
            }
        }
        // 2. heat overlay
        if (layers.hasHeat()) {
            for (int y = y0; y <= y1; y++) {
                for (int x = x0; x <= x1; x++) {
                    int hv = layers.heat(y * w + x);
                    if (hv == ViewData.UNKNOWN) {
                        continue;
                    }
                    paintHeatCell(g, hv, layers.heatLow(), layers.heatHigh(), ox + x * s, oy + y * s, s);
                }
            }
        }
        // 3. grid
        if (s >= 8) {
            g.setStroke(Palette.GRID);
            g.setLineWidth(1);
            for (int x = x0; x <= x1 + 1; x++) {
                g.strokeLine(ox + x * s, oy + y0 * s, ox + x * s, oy + (y1 + 1) * s);
            }
            for (int y = y0; y <= y1 + 1; y++) {
                g.strokeLine(ox + x0 * s, oy + y * s, ox + (x1 + 1) * s, oy + y * s);
            }
        }
        // 4. doors, docks, start
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                Cell c = new Cell(x, y);
                Terrain t = map.terrainAt(c);
                if (t.door()) {
                    paintDoor(g, map, c, ox + x * s, oy + y * s, s);
                }
                if (t.dock()) {
                    paintDock(g, ox + x * s, oy + y * s, s);
                }
            }
        }
        if (layers.start() != null) {
            paintStart(g, ox + layers.start().x() * s, oy + layers.start().y() * s, s);
        }
        // 5. zones: outlines, then the placed words
        List<Zone> zones = map.zones();
        for (int i = 0; i < zones.size(); i++) {
            paintZoneOutline(g, zones.get(i), Palette.zone(i), ox, oy, s, x0, y0, x1, y1);
        }
        for (MapLabels.Box b : labels.boxes()) {
            if (b.kind() == MapLabels.Kind.ZONE) {
                paintTag(g, b, ox, oy, Palette.zone(b.zone()).deriveColor(0, 1, 1, 0.9), Palette.textOn(Palette.zone(b.zone())));
            } else if (b.kind() == MapLabels.Kind.DOOR) {
                paintTag(g, b, ox, oy, Color.WHITE.deriveColor(0, 1, 1, 0.85), Palette.DOOR.darker());
            }
        }
        g.restore();
    }

    private static boolean sameFill(Terrain a, Terrain b) {
        return a.wall() ? b.wall() : !b.wall() && a.surface().equals(b.surface());
    }

    /** A word on a tag: the box filled, the text left-aligned inside. */
    private static void paintTag(GraphicsContext g, MapLabels.Box b, double ox, double oy, Color fill, Color ink) {
        g.setFill(fill);
        g.fillRoundRect(ox + b.x(), oy + b.y(), b.w(), b.h(), 6, 6);
        g.setFill(ink);
        g.setFont(MapLabels.font(b.font()));
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(b.text(), ox + b.x() + 3, oy + b.y() + b.h() / 2);
    }

    /**
     * The dynamic part: what a replay step, the policy situation or the pointer changes. Draws over
     * whatever is there (the window's dynamic canvas is transparent).
     *
     * @param labels the static words with the replay's disturbance labels ({@link #eventLabels})
     */
    static void paintDynamic(GraphicsContext g, MapLayers layers, MapLabels labels, double ox, double oy, double s,
                             double width, double height) {
        BuildingMap map = layers.map();
        int w = map.width();
        g.save();
        // 1. replay path and closures
        if (layers.replay() != null) {
            paintPath(g, layers.replay(), layers.step(), ox, oy, s);
        }
        // 2. policy glyphs, above the path (with a white halo on the path's cells, so they read on the line)
        if (layers.overlay() == Overlay.POLICY && s >= 6) {
            int[] v = visible(map, ox, oy, s, width, height);
            java.util.Set<Cell> onPath = new java.util.HashSet<>();
            if (layers.replay() != null) {
                layers.replay().steps().forEach(st -> onPath.add(st.cell()));
            }
            for (int y = v[1]; y <= v[3]; y++) {
                for (int x = v[0]; x <= v[2]; x++) {
                    Action a = layers.policy(y * w + x);
                    if (a != null) {
                        if (onPath.contains(new Cell(x, y))) {
                            paintActionWithHalo(g, a, x, y, ox + x * s, oy + y * s, s);
                        } else {
                            paintAction(g, a, x, y, ox + x * s, oy + y * s, s);
                        }
                        if (layers.policyVaries(y * w + x)) {
                            paintVaries(g, ox + x * s, oy + y * s, s);
                        }
                    }
                }
            }
        }
        // 3. disturbance markers and their placed labels
        if (layers.replay() != null) {
            paintEvents(g, layers.replay(), layers.step(), labels, ox, oy, s);
        }
        // 4. the robot; a dock or the start under it stays visible
        Cell robot = layers.robotCell();
        if (robot != null) {
            boolean onDock = map.inside(robot) && map.terrainAt(robot).dock();
            boolean onStart = robot.equals(layers.start());
            paintRobot(g, ox + robot.x() * s, oy + robot.y() * s, s, onDock || onStart);
            if (onStart) {
                paintStart(g, ox + robot.x() * s, oy + robot.y() * s, s);
            }
        }
        // 5. hover
        Cell hv = layers.hover();
        if (hv != null && map.inside(hv)) {
            g.setStroke(Palette.HOVER);
            g.setLineWidth(2);
            g.setLineDashes();
            g.strokeRect(ox + hv.x() * s + 1, oy + hv.y() * s + 1, s - 2, s - 2);
        }
        g.restore();
    }

    private static int clamp(int v, int lo, int hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    static void paintWall(GraphicsContext g, double x, double y, double s) {
        g.setFill(Palette.WALL);
        g.fillRect(x, y, s, s);
        if (s >= 6) {
            paintWallHatch(g, x, y, s);
        }
    }

    /** The wall's hatch, inside the cell (lines cut to the square: no clip, which is slow). */
    private static void paintWallHatch(GraphicsContext g, double x, double y, double s) {
        g.setStroke(Palette.WALL_HATCH);
        g.setLineWidth(Math.max(1, s / 14));
        double step = Math.max(4, s / 3);
        for (double d = -s + step; d < s; d += step) {
            rising(g, x, y, s, d);
        }
    }

    /** The part inside the cell of the line from (x+d, y+s) to (x+d+s, y). */
    private static void rising(GraphicsContext g, double x, double y, double s, double d) {
        double t0 = Math.max(0, -d);
        double t1 = Math.min(s, s - d);
        if (t1 > t0) {
            g.strokeLine(x + d + t0, y + s - t0, x + d + t1, y + s - t1);
        }
    }

    /** The part inside the cell of the line from (x+d, y) to (x+d+s, y+s). */
    private static void falling(GraphicsContext g, double x, double y, double s, double d) {
        double t0 = Math.max(0, -d);
        double t1 = Math.min(s, s - d);
        if (t1 > t0) {
            g.strokeLine(x + d + t0, y + t0, x + d + t1, y + t1);
        }
    }

    /** A surface swatch: fill, pattern and the surface's first own character (for the key). */
    static void paintSurface(GraphicsContext g, Palette.SurfaceStyle st, double x, double y, double s) {
        g.setFill(st.fill());
        g.fillRect(x, y, s, s);
        paintSurfaceMarks(g, st, st.symbols().isEmpty() ? ' ' : st.symbols().charAt(0), x, y, s);
    }

    /** The pattern of a surface and, when the cell is large enough, the map's own character of the cell. */
    static void paintSurfaceMarks(GraphicsContext g, Palette.SurfaceStyle st, char symbol, double x, double y, double s) {
        Color ink = st.fill().deriveColor(0, 1.0, 0.62, 1.0);
        g.setStroke(ink);
        g.setFill(ink);
        g.setLineWidth(Math.max(0.8, s / 24));
        double q = s / 4;
        switch (st.pattern()) {
            case PLAIN -> {
            }
            case DOTS -> {
                double r = Math.max(1, s / 16);
                for (int i = 1; i <= 3; i += 2) {
                    for (int j = 1; j <= 3; j += 2) {
                        g.fillOval(x + i * q - r, y + j * q - r, 2 * r, 2 * r);
                    }
                }
            }
            case DIAGONAL -> {
                for (double d = -s + s / 3; d < s; d += s / 3) {
                    rising(g, x, y, s, d);
                }
            }
            case BACK_DIAGONAL -> {
                for (double d = -s + s / 3; d < s; d += s / 3) {
                    falling(g, x, y, s, d);
                }
            }
            case HORIZONTAL -> {
                for (int i = 1; i <= 3; i++) {
                    g.strokeLine(x, y + i * q, x + s, y + i * q);
                }
            }
            case VERTICAL -> {
                for (int i = 1; i <= 3; i++) {
                    g.strokeLine(x + i * q, y, x + i * q, y + s);
                }
            }
            case CROSSHATCH -> {
                for (double d = -s + s / 2.5; d < s; d += s / 2.5) {
                    rising(g, x, y, s, d);
                    falling(g, x, y, s, d);
                }
            }
            case GRID -> {
                g.strokeLine(x + 2 * q, y, x + 2 * q, y + s);
                g.strokeLine(x, y + 2 * q, x + s, y + 2 * q);
            }
        }
        if (s * 0.3 >= MapLabels.MIN_FONT && symbol != ' ') {
            g.setFill(ink);
            g.setFont(Font.font("DejaVu Sans", FontWeight.BOLD, s * 0.3));
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.TOP);
            g.fillText(String.valueOf(symbol), x + s * 0.06, y + s * 0.03);
        }
    }

    /** One heat cell: a colour by its place between {@code lo} and {@code hi}, or the cross pattern for impossible cells. */
    static void paintHeatCell(GraphicsContext g, int units, int lo, int hi, double x, double y, double s) {
        if (units == ViewData.IMPOSSIBLE) {
            g.setFill(Palette.IMPOSSIBLE);
            g.fillRect(x, y, s, s);
            g.setStroke(Palette.IMPOSSIBLE_MARK);
            g.setLineWidth(Math.max(1, s / 12));
            double m = s * 0.22;
            g.strokeLine(x + m, y + m, x + s - m, y + s - m);
            g.strokeLine(x + m, y + s - m, x + s - m, y + m);
            return;
        }
        double t = hi <= lo ? 0 : (double) (units - lo) / (hi - lo);
        g.setFill(Palette.heat(t).deriveColor(0, 1, 1, 0.88));
        g.fillRect(x, y, s, s);
    }

    private static void paintDoor(GraphicsContext g, BuildingMap map, Cell c, double x, double y, double s) {
        boolean wallsLeftRight = !map.isFree(new Cell(c.x() - 1, c.y())) && !map.isFree(new Cell(c.x() + 1, c.y()));
        g.setFill(Palette.DOOR);
        double t = Math.max(2, s * 0.18);
        if (wallsLeftRight) {
            g.fillRect(x, y + (s - t) / 2, s, t);
            g.fillRect(x, y + s * 0.15, Math.max(1.5, s * 0.1), s * 0.7);
            g.fillRect(x + s - Math.max(1.5, s * 0.1), y + s * 0.15, Math.max(1.5, s * 0.1), s * 0.7);
        } else {
            g.fillRect(x + (s - t) / 2, y, t, s);
            g.fillRect(x + s * 0.15, y, s * 0.7, Math.max(1.5, s * 0.1));
            g.fillRect(x + s * 0.15, y + s - Math.max(1.5, s * 0.1), s * 0.7, Math.max(1.5, s * 0.1));
        }
    }

    /** A dock: a green disc with a white plus (a charging point). */
    static void paintDock(GraphicsContext g, double x, double y, double s) {
        double d = s * 0.74;
        double cx = x + s / 2;
        double cy = y + s / 2;
        disc(g, cx, cy, d, Palette.DOCK);
        g.setStroke(Color.WHITE);
        g.setLineWidth(Math.max(1.5, s / 9));
        g.setLineCap(StrokeLineCap.BUTT);
        double a = d * 0.28;
        g.strokeLine(cx - a, cy, cx + a, cy);
        g.strokeLine(cx, cy - a, cx, cy + a);
    }

    /** The start cell: a pennant on a pole. */
    static void paintStart(GraphicsContext g, double x, double y, double s) {
        g.setStroke(Palette.START);
        g.setLineWidth(Math.max(1.5, s / 12));
        double px = x + s * 0.22;
        g.strokeLine(px, y + s * 0.12, px, y + s * 0.9);
        g.setFill(Palette.START);
        g.fillPolygon(new double[] {px, px + s * 0.62, px}, new double[] {y + s * 0.12, y + s * 0.3, y + s * 0.48}, 3);
    }

    /** A zone's dashed outline, only where it is inside the visible cell range. */
    private static void paintZoneOutline(GraphicsContext g, Zone z, Color colour, double ox, double oy, double s,
                                         int x0, int y0, int x1, int y1) {
        g.setStroke(colour);
        g.setLineWidth(Math.max(1.5, s / 10));
        g.setLineDashes(Math.max(3, s / 4), Math.max(2, s / 8));
        double in = Math.max(1, s / 14);
        for (Cell c : z.cells()) {
            if (c.x() < x0 || c.x() > x1 || c.y() < y0 || c.y() > y1) {
                continue;
            }
            double x = ox + c.x() * s;
            double y = oy + c.y() * s;
            if (!z.contains(new Cell(c.x(), c.y() - 1))) {
                g.strokeLine(x, y + in, x + s, y + in);
            }
            if (!z.contains(new Cell(c.x(), c.y() + 1))) {
                g.strokeLine(x, y + s - in, x + s, y + s - in);
            }
            if (!z.contains(new Cell(c.x() - 1, c.y()))) {
                g.strokeLine(x + in, y, x + in, y + s);
            }
            if (!z.contains(new Cell(c.x() + 1, c.y()))) {
                g.strokeLine(x + s - in, y, x + s - in, y + s);
            }
        }
        g.setLineDashes();
    }

    /** A policy glyph with a light halo, so that it reads on the path line and on any fill. */
    static void paintActionWithHalo(GraphicsContext g, Action a, int cx, int cy, double x, double y, double s) {
        double r = s * 0.3;
        g.setFill(Color.WHITE.deriveColor(0, 1, 1, 0.55));
        g.fillOval(x + s / 2 - r, y + s / 2 - r, 2 * r, 2 * r);
        paintAction(g, a, cx, cy, x, y, s);
    }

    /** A policy glyph: an arrow for a move, two bars for wait, a battery for charge. */
    static void paintAction(GraphicsContext g, Action a, int cx, int cy, double x, double y, double s) {
        double mx = x + s / 2;
        double my = y + s / 2;
        g.setStroke(Palette.GLYPH);
        g.setFill(Palette.GLYPH);
        g.setLineWidth(Math.max(1.2, s / 14));
        g.setLineCap(StrokeLineCap.ROUND);
        if (a.kind() == ActionKind.MOVE) {
            double dx = a.target().x() - cx;
            double dy = a.target().y() - cy;
            double len = Math.hypot(dx, dy);
            if (len == 0) {
                return;
            }
            dx /= len;
            dy /= len;
            double r = s * 0.36;
            double tx = mx + dx * r;
            double ty = my + dy * r;
            g.strokeLine(mx - dx * r * 0.7, my - dy * r * 0.7, tx - dx * s * 0.08, ty - dy * s * 0.08);
            double hw = s * 0.16;
            double bx = tx - dx * s * 0.24;
            double by = ty - dy * s * 0.24;
            g.fillPolygon(new double[] {tx, bx - dy * hw, bx + dy * hw}, new double[] {ty, by + dx * hw, by - dx * hw}, 3);
        } else if (a.kind() == ActionKind.WAIT) {
            double bw = Math.max(1.5, s * 0.1);
            double bh = s * 0.4;
            g.fillRect(mx - s * 0.14, my - bh / 2, bw, bh);
            g.fillRect(mx + s * 0.14 - bw, my - bh / 2, bw, bh);
        } else {
            double bw = s * 0.46;
            double bh = s * 0.26;
            g.setLineWidth(Math.max(1, s / 18));
            g.strokeRect(mx - bw / 2, my - bh / 2, bw, bh);
            g.fillRect(mx + bw / 2, my - bh / 5, s * 0.06, bh * 0.4);
            g.fillRect(mx - bw / 2 + bw * 0.12, my - bh / 2 + bh * 0.2, bw * 0.5, bh * 0.6);
        }
    }

    /** The "depends on the battery level" mark: a small tilde badge in the cell's top-right corner. */
    static void paintVaries(GraphicsContext g, double x, double y, double s) {
        double r = Math.max(3.5, s * 0.16);
        double cx = x + s - r - 1;
        double cy = y + r + 1;
        g.setFill(Color.WHITE);
        g.fillOval(cx - r, cy - r, 2 * r, 2 * r);
        g.setStroke(Palette.GLYPH);
        g.setLineWidth(Math.max(1, s / 28));
        g.strokeOval(cx - r, cy - r, 2 * r, 2 * r);
        double a = r * 0.55;
        g.beginPath();
        g.moveTo(cx - a, cy + a * 0.2);
        g.bezierCurveTo(cx - a * 0.5, cy - a * 0.7, cx, cy - a * 0.2, cx, cy);
        g.bezierCurveTo(cx, cy + a * 0.2, cx + a * 0.5, cy + a * 0.7, cx + a, cy - a * 0.2);
        g.stroke();
    }

    /** The replay path (walked part solid, rest dashed) and the cells closed by lasting events so far. */
    private static void paintPath(GraphicsContext g, ViewReplay replay, int step, double ox, double oy, double s) {
        List<ViewStep> steps = replay.steps();
        g.setLineCap(StrokeLineCap.ROUND);
        for (int i = 1; i < steps.size(); i++) {
            Cell a = steps.get(i - 1).cell();
            Cell b = steps.get(i).cell();
            if (a.equals(b)) {
                continue;
            }
            boolean walked = i <= step;
            g.setStroke(walked ? Palette.PATH : Palette.PATH.deriveColor(0, 0.7, 1.2, 0.55));
            g.setLineWidth(Math.max(walked ? 2.5 : 1.5, s / (walked ? 7 : 11)));
            if (walked) {
                g.setLineDashes();
            } else {
                g.setLineDashes(Math.max(3, s / 5), Math.max(3, s / 6));
            }
            g.strokeLine(ox + (a.x() + 0.5) * s, oy + (a.y() + 0.5) * s, ox + (b.x() + 0.5) * s, oy + (b.y() + 0.5) * s);
        }
        g.setLineDashes();
        // doors and zones closed for good by a lasting event: hatched from the step they close on
        g.setStroke(Palette.EVENT);
        g.setLineWidth(Math.max(1.5, s / 12));
        for (ViewStep st : steps) {
            if (st.step() > step) {
                break;
            }
            for (Cell c : st.closedCells()) {
                double x = ox + c.x() * s;
                double y = oy + c.y() * s;
                g.strokeRect(x + 1, y + 1, s - 2, s - 2);
                g.strokeLine(x + 2, y + 2, x + s - 2, y + s - 2);
                g.strokeLine(x + s - 2, y + 2, x + 2, y + s - 2);
            }
        }
    }

    /** The disturbance markers (filled once they happened) and their labels where {@link MapLabels} placed them. */
    private static void paintEvents(GraphicsContext g, ViewReplay replay, int step, MapLabels labels, double ox,
                                    double oy, double s) {
        Map<Cell, Integer> firstStep = new HashMap<>();
        for (ViewStep st : replay.steps()) {
            if (st.hasEvent()) {
                firstStep.putIfAbsent(eventCell(st), st.step());
            }
        }
        double r = MapLabels.markerRadius(s);
        for (Map.Entry<Cell, Integer> en : firstStep.entrySet()) {
            Cell where = en.getKey();
            double cx = ox + (where.x() + 0.78) * s;
            double cy = oy + (where.y() + 0.22) * s;
            double[] xs = {cx, cx + r, cx, cx - r};
            double[] ys = {cy - r, cy, cy + r, cy};
            g.setFill(en.getValue() <= step ? Palette.EVENT : Color.WHITE);
            g.fillPolygon(xs, ys, 4);
            g.setStroke(Palette.EVENT);
            g.setLineWidth(1.5);
            g.strokePolygon(xs, ys, 4);
        }
        for (MapLabels.Box b : labels.boxes(MapLabels.Kind.EVENT)) {
            g.setFill(Color.WHITE.deriveColor(0, 1, 1, 0.85));
            g.fillRect(ox + b.x(), oy + b.y(), b.w(), b.h());
            g.setFont(MapLabels.font(b.font()));
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.setFill(Palette.EVENT.darker());
            g.fillText(b.text(), ox + b.x() + 3, oy + b.y() + b.h() / 2);
        }
    }

    /** {@code 40, 41 drag} when the kinds agree, else {@code 40 drag, 52 slip}. */
    static String eventLabel(List<ViewStep> here) {
        boolean same = here.stream().map(ViewStep::event).distinct().count() == 1;
        StringBuilder sb = new StringBuilder();
        for (ViewStep st : here) {
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(st.step());
            if (!same) {
                sb.append(' ').append(eventWord(st.event()));
            }
        }
        if (same) {
            sb.append(' ').append(eventWord(here.get(0).event()));
        }
        return sb.toString();
    }

    /** Where an event is marked: the cell it concerns, else the cell the robot tried to enter. */
    static Cell eventCell(ViewStep st) {
        if (st.eventCell() != null) {
            return st.eventCell();
        }
        if (st.action() != null && st.action().target() != null) {
            return st.action().target();
        }
        return st.cell();
    }

    static String eventWord(EventKind k) {
        return k == null ? "" : k.word();
    }

    static void paintRobot(GraphicsContext g, double x, double y, double s) {
        paintRobot(g, x, y, s, false);
    }

    /**
     * The robot: an orange disc with a dark rim and hub. Over a dock or the start it is drawn
     * smaller ({@link #ROBOT_SMALL} of the cell instead of {@link #ROBOT_FULL}), so that the dock's
     * green ring ({@code 0.74} of the cell) and the start's pennant stay visible around it.
     */
    static void paintRobot(GraphicsContext g, double x, double y, double s, boolean small) {
        double d = s * (small ? ROBOT_SMALL : ROBOT_FULL);
        double cx = x + s / 2;
        double cy = y + s / 2;
        disc(g, cx, cy, d, Palette.ROBOT);
        g.setStroke(Palette.ROBOT_EDGE);
        g.setLineWidth(Math.max(1.5, s / 14));
        g.strokeOval(cx - d / 2, cy - d / 2, d, d);
        disc(g, cx, cy, d * 0.22, Palette.ROBOT_EDGE);
    }

    static final double ROBOT_FULL = 0.56;
    static final double ROBOT_SMALL = 0.4;

    /** A filled disc of diameter {@code d} centred on (cx, cy). */
    private static void disc(GraphicsContext g, double cx, double cy, double d, Color fill) {
        g.setFill(fill);
        g.fillOval(cx - d / 2, cy - d / 2, d, d);
    }
}
