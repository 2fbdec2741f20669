package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The window, headless (TestFX + Monocle, no X server), against the test stand-in analyzer. */
@ExtendWith(ApplicationExtension.class)
class MissionWindowTest {

    @TempDir
    static Path tmp;

    private final FakeAnalyzer analyzer = new FakeAnalyzer();
    private MissionWindow window;
    private Path missionFile;

    @Start
    void start(Stage stage) throws Exception {
        missionFile = FxTests.standInFile(tmp);
        window = FxTests.show(stage, new MissionWindow(analyzer, FxTests.always(TestMissions.twoRooms()), null), 1180,
                780);
        window.open(missionFile);
    }

    @org.junit.jupiter.api.AfterEach
    void stop() throws Exception {
        analyzer.release = true;
        FxTests.dispose(window);
    }

    @Test
    void opening_a_mission_solves_it_and_shows_the_verdict_in_words(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        Label v = robot.lookup("#verdict").queryAs(Label.class);
        assertThat(v.getText()).startsWith("Guaranteed");
        assertThat(robot.lookup("#certificate").queryAs(Label.class).getText()).startsWith("Certificate:");
        assertThat(robot.lookup("#caveats").tryQuery()).isPresent();
    }

    @Test
    void raising_the_reserve_rechecks_and_changes_the_verdict(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        TextField start = robot.lookup("#start-charge").queryAs(TextField.class);
        robot.interact(() -> {
            reserve.setText("95");
            start.setText("100");
        });
        robot.clickOn("#check");
        waitUntil(() -> solved(window) && window.dataProperty().get().mission().reserveUnits() == 380);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("Not guaranteed");
    }

    @Test
    void a_bad_reserve_is_refused_with_a_message_and_nothing_is_solved(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        int before = analyzer.calls;
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        robot.interact(() -> reserve.setText("lots"));
        robot.clickOn("#check");
        Label st = robot.lookup("#solve-status").queryAs(Label.class);
        waitUntil(() -> fx(() -> st.getText().startsWith("the reserve floor")));
        assertThat(st.getText()).contains("'lots'").contains("a charge is written e.g. 20% or 15 Wh");
        assertThat(analyzer.calls).isEqualTo(before);
    }

    @Test
    void stepping_the_replay_moves_the_robot_to_the_replay_cell(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        ViewReplay r = window.dataProperty().get().replays().get(0);
        assertThat(r.length()).isGreaterThanOrEqualTo(3);
        int n = 3;
        for (int i = 0; i < n; i++) {
            robot.clickOn("#step-forward");
        }
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(n);
        assertThat(window.mapView().layers().robotCell()).isEqualTo(r.steps().get(n).cell());
        robot.clickOn("#step-back");
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.mapView().layers().robotCell()).isEqualTo(r.steps().get(n - 1).cell());
        assertThat(robot.lookup("#step-label").queryAs(Label.class).getText()).startsWith("step " + (n - 1) + " of ");
    }

    @Test
    void keyboard_steps_the_replay(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        robot.clickOn("#map");
        robot.type(KeyCode.F8);
        robot.type(KeyCode.F8);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(2);
        robot.type(KeyCode.F6);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(1);
    }

    @Test
    void the_chart_minimum_is_the_worst_case_minimum(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        VerdictSummary v = window.dataProperty().get().verdict();
        assertThat(v.worstCaseMinimumUnits()).isPresent();
        assertThat(window.chart().minimumUnits()).isEqualTo(v.worstCaseMinimumUnits().getAsInt());
        // the floor line is drawn at the reserve floor
        double floorWh = window.chart().floorSeries().getData().get(0).getYValue().doubleValue();
        Mission m = window.dataProperty().get().mission();
        assertThat(floorWh).isEqualTo(m.scale().toWh(m.reserveUnits()).doubleValue());
    }

    @Test
    void cancelling_a_long_check_keeps_the_previous_result_and_the_window_responsive(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        ViewData before = window.dataProperty().get();
        String verdictBefore = robot.lookup("#verdict").queryAs(Label.class).getText();
        analyzer.slow = true;
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        robot.interact(() -> reserve.setText("85"));
        robot.clickOn("#check");
        waitUntil(() -> fx(() -> window.taskProperty().get() != null && window.taskProperty().get().isRunning()));
        // responsive while solving: the replay still steps and the overlay still switches
        robot.clickOn("#step-forward");
        robot.clickOn("#overlay-policy");
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(1);
        assertThat(window.mapView().layers().overlay()).isEqualTo(Overlay.POLICY);
        robot.clickOn("#cancel");
        waitUntil(() -> window.taskProperty().get() == null);
        assertThat(window.dataProperty().get()).isSameAs(before);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).isEqualTo(verdictBefore);
        assertThat(robot.lookup("#solve-status").queryAs(Label.class).getText()).contains("cancelled");
        analyzer.slow = false;
    }

    @Test
    void hovering_a_cell_tells_its_coordinates_surface_zones_and_charge_needed(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        MapView mv = window.mapView();
        Cell c = new Cell(7, 2);
        double[] p = mv.centreOf(c);
        robot.moveTo(mv, javafx.geometry.Pos.TOP_LEFT, new javafx.geometry.Point2D(p[0], p[1]),
                org.testfx.robot.Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        String info = robot.lookup("#cell-info").queryAs(Label.class).getText();
        assertThat(info).contains("cell 7:2").contains("carpet").contains("reading-room").contains("charge needed from here:")
                .contains("Wh");
    }

    @Test
    void a_changed_mission_file_is_offered_for_reload_and_never_written(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        String content = Files.readString(missionFile);
        Files.setLastModifiedTime(missionFile, FileTime.fromMillis(Files.getLastModifiedTime(missionFile).toMillis() + 5000));
        FileTime stamp = Files.getLastModifiedTime(missionFile);
        boolean offered = fx(() -> window.checkFilesChanged());
        assertThat(offered).isTrue();
        assertThat(robot.lookup("#reload-yes").tryQuery()).isPresent();
        robot.clickOn("#reload-yes");
        waitUntil(() -> solved(window));
        assertThat(robot.lookup("#reload-yes").tryQuery()).isEmpty();
        assertThat(Files.readString(missionFile)).isEqualTo(content);
        assertThat(Files.getLastModifiedTime(missionFile)).isEqualTo(stamp);
    }

    private static boolean fx(java.util.concurrent.Callable<Boolean> c) {
        try {
            return WaitForAsyncUtils.asyncFx(c).get(10, TimeUnit.SECONDS);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }
}
