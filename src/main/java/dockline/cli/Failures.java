package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.model.ResourceLimitException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Exit codes by the type of what went wrong, in one place: a {@link ResourceLimitException} is 3
 * (its message has the real size and the limit that applied, its advice what helps), an
 * {@link OutOfMemoryError} is 3 with the heap that applied, and anything else is an internal error:
 * exit 4, a one-line summary and the stack trace in a log file whose path is printed (with
 * {@code --debug}, on standard error instead). Bad input is reported by the loaders as
 * {@link dockline.io.InputException} before this point (exit 2).
 *
 * <p>Also the {@code --json} form of errors: {@link #jsonErrors} turns what a command wrote on
 * standard error into one JSON object (file, line, column, message, hint, exit code), so that every
 * command gives scripts the same shape.
 */
public final class Failures {

    /** Set by {@code --debug} (anywhere on the command line): stack traces go to standard error. */
    static volatile boolean debug;

    private Failures() {
    }

    /**
     * Never a silent "guaranteed": when the plan's policy failed its independent certificate, prints the
     * problem and what is withheld ({@code withheld}, e.g. {@code No policy is written.}) and returns
     * true (the command then exits with {@link ExitCodes#INTERNAL}); else prints nothing and returns false.
     */
    static boolean uncertified(dockline.plan.Plan p, String withheld, PrintWriter err) {
        java.util.Optional<String> problem = p.certification().problem();
        if (problem.isEmpty()) {
            return false;
        }
        err.println("dockline: internal error: " + problem.get());
        err.println(withheld + " Please report this with the input files.");
        return true;
    }

    /** The message and exit code for a failure of solving, certifying or replaying the mission read from {@code file}. */
    static int report(Throwable e, Object file, PrintWriter err) {
        String head = "dockline: " + (file != null ? file + ": " : "");
        if (e instanceof ResourceLimitException r) {
            err.println(head + r.getMessage() + " (hint: " + r.advice() + ")");
            return ExitCodes.RESOURCE_LIMIT;
        }
        if (e instanceof OutOfMemoryError) {
            // the estimates made before allocating (the arena's, the game's) fitted, or this would be a
            // ResourceLimitException; what ran out is something they do not cover
            err.println(head + "ran out of memory: this mission needs more than the JVM's maximum heap of "
                    + ResourceLimitException.maxHeapMb() + " MB (set by -Xmx), past what the size estimates made"
                    + " before allocating foresaw (hint: give the JVM more memory (java -Xmx...), or make the game"
                    + " smaller: a coarser energy resolution or a smaller disturbance budget K)");
            return ExitCodes.RESOURCE_LIMIT;
        }
        return internal(e, err);
    }

    /**
     * An internal error (a defect, not the input's fault): a one-line summary, and the stack trace in a
     * log file (or on {@code err} with --debug). Exit code 4.
     */
    static int internal(Throwable e, PrintWriter err) {
        String summary = e.getClass().getSimpleName() + (e.getMessage() != null ? ": " + firstLine(e.getMessage()) : "");
        err.println("dockline: internal error: " + summary);
        StringWriter trace = new StringWriter();
        e.printStackTrace(new PrintWriter(trace));
        if (debug) {
            err.print(trace);
        } else {
            Path log = writeLog(trace.toString());
            err.println(log != null ? "The details are in " + log + "; please report this with it and the input files."
                    : "Please report this with the input files (run again with --debug for the details).");
        }
        err.flush();
        return ExitCodes.INTERNAL;
    }

    /** Writes the trace to {@code dockline-internal-<time>-<pid>.log} in the temporary folder; null if it cannot. */
    static Path writeLog(String trace) {
        try {
            String stamp = LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"));
            Path dir = Path.of(System.getProperty("java.io.tmpdir"));
            Path log = dir.resolve("dockline-internal-" + stamp + "-" + ProcessHandle.current().pid() + ".log");
            Files.writeString(log, trace, StandardCharsets.UTF_8);
            return log.toAbsolutePath();
        } catch (IOException | RuntimeException ex) {
            return null;
        }
    }

    private static String firstLine(String s) {
        int nl = s.indexOf('\n');
        return nl >= 0 ? s.substring(0, nl) : s;
    }

    /** A writer that passes everything on to another; flushing or closing it flushes the other. */
    abstract static class Passing extends Writer {
        private final Writer to;

        Passing(Writer to) {
            this.to = to;
        }

        /** Sees what was passed on (after it was written). */
        abstract void seen(char[] buf, int off, int len);

        @Override
        public final void write(char[] buf, int off, int len) throws IOException {
            to.write(buf, off, len);
            seen(buf, off, len);
        }

        @Override
        public final void flush() throws IOException {
            to.flush();
        }

        @Override
        public final void close() throws IOException {
            to.flush();
        }
    }

    /** A writer that passes everything on and keeps a copy (for the --json form of errors). */
    static final class Tee extends Passing {
        final StringBuilder copy = new StringBuilder();

        Tee(Writer to) {
            super(to);
        }

        @Override
        void seen(char[] buf, int off, int len) {
            if (copy.length() < 1 << 20) {
                copy.append(buf, off, len);
            }
        }
    }

    /** Counts what is written (to tell whether a command already printed its own JSON). */
    static final class Counting extends Passing {
        long count;

        Counting(Writer to) {
            super(to);
        }

        @Override
        void seen(char[] buf, int off, int len) {
            count += len;
        }
    }

    private static final Pattern LOCATED = Pattern.compile("(.+?):(\\d+):(\\d+): (.*)");
    private static final Pattern HINTED = Pattern.compile("(.*) \\(hint: (.*)\\)");

    /**
     * The errors a command wrote on standard error, as one JSON object: {@code exitCode} and
     * {@code errors}, each with {@code file}, {@code line}, {@code column} (null when the error is not
     * about a place in a file), {@code message} and {@code hint}. A located line is
     * {@code file:line:column: message (hint: ...)} ({@link dockline.io.Problem#format}); a line
     * {@code dockline: ...} is a message of its own; other lines add to the hint of the error before.
     */
    static ObjectNode jsonErrors(String stderr, int exitCode) {
        ObjectNode root = Json.object();
        root.put("exitCode", exitCode);
        ArrayNode errors = root.putArray("errors");
        List<ObjectNode> list = new ArrayList<>();
        for (String raw : stderr.split("\\R")) {
            String line = raw.strip();
            if (line.isEmpty()) {
                continue;
            }
            Matcher m = LOCATED.matcher(line);
            ObjectNode e;
            if (!line.startsWith("dockline:") && m.matches()) {
                e = Json.object();
                e.put("file", m.group(1));
                e.put("line", Integer.parseInt(m.group(2)));
                e.put("column", Integer.parseInt(m.group(3)));
                line = m.group(4);
            } else if (line.startsWith("dockline:") || list.isEmpty()) {
                e = Json.object();
                e.putNull("file");
                e.putNull("line");
                e.putNull("column");
                line = line.startsWith("dockline:") ? line.substring("dockline:".length()).strip() : line;
            } else {
                ObjectNode last = list.get(list.size() - 1);
                String h = last.path("hint").isTextual() ? last.get("hint").asText() + " " : "";
                last.put("hint", h + line);
                continue;
            }
            Matcher h = HINTED.matcher(line);
            if (h.matches()) {
                e.put("message", h.group(1));
                e.put("hint", h.group(2));
            } else {
                e.put("message", line);
                e.putNull("hint");
            }
            e.put("exitCode", exitCode);
            list.add(e);
        }
        list.forEach(errors::add);
        return root;
    }
}
