package dockline.util;

import java.util.Arrays;

/**
 * An open-addressing hash map from long keys to non-negative int values, with linear probing, on
 * primitive arrays (no boxing, no per-entry objects). Expected O(1) per operation: the table is
 * kept at most half full. Every long is a valid key; a slot is empty when its value is
 * {@link #ABSENT}. Not thread-safe.
 *
 * <p>Used where states are numbered on the fly: comparator states, product vertices, closed-loop
 * situations of the certificate checker, the nodes of the minimum-credit fixpoint.
 */
public final class LongIntMap {

    /** What {@link #get} returns for a key that is not in the map. */
    public static final int ABSENT = -1;

    private long[] keys;
    private int[] values;
    private int size;
    private int mask;

    /** An empty map sized for about {@code expected} keys before it first grows. */
    public LongIntMap(int expected) {
        int cap = Integer.highestOneBit(Math.max(4, expected) * 2 - 1) << 1;
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(values, ABSENT);
        mask = cap - 1;
    }

    /** Number of keys stored. */
    public int size() {
        return size;
    }

    /** The value of {@code key}, or {@link #ABSENT}. */
    public int get(long key) {
        for (int i = slot(key); values[i] != ABSENT; i = (i + 1) & mask) {
            if (keys[i] == key) {
                return values[i];
            }
        }
        return ABSENT;
    }

    /**
     * Stores {@code key -> value}, replacing an earlier value of the key.
     *
     * @throws IllegalArgumentException if {@code value} is negative
     */
    public void put(long key, int value) {
        if (value < 0) {
            throw new IllegalArgumentException("values must be non-negative, not " + value);
        }
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        int i = slot(key);
        while (values[i] != ABSENT) {
            if (keys[i] == key) {
                values[i] = value;
                return;
            }
            i = (i + 1) & mask;
        }
        keys[i] = key;
        values[i] = value;
        size++;
    }

    private int slot(long key) {
        // multiplicative (Fibonacci) hashing, Knuth, The Art of Computer Programming vol. 3, 6.4:
        // spreads nearby keys (packed vertex and level numbers) over the table
        long h = key * 0x9E3779B97F4A7C15L;
        h ^= h >>> 32;
        return (int) h & mask;
    }

    private void grow() {
        long[] oldKeys = keys;
        int[] oldValues = values;
        int cap = Math.multiplyExact(keys.length, 2);
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(values, ABSENT);
        mask = cap - 1;
        size = 0;
        for (int i = 0; i < oldKeys.length; i++) {
            if (oldValues[i] != ABSENT) {
                put(oldKeys[i], oldValues[i]);
            }
        }
    }
}
