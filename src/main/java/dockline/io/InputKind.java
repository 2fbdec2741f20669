package dockline.io;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * Whether a file is a building map or a mission, told apart by its top-level keys: a mission has
 * {@code map:} or {@code robot:}, a map has {@code plan:} or {@code legend:}.
 */
public enum InputKind {
    MAP,
    MISSION;

    /**
     * Reads the file's top-level keys.
     *
     * @throws InputException if the file cannot be read or parsed, or has neither kind of keys
     */
    public static InputKind of(Path file) throws InputException {
        Problems problems = new Problems(file);
        YamlReader.Document doc = YamlReader.read(file, problems);
        if (doc == null || doc.root() == null) {
            problems.throwIfAny();
            throw new InputException(new Problem(file, 1, 1, "cannot read the file", "check the path and the file's permissions"));
        }
        if (doc.root() instanceof Node.MapNode m) {
            List<String> keys = m.entries().stream().map(Node.Entry::key).toList();
            if (keys.contains("map") || keys.contains("robot")) {
                return MISSION;
            }
            if (keys.contains("plan") || keys.contains("legend")) {
                return MAP;
            }
            List<String> all = new java.util.ArrayList<>(Arrays.asList(MapReading.KEYS));
            all.addAll(Arrays.asList(MissionReading.KEYS));
            for (String k : keys) {
                String near = Spelling.closest(k, all);
                if (near != null && !near.equals(k)) {
                    problems.add(m.entries().get(keys.indexOf(k)).keyPos(), "unknown key '" + Loading.shorten(k)
                            + "', did you mean '" + near + "'?", "correct the spelling of the key");
                }
            }
        }
        problems.add(doc.root().pos(), "cannot tell whether this is a map or a mission",
                "a map has 'plan:' and 'legend:'; a mission has 'map:' and 'robot:' (see maps/README.md, missions/README.md)");
        problems.throwIfAny();
        throw new IllegalStateException("unreachable");
    }
}
