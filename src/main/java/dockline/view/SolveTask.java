package dockline.view;

import dockline.model.Mission;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import javafx.concurrent.Task;

/**
 * Solves one mission off the FX thread. Built with immutable inputs only (the analyzer and the
 * mission record, which already carries the reserve floor and starting charge asked for); passes
 * {@code this::isCancelled} to the analyzer, which polls it, and turns the analyzer's progress into
 * the task's per cent and message. The window binds its progress
 * indicator and buttons to this task's properties and never touches widgets from {@link #call}.
 */
final class SolveTask extends Task<ViewData> {

    private final Analyzer analyzer;
    private final Mission mission;

    SolveTask(Analyzer analyzer, Mission mission) {
        this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
        this.mission = Objects.requireNonNull(mission, "mission");
        updateTitle("Checking " + mission.name());
        updateMessage("waiting to start");
    }

    Mission mission() {
        return mission;
    }

    @Override
    protected ViewData call() {
        updateMessage("solving (reserve " + mission.reserve() + ", start " + mission.startCharge() + ")");
        updateProgress(-1, 1);
        ViewData data = analyzer.analyze(mission, this::isCancelled, (percent, stage) -> {
            int p = Math.max(0, Math.min(100, percent));
            updateProgress(p, 100);
            updateMessage(words(p, stage));
        });
        if (isCancelled()) {
            throw new CancellationException("cancelled");
        }
        updateMessage("done");
        updateProgress(1, 1);
        return data;
    }

    /** The status words for a stage, e.g. {@code 55 % — certifying the policy}. */
    static String words(int percent, String stage) {
        return percent + " % — " + stage;
    }
}
