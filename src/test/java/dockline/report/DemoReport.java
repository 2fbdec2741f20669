package dockline.report;

import dockline.fixtures.CliRun;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The report of the bundled demo folder {@code missions/} plus one bad mission file, made once per test JVM
 * through the command line ({@code dockline report missions BAD --out ... --json ... --quiet}) and shared by
 * the report's tests (structure, browser, JSON schema), because checking the eight demos takes a while.
 */
public final class DemoReport {

    /** Demo missions in the folder, sorted by file name, as the report lists them. */
    public static final String[] DEMOS = {"aisle-return.yaml", "discounted-trap.yaml", "early-clean.yaml",
            "late-return.yaml", "night-patrol.yaml", "night-round.yaml", "supply-run.yaml", "vault-check.yaml"};

    /** The bad file's content: its map does not exist, and a key is misspelt. */
    static final String BAD = "name: Broken on purpose\nmap: no-such-map.yaml\nreserv: 20%\n";

    /**
     * The made report.
     *
     * @param code exit code of the command
     * @param out  its standard output
     * @param err  its standard error
     * @param html the HTML file
     * @param json the JSON file
     * @param bad  the bad mission file
     */
    public record Made(int code, String out, String err, Path html, Path json, Path bad) {
        public String htmlText() {
            try {
                return Files.readString(html);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    private static Made made;

    private DemoReport() {
    }

    /** Makes the report the first time it is asked for. */
    public static synchronized Made get() {
        if (made == null) {
            try {
                // the report draws its pictures in this JVM: let TestFX start the toolkit first, or the
                // TestFX window tests that run later in the same JVM lose their input (DEVELOPERS.md, tests)
                org.testfx.api.FxToolkit.registerPrimaryStage();
                Path dir = Files.createTempDirectory("dockline-report-test");
                Path bad = dir.resolve("broken.yaml");
                Files.writeString(bad, BAD);
                Path html = dir.resolve("report.html");
                Path json = dir.resolve("report.json");
                CliRun r = CliRun.run("report", "missions", bad.toString(), "--out", html.toString(), "--json",
                        json.toString(), "--quiet");
                made = new Made(r.code(), r.out(), r.err(), html, json, bad);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } catch (java.util.concurrent.TimeoutException e) {
                throw new IllegalStateException("the JavaFX toolkit did not start", e);
            }
        }
        return made;
    }
}
