package dockline.cli;

import dockline.util.Progress;
import dockline.util.ProgressListener;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.BooleanSupplier;
import java.util.function.LongSupplier;

/**
 * The progress of a command's long work on standard error, as one line rewritten in place
 * ({@code \r}): the phase, its per cent and the time since the command began, e.g.
 * {@code dockline: solving the game at floor 83 units  42 %  12.5 s}. At most one update every
 * {@link #INTERVAL_NANOS} (4 lines a second), and the line is erased before anything else is
 * written to standard output or standard error and when the work ends. Only when standard error is a terminal, never
 * with {@code --json} (whose errors are collected from standard error) and never with {@code --quiet}.
 */
final class ProgressLine implements ProgressListener {

    /** Least time between two updates: 250 ms. */
    static final long INTERVAL_NANOS = 250_000_000L;

    /** Whether standard error is a terminal; tests replace it. */
    static BooleanSupplier terminal = ProgressLine::stderrIsTerminal;

    private final Writer err;
    private final LongSupplier clock;
    private final long began;
    private long lastPrint = Long.MIN_VALUE;
    private int shown;

    ProgressLine(Writer err, LongSupplier clock) {
        this.err = err;
        this.clock = clock;
        this.began = clock.getAsLong();
    }

    /** Whether progress is shown: standard error is a terminal, and neither --json nor --quiet was given. */
    static boolean wanted(boolean json, boolean quiet) {
        return !json && !quiet && terminal.getAsBoolean();
    }

    /**
     * Standard error is a terminal: on Linux, file descriptor 2 is a terminal device; elsewhere the JVM
     * has a console (standard input and output are terminals), the nearest test the JDK offers.
     */
    static boolean stderrIsTerminal() {
        Path fd2 = Path.of("/proc/self/fd/2");
        try {
            if (Files.isSymbolicLink(fd2)) {
                String target = Files.readSymbolicLink(fd2).toString();
                return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty") || target.equals("/dev/console");
            }
        } catch (IOException | SecurityException | UnsupportedOperationException e) {
            // fall through to the console test
        }
        return System.console() != null;
    }

    /** A frame for a command's work: while it is open the core's progress goes to {@code err}. */
    static final class Frame implements AutoCloseable {
        private final ProgressLine line;
        private final Progress.Scope scope;
        private final PrintWriter out;
        private final PrintWriter err;

        private Frame(ProgressLine line, PrintWriter out, PrintWriter err) {
            this.line = line;
            this.scope = line == null ? null : Progress.listen(line);
            this.out = out;
            this.err = err;
        }

        /**
         * The writer the command prints its results to: it erases the progress line first (standard
         * output and standard error are usually the same terminal).
         */
        PrintWriter out() {
            return out;
        }

        /** The writer the command prints its errors to: it erases the progress line first. */
        PrintWriter err() {
            return err;
        }

        @Override
        public void close() {
            if (scope != null) {
                scope.close();
                line.erase();
            }
        }
    }

    /** Opens the frame: a progress line on {@code err} when {@link #wanted}, else nothing. */
    static Frame open(PrintWriter out, PrintWriter err, boolean json, boolean quiet) {
        if (!wanted(json, quiet)) {
            return new Frame(null, out, err);
        }
        ProgressLine line = new ProgressLine(err, System::nanoTime);
        return new Frame(line, new PrintWriter(line.guard(out), true), new PrintWriter(line.guard(err), true));
    }

    /** The stages of a plan are not shown: the phases inside them say more about how far the work is. */
    @Override
    public void stage(int percent, String stage) {
    }

    @Override
    public void phase(String phase, int percent) {
        long now = clock.getAsLong();
        if (lastPrint != Long.MIN_VALUE && now - lastPrint < INTERVAL_NANOS) {
            return;
        }
        lastPrint = now;
        String text = String.format(Locale.ROOT, "dockline: %s  %d %%  %.1f s", phase, percent, (now - began) / 1e9);
        StringBuilder sb = new StringBuilder("\r").append(text);
        for (int i = text.length(); i < shown; i++) {
            sb.append(' ');
        }
        shown = text.length();
        write(sb.toString());
    }

    /** Erases the progress line if one is shown. */
    void erase() {
        if (shown > 0) {
            int n = shown;
            shown = 0;
            write("\r" + " ".repeat(n) + "\r");
        }
    }

    private void write(String s) {
        try {
            err.write(s);
            err.flush();
        } catch (IOException e) {
            // standard error is gone: nothing to show progress on
        }
    }

    /** A writer onto {@code out} that erases the progress line before each write. */
    Writer guard(Writer out) {
        return new Writer() {
            @Override
            public void write(char[] buf, int off, int len) throws IOException {
                erase();
                out.write(buf, off, len);
            }

            @Override
            public void flush() throws IOException {
                out.flush();
            }

            @Override
            public void close() throws IOException {
                out.flush();
            }
        };
    }
}
