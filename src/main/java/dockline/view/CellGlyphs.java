package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;

/**
 * The symbols drawn inside one cell of {@code s} pixels with its top-left corner at ({@code x},
 * {@code y}): walls (hatched), surface patterns with the map's own legend character, heat cells, doors,
 * docks, the start's pennant, the policy's glyphs and the robot. Shared by the map ({@link MapPainter})
 * and its key ({@link Legends}), so the key always shows what the map draws. Each call is O(1).
 */
final class CellGlyphs {

    private CellGlyphs() {
    }
    static void paintWall(GraphicsContext g, double x, double y, double s) {
        g.setFill(Palette.WALL);
        g.fillRect(x, y, s, s);
        if (s >= 6) {
            paintWallHatch(g, x, y, s);
        }
    }

    /** The wall's hatch, inside the cell (lines cut to the square: no clip, which is slow). */
    static void paintWallHatch(GraphicsContext g, double x, double y, double s) {
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

    /**
     * A cell whose need is known only as a range: the colour of its upper bound (enough charge; none when no level
     * is known to be enough, {@link ViewData#UNKNOWN}) and a light corner triangle with a dark edge, the key's
     * "at most" mark.
     */
    static void paintHeatRange(GraphicsContext g, int upper, int lo, int hi, double x, double y, double s) {
        if (upper != ViewData.UNKNOWN) {
            paintHeatCell(g, upper, lo, hi, x, y, s);
        }
        double m = Math.max(3, s * 0.4);
        g.setFill(Palette.IMPOSSIBLE_MARK);
        g.fillPolygon(new double[] {x, x + m, x}, new double[] {y, y, y + m}, 3);
        g.setStroke(Palette.IMPOSSIBLE);
        g.setLineWidth(Math.max(1, s / 16));
        g.strokeLine(x + m, y, x, y + m);
    }

    /** A door: a bar across the cell between its two walls, with the frames at its ends. */
    static void paintDoor(GraphicsContext g, BuildingMap map, Cell c, double x, double y, double s) {
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
