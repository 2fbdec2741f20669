package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import java.util.List;
import javafx.geometry.Point2D;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Forcing a disturbance by pointing, with the real solver: a right-click on a door the robot is about
 * to pass shuts it there, the door rule being lasting it stays shut, and the forced run joins the run
 * list. The floor is {@link TestMissions#twoDoorsLasting} (invented demo data): two doors between the
 * rooms, one event at most, so a shut door leaves the other way.
 */
@ExtendWith(ApplicationExtension.class)
class ForcingWindowTest {

    private MissionWindow window;
    private final Mission mission = TestMissions.twoDoorsLasting();

    @Start
    void start(Stage stage) {
        window = FxTests.show(stage, new MissionWindow(new SolverAnalyzer(), FxTests.always(mission), null), 1280, 800);
        window.open(java.nio.file.Path.of("two-doors.yaml"));
    }

    @AfterEach
    void stop() throws Exception {
        FxTests.dispose(window);
    }

    /** The door cell the run's first move into a door enters, and the step of that move. */
    private static int[] firstDoorMove(Mission m, ViewReplay r) {
        for (ViewStep st : r.steps()) {
            if (st.action() != null && st.action().kind() == ActionKind.MOVE && m.map().terrainAt(st.action().target()).door()) {
                return new int[] {st.action().target().x(), st.action().target().y(), st.step()};
            }
        }
        return null;
    }

    private void rightClick(FxRobot robot, Cell c) {
        double[] p = fx(() -> window.mapView().centreOf(c));
        Point2D screen = fx(() -> window.mapView().localToScreen(p[0], p[1]));
        robot.moveTo(screen);
        robot.clickOn(MouseButton.SECONDARY);
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void right_clicking_a_door_ahead_shuts_it_there_for_good_and_adds_the_forced_run(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        ViewData d = fx(() -> window.dataProperty().get());
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.GUARANTEED);
        @SuppressWarnings("unchecked")
        ComboBox<ViewReplay> runs = robot.lookup("#replay").queryAs(ComboBox.class);
        ViewReplay nominal = d.replays().stream().filter(r -> r.kind() == ViewReplay.Kind.NOMINAL).findFirst().orElseThrow();
        robot.interact(() -> runs.setValue(nominal));
        int[] door = firstDoorMove(mission, nominal);
        assertThat(door).as("the run with no disturbance goes through a door").isNotNull();
        Cell c = new Cell(door[0], door[1]);
        int before = fx(() -> runs.getItems().size());

        rightClick(robot, c);

        assertThat(fx(() -> runs.getItems().size())).isEqualTo(before + 1);
        ViewReplay forced = fx(runs::getValue);
        assertThat(forced.kind()).isEqualTo(ViewReplay.Kind.FORCED);
        assertThat(fx(() -> runs.getItems().get(runs.getItems().size() - 1))).isSameAs(forced);
        // the door shuts at the robot's move into it: same step as in the run with no disturbance
        ViewStep hit = forced.steps().get(door[2]);
        assertThat(hit.event()).isEqualTo(EventKind.DOOR_SHUT);
        assertThat(hit.closedCells()).containsExactly(c);
        // lasting: the robot never stands in that door afterwards, and still finishes by the other door
        // (checked on the replay's cells, not through the solver's closure sets)
        assertThat(forced.steps().subList(door[2], forced.steps().size())).allSatisfy(st -> assertThat(st.cell()).isNotEqualTo(c));
        assertThat(forced.steps().get(forced.length()).cell()).isIn(mission.map().docks());
        assertThat(window.player().step()).isZero();
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText()))
                .startsWith("forced door-shut at the door " + mission.map().doorName(c)).contains("lasting");
    }

    @Test
    void a_door_the_run_has_already_passed_cannot_be_forced_and_nothing_is_added(FxRobot robot) throws Exception {
        waitUntil(() -> solved(window));
        ViewData d = fx(() -> window.dataProperty().get());
        @SuppressWarnings("unchecked")
        ComboBox<ViewReplay> runs = robot.lookup("#replay").queryAs(ComboBox.class);
        ViewReplay nominal = d.replays().stream().filter(r -> r.kind() == ViewReplay.Kind.NOMINAL).findFirst().orElseThrow();
        robot.interact(() -> runs.setValue(nominal));
        int[] door = firstDoorMove(mission, nominal);
        Cell c = new Cell(door[0], door[1]);
        // past the door (the run enters it once on the way in and uses the same door back only if it must)
        int past = nominal.length();
        robot.interact(() -> window.player().jumpTo(past));
        int before = fx(() -> runs.getItems().size());
        rightClick(robot, c);
        assertThat(fx(() -> runs.getItems().size())).isEqualTo(before);
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText()))
                .contains("does not try to enter the door " + mission.map().doorName(c));
        // a wall has nothing to force
        rightClick(robot, new Cell(0, 0));
        assertThat(fx(() -> robot.lookup("#status").queryAs(Label.class).getText())).startsWith("no door or zone at 0:0");
        assertThat(fx(() -> runs.getItems().size())).isEqualTo(before);
        List<ViewReplay> all = fx(() -> List.copyOf(runs.getItems()));
        assertThat(all).noneMatch(r -> r.kind() == ViewReplay.Kind.FORCED);
    }
}
