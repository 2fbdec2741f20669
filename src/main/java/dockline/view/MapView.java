package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.Map;
import javafx.scene.Group;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.ImageView;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import javafx.scene.shape.Rectangle;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;

/**
 * The interactive map: draws the current {@link MapLayers}, zooms (scroll wheel, {@code +}/{@code -},
 * {@code 0} to fit) and pans (drag, arrow keys), and reports the cell under the mouse.
 *
 * <p>Two layers. The static one (surfaces, walls, heat map, symbols, zones, words: see
 * {@link MapPainter#paintStatic}) is drawn once per zoom into images of {@value #TILE} × {@value #TILE}
 * pixels, only for the tiles that come into view, and kept; panning moves the tiles (a translation)
 * and draws only tiles not drawn before at that zoom; the last {@value #PICTURES_KEPT} pictures (per
 * zoom level and layer: the heat values, or none) are kept, so zooming back or switching the layer
 * back costs nothing. Another map drops them all. The dynamic layer (path, robot, events, policy glyphs, hover:
 * {@link MapPainter#paintDynamic}) is one transparent canvas over the visible part of the map, redrawn on every change
 * in O(visible cells + replay length). {@link #staticRepaints()} counts the tiles drawn, for tests.
 */
final class MapView extends Region {

    static final double MIN_CELL = 3;
    static final double MAX_CELL = 120;
    /** Edge of one static tile in pixels. */
    static final int TILE = 512;
    /** Static pictures (one per zoom level and layer: with or without a heat map, heat values) kept. */
    static final int PICTURES_KEPT = 4;
    /** Tiles kept per picture (1 MB each); the ones farthest from the view go first. */
    static final int TILES_KEPT = 24;

    /** The static images of one zoom: its tiles by (column, row) and its placed words. */
    private static final class StaticLevel {
        final MapLayers source;
        final double cellPx;
        final MapLabels labels;
        final Map<Long, ImageView> tiles = new HashMap<>();
        MapLabels withEvents;
        ViewReplay eventsOf;

        StaticLevel(MapLayers source, double cellPx) {
            this.source = source;
            this.cellPx = cellPx;
            this.labels = MapLabels.of(source.map(), source.start(), cellPx);
        }
    }

    private final Canvas canvas = new Canvas();
    private final Group tileLayer = new Group();
    private final Canvas tileCanvas = new Canvas(TILE, TILE);
    /** The static pictures kept, least recently used first. */
    private final java.util.List<StaticLevel> levels = new ArrayList<>();
    private StaticLevel current;
    private long staticRepaints;
    private long dynamicRepaints;
    private final ObjectProperty<MapLayers> layers = new SimpleObjectProperty<>(this, "layers");
    private final ReadOnlyObjectWrapper<Cell> hover = new ReadOnlyObjectWrapper<>(this, "hoverCell");
    private double cellPx = 24;
    private double ox;
    private double oy;
    /** The user zoomed or panned: keep the view when the area is resized; else re-fit. */
    private boolean userMoved;
    private double lastW = -1;
    private double lastH = -1;
    private double dragX;
    private double dragY;
    private boolean dragged;

    MapView() {
        setId("map");
        canvas.setMouseTransparent(true);
        tileLayer.setMouseTransparent(true);
        tileLayer.setManaged(false);
        canvas.setManaged(false);
        getChildren().addAll(tileLayer, canvas);
        Rectangle clip = new Rectangle();
        clip.widthProperty().bind(widthProperty());
        clip.heightProperty().bind(heightProperty());
        setClip(clip);
        setFocusTraversable(true);
        setMinSize(200, 150);
        setPrefSize(700, 480);
        setStyle("-fx-background-color: #eceae4;");
        layers.addListener((o, was, now) -> {
            if (now != null && was != null && now.map() != was.map()) {
                dropStatic(); // another map: none of the images can come back
            }
            if (was == null || now == null || was.map() != now.map()) {
                // a new map is fitted by the next layout, which draws it: drawing it now at the old zoom is waste
                userMoved = false;
                lastW = -1;
                requestLayout();
                return;
            }
            redraw();
        });
        addEventHandler(ScrollEvent.SCROLL, e -> {
            if (e.getDeltaY() != 0) {
                zoomAt(e.getDeltaY() > 0 ? 1.15 : 1 / 1.15, e.getX(), e.getY());
            }
            e.consume();
        });
        addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            requestFocus();
            dragX = e.getX();
            dragY = e.getY();
            dragged = false;
        });
        addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            pan(e.getX() - dragX, e.getY() - dragY);
            dragX = e.getX();
            dragY = e.getY();
            dragged = true;
            updateHover(e.getX(), e.getY());
        });
        addEventHandler(MouseEvent.MOUSE_MOVED, e -> updateHover(e.getX(), e.getY()));
        addEventHandler(MouseEvent.MOUSE_EXITED, e -> setHover(null));
        addEventHandler(KeyEvent.KEY_PRESSED, this::onKey);
    }

    private void onKey(KeyEvent e) {
        double step = Math.max(20, cellPx * 2);
        switch (e.getCode()) {
            case LEFT -> pan(step, 0);
            case RIGHT -> pan(-step, 0);
            case UP -> pan(0, step);
            case DOWN -> pan(0, -step);
            case PLUS, EQUALS, ADD -> zoomIn();
            case MINUS, SUBTRACT -> zoomOut();
            case DIGIT0, NUMPAD0 -> fit();
            default -> {
                return;
            }
        }
        e.consume();
    }

    ObjectProperty<MapLayers> layersProperty() {
        return layers;
    }

    MapLayers layers() {
        return layers.get();
    }

    ReadOnlyObjectProperty<Cell> hoverCellProperty() {
        return hover.getReadOnlyProperty();
    }

    double cellPx() {
        return cellPx;
    }

    double originX() {
        return ox;
    }

    boolean wasDragged() {
        return dragged;
    }

    void zoomIn() {
        zoomAt(1.25, getWidth() / 2, getHeight() / 2);
    }

    void zoomOut() {
        zoomAt(1 / 1.25, getWidth() / 2, getHeight() / 2);
    }

    /** Zooms by the factor, keeping the map point under (px, py) in place. */
    void zoomAt(double factor, double px, double py) {
        double n = Math.max(MIN_CELL, Math.min(MAX_CELL, cellPx * factor));
        double f = n / cellPx;
        ox = Math.rint(px - (px - ox) * f);
        oy = Math.rint(py - (py - oy) * f);
        cellPx = n;
        userMoved = true;
        redraw();
    }

    void pan(double dx, double dy) {
        ox = Math.rint(ox + dx);
        oy = Math.rint(oy + dy);
        userMoved = true;
        redraw();
    }

    /** Scales and centres the whole map in the view. */
    void fit() {
        MapLayers l = layers.get();
        double w = getWidth();
        double h = getHeight();
        if (l == null || w <= 0 || h <= 0) {
            return;
        }
        BuildingMap m = l.map();
        cellPx = Math.max(MIN_CELL, Math.min(MAX_CELL, Math.min((w - 16) / m.width(), (h - 16) / m.height())));
        ox = Math.rint((w - cellPx * m.width()) / 2);
        oy = Math.rint((h - cellPx * m.height()) / 2);
        userMoved = false;
        redraw();
    }

    /** The cell under a point of this view, or {@code null} off the map. */
    Cell cellAt(double x, double y) {
        MapLayers l = layers.get();
        if (l == null) {
            return null;
        }
        int cx = (int) Math.floor((x - ox) / cellPx);
        int cy = (int) Math.floor((y - oy) / cellPx);
        Cell c = new Cell(cx, cy);
        return l.map().inside(c) ? c : null;
    }

    /** The centre of a cell in this view's coordinates. */
    double[] centreOf(Cell c) {
        return new double[] {ox + (c.x() + 0.5) * cellPx, oy + (c.y() + 0.5) * cellPx};
    }

    private void updateHover(double x, double y) {
        setHover(cellAt(x, y));
    }

    private void setHover(Cell c) {
        hover.set(c);
        MapLayers l = layers.get();
        if (l != null) {
            MapLayers n = l.withHover(c);
            if (n != l) {
                layers.set(n);
            }
        }
    }

    @Override
    protected void layoutChildren() {
        double w = getWidth();
        double h = getHeight();
        if (w != lastW || h != lastH) {
            lastW = w;
            lastH = h;
            if (!userMoved) {
                fit();
            }
        }
        redraw();
    }

    /** Tiles of the static layer drawn so far (for tests and the view benchmark). */
    long staticRepaints() {
        return staticRepaints;
    }

    /** Redraws of the dynamic layer so far. */
    long dynamicRepaints() {
        return dynamicRepaints;
    }

    /** Forgets every static image, so that the next redraw draws the visible tiles again (the benchmark's full repaint). */
    void dropStatic() {
        levels.clear();
        current = null;
        tileLayer.getChildren().clear();
    }

    void redraw() {
        MapLayers l = layers.get();
        double w = getWidth();
        double h = getHeight();
        if (w <= 0 || h <= 0) {
            return;
        }
        GraphicsContext g = canvas.getGraphicsContext2D();
        if (l == null) {
            g.clearRect(0, 0, canvas.getWidth(), canvas.getHeight());
            tileLayer.setVisible(false);
            return;
        }
        tileLayer.setVisible(true);
        StaticLevel level = staticLevel(l);
        tileLayer.setTranslateX(ox);
        tileLayer.setTranslateY(oy);
        showTiles(level, l, w, h);
        if (level.eventsOf != l.replay() || level.withEvents == null) {
            level.withEvents = MapPainter.eventLabels(l, level.labels);
            level.eventsOf = l.replay();
        }
        // the dynamic canvas covers only the visible part of the map: less to clear and to composite
        double x0 = Math.max(0, ox);
        double y0 = Math.max(0, oy);
        double cw = Math.max(1, Math.ceil(Math.min(w, ox + l.map().width() * cellPx) - x0));
        double ch = Math.max(1, Math.ceil(Math.min(h, oy + l.map().height() * cellPx) - y0));
        if (canvas.getWidth() != cw || canvas.getHeight() != ch) {
            canvas.setWidth(cw);
            canvas.setHeight(ch);
        }
        canvas.setLayoutX(x0);
        canvas.setLayoutY(y0);
        g.clearRect(0, 0, cw, ch);
        MapPainter.paintDynamic(g, l, level.withEvents, ox - x0, oy - y0, cellPx, cw, ch);
        dynamicRepaints++;
    }

    /** The static images for the current zoom and static picture, made (empty) when there are none yet. */
    private StaticLevel staticLevel(MapLayers l) {
        if (current != null && current.cellPx == cellPx && l.sameStaticAs(current.source)) {
            return current;
        }
        StaticLevel level = null;
        for (Iterator<StaticLevel> it = levels.iterator(); it.hasNext(); ) {
            StaticLevel c = it.next();
            if (c.cellPx == cellPx && l.sameStaticAs(c.source)) {
                level = c;
                it.remove();
                break;
            }
        }
        if (level == null) {
            level = new StaticLevel(l, cellPx);
        }
        levels.add(level);
        while (levels.size() > PICTURES_KEPT) {
            levels.remove(0);
        }
        current = level;
        tileLayer.getChildren().setAll(level.tiles.values());
        return level;
    }

    /** Draws the tiles that are in view and not drawn yet; drops far ones over {@link #TILES_KEPT}. */
    private void showTiles(StaticLevel level, MapLayers l, double w, double h) {
        double mapW = l.map().width() * cellPx;
        double mapH = l.map().height() * cellPx;
        int cols = (int) Math.ceil(mapW / TILE);
        int rows = (int) Math.ceil(mapH / TILE);
        int c0 = Math.max(0, (int) Math.floor(-ox / TILE));
        int r0 = Math.max(0, (int) Math.floor(-oy / TILE));
        int c1 = Math.min(cols - 1, (int) Math.floor((w - ox) / TILE));
        int r1 = Math.min(rows - 1, (int) Math.floor((h - oy) / TILE));
        for (int r = r0; r <= r1; r++) {
            for (int c = c0; c <= c1; c++) {
                long key = ((long) r << 32) | c;
                if (!level.tiles.containsKey(key)) {
                    ImageView iv = drawTile(level, c, r, Math.min(TILE, mapW - c * TILE), Math.min(TILE, mapH - r * TILE));
                    level.tiles.put(key, iv);
                    tileLayer.getChildren().add(iv);
                }
            }
        }
        if (level.tiles.size() > TILES_KEPT) {
            double cx = (w / 2 - ox) / TILE;
            double cy = (h / 2 - oy) / TILE;
            java.util.List<Long> keys = new ArrayList<>(level.tiles.keySet());
            keys.sort((a, b) -> Double.compare(dist(b, cx, cy), dist(a, cx, cy)));
            for (int i = 0; i < keys.size() - TILES_KEPT; i++) {
                tileLayer.getChildren().remove(level.tiles.remove(keys.get(i)));
            }
        }
    }

    private static double dist(long key, double cx, double cy) {
        double c = (int) key + 0.5;
        double r = (int) (key >>> 32) + 0.5;
        return Math.hypot(c - cx, r - cy);
    }

    private ImageView drawTile(StaticLevel level, int col, int row, double tw, double th) {
        int iw = (int) Math.ceil(tw);
        int ih = (int) Math.ceil(th);
        GraphicsContext g = tileCanvas.getGraphicsContext2D();
        g.clearRect(0, 0, TILE, TILE);
        MapPainter.paintStatic(g, level.source, level.labels, -col * (double) TILE, -row * (double) TILE, level.cellPx,
                iw, ih);
        SnapshotParameters p = new SnapshotParameters();
        p.setFill(Color.TRANSPARENT);
        p.setViewport(new javafx.geometry.Rectangle2D(0, 0, iw, ih));
        WritableImage img = tileCanvas.snapshot(p, new WritableImage(iw, ih));
        ImageView iv = new ImageView(img);
        iv.setLayoutX(col * (double) TILE);
        iv.setLayoutY(row * (double) TILE);
        staticRepaints++;
        return iv;
    }
}
