package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dockline.io.MapLoader;
import dockline.io.MissionLoader;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import java.awt.geom.Rectangle2D;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * What the map picture says: labels that never overlap and never shrink below a readable size,
 * the map's own legend characters in the key (window and rendered picture), and the dock and the
 * start visible under the robot.
 */
class MapDrawingTest {

    private static final double[] ZOOMS = {3, 5, 8, 12, 16, 24, 40, 64};

    @BeforeAll
    static void toolkit() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
    }

    static List<Path> bundledMaps() throws Exception {
        try (Stream<Path> s = Files.list(Path.of("maps"))) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
    }

    /** Events on ten neighbouring free cells of the map (the worst case for their labels), two on one cell. */
    static ViewReplay crowdedEvents(BuildingMap map) {
        List<ViewStep> steps = new ArrayList<>();
        Cell first = null;
        for (int y = 0; y < map.height() && first == null; y++) {
            for (int x = 0; x + 10 < map.width() && first == null; x++) {
                boolean run = true;
                for (int i = 0; i < 10; i++) {
                    run &= map.isFree(new Cell(x + i, y));
                }
                if (run) {
                    first = new Cell(x, y);
                }
            }
        }
        steps.add(new ViewStep(0, first, null, null, "", null, 10, 3, 0));
        for (int i = 1; i <= 10; i++) {
            Cell c = new Cell(first.x() + i - 1, first.y());
            steps.add(new ViewStep(i, c, null, EventKind.DRAG, "rug", c, 10, 3, 0));
        }
        steps.add(new ViewStep(11, first, null, EventKind.SLIP, "wet", first, 10, 3, 0));
        return new ViewReplay(ViewReplay.Kind.FORCED, "crowded", steps);
    }

    private static boolean isText(MapLabels.Box b) {
        return b.kind() == MapLabels.Kind.ZONE || b.kind() == MapLabels.Kind.DOOR || b.kind() == MapLabels.Kind.EVENT;
    }

    @Test
    void labels_never_overlap_and_are_never_tiny_on_the_bundled_maps_at_any_zoom() throws Exception {
        int checkedPairs = 0;
        for (Path p : bundledMaps()) {
            BuildingMap map = MapLoader.load(p);
            Cell start = map.docks().isEmpty() ? null : map.docks().get(0);
            ViewReplay events = crowdedEvents(map);
            for (double s : ZOOMS) {
                List<MapLabels.Box> boxes = FxRuntime.call(() -> MapLabels.of(map, start, s)
                        .withEvents(MapPainter.eventMarkers(events)).boxes());
                for (int i = 0; i < boxes.size(); i++) {
                    MapLabels.Box a = boxes.get(i);
                    if (isText(a)) {
                        assertThat(a.font()).as("%s at %s px: text size of '%s'", p, s, a.text())
                                .isGreaterThanOrEqualTo(9);
                        assertThat(a.x() >= 0 && a.y() >= 0 && a.x() + a.w() <= map.width() * s
                                && a.y() + a.h() <= map.height() * s).as("inside the map: " + a).isTrue();
                    }
                    for (int j = i + 1; j < boxes.size(); j++) {
                        MapLabels.Box b = boxes.get(j);
                        if (!isText(a) && !isText(b)) {
                            continue; // symbols and markers may touch each other (a start on a dock)
                        }
                        boolean staticOverMarker = (a.kind() == MapLabels.Kind.MARK || b.kind() == MapLabels.Kind.MARK)
                                && !(a.kind() == MapLabels.Kind.EVENT || b.kind() == MapLabels.Kind.EVENT);
                        if (staticOverMarker) {
                            continue; // an event marker is drawn above the static words
                        }
                        // intersection by java.awt.geom (a general-purpose geometry library), not our own test
                        Rectangle2D ra = new Rectangle2D.Double(a.x(), a.y(), a.w(), a.h());
                        Rectangle2D rb = new Rectangle2D.Double(b.x(), b.y(), b.w(), b.h());
                        assertThat(ra.intersects(rb)).as("%s at %s px: %s and %s", p, s, a, b).isFalse();
                        checkedPairs++;
                    }
                }
                if (p.getFileName().toString().equals("research-block.yaml") && s >= 24) {
                    // not vacuous: zoomed in, every zone of the research block has its name, and doors theirs
                    assertThat(boxes.stream().filter(b -> b.kind() == MapLabels.Kind.ZONE).count())
                            .isEqualTo(map.zones().size());
                    assertThat(boxes.stream().filter(b -> b.kind() == MapLabels.Kind.DOOR).count()).isPositive();
                    assertThat(boxes.stream().filter(b -> b.kind() == MapLabels.Kind.EVENT).count()).isGreaterThan(5);
                }
            }
        }
        assertThat(checkedPairs).isGreaterThan(5_000);
    }

    /** The map file's legend read with a general-purpose YAML reader (Jackson), not dockline's loader. */
    private static Map<String, TreeSet<Character>> keyRowsFromTheFile(Path p) throws Exception {
        JsonNode legend = new ObjectMapper(new YAMLFactory()).readTree(p.toFile()).get("legend");
        Map<String, TreeSet<Character>> rows = new TreeMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = legend.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            char ch = e.getKey().charAt(0);
            JsonNode v = e.getValue();
            String row;
            if (v.isTextual()) {
                row = v.asText();
            } else if (v.path("dock").asBoolean(false)) {
                row = "dock";
            } else if (v.path("door").asBoolean(false)) {
                row = "door";
            } else {
                row = v.path("surface").asText();
            }
            rows.computeIfAbsent(row, k -> new TreeSet<>()).add(ch);
        }
        return rows;
    }

    private static String expectedText(String row, TreeSet<Character> chars) {
        StringBuilder sb = new StringBuilder(row).append(" (map: ");
        int i = 0;
        for (char c : chars) {
            sb.append(i++ == 0 ? "" : ", ").append(c);
        }
        return sb.append(')').toString();
    }

    private static List<String> labelTexts(Node root) {
        List<String> out = new ArrayList<>();
        if (root instanceof Label l) {
            out.add(l.getText());
        }
        if (root instanceof Parent p) {
            for (Node n : p.getChildrenUnmodifiable()) {
                out.addAll(labelTexts(n));
            }
        }
        return out;
    }

    @Test
    void the_key_shows_the_maps_own_characters_in_the_window_and_in_the_picture() throws Exception {
        for (Path p : bundledMaps()) {
            BuildingMap map = MapLoader.load(p);
            List<String> key = FxRuntime.call(() -> labelTexts(Legends.mapKey(map)));
            for (Map.Entry<String, TreeSet<Character>> row : keyRowsFromTheFile(p).entrySet()) {
                assertThat(key).as(p.toString()).contains(expectedText(row.getKey(), row.getValue()));
            }
        }
        // the clash of the issue: the research block uses C for a dock, so no other row may show a C
        BuildingMap rb = MapLoader.load(Path.of("maps/research-block.yaml"));
        List<String> key = FxRuntime.call(() -> labelTexts(Legends.mapKey(rb)));
        assertThat(key).contains("carpet (map: ,)", "dock (map: C)", "door (map: D, F)");
        assertThat(key.stream().filter(t -> t.contains("C)") || t.contains(" C,") || t.contains("(C"))).containsExactly("dock (map: C)");
        // the rendered picture has the same key
        Mission m = MissionLoader.load(Path.of("missions/late-return.yaml"));
        ViewData d = FakeAnalyzer.compute(m);
        List<String> picture = FxRuntime.call(() -> labelTexts(PictureRenderer.build(d, PictureRenderer.Options.defaults())));
        assertThat(picture).contains("carpet (map: ,)", "dock (map: C)", "door (map: D, F)", "tile (map: .)");
        assertThat(picture).noneMatch(t -> t.startsWith("carpet (C)"));
    }

    private static Color pixel(WritableImage img, double x, double y) {
        PixelReader r = img.getPixelReader();
        return r.getColor((int) Math.floor(x), (int) Math.floor(y));
    }

    private static boolean near(Color a, Color b) {
        return Math.abs(a.getRed() - b.getRed()) < 0.04 && Math.abs(a.getGreen() - b.getGreen()) < 0.04
                && Math.abs(a.getBlue() - b.getBlue()) < 0.04;
    }

    private static WritableImage draw(MapLayers l, double s) throws Exception {
        return FxRuntime.call(() -> {
            Canvas c = new Canvas(l.map().width() * s, l.map().height() * s);
            MapPainter.paint(c.getGraphicsContext2D(), l, 0, 0, s, c.getWidth(), c.getHeight());
            SnapshotParameters sp = new SnapshotParameters();
            sp.setFill(Color.WHITE);
            return c.snapshot(sp, null);
        });
    }

    @Test
    void the_dock_and_the_start_stay_visible_under_the_robot() throws Exception {
        Mission m = TestMissions.twoRooms();
        BuildingMap map = m.map();
        Cell dock = new Cell(11, 1);
        Cell start = m.start();
        assertThat(map.terrainAt(dock).dock()).isTrue();
        double s = 40;
        List<ViewStep> steps = List.of(new ViewStep(0, start, null, null, "", null, 10, 1, 0),
                new ViewStep(1, dock, null, null, "", null, 10, 1, 0));
        ViewReplay r = new ViewReplay(ViewReplay.Kind.FORCED, "two places", steps);
        // robot on the dock: the dock's green ring shows around it, the robot's disc in the middle
        WritableImage onDock = draw(MapLayers.of(map, start, Overlay.PLAIN, null, 0, 1, null, r, 1), s);
        double cx = (dock.x() + 0.5) * s;
        double cy = (dock.y() + 0.5) * s;
        double ring = 0.33 * s / Math.sqrt(2);
        for (double[] d : new double[][] {{1, 1}, {-1, 1}, {1, -1}, {-1, -1}}) {
            Color c = pixel(onDock, cx + d[0] * ring, cy + d[1] * ring);
            assertThat(near(c, Palette.DOCK)).as("dock ring pixel %s", c).isTrue();
        }
        assertThat(near(pixel(onDock, cx + 0.14 * s, cy), Palette.ROBOT)).as("robot disc").isTrue();
        // robot on the start: the pennant is drawn over the robot
        WritableImage onStart = draw(MapLayers.of(map, start, Overlay.PLAIN, null, 0, 1, null, r, 0), s);
        Color pennant = pixel(onStart, (start.x() + 0.32) * s, (start.y() + 0.3) * s);
        assertThat(near(pennant, Palette.START)).as("pennant pixel %s", pennant).isTrue();
    }
}
