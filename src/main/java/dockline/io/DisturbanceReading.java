package dockline.io;

import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Terrain;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * Reads a map's {@code disturbances:} section (maps/README.md): the budget, whether it is per mission
 * or per lap, and each event entry, placed on the cells of the zones and doors it names. Needs the
 * plan, the zones and the doors read before it; linear in the entries times the cells they cover.
 */
final class DisturbanceReading {

    private final Problems problems;
    private final Loading in;
    /** The plan, {@code null} when it could not be read. */
    private final PlanGrid grid;
    private final Map<String, Zone> zones;
    private final Map<String, Cell> doorCells;
    private final Map<Cell, String> doorNames;

    DisturbanceReading(Loading in, PlanGrid grid, Map<String, Zone> zones, Map<String, Cell> doorCells,
                       Map<Cell, String> doorNames) {
        this.problems = in.problems;
        this.in = in;
        this.grid = grid;
        this.zones = zones;
        this.doorCells = doorCells;
        this.doorNames = doorNames;
    }

    /** The disturbance model, or {@code null} after a problem. */
    DisturbanceModel read(Node.MapNode m) {
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
        if (w.equals(MapReading.ALL_DOORS)) {
            List<Cell> doors = doorCellsIn(null);
            if (doors.isEmpty()) {
                problems.add(pos, "'" + MapReading.ALL_DOORS + "': the plan has no door cells", "mark door characters in the legend with door: true");
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
        known.add(MapReading.ALL_DOORS);
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
