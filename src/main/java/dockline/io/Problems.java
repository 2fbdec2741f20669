package dockline.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Collects the problems of one load (a file, plus the map a mission names). Keeps at most
 * {@link #LIMIT} problems so that a badly broken file gives a readable report, not a flood.
 */
final class Problems {

    /** Most problems kept per load; one more line says how many were left out. */
    static final int LIMIT = 200;

    private final Path file;
    private final List<Problem> list = new ArrayList<>();
    /** Positions already explained by a lower-level problem (a tab, a bad byte): later problems there are noise. */
    private final Set<Long> explained = new HashSet<>();
    private int dropped;
    private int attempts;


    Problems(Path file) {
        this.file = file;
    }

    Path file() {
        return file;
    }

    /**
     * A problem of a policy file (the only reader that uses this form): such files are written by
     * {@code dockline export}, so the hint is the same for all of them.
     */
    void addPolicy(Pos pos, String message) {
        add(pos, message, "policy files are written by 'dockline export'; export it again (missions/POLICY-FORMAT.md)");
    }

    /**
     * Records a problem. Every problem has a hint (ProblemHintsTest scans the loaders for calls
     * without one); the message and hint are made safe to print ({@link #safe}).
     */
    void add(Pos pos, String message, String hint) {
        attempts++;
        if (explained.contains(key(pos.line(), pos.column()))) {
            return;
        }
        add(new Problem(file, pos.line(), pos.column(), safe(message), safe(hint == null ? GENERAL_HINT : hint)));
    }

    /** Only for a hint computed as null at run time (the scan in ProblemHintsTest rules out written ones). */
    static final String GENERAL_HINT = "see maps/README.md or missions/README.md for what this key takes";

    /** Longest message or hint kept whole; the quoting sites keep file content to {@link Loading#QUOTED} characters. */
    static final int LONGEST = 600;

    /**
     * A message as it may be printed: characters a terminal would hide or act on (controls,
     * bidirectional overrides) escaped, and at most {@link #LONGEST} characters, so that no path
     * through a library's wording can put a long stretch of a file, or a reordering of the line,
     * on the user's screen.
     */
    static String safe(String s) {
        boolean clean = s.length() <= LONGEST;
        for (int i = 0; clean && i < s.length(); i++) {
            clean = !Loading.hidden(s.charAt(i));
        }
        if (clean) {
            return s;
        }
        return Loading.escaped(s, LONGEST, true);
    }

    /** A "N more ..." line: kept even though its position is explained by the problems it sums up. */
    void addSummary(Pos pos, String message, String hint) {
        attempts++;
        add(new Problem(file, pos.line(), pos.column(), safe(message), safe(hint)));
    }

    /** A problem that explains its position: later problems at the very same position are dropped. */
    void addExplaining(Pos pos, String message, String hint) {
        add(pos, message, hint);
        explained.add(key(pos.line(), pos.column()));
    }

    /** Marks a position as explained without a new problem. */
    void explain(Pos pos) {
        explained.add(key(pos.line(), pos.column()));
    }

    void add(Problem p) {
        attempts++;
        if (list.size() >= LIMIT) {
            dropped++;
            return;
        }
        list.add(p);
    }

    /** Takes over another load's problems, counts and explained positions (for a file read on its own first). */
    void absorb(Problems other) {
        int taken = Math.min(other.list.size(), Math.max(0, LIMIT - list.size()));
        list.addAll(other.list.subList(0, taken));
        dropped += other.dropped + other.list.size() - taken;
        attempts += other.attempts;
        explained.addAll(other.explained);
    }

    /** Counts a problem that is not worded because the report is full ({@link #LIMIT}). */
    void dropOne() {
        attempts++;
        dropped++;
    }

    void addAll(List<Problem> ps) {
        for (Problem p : ps) {
            add(p);
        }
    }

    boolean isExplained(Pos pos) {
        return explained.contains(key(pos.line(), pos.column()));
    }

    boolean any() {
        return !list.isEmpty();
    }

    int count() {
        return list.size();
    }

    /**
     * How many problems were raised, counting those suppressed or dropped: compare before and after a
     * step to see whether it found anything.
     */
    int raised() {
        return attempts;
    }

    /** Throws if anything was found: problems grouped by file (this file first), then by position. */
    void throwIfAny() throws InputException {
        if (list.isEmpty()) {
            return;
        }
        Map<Path, Integer> fileOrder = new LinkedHashMap<>();
        fileOrder.put(file, 0); // the file asked for first, then the files it names
        for (Problem p : list) {
            fileOrder.putIfAbsent(p.file(), fileOrder.size());
        }
        List<Problem> sorted = new ArrayList<>(list);
        sorted.sort(Comparator.<Problem>comparingInt(p -> fileOrder.get(p.file()))
                .thenComparingInt(Problem::line).thenComparingInt(Problem::column));
        if (dropped > 0) {
            Problem last = sorted.get(sorted.size() - 1);
            sorted.add(new Problem(last.file(), last.line(), last.column(),
                    dropped + " more problem" + (dropped == 1 ? "" : "s") + " not shown",
                    "fix the ones above first"));
        }
        throw new InputException(sorted);
    }

    /**
     * Runs a checking step. A defect in it (any runtime exception) is not the user's mistake, so it
     * is not disguised as a problem of the file: it is rethrown as an internal error naming the
     * file (exit code 4, with the stack trace in a log file).
     */
    <T> T guard(java.util.function.Supplier<T> step) {
        try {
            return step.get();
        } catch (RuntimeException e) {
            throw new IllegalStateException(INTERNAL + " " + file, e);
        }
    }

    /** How a defect of the checker itself is reported (tests look for it). */
    static final String INTERNAL = "internal error while checking this file";

    private static long key(int line, int col) {
        return ((long) line << 32) | (col & 0xffffffffL);
    }
}
