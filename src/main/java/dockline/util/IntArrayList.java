package dockline.util;

import java.util.Arrays;

/**
 * A growable array of ints (no boxing). Appending is amortised O(1): the array grows by half its
 * length when full. Growth past the largest array the JVM allows is an {@link ArithmeticException}
 * (which the commands report as "too large", exit 3), never a negative array size. Not thread-safe.
 */
public final class IntArrayList {

    /** The largest array length the common JVMs allocate. */
    static final int MAX_LENGTH = Integer.MAX_VALUE - 8;

    private int[] a;
    private int n;

    /** An empty list with room for {@code capacity} values before it first grows. */
    public IntArrayList(int capacity) {
        a = new int[Math.max(4, capacity)];
    }

    /** An empty list with a small initial room. */
    public IntArrayList() {
        this(64);
    }

    /** Appends {@code v}. */
    public void add(int v) {
        if (n == a.length) {
            grow();
        }
        a[n++] = v;
    }

    private void grow() {
        if (a.length >= MAX_LENGTH) {
            throw new ArithmeticException("more than " + MAX_LENGTH + " values in one list");
        }
        long cap = Math.min(MAX_LENGTH, (long) a.length + (a.length >> 1) + 4);
        a = Arrays.copyOf(a, (int) cap);
    }

    /** The i-th value, {@code 0 <= i < size()} (not checked beyond the array's bounds: this is a hot path). */
    public int get(int i) {
        return a[i];
    }

    /** Replaces the i-th value, {@code 0 <= i < size()}. */
    public void set(int i, int v) {
        a[i] = v;
    }

    /** The last value; the list must not be empty. */
    public int last() {
        return get(n - 1);
    }

    public int size() {
        return n;
    }

    /** A copy of the values, exactly {@link #size()} long. */
    public int[] toArray() {
        return Arrays.copyOf(a, n);
    }
}
