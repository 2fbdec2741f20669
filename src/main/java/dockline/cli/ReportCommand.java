package dockline.cli;

import dockline.io.AtomicFiles;
import dockline.report.Caveats;
import dockline.report.Html;
import dockline.report.JsonReport;
import dockline.report.LocatedError;
import dockline.report.MissionResult;
import dockline.report.ReportMeta;
import dockline.report.ReportRun;
import dockline.view.ReportPictures;
import dockline.util.ProgressListener;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline report MISSION... | FOLDER --out REPORT.html [--json FILE]}: parses the options, hands the
 * mission files to the core's report run ({@link ReportRun}: every mission through the planner, several at
 * once on a bounded pool) with the view's picture code ({@link ReportPictures}, the one {@code render} uses),
 * writes the HTML file ({@link Html}) and the JSON file ({@link JsonReport}) atomically, and prints a short
 * summary. Progress goes to standard error when it is a terminal and {@code --quiet} is not given.
 * Exit code: the worst of the missions' (0 all guaranteed, 1 some not, 2 bad input, 3, 4).
 */
@Command(name = "report",
        description = {"Checks every mission given (a folder: every mission file in it, sorted) and writes one"
                + " self-contained HTML sign-off report: a summary table, then per mission the map with the worst"
                + " case, the battery chart, the suggestions, the disturbance model, the rule of thumb beside the"
                + " verdict, the safety cautions, and the input files' SHA-256."},
        exitCodeList = {"0:report written; every mission guaranteed", "1:report written; some mission not guaranteed",
                "2:bad input (a bad mission is still listed with its errors), or no report written",
                "3:some mission over a resource limit", "4:internal error"})
public final class ReportCommand extends CommandBase {

    @Parameters(arity = "1..*", paramLabel = "MISSION|FOLDER", description = "mission files, or folders of them")
    List<Path> inputs = new ArrayList<>();

    @Option(names = "--out", required = true, paramLabel = "REPORT.html", description = "the HTML report to write")
    Path out;

    @Option(names = "--json", paramLabel = "FILE", description = "also write the report's content as JSON to FILE")
    Path json;

    @Option(names = "--jobs", paramLabel = "N", description = "missions checked at once (default: the number of cores)")
    Integer jobs;

    @Option(names = "--quiet", description = "no progress on standard error")
    boolean quiet;

    @Override
    int run(PrintWriter o, PrintWriter err) {
        if (jobs != null && (jobs < 1 || jobs > 256)) {
            err.println("dockline: --jobs must be a whole number from 1 to 256, not " + jobs);
            return ExitCodes.BAD_INPUT;
        }
        if (!outputOk("--out", out, err) || (json != null && !outputOk("--json", json, err))) {
            return ExitCodes.BAD_INPUT;
        }
        if (json != null && same(out, json)) {
            err.println("dockline: --json " + json + ": the same file as --out (hint: give the JSON file another name)");
            return ExitCodes.BAD_INPUT;
        }
        List<Path> files;
        try {
            files = ReportRun.missionFiles(inputs);
        } catch (IllegalArgumentException | IOException e) {
            err.println("dockline: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        int threads = jobs != null ? jobs : Runtime.getRuntime().availableProcessors();
        boolean progress = ProgressLine.wanted(false, quiet);
        List<MissionResult> results = ReportRun.check(files, threads, new ReportPictures(), progress
                ? new ProgressListener() {
                    @Override
                    public void stage(int percent, String missionDone) {
                        err.println(missionDone);
                        err.flush();
                    }
                } : null);
        for (MissionResult r : results) {
            for (MissionResult.Input in : r.inputs()) {
                Path p = Path.of(in.file());
                if (same(p, out) || (json != null && same(p, json))) {
                    err.println("dockline: " + in.file() + " is an input of the report; choose another output name"
                            + " (outputs never overwrite inputs)");
                    return ExitCodes.BAD_INPUT;
                }
            }
        }
        ReportMeta meta = new ReportMeta(version(), Instant.now());
        String html = Html.report(results, meta);
        String data = json == null ? null : JsonReport.json(results, meta);
        try {
            AtomicFiles.writeString(out, html);
            if (data != null) {
                AtomicFiles.writeString(json, data);
            }
        } catch (IOException e) {
            err.println("dockline: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        for (MissionResult r : results) {
            for (LocatedError e : r.errors()) {
                err.println(e.format());
            }
        }
        int ok = 0;
        int not = 0;
        for (MissionResult r : results) {
            ok += r.status() == MissionResult.Status.GUARANTEED ? 1 : 0;
            not += r.status() == MissionResult.Status.NOT_GUARANTEED ? 1 : 0;
        }
        o.println("wrote " + out + (data != null ? " and " + json : "") + ": " + results.size() + " mission"
                + (results.size() == 1 ? "" : "s") + ", " + ok + " guaranteed, " + not + " not guaranteed, "
                + (results.size() - ok - not) + " not checked");
        for (MissionResult r : results) {
            o.println("  " + r.status().word() + "  " + r.file());
        }
        o.println(Caveats.block());
        return ReportRun.exitCode(results);
    }

    private static boolean outputOk(String option, Path target, PrintWriter err) {
        String why = AtomicFiles.problemWith(target);
        if (why != null) {
            err.println("dockline: " + option + " " + (target.toString().isEmpty() ? "''" : target) + ": " + why);
            return false;
        }
        return true;
    }

    private static boolean same(Path a, Path b) {
        try {
            if (Files.exists(a) && Files.exists(b)) {
                return Files.isSameFile(a, b);
            }
        } catch (IOException | SecurityException e) {
            // compare the names below
        }
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }

    static String version() {
        String v = new Main.Version().getVersion()[0];
        return v.startsWith("dockline ") ? v.substring("dockline ".length()) : v;
    }
}
