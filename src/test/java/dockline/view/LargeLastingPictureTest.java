package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.plan.PictureRoute;
import dockline.report.Caveats;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import org.junit.jupiter.api.Test;

/**
 * The picture of {@code render} and of the report on the benchmark's 64² reserve floor with its doors lasting
 * (invented data; 1,083 disturbance states, 3.08 M robot vertices in the whole closure arena): the analyzer
 * takes the charging route phase by phase, the verdict is the whole arena's, and the key says what the heat
 * layer knows; the safety line stays. (The time is a benchmark figure, DEVELOPERS.md "Lasting doors", never
 * asserted here.)
 */
class LargeLastingPictureTest {

    @Test
    void the_64_floor_with_lasting_doors_is_pictured_from_the_phases_with_a_heat_key_that_says_so() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage(); // the toolkit as TestFX starts it (see PictureRendererTest)
        Mission m = LargeLastingMissions.floor(64);
        assertThat(PictureRoute.phased(m)).isTrue();
        ViewData d = new SolverAnalyzer().analyze(m, () -> false);
        // the charging route on the whole arena found it not guaranteed, no floor and no start charge
        // (DEVELOPERS.md, "Lasting doors", row lasting-check, checked there once against the whole arena)
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.NOT_GUARANTEED);
        assertThat(d.verdict().headline()).contains("phase by phase").contains("No floor can be guaranteed");
        assertThat(d.heatNote()).contains("sure upper bound");
        assertThat(d.replays()).as("the counterexample").isNotEmpty();
        Parent picture = FxTests.fx(() -> PictureRenderer.build(d, new PictureRenderer.Options(1200, 800,
                Overlay.HEAT, -1, -1)));
        assertThat(((Label) picture.lookup("#heat-note")).getText()).isEqualTo(d.heatNote());
        assertThat(picture.lookupAll(".label").stream().map(n -> ((Label) n).getText()).toList())
                .anyMatch(t -> t.contains(Caveats.shortLine()));
        assertThat(PictureRenderer.render(d, PictureRenderer.Options.defaults()).getWidth()).isPositive();
    }
}
