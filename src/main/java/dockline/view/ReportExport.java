package dockline.view;

import dockline.io.AtomicFiles;
import dockline.report.Html;
import dockline.report.MissionResult;
import dockline.report.ReportMeta;
import dockline.report.ReportRun;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * "Export sign-off report": the report that {@code dockline report} writes, for the mission file the
 * window shows (the same checks through the core, the same pictures, the same HTML), written atomically
 * through {@link AtomicFiles}. Runs the whole check again, so it belongs on a background thread; its cost
 * is the report's (a few plans of the mission, see the report package).
 */
final class ReportExport {

    private ReportExport() {
    }

    /** Asks where to write the report (a save dialog), starting in {@code folder}, named after {@code name}. */
    static Optional<Path> choose(javafx.stage.Window owner, Path folder, String name) {
        return SaveDialogs.ask(owner, "Export the sign-off report as HTML", "HTML reports", ".html", folder,
                name + "-report");
    }

    /**
     * {@link #write} on {@code worker}; {@code say} hears (on the FX thread) that it started and how it ended.
     */
    static java.util.concurrent.CompletableFuture<String> writeLater(Path missionFile, Path out,
            java.util.concurrent.Executor worker, java.util.function.Consumer<String> say) {
        say.accept("writing the report to " + out + "\u2026");
        return java.util.concurrent.CompletableFuture.supplyAsync(() -> write(missionFile, out), worker)
                .whenComplete((msg, ex) -> javafx.application.Platform.runLater(() -> say.accept(ex == null ? msg
                        : "could not write the report: " + ex)));
    }

    /**
     * Checks {@code missionFile} as the report does and writes the HTML report to {@code out}.
     *
     * @return the words for the status line: where it was written and the verdict, or why not
     */
    static String write(Path missionFile, Path out) {
        if (out.toAbsolutePath().normalize().equals(missionFile.toAbsolutePath().normalize())) {
            return "the report would overwrite the mission file; choose another name";
        }
        List<MissionResult> results = ReportRun.check(List.of(missionFile), 1, new ReportPictures(), null);
        String v = ReportExport.class.getPackage().getImplementationVersion();
        String html = Html.report(results, new ReportMeta(v != null ? v : "0.1.0", Instant.now()));
        try {
            AtomicFiles.writeString(out, html);
        } catch (IOException e) {
            return "could not write the report to " + out + ": " + e.getMessage();
        }
        return "report written to " + out + " (" + results.get(0).status().word() + ")";
    }
}
