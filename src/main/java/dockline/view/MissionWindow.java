package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Terrain;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.RadioButton;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Separator;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.Slider;
import javafx.scene.control.Spinner;
import javafx.scene.control.TextField;
import javafx.scene.control.Toggle;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.stage.Window;

/**
 * The desktop window for one mission at a time: the map with its overlays, the reserve and
 * starting-charge controls with a background re-check, the verdict in words, the replay player
 * with the battery chart, and the safety caveats (always visible).
 *
 * <p>Threading: all fields are touched on the FX thread only. Solving runs in a {@link SolveTask}
 * on one background worker; the window binds to the task's properties and keeps showing the
 * previous result until a new one succeeds (a cancelled or failed check changes nothing shown).
 *
 * <p>Files: mission and map files are only read. The only file written is the recent-files list
 * ({@link RecentFiles}). When a file changes on disk, a notice offers to reload it; the check runs
 * whenever the window regains focus.
 */
public final class MissionWindow {

    private final Analyzer analyzer;
    private final MissionSource source;
    private final RecentFiles recent;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "dockline-solver");
        t.setDaemon(true);
        return t;
    });

    private final BorderPane root = new BorderPane();
    private final MapView mapView = new MapView();
    private final BatteryChart chart = new BatteryChart();
    private final ReplayPlayer player = new ReplayPlayer();
    private final ObjectProperty<ViewData> data = new SimpleObjectProperty<>(this, "data");
    private final ObjectProperty<Task<?>> task = new SimpleObjectProperty<>(this, "task");
    private final javafx.beans.property.BooleanProperty hasMission = new javafx.beans.property.SimpleBooleanProperty(this,
            "hasMission", false);

    // header
    private final Label verdict = new Label("Open a mission (File \u203a Open, Ctrl+O)");
    private final Label certificate = new Label("");
    private final Label figures = new Label("");
    private final VBox notice = new VBox(4);
    // check controls
    private final TextField reserveField = new TextField();
    private final ChoiceBox<String> reserveUnit = new ChoiceBox<>(FXCollections.observableArrayList("%", "Wh"));
    private final TextField startField = new TextField();
    private final ChoiceBox<String> startUnit = new ChoiceBox<>(FXCollections.observableArrayList("%", "Wh"));
    private final Button checkButton = new Button("_Check");
    private final Button cancelButton = new Button("C_ancel");
    private final ProgressIndicator solving = new ProgressIndicator(-1);
    private final Label solveStatus = new Label("");
    // overlay controls
    private final ToggleGroup overlayGroup = new ToggleGroup();
    private final RadioButton plainToggle = new RadioButton("_Plain map");
    private final RadioButton heatToggle = new RadioButton("C_harge needed");
    private final RadioButton policyToggle = new RadioButton("P_olicy");
    private final ChoiceBox<ProgressChoices.Choice> progressChoice = new ChoiceBox<>();
    private final Spinner<Integer> budgetSpinner = new Spinner<>(0, 0, 0);
    private final Slider levelSlider = new Slider(0, 1, 1);
    private final Label levelLabel = new Label("");
    private final ChoiceBox<PolicyMode> policyMode = new ChoiceBox<>(FXCollections.observableArrayList(PolicyMode.values()));

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
    private final StackPane keyBox = new StackPane();
    // replay controls
    private final ComboBox<ViewReplay> replayChoice = new ComboBox<>();
    private final Button backButton = new Button("\u25c0 _Back");
    private final Button playButton = new Button("\u25b6 Pla_y");
    private final Button forwardButton = new Button("_Next \u25b6");
    private final Slider speedSlider = new Slider(0.5, 10, 2);
    private final Label stepLabel = new Label("");
    private final Label replayNotes = new Label("");
    private final ChoiceBox<EventKind> forceKind = new ChoiceBox<>();
    private final TextField forceSlipTo = new TextField();
    private final Spinner<Integer> forceStep = new Spinner<>(1, 10_000, 1);
    private final ListView<ScenarioEvent> forcedList = new ListView<>();
    private final Button forceAdd = new Button("Add");
    private final Button forceRun = new Button("Run _scenario");
    private final VBox forceBox = new VBox(4);
    // other
    private final Label cellInfo = new Label("Point at a cell to see it here.");
    private final Label status = new Label("");
    private final RadioMenuItem[] overlayItems = new RadioMenuItem[3];
    private final Menu recentMenu = new Menu("Open _recent");

    private Mission base;
    private BuildingMap mapOnly;
    private Path file;
    private final Map<Path, FileTime> stamps = new LinkedHashMap<>();
    private final Map<Path, FileTime> dismissed = new LinkedHashMap<>();
    private Stage stage;
    private boolean updatingControls;

    public MissionWindow(Analyzer analyzer, MissionSource source, Path recentStore) {
        this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
        this.source = Objects.requireNonNull(source, "source");
        this.recent = new RecentFiles(recentStore);
        build();
    }

    // ------------------------------------------------------------------ layout

    private void build() {
        root.setId("dockline-window");
        root.getStylesheets().add(PictureRenderer.stylesheet());

        verdict.setId("verdict");
        verdict.setMaxWidth(Double.MAX_VALUE);
        VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
        certificate.setId("certificate");
        certificate.getStyleClass().add("certificate");
        figures.setId("figures");
        figures.getStyleClass().add("certificate");
        notice.setId("notice");
        notice.setVisible(false);
        notice.setManaged(false);
        notice.setPadding(new Insets(4, 10, 4, 10));
        notice.setStyle("-fx-background-color: #fde6c4; -fx-border-color: #d99a3a; -fx-border-width: 0 0 1 0;");
        VBox header = new VBox(3, verdict, certificate, figures);
        header.setPadding(new Insets(6, 10, 4, 10));
        VBox top = new VBox(buildMenu(), header, notice);
        root.setTop(top);


        ScrollPane side = new ScrollPane(buildSide());
        side.setFitToWidth(true);
        side.setPrefViewportWidth(300);
        side.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        root.setRight(side);

        chart.node().setPrefHeight(190);
        status.setId("status");
        status.getStyleClass().add("status-line");
        Label runLabel = new Label("R_un");
        runLabel.setMnemonicParsing(true);
        runLabel.setLabelFor(replayChoice);
        Label speedLabel = new Label();
        speedLabel.setLabelFor(speedSlider);
        speedLabel.textProperty().bind(speedSlider.valueProperty().asString("speed %.1f/s"));
        speedLabel.setMinWidth(Region.USE_PREF_SIZE);
        HBox replayBar = new HBox(6, runLabel, replayChoice, backButton, playButton, forwardButton, speedLabel, speedSlider,
                stepLabel);
        replayBar.setId("replay-bar");
        for (Region n : List.of(runLabel, backButton, playButton, forwardButton, speedSlider)) {
            n.setMinWidth(Region.USE_PREF_SIZE);
        }
        replayChoice.setMinWidth(120);
        stepLabel.setWrapText(false);
        stepLabel.setMinWidth(0);
        stepLabel.setTextOverrun(javafx.scene.control.OverrunStyle.ELLIPSIS);
        stepLabel.setTooltip(new Tooltip());
        stepLabel.getTooltip().textProperty().bind(stepLabel.textProperty());
        replayBar.setAlignment(Pos.CENTER_LEFT);
        replayBar.setPadding(new Insets(4, 10, 0, 10));
        replayChoice.setMaxWidth(260);
        HBox.setHgrow(stepLabel, Priority.ALWAYS);
        replayNotes.setId("replay-notes");
        replayNotes.setWrapText(true);
        replayNotes.getStyleClass().add("certificate");
        replayNotes.setMaxHeight(48);
        VBox replayBox = new VBox(replayBar, replayNotes, chart.node());
        VBox.setVgrow(chart.node(), Priority.ALWAYS);
        replayBox.setMinHeight(150);
        javafx.scene.control.SplitPane split = new javafx.scene.control.SplitPane(mapView, replayBox);
        split.setId("map-split");
        split.setOrientation(Orientation.VERTICAL);
        split.setDividerPositions(0.66);
        javafx.scene.control.SplitPane.setResizableWithParent(replayBox, false);
        root.setCenter(split);
        VBox bottom = new VBox(status, new CaveatPanel());
        root.setBottom(bottom);

        wire();
        refreshAll();
    }

    private MenuBar buildMenu() {
        MenuItem open = item("_Open mission or map\u2026", "Shortcut+O", this::chooseAndOpen);
        MenuItem reload = item("_Reload from disk", "Shortcut+R", this::reload);
        MenuItem close = item("_Close window", "Shortcut+W", () -> {
            if (stage != null) {
                stage.close();
            }
        });
        MenuItem importImage = item("_Import occupancy image\u2026", null, this::importImage);
        Menu fileMenu = new Menu("_File", null, open, recentMenu, importImage, reload, new SeparatorMenuItem(), close);
        fileMenu.setOnShowing(e -> rebuildRecentMenu());
        rebuildRecentMenu();

        MenuItem check = item("_Check now", "F5", this::check);
        MenuItem cancel = item("C_ancel check", "Shortcut+PERIOD", this::cancel);
        Menu checkMenu = new Menu("_Check", null, check, cancel);

        ToggleGroup g = new ToggleGroup();
        String[] names = {"_Plain map", "Charge _needed", "_Policy"};
        for (int i = 0; i < 3; i++) {
            Overlay o = Overlay.values()[i];
            RadioMenuItem r = new RadioMenuItem(names[i]);
            r.setToggleGroup(g);
            r.setAccelerator(KeyCombination.keyCombination("Shortcut+" + (i + 1)));
            r.setOnAction(e -> setOverlay(o));
            overlayItems[i] = r;
        }
        MenuItem zoomIn = item("Zoom _in", "Shortcut+EQUALS", mapView::zoomIn);
        MenuItem zoomOut = item("Zoom _out", "Shortcut+MINUS", mapView::zoomOut);
        MenuItem fit = item("_Fit map", "Shortcut+0", mapView::fit);
        Menu viewMenu = new Menu("_View", null, overlayItems[0], overlayItems[1], overlayItems[2], new SeparatorMenuItem(),
                zoomIn, zoomOut, fit);

        MenuItem play = item("_Play / pause", "F7", player::togglePlay);
        MenuItem back = item("Step _back", "F6", player::stepBack);
        MenuItem fwd = item("Step _forward", "F8", player::stepForward);
        MenuItem first = item("To the _start", "Shortcut+HOME", player::toStart);
        MenuItem end = item("To the _end", "Shortcut+END", player::toEnd);
        Menu replayMenu = new Menu("_Replay", null, play, back, fwd, first, end);
        MenuBar bar = new MenuBar(fileMenu, checkMenu, viewMenu, replayMenu);
        bar.setId("menu");
        return bar;
    }

    private static MenuItem item(String text, String accel, Runnable action) {
        MenuItem m = new MenuItem(text);
        m.setMnemonicParsing(true);
        if (accel != null) {
            m.setAccelerator(KeyCombination.keyCombination(accel));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    private Node buildSide() {
        // check
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
        cancelButton.setId("cancel");
        cancelButton.setTooltip(new Tooltip("Stop the running check; the previous result stays (Ctrl+.)"));
        solving.setId("solving");
        solving.setPrefSize(22, 22);
        solveStatus.setId("solve-status");
        solveStatus.setWrapText(true);
        HBox buttons = new HBox(6, checkButton, cancelButton, solving);
        buttons.setAlignment(Pos.CENTER_LEFT);
        VBox checkSec = section("Reserve and charge", grid, buttons, solveStatus);

        // overlay
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
        VBox overlaySec = section("Show on the map", new HBox(8, plainToggle, heatToggle, policyToggle), og,
                modeRow, levelSlider, levelLabel, keyBox);

        // replay
        replayChoice.setId("replay");
        replayChoice.setMaxWidth(Double.MAX_VALUE);
        backButton.setId("step-back");
        playButton.setId("play");
        forwardButton.setId("step-forward");
        for (Button b : List.of(backButton, playButton, forwardButton)) {
            b.setMnemonicParsing(true);
        }
        speedSlider.setId("speed");
        speedSlider.setShowTickLabels(false);
        speedSlider.setPrefWidth(110);
        speedSlider.setTooltip(new Tooltip("replay speed in steps per second"));
        stepLabel.setId("step-label");
        stepLabel.setWrapText(true);
        stepLabel.setMaxWidth(Double.MAX_VALUE);
        forceKind.setId("force-kind");
        forceKind.setConverter(new javafx.util.StringConverter<>() {
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
        forceBox.getChildren().addAll(kindRow, stepRow, forcedList, forceRun);
        VBox forceSec = section("Force disturbances (scenario)", forceBox);

        cellInfo.setId("cell-info");
        cellInfo.getStyleClass().add("cell-info");
        cellInfo.setWrapText(true);
        cellInfo.setMinHeight(Region.USE_PREF_SIZE);
        VBox cellSec = section("Cell", cellInfo);

        VBox side = new VBox(checkSec, overlaySec, cellSec, forceSec);
        side.getStyleClass().add("side-panel");
        side.setPrefWidth(300);
        return side;
    }

    private static VBox section(String title, Node... content) {
        Label t = new Label(title);
        t.getStyleClass().add("section-title");
        VBox v = new VBox(t);
        v.getChildren().addAll(content);
        v.getStyleClass().add("section");
        return v;
    }

    // ------------------------------------------------------------------ behaviour wiring

    private void wire() {
        checkButton.setOnAction(e -> check());
        cancelButton.setOnAction(e -> cancel());
        checkButton.disableProperty().bind(task.isNotNull().or(hasMission.not()));
        cancelButton.disableProperty().bind(task.isNull());
        solving.visibleProperty().bind(task.isNotNull());

        overlayGroup.selectedToggleProperty().addListener((o, a, b) -> {
            if (b != null) {
                syncOverlayMenu();
                refreshLayers();
            }
        });
        progressChoice.valueProperty().addListener((o, a, b) -> refreshLayers());
        budgetSpinner.valueProperty().addListener((o, a, b) -> refreshLayers());
        levelSlider.valueProperty().addListener((o, a, b) -> {
            if (!updatingControls) {
                long r = Math.round(levelSlider.getValue());
                if (r != levelSlider.getValue()) {
                    levelSlider.setValue(r);
                    return;
                }
            }
            updateLevelLabel();
            refreshLayers();
        });
        replayChoice.valueProperty().addListener((o, a, b) -> onReplayChosen());
        policyMode.valueProperty().addListener((o, a, b) -> refreshLayers());

        backButton.setOnAction(e -> player.stepBack());
        forwardButton.setOnAction(e -> player.stepForward());
        playButton.setOnAction(e -> player.togglePlay());
        player.playingProperty().addListener((o, a, b) -> playButton.setText(b ? "\u275a\u275a Pa_use" : "\u25b6 Pla_y"));
        player.speedProperty().bind(speedSlider.valueProperty());
        player.stepProperty().addListener((o, a, b) -> onStep());

        mapView.hoverCellProperty().addListener((o, a, b) -> updateCellInfo(b));
        data.addListener((o, a, b) -> refreshAll());
    }

    /** Keyboard shortcuts and file checks on a real stage; also sets the title. */
    public void attach(Stage s) {
        this.stage = s;
        updateTitle();
        s.focusedProperty().addListener((o, a, b) -> {
            if (b) {
                checkFilesChanged();
            }
        });
        s.setOnHidden(e -> dispose());
    }

    /** A scene holding this window's content (for a stage, or for tests). */
    public Scene scene(double width, double height) {
        return new Scene(root, width, height);
    }

    public Parent root() {
        return root;
    }

    /** Stops a running check and the worker thread. */
    public void dispose() {
        Task<?> t = task.get();
        if (t != null) {
            t.cancel();
        }
        player.pause();
        worker.shutdownNow();
    }

    // ------------------------------------------------------------------ opening

    private void chooseAndOpen() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Open a dockline mission or map");
        fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("YAML files", "*.yaml", "*.yml"),
                new FileChooser.ExtensionFilter("All files", "*"));
        if (file != null && file.toAbsolutePath().getParent() != null) {
            fc.setInitialDirectory(file.toAbsolutePath().getParent().toFile());
        }
        Window owner = root.getScene() != null ? root.getScene().getWindow() : null;
        java.io.File f = fc.showOpenDialog(owner);
        if (f != null) {
            open(f.toPath());
        }
    }

    /** The import dialog ({@link ImportDialog}); the map it writes is opened. */
    private void importImage() {
        Path folder = file != null && file.toAbsolutePath().getParent() != null ? file.toAbsolutePath().getParent() : null;
        Window owner = root.getScene() != null ? root.getScene().getWindow() : null;
        new ImportDialog(owner, folder).showAndWait().ifPresent(this::open);
    }

    private void rebuildRecentMenu() {
        recentMenu.getItems().clear();
        for (Path p : recent.files()) {
            MenuItem m = new MenuItem(p.getFileName() + "  \u2014  " + p);
            m.setMnemonicParsing(false);
            m.setOnAction(e -> open(p));
            recentMenu.getItems().add(m);
        }
        recentMenu.setDisable(recentMenu.getItems().isEmpty());
    }

    /** Reads a mission (or map) file and shows it; on a bad file, shows the errors and keeps what was shown. */
    public boolean open(Path p) {
        MissionSource.Opened o;
        try {
            o = source.open(p);
        } catch (MissionSource.OpenException e) {
            showNotice("Could not open " + p.getFileName() + ":\n" + String.join("\n", e.messages()), List.of());
            if (!Files.exists(p)) {
                recent.remove(p);
            }
            return false;
        }
        hideNotice();
        recent.add(p);
        file = p;
        stamps.clear();
        dismissed.clear();
        remember(p);
        if (o.map().source() != null) {
            remember(o.map().source());
        }
        if (o.mission() == null) {
            showMapOnly(o.map());
        } else {
            showMission(o.mission());
            check();
        }
        updateTitle();
        return true;
    }

    private void remember(Path p) {
        try {
            stamps.put(p, Files.getLastModifiedTime(p));
        } catch (IOException | RuntimeException gone) {
            stamps.put(p, FileTime.fromMillis(0));
        }
    }

    /** Shows a mission without a file behind it (it is not checked until asked). */
    public void showMission(Mission m) {
        Task<?> t = task.get();
        if (t != null) {
            t.cancel();
        }
        base = m;
        mapOnly = null;
        hasMission.set(true);
        updatingControls = true;
        try {
            setChargeFields(m.reserve(), reserveField, reserveUnit);
            setChargeFields(m.startCharge(), startField, startUnit);
        } finally {
            updatingControls = false;
        }
        solveStatus.setText("");
        data.set(new MapOnlyData(m));
        updateTitle();
    }

    private void showMapOnly(BuildingMap map) {
        base = null;
        mapOnly = map;
        hasMission.set(false);
        data.set(null);
        refreshAll();
    }

    private static void setChargeFields(Charge c, TextField f, ChoiceBox<String> unit) {
        f.setText(c.amount().stripTrailingZeros().toPlainString());
        unit.setValue(c.percent() ? "%" : "Wh");
    }

    private void reload() {
        hideNotice();
        if (file != null) {
            open(file);
        }
    }

    /** Compares the files' modification times with those at opening; offers a reload when they differ. */
    public boolean checkFilesChanged() {
        List<Path> changed = new ArrayList<>();
        for (Map.Entry<Path, FileTime> e : stamps.entrySet()) {
            FileTime now;
            try {
                now = Files.getLastModifiedTime(e.getKey());
            } catch (IOException | RuntimeException gone) {
                now = FileTime.fromMillis(0);
            }
            if (!now.equals(e.getValue()) && !now.equals(dismissed.get(e.getKey()))) {
                changed.add(e.getKey());
                dismissed.put(e.getKey(), now);
            }
        }
        if (changed.isEmpty()) {
            return false;
        }
        StringBuilder sb = new StringBuilder();
        for (Path p : changed) {
            sb.append(sb.length() == 0 ? "" : ", ").append(p.getFileName());
        }
        Button yes = new Button("_Reload");
        yes.setId("reload-yes");
        yes.setOnAction(e -> reload());
        Button no = new Button("_Keep what is shown");
        no.setId("reload-no");
        no.setOnAction(e -> hideNotice());
        showNotice(sb + " changed on disk. Reload it? (Nothing is ever written to it from here.)", List.of(yes, no));
        return true;
    }

    private void showNotice(String text, List<Button> actions) {
        Label l = new Label(text);
        l.setId("notice-text");
        l.setWrapText(true);
        notice.getChildren().setAll(l);
        if (!actions.isEmpty()) {
            HBox h = new HBox(6);
            h.getChildren().addAll(actions);
            notice.getChildren().add(h);
        } else {
            Button ok = new Button("Dismiss");
            ok.setOnAction(e -> hideNotice());
            notice.getChildren().add(ok);
        }
        notice.setVisible(true);
        notice.setManaged(true);
    }

    private void hideNotice() {
        notice.setVisible(false);
        notice.setManaged(false);
        notice.getChildren().clear();
    }

    private void updateTitle() {
        if (stage == null) {
            return;
        }
        String what = base != null ? base.name() : mapOnly != null ? mapOnly.name() + " (map)" : "no mission";
        stage.setTitle("dockline \u2014 " + what + (file != null ? "  [" + file.getFileName() + "]" : ""));
    }

    // ------------------------------------------------------------------ checking

    /** Re-checks the mission with the reserve floor and starting charge in the fields, in the background. */
    public void check() {
        if (base == null || task.get() != null) {
            return;
        }
        Charge reserve;
        Charge start;
        try {
            reserve = parseCharge(reserveField.getText(), reserveUnit.getValue(), "reserve floor");
            start = parseCharge(startField.getText(), startUnit.getValue(), "starting charge");
        } catch (IllegalArgumentException e) {
            solveStatus.setText(e.getMessage());
            return;
        }
        Mission m = base.withReserve(reserve).withStartCharge(start);
        SolveTask t = new SolveTask(analyzer, m);
        solveStatus.textProperty().bind(t.messageProperty());
        t.setOnSucceeded(e -> {
            finishTask(t);
            data.set(t.getValue());
            solveStatus.setText("checked with reserve " + reserve + " and start " + start);
        });
        t.setOnCancelled(e -> {
            finishTask(t);
            solveStatus.setText("check cancelled \u2014 still showing the previous result");
        });
        t.setOnFailed(e -> {
            finishTask(t);
            Throwable x = t.getException();
            if (x == null || x instanceof IllegalArgumentException) {
                solveStatus.setText("could not check: " + (x == null ? "unknown error" : x.getMessage())
                        + " \u2014 still showing the previous result");
            } else {
                // a defect of the tool, shown as an error where the verdict goes, not as a status note
                String what = x.getClass().getSimpleName() + (x.getMessage() != null ? ": " + x.getMessage() : "");
                solveStatus.setText("internal error: " + what + " \u2014 please report it");
                verdict.setText("Internal error \u2014 " + what + "; this mission was not checked; do not rely on the"
                        + " result shown below");
                VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
            }
        });
        task.set(t);
        worker.execute(t);
    }

    private void finishTask(Task<?> t) {
        solveStatus.textProperty().unbind();
        if (task.get() == t) {
            task.set(null);
        }
    }

    /** Cancels a running check; the result shown stays. */
    public void cancel() {
        Task<?> t = task.get();
        if (t != null) {
            t.cancel();
        }
    }

    /** The field's charge (the unit chooser applies when the text has no unit of its own), checked against the capacity. */
    private Charge parseCharge(String text, String unit, String what) {
        String t = text == null ? "" : text.trim().replace(',', '.');
        boolean hasUnit = t.endsWith("%") || t.toLowerCase(java.util.Locale.ROOT).endsWith("wh");
        Charge c;
        try {
            c = dockline.io.Quantities.parseCharge(hasUnit || t.isEmpty() ? t : t + ("%".equals(unit) ? "%" : " Wh"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("the " + what + ": " + e.getMessage());
        }
        String wrong = dockline.io.Quantities.checkAgainstCapacity(c, base.robot().capacityWh());
        if (wrong != null) {
            throw new IllegalArgumentException("the " + what + ": " + wrong);
        }
        return c;
    }

    // ------------------------------------------------------------------ scenarios

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
                status.setText("'" + t + "' is not a cell; write x:y, e.g. 3:4");
                return;
            }
        }
        ScenarioEvent f = new ScenarioEvent(s, k, to);
        forcedList.getItems().removeIf(e -> e.step() == f.step());
        forcedList.getItems().add(f);
        forcedList.getItems().sort(java.util.Comparator.comparingInt(ScenarioEvent::step));
    }

    private void runScenario() {
        ViewData d = data.get();
        if (d == null || !d.canForce() || forcedList.getItems().isEmpty()) {
            return;
        }
        List<ScenarioEvent> events = List.copyOf(forcedList.getItems());
        Optional<ViewReplay> r;
        try {
            r = d.force(events);
        } catch (IllegalArgumentException e) {
            status.setText("that scenario cannot be played: " + e.getMessage());
            return;
        }
        if (r.isEmpty()) {
            status.setText("that scenario cannot be played");
            return;
        }
        replayChoice.getItems().add(r.get());
        replayChoice.setValue(r.get());
        status.setText("scenario added: " + r.get().title());
    }

    // ------------------------------------------------------------------ refreshing what is shown

    private void refreshAll() {
        ViewData d = data.get();
        Mission m = d == null ? null : d.mission();
        boolean has = m != null;
        for (Node n : List.of(reserveField, reserveUnit, startField, startUnit, progressChoice, budgetSpinner, levelSlider,
                replayChoice, backButton, playButton, forwardButton, plainToggle, heatToggle, policyToggle)) {
            n.setDisable(!has);
        }
        if (!has) {
            player.load(0);
            replayChoice.getItems().clear();
            chart.show(null, null);
            if (mapOnly != null) {
                mapView.layersProperty().set(MapLayers.plain(mapOnly));
                verdict.setText("Map only \u2014 " + mapOnly.name() + ": open a mission on this map to check it");
            } else {
                mapView.layersProperty().set(null);
            }
            VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
            certificate.setText("");
            figures.setText("");
            forceBox.setDisable(true);
            keyBox.getChildren().setAll(mapOnly != null ? Legends.mapKey(mapOnly) : new Label(""));
            return;
        }
        updatingControls = true;
        try {
            VerdictSummary v = d.verdict();
            verdict.setText(v.headline());
            VerdictStyles.apply(verdict, v.outcome());
            certificate.setText("Certificate: " + v.certificate());
            figures.setText(figuresText(m, v));

            List<ProgressChoices.Choice> choices = ProgressChoices.of(m);
            ProgressChoices.Choice keep = progressChoice.getValue();
            progressChoice.getItems().setAll(choices);
            int initial = ProgressChoices.initialMask(m);
            ProgressChoices.Choice pick = choices.stream().filter(c -> keep != null && c.mask() == keep.mask()).findFirst()
                    .orElse(choices.stream().filter(c -> c.mask() == initial).findFirst().orElse(choices.get(0)));
            progressChoice.setValue(pick);

            int k = m.map().disturbances().budget();
            Integer oldK = budgetSpinner.getValue();
            budgetSpinner.setValueFactory(new javafx.scene.control.SpinnerValueFactory.IntegerSpinnerValueFactory(0, k,
                    oldK == null ? k : Math.min(k, oldK)));
            if (oldK == null || oldK > k || !d.solved()) {
                budgetSpinner.getValueFactory().setValue(k);
            }
            int lo = m.reserveUnits();
            int hi = Math.max(lo, m.capacityUnits());
            levelSlider.setMin(lo);
            levelSlider.setMax(hi);
            levelSlider.setMajorTickUnit(Math.max(1, (hi - lo) / 4.0));
            levelSlider.setValue(Math.max(lo, Math.min(hi, m.startUnits())));
            updateLevelLabel();

            replayChoice.getItems().setAll(d.replays());
            forceKind.getItems().clear();
            List<EventRule> rules = m.map().disturbances().rules();
            for (EventKind ek : EventKind.values()) {
                if (rules.stream().anyMatch(r -> r.kind() == ek)) {
                    forceKind.getItems().add(ek);
                }
            }
            if (!forceKind.getItems().isEmpty()) {
                forceKind.setValue(forceKind.getItems().get(0));
            }
            forcedList.getItems().clear();
            forceBox.setDisable(!d.canForce() || rules.isEmpty());
        } finally {
            updatingControls = false;
        }
        replayChoice.setValue(replayChoice.getItems().isEmpty() ? null : replayChoice.getItems().get(0));
        onReplayChosen();
        syncOverlayMenu();
        refreshLayers();
    }

    private static String figuresText(Mission m, VerdictSummary v) {
        StringBuilder sb = new StringBuilder();
        sb.append("Reserve floor ").append(Units.both(m, m.reserveUnits()));
        sb.append(" \u00b7 starting charge ").append(Units.both(m, m.startUnits()));
        sb.append(" \u00b7 capacity ").append(Units.wh(m, m.capacityUnits()));
        v.worstCaseMinimumUnits().ifPresent(u -> sb.append(" \u00b7 worst-case lowest battery ").append(Units.both(m, u)));
        v.highestReserveUnits().ifPresent(u -> sb.append(" \u00b7 highest floor that can be guaranteed ").append(Units.both(m, u)));
        sb.append(" \u00b7 ").append(m.scale().describe());
        return sb.toString();
    }

    private void onReplayChosen() {
        ViewData d = data.get();
        ViewReplay r = replayChoice.getValue();
        player.load(r == null ? 0 : r.length());
        chart.show(d == null ? null : d.mission(), r);
        replayNotes.setText(r == null ? "" : String.join(" ", r.notes()));
        refreshLayers();
        onStep();
    }

    private void onStep() {
        int s = player.step();
        chart.setStep(s);
        MapLayers l = mapView.layers();
        if (following()) {
            refreshLayers();
        } else if (l != null) {
            mapView.layersProperty().set(l.withStep(s));
        }
        updateStepLabel();
    }

    /** Whether the policy overlay takes its situation from the current replay step. */
    private boolean following() {
        return currentOverlay() == Overlay.POLICY && policyMode.getValue() == PolicyMode.FOLLOW
                && replayChoice.getValue() != null;
    }

    private void updateStepLabel() {
        ViewData d = data.get();
        ViewReplay r = replayChoice.getValue();
        if (d == null || r == null) {
            stepLabel.setText("no run to play");
            return;
        }
        Mission m = d.mission();
        ViewStep st = r.steps().get(Math.min(player.step(), r.length()));
        StringBuilder sb = new StringBuilder();
        sb.append("step ").append(st.step()).append(" of ").append(r.length()).append(": robot at ").append(st.cell());
        if (st.action() != null) {
            sb.append(" after ").append(st.action());
        }
        if (st.hasEvent()) {
            sb.append("; ").append(st.event().word()).append(st.eventLabel().isEmpty() ? "" : " (" + st.eventLabel() + ")");
        }
        sb.append("; battery ").append(Units.both(m, st.levelUnits()));
        sb.append("; disturbances left ").append(st.budgetLeft());
        stepLabel.setText(sb.toString());
    }

    private void updateLevelLabel() {
        ViewData d = data.get();
        if (d == null) {
            levelLabel.setText("");
            return;
        }
        levelLabel.setText("policy shown for a battery of " + Units.both(d.mission(), currentLevel()));
    }

    private Overlay currentOverlay() {
        Toggle t = overlayGroup.getSelectedToggle();
        return t == null ? Overlay.HEAT : (Overlay) t.getUserData();
    }

    /** Selects what is drawn over the map. */
    public void setOverlay(Overlay o) {
        switch (o) {
            case PLAIN -> plainToggle.setSelected(true);
            case HEAT -> heatToggle.setSelected(true);
            case POLICY -> policyToggle.setSelected(true);
        }
    }

    private void syncOverlayMenu() {
        overlayItems[currentOverlay().ordinal()].setSelected(true);
    }

    private int currentLevel() {
        return (int) Math.round(levelSlider.getValue());
    }

    private void refreshLayers() {
        if (updatingControls) {
            return;
        }
        ViewData d = data.get();
        if (d == null) {
            return;
        }
        Overlay o = currentOverlay();
        ProgressChoices.Choice pc = progressChoice.getValue();
        int progress = pc == null ? 0 : pc.mask();
        Integer k = budgetSpinner.getValue();
        int budget = k == null ? d.mission().map().disturbances().budget() : k;
        int level = policyMode.getValue() == PolicyMode.LEVEL ? currentLevel() : -1;
        ViewReplay r = replayChoice.getValue();
        if (following()) {
            ViewStep st = r.steps().get(Math.min(player.step(), r.length()));
            level = st.levelUnits();
            budget = st.budgetLeft();
            progress = st.progress();
        }
        MapLayers l = MapLayers.of(d, o, budget, progress, level, r, player.step())
                .withHover(mapView.hoverCellProperty().get());
        mapView.layersProperty().set(l);
        Mission m = d.mission();
        VBox key = new VBox(6);
        if (o == Overlay.HEAT) {
            key.getChildren().add(Legends.heatKey(m, l.heatLow(), l.heatHigh()));
        } else if (o == Overlay.POLICY) {
            key.getChildren().add(Legends.policyKey());
        }
        key.getChildren().add(Legends.mapKey(m.map()));
        keyBox.getChildren().setAll(key);
        levelSlider.setDisable(o != Overlay.POLICY || policyMode.getValue() != PolicyMode.LEVEL);
        policyMode.setDisable(o != Overlay.POLICY);
        if (following()) {
            levelLabel.setText("policy shown for the replay step: battery " + Units.both(m, level) + ", "
                    + budget + " disturbances left");
        } else if (policyMode.getValue() == PolicyMode.ANY) {
            levelLabel.setText("policy shown at every battery level it meets on each cell");
        } else {
            updateLevelLabel();
        }
        updateCellInfo(mapView.hoverCellProperty().get());
    }

    private void updateCellInfo(Cell c) {
        cellInfo.setText(c == null ? "Point at a cell to see it here." : describeCell(c));
    }

    /** What the cell panel says about a cell. */
    String describeCell(Cell c) {
        ViewData d = data.get();
        BuildingMap map = d != null ? d.mission().map() : mapOnly;
        if (map == null || !map.inside(c)) {
            return "";
        }
        Terrain t = map.terrainAt(c);
        StringBuilder sb = new StringBuilder();
        sb.append("cell ").append(c).append(" (column ").append(c.x()).append(", row ").append(c.y()).append(")\n");
        sb.append("surface: ").append(t.describe()).append('\n');
        if (t.door()) {
            sb.append("door: ").append(map.doorName(c)).append('\n');
        }
        List<String> zones = map.zonesAt(c);
        sb.append("zones: ").append(zones.isEmpty() ? "none" : String.join(", ", zones)).append('\n');
        for (EventRule r : map.disturbances().rules()) {
            if (r.covers(c)) {
                sb.append("may see: ").append(r.kind().word()).append(" (").append(r.label()).append(")\n");
            }
        }
        if (d != null && t.free()) {
            Mission m = d.mission();
            ProgressChoices.Choice pc = progressChoice.getValue();
            Integer k = budgetSpinner.getValue();
            int need = d.chargeNeeded(c.index(map.width()), k == null ? 0 : k, pc == null ? 0 : pc.mask());
            sb.append("charge needed from here: ");
            if (need == ViewData.IMPOSSIBLE) {
                sb.append("impossible (no charge is enough)");
            } else if (need == ViewData.UNKNOWN) {
                sb.append("not known (check the mission first)");
            } else {
                sb.append(Units.both(m, need));
            }
            sb.append("\n  (tasks: ").append(pc == null ? "?" : pc.label()).append("; disturbances left ").append(k).append(')');
        }
        MapLayers shown = mapView.layers();
        if (shown != null) {
            shown.policyWords(c).ifPresent(w -> sb.append("\npolicy here: ").append(w));
        }
        return sb.toString();
    }

    // ------------------------------------------------------------------ for tests and the launcher

    ReadOnlyObjectProperty<ViewData> dataProperty() {
        return data;
    }

    ReadOnlyObjectProperty<Task<?>> taskProperty() {
        return task;
    }

    MapView mapView() {
        return mapView;
    }

    BatteryChart chart() {
        return chart;
    }

    ReplayPlayer player() {
        return player;
    }

    Label verdictLabel() {
        return verdict;
    }

    Path file() {
        return file;
    }

    List<Path> recentFiles() {
        return recent.files();
    }

    void closeFromLauncher() {
        if (stage != null) {
            stage.close();
        }
        Platform.runLater(() -> { });
    }
}
