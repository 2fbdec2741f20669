package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Terrain;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import javafx.scene.paint.Color;

/**
 * dockline's own colours and fill patterns. Every surface gets a pattern as well as a colour, and
 * its cells show the map's own legend character (never a letter of our own, which could clash with
 * a character the map uses for something else); impossible cells of the heat map get a cross
 * pattern, so nothing is told by colour alone (for colour-blind users and grey-scale prints).
 */
final class Palette {

    static final Color BACKGROUND = Color.web("#eceae4");
    static final Color WALL = Color.web("#353a41");
    static final Color WALL_HATCH = Color.web("#5d646d");
    static final Color GRID = Color.rgb(40, 40, 40, 0.10);
    static final Color DOCK = Color.web("#13806b");
    static final Color DOOR = Color.web("#8c5a28");
    static final Color START = Color.web("#2750b5");
    static final Color ROBOT = Color.web("#ff7a1a");
    static final Color ROBOT_EDGE = Color.web("#3a1a00");
    static final Color PATH = Color.web("#40308f");
    static final Color EVENT = Color.web("#cf2139");
    static final Color IMPOSSIBLE = Color.web("#55585e");
    static final Color IMPOSSIBLE_MARK = Color.web("#f2f2f2");
    static final Color GLYPH = Color.web("#1c1f23");
    static final Color HOVER = Color.web("#101010");
    static final Color FLOOR_LINE = Color.web("#cf2139");

    /** Light surface fills; the pattern and letter carry the distinction as well. */
    private static final Color[] SURFACE_FILLS = {
        Color.web("#f6f2e6"), Color.web("#dfe8d2"), Color.web("#e9dcc6"), Color.web("#d8e3ee"),
        Color.web("#eedae4"), Color.web("#e5e1f2"), Color.web("#f0ecc8"), Color.web("#d6ebe6"),
    };

    /** Zone outline colours, strong enough on every surface fill. */
    private static final Color[] ZONE_COLOURS = {
        Color.web("#1f7896"), Color.web("#c0561c"), Color.web("#6b4896"), Color.web("#3a8a3e"),
        Color.web("#a67c00"), Color.web("#b8336a"), Color.web("#2e5e8c"), Color.web("#7a5230"),
    };

    /** Heat map stops from "little charge needed" to "all of it": cream, amber, brick, aubergine. */
    private static final Color[] HEAT_STOPS = {
        Color.web("#fff4d8"), Color.web("#f4b04a"), Color.web("#c0502f"), Color.web("#4b1d40"),
    };

    /** Fill patterns for surfaces, in the order surfaces are given them. */
    enum Pattern { PLAIN, DOTS, DIAGONAL, HORIZONTAL, CROSSHATCH, VERTICAL, BACK_DIAGONAL, GRID }

    /**
     * How one surface is drawn.
     *
     * @param symbols the map's own legend characters for plain cells of this surface (no dock, no
     *                door), in sorted order; may be empty when the surface occurs only under docks or doors
     */
    record SurfaceStyle(String surface, Color fill, Pattern pattern, String symbols) {
    }

    private Palette() {
    }

    /** Styles for the surfaces of a map, in sorted order of surface name (stable across runs). */
    static List<SurfaceStyle> surfaces(BuildingMap map) {
        TreeSet<String> names = new TreeSet<>();
        for (Terrain t : map.legend().values()) {
            if (t.free()) {
                names.add(t.surface());
            }
        }
        List<SurfaceStyle> out = new ArrayList<>();
        int i = 0;
        Pattern[] patterns = Pattern.values();
        for (String n : names) {
            out.add(new SurfaceStyle(n, SURFACE_FILLS[i % SURFACE_FILLS.length], patterns[i % patterns.length],
                    symbols(map, t -> t.free() && !t.dock() && !t.door() && t.surface().equals(n))));
            i++;
        }
        return out;
    }

    /** The map's legend characters whose terrain passes the test, sorted, as one string. */
    static String symbols(BuildingMap map, java.util.function.Predicate<Terrain> test) {
        StringBuilder sb = new StringBuilder();
        new TreeSet<>(map.legend().keySet()).forEach(ch -> {
            if (test.test(map.legend().get(ch))) {
                sb.append(ch.charValue());
            }
        });
        return sb.toString();
    }

    /** Characters for a key row: {@code ", "} between them, e.g. {@code D, F}. */
    static String listed(String symbols) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < symbols.length(); i++) {
            sb.append(i == 0 ? "" : ", ").append(symbols.charAt(i));
        }
        return sb.toString();
    }

    static Color zone(int i) {
        return ZONE_COLOURS[Math.floorMod(i, ZONE_COLOURS.length)];
    }

    /** Heat colour for a fraction 0..1 of the capacity (clamped). */
    static Color heat(double t) {
        double c = Math.max(0, Math.min(1, t)) * (HEAT_STOPS.length - 1);
        int i = Math.min((int) Math.floor(c), HEAT_STOPS.length - 2);
        return HEAT_STOPS[i].interpolate(HEAT_STOPS[i + 1], c - i);
    }

    /** A text colour readable on the given fill. */
    static Color textOn(Color fill) {
        double lum = 0.2126 * fill.getRed() + 0.7152 * fill.getGreen() + 0.0722 * fill.getBlue();
        return lum > 0.55 ? Color.web("#15171a") : Color.web("#fafafa");
    }
}
