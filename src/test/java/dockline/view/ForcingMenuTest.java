package dockline.view;

import static dockline.view.FxTests.fx;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.geometry.Point2D;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.MenuItem;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * A right-click on a cell where two events may strike (a door that may shut inside a drag zone) asks
 * which one to force, and forces the one picked. Against the test stand-in analyzer, whose run never
 * passes that door, so the answer is that there is nothing to force after the current step.
 */
@ExtendWith(ApplicationExtension.class)
class ForcingMenuTest {

    private static final Cell DOOR = new Cell(5, 3);

    private MissionWindow window;

    /** The two-room floor with a drag rule over the door too (invented demo data). */
    private static Mission mission() {
        Mission m = TestMissions.twoRooms();
        BuildingMap map = m.map();
        List<EventRule> rules = new ArrayList<>(map.disturbances().rules());
        rules.add(new EventRule(EventKind.DRAG, "door mat", List.of(DOOR), new BigDecimal("0.5")));
        BuildingMap withMat = new BuildingMap(map.name(), null, map.cellSizeMetres(), map.rows(), map.legend(), map.zones(),
                java.util.Map.of(DOOR, "D1"), new DisturbanceModel(map.disturbances().budget(), rules));
        return new Mission(m.name(), null, withMat, m.robot(), m.start(), m.startCharge(), m.reserve(), m.tasks(),
                m.objective());
    }

    @Start
    void start(Stage stage) {
        Mission m = mission();
        window = FxTests.show(stage, new MissionWindow(new FakeAnalyzer(), FxTests.always(m), null), 1280, 800);
        window.open(java.nio.file.Path.of("mat.yaml"));
    }

    @AfterEach
    void stop() throws Exception {
        FxTests.dispose(window);
    }

    @Test
    void two_events_on_one_cell_are_offered_in_a_menu_and_the_one_picked_is_forced(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> fx(() -> window.taskProperty().get() == null
                && window.dataProperty().get() != null && window.dataProperty().get().solved()));
        WaitForAsyncUtils.waitForFxEvents();
        double[] p = fx(() -> window.mapView().centreOf(DOOR));
        Point2D screen = fx(() -> window.mapView().localToScreen(p[0], p[1]));
        robot.moveTo(screen);
        robot.clickOn(MouseButton.SECONDARY);
        WaitForAsyncUtils.waitForFxEvents();
        ContextMenu menu = fx(() -> Window.getWindows().stream().filter(w -> w instanceof ContextMenu && w.isShowing())
                .map(w -> (ContextMenu) w).findFirst().orElse(null));
        assertThat(menu).isNotNull();
        List<String> items = fx(() -> menu.getItems().stream().map(MenuItem::getText).toList());
        assertThat(items).containsExactly("Force door-shut (door D1) here", "Force drag (door mat) here");
        robot.interact(() -> {
            menu.getItems().get(1).fire();
            menu.hide();
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText()))
                .startsWith("the robot's run does not try to enter the drag zone 'door mat' after step 0");
    }
}
