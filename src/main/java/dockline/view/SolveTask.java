package dockline.view;

import dockline.model.Mission;
import dockline.util.ProgressListener;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.function.ObjIntConsumer;
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
        ViewData data = analyzer.analyze(mission, this::isCancelled, new Status((words, percent) -> {
            updateProgress(percent, 100);
            updateMessage(words);
        }));
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

    /**
     * The analyzer's progress as the task's per cent and words: a stage moves the bar, a phase of the
     * stage shows in the words with its own per cent, e.g.
     * {@code 4 % — solving the game (solving the game at floor 83 units: 42 %)}, without moving the bar.
     */
    static final class Status implements ProgressListener {
        private final ObjIntConsumer<String> show;
        private int percent;
        private String stage = "solving";

        /** {@code show} gets the words and the bar's per cent (0 to 100) at each report. */
        Status(ObjIntConsumer<String> show) {
            this.show = show;
        }

        @Override
        public void stage(int percent, String stage) {
            this.percent = Math.max(0, Math.min(100, percent));
            this.stage = stage;
            show.accept(words(this.percent, stage), this.percent);
        }

        @Override
        public void phase(String phase, int phasePercent) {
            show.accept(words(percent, stage + " (" + phase + ": " + phasePercent + " %)"), percent);
        }
    }
}
