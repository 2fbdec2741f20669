package dockline.io;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.Terrain;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Checks one parsed map document and builds the {@link BuildingMap}. Goes on after each problem
 * so that one run reports all of them; the map is built only when there was none.
 */
final class MapReading extends DocumentReading<BuildingMap> {

    static final String[] KEYS = {"name", "cell-size", "legend", "plan", "zones", "doors", "disturbances"};
    static final String ALL_DOORS = "all-doors";

    private Map<Character, Terrain> legend;
    private PlanGrid grid;
    private final Map<String, Zone> zones = new LinkedHashMap<>();
    private final Map<String, Cell> doorCells = new LinkedHashMap<>();
    private final Map<Cell, String> doorNames = new HashMap<>();

    MapReading(YamlReader.Document doc, Problems problems) {
        super(doc, problems, "a map file");
    }

    @Override
    BuildingMap read(Node.MapNode root) {
        String name = name(root, KEYS);

        BigDecimal cellSize = null;
        Node cs = in.require(root, "cell-size", "the map");
        if (cs != null) {
            cellSize = in.decimal(cs, "cell-size (metres)");
            if (cellSize != null && (cellSize.signum() <= 0 || cellSize.compareTo(BigDecimal.valueOf(1000)) > 0)) {
                problems.add(cs.pos(), "cell-size must be more than 0 and at most 1000 metres, not " + cellSize.toPlainString(),
                        "the edge length of one plan cell, e.g. 0.5");
                cellSize = null;
            }
        }
        Node legendNode = in.require(root, "legend", "the map");
        if (legendNode != null) {
            legend = legend(legendNode);
        }
        Node planNode = in.require(root, "plan", "the map");
        if (planNode != null) {
            grid = new PlanReading(doc, problems, legend).read(planNode);
        }
        if (root.get("zones") != null) {
            zones(root.entry("zones"));
        }
        if (root.get("doors") != null) {
            doors(in.map(root.get("doors"), "doors"));
        }
        DisturbanceModel dm = DisturbanceModel.none();
        if (root.get("disturbances") != null) {
            dm = new DisturbanceReading(in, grid, zones, doorCells, doorNames).read(in.map(root.get("disturbances"), "disturbances"));
        }
        if (!clean() || name == null || cellSize == null || legend == null || grid == null || dm == null) {
            return null;
        }
        try {
            return new BuildingMap(name, doc.file(), cellSize, grid.rows, legend, new ArrayList<>(zones.values()),
                    doorNames, dm);
        } catch (IllegalArgumentException e) {
            problems.add(Pos.START, "the map is not consistent: " + e.getMessage(),
                    "compare the map with the key-by-key description in maps/README.md");
            return null;
        }
    }


    // ---------------------------------------------------------------- legend

    private Map<Character, Terrain> legend(Node n) {
        Node.MapNode m = in.map(n, "legend");
        if (m == null) {
            return null;
        }
        Map<Character, Terrain> out = new HashMap<>();
        boolean ok = true;
        for (Node.Entry e : m.entries()) {
            String k = e.key();
            if (k.length() != 1 || Character.isSurrogate(k.charAt(0))) {
                problems.add(e.keyPos(), "legend key '" + Loading.shorten(k) + "' must be a single character",
                        "each plan cell is one character; the legend says what each character means");
                ok = false;
                continue;
            }
            char c = k.charAt(0);
            if (Character.isWhitespace(c) || Character.isISOControl(c) || c == '\uFFFD') {
                problems.add(e.keyPos(), "legend key must be a visible character, not a space or control character",
                        "use one visible character per terrain, e.g. \"#\": wall");
                ok = false;
                continue;
            }
            Terrain t = terrain(c, e.value());
            if (t == null) {
                ok = false;
            } else {
                out.put(c, t);
            }
        }
        if (m.entries().isEmpty()) {
            problems.add(m.pos(), "the legend is empty", "say what each plan character means, e.g. \"#\": wall");
            return null;
        }
        return ok ? out : null;
    }

    private Terrain terrain(char c, Node v) {
        String what = "legend '" + c + "'";
        if (v instanceof Node.MapNode m) {
            in.onlyKeys(m, what, "surface", "dock", "door");
            Node sn = in.require(m, "surface", what);
            String surface = sn == null ? null : in.string(sn, what + " surface");
            boolean dock = false;
            boolean door = false;
            if (m.get("dock") != null) {
                Boolean b = in.bool(m.get("dock"), what + " dock");
                dock = b != null && b;
            }
            if (m.get("door") != null) {
                Boolean b = in.bool(m.get("door"), what + " door");
                door = b != null && b;
            }
            if (surface == null) {
                return null;
            }
            if (surface.equals("wall")) {
                if (dock) {
                    problems.add(m.get("dock").pos(), "a dock cannot stand on a wall",
                            "give the dock cell a surface, e.g. {surface: tile, dock: true}");
                    return null;
                }
                if (door) {
                    problems.add(m.get("door").pos(), "a door cannot be a wall",
                            "give the door cell a surface, e.g. {surface: tile, door: true}");
                    return null;
                }
                return Terrain.wall(c);
            }
            return new Terrain(c, surface, dock, door);
        }
        if (v instanceof Node.Scalar s && s.kind() != Node.Kind.NULL) {
            String surface = in.string(v, what);
            if (surface == null) {
                return null;
            }
            return surface.equals("wall") ? Terrain.wall(c) : new Terrain(c, surface, false, false);
        }
        if (v != null && !(v instanceof Node.Bad)) {
            problems.add(v.pos(), what + " must be 'wall', a surface name, or {surface: ..., dock: true, door: true}",
                    "e.g. \".\": tile");
        }
        return null;
    }

    // ---------------------------------------------------------------- zones

    private void zones(Node.Entry entry) {
        Node.MapNode m = in.map(entry.value(), "zones");
        if (m == null) {
            return;
        }
        for (Node.Entry e : m.entries()) {
            Zone z = zone(e);
            if (z != null) {
                zones.put(z.name(), z);
            }
        }
    }

    private Zone zone(Node.Entry e) {
        String name = e.key().trim();
        if (name.isEmpty() || name.equals(ALL_DOORS)) {
            problems.add(e.keyPos(), name.isEmpty() ? "a zone needs a name" : "'" + ALL_DOORS + "' is reserved and cannot name a zone",
                    "give the zone a name of its own, e.g. ward-a");
            return null;
        }
        String what = "zone '" + Loading.shorten(name) + "'";
        Node.MapNode m = in.map(e.value(), what);
        if (m == null) {
            return null;
        }
        in.onlyKeys(m, what, "from", "to", "cells");
        Node from = m.get("from");
        Node to = m.get("to");
        Node cells = m.get("cells");
        if ((from == null) != (to == null)) {
            problems.add(m.pos(), what + ": a rectangle needs both 'from' and 'to'", "e.g. {from: [1, 1], to: [6, 4]}");
            return null;
        }
        if (from == null && cells == null) {
            problems.add(m.pos(), what + " needs a rectangle (from, to) or a list of cells",
                    "e.g. {from: [1, 1], to: [6, 4]} or {cells: [[3, 4], [4, 4]]}");
            return null;
        }
        List<Cell> out = new ArrayList<>();
        boolean ok = true;
        if (from != null) {
            Cell a = in.cell(from, what + " from");
            Cell b = in.cell(to, what + " to");
            ok &= a != null && b != null && onPlan(a, from.pos(), what) && onPlan(b, to.pos(), what);
            if (ok && grid != null) {
                for (int y = Math.min(a.y(), b.y()); y <= Math.max(a.y(), b.y()); y++) {
                    for (int x = Math.min(a.x(), b.x()); x <= Math.max(a.x(), b.x()); x++) {
                        Cell c = new Cell(x, y);
                        Terrain t = grid.at(c);
                        if (t != null && t.free()) {
                            out.add(c); // the walls of a room are part of its rectangle, not of the zone
                        }
                    }
                }
            }
        }
        if (cells != null) {
            if (cells instanceof Node.SeqNode s) {
                for (Node cn : s.items()) {
                    Cell c = in.cell(cn, what + " cell");
                    if (c == null || !onPlan(c, cn.pos(), what)) {
                        ok = false;
                        continue;
                    }
                    Terrain t = grid == null ? null : grid.at(c);
                    if (t != null && t.wall()) {
                        problems.add(cn.pos(), what + ": cell " + c + " is a wall", "a zone holds free cells only");
                        ok = false;
                    } else if (t != null) {
                        out.add(c);
                    }
                }
            } else if (!(cells instanceof Node.Bad)) {
                problems.add(cells.pos(), what + " cells must be a list of cells [x, y]", "e.g. cells: [[3, 4], [4, 4]]");
                ok = false;
            }
        }
        if (!ok) {
            return null;
        }
        if (out.isEmpty() && grid != null && !grid.incomplete) {
            problems.add(e.keyPos(), what + " contains no free cell", "check its coordinates: x is the column, y the row");
            return null;
        }
        return out.isEmpty() ? null : new Zone(name, out);
    }

    private boolean onPlan(Cell c, Pos pos, String what) {
        if (grid == null || grid.inside(c)) {
            return true;
        }
        problems.add(pos, what + ": cell " + c + " is outside the plan (" + grid.describeSize() + ")",
                "x counts columns from 0 at the left, y rows from 0 at the top");
        return false;
    }

    // ---------------------------------------------------------------- doors

    private void doors(Node.MapNode m) {
        if (m == null) {
            return;
        }
        for (Node.Entry e : m.entries()) {
            String name = e.key().trim();
            String what = "door '" + Loading.shorten(name) + "'";
            if (name.isEmpty() || name.equals(ALL_DOORS)) {
                problems.add(e.keyPos(), name.isEmpty() ? "a door needs a name" : "'" + ALL_DOORS + "' is reserved and cannot name a door",
                        "give the door a name of its own, e.g. ward-door");
                continue;
            }
            if (zones.containsKey(name)) {
                problems.add(e.keyPos(), "'" + Loading.shorten(name) + "' names both a zone and a door",
                        "give the door another name, e.g. '" + Loading.shorten(name) + "-door'");
                continue;
            }
            Cell c = in.cell(e.value(), what);
            if (c == null || !onPlan(c, e.value().pos(), what)) {
                continue;
            }
            Terrain t = grid == null ? null : grid.at(c);
            if (t != null && !t.door()) {
                problems.add(e.value().pos(), what + ": cell " + c + " is not a door (its character '" + t.symbol()
                        + "' means " + t.describe() + ")", "mark the character as a door in the legend, e.g. D: {surface: tile, door: true}");
                continue;
            }
            String other = doorNames.get(c);
            if (other != null) {
                problems.add(e.value().pos(), what + ": cell " + c + " is already named '" + Loading.shorten(other) + "'",
                        "give each door cell one name");
                continue;
            }
            doorNames.put(c, name);
            doorCells.put(name, c);
        }
    }
}
