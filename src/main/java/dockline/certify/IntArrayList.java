package dockline.certify;

import java.util.Arrays;

/** A growable int array (no boxing). */
final class IntArrayList {
    private int[] a;
    private int n;

    IntArrayList(int capacity) {
        a = new int[Math.max(4, capacity)];
    }

    void add(int v) {
        if (n == a.length) {
            a = Arrays.copyOf(a, Math.max(8, a.length + (a.length >> 1)));
        }
        a[n++] = v;
    }

    int get(int i) {
        return a[i];
    }

    void set(int i, int v) {
        a[i] = v;
    }

    int size() {
        return n;
    }

    int[] toArray() {
        return Arrays.copyOf(a, n);
    }
}
