package dockline.view;

import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Spinner;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;

/**
 * Forcing disturbances: the side panel's scenario list (event kind, step, "Add", "Run scenario"),
 * and forcing by pointing ({@link #forceAt}: a right-click on a door or a zone of the map at the
 * current replay step). Both play the policy through the core's forced-event replay
 * ({@link ViewData#force}, over {@code plan.PlanReplays.forced}); a lasting rule's door or zone is
 * then closed for good, as in {@code dockline replay --force}. Each forced run is handed to
 * {@code added} (the window puts it in the run list). FX thread only.
 */
final class ForcingPanel {

    /** The event kinds a right-click can force: those that strike a move into the clicked cell. */
    private static final List<EventKind> POINTABLE = List.of(EventKind.DOOR_SHUT, EventKind.BLOCKAGE, EventKind.DRAG);

    private final ChoiceBox<EventKind> forceKind = new ChoiceBox<>();
    private final TextField forceSlipTo = new TextField();
    private final Spinner<Integer> forceStep = new Spinner<>(1, 10_000, 1);
    private final ListView<ScenarioEvent> forcedList = new ListView<>();
    private final Button forceAdd = new Button("Add");
    private final Button forceRun = new Button("Run _scenario");
    private final VBox forceBox = new VBox(4);
    private final VBox node;
    private final Consumer<ViewReplay> added;
    private final Consumer<String> status;
    private ViewData data;

    ForcingPanel(Consumer<ViewReplay> added, Consumer<String> status) {
        this.added = added;
        this.status = status;
        forceKind.setId("force-kind");
        forceKind.setConverter(new StringConverter<>() {
            @Override
            public String toString(EventKind k) {
                return k == null ? "" : k.word();
            }

            @Override
            public EventKind fromString(String s) {
                return EventKind.ofWord(s);
            }
        });
        forceSlipTo.setId("force-slip-to");
        forceSlipTo.setPromptText("x:y");
        forceSlipTo.setPrefColumnCount(5);
        forceSlipTo.disableProperty().bind(forceKind.valueProperty().isNotEqualTo(EventKind.SLIP));
        forceStep.setId("force-step");
        forceStep.setPrefWidth(80);
        forceStep.setEditable(true);
        forcedList.setId("forced");
        forcedList.setPrefHeight(60);
        forceAdd.setId("force-add");
        forceRun.setId("force-run");
        Button forceClear = new Button("Clear");
        forceClear.setOnAction(e -> forcedList.getItems().clear());
        forceAdd.setOnAction(e -> addForced());
        forceRun.setOnAction(e -> runScenario());
        HBox kindRow = new HBox(6, forceKind, new Label("slip to"), forceSlipTo);
        kindRow.setAlignment(Pos.CENTER_LEFT);
        HBox stepRow = new HBox(6, new Label("at step"), forceStep, forceAdd, forceClear);
        stepRow.setAlignment(Pos.CENTER_LEFT);
        Label hint = new Label("Or right-click a door or zone on the map: its event strikes the robot's next move into it"
                + " after the current step.");
        hint.setWrapText(true);
        hint.getStyleClass().add("certificate");
        forceBox.getChildren().addAll(kindRow, stepRow, forcedList, forceRun, hint);
        node = SidePanels.section("Force disturbances (scenario)", forceBox);
    }

    VBox node() {
        return node;
    }

    /** New data: the kinds its map has, an empty scenario, enabled when the data can force. */
    void show(ViewData d) {
        this.data = d;
        forceKind.getItems().clear();
        forcedList.getItems().clear();
        if (d == null) {
            forceBox.setDisable(true);
            return;
        }
        List<EventRule> rules = d.mission().map().disturbances().rules();
        for (EventKind ek : EventKind.values()) {
            if (rules.stream().anyMatch(r -> r.kind() == ek)) {
                forceKind.getItems().add(ek);
            }
        }
        if (!forceKind.getItems().isEmpty()) {
            forceKind.setValue(forceKind.getItems().get(0));
        }
        forceBox.setDisable(!d.canForce() || rules.isEmpty());
    }

    private void addForced() {
        EventKind k = forceKind.getValue();
        Integer s = forceStep.getValue();
        if (k == null || s == null) {
            return;
        }
        Cell to = null;
        String t = forceSlipTo.getText() == null ? "" : forceSlipTo.getText().trim();
        if (k == EventKind.SLIP && !t.isEmpty()) {
            String[] xy = t.split(":");
            try {
                to = new Cell(Integer.parseInt(xy[0].trim()), Integer.parseInt(xy[1].trim()));
            } catch (RuntimeException e) {
                status.accept("'" + t + "' is not a cell; write x:y, e.g. 3:4");
                return;
            }
        }
        ScenarioEvent f = new ScenarioEvent(s, k, to);
        forcedList.getItems().removeIf(e -> e.step() == f.step());
        forcedList.getItems().add(f);
        forcedList.getItems().sort(Comparator.comparingInt(ScenarioEvent::step));
    }

    private void runScenario() {
        if (data == null || !data.canForce() || forcedList.getItems().isEmpty()) {
            return;
        }
        play(List.copyOf(forcedList.getItems()), null).ifPresent(r -> status.accept("scenario added: " + r.title()));
    }

    /** Plays the events; on success hands the run on; on failure says why. */
    private Optional<ViewReplay> play(List<ScenarioEvent> events, String what) {
        Optional<ViewReplay> r;
        try {
            r = data.force(events);
        } catch (IllegalArgumentException e) {
            status.accept((what == null ? "that scenario" : what) + " cannot be played: " + e.getMessage());
            return Optional.empty();
        }
        if (r.isEmpty()) {
            status.accept((what == null ? "that scenario" : what) + " cannot be played");
            return Optional.empty();
        }
        added.accept(r.get());
        return r;
    }

    /**
     * A right-click on the cell: with one door or zone event there it is forced at once, with several
     * a menu asks which; with none the status line says so.
     */
    void pointed(BuildingMap map, Cell c, Consumer<EventRule> force, javafx.scene.Node owner, double screenX,
                 double screenY) {
        List<EventRule> rules = pointable(map, c);
        if (rules.isEmpty()) {
            status.accept("no door or zone at " + c + " has an event to force (right-click a door that may shut, or a"
                    + " blockage or drag zone)");
            return;
        }
        if (rules.size() == 1) {
            force.accept(rules.get(0));
            return;
        }
        javafx.scene.control.ContextMenu menu = new javafx.scene.control.ContextMenu();
        menu.setId("force-menu");
        for (EventRule r : rules) {
            javafx.scene.control.MenuItem mi = new javafx.scene.control.MenuItem("Force " + r.kind().word() + " ("
                    + r.label() + ") here");
            mi.setMnemonicParsing(false);
            mi.setOnAction(e -> force.accept(r));
            menu.getItems().add(mi);
        }
        menu.show(owner, screenX, screenY);
    }

    /** The door or zone events a right-click on the cell can force, with the rule each comes from. */
    static List<EventRule> pointable(BuildingMap map, Cell c) {
        List<EventRule> out = new ArrayList<>();
        if (map == null || !map.inside(c)) {
            return out;
        }
        for (EventRule r : map.disturbances().rules()) {
            if (POINTABLE.contains(r.kind()) && r.covers(c) && (r.kind() != EventKind.DOOR_SHUT || map.terrainAt(c).door())) {
                out.add(r);
            }
        }
        return out;
    }

    /**
     * Forces the rule's event on the door or zone at the cell, at the robot's first move into it after
     * {@code step} of the run {@code current}: the run's own disturbances up to that step are kept
     * (so the run is the same up to there), the policy's run from there on with nominal outcomes is
     * played to find that move, and the event is forced at its step. The forced run is added.
     *
     * @return the forced run, or empty (the reason is in the status line)
     */
    Optional<ViewReplay> forceAt(Cell c, EventRule rule, ViewReplay current, int step) {
        if (data == null || !data.canForce()) {
            status.accept("forcing needs a checked mission with a policy (a one-trip mission; press Check)");
            return Optional.empty();
        }
        BuildingMap map = data.mission().map();
        String place = rule.kind() == EventKind.DOOR_SHUT ? "door " + map.doorName(c) : rule.kind().word() + " zone '"
                + rule.label() + "'";
        List<ScenarioEvent> kept = new ArrayList<>();
        if (current != null) {
            for (ViewStep st : current.steps()) {
                if (st.step() >= 1 && st.step() <= step && st.hasEvent()) {
                    kept.add(new ScenarioEvent(st.step(), st.event(), st.event() == EventKind.SLIP ? st.eventCell() : null));
                }
            }
        }
        ViewReplay prefix;
        try {
            Optional<ViewReplay> p = data.force(kept);
            if (p.isEmpty()) {
                status.accept("the " + place + " cannot be forced here: the run up to step " + step + " cannot be replayed");
                return Optional.empty();
            }
            prefix = p.get();
        } catch (IllegalArgumentException e) {
            status.accept("the " + place + " cannot be forced here: " + e.getMessage());
            return Optional.empty();
        }
        int at = -1;
        for (int i = step + 1; i < prefix.steps().size() && at < 0; i++) {
            ViewStep st = prefix.steps().get(i);
            ViewStep before = prefix.steps().get(i - 1);
            boolean into = st.action() != null && st.action().kind() == ActionKind.MOVE
                    && (rule.kind() == EventKind.DOOR_SHUT ? st.action().target().equals(c) : rule.covers(st.action().target()));
            if (into && before.budgetLeft() > 0) {
                at = i;
            }
        }
        if (at < 0) {
            status.accept("the robot's run does not try to enter the " + place + " after step " + step
                    + (step > 0 ? " (or no disturbance is left by then)" : "") + "; nothing forced");
            return Optional.empty();
        }
        int forcedStep = at;
        List<ScenarioEvent> events = new ArrayList<>(kept);
        events.add(new ScenarioEvent(forcedStep, rule.kind(), null));
        Optional<ViewReplay> r = play(events, rule.kind().word() + " at the " + place);
        r.ifPresent(x -> status.accept("forced " + rule.kind().word() + " at the " + place + " at step " + forcedStep
                + (rule.lasting() ? " (lasting: it stays closed for the rest of the mission)" : "") + "; run added: "
                + x.title()));
        return r;
    }
}
