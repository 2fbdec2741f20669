package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import java.nio.file.Path;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window on a demo mission with the real loader and solver, headless: what it shows must be
 * what the solver computed (verdict, heat map under the pointer, replay, chart).
 */
class DemoMissionWindowTest extends RealWindowCase {

    private static final Path MISSION = Path.of("missions/night-round.yaml");

    @Start
    void start(Stage stage) {
        open(stage, 1180, 780, MISSION);
    }

    private boolean solvedWithReserve(int units) {
        return fx(() -> window.taskProperty().get() == null && window.dataProperty().get() != null
                && window.dataProperty().get().solved() && window.dataProperty().get().mission().reserveUnits() == units);
    }

    @Test
    void the_demo_verdict_and_the_heat_map_under_the_pointer_are_the_solvers(FxRobot robot) throws Exception {
        Mission m = dockline.io.MissionLoader.load(MISSION);
        waitUntil(() -> solvedWithReserve(m.reserveUnits()));
        ViewData d = fx(() -> window.dataProperty().get());
        // missions/README.md lists this demo as guaranteed
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.GUARANTEED);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("Guaranteed");
        // the start cell needs no more than the starting charge (else the verdict could not be "guaranteed")
        int w = m.map().width();
        int need = d.chargeNeeded(m.start().index(w), m.map().disturbances().budget(), ProgressChoices.initialMask(m));
        assertThat(need).isBetween(m.reserveUnits(), m.startUnits());
        // the pointer over the start cell shows that figure
        MapView mv = window.mapView();
        Cell c = m.start();
        double[] p = fx(() -> mv.centreOf(c));
        robot.moveTo(mv, javafx.geometry.Pos.TOP_LEFT, new javafx.geometry.Point2D(p[0], p[1]),
                org.testfx.robot.Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(robot.lookup("#cell-info").queryAs(Label.class).getText())
                .contains("cell " + c).contains("charge needed from here: " + Units.both(m, need));
    }

    @Test
    void stepping_the_certified_worst_case_moves_the_robot_and_the_chart_shows_its_minimum(FxRobot robot) throws Exception {
        Mission m = dockline.io.MissionLoader.load(MISSION);
        waitUntil(() -> solvedWithReserve(m.reserveUnits()));
        ViewData d = fx(() -> window.dataProperty().get());
        assertThat(d.verdict().certificate()).startsWith("passed");
        ViewReplay worst = d.replays().get(0);
        assertThat(worst.kind()).isEqualTo(ViewReplay.Kind.WORST_CASE);
        int n = Math.min(5, worst.length());
        for (int i = 0; i < n; i++) {
            robot.clickOn("#step-forward");
        }
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(() -> window.player().step())).isEqualTo(n);
        assertThat(fx(() -> window.mapView().layers().robotCell())).isEqualTo(worst.steps().get(n).cell());
        assertThat(robot.lookup("#step-label").queryAs(Label.class).getText()).startsWith("step " + n + " of " + worst.length());
        // the chart plots the replay; its lowest point is the solver's worst-case minimum
        assertThat(fx(() -> window.chart().minimumUnits())).isEqualTo(d.verdict().worstCaseMinimumUnits().getAsInt());
        // playing runs to the end and stops there
        javafx.scene.control.Slider speed = robot.lookup("#speed").queryAs(javafx.scene.control.Slider.class);
        robot.interact(() -> speed.setValue(speed.getMax()));
        robot.clickOn("#play");
        waitUntil(() -> fx(() -> window.player().step() == worst.length() && !window.player().playingProperty().get()));
        assertThat(fx(() -> window.mapView().layers().robotCell())).isEqualTo(worst.steps().get(worst.length()).cell());
    }

    @Test
    void a_forced_door_shut_scenario_is_added_to_the_runs(FxRobot robot) throws Exception {
        Mission m = dockline.io.MissionLoader.load(MISSION);
        waitUntil(() -> solvedWithReserve(m.reserveUnits()));
        ViewData d = fx(() -> window.dataProperty().get());
        assertThat(d.canForce()).isTrue();
        // force the event the worst case itself suffers, at its step: the forced run must replay it
        ViewStep ev = d.replays().get(0).steps().stream().filter(ViewStep::hasEvent).findFirst().orElseThrow();
        ViewReplay forced = d.force(java.util.List.of(new ScenarioEvent(ev.step(), ev.event(),
                ev.event() == dockline.model.EventKind.SLIP ? ev.cell() : null))).orElseThrow();
        assertThat(forced.kind()).isEqualTo(ViewReplay.Kind.FORCED);
        assertThat(forced.steps().get(ev.step()).event()).isEqualTo(ev.event());
        // the same through the window's controls: the scenario joins the runs and is shown
        @SuppressWarnings("unchecked")
        javafx.scene.control.ChoiceBox<dockline.model.EventKind> kind = robot.lookup("#force-kind").queryAs(javafx.scene.control.ChoiceBox.class);
        @SuppressWarnings("unchecked")
        javafx.scene.control.Spinner<Integer> at = robot.lookup("#force-step").queryAs(javafx.scene.control.Spinner.class);
        robot.interact(() -> {
            kind.setValue(ev.event());
            at.getValueFactory().setValue(ev.step());
        });
        if (ev.event() == dockline.model.EventKind.SLIP) {
            TextField to = robot.lookup("#force-slip-to").queryAs(TextField.class);
            robot.interact(() -> to.setText(ev.cell().toString()));
        }
        robot.interact(() -> robot.lookup("#force-add").queryButton().fire());
        robot.interact(() -> robot.lookup("#force-run").queryButton().fire());
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        javafx.scene.control.ComboBox<ViewReplay> runs = robot.lookup("#replay").queryAs(javafx.scene.control.ComboBox.class);
        assertThat(fx(() -> runs.getValue().kind())).isEqualTo(ViewReplay.Kind.FORCED);
        assertThat(fx(() -> window.chart().minimumUnits())).isEqualTo(fx(() -> runs.getValue().minimumUnits()));
        // an event where it cannot happen is refused in words
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> d.force(java.util.List.of(
                new ScenarioEvent(1, dockline.model.EventKind.BLOCKAGE, null)))).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void a_reserve_above_the_starting_charge_is_refused_with_the_reason_as_the_command_line_does(FxRobot robot)
            throws Exception {
        Mission m = dockline.io.MissionLoader.load(MISSION);
        waitUntil(() -> solvedWithReserve(m.reserveUnits()));
        ViewData before = fx(() -> window.dataProperty().get());
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        robot.interact(() -> reserve.setText("90"));
        robot.clickOn("#check");
        WaitForAsyncUtils.waitForFxEvents();
        // the mission starts at 80 %: a floor of 90 % is an input mistake, not a question for the solver
        Label st = robot.lookup("#solve-status").queryAs(Label.class);
        assertThat(fx(st::getText)).contains("the reserve floor (54 Wh)").contains("is above the starting charge (48 Wh)")
                .contains("hint:");
        assertThat(fx(() -> window.taskProperty().get())).isNull();
        assertThat(fx(() -> window.dataProperty().get())).isSameAs(before);
        // the command line refuses the same override with exit code 2 (bad input)
        assertThat(dockline.cli.Main.run("check", "--reserve", "90%", MISSION.toString())).isEqualTo(2);
    }
}
