package dockline.margin;

import java.util.Arrays;

/**
 * Open-addressing hash map from long keys to non-negative int values, on primitive arrays (no
 * boxing, no per-entry objects). Expected O(1) per operation at load factor at most 1/2.
 * Kept per package on purpose: the trust code shares no helpers with the solver.
 */
final class LongIntMap {

    private long[] keys;
    private int[] values;
    private int size;
    private int mask;

    LongIntMap(int expected) {
        int cap = Integer.highestOneBit(Math.max(16, expected) * 2 - 1) << 1;
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(values, -1);
        mask = cap - 1;
    }

    /** The value of the key, or -1. */
    int get(long key) {
        int i = slot(key);
        while (values[i] >= 0) {
            if (keys[i] == key) {
                return values[i];
            }
            i = (i + 1) & mask;
        }
        return -1;
    }

    /** Stores the key with the value (value must be non-negative and the key new). */
    void put(long key, int value) {
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        int i = slot(key);
        while (values[i] >= 0) {
            i = (i + 1) & mask;
        }
        keys[i] = key;
        values[i] = value;
        size++;
    }

    private int slot(long key) {
        long h = key * 0x9E3779B97F4A7C15L;
        return (int) (h >>> 33) & mask;
    }

    private void grow() {
        long[] oldK = keys;
        int[] oldV = values;
        int cap = Math.multiplyExact(keys.length, 2);
        keys = new long[cap];
        values = new int[cap];
        Arrays.fill(values, -1);
        mask = cap - 1;
        size = 0;
        for (int i = 0; i < oldK.length; i++) {
            if (oldV[i] >= 0) {
                put(oldK[i], oldV[i]);
            }
        }
    }
}
