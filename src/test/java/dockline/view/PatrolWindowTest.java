package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import java.nio.file.Path;
import javafx.scene.control.Label;
import javafx.scene.control.Slider;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * A patrol in the window, with the real loader and solver: the demo night patrol opens (the window
 * refused patrols before), its lasso is the run shown (the way in, then the lap), and playing goes
 * round the lap for ever.
 */
class PatrolWindowTest extends RealWindowCase {

    private static final Path MISSION = Path.of("missions/night-patrol.yaml");

    @Start
    void start(Stage stage) {
        open(stage, 1280, 800, MISSION);
    }

    @Test
    void the_night_patrol_opens_shows_its_lasso_and_plays_the_lap_in_a_loop(FxRobot robot) throws Exception {
        Mission m = dockline.io.MissionLoader.load(MISSION);
        assertThat(m.tasks().patrols()).isTrue();
        waitUntil(() -> solved(window));
        ViewData d = fx(() -> window.dataProperty().get());
        // missions/README.md lists the night patrol as guaranteed
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.GUARANTEED);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("Guaranteed")
                .contains("again and again for ever");
        // no charge-needed map for a patrol: the plain map is shown and that choice is off
        assertThat(fx(() -> window.mapView().layers().overlay())).isEqualTo(Overlay.PLAIN);
        assertThat(fx(() -> robot.lookup("#overlay-heat").query().isDisabled())).isTrue();
        ViewReplay lasso = d.replays().get(0);
        assertThat(lasso.kind()).isEqualTo(ViewReplay.Kind.LASSO);
        // the lasso `dockline replay missions/night-patrol.yaml` prints: 204 steps, the loop from step 114
        // (length 91, so the step after 204 is 114 again)
        assertThat(lasso.length()).isEqualTo(204);
        assertThat(lasso.loopStart()).isEqualTo(114);
        // the lap is a lap: it comes back to the situation it starts in, and completes the checkpoints
        ViewStep first = lasso.steps().get(lasso.loopStart());
        ViewStep last = lasso.steps().get(lasso.length());
        assertThat(first.budgetLeft()).isEqualTo(last.budgetLeft());
        assertThat(fx(() -> window.player().loopStart())).isEqualTo(114);

        Label step = robot.lookup("#step-label").queryAs(Label.class);
        assertThat(fx(step::getText)).startsWith("step 0 of 204 (way in)");
        robot.interact(() -> window.player().jumpTo(204));
        assertThat(fx(step::getText)).startsWith("step 204 of 204 (lap: steps 114 to 204, then step 114 again)");
        robot.clickOn("#step-forward");
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(window.player().step()).isEqualTo(114);
        assertThat(fx(() -> window.mapView().layers().robotCell())).isEqualTo(first.cell());

        // playing does not stop at the end: it goes round the lap again
        Slider speed = robot.lookup("#speed").queryAs(Slider.class);
        robot.interact(() -> {
            speed.setValue(10);
            window.player().jumpTo(200);
            window.player().play();
        });
        long wraps = window.player().wraps();
        waitUntil(() -> fx(() -> window.player().wraps() > wraps && window.player().step() > 114));
        assertThat(fx(() -> window.player().playingProperty().get())).isTrue();
        robot.interact(() -> window.player().pause());
        assertThat(fx(() -> window.chart().batterySeries().getData().size())).isEqualTo(205);
    }
}
