package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.solved;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import dockline.plan.PictureRoute;
import javafx.geometry.Point2D;
import javafx.scene.control.Label;
import javafx.scene.control.Spinner;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window on a large generated mission with lasting doors (the benchmark's 32² reserve floor, invented
 * data; its whole closure arena is over the pictures' threshold), with the real solver, headless: the verdict
 * comes from the charging route phase by phase, and the heat layer says in its key, and per cell, what it
 * knows (enough charge, and a range where the need is not known exactly) instead of a number it does not know.
 * The brackets themselves are checked against the whole arena and a brute force in {@code HeatBoundsProperties}.
 */
class LargeLastingWindowTest extends RealWindowCase {

    private final Mission mission = LargeLastingMissions.floor(32);

    @Start
    void start(Stage stage) {
        open(stage, 1280, 800, mission, java.nio.file.Path.of("generated-32.yaml"));
    }

    @Test
    void the_verdict_and_the_heat_layers_wording_of_a_large_lasting_mission(FxRobot robot) throws Exception {
        assertThat(PictureRoute.phased(mission)).as("over the pictures' threshold").isTrue();
        waitUntil(() -> solved(window));
        ViewData d = fx(() -> window.dataProperty().get());
        // the charging route on the whole arena says guaranteed (DEVELOPERS.md, "Lasting doors", row lasting-check)
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.GUARANTEED);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("Guaranteed");
        assertThat(d.verdict().headline()).contains("phase by phase");
        // the key of the heat layer says what the colours claim, and shows the "at most" mark
        Label note = robot.lookup("#heat-note").queryAs(Label.class);
        assertThat(note.getText()).contains("sure upper bound").contains("corner mark");
        assertThat(fx(() -> note.getParent().lookupAll(".legend-label").stream().filter(n -> n instanceof Label)
                .map(n -> ((Label) n).getText()).toList())).anyMatch(t -> t.startsWith("at most"));
        // a cell known only as a range says so under the pointer, with both figures
        @SuppressWarnings("unchecked")
        Spinner<Integer> budget = robot.lookup("#budget").queryAs(Spinner.class);
        int k = fx(budget::getValue);
        int mask = ProgressChoices.initialMask(mission);
        int w = mission.map().width();
        Cell ranged = null;
        for (int i = 0; i < mission.map().cellCount() && ranged == null; i++) {
            Cell c = Cell.ofIndex(i, w);
            int hi = d.chargeNeeded(i, k, mask);
            if (mission.map().isFree(c) && hi >= 0 && d.chargeNeededAtLeast(i, k, mask) >= 0
                    && d.chargeNeededAtLeast(i, k, mask) < hi) {
                ranged = c;
            }
        }
        assertThat(ranged).as("a cell whose need is known only as a range").isNotNull();
        Cell c = ranged;
        int lo = d.chargeNeededAtLeast(c.index(w), k, mask);
        int hi = d.chargeNeeded(c.index(w), k, mask);
        double[] p = fx(() -> window.mapView().centreOf(c));
        Point2D screen = fx(() -> window.mapView().localToScreen(p[0], p[1]));
        robot.moveTo(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(robot.lookup("#cell-info").queryAs(Label.class).getText()).contains("cell " + c)
                .contains("charge needed from here: between " + Units.both(mission, lo) + " and "
                        + Units.both(mission, hi));
    }
}
