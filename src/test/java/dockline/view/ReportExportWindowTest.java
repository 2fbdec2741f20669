package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * File › Export sign-off report: the window writes the report that {@code dockline report} writes for
 * the mission it shows. The HTML is read back with jsoup (a general-purpose HTML parser): one summary
 * row for the mission with the verdict missions/README.md documents, and nothing outside the file.
 */
class ReportExportWindowTest extends RealWindowCase {

    private static final Path MISSION = Path.of("missions/aisle-return.yaml");

    @TempDir
    Path dir;

    @Start
    void start(Stage stage) {
        open(stage, 1180, 780, MISSION);
    }

    @Test
    void the_report_of_the_mission_shown_is_written_and_self_contained() throws Exception {
        Path out = dir.resolve("aisle-report.html");
        String said = WaitForAsyncUtils.asyncFx(() -> window.exportReport(out)).get(10, TimeUnit.SECONDS)
                .get(240, TimeUnit.SECONDS);
        assertThat(said).startsWith("report written to " + out);
        Document doc = Jsoup.parse(Files.readString(out));
        assertThat(doc.select("#summary-table tr.mission-row")).hasSize(1);
        Element row = doc.selectFirst("#summary-table tr.mission-row");
        // missions/README.md: aisle-return is guaranteed
        assertThat(row.attr("data-status")).isEqualTo("guaranteed");
        for (Element img : doc.select("img")) {
            assertThat(img.attr("src")).startsWith("data:");
        }
        assertThat(doc.select("script")).isEmpty();
        assertThat(doc.text()).contains("robot maker");
        // a report never overwrites the mission it reports on
        assertThat(ReportExport.write(MISSION, MISSION)).contains("overwrite the mission file");
    }
}
