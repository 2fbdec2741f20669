package dockline.report;

import dockline.io.Problem;

/**
 * One error of a mission that could not be checked, located where the file is known.
 *
 * @param file    the file, or null when the error is not in a file
 * @param line    1-based line, or null
 * @param column  1-based column, or null
 * @param message what is wrong
 * @param hint    how to fix it, or null
 */
public record LocatedError(String file, Integer line, Integer column, String message, String hint) {

    /** A loader's problem. */
    public static LocatedError of(Problem p) {
        return new LocatedError(p.file().toString(), p.line(), p.column(), p.message(), p.hint());
    }

    /** An error that is not located in a file. */
    public static LocatedError plain(String message, String hint) {
        return new LocatedError(null, null, null, message, hint);
    }

    /** {@code file:line:column: message (hint: ...)}, as the command line prints it. */
    public String format() {
        String head = file == null ? message : file + ":" + line + ":" + column + ": " + message;
        return hint == null ? head : head + " (hint: " + hint + ")";
    }
}
