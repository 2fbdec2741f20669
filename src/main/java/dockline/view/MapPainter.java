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
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;

/**
 * Draws a {@link MapLayers} snapshot onto a canvas: surfaces (colour, pattern and letter), walls
 * (hatched), the overlay (heat map or policy glyphs), zones with their names, doors, docks, the
 * start cell, the replay path with its disturbance events, the robot, and the hovered cell.
 *
 * <p>Only the cells inside the visible rectangle are drawn: O(visible cells + replay length).
 */
final class MapPainter {

    private MapPainter() {
    }

    /**
     * Paints the layers with the map's top-left corner at ({@code ox}, {@code oy}) and cells of
     * {@code s} pixels, clipped to a {@code width} × {@code height} canvas.
     */
    static void paint(GraphicsContext g, MapLayers layers, double ox, double oy, double s, double width, double height) {
        BuildingMap map = layers.map();
        int w = map.width();
        int h = map.height();
        g.save();
        g.setFill(Palette.BACKGROUND);
        g.fillRect(0, 0, width, height);
        int x0 = clamp((int) Math.floor(-ox / s), 0, w - 1);
        int y0 = clamp((int) Math.floor(-oy / s), 0, h - 1);
        int x1 = clamp((int) Math.ceil((width - ox) / s), 0, w - 1);
        int y1 = clamp((int) Math.ceil((height - oy) / s), 0, h - 1);

        Map<String, Palette.SurfaceStyle> styles = new HashMap<>();
        for (Palette.SurfaceStyle st : Palette.surfaces(map)) {
            styles.put(st.surface(), st);
        }
        // 1. base: surfaces and walls
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                Cell c = new Cell(x, y);
                Terrain t = map.terrainAt(c);
                double px = ox + x * s;
                double py = oy + y * s;
                if (t.wall()) {
                    paintWall(g, px, py, s);
                } else {
                    paintSurface(g, styles.get(t.surface()), px, py, s);
                }
            }
        }
        // 2. heat overlay
        if (layers.hasHeat()) {
            for (int y = y0; y <= y1; y++) {
                for (int x = x0; x <= x1; x++) {
                    int v = layers.heat(y * w + x);
                    if (v == ViewData.UNKNOWN) {
                        continue;
                    }
                    paintHeatCell(g, v, layers.heatLow(), layers.heatHigh(), ox + x * s, oy + y * s, s);
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
        // 5. zones: outlines, then names
        List<Zone> zones = map.zones();
        for (int i = 0; i < zones.size(); i++) {
            paintZoneOutline(g, map, zones.get(i), Palette.zone(i), ox, oy, s);
        }
        paintZoneNames(g, map, ox, oy, s);
        // 6. policy glyphs
        if (layers.overlay() == Overlay.POLICY) {
            for (int y = y0; y <= y1; y++) {
                for (int x = x0; x <= x1; x++) {
                    Action a = layers.policy(y * w + x);
                    if (a != null) {
                        paintAction(g, a, x, y, ox + x * s, oy + y * s, s);
                        if (layers.policyVaries(y * w + x)) {
                            paintVaries(g, ox + x * s, oy + y * s, s);
                        }
                    }
                }
            }
        }
        // 7. replay path, events, robot
        if (layers.replay() != null) {
            paintReplay(g, layers.replay(), layers.step(), ox, oy, s);
        }
        Cell robot = layers.robotCell();
        if (robot != null) {
            paintRobot(g, ox + robot.x() * s, oy + robot.y() * s, s);
        }
        // 8. hover
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
            g.save();
            clip(g, x, y, s, s);
            g.setStroke(Palette.WALL_HATCH);
            g.setLineWidth(Math.max(1, s / 14));
            double step = Math.max(4, s / 3);
            for (double d = -s; d < s; d += step) {
                g.strokeLine(x + d, y + s, x + d + s, y);
            }
            g.restore();
        }
    }

    /** A surface: fill, then its pattern, then (when large enough) its letter. */
    static void paintSurface(GraphicsContext g, Palette.SurfaceStyle st, double x, double y, double s) {
        g.setFill(st.fill());
        g.fillRect(x, y, s, s);
        Color ink = st.fill().deriveColor(0, 1.0, 0.62, 1.0);
        g.save();
        clip(g, x, y, s, s);
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
                for (double d = -s; d < s; d += s / 3) {
                    g.strokeLine(x + d, y + s, x + d + s, y);
                }
            }
            case BACK_DIAGONAL -> {
                for (double d = -s; d < s; d += s / 3) {
                    g.strokeLine(x + d, y, x + d + s, y + s);
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
                for (double d = -s; d < s; d += s / 2.5) {
                    g.strokeLine(x + d, y + s, x + d + s, y);
                    g.strokeLine(x + d, y, x + d + s, y + s);
                }
            }
            case GRID -> {
                g.strokeLine(x + 2 * q, y, x + 2 * q, y + s);
                g.strokeLine(x, y + 2 * q, x + s, y + 2 * q);
            }
        }
        g.restore();
        if (s >= 22) {
            g.setFill(ink);
            g.setFont(Font.font("DejaVu Sans", FontWeight.BOLD, s * 0.26));
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.TOP);
            g.fillText(String.valueOf(st.letter()), x + s * 0.06, y + s * 0.03);
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

    private static void paintZoneOutline(GraphicsContext g, BuildingMap map, Zone z, Color colour, double ox, double oy, double s) {
        g.setStroke(colour);
        g.setLineWidth(Math.max(1.5, s / 10));
        g.setLineDashes(Math.max(3, s / 4), Math.max(2, s / 8));
        double in = Math.max(1, s / 14);
        for (Cell c : z.cells()) {
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

    /**
     * Zone names on tags, each at the first cell of its zone (row-major) whose tag does not
     * overlap a tag already placed; the first cell when every place overlaps. O(zones × cells).
     */
    private static void paintZoneNames(GraphicsContext g, BuildingMap map, double ox, double oy, double s) {
        double size = Math.max(9, Math.min(15, s * 0.42));
        Font font = Font.font("DejaVu Sans", FontWeight.BOLD, size);
        List<double[]> placed = new java.util.ArrayList<>();
        List<Zone> zones = map.zones();
        for (int i = 0; i < zones.size(); i++) {
            Zone z = zones.get(i);
            if (z.cells().isEmpty()) {
                continue;
            }
            Text probe = new Text(z.name());
            probe.setFont(font);
            double tw = probe.getLayoutBounds().getWidth() + 8;
            double th = probe.getLayoutBounds().getHeight() + 2;
            double[] rect = null;
            for (Cell c : z.cells()) {
                double[] r = {ox + c.x() * s + 2, oy + c.y() * s + 2, tw, th};
                if (placed.stream().noneMatch(p -> overlaps(p, r))) {
                    rect = r;
                    break;
                }
            }
            if (rect == null) {
                Cell c = z.cells().get(0);
                rect = new double[] {ox + c.x() * s + 2, oy + c.y() * s + 2, tw, th};
            }
            placed.add(rect);
            Color col = Palette.zone(i);
            g.setFill(col.deriveColor(0, 1, 1, 0.9));
            g.fillRoundRect(rect[0], rect[1], tw, th, 6, 6);
            g.setFill(Palette.textOn(col));
            g.setFont(font);
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.TOP);
            g.fillText(z.name(), rect[0] + 4, rect[1] + 1);
        }
    }

    private static boolean overlaps(double[] a, double[] b) {
        return a[0] < b[0] + b[2] && b[0] < a[0] + a[2] && a[1] < b[1] + b[3] && b[1] < a[1] + a[3];
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

    /** The replay path (walked part solid, rest dashed), its disturbance events, numbered by step. */
    private static void paintReplay(GraphicsContext g, ViewReplay replay, int step, double ox, double oy, double s) {
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
        double size = Math.max(9, Math.min(13, s * 0.36));
        Font font = Font.font("DejaVu Sans", FontWeight.BOLD, size);
        // one marker per cell; its label lists the steps and kinds there, e.g. "40, 41 drag"
        Map<Cell, List<ViewStep>> byCell = new java.util.LinkedHashMap<>();
        for (ViewStep st : steps) {
            if (st.hasEvent()) {
                byCell.computeIfAbsent(eventCell(st), c -> new java.util.ArrayList<>()).add(st);
            }
        }
        List<double[]> placed = new java.util.ArrayList<>();
        for (Map.Entry<Cell, List<ViewStep>> en : byCell.entrySet()) {
            Cell where = en.getKey();
            List<ViewStep> here = en.getValue();
            double cx = ox + (where.x() + 0.78) * s;
            double cy = oy + (where.y() + 0.22) * s;
            double r = Math.max(5, s * 0.22);
            boolean happened = here.get(0).step() <= step;
            double[] xs = {cx, cx + r, cx, cx - r};
            double[] ys = {cy - r, cy, cy + r, cy};
            g.setFill(happened ? Palette.EVENT : Color.WHITE);
            g.fillPolygon(xs, ys, 4);
            g.setStroke(Palette.EVENT);
            g.setLineWidth(1.5);
            g.strokePolygon(xs, ys, 4);
            String label = eventLabel(here);
            Text probe = new Text(label);
            probe.setFont(font);
            double tw = probe.getLayoutBounds().getWidth() + 4;
            double th = size * 1.3;
            double[] rect = {cx + r + 1, cy - th / 2, tw, th};
            for (int tries = 0; tries < 6 && overlapsAny(placed, rect); tries++) {
                rect[1] += th + 1; // below the one in the way
            }
            placed.add(rect);
            g.setFill(Color.WHITE.deriveColor(0, 1, 1, 0.85));
            g.fillRect(rect[0], rect[1], rect[2], rect[3]);
            g.setFont(font);
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.setFill(Palette.EVENT.darker());
            g.fillText(label, rect[0] + 2, rect[1] + th / 2);
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

    private static boolean overlapsAny(List<double[]> placed, double[] r) {
        for (double[] p : placed) {
            if (overlaps(p, r)) {
                return true;
            }
        }
        return false;
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
        double d = s * 0.56;
        double cx = x + s / 2;
        double cy = y + s / 2;
        disc(g, cx, cy, d, Palette.ROBOT);
        g.setStroke(Palette.ROBOT_EDGE);
        g.setLineWidth(Math.max(1.5, s / 14));
        g.strokeOval(cx - d / 2, cy - d / 2, d, d);
        disc(g, cx, cy, d * 0.22, Palette.ROBOT_EDGE);
    }

    /** A filled disc of diameter {@code d} centred on (cx, cy). */
    private static void disc(GraphicsContext g, double cx, double cy, double d, Color fill) {
        g.setFill(fill);
        g.fillOval(cx - d / 2, cy - d / 2, d, d);
    }

    private static void clip(GraphicsContext g, double x, double y, double w, double h) {
        g.beginPath();
        g.rect(x, y, w, h);
        g.closePath();
        g.clip();
    }
}
