package dockline.view;

import dockline.model.Mission;
import java.util.List;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Slider;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The replay area under the map: the player's buttons and speed, the run chooser, the current step
 * in words, the run's notes and the battery chart.
 *
 * <p>Layout rules (issue: controls that do not move, nothing cut off): the buttons come first in
 * their row and have fixed widths, so neither a longer run title nor the Play/Pause text moves
 * them; the step text has a row of its own and wraps; the notes wrap inside a scroll pane; the run
 * chooser, the step text and the notes carry their full text as a tooltip as well. FX thread only.
 */
final class ReplayControls {

    static final double BUTTON_WIDTH = 104;

    private final ReplayPlayer player;
    private final BatteryChart chart;
    private final ComboBox<ViewReplay> replayChoice = new ComboBox<>();
    private final Button backButton = new Button("\u25c0 _Back");
    private final Button playButton = new Button("\u25b6 Pla_y");
    private final Button forwardButton = new Button("_Next \u25b6");
    private final Slider speedSlider = new Slider(0.5, 10, 2);
    private final Label stepLabel = new Label("");
    private final Label replayNotes = new Label("");
    private final VBox node;

    ReplayControls(ReplayPlayer player, BatteryChart chart) {
        this.player = player;
        this.chart = chart;
        replayChoice.setId("replay");
        replayChoice.setMinWidth(160);
        replayChoice.setPrefWidth(360);
        replayChoice.setMaxWidth(Double.MAX_VALUE);
        replayChoice.setTooltip(new Tooltip());
        replayChoice.getTooltip().setWrapText(true);
        replayChoice.getTooltip().setMaxWidth(520);
        replayChoice.valueProperty().addListener((o, a, b) -> replayChoice.getTooltip().setText(b == null ? "no run" : b.title()));
        // the list shows whole titles (wrapped), the box its own tooltip
        replayChoice.setCellFactory(lv -> new ListCell<>() {
            {
                setWrapText(true);
                setPrefWidth(420);
            }

            @Override
            protected void updateItem(ViewReplay r, boolean empty) {
                super.updateItem(r, empty);
                setText(empty || r == null ? null : r.title());
            }
        });
        backButton.setId("step-back");
        playButton.setId("play");
        forwardButton.setId("step-forward");
        for (Button b : List.of(backButton, playButton, forwardButton)) {
            b.setMnemonicParsing(true);
            b.setMinWidth(BUTTON_WIDTH);
            b.setPrefWidth(BUTTON_WIDTH);
            b.setMaxWidth(BUTTON_WIDTH);
        }
        speedSlider.setId("speed");
        speedSlider.setShowTickLabels(false);
        speedSlider.setPrefWidth(100);
        speedSlider.setMinWidth(100);
        speedSlider.setTooltip(new Tooltip("replay speed in steps per second"));
        Label speedLabel = new Label();
        speedLabel.setLabelFor(speedSlider);
        speedLabel.textProperty().bind(speedSlider.valueProperty().asString("speed %.1f/s"));
        speedLabel.setMinWidth(80);
        speedLabel.setPrefWidth(80);
        Label runLabel = new Label("R_un");
        runLabel.setMnemonicParsing(true);
        runLabel.setLabelFor(replayChoice);
        runLabel.setMinWidth(Region.USE_PREF_SIZE);
        HBox bar = new HBox(6, backButton, playButton, forwardButton, speedLabel, speedSlider, runLabel, replayChoice);
        bar.setId("replay-bar");
        bar.setAlignment(Pos.CENTER_LEFT);
        HBox.setHgrow(replayChoice, Priority.ALWAYS);

        stepLabel.setId("step-label");
        stepLabel.setMaxWidth(Double.MAX_VALUE);
        stepLabel.setMinHeight(Region.USE_PREF_SIZE);
        LongText.wrap(stepLabel, 520);

        replayNotes.setId("replay-notes");
        replayNotes.getStyleClass().add("certificate");
        replayNotes.setMaxWidth(Double.MAX_VALUE);
        replayNotes.setMinHeight(Region.USE_PREF_SIZE);
        LongText.wrap(replayNotes, 520);
        ScrollPane notes = new ScrollPane(replayNotes);
        notes.setId("replay-notes-scroll");
        notes.setFitToWidth(true);
        notes.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        notes.setPrefViewportHeight(46);
        notes.setMinHeight(30);
        notes.setStyle("-fx-background-color: transparent; -fx-background: transparent;");

        backButton.setOnAction(e -> player.stepBack());
        forwardButton.setOnAction(e -> player.stepForward());
        playButton.setOnAction(e -> player.togglePlay());
        player.playingProperty().addListener((o, a, b) -> playButton.setText(b ? "\u275a\u275a Pa_use" : "\u25b6 Pla_y"));
        player.speedProperty().bind(speedSlider.valueProperty());

        node = new VBox(3, bar, stepLabel, notes, chart.node());
        node.setPadding(new Insets(4, 10, 0, 10));
        VBox.setVgrow(chart.node(), Priority.ALWAYS);
        node.setMinHeight(150);
    }

    VBox node() {
        return node;
    }

    ComboBox<ViewReplay> choice() {
        return replayChoice;
    }

    ViewReplay current() {
        return replayChoice.getValue();
    }

    void setDisable(boolean off) {
        for (javafx.scene.Node n : List.of(replayChoice, backButton, playButton, forwardButton)) {
            n.setDisable(off);
        }
    }

    /** Shows the runs of newly shown data (the first one chosen by the caller). */
    void setRuns(List<ViewReplay> runs) {
        replayChoice.getItems().setAll(runs);
    }

    /** Adds a run and chooses it. */
    void add(ViewReplay r) {
        replayChoice.getItems().add(r);
        replayChoice.setValue(r);
    }

    /** A run was chosen: the player, the chart and the notes follow it. */
    void chosen(Mission m, ViewReplay r) {
        player.load(r == null ? 0 : r.length(), r == null ? -1 : r.loopStart());
        chart.show(m, r);
        replayNotes.setText(r == null ? "" : String.join(" ", r.notes()));
    }

    /** The step label for the player's step of the chosen run. */
    void showStep(Mission m) {
        ViewReplay r = replayChoice.getValue();
        chart.setStep(player.step());
        stepLabel.setText(m == null || r == null ? "no run to play" : stepWords(m, r, player.step()));
    }

    static String stepWords(Mission m, ViewReplay r, int step) {
        ViewStep st = r.steps().get(Math.max(0, Math.min(step, r.length())));
        StringBuilder sb = new StringBuilder();
        sb.append("step ").append(st.step()).append(" of ").append(r.length());
        if (r.loopStart() >= 0) {
            sb.append(st.step() < r.loopStart() ? " (way in)" : " (lap: steps " + r.loopStart() + " to " + r.length()
                    + ", then step " + r.loopStart() + " again)");
        }
        sb.append(": robot at ").append(st.cell());
        if (st.action() != null) {
            sb.append(" after ").append(st.action());
        }
        if (st.hasEvent()) {
            sb.append("; ").append(st.event().word()).append(st.eventLabel().isEmpty() ? "" : " (" + st.eventLabel() + ")");
        }
        if (!st.closedCells().isEmpty()) {
            sb.append("; closed for good from here: ").append(st.closedCells().size() == 1 ? st.closedCells().get(0)
                    : st.closedCells().size() + " cells");
        }
        sb.append("; battery ").append(Units.both(m, st.levelUnits()));
        sb.append("; disturbances left ").append(st.budgetLeft());
        return sb.toString();
    }

    Label stepLabel() {
        return stepLabel;
    }
}
