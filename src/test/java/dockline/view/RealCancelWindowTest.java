package dockline.view;

import static dockline.view.FxTests.fx;
import static dockline.view.FxTests.waitUntil;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BooleanSupplier;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Cancelling a check that runs the real solver: the window stays responsive, the solver stops on
 * the flag the task passes down, and the previous result stays shown.
 */
@ExtendWith(ApplicationExtension.class)
class RealCancelWindowTest {

    /** The real analyzer, held at a gate from the second call on so the test can cancel while it waits. */
    static final class GatedAnalyzer implements Analyzer {
        final AtomicInteger calls = new AtomicInteger();
        final CountDownLatch entered = new CountDownLatch(1);
        final CountDownLatch gate = new CountDownLatch(1);
        final AtomicBoolean solverSawCancel = new AtomicBoolean();

        @Override
        public ViewData analyze(Mission m, BooleanSupplier cancelled) {
            if (calls.incrementAndGet() > 1) {
                entered.countDown();
                try {
                    gate.await(60, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
            try {
                return new SolverAnalyzer().analyze(m, cancelled);
            } catch (java.util.concurrent.CancellationException e) {
                solverSawCancel.set(true);
                throw e;
            }
        }
    }

    private final GatedAnalyzer analyzer = new GatedAnalyzer();
    private MissionWindow window;

    @Start
    void start(Stage stage) {
        window = new MissionWindow(analyzer, new FileMissionSource(), null);
        FxTests.show(stage, window, 1180, 780);
        window.open(Path.of("missions/supply-run.yaml"));
    }

    @AfterEach
    void stop() throws Exception {
        analyzer.gate.countDown();
        FxTests.dispose(window);
    }

    @Test
    void cancelling_a_real_check_keeps_the_previous_result(FxRobot robot) throws Exception {
        waitUntil(() -> fx(() -> window.taskProperty().get() == null && window.dataProperty().get().solved()));
        ViewData before = fx(() -> window.dataProperty().get());
        String verdictBefore = robot.lookup("#verdict").queryAs(Label.class).getText();
        TextField reserve = robot.lookup("#reserve").queryAs(TextField.class);
        robot.interact(() -> reserve.setText("10"));
        robot.interact(() -> robot.lookup("#check").queryButton().fire());
        assertThat(analyzer.entered.await(60, TimeUnit.SECONDS)).isTrue();
        // responsive while the check runs: the overlay switches and the cell panel answers
        robot.interact(() -> window.setOverlay(Overlay.PLAIN));
        assertThat(fx(() -> window.mapView().layers().overlay())).isEqualTo(Overlay.PLAIN);
        robot.interact(() -> robot.lookup("#cancel").queryButton().fire());
        analyzer.gate.countDown();
        waitUntil(() -> fx(() -> window.taskProperty().get() == null));
        assertThat(analyzer.solverSawCancel.get()).as("the solver stopped on the task's flag").isTrue();
        assertThat(fx(() -> window.dataProperty().get())).isSameAs(before);
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).isEqualTo(verdictBefore);
        assertThat(robot.lookup("#solve-status").queryAs(Label.class).getText()).contains("cancelled");
        // and a new check afterwards works
        robot.interact(() -> robot.lookup("#check").queryButton().fire());
        waitUntil(() -> fx(() -> window.taskProperty().get() == null && window.dataProperty().get() != before));
        Mission now = fx(() -> window.dataProperty().get().mission());
        assertThat(now.reserve().toString()).isEqualTo("10%");
    }
}
