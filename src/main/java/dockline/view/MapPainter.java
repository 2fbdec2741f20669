package dockline.view;

import dockline.arena.Action;
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
import javafx.scene.text.TextAlignment;

/**
 * Draws a {@link MapLayers} snapshot in two parts. The static part ({@link #paintStatic}): surfaces
 * (colour, pattern and the map's own legend character), walls (hatched), the heat map, the grid,
 * doors, docks, the start cell, zone outlines and the placed words of {@link MapLabels}. The dynamic
 * part ({@link #paintDynamic}): the replay path, closures, policy glyphs (above the path), the
 * disturbance markers and their labels, the robot (dock and start stay visible under it) and the
 * hovered cell. The window keeps the static part in images and redraws only the dynamic part on a
 * replay step or a hover; {@code render} draws both onto one canvas ({@link #paint}). The symbols
 * inside one cell are {@link CellGlyphs}, shared with the map's key.
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
                        CellGlyphs.paintWallHatch(g, px, py, s);
                    } else {
                        CellGlyphs.paintSurfaceMarks(g, styles.get(t.surface()), row.charAt(x), px, py, s);
                    }
                }
            }
        }
        // 2. heat overlay
        if (layers.hasHeat()) {
            for (int y = y0; y <= y1; y++) {
                for (int x = x0; x <= x1; x++) {
                    int hv = layers.heat(y * w + x);
                    if (layers.heatRanged(y * w + x)) {
                        CellGlyphs.paintHeatRange(g, hv, layers.heatLow(), layers.heatHigh(), ox + x * s, oy + y * s, s);
                        continue;
                    }
                    if (hv == ViewData.UNKNOWN) {
                        continue;
                    }
                    CellGlyphs.paintHeatCell(g, hv, layers.heatLow(), layers.heatHigh(), ox + x * s, oy + y * s, s);
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
                    CellGlyphs.paintDoor(g, map, c, ox + x * s, oy + y * s, s);
                }
                if (t.dock()) {
                    CellGlyphs.paintDock(g, ox + x * s, oy + y * s, s);
                }
            }
        }
        if (layers.start() != null) {
            CellGlyphs.paintStart(g, ox + layers.start().x() * s, oy + layers.start().y() * s, s);
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
        paintWord(g, b, ox, oy, ink);
    }

    /** A placed word's text in {@code ink}, left-aligned inside its box and centred in its height. */
    private static void paintWord(GraphicsContext g, MapLabels.Box b, double ox, double oy, Color ink) {
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
                            CellGlyphs.paintActionWithHalo(g, a, x, y, ox + x * s, oy + y * s, s);
                        } else {
                            CellGlyphs.paintAction(g, a, x, y, ox + x * s, oy + y * s, s);
                        }
                        if (layers.policyVaries(y * w + x)) {
                            CellGlyphs.paintVaries(g, ox + x * s, oy + y * s, s);
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
            CellGlyphs.paintRobot(g, ox + robot.x() * s, oy + robot.y() * s, s, onDock || onStart);
            if (onStart) {
                CellGlyphs.paintStart(g, ox + robot.x() * s, oy + robot.y() * s, s);
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
            paintWord(g, b, ox, oy, Palette.EVENT.darker());
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
}
