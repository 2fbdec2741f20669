package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Mission;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/** Reads a mission file (or a map file on its own) for the window. Never writes anything. */
@FunctionalInterface
public interface MissionSource {

    /**
     * What was opened: a mission (with its map), or a map alone ({@code mission} is {@code null}).
     */
    record Opened(Path file, Mission mission, BuildingMap map) {
        public Opened {
            Objects.requireNonNull(file, "file");
            Objects.requireNonNull(map, "map");
        }
    }

    /** The file could not be read; {@code messages} are {@code file:line:column: message} lines. */
    final class OpenException extends Exception {
        private final List<String> messages;

        public OpenException(List<String> messages) {
            super(String.join("\n", messages));
            this.messages = List.copyOf(messages);
        }

        public List<String> messages() {
            return messages;
        }
    }

    Opened open(Path file) throws OpenException;
}
