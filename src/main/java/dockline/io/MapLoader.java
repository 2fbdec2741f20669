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
        Problems problems = new Problems(file);
        YamlReader.Document doc = YamlReader.parse(file, content, problems);
        BuildingMap map = doc.root() == null ? null : problems.guard(() -> new MapReading(doc, problems).read());
        problems.throwIfAny();
        return map;
    }

    /** Reads the file; problems go to {@code problems}; {@code null} if it has any. */
    static BuildingMap read(Path file, Problems problems) {
        YamlReader.Document doc = YamlReader.read(file, problems);
        if (doc == null || doc.root() == null) {
            return null;
        }
        return problems.guard(() -> new MapReading(doc, problems).read());
    }
}
