package dockline.view;

import dockline.model.Mission;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;

/**
 * The battery level over the steps of a replay, in Wh, with the reserve floor as a dashed line,
 * the disturbance events as marks and the current step as a dot. Animation is off so that the
 * picture is complete at once (also in a snapshot). Each battery point carries its exact unit
 * count as the data item's extra value.
 */
final class BatteryChart {

    static final String BATTERY = "battery";
    static final String FLOOR = "reserve floor";
    static final String EVENTS = "disturbance";
    static final String NOW = "current step";

    private final NumberAxis xAxis = new NumberAxis();
    private final NumberAxis yAxis = new NumberAxis();
    private final LineChart<Number, Number> chart = new LineChart<>(xAxis, yAxis);
    private final XYChart.Series<Number, Number> battery = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> floor = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> events = new XYChart.Series<>();
    private final XYChart.Series<Number, Number> now = new XYChart.Series<>();
    private ViewReplay replay;
    private Mission mission;

    BatteryChart() {
        chart.setAnimated(false);
        chart.setId("battery-chart");
        chart.getStyleClass().add("battery-chart");
        chart.setCreateSymbols(true);
        chart.setLegendVisible(true);
        xAxis.setLabel("step");
        xAxis.setAnimated(false);
        xAxis.setForceZeroInRange(true);
        yAxis.setLabel("battery (Wh)");
        yAxis.setAnimated(false);
        battery.setName(BATTERY);
        floor.setName(FLOOR);
        events.setName(EVENTS);
        now.setName(NOW);
        chart.getData().add(battery);
        chart.getData().add(floor);
        chart.getData().add(events);
        chart.getData().add(now);
        chart.setMinHeight(140);
    }

    LineChart<Number, Number> node() {
        return chart;
    }

    /** Shows a replay of a mission (or nothing when the replay is {@code null}). */
    void show(Mission m, ViewReplay r) {
        this.mission = m;
        this.replay = r;
        battery.getData().clear();
        floor.getData().clear();
        events.getData().clear();
        now.getData().clear();
        if (m == null) {
            chart.setTitle("battery over the run");
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
        if (r == null) {
            chart.setTitle("battery over the run (no run to show)");
            return;
        }
        chart.setTitle("battery over the " + r.kind().word() + " (lowest " + Units.both(m, r.minimumUnits()) + ")");
        for (ViewStep s : r.steps()) {
            XYChart.Data<Number, Number> d = new XYChart.Data<>(s.step(), Units.whValue(m, s.levelUnits()));
            d.setExtraValue(s.levelUnits());
            battery.getData().add(d);
            if (s.hasEvent()) {
                XYChart.Data<Number, Number> e = new XYChart.Data<>(s.step(), Units.whValue(m, s.levelUnits()));
                e.setExtraValue(s.levelUnits());
                events.getData().add(e);
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
