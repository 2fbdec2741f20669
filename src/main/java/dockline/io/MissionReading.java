package dockline.io;

import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.model.Tasks;
import dockline.model.Timing;
import dockline.model.Zone;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Checks one parsed mission document (and loads its map) and builds the {@link Mission}. Goes on
 * after each problem so that one run reports all of them; checks that need the map are skipped
 * when the map has problems of its own (those are reported with the map's file name).
 */
final class MissionReading extends DocumentReading<Mission> {

    static final String[] KEYS = {"name", "map", "robot", "start", "reserve", "tasks", "objective", "deadline"};
    /** Largest discount factor accepted (the comparator's numbers grow with it). */
    static final int MAX_DISCOUNT = 1_000_000;
    private static final BigDecimal HUNDRED = BigDecimal.valueOf(100);

    private final RobotReading robots = new RobotReading(in);
    private BuildingMap map;
    /** Where the discounted objective's threshold is written, for the range check after loading. */
    private Pos thresholdPos;
    private boolean mapBroken;

    MissionReading(YamlReader.Document doc, Problems problems) {
        super(doc, problems, "a mission file");
    }

    @Override
    Mission read(Node.MapNode root) {
        if (root.get("map") == null && root.get("robot") == null && (root.get("plan") != null || root.get("legend") != null)) {
            // a map where a mission belongs: one clear line instead of a screenful of unknown and missing keys
            problems.add(root.pos(), "this is a map file, not a mission",
                    "give a mission file whose 'map:' names this map; 'dockline validate' checks a map on its own");
            return null;
        }
        String name = name(root, KEYS);
        Node mapNode = in.require(root, "map", "the mission");
        if (mapNode != null) {
            loadMap(mapNode);
        } else {
            mapBroken = true;
        }
        RobotReading.Robot robot = null;
        Node rn = in.require(root, "robot", "the mission");
        if (rn != null) {
            robot = robots.read(root.entry("robot"));
        }
        Cell start = null;
        Charge startCharge = Charge.percent(HUNDRED);
        Node sn = in.require(root, "start", "the mission");
        Node startChargeNode = null;
        Node startCellNode = null;
        Node.MapNode sm = sn == null ? null : in.map(sn, "start");
        if (sm != null) {
            in.onlyKeys(sm, "start", "cell", "charge");
            startCellNode = in.require(sm, "cell", "start");
            if (startCellNode != null) {
                start = in.cell(startCellNode, "start cell");
            }
            startChargeNode = sm.get("charge");
            if (startChargeNode != null) {
                startCharge = in.charge(startChargeNode, "start charge");
            }
        }
        Node resNode = in.require(root, "reserve", "the mission");
        Charge reserve = resNode == null ? null : in.charge(resNode, "reserve");

        Tasks tasks = Tasks.justDock();
        Node tn = root.get("tasks");
        TaskNodes taskNodes = null;
        if (tn != null) {
            taskNodes = new TaskNodes();
            tasks = tasks(in.map(tn, "tasks"), taskNodes, root.entry("tasks").keyPos());
        }
        Objective objective = new Objective.Reserve();
        if (root.get("objective") != null) {
            objective = objective(in.map(root.get("objective"), "objective"));
        }
        Timing timing = ClockReading.timing(robot == null ? null : robot.tick, robot == null ? null : robot.tickNode,
                root.get("deadline"), rn == null ? null : rn.pos(), tasks != null && tasks.patrols(), problems);

        // checks across sections
        if (robot != null && robot.profile != null) {
            robots.charges(robot, startCharge, startChargeNode, sn, reserve, resNode);
        }
        if (map != null && start != null && startCellNode != null) {
            startCell(start, startCellNode.pos(), tasks);
        }
        if (map != null && robot != null) {
            robots.surfaces(robot, map);
            robots.drags(robot, map);
        }
        if (map != null && tasks != null && taskNodes != null) {
            taskZones(tasks, taskNodes);
        }
        if (map != null && tasks != null && tasks.finishOnDock() && map.docks().isEmpty()) {
            Pos at = taskNodes != null && taskNodes.finishOnDock != null ? taskNodes.finishOnDock : mapNode.pos();
            problems.add(at, "the mission must finish on a dock, but the map has no dock",
                    "mark a dock in the map's legend, e.g. C: {surface: tile, dock: true}");
        }
        if (!clean() || mapBroken || map == null || name == null || robot == null || robot.profile == null
                || start == null || startCharge == null || reserve == null || tasks == null || objective == null
                || timing == null) {
            return null;
        }
        Mission mission = new Mission(name, doc.file(), map, robot.profile, start, startCharge, reserve, tasks, objective,
                timing);
        return objective instanceof Objective.Discounted d && !discountedFits(mission, d) ? null : mission;
    }

    /**
     * Whether the discounted comparator's exact 64-bit arithmetic fits this threshold and the largest
     * energy change of this mission's moves (what {@code check} would otherwise refuse after loading);
     * a problem at the threshold if not. A game too large to compile is left to {@code check}'s
     * own limits.
     */
    private boolean discountedFits(Mission mission, Objective.Discounted d) {
        int mu;
        try {
            mu = dockline.arena.ArenaCompiler.compile(mission).maxAbsWeight();
        } catch (dockline.model.ResourceLimitException tooLarge) {
            return true;
        }
        try {
            dockline.monitor.DiscountedComparator.of(d, mu);
            return true;
        } catch (ArithmeticException e) {
            problems.add(thresholdPos != null ? thresholdPos : Pos.START, "threshold " + Loading.shorten(d.threshold().toString())
                            + " is too large for exact arithmetic: with energy changes of up to " + mu + " units per step"
                            + " and discount " + d.discount() + ", the comparator's numbers would pass the 64-bit range",
                    "give a threshold with a smaller numerator and denominator (e.g. \"3/4\"); a coarser energy"
                            + " resolution does not help much, as the threshold is counted in energy units");
            return false;
        }
    }

    // ---------------------------------------------------------------- map

    private void loadMap(Node mapNode) {
        String rel = in.string(mapNode, "map (path of the map file)");
        if (rel == null) {
            mapBroken = true;
            return;
        }
        Path mapPath;
        try {
            mapPath = doc.file().resolveSibling(rel).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            problems.add(mapNode.pos(), "map: '" + Loading.shorten(rel) + "' is not a valid path",
                    "give the map file's path relative to the mission file, e.g. ../maps/clinic-wing.yaml");
            mapBroken = true;
            return;
        }
        if (Files.isDirectory(mapPath)) {
            problems.add(mapNode.pos(), "map: '" + Loading.shorten(rel) + "' is a folder, not a map file (" + mapPath + ")",
                    "name the map's .yaml file in that folder");
            mapBroken = true;
            return;
        }
        String fileName = mapPath.getFileName() == null ? "" : mapPath.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!fileName.endsWith(".yaml") && !fileName.endsWith(".yml")) {
            // a mission may name any path; reading only YAML files keeps it from showing other files' content
            problems.add(mapNode.pos(), "map: '" + Loading.shorten(rel) + "' is not a .yaml or .yml file",
                    "name the building map's YAML file, e.g. map: ../maps/clinic-wing.yaml");
            mapBroken = true;
            return;
        }
        if (!Files.exists(mapPath, LinkOption.NOFOLLOW_LINKS)) {
            problems.add(mapNode.pos(), "map file '" + Loading.shorten(rel) + "' not found (looked for " + mapPath + ")",
                    nearbyFiles(mapPath));
            mapBroken = true;
            return;
        }
        YamlReader.Refusal refused = YamlReader.refusal(mapPath);
        if (refused != null) {
            problems.add(mapNode.pos(), "map: '" + Loading.shorten(rel) + "': " + refused.message(), refused.hint());
            mapBroken = true;
            return;
        }
        Problems mapProblems = new Problems(mapPath);
        map = MapLoader.read(mapPath, mapProblems, true);
        if (mapProblems.any() || map == null) {
            try {
                mapProblems.throwIfAny();
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
            map = null;
            mapBroken = true;
        }
    }

    private static String nearbyFiles(Path wanted) {
        Path dir = wanted.getParent() == null ? Path.of(".") : wanted.getParent();
        String base = wanted.getFileName() == null ? "" : wanted.getFileName().toString();
        List<String> names = new ArrayList<>();
        if (Files.isDirectory(dir)) {
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, "*.{yaml,yml}")) {
                int n = 0;
                for (Path p : ds) {
                    names.add(p.getFileName().toString());
                    if (++n > 500) {
                        break;
                    }
                }
            } catch (IOException | RuntimeException e) {
                return "the path is relative to the mission file's folder";
            }
        }
        names.remove(base); // the wanted name itself may be listed (e.g. a dangling link): never suggest it back
        String near = Spelling.closest(base, names);
        return near != null ? "did you mean '" + near + "'? the path is relative to the mission file's folder"
                : "the path is relative to the mission file's folder";
    }

    private void startCell(Cell start, Pos pos, Tasks tasks) {
        if (!map.inside(start)) {
            problems.add(pos, "start cell " + start + " is outside the map (" + map.width() + " x " + map.height()
                    + " cells: x from 0 to " + (map.width() - 1) + ", y from 0 to " + (map.height() - 1) + ")",
                    "x is the column from the left, y the row from the top, both from 0");
            return;
        }
        if (!map.isFree(start)) {
            problems.add(pos, "start cell " + start + " is a wall", "pick a free cell, e.g. "
                    + (map.docks().isEmpty() ? "one next to it" : "the dock at " + map.docks().get(0)));
            return;
        }
        if (tasks != null) {
            for (String a : tasks.avoid()) {
                if (map.zone(a).map(z -> z.contains(start)).orElse(false)) {
                    problems.add(pos, "start cell " + start + " is in the avoided zone '" + Loading.shorten(a) + "'",
                            "start outside every avoided zone");
                }
            }
        }
    }

    // ---------------------------------------------------------------- tasks

    private static final class TaskNodes {
        List<Loading.Named> visit = List.of();
        List<Loading.Named> avoid = List.of();
        Pos visitPos;
        Pos finishOnDock;
        Pos tasksKey;
    }

    private Tasks tasks(Node.MapNode m, TaskNodes nodes, Pos keyPos) {
        if (m == null) {
            return null;
        }
        nodes.tasksKey = keyPos;
        in.onlyKeys(m, "tasks", "visit", "order", "avoid", "finish-on-dock", "patrol");
        nodes.visitPos = m.get("visit") == null ? null : m.get("visit").pos();
        List<Loading.Named> v = namedOrNone(m, "visit");
        boolean ok = v != null;
        nodes.visit = v == null ? List.of() : v;
        List<String> visit = names(nodes.visit);
        boolean ordered = true;
        Node on = m.get("order");
        if (on != null) {
            String o = in.string(on, "order");
            if ("given".equals(o)) {
                ordered = true;
            } else if ("any".equals(o)) {
                ordered = false;
            } else if (o != null) {
                String near = Spelling.closest(o, List.of("given", "any"));
                problems.add(on.pos(), "order must be 'given' or 'any', not '" + Loading.shorten(o) + "'"
                        + (near != null ? " (did you mean '" + near + "'?)" : ""),
                        "given: visit the zones in the order listed; any: in any order");
                ok = false;
            } else {
                ok = false;
            }
        }
        List<Loading.Named> av = namedOrNone(m, "avoid");
        ok &= av != null;
        nodes.avoid = av == null ? List.of() : av;
        List<String> avoid = names(nodes.avoid);
        boolean finish = true;
        Node fn = m.get("finish-on-dock");
        if (fn != null) {
            nodes.finishOnDock = fn.pos();
            Boolean b = in.bool(fn, "finish-on-dock");
            ok &= b != null;
            finish = b == null || b;
        }
        if (visit.size() > GoalAutomaton.MAX_TASKS) {
            problems.add(nodes.visitPos, "the mission lists " + visit.size() + " zones to visit; at most "
                    + GoalAutomaton.MAX_TASKS + " are allowed", "split it into several missions");
            ok = false;
        }
        if (!ordered) {
            Set<String> seen = new LinkedHashSet<>();
            for (Loading.Named n : nodes.visit) {
                if (!seen.add(n.name())) {
                    problems.add(n.pos(), "zone '" + Loading.shorten(n.name()) + "' is listed twice in visit",
                            "with order: any, each zone needs visiting once; remove the second one");
                    ok = false;
                }
            }
        }
        for (Loading.Named a : nodes.avoid) {
            if (visit.contains(a.name())) {
                problems.add(a.pos(), "zone '" + Loading.shorten(a.name()) + "' is both to visit and to avoid",
                        "remove it from one of the two lists");
                ok = false;
            }
        }
        if (m.get("patrol") != null) {
            List<Loading.Named> p = in.named(m.get("patrol"), "patrol");
            if (p == null || !ClockReading.patrol(m.get("patrol"), p, nodes.avoid, m, problems)) {
                return null;
            }
            nodes.visit = p; // checked against the map's zones like visit
            return Tasks.patrol(p.stream().map(Loading.Named::name).toList(), avoid);
        }
        if (ok && visit.isEmpty() && !finish) {
            problems.add(m.pos(), "the mission has nothing to do: no zone to visit and finish-on-dock is false",
                    "list zones under visit, or set finish-on-dock: true");
            ok = false;
        }
        return ok ? new Tasks(visit, ordered, avoid, finish) : null;
    }

    /** The names listed under {@code key}: none when it is absent, {@code null} after a problem. */
    private List<Loading.Named> namedOrNone(Node.MapNode m, String key) {
        return m.get(key) == null ? List.of() : in.named(m.get(key), key);
    }

    private static List<String> names(List<Loading.Named> named) {
        return named.stream().map(Loading.Named::name).toList();
    }

    private void taskZones(Tasks tasks, TaskNodes nodes) {
        List<String> known = map.zones().stream().map(Zone::name).toList();
        List<Loading.Named> all = new ArrayList<>(nodes.visit);
        all.addAll(nodes.avoid);
        for (Loading.Named n : all) {
            if (!known.contains(n.name())) {
                String near = Spelling.closest(n.name(), known);
                problems.add(n.pos(), "no zone named '" + Loading.shorten(n.name()) + "' in the map"
                                + (near != null ? ", did you mean '" + near + "'?" : ""),
                        known.isEmpty() ? "the map defines no zones" : "zones of the map: " + String.join(", ", known));
            }
        }
    }

    // ---------------------------------------------------------------- objective

    private boolean startsWithFoldIndicator(Node n) {
        if (!(n instanceof Node.Scalar s) || s.kind() != Node.Kind.STRING || s.text().trim().equals(">")) {
            return false;
        }
        return writtenWith(doc, n.pos(), '>');
    }

    private Objective objective(Node.MapNode m) {
        if (m == null) {
            return null;
        }
        Node kn = in.require(m, "kind", "objective");
        String kind = kn == null ? null : in.string(kn, "objective kind");
        if (kind == null) {
            return null;
        }
        if (kind.equals("reserve")) {
            in.onlyKeys(m, "objective", "kind");
            for (String k : List.of("discount", "threshold", "relation")) {
                if (m.get(k) != null) {
                    problems.add(m.entry(k).keyPos(), "'" + k + "' applies only to kind: discounted", "remove it");
                }
            }
            return new Objective.Reserve();
        }
        if (!kind.equals("discounted")) {
            String near = Spelling.closest(kind, List.of("reserve", "discounted"));
            problems.add(kn.pos(), "unknown objective kind '" + Loading.shorten(kind) + "'"
                    + (near != null ? ", did you mean '" + near + "'?" : ""), "kinds: reserve, discounted");
            return null;
        }
        in.onlyKeys(m, "objective", "kind", "discount", "threshold", "relation");
        Node dn = in.require(m, "discount", "a discounted objective");
        Node tn = in.require(m, "threshold", "a discounted objective");
        Integer d = null;
        if (dn != null) {
            d = in.integer(dn, "discount (a whole number, at least 2)", 2, MAX_DISCOUNT);
        }
        Rational threshold = null;
        thresholdPos = tn == null ? null : tn.pos();
        if (tn instanceof Node.Scalar s && s.kind() != Node.Kind.NULL && s.kind() != Node.Kind.BOOLEAN) {
            String t = s.text().trim();
            try {
                threshold = t.matches("[+-]?\\d+\\s*/\\s*[+-]?\\d+|[+-]?\\d+(\\.\\d+)?") ? Rational.parse(t) : null;
            } catch (NumberFormatException | ArithmeticException e) {
                threshold = null;
            }
            if (threshold == null) {
                problems.add(tn.pos(), "threshold '" + Loading.shorten(t) + "' is not a rational number",
                        "write p/q (e.g. \"3/4\"), a whole number (-2) or a decimal (0.75), small enough for 64-bit numbers");
            }
        } else if (tn != null && !(tn instanceof Node.Bad)) {
            problems.add(tn.pos(), "threshold must be a rational number, not " + tn.describe(), "e.g. \"3/4\"");
        }
        Relation rel = Relation.AT_LEAST;
        Node rn = m.get("relation");
        if (rn != null && startsWithFoldIndicator(rn)) {
            problems.add(rn.pos(), "relation: a bare '>' starts a folded text block in YAML",
                    "write relation: \">\" (in quotes) or relation: above");
            return null;
        }
        if (rn != null) {
            String r = in.string(rn, "relation");
            rel = r == null ? null : switch (r) {
                case ">=", "at-least" -> Relation.AT_LEAST;
                case ">", "above" -> Relation.ABOVE;
                default -> null;
            };
            if (r != null && rel == null) {
                problems.add(rn.pos(), "relation must be at-least (>=) or above (>), not '" + Loading.shorten(r) + "'",
                        "write the symbols in quotes: \">=\" or \">\"");
            }
        }
        if (d == null || threshold == null || rel == null) {
            return null;
        }
        return new Objective.Discounted(d, threshold, rel);
    }
}
