package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;

/**
 * The interactive map: a canvas that draws the current {@link MapLayers}, zooms (scroll wheel,
 * {@code +}/{@code -}, {@code 0} to fit) and pans (drag, arrow keys), and reports the cell under
 * the mouse. Redraws only on change; a redraw is O(visible cells).
 */
final class MapView extends Region {

    static final double MIN_CELL = 3;
    static final double MAX_CELL = 120;

    private final Canvas canvas = new Canvas();
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
        getChildren().add(canvas);
        setFocusTraversable(true);
        setMinSize(200, 150);
        setPrefSize(700, 480);
        setStyle("-fx-background-color: #eceae4;");
        layers.addListener((o, was, now) -> {
            if (was == null || now == null || was.map() != now.map()) {
                userMoved = false;
                lastW = -1;
                requestLayout();
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

    double originY() {
        return oy;
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
        ox = px - (px - ox) * f;
        oy = py - (py - oy) * f;
        cellPx = n;
        userMoved = true;
        redraw();
    }

    void pan(double dx, double dy) {
        ox += dx;
        oy += dy;
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
        ox = (w - cellPx * m.width()) / 2;
        oy = (h - cellPx * m.height()) / 2;
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
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
        }
        if (w != lastW || h != lastH) {
            lastW = w;
            lastH = h;
            if (!userMoved) {
                fit();
            }
        }
        redraw();
    }

    void redraw() {
        MapLayers l = layers.get();
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        if (w <= 0 || h <= 0) {
            return;
        }
        if (l == null) {
            canvas.getGraphicsContext2D().setFill(Palette.BACKGROUND);
            canvas.getGraphicsContext2D().fillRect(0, 0, w, h);
            return;
        }
        MapPainter.paint(canvas.getGraphicsContext2D(), l, ox, oy, cellPx, w, h);
    }
}
