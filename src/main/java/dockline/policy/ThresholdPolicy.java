package dockline.policy;

import dockline.arena.Action;
import dockline.model.Cell;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A robot policy stated per game position as level thresholds: for a position (cell, budget left,
 * closures, task progress) a list "at or above X units do this, below it, at or above Y do that, ...",
 * thresholds falling. A controller can look up any gauge reading, not only the levels one run meets:
 * at level l it takes the first step whose threshold is at most l; below the last threshold the
 * position has no action (the policy does not cover that reading). This is what {@code export} writes
 * for the charging route and what the certificate checker re-checks; it depends on the model and arena
 * records only, never on solver internals.
 *
 * <p>Look-up is O(1) expected to find the position (a hash map) plus O(steps) to find the threshold.
 */
public final class ThresholdPolicy {

    /**
     * One threshold of a position: at or above {@code atLeastUnits} (and below the previous step's
     * threshold) do {@code action}.
     */
    public record Step(int atLeastUnits, Action action) {
        public Step {
            if (atLeastUnits < 0) {
                throw new IllegalArgumentException("a threshold must not be negative: " + atLeastUnits);
            }
            if (action == null) {
                throw new IllegalArgumentException("a threshold needs an action");
            }
        }
    }

    /**
     * The thresholds of one game position.
     *
     * @param cell       where the robot is
     * @param budgetLeft disturbances the building may still throw
     * @param progress   task progress bit mask
     * @param closures   what the robot has met that lasts ({@link PolicyEntry#closures}); {@code ""} when nothing
     * @param steps      thresholds strictly falling, at least one
     */
    public record Row(Cell cell, int budgetLeft, int progress, String closures, List<Step> steps) {
        public Row {
            closures = closures == null ? "" : closures;
            steps = List.copyOf(steps);
            if (steps.isEmpty()) {
                throw new IllegalArgumentException("a threshold row needs at least one step, at " + cell);
            }
            for (int i = 1; i < steps.size(); i++) {
                if (steps.get(i).atLeastUnits() >= steps.get(i - 1).atLeastUnits()) {
                    throw new IllegalArgumentException("thresholds must fall strictly within a row, at " + cell + ": "
                            + steps.get(i - 1).atLeastUnits() + " then " + steps.get(i).atLeastUnits());
                }
            }
        }

        /** The action at this level: the first step at or below it; empty below the last threshold. */
        public Optional<Action> at(int level) {
            for (Step s : steps) {
                if (s.atLeastUnits() <= level) {
                    return Optional.of(s.action());
                }
            }
            return Optional.empty();
        }
    }

    private record Key(Cell cell, int budgetLeft, int progress, String closures) {
    }

    private final List<Row> rows;
    private final Map<Key, Row> index;

    /**
     * @throws IllegalArgumentException if two rows are for the same position
     */
    public ThresholdPolicy(List<Row> rows) {
        List<Row> sorted = new ArrayList<>(rows);
        sorted.sort(Comparator.comparingInt(Row::progress).reversed()
                .thenComparing(Row::budgetLeft, Comparator.reverseOrder())
                .thenComparing(Row::closures)
                .thenComparing(Row::cell));
        this.rows = List.copyOf(sorted);
        this.index = new HashMap<>(sorted.size() * 2);
        for (Row r : sorted) {
            if (index.put(new Key(r.cell(), r.budgetLeft(), r.progress(), r.closures()), r) != null) {
                throw new IllegalArgumentException("two threshold rows for " + r.cell() + " budget " + r.budgetLeft()
                        + (r.closures().isEmpty() ? "" : " (" + r.closures() + ")") + " progress " + r.progress());
            }
        }
    }

    /** The rows (one per position) in a deterministic order. */
    public List<Row> rows() {
        return rows;
    }

    /** Positions listed. */
    public int size() {
        return rows.size();
    }

    /** Thresholds over all positions. */
    public int stepCount() {
        int n = 0;
        for (Row r : rows) {
            n += r.steps().size();
        }
        return n;
    }

    /** The row of a position, if listed. */
    public Optional<Row> row(Cell cell, int budgetLeft, int progress, String closures) {
        return Optional.ofNullable(index.get(new Key(cell, budgetLeft, progress, closures == null ? "" : closures)));
    }

    /** The action at a situation: the position's first step at or below the level. */
    public Optional<Action> lookup(Cell cell, int level, int budgetLeft, int progress, String closures) {
        return row(cell, budgetLeft, progress, closures).flatMap(r -> r.at(level));
    }
}
