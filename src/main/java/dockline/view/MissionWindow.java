package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventRule;
import dockline.model.Mission;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.concurrent.Task;
import javafx.geometry.Orientation;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.stage.Window;

/**
 * The desktop window for one mission at a time: the map with its overlays, the reserve and
 * starting-charge controls with a background re-check, the verdict in words, the replay player
 * with the battery chart, forcing disturbances, and the safety caveats (always visible).
 *
 * <p>This class puts the pieces together and keeps the state they share (the data shown, the
 * running check, the files): {@link CheckPanel} (reserve and charge, Check, progress),
 * {@link OverlayPanel} (what is drawn over the map), {@link CellPanel} (the cell under the pointer),
 * {@link ForcingPanel} (scenarios, and right-click forcing on the map), {@link ReplayControls}
 * (player, run chooser, step, notes, {@link BatteryChart}) and {@link PictureExport}.
 *
 * <p>Threading: all fields are touched on the FX thread only. Solving runs in a {@link SolveTask}
 * on one background worker; the window binds to the task's properties and keeps showing the
 * previous result until a new one succeeds (a cancelled or failed check changes nothing shown).
 *
 * <p>Files: mission and map files are only read. The files written are the recent-files list
 * ({@link RecentFiles}) and a picture the user exports. When a file changes on disk, a notice offers
 * to reload it; the check runs whenever the window regains focus.
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
    private final BooleanProperty hasMission = new SimpleBooleanProperty(this, "hasMission", false);

    private final HeaderPanel header = new HeaderPanel();
    // the pieces
    private final CheckPanel checkPanel = new CheckPanel(this::check, this::cancel);
    private final OverlayPanel overlays = new OverlayPanel(this::overlayChanged);
    private final CellPanel cellPanel = new CellPanel();
    private final ForcingPanel forcing;
    private final ReplayControls replay;
    // other
    private final Label status = new Label("");
    private final WindowMenu menu;

    private Mission base;
    private BuildingMap mapOnly;
    private Path file;
    private final FileStamps stamps = new FileStamps();
    private Stage stage;
    private boolean updatingControls;

    public MissionWindow(Analyzer analyzer, MissionSource source, Path recentStore) {
        this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
        this.source = Objects.requireNonNull(source, "source");
        this.recent = new RecentFiles(recentStore);
        this.replay = new ReplayControls(player, chart);
        this.forcing = new ForcingPanel(this::runAdded, this::say);
        this.menu = new WindowMenu(this, mapView, player, recent);
        build();
    }

    // ------------------------------------------------------------------ layout

    private void build() {
        root.setId("dockline-window");
        root.getStylesheets().add(PictureRenderer.stylesheet());

        root.setTop(new VBox(menu.bar(), header.node()));

        VBox sidePanel = new VBox(checkPanel.node(), overlays.node(), cellPanel.node(), forcing.node());
        sidePanel.getStyleClass().add("side-panel");
        sidePanel.setPrefWidth(300);
        ScrollPane side = new ScrollPane(sidePanel);
        side.setFitToWidth(true);
        side.setPrefViewportWidth(300);
        side.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        root.setRight(side);

        chart.node().setPrefHeight(190);
        status.setId("status");
        status.getStyleClass().add("status-line");
        status.setWrapText(true);
        status.setMaxWidth(Double.MAX_VALUE);
        SplitPane split = new SplitPane(mapView, replay.node());
        split.setId("map-split");
        split.setOrientation(Orientation.VERTICAL);
        split.setDividerPositions(0.6);
        SplitPane.setResizableWithParent(replay.node(), false);
        root.setCenter(split);
        root.setBottom(new VBox(status, new CaveatPanel()));

        wire();
        refreshAll();
    }

    // ------------------------------------------------------------------ behaviour wiring

    private void wire() {
        checkPanel.bind(task, hasMission);
        replay.choice().valueProperty().addListener((o, a, b) -> onReplayChosen());
        player.stepProperty().addListener((o, a, b) -> onStep());
        chart.onStepPicked(player::jumpTo);
        mapView.hoverCellProperty().addListener((o, a, b) -> updateCellInfo(b));
        mapView.addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (e.getButton() == MouseButton.SECONDARY && !mapView.wasDragged()) {
                rightClick(mapView.cellAt(e.getX(), e.getY()), e.getScreenX(), e.getScreenY());
                e.consume();
            }
        });
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

    void chooseAndOpen() {
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
    void importImage() {
        Path folder = file != null && file.toAbsolutePath().getParent() != null ? file.toAbsolutePath().getParent() : null;
        Window owner = root.getScene() != null ? root.getScene().getWindow() : null;
        new ImportDialog(owner, folder).showAndWait().ifPresent(this::open);
    }

    /** Reads a mission (or map) file and shows it; on a bad file, shows the errors and keeps what was shown. */
    public boolean open(Path p) {
        MissionSource.Opened o;
        try {
            o = source.open(p);
        } catch (MissionSource.OpenException e) {
            header.showNotice("Could not open " + p.getFileName() + ":\n" + String.join("\n", e.messages()), List.of());
            if (!Files.exists(p)) {
                recent.remove(p);
            }
            return false;
        }
        header.hideNotice();
        recent.add(p);
        file = p;
        stamps.clear();
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
        stamps.remember(p);
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
        checkPanel.show(m);
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

    void reload() {
        header.hideNotice();
        if (file != null) {
            open(file);
        }
    }

    /** Compares the files' modification times with those at opening; offers a reload when they differ. */
    public boolean checkFilesChanged() {
        List<Path> changed = stamps.changed();
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
        no.setOnAction(e -> header.hideNotice());
        header.showNotice(sb + " changed on disk. Reload it? (Nothing is ever written to it from here.)", List.of(yes, no));
        return true;
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
        Optional<Mission> asked = checkPanel.missionToCheck(base);
        if (asked.isEmpty()) {
            return;
        }
        Mission m = asked.get();
        SolveTask t = new SolveTask(analyzer, m);
        checkPanel.follow(t);
        t.setOnSucceeded(e -> {
            finishTask(t, "checked with reserve " + m.reserve() + " and start " + m.startCharge());
            data.set(t.getValue());
        });
        t.setOnCancelled(e -> finishTask(t, "check cancelled \u2014 still showing the previous result"));
        t.setOnFailed(e -> {
            Throwable x = t.getException();
            if (x == null || x instanceof IllegalArgumentException) {
                finishTask(t, "could not check: " + (x == null ? "unknown error" : x.getMessage())
                        + " \u2014 still showing the previous result");
            } else {
                // a defect of the tool, shown as an error where the verdict goes, not as a status note
                String what = x.getClass().getSimpleName() + (x.getMessage() != null ? ": " + x.getMessage() : "");
                finishTask(t, "internal error: " + what + " \u2014 please report it");
                header.internalError(what);
            }
        });
        task.set(t);
        worker.execute(t);
    }

    private void finishTask(Task<?> t, String words) {
        checkPanel.finished(words);
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

    // ------------------------------------------------------------------ forcing and exporting

    private void say(String words) {
        status.setText(words);
    }

    /** A forced run was played: it goes into the run list and is shown. */
    private void runAdded(ViewReplay r) {
        replay.add(r);
    }

    /** A right-click on the map: force the event of the door or zone there at the current step. */
    private void rightClick(Cell c, double screenX, double screenY) {
        ViewData d = data.get();
        if (c != null && d != null) {
            forcing.pointed(d.mission().map(), c, rule -> forceAt(c, rule), mapView, screenX, screenY);
        }
    }

    /**
     * Forces the rule's event at the cell's door or zone, at the robot's next move into it after the
     * current step of the run shown; the forced run is added to the run list and shown from the step
     * the user was at. Returns it, or empty (the reason is in the status line).
     */
    Optional<ViewReplay> forceAt(Cell c, EventRule rule) {
        int at = player.step();
        Optional<ViewReplay> r = forcing.forceAt(c, rule, replay.current(), at);
        r.ifPresent(x -> player.jumpTo(at));
        return r;
    }

    void chooseAndExport() {
        String name = base != null ? base.name() : mapOnly != null ? mapOnly.name() : "dockline";
        PictureExport.choose(root.getScene() != null ? root.getScene().getWindow() : null, folder(), name)
                .ifPresent(this::exportPicture);
    }

    void chooseAndExportReport() {
        if (file == null || base == null) {
            say("a report is of a mission file: open one first");
        } else {
            ReportExport.choose(root.getScene().getWindow(), folder(), base.name()).ifPresent(this::exportReport);
        }
    }

    /** Writes the sign-off report of the mission file shown, on the worker thread; the status line says how it went. */
    public java.util.concurrent.CompletableFuture<String> exportReport(Path out) {
        return ReportExport.writeLater(file, out, worker, this::say);
    }

    /** The folder of the file shown, or null. */
    private Path folder() {
        return file != null && file.toAbsolutePath().getParent() != null ? file.toAbsolutePath().getParent() : null;
    }

    /**
     * Writes the picture the window shows now (map, verdict, step, caveats) as a PNG, atomically.
     *
     * @return whether it was written; the status line says where, or why not
     */
    public boolean exportPicture(Path out) {
        if (mapView.layers() == null) {
            say("nothing to export: open a mission or a map first");
            return false;
        }
        String heading = (base != null ? base.name() : mapOnly.name()) + " \u2014 " + header.verdictLabel().getText();
        ViewReplay r = replay.current();
        ViewData d = data.get();
        String caption = (r == null || d == null ? "no run shown" : r.title() + ": " + ReplayControls.stepWords(d.mission(), r,
                player.step())) + " \u00b7 shown: " + overlays.overlay().word()
                + (d != null ? " \u00b7 " + d.mission().scale().describe() : "");
        try {
            PictureExport.writePng(PictureExport.compose(mapView, heading, caption), out);
        } catch (IOException e) {
            say("could not export the picture to " + out + ": " + e.getMessage());
            return false;
        }
        say("picture exported to " + out);
        return true;
    }

    // ------------------------------------------------------------------ refreshing what is shown

    private void refreshAll() {
        ViewData d = data.get();
        Mission m = d == null ? null : d.mission();
        boolean has = m != null;
        checkPanel.setDisable(!has);
        overlays.setDisable(!has);
        replay.setDisable(!has);
        menu.setExportDisabled(!has && mapOnly == null);
        // what the last data's runs and scenarios said no longer applies
        status.setText("");
        if (!has) {
            updatingControls = true;
            try {
                replay.setRuns(List.of());
                replay.choice().setValue(null);
            } finally {
                updatingControls = false;
            }
            replay.chosen(null, null);
            replay.showStep(null);
            if (mapOnly != null) {
                mapView.layersProperty().set(MapLayers.plain(mapOnly));
                header.showOther("Map only \u2014 " + mapOnly.name() + ": open a mission on this map to check it");
            } else {
                mapView.layersProperty().set(null);
                header.showOther("Open a mission (File \u203a Open, Ctrl+O)");
            }
            forcing.show(null);
            overlays.showMapKey(mapOnly);
            updateCellInfo(mapView.hoverCellProperty().get());
            return;
        }
        updatingControls = true;
        try {
            header.show(m, d.verdict());
            overlays.showMission(m, d.solved());
            replay.setRuns(d.replays());
            forcing.show(d);
        } finally {
            updatingControls = false;
        }
        List<ViewReplay> runs = d.replays();
        replay.choice().setValue(runs.isEmpty() ? null : runs.get(0));
        onReplayChosen();
        syncOverlayMenu();
        refreshLayers();
    }

    private void onReplayChosen() {
        if (updatingControls) {
            return;
        }
        ViewData d = data.get();
        replay.chosen(d == null ? null : d.mission(), replay.current());
        refreshLayers();
        onStep();
    }

    private void onStep() {
        int s = player.step();
        MapLayers l = mapView.layers();
        if (following()) {
            refreshLayers();
        } else if (l != null) {
            mapView.layersProperty().set(l.withStep(s));
        }
        ViewData d = data.get();
        replay.showStep(d == null ? null : d.mission());
    }

    /** Whether the policy overlay takes its situation from the current replay step. */
    private boolean following() {
        return overlays.overlay() == Overlay.POLICY && overlays.policyMode() == OverlayPanel.PolicyMode.FOLLOW
                && replay.current() != null;
    }

    private void overlayChanged() {
        syncOverlayMenu();
        refreshLayers();
    }

    /** Selects what is drawn over the map. */
    public void setOverlay(Overlay o) {
        overlays.setOverlay(o);
    }

    private void syncOverlayMenu() {
        menu.syncOverlay(overlays.overlay());
    }

    private void refreshLayers() {
        if (updatingControls) {
            return;
        }
        ViewData d = data.get();
        if (d == null) {
            return;
        }
        Overlay o = overlays.overlay();
        int progress = overlays.progressMask();
        int budget = overlays.budget(d.mission().map().disturbances().budget());
        int level = overlays.policyMode() == OverlayPanel.PolicyMode.LEVEL ? overlays.level() : -1;
        ViewReplay r = replay.current();
        boolean follow = following();
        if (follow) {
            ViewStep st = r.steps().get(Math.min(player.step(), r.length()));
            level = st.levelUnits();
            budget = st.budgetLeft();
            progress = st.progress();
        }
        MapLayers l = MapLayers.of(d, o, budget, progress, level, r, player.step())
                .withHover(mapView.hoverCellProperty().get());
        mapView.layersProperty().set(l);
        overlays.shown(d.mission(), l, follow, level, budget);
        updateCellInfo(mapView.hoverCellProperty().get());
    }

    private void updateCellInfo(Cell c) {
        cellPanel.show(describeCell(c));
    }

    /** What the cell panel says about a cell. */
    String describeCell(Cell c) {
        return CellPanel.describe(data.get(), mapOnly, overlays, mapView.layers(), c);
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
