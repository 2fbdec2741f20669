package dockline.solve;

import dockline.arena.Action;
import dockline.model.Cell;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A robot policy: an action for every situation (cell, battery level, budget left, task progress)
 * the robot can reach while following it. This is what is exported, certified and replayed; it
 * depends on the model and arena only, never on solver internals.
 */
public final class Policy {

    private final List<PolicyEntry> entries;
    private final Map<Key, Action> index;

    private record Key(Cell cell, int level, int budgetLeft, int progress) {
    }

    public Policy(List<PolicyEntry> entries) {
        List<PolicyEntry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparingInt(PolicyEntry::progress).reversed()
                .thenComparing(PolicyEntry::budgetLeft, Comparator.reverseOrder())
                .thenComparing(PolicyEntry::cell)
                .thenComparing(PolicyEntry::level, Comparator.reverseOrder()));
        this.entries = List.copyOf(sorted);
        this.index = new HashMap<>(sorted.size() * 2);
        for (PolicyEntry e : sorted) {
            if (index.put(new Key(e.cell(), e.level(), e.budgetLeft(), e.progress()), e.action()) != null) {
                throw new IllegalArgumentException("two policy entries for " + e.cell() + " level " + e.level()
                        + " budget " + e.budgetLeft() + " progress " + e.progress());
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

    public Optional<Action> lookup(Cell cell, int level, int budgetLeft, int progress) {
        return Optional.ofNullable(index.get(new Key(cell, level, budgetLeft, progress)));
    }
}
