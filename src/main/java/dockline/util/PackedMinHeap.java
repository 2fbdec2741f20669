package dockline.util;

import java.util.Arrays;

/**
 * Min-heap of robot product vertices with their keys packed into one long ({@code key << 32 | vertex}),
 * 4-ary, with lazy deletion instead of decrease-key: an improved vertex is pushed again and stale
 * entries are skipped when they surface. Keys live inside the heap entries, so sifting reads one
 * array with good locality instead of chasing a key array at random; a 4-ary heap has half the levels
 * of a binary one. O(log n) per operation, at most one entry per improvement.
 */
public final class PackedMinHeap {
    private long[] heap;
    private int size;

    public PackedMinHeap(int capacity) {
        this.heap = new long[Math.max(16, capacity)];
    }

    public boolean isEmpty() {
        return size == 0;
    }

    public long peek() {
        return heap[0];
    }

    public void push(int key, int v) {
        if (size == heap.length) {
            heap = Arrays.copyOf(heap, Math.addExact(heap.length, heap.length >> 1));
        }
        long x = ((long) key << 32) | v;
        int i = size++;
        while (i > 0) {
            int parent = (i - 1) >>> 2;
            long p = heap[parent];
            if (p <= x) {
                break;
            }
            heap[i] = p;
            i = parent;
        }
        heap[i] = x;
    }

    public long poll() {
        long top = heap[0];
        long x = heap[--size];
        int n = size;
        int i = 0;
        while (true) {
            int c = 4 * i + 1;
            if (c >= n) {
                break;
            }
            int best = c;
            long bv = heap[c];
            int last = Math.min(c + 4, n);
            for (int j = c + 1; j < last; j++) {
                long hv = heap[j];
                if (hv < bv) {
                    bv = hv;
                    best = j;
                }
            }
            if (x <= bv) {
                break;
            }
            heap[i] = bv;
            i = best;
        }
        heap[i] = x;
        return top;
    }
}
