package dockline.solve.game;

import java.util.Arrays;

/** A growable int array (no boxing). */
final class IntArray {
    private int[] a;
    private int n;

    IntArray(int cap) {
        a = new int[Math.max(4, cap)];
    }

    void add(int v) {
        if (n == a.length) {
            long cap = Math.min(ProductGame.MAX_ARRAY, (long) a.length + (a.length >> 1) + 4);
            if (cap <= n) {
                throw new ArithmeticException("more than " + ProductGame.MAX_ARRAY + " product edges");
            }
            a = Arrays.copyOf(a, (int) cap);
        }
        a[n++] = v;
    }

    int size() {
        return n;
    }

    /** The backing array (may be longer than {@link #size()}). */
    int[] array() {
        return a;
    }
}
