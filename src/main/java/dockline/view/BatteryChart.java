package dockline.view;

import dockline.arena.ActionKind;
import dockline.model.Mission;
import java.util.function.IntConsumer;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.shape.Circle;
import javafx.scene.shape.Line;
import javafx.scene.shape.Polygon;
import javafx.scene.shape.Rectangle;

/**
 * The battery level over the steps of a replay, in Wh, with the reserve floor as a dashed line, the
 * capacity as a dotted line, the charging steps and the disturbance events as marks and the current
 * step as a dot, and a legend of its own under the plot that names each of them. A click on the
 * plot asks for the step under the pointer ({@link #onStepPicked}). Animation is off so that the
 * picture is complete at once (also in a snapshot). Each battery point carries its exact unit count
 * as the data item's extra value. Showing another run, or none, clears every series first.
 */
final class BatteryChart {

    static final String BATTERY = "battery";
    static final String FLOOR = "reserve floor";
    static final String EVENTS = "disturbance";
    static final String NOW = "current step";
    static final String CAPACITY = "capacity";
    static final String CHARGING = "charging step";

    private final NumberAxis xAxis = new NumberAxis();
    private final NumberAxis yAxis = new NumberAxis();
    private final LineChart<Number, Number> chart = new LineChart<>(xAxis, yAxis);
    private final XYChart.Series<Number, Number> battery = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> floor = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> events = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> now = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> capacity = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> charging = new XYChart.Series<>();
    private final FlowPane legend = new FlowPane(12, 2);
    private final BorderPane box = new BorderPane();
    private ViewReplay replay;
    private Mission mission;
    private IntConsumer picked = s -> { };

    BatteryChart() {
        chart.setAnimated(false);
        chart.setId("battery-chart");
        chart.getStyleClass().add("battery-chart");
        chart.setCreateSymbols(true);
        chart.setLegendVisible(false);
        xAxis.setLabel("step");
        xAxis.setAnimated(false);
        xAxis.setForceZeroInRange(true);
        yAxis.setLabel("Wh");
        yAxis.setAnimated(false);
        battery.setName(BATTERY);
        floor.setName(FLOOR);
        events.setName(EVENTS);
        now.setName(NOW);
        chart.getData().add(battery);
        chart.getData().add(floor);
        chart.getData().add(events);
        chart.getData().add(now);
        capacity.setName(CAPACITY);
        charging.setName(CHARGING);
        chart.getData().add(capacity);
        chart.getData().add(charging);
        chart.setMinHeight(120);
        chart.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY && replay != null) {
                picked.accept(stepAtSceneX(e.getSceneX(), e.getSceneY()));
            }
        });
        Tooltip.install(chart, new Tooltip("click the chart to go to that step of the run"));
        buildLegend();
        box.setId("battery-chart-box");
        box.setCenter(chart);
        box.setBottom(legend);
        box.setMinHeight(140);
    }

    /** The chart with its legend under it. */
    Region node() {
        return box;
    }

    /** Told the step under the pointer when the plot is clicked. */
    void onStepPicked(IntConsumer c) {
        picked = c == null ? s -> { } : c;
    }

    /** The run's step nearest to the scene point's x on the step axis, clamped to the run. */
    int stepAtSceneX(double sceneX, double sceneY) {
        double x = xAxis.sceneToLocal(sceneX, sceneY).getX();
        Number v = xAxis.getValueForDisplay(x);
        int len = replay == null ? 0 : replay.length();
        return (int) Math.max(0, Math.min(len, Math.round(v.doubleValue())));
    }

    /** Where a step is drawn, in scene coordinates (x on the step axis, y in the middle of the plot). */
    javafx.geometry.Point2D sceneOfStep(int step) {
        double x = xAxis.getDisplayPosition(step);
        javafx.geometry.Point2D p = xAxis.localToScene(x, 0);
        javafx.geometry.Bounds plot = yAxis.localToScene(yAxis.getLayoutBounds());
        return new javafx.geometry.Point2D(p.getX(), (plot.getMinY() + plot.getMaxY()) / 2);
    }

    private void buildLegend() {
        legend.setId("battery-legend");
        legend.setAlignment(Pos.CENTER);
        legend.setPadding(new Insets(0, 8, 2, 8));
        Color battery = Color.web("#40308f");
        Color red = Color.web("#cf2139");
        Line b = new Line(0, 0, 18, 0);
        b.setStroke(battery);
        b.setStrokeWidth(2.5);
        Line f = new Line(0, 0, 18, 0);
        f.setStroke(red);
        f.setStrokeWidth(2);
        f.getStrokeDashArray().setAll(5.0, 3.0);
        Line c = new Line(0, 0, 18, 0);
        c.setStroke(Color.web("#5b636d"));
        c.setStrokeWidth(1.5);
        c.getStrokeDashArray().setAll(1.5, 3.0);
        Rectangle ch = new Rectangle(8, 8, Color.web("#2f8f4e"));
        Polygon d = new Polygon(5, 0, 10, 5, 5, 10, 0, 5);
        d.setFill(Color.WHITE);
        d.setStroke(red);
        d.setStrokeWidth(2);
        Circle n = new Circle(5, Color.web("#ff7a1a"));
        n.setStroke(Color.web("#3a1a00"));
        n.setStrokeWidth(2);
        legend.getChildren().setAll(entry(b, BATTERY), entry(f, FLOOR + " (dashed)"), entry(c, CAPACITY + " (dotted)"),
                entry(ch, CHARGING), entry(d, EVENTS), entry(n, NOW));
    }

    private static Label entry(Node swatch, String words) {
        Label l = new Label(words, swatch);
        l.getStyleClass().addAll("legend-label", "battery-legend-item");
        l.setMinWidth(Region.USE_PREF_SIZE);
        return l;
    }

    /** The words of the legend's entries, in order. */
    java.util.List<String> legendWords() {
        return legend.getChildren().stream().map(x -> ((Label) x).getText()).toList();
    }

    /** Shows a replay of a mission (or nothing when the replay is {@code null}). */
    void show(Mission m, ViewReplay r) {
        this.mission = m;
        this.replay = r;
        battery.getData().clear();
        floor.getData().clear();
        events.getData().clear();
        now.getData().clear();
        capacity.getData().clear();
        charging.getData().clear();
        if (m == null) {
            chart.setTitle("battery over the run (no mission)");
            return;
        }
        double capWh = Units.whValue(m, m.capacityUnits());
        yAxis.setAutoRanging(false);
        yAxis.setLowerBound(0);
        yAxis.setUpperBound(capWh);
        yAxis.setTickUnit(niceTick(capWh / 5));
        int len = r == null ? 1 : Math.max(1, r.length());
        xAxis.setAutoRanging(false);
        xAxis.setLowerBound(0);
        xAxis.setUpperBound(len);
        xAxis.setTickUnit(Math.max(1, niceTick(len / 10.0)));
        double floorWh = Units.whValue(m, m.reserveUnits());
        floor.getData().add(new XYChart.Data<>(0, floorWh));
        floor.getData().add(new XYChart.Data<>(len, floorWh));
        capacity.getData().add(new XYChart.Data<>(0, capWh));
        capacity.getData().add(new XYChart.Data<>(len, capWh));
        if (r == null) {
            chart.setTitle("battery over the run (no run to show)");
            return;
        }
        chart.setTitle("battery over the " + r.kind().word() + " (lowest " + Units.both(m, r.minimumUnits()) + ")"
                + (r.loops() ? "; from step " + r.loopStart() + " the lap repeats" : ""));
        for (ViewStep s : r.steps()) {
            XYChart.Data<Number, Number> d = new XYChart.Data<>(s.step(), Units.whValue(m, s.levelUnits()));
            d.setExtraValue(s.levelUnits());
            battery.getData().add(d);
            if (s.hasEvent()) {
                XYChart.Data<Number, Number> e = new XYChart.Data<>(s.step(), Units.whValue(m, s.levelUnits()));
                e.setExtraValue(s.levelUnits());
                events.getData().add(e);
            }
            if (s.action() != null && s.action().kind() == ActionKind.CHARGE) {
                XYChart.Data<Number, Number> c = new XYChart.Data<>(s.step(), Units.whValue(m, s.levelUnits()));
                c.setExtraValue(s.levelUnits());
                charging.getData().add(c);
            }
        }
        setStep(0);
    }

    /** Moves the current-step dot. */
    void setStep(int step) {
        now.getData().clear();
        if (replay == null || mission == null) {
            return;
        }
        int s = Math.max(0, Math.min(step, replay.length()));
        ViewStep vs = replay.steps().get(s);
        XYChart.Data<Number, Number> d = new XYChart.Data<>(s, Units.whValue(mission, vs.levelUnits()));
        d.setExtraValue(vs.levelUnits());
        now.getData().add(d);
    }

    /** The lowest battery level plotted, in units (from the points' extra values); -1 when empty. */
    int minimumUnits() {
        int min = Integer.MAX_VALUE;
        for (XYChart.Data<Number, Number> d : battery.getData()) {
            min = Math.min(min, (Integer) d.getExtraValue());
        }
        return min == Integer.MAX_VALUE ? -1 : min;
    }

    XYChart.Series<Number, Number> batterySeries() {
        return battery;
    }

    XYChart.Series<Number, Number> floorSeries() {
        return floor;
    }

    XYChart.Series<Number, Number> chargingSeries() {
        return charging;
    }

    XYChart.Series<Number, Number> capacitySeries() {
        return capacity;
    }

    /** 1, 2 or 5 times a power of ten, at least the raw value. */
    static double niceTick(double raw) {
        if (raw <= 0) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= raw) {
                return m * p;
            }
        }
        return 10 * p;
    }
}
