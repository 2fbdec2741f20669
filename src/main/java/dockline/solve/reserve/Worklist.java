package dockline.solve.reserve;

import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;

/**
 * The won robot triples not yet expanded: one circular buffer serves as stack or queue (pushes at the
 * tail, pops at the tail for last-in first-out or at the head for first-in first-out); its length is a
 * power of two so indices wrap by a mask (int overflow of head and tail is harmless for the same reason),
 * and it grows within the memory budget of {@link ImplicitReserveGame#limitWorklist}.
 */
final class Worklist {
    // the game whose memory budget the buffer grows within (its fixed bytes change during a solve)
    private final ImplicitReserveGame game;
    private long[] buf = new long[1 << 12];
    private int mask = buf.length - 1;
    private int head;
    private int tail;
    private long pushed;

    Worklist(ImplicitReserveGame game) {
        this.game = game;
    }

    boolean isEmpty() {
        return head == tail;
    }

    long pop(boolean fifo) {
        return fifo ? buf[(head++) & mask] : buf[(--tail) & mask];
    }

    void push(long v) {
        if (tail - head == buf.length) {
            grow();
        }
        buf[(tail++) & mask] = v;
        pushed++;
    }

    /** Triples pushed so far. */
    long pushed() {
        return pushed;
    }

    /**
     * The full buffer in one twice as long, each element at the same index modulo the new length, so that
     * head and tail stay valid (any run of n consecutive indices is distinct modulo 2n).
     */
    private void grow() {
        // while copying, the old buffer and the new one (twice as long) are both live
        long bytes = game.fixedBytes + 24L * buf.length;
        if (bytes > game.budgetBytes || buf.length >= (1 << 30)) {
            throw new ProductTooLargeException(new SizeEstimate(game.vertexCount, game.edgeCount(), bytes, 0), game.budgetBytes,
                    true);
        }
        long[] out = new long[buf.length * 2];
        int outMask = out.length - 1;
        for (int i = head; i != tail; i++) {
            out[i & outMask] = buf[i & mask];
        }
        buf = out;
        mask = outMask;
    }
}
