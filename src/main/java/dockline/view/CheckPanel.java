package dockline.view;

import dockline.io.Quantities;
import dockline.model.Charge;
import dockline.model.Mission;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.binding.BooleanExpression;
import javafx.collections.FXCollections;
import javafx.concurrent.Task;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The side panel's "Reserve and charge" section: the reserve floor and starting charge fields, the
 * Check and Cancel buttons, a progress bar with its per cent and the status line of the last check.
 *
 * <p>The figures typed are checked by the same rules as the command line's overrides
 * ({@code MissionOptions} in the cli, the mission loader's {@code MissionReading}): a charge in the
 * written form, within the capacity, and a floor that is not above the starting charge once both are
 * rounded to whole energy units against the robot. A refused figure is explained here and nothing
 * is solved. FX thread only.
 */
final class CheckPanel {

    private final TextField reserveField = new TextField();
    private final ChoiceBox<String> reserveUnit = new ChoiceBox<>(FXCollections.observableArrayList("%", "Wh"));
    private final TextField startField = new TextField();
    private final ChoiceBox<String> startUnit = new ChoiceBox<>(FXCollections.observableArrayList("%", "Wh"));
    private final Button checkButton = new Button("_Check");
    private final Button cancelButton = new Button("C_ancel");
    private final ProgressBar solving = new ProgressBar(-1);
    private final Label solveStatus = new Label("");
    private final VBox node;

    CheckPanel(Runnable onCheck, Runnable onCancel) {
        reserveField.setId("reserve");
        reserveField.setPrefColumnCount(6);
        reserveUnit.setId("reserve-unit");
        startField.setId("start-charge");
        startField.setPrefColumnCount(6);
        startUnit.setId("start-unit");
        reserveUnit.setValue("%");
        startUnit.setValue("%");
        Label reserveLabel = new Label("_Reserve floor");
        reserveLabel.setMnemonicParsing(true);
        reserveLabel.setLabelFor(reserveField);
        Label startLabel = new Label("_Starting charge");
        startLabel.setMnemonicParsing(true);
        startLabel.setLabelFor(startField);
        GridPane grid = new GridPane();
        grid.setHgap(6);
        grid.setVgap(4);
        grid.addRow(0, reserveLabel, reserveField, reserveUnit);
        grid.addRow(1, startLabel, startField, startUnit);
        checkButton.setId("check");
        checkButton.setDefaultButton(true);
        checkButton.setTooltip(new Tooltip("Solve again with these figures (F5)"));
        checkButton.setOnAction(e -> onCheck.run());
        cancelButton.setId("cancel");
        cancelButton.setTooltip(new Tooltip("Stop the running check; the previous result stays (Ctrl+.)"));
        cancelButton.setOnAction(e -> onCancel.run());
        solving.setId("solving");
        solving.setPrefWidth(90);
        solveStatus.setId("solve-status");
        solveStatus.setWrapText(true);
        solveStatus.setMaxWidth(Double.MAX_VALUE);
        HBox buttons = new HBox(6, checkButton, cancelButton, solving);
        buttons.setAlignment(Pos.CENTER_LEFT);
        HBox.setHgrow(solving, Priority.NEVER);
        node = SidePanels.section("Reserve and charge", grid, buttons, solveStatus);
    }

    VBox node() {
        return node;
    }

    /** Binds the buttons and the progress bar to the running check ({@code running} is null when none). */
    void bind(javafx.beans.value.ObservableObjectValue<Task<?>> running, BooleanExpression hasMission) {
        checkButton.disableProperty().bind(javafx.beans.binding.Bindings.isNotNull(running).or(hasMission.not()));
        cancelButton.disableProperty().bind(javafx.beans.binding.Bindings.isNull(running));
        solving.visibleProperty().bind(javafx.beans.binding.Bindings.isNotNull(running));
    }

    void setDisable(boolean off) {
        for (javafx.scene.Node n : new javafx.scene.Node[] {reserveField, reserveUnit, startField, startUnit}) {
            n.setDisable(off);
        }
    }

    /** Shows the mission's own figures in the fields. */
    void show(Mission m) {
        set(m.reserve(), reserveField, reserveUnit);
        set(m.startCharge(), startField, startUnit);
        solveStatus.setText("");
    }

    private static void set(Charge c, TextField f, ChoiceBox<String> unit) {
        f.setText(c.amount().stripTrailingZeros().toPlainString());
        unit.setValue(c.percent() ? "%" : "Wh");
    }

    /**
     * The mission with the figures in the fields, or empty when they are refused (the reason is then
     * in the status line).
     */
    Optional<Mission> missionToCheck(Mission base) {
        Mission m;
        try {
            Charge reserve = parseCharge(base, reserveField.getText(), reserveUnit.getValue(), "reserve floor");
            Charge start = parseCharge(base, startField.getText(), startUnit.getValue(), "starting charge");
            m = base.withReserve(reserve).withStartCharge(start);
        } catch (IllegalArgumentException e) {
            solveStatus.setText(e.getMessage());
            return Optional.empty();
        }
        String wrong = refusal(m);
        if (wrong != null) {
            solveStatus.setText(wrong);
            return Optional.empty();
        }
        return Optional.of(m);
    }

    /**
     * Why the figures cannot be checked once rounded to whole units, or null: the same two rules as
     * the command line's overrides (a floor above the capacity, a floor above the starting charge).
     */
    static String refusal(Mission m) {
        String unit = m.scale().formatWh(1);
        if (m.reserveUnits() > m.capacityUnits()) {
            return "the reserve floor (" + m.scale().formatWh(m.reserveUnits()) + ") is above the capacity ("
                    + m.scale().formatWh(m.capacityUnits()) + ") in whole energy units (hint: give a lower reserve;"
                    + " the floor rounds up and the capacity down to units of " + unit + ")";
        }
        int start = Math.min(m.capacityUnits(), m.startUnits());
        if (m.reserveUnits() > start) {
            // a robot that starts below its floor is an input mistake, not a question for the solver
            return "the reserve floor (" + m.scale().formatWh(m.reserveUnits()) + ") is above the starting charge ("
                    + m.scale().formatWh(start) + ") in whole energy units (hint: lower the reserve floor or raise the"
                    + " starting charge; the floor rounds up and the charge down to units of " + unit + ")";
        }
        return null;
    }

    /** The field's charge (the unit chooser applies when the text has no unit of its own), checked against the capacity. */
    private static Charge parseCharge(Mission base, String text, String unit, String what) {
        String t = text == null ? "" : text.trim().replace(',', '.');
        boolean hasUnit = t.endsWith("%") || t.toLowerCase(Locale.ROOT).endsWith("wh");
        Charge c;
        try {
            c = Quantities.parseCharge(hasUnit || t.isEmpty() ? t : t + ("%".equals(unit) ? "%" : " Wh"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("the " + what + ": " + e.getMessage());
        }
        String wrong = Quantities.checkAgainstCapacity(c, base.robot().capacityWh());
        if (wrong != null) {
            throw new IllegalArgumentException("the " + what + ": " + wrong);
        }
        return c;
    }

    /** Follows a running check: its per cent on the bar, its stage in words under it. */
    void follow(Task<?> t) {
        solving.progressProperty().bind(t.progressProperty());
        solveStatus.textProperty().bind(t.messageProperty());
    }

    /** Stops following the check and shows the words given. */
    void finished(String words) {
        solving.progressProperty().unbind();
        solving.setProgress(-1);
        solveStatus.textProperty().unbind();
        solveStatus.setText(words);
    }

    void say(String words) {
        if (!solveStatus.textProperty().isBound()) {
            solveStatus.setText(words);
        }
    }
}
