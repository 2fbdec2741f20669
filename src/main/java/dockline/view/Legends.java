package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import java.util.function.Consumer;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/**
 * Keys for the map: surfaces (swatch with pattern and the map's own legend characters), symbols, the heat scale in Wh and
 * % of capacity with the impossible swatch, and the policy glyphs. Swatches are drawn by the same
 * {@link CellGlyphs} code as the map, so the key always matches the picture.
 */
final class Legends {

    private static final double SW = 22;

    private Legends() {
    }

    private static Canvas swatch(Consumer<GraphicsContext> draw) {
        Canvas c = new Canvas(SW, SW);
        GraphicsContext g = c.getGraphicsContext2D();
        g.setFill(Palette.BACKGROUND);
        g.fillRect(0, 0, SW, SW);
        draw.accept(g);
        g.setStroke(Palette.GRID);
        g.strokeRect(0.5, 0.5, SW - 1, SW - 1);
        return c;
    }

    private static HBox row(Node sw, String text) {
        Label l = new Label(text);
        l.getStyleClass().add("legend-label");
        l.setWrapText(true);
        HBox h = new HBox(6, sw, l);
        h.setAlignment(Pos.CENTER_LEFT);
        return h;
    }

    /**
     * The map's own legend characters for a key row, e.g. {@code  (map: D, F)}; nothing when there are none.
     * The key never invents a letter: a letter of our own could be a character the map uses for
     * something else (the demo maps use {@code C} for a dock).
     */
    static String own(String symbols) {
        return symbols.isEmpty() ? "" : " (map: " + Palette.listed(symbols) + ")";
    }

    /** Surface key and map symbols. */
    static VBox mapKey(BuildingMap map) {
        VBox box = new VBox(3);
        for (Palette.SurfaceStyle st : Palette.surfaces(map)) {
            box.getChildren().add(row(swatch(g -> CellGlyphs.paintSurface(g, st, 0, 0, SW)), st.surface() + own(st.symbols())));
        }
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintWall(g, 0, 0, SW)),
                "wall" + own(Palette.symbols(map, dockline.model.Terrain::wall))));
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintDock(g, 0, 0, SW)),
                "dock" + own(Palette.symbols(map, dockline.model.Terrain::dock))));
        box.getChildren().add(row(swatch(g -> {
            g.setFill(Palette.DOOR);
            g.fillRect(0, SW * 0.41, SW, SW * 0.18);
        }), "door" + own(Palette.symbols(map, t -> t.door() && !t.dock()))));
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintStart(g, 0, 0, SW)), "start"));
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintRobot(g, 0, 0, SW)), "robot"));
        box.getChildren().add(row(swatch(g -> {
            g.setFill(Palette.EVENT);
            double c = SW / 2;
            double r = SW * 0.3;
            g.fillPolygon(new double[] {c, c + r, c, c - r}, new double[] {c - r, c, c + r, c}, 4);
        }), "disturbance (step, kind)"));
        box.getChildren().add(row(swatch(g -> {
            g.setStroke(Palette.PATH);
            g.setLineWidth(3);
            g.strokeLine(2, SW / 2, SW - 2, SW / 2);
        }), "run (walked solid, ahead dashed)"));
        return box;
    }

    /**
     * Heat scale from {@code lo} (the reserve floor) to {@code hi} (the most any cell needs), ticks
     * in Wh and % of capacity, plus the impossible swatch.
     */
    static VBox heatKey(Mission m, int lo, int hi) {
        return heatKey(m, lo, hi, null, false);
    }

    /**
     * As {@link #heatKey(Mission, int, int)}; with a {@code note} (the heat layer is not exact everywhere,
     * {@link ViewData#heatNote}) also the note, and with {@code ranged} the "at most" mark of a cell whose need
     * is known only as a range.
     */
    static VBox heatKey(Mission m, int lo, int hi, String note, boolean ranged) {
        VBox box = exactHeatKey(m, lo, hi);
        if (ranged) {
            box.getChildren().add(row(swatch(g2 -> CellGlyphs.paintHeatRange(g2, hi, lo, hi, 0, 0, SW)),
                    "at most: the colour is enough charge (a sure upper bound); the need may be lower"));
        }
        if (note != null) {
            Label words = new Label(note);
            words.getStyleClass().add("legend-label");
            words.setWrapText(true);
            words.setId("heat-note");
            box.getChildren().add(words);
        }
        return box;
    }

    private static VBox exactHeatKey(Mission m, int lo, int hi) {
        VBox box = new VBox(3);
        Label title = new Label("charge needed to finish safely");
        title.getStyleClass().add("legend-label");
        box.getChildren().add(title);
        double w = 150;
        double h = 14;
        Canvas bar = new Canvas(w, h);
        GraphicsContext g = bar.getGraphicsContext2D();
        for (int i = 0; i < w; i++) {
            g.setFill(Palette.heat(i / (w - 1)));
            g.fillRect(i, 0, 1, h);
        }
        g.setStroke(Palette.GLYPH);
        g.strokeRect(0.5, 0.5, w - 1, h - 1);
        box.getChildren().add(bar);
        VBox ticks = new VBox(0);
        String[] where = {"left end", "middle", "right end"};
        long[] at = {lo, lo + (long) (hi - lo) / 2, hi};
        for (int i = 0; i < at.length; i++) {
            Label l = new Label(where[i] + ": " + Units.both(m, at[i]));
            l.getStyleClass().add("legend-label");
            ticks.getChildren().add(l);
        }
        box.getChildren().add(ticks);
        box.getChildren().add(row(swatch(g2 -> CellGlyphs.paintHeatCell(g2, ViewData.IMPOSSIBLE, lo, hi, 0, 0, SW)),
                "impossible: no charge is enough"));
        return box;
    }

    /** Policy glyphs. */
    static VBox policyKey() {
        VBox box = new VBox(3);
        Cell c = new Cell(0, 0);
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintAction(g, new Action(ActionKind.MOVE, new Cell(1, 0)), 0, 0, 0, 0, SW)), "move"));
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintAction(g, new Action(ActionKind.WAIT, c), 0, 0, 0, 0, SW)), "wait"));
        box.getChildren().add(row(swatch(g -> CellGlyphs.paintAction(g, new Action(ActionKind.CHARGE, c), 0, 0, 0, 0, SW)), "charge"));
        box.getChildren().add(row(swatch(g -> {
            CellGlyphs.paintAction(g, new Action(ActionKind.MOVE, new Cell(1, 0)), 0, 0, 0, 0, SW);
            CellGlyphs.paintVaries(g, 0, 0, SW);
        }), "the move depends on the battery level (the most frequent is drawn)"));
        Label none = new Label("no glyph: the policy never gets there in that situation (or only with more"
                + " charge than shown). At a level between two of the policy's rows the move of the row below is drawn:"
                + " more charge never hurts. Point at a cell for its levels in words.");
        none.getStyleClass().add("legend-label");
        none.setWrapText(true);
        box.getChildren().add(none);
        box.setPadding(new Insets(2, 0, 0, 0));
        return box;
    }
}
