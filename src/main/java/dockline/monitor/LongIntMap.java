package dockline.monitor;

import java.util.Arrays;

/**
 * An open-addressing hash map from long keys to non-negative int values, with linear probing and
 * no boxing: the hot path of on-the-fly comparator construction ({@link DiscountedComparator},
 * {@link PairMonitor}) looks a key up in O(1) expected time without allocating.
 *
 * <p>{@link Long#MIN_VALUE} marks an empty slot and may not be used as a key. Not thread-safe. Public
 * because the product builders in {@code dockline.solve} number their (vertex, state) pairs with it too.
 */
public final class LongIntMap {

    /** What {@link #get} returns for a key that is not in the map. */
    public static final int ABSENT = -1;
    private static final long EMPTY = Long.MIN_VALUE;

    private long[] keys;
    private int[] values;
    private int size;
    private int mask;

    public LongIntMap(int expected) {
        int cap = Integer.highestOneBit(Math.max(4, expected) * 2 - 1) << 1;
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(keys, EMPTY);
        mask = cap - 1;
    }

    public int size() {
        return size;
    }

    /** The value of {@code key}, or {@link #ABSENT}. */
    public int get(long key) {
        for (int i = slot(key); ; i = (i + 1) & mask) {
            long k = keys[i];
            if (k == key) {
                return values[i];
            }
            if (k == EMPTY) {
                return ABSENT;
            }
        }
    }

    /** Stores {@code key -> value} ({@code value >= 0}), replacing an earlier value. */
    public void put(long key, int value) {
        if (key == EMPTY) {
            throw new IllegalArgumentException("Long.MIN_VALUE cannot be a key");
        }
        if ((size + 1) * 2 > keys.length) {
            grow();
        }
        for (int i = slot(key); ; i = (i + 1) & mask) {
            long k = keys[i];
            if (k == key) {
                values[i] = value;
                return;
            }
            if (k == EMPTY) {
                keys[i] = key;
                values[i] = value;
                size++;
                return;
            }
        }
    }

    private int slot(long key) {
        // multiplicative (Fibonacci) hashing, Knuth, The Art of Computer Programming vol. 3, 6.4:
        // spreads nearby numerators over the table
        long h = key * 0x9E3779B97F4A7C15L;
        h ^= h >>> 32;
        return (int) h & mask;
    }

    private void grow() {
        long[] ok = keys;
        int[] ov = values;
        int cap = ok.length * 2;
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(keys, EMPTY);
        mask = cap - 1;
        size = 0;
        for (int i = 0; i < ok.length; i++) {
            if (ok[i] != EMPTY) {
                put(ok[i], ov[i]);
            }
        }
    }
}
