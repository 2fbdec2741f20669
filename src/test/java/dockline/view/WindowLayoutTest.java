package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.LogRecord;
import java.util.logging.Logger;
import java.util.stream.Stream;
import javafx.geometry.Point2D;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window at 1280 x 800, headless, against the test stand-in analyzer: nothing cut off without a
 * tooltip holding the full text, replay buttons that stay put, the chart's legend and its click, what a
 * state change must clear, the progress per cent, the picture export, and the start-up warning filter.
 */
@ExtendWith(ApplicationExtension.class)
class WindowLayoutTest {

    @TempDir
    static Path tmp;

    private final FakeAnalyzer analyzer = new FakeAnalyzer();
    private MissionWindow window;
    private Mission mission;

    @Start
    void start(Stage stage) throws Exception {
        Path missionFile = FxTests.standInFile(tmp);
        mission = TestMissions.twoRooms();
        Path mapFile = tmp.resolve("floor.yaml");
        Files.writeString(mapFile, "# stand-in map\n");
        MissionSource src = p -> p.equals(mapFile) ? new MissionSource.Opened(p, null, mission.map())
                : new MissionSource.Opened(p, mission, mission.map());
        window = new MissionWindow(analyzer, src, null);
        FxTests.show(stage, window, 1280, 800);
        window.open(missionFile);
    }

    @AfterEach
    void stop() throws Exception {
        analyzer.release = true;
        FxTests.dispose(window);
    }

    /** The text the label draws (its skin's text node): shorter than the label's text when cut off with "...". */
    private static String drawn(Label l) {
        return fx(() -> ((Text) l.lookup(".text")).getText());
    }

    @Test
    void the_run_box_the_step_label_and_the_notes_show_their_full_text_or_a_tooltip_with_it(FxRobot robot)
            throws Exception {
        waitUntil(() -> solved(window));
        @SuppressWarnings("unchecked")
        ComboBox<ViewReplay> runs = robot.lookup("#replay").queryAs(ComboBox.class);
        assertThat(fx(() -> runs.getTooltip().getText())).isEqualTo(fx(() -> runs.getValue().title()));
        for (int i = 0; i < 4; i++) {
            robot.clickOn("#step-forward");
        }
        WaitForAsyncUtils.waitForFxEvents();
        for (String id : List.of("#step-label", "#replay-notes", "#verdict", "#figures", "#certificate")) {
            Label l = robot.lookup(id).queryAs(Label.class);
            String full = fx(l::getText);
            assertThat(full).as(id).isNotEmpty();
            assertThat(fx(() -> l.getTooltip().getText())).as(id + " tooltip").isEqualTo(full);
            // wrapped, not cut off: the skin draws every character (a cut-off label draws an ellipsis instead)
            assertThat(drawn(l).replaceAll("\\s+", " ").trim()).as(id + " drawn").isEqualTo(full.replaceAll("\\s+", " ").trim());
        }
        assertThat(fx(() -> robot.lookup("#step-label").queryAs(Label.class).getText())).startsWith("step 4 of ");
    }

    @Test
    void the_replay_buttons_stay_where_they_are_while_the_step_text_changes(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        List<String> ids = List.of("#step-back", "#play", "#step-forward");
        double[] before = xs(robot, ids);
        Label step = robot.lookup("#step-label").queryAs(Label.class);
        String first = fx(step::getText);
        for (int i = 0; i < 5; i++) {
            robot.clickOn("#step-forward");
            WaitForAsyncUtils.waitForFxEvents();
            assertThat(xs(robot, ids)).containsExactly(before);
        }
        assertThat(fx(step::getText)).isNotEqualTo(first);
        robot.clickOn("#play");
        WaitForAsyncUtils.waitForFxEvents();
        Button play = robot.lookup("#play").queryAs(Button.class);
        assertThat(fx(play::getText)).contains("Pa_use");
        // the longer "Pause" still fits its fixed width: drawn whole, not cut off
        assertThat(fx(() -> ((Text) play.lookup(".text")).getText())).isEqualTo(fx(play::getText).replace("_", ""));
        assertThat(xs(robot, ids)).containsExactly(before);
        robot.clickOn("#play");
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(xs(robot, ids)).containsExactly(before);
    }

    private static double[] xs(FxRobot robot, List<String> ids) {
        return fx(() -> ids.stream().mapToDouble(id -> {
            Node n = robot.lookup(id).query();
            return n.localToScene(0, 0).getX();
        }).toArray());
    }

    @Test
    void the_chart_has_a_legend_of_floor_capacity_charging_and_disturbances_and_a_click_goes_to_that_step(FxRobot robot)
            throws Exception {
        waitUntil(() -> solved(window));
        List<String> words = fx(() -> window.chart().legendWords());
        assertThat(words).contains("reserve floor (dashed)", "capacity (dotted)", "charging step", "disturbance",
                "battery", "current step");
        assertThat(robot.lookup("#battery-legend").lookup(".battery-legend-item").queryAll()).hasSize(6);
        // the capacity line is drawn at the capacity
        double capWh = fx(() -> window.chart().capacitySeries().getData().get(0).getYValue().doubleValue());
        assertThat(capWh).isEqualTo(mission.scale().toWh(mission.capacityUnits()).doubleValue());
        int target = fx(() -> window.dataProperty().get().replays().get(0).length()) / 2;
        assertThat(target).isPositive();
        Point2D scene = fx(() -> window.chart().sceneOfStep(target));
        Point2D screen = fx(() -> window.root().getScene().getRoot().localToScreen(scene));
        robot.clickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(target);
        assertThat(fx(() -> robot.lookup("#step-label").queryAs(Label.class).getText())).startsWith("step " + target + " of ");
    }

    @Test
    void a_map_alone_after_a_mission_leaves_no_battery_line_and_a_recheck_clears_the_scenario_message(FxRobot robot)
            throws Exception {
        waitUntil(() -> solved(window));
        robot.interact(() -> robot.lookup("#force-add").queryButton().fire());
        robot.interact(() -> robot.lookup("#force-run").queryButton().fire());
        WaitForAsyncUtils.waitForFxEvents();
        Label status = robot.lookup("#status").queryAs(Label.class);
        assertThat(fx(status::getText)).startsWith("scenario added");
        robot.clickOn("#check");
        waitUntil(() -> solved(window) && analyzer.calls >= 2);
        assertThat(fx(status::getText)).doesNotContain("scenario added");

        assertThat(fx(() -> window.chart().batterySeries().getData().size())).isPositive();
        robot.interact(() -> window.open(tmp.resolve("floor.yaml")));
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(() -> window.dataProperty().get())).isNull();
        assertThat(fx(() -> window.chart().batterySeries().getData())).isEmpty();
        assertThat(fx(() -> window.chart().floorSeries().getData())).isEmpty();
        assertThat(fx(() -> window.chart().chargingSeries().getData())).isEmpty();
        assertThat(fx(() -> robot.lookup("#step-label").queryAs(Label.class).getText())).isEqualTo("no run to play");
        @SuppressWarnings("unchecked")
        ComboBox<ViewReplay> runs = robot.lookup("#replay").queryAs(ComboBox.class);
        assertThat(fx(() -> runs.getItems())).isEmpty();
        assertThat(fx(() -> window.mapView().layers().replay())).isNull();
    }

    @Test
    void a_running_check_shows_its_per_cent(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        analyzer.slow = true;
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        robot.interact(() -> reserve.setText("30"));
        robot.clickOn("#check");
        Label st = robot.lookup("#solve-status").queryAs(Label.class);
        waitUntil(() -> fx(() -> st.getText().startsWith("40 %")));
        assertThat(fx(st::getText)).isEqualTo("40 % \u2014 halfway through the stand-in");
        assertThat(fx(() -> robot.lookup("#solving").queryAs(javafx.scene.control.ProgressBar.class).getProgress()))
                .isEqualTo(0.4, org.assertj.core.data.Offset.offset(1e-9));
        analyzer.release = true;
        waitUntil(() -> solved(window) && window.dataProperty().get().mission().reserveUnits() == 120);
        assertThat(fx(st::getText)).startsWith("checked with reserve 30%");
    }

    @Test
    void the_picture_is_exported_as_a_png_that_decodes(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        robot.clickOn("#step-forward");
        Path dir = Files.createDirectories(tmp.resolve("pictures"));
        Path out = dir.resolve("floor.png");
        assertThat(fx(() -> window.exportPicture(out))).isTrue();
        // decoded by the JDK's own PNG reader, a general-purpose library outside the project
        BufferedImage img = ImageIO.read(out.toFile());
        assertThat(img).isNotNull();
        assertThat(img.getWidth()).isGreaterThanOrEqualTo(480);
        assertThat(img.getHeight()).isGreaterThan(200);
        try (Stream<Path> files = Files.list(dir)) {
            // written atomically: the picture, and no temporary file left beside it
            assertThat(files.map(p -> p.getFileName().toString()).toList()).containsExactly("floor.png");
        }
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText())).startsWith("picture exported to");
        // a folder in the way: refused in words, nothing written
        assertThat(fx(() -> window.exportPicture(dir))).isFalse();
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText())).startsWith("could not export");
    }

    @Test
    void the_unnamed_module_warning_is_dropped_at_its_logger_and_other_javafx_warnings_are_not() {
        FxRuntime.quietUnnamedModuleWarning();
        Logger log = Logger.getLogger("javafx");
        List<String> seen = new java.util.concurrent.CopyOnWriteArrayList<>();
        Handler h = new Handler() {
            @Override
            public void publish(LogRecord r) {
                seen.add(r.getMessage()); // the logger's filter runs before its handlers
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        log.addHandler(h);
        boolean parents = log.getUseParentHandlers();
        log.setUseParentHandlers(false);
        try {
            log.log(Level.WARNING, "Unsupported JavaFX configuration: classes were loaded from 'unnamed module @1a2b'");
            log.log(Level.WARNING, "some other JavaFX warning");
        } finally {
            log.removeHandler(h);
            log.setUseParentHandlers(parents);
        }
        assertThat(seen).containsExactly("some other JavaFX warning");
    }
}
