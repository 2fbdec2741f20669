package dockline.view;

import static dockline.view.FxTests.fx;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Cell;
import dockline.model.Mission;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The map keeps its static layer in images: on the research block, replay steps, hovering and
 * panning draw no static tile again; a new zoom draws its tiles once, and going back to a zoom
 * drawn before draws nothing.
 */
@ExtendWith(ApplicationExtension.class)
class MapViewRepaintTest {

    /** late-return runs on maps/research-block.yaml, the 60 x 40 research block. */
    private static final Path MISSION = Path.of("missions/late-return.yaml");

    private MapView view;
    private ViewData data;

    @Start
    void start(Stage stage) throws Exception {
        Mission m = MissionLoader.load(MISSION);
        data = FakeAnalyzer.compute(m);
        view = new MapView();
        stage.setScene(new Scene(new StackPane(view), 900, 640));
        stage.show();
    }

    private static void fxRun(Runnable r) {
        fx(() -> {
            r.run();
            return null;
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void replay_steps_hover_and_pan_draw_no_static_tile_again() {
        Mission m = data.mission();
        assertThat(m.map().width()).isEqualTo(60);
        ViewReplay r = data.replays().get(0);
        assertThat(r.length()).isGreaterThan(5);
        int k = m.map().disturbances().budget();
        int progress = ProgressChoices.initialMask(m);
        fxRun(() -> view.layersProperty().set(MapLayers.of(data, Overlay.HEAT, k, progress, -1, r, 0)));
        long first = fx(view::staticRepaints);
        assertThat(first).as("the first draw paints the static tiles").isPositive();
        long dynamicBefore = fx(view::dynamicRepaints);

        // every replay step in heat mode (the window's withStep)
        for (int i = 0; i <= r.length(); i++) {
            int s = i;
            fxRun(() -> view.layersProperty().set(view.layers().withStep(s)));
        }
        assertThat(fx(view::staticRepaints)).as("static tiles drawn during heat-map steps").isEqualTo(first);
        // the policy layer has no heat map under it: another static picture, drawn once
        fxRun(() -> view.layersProperty().set(MapLayers.of(data, Overlay.POLICY, k, progress, -1, r, 0)));
        long policy = fx(view::staticRepaints);
        assertThat(policy).isGreaterThan(first);
        // every replay step in policy mode, the layer following the step's situation
        for (int i = 0; i <= r.length(); i++) {
            ViewStep st = r.steps().get(i);
            int s = i;
            fxRun(() -> view.layersProperty().set(
                    MapLayers.of(data, Overlay.POLICY, st.budgetLeft(), st.progress(), st.levelUnits(), r, s)));
        }
        // hovering cells, panning a little
        for (int x = 1; x < 20; x++) {
            Cell c = new Cell(x, 17);
            fxRun(() -> view.layersProperty().set(view.layers().withHover(c)));
        }
        fxRun(() -> view.pan(12, -7));
        fxRun(() -> view.pan(-12, 7));
        assertThat(fx(view::staticRepaints)).as("static tiles drawn during policy steps, hover and pan").isEqualTo(policy);
        assertThat(fx(view::dynamicRepaints) - dynamicBefore).isGreaterThan(2L * r.length());

        // a new zoom draws its tiles once; back to the fitted zoom draws none
        fxRun(() -> view.zoomIn());
        long zoomed = fx(view::staticRepaints);
        assertThat(zoomed).isGreaterThan(policy);
        fxRun(() -> view.layersProperty().set(view.layers().withStep(1)));
        assertThat(fx(view::staticRepaints)).isEqualTo(zoomed);
        fxRun(() -> view.fit());
        assertThat(fx(view::staticRepaints)).as("the fitted zoom's tiles are kept").isEqualTo(zoomed);

        // the plain map is the policy layer's static picture too: nothing to draw
        fxRun(() -> view.layersProperty().set(MapLayers.of(data, Overlay.PLAIN, k, progress, -1, r, 0)));
        assertThat(fx(view::staticRepaints)).isEqualTo(zoomed);
        // back to the heat map: its picture at this zoom was kept
        fxRun(() -> view.layersProperty().set(MapLayers.of(data, Overlay.HEAT, k, progress, -1, r, 0)));
        assertThat(fx(view::staticRepaints)).isEqualTo(zoomed);
    }
}
