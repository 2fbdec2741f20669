package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The HTML report's structure and self-containment, read with a general-purpose HTML parser (jsoup, which
 * follows the WHATWG HTML parsing algorithm and shares no code with the report writer): the summary
 * table has one row per mission with the columns asked for, each mission has its section with map,
 * battery chart, disturbance model and safety cautions, the traceability block lists every input's SHA-256
 * (FIPS 180-4, computed here with the JDK's digest), and nothing in the file points outside it.
 */
class ReportHtmlTest {

    @TempDir
    Path dir;

    private static Document doc() {
        return Jsoup.parse(DemoReport.get().htmlText());
    }

    @Test
    void summaryTable_hasTheColumns_andOneRowPerMission_inOrder() {
        Document d = doc();
        List<String> heads = d.select("#summary-table thead th").eachText();
        assertThat(heads).startsWith("Mission", "Verdict", "Reserve floor", "Worst case", "Highest guaranteed floor",
                "Lowest start", "Method", "Certified");
        assertThat(heads).anyMatch(h -> h.contains("20 %")).anyMatch(h -> h.contains("30 %"));
        Elements rows = d.select("#summary-table tbody tr.mission-row");
        assertThat(rows).hasSize(DemoReport.DEMOS.length + 1);
        for (int i = 0; i < DemoReport.DEMOS.length; i++) {
            assertThat(rows.get(i).attr("data-file")).endsWith(DemoReport.DEMOS[i]);
            assertThat(rows.get(i).select("td")).hasSize(heads.size());
        }
        Element bad = rows.get(rows.size() - 1);
        assertThat(bad.attr("data-status")).isEqualTo("bad-input");
        assertThat(bad.text()).contains("not checked: bad input");
        // every row links to its own section
        for (Element row : rows) {
            String href = row.selectFirst("a").attr("href");
            assertThat(href).startsWith("#");
            assertThat(d.getElementById(href.substring(1))).isNotNull();
        }
    }

    @Test
    void everyCheckedMission_hasMapChartDisturbancesAndCautions() throws Exception {
        Document d = doc();
        Elements sections = d.select("section.mission");
        assertThat(sections).hasSize(DemoReport.DEMOS.length + 1);
        for (Element s : sections) {
            assertThat(s.select(".cautions li")).as("cautions in %s", s.id()).hasSizeGreaterThanOrEqualTo(
                    Caveats.LINES.size());
            for (String line : Caveats.LINES) {
                assertThat(s.select(".cautions").text()).contains(line);
            }
            if (s.attr("data-status").equals("bad-input")) {
                assertThat(s.select("ul.errors li")).isNotEmpty();
                continue;
            }
            Element map = s.selectFirst("figure.map img");
            assertThat(map).as("map picture of %s", s.id()).isNotNull();
            BufferedImage png = ImageIO.read(new ByteArrayInputStream(dataBytes(map.attr("src"), "image/png")));
            assertThat(png).as("the map of %s decodes as PNG", s.id()).isNotNull();
            assertThat(png.getWidth()).isGreaterThan(0);
            Element chart = s.selectFirst("figure.battery img");
            assertThat(chart).as("battery chart of %s", s.id()).isNotNull();
            String svg = new String(dataBytes(chart.attr("src"), "image/svg+xml"), java.nio.charset.StandardCharsets.UTF_8);
            Document sd = Jsoup.parse(svg, "", org.jsoup.parser.Parser.xmlParser());
            assertThat(sd.select("svg polyline")).hasSize(1);
            assertThat(s.selectFirst("p.disturbances").text()).isNotBlank();
            assertThat(s.select("ul.rule-of-thumb li")).hasSize(RuleOfThumb.MARGINS.length);
            if (s.attr("data-status").equals("not-guaranteed")) {
                assertThat(s.select("h3").eachText()).contains("Suggestions");
            }
        }
    }

    /** The section of a demo mission, found by its place in {@link DemoReport#DEMOS}. */
    private static Element section(Document d, String demo) {
        int i = java.util.Arrays.asList(DemoReport.DEMOS).indexOf(demo);
        return d.getElementById("mission-" + (i + 1));
    }

    /**
     * A deadline mission's section says what its verdict covers (the deadline) and sets the rule of thumb's
     * shortest run against the deadline; a patrol's says laps; the lowest start of both is shown (missions/README.md:
     * the patrol's is its floor of 12 Wh, none keeps the early clean's deadline).
     */
    @Test
    void patrolAndDeadlineSections_wordTheirGoal() {
        Document d = doc();
        Element clean = section(d, "early-clean.yaml");
        assertThat(clean.selectFirst("p.verdict").text()).contains("miss the deadline");
        for (Element rule : clean.select("ul.rule-of-thumb li")) {
            assertThat(rule.text()).contains("the deadline of 37 turns");
        }
        assertThat(clean.select("dl.figures").text()).contains("no start charge guarantees the floor within the deadline");
        // missions/README.md: the early clean is guaranteed with a deadline of its worst case, 43 turns
        assertThat(clean.select("ul.suggestions li").eachText()).anyMatch(t -> t.contains("allow a deadline of at least"
                + " 2 min 52 s (43 turns; now 37)"));
        Element patrol = section(d, "night-patrol.yaml");
        assertThat(patrol.selectFirst("p.verdict").text()).contains("lap after lap");
        assertThat(patrol.select("dl.figures").text()).contains("Lowest start 12 Wh");
        for (Element rule : patrol.select("ul.rule-of-thumb li")) {
            assertThat(rule.text()).doesNotContain("deadline");
        }
    }

    @Test
    void referencesNothingOutsideItself() {
        Document d = doc();
        assertThat(outsideReferences(d)).isEmpty();
        Elements imgs = d.select("img");
        assertThat(imgs).hasSizeGreaterThanOrEqualTo(2 * DemoReport.DEMOS.length);
        String css = d.select("style").html();
        assertThat(css).contains("@page").contains("A4").contains("@media print");
        // the check can fail: a doctored copy with a picture, a link and a script from outside is caught
        Document doctored = doc();
        doctored.body().appendElement("img").attr("src", "https://example.invalid/x.png");
        doctored.body().appendElement("a").attr("href", "file:///etc/hostname");
        doctored.body().appendElement("script").attr("src", "http://example.invalid/x.js");
        assertThat(outsideReferences(doctored)).hasSizeGreaterThanOrEqualTo(3);
    }

    /** What in the document reaches outside it: scripts, external elements, links and sources that leave it. */
    static List<String> outsideReferences(Document d) {
        List<String> found = new java.util.ArrayList<>();
        d.select("script").forEach(e -> found.add("script " + e.attr("src")));
        d.select("link, iframe, object, embed, base, video, audio, source").forEach(e -> found.add("<" + e.tagName() + ">"));
        for (Element e : d.getAllElements()) {
            for (Attribute a : e.attributes()) {
                String k = a.getKey().toLowerCase(Locale.ROOT);
                String v = a.getValue().trim().toLowerCase(Locale.ROOT);
                boolean ref = k.equals("src") || k.equals("href") || k.equals("srcset") || k.equals("action")
                        || k.equals("poster") || k.equals("data") || k.equals("xlink:href");
                if (ref && (v.startsWith("http:") || v.startsWith("https:") || v.startsWith("file:") || v.startsWith("//"))) {
                    found.add(k + "=" + v);
                }
                if (k.equals("href") && !v.startsWith("#")) {
                    found.add("link out of the file: " + v);
                }
                if (k.startsWith("on")) {
                    found.add("event handler " + k);
                }
                if (e.tagName().equals("img") && k.equals("src") && !v.startsWith("data:")) {
                    found.add("picture not embedded: " + v);
                }
            }
        }
        String css = d.select("style").html();
        if (css.contains("url(") || css.contains("@import")) {
            found.add("style loads something");
        }
        return found;
    }

    @Test
    void traceability_listsVersionDate_andEveryInputsSha256() throws Exception {
        Document d = doc();
        Element t = d.getElementById("traceability");
        assertThat(t).isNotNull();
        assertThat(t.text()).contains("dockline ").contains("Date");
        assertThat(t.select("dl dd").eachText()).anyMatch(s -> s.matches("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}Z"));
        Elements rows = t.select("#inputs tbody tr");
        for (String demo : DemoReport.DEMOS) {
            Path p = Path.of("missions", demo);
            Element row = rows.stream().filter(r -> r.child(0).text().equals(p.toString())).findFirst().orElseThrow();
            assertThat(row.child(1).text()).isEqualTo(sha256(p));
        }
        // the maps the missions name are inputs too
        assertThat(rows.eachText()).anyMatch(s -> s.contains("clinic-wing.yaml"));
        assertThat(t.select("ul.rounding li").text()).contains("against the robot");
    }

    /** A folder with no mission files: exit 2, a hint, and no file written. */
    @Test
    void emptyFolder_isBadInput_withAHint_andWritesNothing() throws Exception {
        Path empty = Files.createDirectory(dir.resolve("empty"));
        Files.writeString(empty.resolve("notes.txt"), "not a mission\n");
        Path out = dir.resolve("r.html");
        CliRun r = CliRun.run("report", empty.toString(), "--out", out.toString(), "--quiet");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("holds no mission files").contains("hint:");
        assertThat(out).doesNotExist();
        try (var files = Files.list(dir)) {
            assertThat(files.map(f -> f.getFileName().toString())).containsExactly("empty");
        }
    }

    static byte[] dataBytes(String uri, String type) {
        String prefix = "data:" + type + ";base64,";
        assertThat(uri).startsWith(prefix);
        return Base64.getDecoder().decode(uri.substring(prefix.length()));
    }

    static String sha256(Path p) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p)));
    }
}
