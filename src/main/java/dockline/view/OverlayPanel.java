package dockline.view;

import dockline.model.Mission;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.geometry.Pos;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.Slider;
import javafx.scene.control.Spinner;
import javafx.scene.control.SpinnerValueFactory;
import javafx.scene.control.Toggle;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;

/**
 * The side panel's "Show on the map" section: which overlay (plain, charge needed, policy), the
 * situation it is read in (tasks done, disturbances left, battery level or the replay step), and
 * the keys of what is drawn. It holds the user's choices only; the window turns them into
 * {@link MapLayers}. FX thread only.
 */
final class OverlayPanel {

    /** Which battery level the policy overlay is read at. */
    enum PolicyMode {
        FOLLOW("the current replay step"),
        ANY("every level it meets"),
        LEVEL("the level below");

        private final String words;

        PolicyMode(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    private final ToggleGroup overlayGroup = new ToggleGroup();
    private final RadioButton plainToggle = new RadioButton("_Plain map");
    private final RadioButton heatToggle = new RadioButton("C_harge needed");
    private final RadioButton policyToggle = new RadioButton("P_olicy");
    private final ChoiceBox<ProgressChoices.Choice> progressChoice = new ChoiceBox<>();
    private final Spinner<Integer> budgetSpinner = new Spinner<>(0, 0, 0);
    private final Slider levelSlider = new Slider(0, 1, 1);
    private final Label levelLabel = new Label("");
    private final ChoiceBox<PolicyMode> policyMode = new ChoiceBox<>(FXCollections.observableArrayList(PolicyMode.values()));
    private final StackPane keyBox = new StackPane();
    private final VBox node;
    private boolean updating;

    /** {@code changed} runs whenever a choice changes what the map shows. */
    OverlayPanel(Runnable changed) {
        plainToggle.setId("overlay-plain");
        heatToggle.setId("overlay-heat");
        policyToggle.setId("overlay-policy");
        for (RadioButton r : List.of(plainToggle, heatToggle, policyToggle)) {
            r.setToggleGroup(overlayGroup);
            r.setMnemonicParsing(true);
        }
        plainToggle.setUserData(Overlay.PLAIN);
        heatToggle.setUserData(Overlay.HEAT);
        policyToggle.setUserData(Overlay.POLICY);
        heatToggle.setSelected(true);
        progressChoice.setId("progress");
        progressChoice.setMaxWidth(Double.MAX_VALUE);
        budgetSpinner.setId("budget");
        budgetSpinner.setPrefWidth(80);
        levelSlider.setId("level");
        levelSlider.setBlockIncrement(1);
        levelLabel.setId("level-label");
        levelLabel.setWrapText(true);
        GridPane og = new GridPane();
        og.setHgap(6);
        og.setVgap(4);
        og.addRow(0, new Label("Tasks done"), progressChoice);
        og.addRow(1, new Label("Disturbances left"), budgetSpinner);
        GridPane.setHgrow(progressChoice, Priority.ALWAYS);
        keyBox.setId("key");
        keyBox.setAlignment(Pos.TOP_LEFT);
        policyMode.setId("policy-mode");
        policyMode.setValue(PolicyMode.ANY);
        policyMode.setTooltip(new Tooltip("The replay step: the battery, disturbances left and tasks done at the current"
                + " step. Every level: each cell's move over all battery levels the policy meets there."));
        HBox modeRow = new HBox(6, new Label("Policy at"), policyMode);
        modeRow.setAlignment(Pos.CENTER_LEFT);
        HBox toggles = new HBox(8, plainToggle, heatToggle, policyToggle);
        node = SidePanels.section("Show on the map", toggles, og, modeRow, levelSlider, levelLabel, keyBox);

        overlayGroup.selectedToggleProperty().addListener((o, a, b) -> {
            if (b != null) {
                changed.run();
            }
        });
        progressChoice.valueProperty().addListener((o, a, b) -> fire(changed));
        budgetSpinner.valueProperty().addListener((o, a, b) -> fire(changed));
        policyMode.valueProperty().addListener((o, a, b) -> fire(changed));
        levelSlider.valueProperty().addListener((o, a, b) -> {
            if (!updating) {
                long r = Math.round(levelSlider.getValue());
                if (r != levelSlider.getValue()) {
                    levelSlider.setValue(r);
                    return;
                }
            }
            fire(changed);
        });
    }

    private void fire(Runnable changed) {
        if (!updating) {
            changed.run();
        }
    }

    VBox node() {
        return node;
    }

    void setDisable(boolean off) {
        for (javafx.scene.Node n : List.of(progressChoice, budgetSpinner, levelSlider, plainToggle, heatToggle, policyToggle)) {
            n.setDisable(off);
        }
    }

    /**
     * Sets the choices for a newly shown mission's data, keeping what still applies; fires nothing. A
     * patrol or deadline mission has no charge-needed map (a one-trip figure): that choice is off for
     * it, and the plain map is shown instead.
     */
    void showMission(Mission m, boolean solved) {
        updating = true;
        try {
            boolean oneTrip = !m.beyondOneTrip();
            heatToggle.setDisable(!oneTrip);
            heatToggle.setTooltip(oneTrip ? null : new Tooltip("no charge-needed map for a patrol or a deadline mission"));
            if (!oneTrip && overlay() == Overlay.HEAT) {
                plainToggle.setSelected(true);
            }
            List<ProgressChoices.Choice> choices = ProgressChoices.of(m);
            ProgressChoices.Choice keep = progressChoice.getValue();
            progressChoice.getItems().setAll(choices);
            int initial = ProgressChoices.initialMask(m);
            ProgressChoices.Choice pick = choices.stream().filter(c -> keep != null && c.mask() == keep.mask()).findFirst()
                    .orElse(choices.stream().filter(c -> c.mask() == initial).findFirst().orElse(choices.get(0)));
            progressChoice.setValue(pick);

            int k = m.map().disturbances().budget();
            Integer oldK = budgetSpinner.getValue();
            budgetSpinner.setValueFactory(new SpinnerValueFactory.IntegerSpinnerValueFactory(0, k,
                    oldK == null ? k : Math.min(k, oldK)));
            if (oldK == null || oldK > k || !solved) {
                budgetSpinner.getValueFactory().setValue(k);
            }
            int lo = m.reserveUnits();
            int hi = Math.max(lo, m.capacityUnits());
            levelSlider.setMin(lo);
            levelSlider.setMax(hi);
            levelSlider.setMajorTickUnit(Math.max(1, (hi - lo) / 4.0));
            levelSlider.setValue(Math.max(lo, Math.min(hi, m.startUnits())));
        } finally {
            updating = false;
        }
    }

    /** Shows a map's own key alone (no mission). */
    void showMapKey(dockline.model.BuildingMap map) {
        keyBox.getChildren().setAll(map != null ? Legends.mapKey(map) : new Label(""));
        levelLabel.setText("");
    }

    Overlay overlay() {
        Toggle t = overlayGroup.getSelectedToggle();
        return t == null ? Overlay.HEAT : (Overlay) t.getUserData();
    }

    /** Selects what is drawn over the map. */
    void setOverlay(Overlay o) {
        switch (o) {
            case PLAIN -> plainToggle.setSelected(true);
            case HEAT -> heatToggle.setSelected(true);
            case POLICY -> policyToggle.setSelected(true);
        }
    }

    PolicyMode policyMode() {
        return policyMode.getValue();
    }

    /** The task progress chosen, as a bit mask (0 before any choice). */
    int progressMask() {
        ProgressChoices.Choice pc = progressChoice.getValue();
        return pc == null ? 0 : pc.mask();
    }

    String progressLabel() {
        ProgressChoices.Choice pc = progressChoice.getValue();
        return pc == null ? "?" : pc.label();
    }

    /** The disturbances left chosen, or {@code fallback} before any choice. */
    int budget(int fallback) {
        Integer k = budgetSpinner.getValue();
        return k == null ? fallback : k;
    }

    int level() {
        return (int) Math.round(levelSlider.getValue());
    }

    /**
     * After the layers were rebuilt: the keys for what is drawn, which controls apply, and the
     * words for the situation the policy is read in.
     */
    void shown(Mission m, MapLayers l, boolean following, int level, int budget) {
        Overlay o = overlay();
        VBox key = new VBox(6);
        if (o == Overlay.HEAT) {
            key.getChildren().add(Legends.heatKey(m, l.heatLow(), l.heatHigh(), l.heatNote(), l.heatRanged() != null));
        } else if (o == Overlay.POLICY) {
            key.getChildren().add(Legends.policyKey());
        }
        key.getChildren().add(Legends.mapKey(m.map()));
        keyBox.getChildren().setAll(key);
        levelSlider.setDisable(o != Overlay.POLICY || policyMode.getValue() != PolicyMode.LEVEL);
        policyMode.setDisable(o != Overlay.POLICY);
        if (o != Overlay.POLICY) {
            levelLabel.setText("");
        } else if (following) {
            levelLabel.setText("policy shown for the replay step: battery " + Units.both(m, level) + ", " + budget
                    + " disturbances left");
        } else if (policyMode.getValue() == PolicyMode.ANY) {
            levelLabel.setText("policy shown at every battery level it meets on each cell");
        } else {
            levelLabel.setText("policy shown for a battery of " + Units.both(m, level()));
        }
    }
}
