package dockline.raster;

import java.nio.file.Path;
import java.util.Objects;

/**
 * One thing wrong with an image file or with an import option, for a person to read.
 *
 * @param file    the file as the user named it
 * @param line    1-based line in a text (plain Netpbm) file, or 0 when no position makes sense
 *                (binary data, a whole-file fact)
 * @param column  1-based column (in bytes) on that line, or 0 with {@code line} 0
 * @param message what is wrong, in plain words
 * @param hint    how to fix it, or {@code null}
 */
public record RasterProblem(Path file, int line, int column, String message, String hint) {

    public RasterProblem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        if (line < 0 || column < 0 || (line == 0) != (column == 0)) {
            throw new IllegalArgumentException("line and column are both 0 or both 1-based");
        }
        if (hint != null && hint.isBlank()) {
            hint = null;
        }
    }

    /** A problem of the whole file (no position). */
    public static RasterProblem of(Path file, String message, String hint) {
        return new RasterProblem(file, 0, 0, message, hint);
    }

    /** {@code file:line:column: message (hint: ...)}, or {@code file: message (hint: ...)} without a position. */
    public String format() {
        String head = line == 0 ? file + ": " + message : file + ":" + line + ":" + column + ": " + message;
        return hint == null ? head : head + " (hint: " + hint + ")";
    }

    @Override
    public String toString() {
        return format();
    }
}
