package dockline.util;

import java.util.Arrays;

/**
 * The first-in first-out queue of a breadth-first search over the ints {@code 0..n-1}, with the
 * visited set: each int enters at most once (at its first {@link #visit}), so the queue's order is the
 * order of discovery and {@link #visited()} counts the ints reached. One boolean (a byte) per int and
 * one int array that starts small and doubles (never past n), so a search that reaches few ints costs
 * little beyond the visited set. O(1) per operation, amortised; no boxing. Not thread-safe.
 *
 * <p>Breadth-first search as in Cormen, Leiserson, Rivest and Stein, "Introduction to Algorithms",
 * section 22.2 (common practice).
 */
public final class VisitQueue {

    private final boolean[] seen;
    private int[] queue;
    private int head;
    private int tail;

    /** An empty queue over the ints {@code 0..n-1}, none visited. */
    public VisitQueue(int n) {
        this(n, 1024);
    }

    /**
     * The same with room for {@code capacity} ints before the queue first grows (n for a search that is
     * known to reach most of them, such as a benchmark's baseline, so that it never copies).
     */
    public VisitQueue(int n, int capacity) {
        this.seen = new boolean[n];
        this.queue = new int[Math.max(1, Math.min(n, capacity))];
    }

    /** Marks {@code x} visited and queues it, unless it was visited before; whether it was new. */
    public boolean visit(int x) {
        if (seen[x]) {
            return false;
        }
        seen[x] = true;
        if (tail == queue.length) {
            queue = Arrays.copyOf(queue, (int) Math.min(seen.length, 2L * tail));
        }
        queue[tail++] = x;
        return true;
    }

    /** Marks {@code x} visited without queueing it (a cell the search must not enter or expand). */
    public void mark(int x) {
        seen[x] = true;
    }

    /** Whether {@code x} was visited or marked. */
    public boolean seen(int x) {
        return seen[x];
    }

    /** Whether a queued int is still to be taken. */
    public boolean hasNext() {
        return head < tail;
    }

    /** Takes the oldest queued int. */
    public int next() {
        return queue[head++];
    }

    /** Ints queued so far (taken or not). */
    public int visited() {
        return tail;
    }
}
