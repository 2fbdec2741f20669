package dockline.io;

import dockline.model.Mission;
import java.nio.file.Path;

/**
 * Loads and validates a mission file ({@code missions/*.yaml}; documented key by key in
 * missions/README.md) together with the map it names. The map path is relative to the mission
 * file; problems in the map are reported with the map file's name. Every problem of both files is
 * reported at once; the mission is returned only when there is none.
 */
public final class MissionLoader {

    private MissionLoader() {
    }

    /**
     * Reads and checks a mission file and its map.
     *
     * @throws InputException with every problem found, if there is any
     */
    public static Mission load(Path file) throws InputException {
        Problems problems = new Problems(file);
        YamlReader.Document doc = YamlReader.read(file, problems);
        Mission m = doc == null || doc.root() == null ? null : problems.guard(() -> new MissionReading(doc, problems).read());
        problems.throwIfAny();
        return m;
    }

    /**
     * Reads and checks mission content given as bytes; {@code file} names it in messages and is the
     * place the map path is resolved from.
     */
    public static Mission load(Path file, byte[] content) throws InputException {
        return YamlReader.readContent(file, content, (doc, problems) -> new MissionReading(doc, problems).read());
    }
}
