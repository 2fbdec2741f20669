package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Opening files (mission, map alone, broken file), the recent-files list, and keyboard shortcuts. */
@ExtendWith(ApplicationExtension.class)
class WindowFilesAndKeysTest {

    @TempDir
    static Path tmp;

    private MissionWindow window;
    private Path store;

    @Start
    void start(Stage stage) throws Exception {
        store = Files.createTempDirectory(tmp, "home").resolve(".dockline/recent-files.txt");
        window = new MissionWindow(new FakeAnalyzer(), new FileMissionSource(), store);
        FxTests.show(stage, window, 1180, 780);
    }

    @AfterEach
    void stop() throws Exception {
        FxTests.dispose(window);
    }

    @Test
    void a_mission_file_opens_is_remembered_and_is_never_written() throws Exception {
        Path mission = Path.of("missions/night-round.yaml");
        FileTime before = Files.getLastModifiedTime(mission);
        byte[] content = Files.readAllBytes(mission);
        assertThat(fx(() -> window.open(mission))).isTrue();
        waitUntil(() -> solved(window));
        assertThat(fx(() -> window.recentFiles())).containsExactly(mission.toAbsolutePath().normalize());
        assertThat(Files.readString(store)).contains(mission.toAbsolutePath().normalize().toString());
        assertThat(Files.getLastModifiedTime(mission)).isEqualTo(before);
        assertThat(Files.readAllBytes(mission)).isEqualTo(content);
        // a second window reads the same list back
        RecentFiles again = new RecentFiles(store);
        assertThat(again.files()).containsExactly(mission.toAbsolutePath().normalize());
    }

    @Test
    void a_map_opened_alone_is_drawn_without_a_verdict(FxRobot robot) throws Exception {
        assertThat(fx(() -> window.open(Path.of("maps/clinic-wing.yaml")))).isTrue();
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("Map only");
        assertThat(fx(() -> window.mapView().layers())).isNotNull();
        assertThat(fx(() -> window.mapView().layers().map().name())).isNotBlank();
        assertThat(robot.lookup("#check").queryButton().isDisabled()).isTrue();
    }

    @Test
    void a_broken_file_shows_every_problem_and_keeps_the_mission_shown(FxRobot robot) throws Exception {
        assertThat(fx(() -> window.open(Path.of("missions/night-round.yaml")))).isTrue();
        waitUntil(() -> solved(window));
        ViewData shown = fx(() -> window.dataProperty().get());
        Path bad = tmp.resolve("broken.yaml");
        Files.writeString(bad, "name: broken\nmap: nowhere.yaml\nrobot: 3\n");
        assertThat(fx(() -> window.open(bad))).isFalse();
        WaitForAsyncUtils.waitForFxEvents();
        String text = robot.lookup("#notice-text").queryAs(Label.class).getText();
        assertThat(text).contains("Could not open broken.yaml").containsPattern("broken\\.yaml:\\d+:\\d+: ");
        assertThat(fx(() -> window.dataProperty().get())).isSameAs(shown);
    }

    @Test
    void shortcuts_switch_the_overlay_and_start_a_check(FxRobot robot) throws Exception {
        assertThat(fx(() -> window.open(Path.of("missions/night-round.yaml")))).isTrue();
        waitUntil(() -> solved(window));
        ViewData first = fx(() -> window.dataProperty().get());
        robot.clickOn("#map");
        robot.push(KeyCode.CONTROL, KeyCode.DIGIT3);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(() -> window.mapView().layers().overlay())).isEqualTo(Overlay.POLICY);
        robot.push(KeyCode.CONTROL, KeyCode.DIGIT1);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(() -> window.mapView().layers().overlay())).isEqualTo(Overlay.PLAIN);
        robot.push(KeyCode.F5);
        waitUntil(() -> solved(window) && fx(() -> window.dataProperty().get()) != first);
    }

    @Test
    void the_map_pans_by_dragging_and_zooms_by_scrolling(FxRobot robot) throws Exception {
        assertThat(fx(() -> window.open(Path.of("missions/night-round.yaml")))).isTrue();
        waitUntil(() -> solved(window));
        MapView mv = window.mapView();
        double x0 = fx(mv::originX);
        robot.drag("#map").moveBy(60, 0).drop();
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(mv::originX)).isGreaterThan(x0 + 30);
        double s0 = fx(mv::cellPx);
        robot.moveTo("#map").scroll(3, javafx.geometry.VerticalDirection.UP);
        WaitForAsyncUtils.waitForFxEvents();
        double s1 = fx(mv::cellPx);
        assertThat(s1).isNotEqualTo(s0);
    }

    @Test
    void the_map_zooms_and_pans_with_keys(FxRobot robot) throws Exception {
        assertThat(fx(() -> window.open(Path.of("missions/night-round.yaml")))).isTrue();
        waitUntil(() -> solved(window));
        MapView mv = window.mapView();
        double s0 = fx(mv::cellPx);
        robot.clickOn("#map");
        robot.type(KeyCode.PLUS);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(mv::cellPx)).isGreaterThan(s0);
        double x0 = fx(mv::originX);
        robot.type(KeyCode.LEFT);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(mv::originX)).isGreaterThan(x0);
        robot.type(KeyCode.DIGIT0);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(mv::cellPx)).isEqualTo(s0);
    }
}
