package dockline.view;

import java.nio.file.Path;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCombination;

/**
 * The window's menu bar (File, Check, View, Replay) with its shortcuts; every item calls the
 * {@link MissionWindow} or one of its pieces. The recent-files menu is rebuilt each time the File
 * menu opens. FX thread only.
 */
final class WindowMenu {

    private final RadioMenuItem[] overlayItems = new RadioMenuItem[3];
    private final Menu recentMenu = new Menu("Open _recent");
    private final MenuItem exportItem = new MenuItem("_Export picture as PNG\u2026");
    private final MissionWindow w;
    private final RecentFiles recent;
    private final MenuBar bar;

    WindowMenu(MissionWindow w, MapView mapView, ReplayPlayer player, RecentFiles recent) {
        this.w = w;
        this.recent = recent;
        MenuItem open = item("_Open mission or map\u2026", "Shortcut+O", w::chooseAndOpen);
        MenuItem reload = item("_Reload from disk", "Shortcut+R", w::reload);
        MenuItem close = item("_Close window", "Shortcut+W", w::closeFromLauncher);
        MenuItem importImage = item("_Import occupancy image\u2026", null, w::importImage);
        exportItem.setId("export-picture");
        exportItem.setMnemonicParsing(true);
        exportItem.setAccelerator(KeyCombination.keyCombination("Shortcut+E"));
        exportItem.setOnAction(e -> w.chooseAndExport());
        MenuItem exportReport = item("Export sign-off _report as HTML\u2026", null, w::chooseAndExportReport);
        exportReport.setId("export-report");
        Menu fileMenu = new Menu("_File", null, open, recentMenu, importImage, reload, new SeparatorMenuItem(), exportItem,
                exportReport, new SeparatorMenuItem(), close);
        fileMenu.setOnShowing(e -> rebuildRecent());
        rebuildRecent();

        MenuItem check = item("_Check now", "F5", w::check);
        MenuItem cancel = item("C_ancel check", "Shortcut+PERIOD", w::cancel);
        Menu checkMenu = new Menu("_Check", null, check, cancel);

        ToggleGroup g = new ToggleGroup();
        String[] names = {"_Plain map", "Charge _needed", "_Policy"};
        for (int i = 0; i < 3; i++) {
            Overlay o = Overlay.values()[i];
            RadioMenuItem r = new RadioMenuItem(names[i]);
            r.setToggleGroup(g);
            r.setAccelerator(KeyCombination.keyCombination("Shortcut+" + (i + 1)));
            r.setOnAction(e -> w.setOverlay(o));
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
        bar = new MenuBar(fileMenu, checkMenu, viewMenu, replayMenu);
        bar.setId("menu");
    }

    MenuBar bar() {
        return bar;
    }

    void syncOverlay(Overlay o) {
        overlayItems[o.ordinal()].setSelected(true);
    }

    void setExportDisabled(boolean off) {
        exportItem.setDisable(off);
    }

    private void rebuildRecent() {
        recentMenu.getItems().clear();
        for (Path p : recent.files()) {
            MenuItem m = new MenuItem(p.getFileName() + "  \u2014  " + p);
            m.setMnemonicParsing(false);
            m.setOnAction(e -> w.open(p));
            recentMenu.getItems().add(m);
        }
        recentMenu.setDisable(recentMenu.getItems().isEmpty());
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
}
