package dockline.view;

import static dockline.view.FxTests.fx;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window's policy layer following the replay step, on a demo mission with the real solver:
 * pointing at the robot's cell says the policy's levels there in words, and the move it names is
 * the one the replay makes next.
 */
class PolicyWordsWindowTest extends RealWindowCase {

    private static final Path MISSION = Path.of("missions/night-round.yaml");

    @Start
    void start(Stage stage) {
        open(stage, 1180, 780, MISSION);
    }

    @Test
    @SuppressWarnings("unchecked")
    void pointing_at_a_cell_says_the_policys_levels_in_words(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(180, TimeUnit.SECONDS, () -> fx(() -> window.taskProperty().get() == null
                && window.dataProperty().get() != null && window.dataProperty().get().solved()));
        WaitForAsyncUtils.waitForFxEvents();
        ChoiceBox<OverlayPanel.PolicyMode> mode = robot.lookup("#policy-mode").queryAs(ChoiceBox.class);
        robot.interact(() -> {
            window.setOverlay(Overlay.POLICY);
            mode.setValue(OverlayPanel.PolicyMode.FOLLOW);
        });
        ViewReplay r = fx(() -> window.dataProperty().get().replays().get(0));
        Cell at = r.steps().get(0).cell();
        MapView mv = window.mapView();
        double[] p = fx(() -> mv.centreOf(at));
        robot.moveTo(mv, javafx.geometry.Pos.TOP_LEFT, new javafx.geometry.Point2D(p[0], p[1]),
                org.testfx.robot.Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        String info = robot.lookup("#cell-info").queryAs(Label.class).getText();
        String move = PolicyRules.moveWords(window.dataProperty().get().mission().map(), at, r.steps().get(1).action());
        assertThat(info).contains("policy here: at ").contains(" or more: ").contains(move);
        // the arrow on the robot's cell is that move
        assertThat(fx(() -> window.mapView().layers().policy(at.index(window.dataProperty().get().mission().map().width()))))
                .isEqualTo(r.steps().get(1).action());
    }
}
