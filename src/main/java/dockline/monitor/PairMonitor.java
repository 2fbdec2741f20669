package dockline.monitor;

import dockline.util.LongIntMap;
import java.util.Arrays;

/**
 * Two monitors read the same weights side by side: the synchronous product of two deterministic
 * automata (the textbook intersection construction), so a run is accepted when both accept. Used
 * to keep the reserve floor while a discounted score is watched: {@code new PairMonitor(reserve,
 * comparator)}.
 *
 * <p>A pair state is numbered densely when first reached (an open-addressing map from the packed
 * pair to its number; no boxing); {@link #REJECT} as soon as either side rejects. Each step costs
 * one step of each side plus one O(1) expected lookup. Mutable as states are discovered; not
 * thread-safe.
 */
public final class PairMonitor implements Monitor {

    private final Monitor first;
    private final Monitor second;
    private final LongIntMap index = new LongIntMap(64);
    private int[] firstState = new int[64];
    private int[] secondState = new int[64];
    private int count;
    private final int initial;

    public PairMonitor(Monitor first, Monitor second) {
        if (first == null || second == null) {
            throw new IllegalArgumentException("both monitors are required");
        }
        this.first = first;
        this.second = second;
        int a = first.initialState();
        int b = second.initialState();
        // a side that starts in its losing sink (e.g. a battery below the floor) rejects at once
        this.initial = a == REJECT || b == REJECT ? REJECT : intern(a, b);
    }

    public Monitor first() {
        return first;
    }

    public Monitor second() {
        return second;
    }

    @Override
    public int initialState() {
        return initial;
    }

    @Override
    public int step(int s, int w) {
        if (s == REJECT) {
            return REJECT;
        }
        int a = first.step(firstState[s], w);
        if (a == REJECT) {
            return REJECT;
        }
        int b = second.step(secondState[s], w);
        if (b == REJECT) {
            return REJECT;
        }
        return intern(a, b);
    }

    private int intern(int a, int b) {
        long key = ((long) a << 32) | (b & 0xffffffffL);
        int s = index.get(key);
        if (s != LongIntMap.ABSENT) {
            return s;
        }
        if (count == firstState.length) {
            firstState = Arrays.copyOf(firstState, count * 2);
            secondState = Arrays.copyOf(secondState, count * 2);
        }
        s = count++;
        firstState[s] = a;
        secondState[s] = b;
        index.put(key, s);
        return s;
    }

    /** The first monitor's state within pair state {@code s}. */
    public int firstOf(int s) {
        return firstState[s];
    }

    /** The second monitor's state within pair state {@code s}. */
    public int secondOf(int s) {
        return secondState[s];
    }

    /** Pair states discovered so far. */
    public int stateCount() {
        return count;
    }

    @Override
    public boolean acceptsAtCompletion(int s) {
        return s != REJECT && first.acceptsAtCompletion(firstState[s]) && second.acceptsAtCompletion(secondState[s]);
    }

    @Override
    public long stateBound() {
        long a = first.stateBound();
        long b = second.stateBound();
        return Math.multiplyHigh(a, b) != 0 || a * b < 0 ? Long.MAX_VALUE : a * b;
    }

    @Override
    public String describe(int s) {
        if (s == REJECT) {
            return "rejected";
        }
        return first.describe(firstState[s]) + "; " + second.describe(secondState[s]);
    }
}
