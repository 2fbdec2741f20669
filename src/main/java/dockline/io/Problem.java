package dockline.io;

import java.nio.file.Path;
import java.util.Objects;

/**
 * One thing wrong with an input file, at a position a person (or an editor) can jump to.
 *
 * @param file    the file as the user named it (relative paths stay relative)
 * @param line    1-based line
 * @param column  1-based column, counted in characters (Unicode code points)
 * @param message what is wrong, in plain words
 * @param hint    how to fix it, or {@code null}
 */
public record Problem(Path file, int line, int column, String message, String hint) {

    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        if (line < 1 || column < 1) {
            throw new IllegalArgumentException("line and column are 1-based");
        }
        if (hint != null && hint.isBlank()) {
            hint = null;
        }
    }

    public Problem(Path file, int line, int column, String message) {
        this(file, line, column, message, null);
    }

    /** {@code file:line:column: message}, followed by {@code  (hint: ...)} when there is a hint; one line. */
    public String format() {
        String head = file + ":" + line + ":" + column + ": " + message;
        return hint == null ? head : head + " (hint: " + hint + ")";
    }

    @Override
    public String toString() {
        return format();
    }
}
