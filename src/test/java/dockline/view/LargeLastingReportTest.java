package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.report.MissionChecker;
import dockline.report.MissionResult;
import org.junit.jupiter.api.Test;

/**
 * The sign-off report of a large generated mission with lasting doors (the benchmark's 32² reserve floor,
 * invented data): its picture comes from the charging route phase by phase ({@code PictureRoute}), whose verdict
 * must agree with the check's (the report refuses a disagreement as an internal error), and it is drawn.
 */
class LargeLastingReportTest {

    @Test
    void the_report_of_a_large_lasting_mission_has_its_verdict_and_its_picture() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage(); // the toolkit as TestFX starts it (see PictureRendererTest)
        Mission m = LargeLastingMissions.floor(32);
        MissionResult r = MissionChecker.check(m, 0, new ReportPictures());
        // the charging route on the whole arena says guaranteed, highest floor 8, lowest start 2 units
        // (DEVELOPERS.md, "Lasting doors", row lasting-check)
        assertThat(r.status()).isEqualTo(MissionResult.Status.GUARANTEED);
        assertThat(r.figures().highestFloorUnits()).hasValue(8);
        assertThat(r.figures().lowestStartUnits()).hasValue(2);
        assertThat(r.pictureNote()).isNull();
        assertThat(r.picture()).isNotEmpty();
        assertThat(r.run()).isNotNull();
    }
}
