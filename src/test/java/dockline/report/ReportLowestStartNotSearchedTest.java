package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.OptionalInt;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.Test;

/**
 * The report tells a lowest start that was not searched (a patrol's or deadline mission's search past the
 * memory budget) from one that does not exist by the figures' own flag, not by the wording of a note. The
 * patrol is the demo missions/night-patrol.yaml (its lowest start is its floor of 12 Wh, missions/README.md);
 * the HTML is read with jsoup, a general-purpose parser that shares no code with the report writer.
 */
class ReportLowestStartNotSearchedTest {

    private static final Pictures NONE = NoPictures.NONE;

    private static String lowestStart(MissionResult r) {
        String html = Html.report(List.of(r), new ReportMeta("test", Instant.EPOCH));
        return Jsoup.parse(html).select("dl.figures").text();
    }

    @Test
    void aLowestStartNotSearched_isWordedSo_andOneSearched_isShown() {
        MissionResult r = MissionChecker.check(Path.of("missions/night-patrol.yaml"), 1L << 30, NONE);
        assertThat(r.figures().lowestStartSearched()).isTrue();
        assertThat(lowestStart(r)).contains("Lowest start 12 Wh");

        MissionResult.Figures f = r.figures();
        MissionResult.Figures unknown = new MissionResult.Figures(f.scale(), f.guaranteed(), f.method(),
                f.methodReason(), f.certified(), f.certification(), f.capacityUnits(), f.startUnits(),
                f.reserveUnits(), f.budget(), f.lowestLevelUnits(), f.highestFloorUnits(), OptionalInt.empty(), false,
                f.rules());
        MissionResult notSearched = new MissionResult(r.file(), r.status(), r.errors(), r.inputs(), r.mission(),
                r.kind(), unknown, r.suggestions(), r.disturbances(), r.run(), r.picture(), r.pictureNote(),
                List.of());
        assertThat(lowestStart(notSearched)).contains("Lowest start not computed (see the notes)")
                .doesNotContain("no start charge guarantees");
    }
}
