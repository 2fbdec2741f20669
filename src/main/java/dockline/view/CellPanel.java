package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Terrain;
import java.util.List;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The side panel's "Cell" section: what the map says about the cell under the pointer (surface,
 * door, zones, the disturbances that may strike there) and, for a checked mission, the charge
 * needed from there in the situation chosen in {@link OverlayPanel}. FX thread only.
 */
final class CellPanel {

    static final String NOTHING = "Point at a cell to see it here. Right-click a door or zone to force its event.";

    private final Label cellInfo = new Label(NOTHING);
    private final VBox node;

    CellPanel() {
        cellInfo.setId("cell-info");
        cellInfo.getStyleClass().add("cell-info");
        cellInfo.setWrapText(true);
        cellInfo.setMinHeight(Region.USE_PREF_SIZE);
        node = SidePanels.section("Cell", cellInfo);
    }

    VBox node() {
        return node;
    }

    void show(String words) {
        cellInfo.setText(words == null || words.isEmpty() ? NOTHING : words);
    }

    /** What the panel says about a cell of the map ({@code data} may be null: a map alone). */
    static String describe(ViewData data, BuildingMap mapOnly, OverlayPanel choices, MapLayers shown, Cell c) {
        BuildingMap map = data != null ? data.mission().map() : mapOnly;
        if (c == null || map == null || !map.inside(c)) {
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
                sb.append("may see: ").append(r.kind().word()).append(" (").append(r.label()).append(')')
                        .append(r.lasting() ? ", lasting" : "").append('\n');
            }
        }
        if (data != null && t.free()) {
            Mission m = data.mission();
            int k = choices.budget(0);
            int need = data.chargeNeeded(c.index(map.width()), k, choices.progressMask());
            int atLeast = data.chargeNeededAtLeast(c.index(map.width()), k, choices.progressMask());
            sb.append("charge needed from here: ");
            if (atLeast != need && atLeast >= 0) {
                // known only as a range (the heat layer's note says why): never one number that is not known
                sb.append(need >= 0 ? "between " + Units.both(m, atLeast) + " and " + Units.both(m, need)
                        + " (enough: " + Units.both(m, need) + ")" : "at least " + Units.both(m, atLeast)
                        + "; no level is known to be enough");
            } else if (need == ViewData.IMPOSSIBLE) {
                sb.append("impossible (no charge is enough)");
            } else if (need == ViewData.UNKNOWN) {
                sb.append(data.solved() ? "not shown for this kind of mission" : "not known (check the mission first)");
            } else {
                sb.append(Units.both(m, need));
            }
            sb.append("\n  (tasks: ").append(choices.progressLabel()).append("; disturbances left ").append(k).append(')');
        }
        if (shown != null) {
            shown.policyWords(c).ifPresent(w -> sb.append("\npolicy here: ").append(w));
        }
        return sb.toString();
    }
}
