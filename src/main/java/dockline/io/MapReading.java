package dockline.io;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Terrain;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Checks one parsed map document and builds the {@link BuildingMap}. Goes on after each problem
 * so that one run reports all of them; the map is built only when there was none.
 */
final class MapReading {

    static final String[] KEYS = {"name", "cell-size", "legend", "plan", "zones", "doors", "disturbances"};
    static final String ALL_DOORS = "all-doors";
    /** Characters that YAML gives a meaning at the start of a plain key; such legend keys must be quoted. */
    private static final String YAML_INDICATORS = "#&*!|>'\"%@`{}[],:?-";
    /** How often one unknown plan character is reported before the rest are counted. */
    private static final int SHOWN_PER_CHAR = 3;

    private final YamlReader.Document doc;
    private final Problems problems;
    private final Loading in;

    private Map<Character, Terrain> legend;
    private Grid grid;
    private final Map<String, Zone> zones = new LinkedHashMap<>();
    private final Map<String, Cell> doorCells = new LinkedHashMap<>();
    private final Map<Cell, String> doorNames = new HashMap<>();

    MapReading(YamlReader.Document doc, Problems problems) {
        this.doc = doc;
        this.problems = problems;
        this.in = new Loading(problems);
    }

    BuildingMap read() {
        int before = problems.raised();
        Node.MapNode root = in.map(doc.root(), "a map file");
        if (root == null) {
            return null;
        }
        in.onlyKeys(root, "a map file", KEYS);
        String name = root.get("name") == null ? stem(doc.file()) : in.string(root.get("name"), "name");

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
            grid = plan(planNode);
        }
        if (root.get("zones") != null) {
            zones(root.entry("zones"));
        }
        if (root.get("doors") != null) {
            doors(in.map(root.get("doors"), "doors"));
        }
        DisturbanceModel dm = DisturbanceModel.none();
        if (root.get("disturbances") != null) {
            dm = disturbances(in.map(root.get("disturbances"), "disturbances"));
        }
        if (problems.raised() > before || name == null || cellSize == null || legend == null || grid == null || dm == null) {
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

    static String stem(Path file) {
        Path f = file.getFileName();
        String s = f == null ? "map" : f.toString();
        int dot = s.lastIndexOf('.');
        return dot > 0 ? s.substring(0, dot) : s;
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

    // ---------------------------------------------------------------- plan

    /** The plan's rows, where each row sits in the file, and what is known about each cell. */
    static final class Grid {
        final List<String> rows;
        final int width;
        final int height;
        /** File line of each row. */
        final int[] rowLine;
        /** Column of each row's first character, or 0 when it could not be located exactly. */
        final int[] rowColumn;
        /** Some cells have characters the legend does not know (or the legend is broken). */
        boolean incomplete;
        /** The legend as a table indexed by character (no boxing in the per-cell loops). */
        final Terrain[] table = new Terrain[65536];
        private final Map<Character, Terrain> legend;

        Grid(List<String> rows, int width, int[] rowLine, int[] rowColumn, Map<Character, Terrain> legend) {
            this.rows = rows;
            this.height = rows.size();
            this.width = width;
            this.rowLine = rowLine;
            this.rowColumn = rowColumn;
            this.legend = legend;
            if (legend != null) {
                legend.forEach((c, t) -> table[c] = t);
            }
        }

        boolean inside(Cell c) {
            return c.x() >= 0 && c.y() >= 0 && c.x() < width && c.y() < height;
        }

        /** The terrain of a cell, or {@code null} when unknown. */
        Terrain at(Cell c) {
            if (legend == null || !inside(c) || c.x() >= rows.get(c.y()).length()) {
                return null;
            }
            return table[rows.get(c.y()).charAt(c.x())];
        }

        String describeSize() {
            return width + " x " + height + " cells: x from 0 to " + (width - 1) + ", y from 0 to " + (height - 1);
        }
    }

    private Grid plan(Node n) {
        if (!(n instanceof Node.Scalar s) || s.kind() != Node.Kind.STRING || !isLiteralBlock(s.pos())) {
            if (n instanceof Node.Bad) {
                return null;
            }
            problems.add(n.pos(), "plan must be a block of rows written after 'plan: |'",
                    "write 'plan: |' and then the rows on the following lines, indented by two spaces");
            return null;
        }
        String[] split = s.text().split("\n", -1);
        int count = split.length;
        while (count > 0 && split[count - 1].isEmpty()) {
            count--;
        }
        if (count == 0) {
            problems.add(n.pos(), "the plan has no rows", "write the rows on the lines after 'plan: |'");
            return null;
        }
        if (count > MapLoader.MAX_SIDE) {
            problems.add(n.pos(), "the plan has " + count + " rows; at most " + MapLoader.MAX_SIDE + " are allowed",
                    "use a coarser cell size");
            return null;
        }
        List<String> rows = Arrays.asList(split).subList(0, count);
        int[] rowLine = new int[count];
        int[] rowColumn = new int[count];
        for (int i = 0; i < count; i++) {
            // A literal block keeps its lines one for one: row i is on the i-th line after the '|'.
            int line = s.pos().line() + 1 + i;
            String fileLine = doc.source().line(line);
            String row = rows.get(i);
            rowLine[i] = line;
            int lead = fileLine.length() - row.length();
            if (lead >= 0 && fileLine.endsWith(row) && fileLine.substring(0, lead).isBlank()) {
                rowColumn[i] = fileLine.codePointCount(0, lead) + 1;
            }
        }
        int ref = 0; // the first row that is not empty sets the width
        while (rows.get(ref).isEmpty()) {
            ref++;
        }
        int width = rows.get(ref).codePointCount(0, rows.get(ref).length());
        if (width > MapLoader.MAX_SIDE) {
            problems.add(at(rowLine, rowColumn, ref, 0, n.pos()), "plan rows are " + width + " cells wide; at most "
                    + MapLoader.MAX_SIDE + " are allowed", "use a coarser cell size");
            return null;
        }
        Grid g = new Grid(rows, width, rowLine, rowColumn, legend);
        g.incomplete = legend == null;
        Map<Integer, Integer> seen = new HashMap<>();
        boolean anyFree = false;
        for (int y = 0; y < count; y++) {
            String row = rows.get(y);
            if (row.isEmpty()) {
                problems.add(new Pos(rowLine[y], 1), "plan row " + y + " is empty",
                        "remove the blank line inside the plan, or fill the row with wall characters");
                g.incomplete = true;
                continue;
            }
            int x = 0;
            for (int i = 0; i < row.length(); ) {
                int cp = row.codePointAt(i);
                Terrain known = cp <= 0xFFFF ? g.table[cp] : null;
                if (x < width && (known != null || legend == null)) {
                    // the common case: a known character inside the width; no objects made
                    anyFree |= known != null && known.free();
                    i += Character.charCount(cp);
                    x++;
                    continue;
                }
                Pos p = at(rowLine, rowColumn, y, x, n.pos());
                if (x == width) {
                    problems.add(p, "plan row " + y + " is " + row.codePointCount(0, row.length()) + " cells wide, but row "
                            + ref + " is " + width, "all rows must be equally wide; fill with wall characters"
                            + (row.endsWith(" ") ? " (this row ends in spaces)" : ""));
                    g.incomplete = true;
                }
                if (legend != null && known == null) {
                    g.incomplete = true;
                    int times = seen.merge(cp, 1, Integer::sum);
                    if (times <= SHOWN_PER_CHAR) {
                        problems.add(p, unknownChar(cp), unknownCharHint(cp));
                    } else if (times == SHOWN_PER_CHAR + 1) {
                        int more = countFrom(rows, y, i, cp);
                        problems.add(p, "character " + quote(cp) + " is not in the legend (here and " + (more - 1)
                                + " more time" + (more == 2 ? "" : "s") + " below)", unknownCharHint(cp));
                    }
                } else if (known != null && known.free()) {
                    anyFree = true;
                }
                i += Character.charCount(cp);
                x++;
            }
            if (x < width) {
                problems.add(at(rowLine, rowColumn, y, x, n.pos()), "plan row " + y + " is " + x
                        + " cells wide, but row " + ref + " is " + width, "all rows must be equally wide; fill with wall characters");
                g.incomplete = true;
            }
        }
        if (legend != null && !anyFree && !g.incomplete) {
            problems.add(n.pos(), "the plan has no free cell: every character is a wall",
                    "mark the floor with a legend symbol that is not a wall, e.g. \".\": tile");
        }
        return g;
    }

    private boolean isLiteralBlock(Pos p) {
        String line = doc.source().line(p.line());
        int idx = SourceText.charIndexOfColumn(line, p.column());
        return idx >= 0 && line.charAt(idx) == '|';
    }

    private static int countFrom(List<String> rows, int y0, int i0, int cp) {
        int n = 0;
        for (int y = y0; y < rows.size(); y++) {
            String r = rows.get(y);
            for (int i = y == y0 ? i0 : 0; i < r.length(); ) {
                int c = r.codePointAt(i);
                if (c == cp) {
                    n++;
                }
                i += Character.charCount(c);
            }
        }
        return n;
    }

    private static Pos at(int[] rowLine, int[] rowColumn, int y, int x, Pos fallback) {
        if (rowColumn[y] == 0) {
            return new Pos(rowLine[y], 1);
        }
        return new Pos(rowLine[y], rowColumn[y] + x);
    }

    private String unknownChar(int cp) {
        if (cp == ' ') {
            return "a space in the plan";
        }
        return "character " + quote(cp) + " is not in the legend";
    }

    private String unknownCharHint(int cp) {
        if (cp == ' ') {
            return "every cell needs a legend character, e.g. '#' for a wall";
        }
        if (cp <= 0xFFFF && YAML_INDICATORS.indexOf(cp) >= 0) {
            return "add it to the legend, in quotes (YAML needs them for this character), e.g. \""
                    + (char) cp + "\": wall";
        }
        return "add it to the legend, or use one of: " + legendChars();
    }

    private String legendChars() {
        StringBuilder sb = new StringBuilder();
        legend.keySet().stream().sorted().forEach(c -> sb.append(sb.length() == 0 ? "" : " ").append(c));
        return sb.toString();
    }

    private static String quote(int cp) {
        if (Character.isISOControl(cp) || cp == 0xFFFD || !Character.isDefined(cp)) {
            return String.format("U+%04X", cp);
        }
        return "'" + new String(Character.toChars(cp)) + "'";
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

    // ---------------------------------------------------------------- disturbances

    private DisturbanceModel disturbances(Node.MapNode m) {
        if (m == null) {
            return null;
        }
        in.onlyKeys(m, "disturbances", "budget", "events", "budget-per");
        int budget = 0;
        boolean ok = true;
        if (m.get("budget") != null) {
            Integer b = in.integer(m.get("budget"), "budget (events per mission)", 0, MapLoader.MAX_BUDGET);
            ok &= b != null;
            budget = b == null ? 0 : b;
        }
        List<EventRule> rules = new ArrayList<>();
        Node events = m.get("events");
        if (events instanceof Node.SeqNode s) {
            int entry = 0;
            for (Node ev : s.items()) {
                ok &= event(ev, rules, entry++, budget);
            }
        } else if (events != null && !(events instanceof Node.Bad)
                && !(events instanceof Node.Scalar sc && sc.kind() == Node.Kind.NULL)) {
            problems.add(events.pos(), "events must be a list, one '- kind: ...' entry per event",
                    "e.g. events: [{kind: door-shut, where: all-doors}]");
            ok = false;
        }
        Boolean perLap = m.get("budget-per") == null ? Boolean.FALSE : budgetPer(m.get("budget-per"));
        return ok && perLap != null ? new DisturbanceModel(budget, rules, perLap) : null;
    }

    /** {@code budget-per: mission} (the default: the budget is for the whole mission, or night) or {@code lap}. */
    private Boolean budgetPer(Node n) {
        String v = in.string(n, "budget-per");
        if (v == null) {
            return null;
        }
        if (v.equals("lap") || v.equals("mission")) {
            return v.equals("lap");
        }
        String near = Spelling.closest(v, List.of("lap", "mission"));
        problems.add(n.pos(), "budget-per must be 'mission' or 'lap', not '" + Loading.shorten(v) + "'"
                        + (near != null ? " (did you mean '" + near + "'?)" : ""),
                "mission: at most budget events in the whole mission (a patrol: the whole night); lap: the budget"
                        + " starts afresh on every lap of a patrol");
        return null;
    }

    private boolean event(Node n, List<EventRule> rules, int entry, int budget) {
        Node.MapNode m = in.map(n, "an event");
        if (m == null) {
            return false;
        }
        in.onlyKeys(m, "an event", "kind", "where", "extra", "duration", "at-most");
        Node kn = in.require(m, "kind", "an event");
        Node wn = in.require(m, "where", "an event");
        EventKind kind = null;
        List<String> words = Arrays.stream(EventKind.values()).map(EventKind::word).toList();
        if (kn != null) {
            String k = in.string(kn, "kind");
            if (k != null) {
                kind = EventKind.ofWord(k);
                if (kind == null) {
                    String near = Spelling.closest(k, words);
                    problems.add(kn.pos(), "unknown event kind '" + Loading.shorten(k) + "'"
                            + (near != null ? ", did you mean '" + near + "'?" : ""), "kinds: " + String.join(", ", words));
                }
            }
        }
        BigDecimal extra = BigDecimal.ZERO;
        Node xn = m.get("extra");
        if (kind == EventKind.DRAG) {
            if (xn == null) {
                problems.add(m.pos(), "a drag event needs 'extra': the energy in Wh added to each dragged move", "e.g. extra: 0.5");
                return false;
            }
            extra = in.wh(xn, "extra");
            if (extra == null) {
                return false;
            }
            if (extra.signum() == 0) {
                problems.add(xn.pos(), "extra must be more than 0 Wh for a drag",
                        "give the extra energy a drag costs, e.g. extra: 0.5");
                return false;
            }
        } else if (kind != null && xn != null) {
            problems.add(xn.pos(), "'extra' applies only to kind: drag", "remove it");
            return false;
        }
        EventDuration duration = duration(m.get("duration"), kind);
        boolean limitOk = true;
        int atMost = -1;
        Node an = m.get("at-most");
        if (an != null) {
            Integer a = in.integer(an, "at-most (events of this entry per mission)", -MapLoader.MAX_BUDGET * 1000L,
                    MapLoader.MAX_BUDGET * 1000L);
            if (a != null && (a < 0 || a > budget)) {
                problems.add(an.pos(), "at-most must be between 0 and the budget (" + budget + "), not " + a,
                        "a whole number from 0 to " + budget + ", or leave at-most out (then only the budget limits this event)");
                a = null;
            }
            limitOk = a != null;
            atMost = a == null ? -1 : a;
        }
        List<String> where = wn == null ? null : in.names(wn, "where");
        if (kind == null || where == null || duration == null || !limitOk) {
            return false;
        }
        if (where.isEmpty()) {
            problems.add(wn.pos(), "where names no zone or door", "e.g. where: [lobby] or where: all-doors");
            return false;
        }
        boolean ok = true;
        int first = rules.size();
        for (String w : where) {
            ok &= place(kind, w, wn.pos(), extra, rules);
        }
        for (int i = first; i < rules.size(); i++) {
            rules.set(i, rules.get(i).withDuration(duration).withAtMost(atMost, entry));
        }
        return ok;
    }

    /**
     * The duration of an event entry: {@code rest-of-mission} (the default) or {@code momentary} for
     * door-shut and blockage; slip and drag take no {@code duration}. {@code null} after a problem.
     */
    private EventDuration duration(Node dn, EventKind kind) {
        boolean closes = kind == EventKind.DOOR_SHUT || kind == EventKind.BLOCKAGE;
        List<String> words = Arrays.stream(EventDuration.values()).map(EventDuration::word).toList();
        if (dn == null) {
            return closes || kind == null ? EventDuration.REST_OF_MISSION : EventDuration.MOMENTARY;
        }
        if (kind != null && !closes) {
            problems.add(dn.pos(), "'duration' applies only to kind: door-shut and kind: blockage; a "
                    + kind.word() + " is momentary by nature", "remove it");
            return null;
        }
        String d = in.string(dn, "duration");
        if (d == null) {
            return null;
        }
        EventDuration out = EventDuration.ofWord(d);
        if (out == null) {
            String near = Spelling.closest(d, words);
            problems.add(dn.pos(), "unknown duration '" + Loading.shorten(d) + "'"
                    + (near != null ? ", did you mean '" + near + "'?" : ""), "durations: " + String.join(", ", words));
            return null;
        }
        return closes || kind == null ? out : EventDuration.MOMENTARY;
    }

    private boolean place(EventKind kind, String w, Pos pos, BigDecimal extra, List<EventRule> rules) {
        if (grid == null || grid.incomplete) {
            return true; // cannot tell door cells yet; the plan's own problems come first
        }
        if (w.equals(ALL_DOORS)) {
            List<Cell> doors = doorCellsIn(null);
            if (doors.isEmpty()) {
                problems.add(pos, "'" + ALL_DOORS + "': the plan has no door cells", "mark door characters in the legend with door: true");
                return false;
            }
            for (Cell c : doors) {
                rules.add(new EventRule(kind, doorLabel(c), List.of(c), extra));
            }
            return true;
        }
        Cell door = doorCells.get(w);
        if (door != null) {
            rules.add(new EventRule(kind, doorLabel(door), List.of(door), extra));
            return true;
        }
        Zone z = zones.get(w);
        if (z != null) {
            if (kind == EventKind.DOOR_SHUT) {
                List<Cell> doors = doorCellsIn(z);
                if (doors.isEmpty()) {
                    problems.add(pos, "zone '" + Loading.shorten(w) + "' has no door cell, so no door there can shut",
                            "name a door, a zone with doors, or all-doors");
                    return false;
                }
                for (Cell c : doors) {
                    rules.add(new EventRule(kind, doorLabel(c), List.of(c), extra));
                }
            } else {
                rules.add(new EventRule(kind, z.name(), z.cells(), extra));
            }
            return true;
        }
        List<String> known = new ArrayList<>(zones.keySet());
        known.addAll(doorCells.keySet());
        known.add(ALL_DOORS);
        String near = Spelling.closest(w, known);
        problems.add(pos, "no zone or door named '" + Loading.shorten(w) + "'"
                        + (near != null ? ", did you mean '" + near + "'?" : ""),
                "name a zone from 'zones', a door from 'doors', or all-doors");
        return false;
    }

    private List<Cell> doorCellsIn(Zone z) {
        List<Cell> out = new ArrayList<>();
        for (int y = 0; y < grid.height; y++) {
            for (int x = 0; x < grid.width; x++) {
                Cell c = new Cell(x, y);
                Terrain t = grid.at(c);
                if (t != null && t.door() && (z == null || z.contains(c))) {
                    out.add(c);
                }
            }
        }
        return out;
    }

    private String doorLabel(Cell c) {
        String n = doorNames.get(c);
        return "door " + (n != null ? n : c.toString());
    }
}
