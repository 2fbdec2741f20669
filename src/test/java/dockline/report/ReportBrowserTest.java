package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end: the demo report opened in a real headless browser (Chromium, with no network: QUIC, background
 * networking, component updates and sync are off, and the report has no link that leaves it). A small
 * checking script appended to a copy of the report writes what the browser found into the page once it has
 * loaded: how many pictures there are, which did not decode ({@code naturalWidth} 0), and how many rows of
 * the summary table are laid out with a height. The DOM the browser dumps is read back with jsoup.
 *
 * <p>Skipped, with a message on standard output, only when no Chromium is installed ({@code .ci/run}
 * installs it).
 */
class ReportBrowserTest {

    @TempDir
    Path dir;

    private static final String PROBE = """
            <script>
            window.addEventListener('load', function () {
              var imgs = document.images, broken = [];
              for (var i = 0; i < imgs.length; i++) {
                if (!(imgs[i].complete && imgs[i].naturalWidth > 0)) { broken.push(i); }
              }
              var rows = document.querySelectorAll('#summary-table tbody tr'), shown = [];
              rows.forEach(function (r) {
                if (r.getBoundingClientRect().height > 0 && getComputedStyle(r).display !== 'none') {
                  shown.push(r.getAttribute('data-file'));
                }
              });
              var p = document.createElement('pre');
              p.id = 'browser-findings';
              p.setAttribute('data-images', String(imgs.length));
              p.setAttribute('data-broken', broken.join(','));
              p.setAttribute('data-shown', String(shown.length));
              p.textContent = shown.join('\\n');
              document.body.appendChild(p);
            });
            </script>
            """;

    static Path chromium() {
        for (String c : List.of("/usr/bin/chromium", "/usr/bin/chromium-browser", "/usr/bin/google-chrome")) {
            if (Files.isExecutable(Path.of(c))) {
                return Path.of(c);
            }
        }
        String path = System.getenv("PATH");
        if (path != null) {
            for (String d : path.split(File.pathSeparator)) {
                for (String n : List.of("chromium", "chromium-browser")) {
                    Path p = Path.of(d, n);
                    if (Files.isExecutable(p)) {
                        return p;
                    }
                }
            }
        }
        return null;
    }

    @Test
    void everyPictureDecodes_andTheSummaryShowsEveryMission() throws Exception {
        Path browser = chromium();
        if (browser == null) {
            System.out.println("SKIPPED ReportBrowserTest: no Chromium found (/usr/bin/chromium); .ci/run installs it"
                    + " with apt-get install -y chromium");
        }
        Assumptions.assumeTrue(browser != null, "no Chromium found; .ci/run installs it");
        DemoReport.Made made = DemoReport.get();
        String html = made.htmlText();
        int end = html.lastIndexOf("</body>");
        assertThat(end).isPositive();
        Path copy = dir.resolve("probe.html");
        Files.writeString(copy, html.substring(0, end) + PROBE + html.substring(end), StandardCharsets.UTF_8);
        Path profile = Files.createDirectory(dir.resolve("profile"));
        List<String> cmd = new ArrayList<>(List.of(browser.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--disable-extensions", "--user-data-dir=" + profile, "--virtual-time-budget=10000",
                "--dump-dom", copy.toUri().toString()));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        Path dom = dir.resolve("dom.html");
        pb.redirectOutput(dom.toFile());
        pb.redirectError(dir.resolve("chromium.err").toFile());
        Process p = pb.start();
        boolean done = p.waitFor(3, TimeUnit.MINUTES);
        if (!done) {
            p.destroyForcibly();
        }
        assertThat(done).as("chromium finished").isTrue();
        assertThat(p.exitValue()).as(Files.readString(dir.resolve("chromium.err"))).isZero();
        Document d = Jsoup.parse(Files.readString(dom));
        Element f = d.getElementById("browser-findings");
        assertThat(f).as("the probe ran in the browser; stderr: %s", Files.readString(dir.resolve("chromium.err")))
                .isNotNull();
        int images = Integer.parseInt(f.attr("data-images"));
        assertThat(images).isEqualTo(Jsoup.parse(html).select("img").size()).isGreaterThanOrEqualTo(
                2 * DemoReport.DEMOS.length);
        assertThat(f.attr("data-broken")).as("pictures that did not decode (indices)").isEmpty();
        assertThat(Integer.parseInt(f.attr("data-shown"))).isEqualTo(DemoReport.DEMOS.length + 1);
        List<String> shown = List.of(f.wholeText().split("\n"));
        for (int i = 0; i < DemoReport.DEMOS.length; i++) {
            assertThat(shown.get(i)).endsWith(DemoReport.DEMOS[i]);
        }
        assertThat(shown.get(DemoReport.DEMOS.length)).isEqualTo(made.bad().toString());
    }
}
