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

    void add(Pos pos, String message) {
        add(pos, message, null);
    }

    void add(Pos pos, String message, String hint) {
        attempts++;
        if (explained.contains(key(pos.line(), pos.column()))) {
            return;
        }
        add(new Problem(file, pos.line(), pos.column(), message, hint));
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
     * Runs a checking step; a defect in it (any runtime exception) becomes a problem at 1:1 instead
     * of a stack trace, so that bad input can never crash a run.
     */
    <T> T guard(java.util.function.Supplier<T> step) {
        try {
            return step.get();
        } catch (RuntimeException e) {
            add(Pos.START, INTERNAL + " (" + e + ")", "please report this with the file");
            return null;
        }
    }

    /** How a defect of the checker itself is reported (tests look for it). */
    static final String INTERNAL = "internal error while checking this file";

    private static long key(int line, int col) {
        return ((long) line << 32) | (col & 0xffffffffL);
    }
}
