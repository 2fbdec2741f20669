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
 * A robot policy: an action for every situation (cell, battery level, budget left, closures, task progress,
 * and for a discounted mission the score memory {@link PolicyScore}) the robot can reach while
 * following it. This is what is exported, certified and replayed; it depends on the model and
 * arena only, never on solver internals.
 *
 * <p>Either every row has a score memory (a discounted policy) or none has (a reserve policy).
 * Look-up is O(1) expected (a hash map over the situations).
 */
public final class Policy {

    private final List<PolicyEntry> entries;
    private final Map<Key, Action> index;
    private final boolean scored;

    private record Key(Cell cell, int level, int budgetLeft, int progress, PolicyScore score, String closures) {
    }

    /**
     * @throws IllegalArgumentException if two rows are for the same situation, or only some rows
     *                                  carry a score memory
     */
    public Policy(List<PolicyEntry> entries) {
        List<PolicyEntry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparingInt(PolicyEntry::progress).reversed()
                .thenComparing(PolicyEntry::budgetLeft, Comparator.reverseOrder())
                .thenComparing(PolicyEntry::closures)
                .thenComparing(PolicyEntry::cell)
                .thenComparing(PolicyEntry::level, Comparator.reverseOrder())
                .thenComparing(PolicyEntry::score, Comparator.nullsFirst(Comparator.naturalOrder())));
        this.entries = List.copyOf(sorted);
        this.index = new HashMap<>(sorted.size() * 2);
        long withScore = sorted.stream().filter(PolicyEntry::scored).count();
        if (withScore != 0 && withScore != sorted.size()) {
            throw new IllegalArgumentException("either every policy row has a score memory or none has ("
                    + withScore + " of " + sorted.size() + " have one)");
        }
        this.scored = withScore > 0;
        for (PolicyEntry e : sorted) {
            if (index.put(new Key(e.cell(), e.level(), e.budgetLeft(), e.progress(), e.score(), e.closures()),
                    e.action()) != null) {
                throw new IllegalArgumentException("two policy entries for " + e.cell() + " level " + e.level()
                        + " budget " + e.budgetLeft() + (e.closures().isEmpty() ? "" : " (" + e.closures() + ")")
                        + " progress " + e.progress()
                        + (e.scored() ? " score " + e.score() : ""));
            }
        }
    }

    /** All entries in a deterministic order. */
    public List<PolicyEntry> entries() {
        return entries;
    }

    public int size() {
        return entries.size();
    }

    /** Whether the rows carry a score memory (a policy for a discounted mission). */
    public boolean scored() {
        return scored;
    }

    /** The action of a reserve policy's row. */
    public Optional<Action> lookup(Cell cell, int level, int budgetLeft, int progress) {
        return lookup(cell, level, budgetLeft, progress, null);
    }

    /** The action of a row with the given score memory ({@code null}: a reserve policy's row). */
    public Optional<Action> lookup(Cell cell, int level, int budgetLeft, int progress, PolicyScore score) {
        return lookup(cell, level, budgetLeft, progress, score, "");
    }

    /**
     * The action of a row with the given score memory and closures ({@link PolicyEntry#closures};
     * {@code ""}: nothing closed).
     */
    public Optional<Action> lookup(Cell cell, int level, int budgetLeft, int progress, PolicyScore score,
                                   String closures) {
        return Optional.ofNullable(index.get(new Key(cell, level, budgetLeft, progress, score, closures)));
    }
}
