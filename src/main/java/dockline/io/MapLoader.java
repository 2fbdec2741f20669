package dockline.io;

import dockline.model.BuildingMap;
import java.nio.file.Path;

/**
 * Loads and validates a building map file ({@code maps/*.yaml}; the format is documented key by
 * key in maps/README.md). Every problem of the file is reported at once, each at its line and
 * column; the map is returned only when there is none.
 *
 * <p>Linear in the file size; the plan is at most {@link #MAX_SIDE} x {@link #MAX_SIDE} cells.
 */
public final class MapLoader {

    /** Most rows, and most cells in a row, of a plan. */
    public static final int MAX_SIDE = 2048;
    /** Largest disturbance budget a map may give. */
    public static final int MAX_BUDGET = 1000;

    private MapLoader() {
    }

    /**
     * Reads and checks a map file.
     *
     * @throws InputException with every problem found, if there is any
     */
    public static BuildingMap load(Path file) throws InputException {
        Problems problems = new Problems(file);
        BuildingMap map = read(file, problems);
        problems.throwIfAny();
        return map;
    }

    /** Reads and checks map content given as bytes; {@code file} names it in messages. */
    public static BuildingMap load(Path file, byte[] content) throws InputException {
        return YamlReader.readContent(file, content, (doc, problems) -> new MapReading(doc, problems).read());
    }

    /**
     * Reads the file; problems go to {@code problems}; {@code null} if it has any. A file that is not
     * a dockline map at all (none of its top-level keys is a map key: a mission may name any path)
     * gets one problem that quotes none of its content.
     */
    static BuildingMap read(Path file, Problems problems) {
        return read(file, problems, false);
    }

    /**
     * As {@link #read(Path, Problems)}; {@code namedByMission}: the path comes from a mission's
     * {@code map:}, so a file that is not a map at all is refused in one line that quotes none of it.
     */
    static BuildingMap read(Path file, Problems problems, boolean namedByMission) {
        Problems own = new Problems(file);
        YamlReader.Document doc = YamlReader.read(file, own);
        if (namedByMission && doc != null && !looksLikeMap(doc)) {
            problems.add(Pos.START, NOT_A_MAP, "a map has 'cell-size:', 'legend:' and 'plan:' (see maps/README.md);"
                    + " check the path in the mission's 'map:'");
            return null;
        }
        problems.absorb(own);
        if (doc == null || doc.root() == null) {
            return null;
        }
        return problems.guard(() -> new MapReading(doc, problems).read());
    }

    /** How a file that is not a map is refused (tests look for it). */
    static final String NOT_A_MAP = "this is not a dockline map: none of its top-level keys is a map key";

    /**
     * Whether a parsed file is meant as a map: its root mapping has a map key, or, when it could not
     * be parsed, a line starts with one (so that a map with a syntax error still gets its own messages).
     */
    static boolean looksLikeMap(YamlReader.Document doc) {
        java.util.List<String> keys = java.util.Arrays.asList(MapReading.KEYS);
        if (doc.root() instanceof Node.MapNode m) {
            return m.entries().stream().anyMatch(e -> keys.contains(e.key()));
        }
        if (doc.root() != null) {
            return false; // a single value or a list
        }
        boolean content = false;
        for (int l = 1; doc.source() != null && l <= doc.source().lineCount(); l++) {
            String line = doc.source().line(l).strip();
            content |= !line.isEmpty() && !line.startsWith("#");
            int colon = line.indexOf(':');
            if (colon > 0 && keys.contains(line.substring(0, colon).strip().replace("\"", ""))) {
                return true;
            }
        }
        return !content; // empty or only comments: "the file is empty" says it without quoting
    }
}
