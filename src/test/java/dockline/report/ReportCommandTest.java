package dockline.report;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code dockline report} on small hand-made missions: the outputs, the exit codes, the refusals before any
 * work (bad options, an output that is an input), and no progress lines when standard error is not a
 * terminal (as under the test runner).
 */
class ReportCommandTest {

    /** The report draws its pictures in this JVM: TestFX starts the toolkit first (see DemoReport). */
    @org.junit.jupiter.api.BeforeAll
    static void toolkit() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
    }

    @TempDir
    Path dir;

    @Test
    void twoMissions_bothFiles_exitOneForTheUnsafeOne_noProgressOffATerminal() throws Exception {
        Path heavy = ReportRuleOfThumbTest.mission(dir, ReportRuleOfThumbTest.lane(dir, "heavy", 25), "heavy-run", 60, 5);
        Path light = ReportRuleOfThumbTest.mission(dir, ReportRuleOfThumbTest.lane(dir, "light", 1), "light-run", 40, 10);
        Path html = dir.resolve("out.html");
        Path json = dir.resolve("out.json");
        CliRun r = run("report", light.toString(), heavy.toString(), "--out", html.toString(), "--json", json.toString(),
                "--jobs", "2");
        assertThat(r.code()).as(r.err()).isEqualTo(1);
        assertThat(r.err()).as("no progress when stderr is not a terminal").doesNotContain("[1/2]");
        assertThat(r.out()).contains("2 missions, 1 guaranteed, 1 not guaranteed, 0 not checked").contains("Safety:");
        Document d = Jsoup.parse(Files.readString(html));
        assertThat(d.select("#summary-table tbody tr").eachAttr("data-file")).containsExactly(light.toString(),
                heavy.toString());
        assertThat(d.select("#summary-table td.flag-danger")).hasSize(2);
        assertThat(d.select("#summary-table td.flag-refuses")).hasSize(1);
        assertThat(Files.readString(json)).contains("\"calls-unsafe-safe\"").contains("\"refuses-guaranteed\"");
        try (var files = Files.list(dir)) {
            assertThat(files.map(f -> f.getFileName().toString())).noneMatch(n -> n.endsWith(".part"));
        }
    }

    @Test
    void refusals_beforeAnyWork_writeNothing() throws Exception {
        Path light = ReportRuleOfThumbTest.mission(dir, ReportRuleOfThumbTest.lane(dir, "light", 1), "light-run", 40, 10);
        Path html = dir.resolve("r.html");
        CliRun jobs = run("report", light.toString(), "--out", html.toString(), "--jobs", "0");
        assertThat(jobs.code()).isEqualTo(2);
        assertThat(jobs.err()).contains("--jobs");
        CliRun same = run("report", light.toString(), "--out", html.toString(), "--json", html.toString());
        assertThat(same.code()).isEqualTo(2);
        assertThat(same.err()).contains("the same file as --out");
        CliRun folderOut = run("report", light.toString(), "--out", dir.toString());
        assertThat(folderOut.code()).isEqualTo(2);
        CliRun overInput = run("report", light.toString(), "--out", light.toString(), "--quiet");
        assertThat(overInput.code()).isEqualTo(2);
        assertThat(overInput.err()).contains("is an input of the report");
        assertThat(Files.readString(light)).startsWith("name: light-run");
        assertThat(html).doesNotExist();
        CliRun missing = run("report", dir.resolve("missing.yaml").toString(), "--out", html.toString(), "--quiet");
        assertThat(missing.code()).as("a missing mission is a bad input, listed in the report").isEqualTo(2);
        assertThat(Jsoup.parse(Files.readString(html)).select("section.mission ul.errors li")).isNotEmpty();
    }
}
