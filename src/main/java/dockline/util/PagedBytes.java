package dockline.util;

/**
 * A fixed-length byte array indexed by {@code long}, in pages of 2^30 bytes, so that its length is
 * not bounded by a Java array's int index: the implicit product game keeps half a byte per triple of
 * its numbering here, and a numbering may pass 2^31 slots. Zero-filled; no boxing, one extra array
 * load per access (the page), which the JIT keeps in a register in a loop over one page.
 * Also a bit set of the same length in bits ({@link #getBit}, {@link #setBit}).
 */
public final class PagedBytes {

    /** log2 of the page length. */
    static final int SHIFT = 30;
    private static final long MASK = (1L << SHIFT) - 1;

    private final byte[][] pages;
    private final long length;

    /**
     * @throws IllegalArgumentException if {@code length} is negative or needs more than 2^31 pages
     */
    public PagedBytes(long length) {
        if (length < 0 || (length >>> SHIFT) >= Integer.MAX_VALUE) {
            throw new IllegalArgumentException("length out of range: " + length);
        }
        this.length = length;
        int full = (int) (length >>> SHIFT);
        int rest = (int) (length & MASK);
        this.pages = new byte[full + (rest > 0 ? 1 : 0)][];
        for (int i = 0; i < full; i++) {
            pages[i] = new byte[1 << SHIFT];
        }
        if (rest > 0) {
            pages[full] = new byte[rest];
        }
    }

    /** A byte array for {@code bits} bits. */
    public static PagedBytes bits(long bits) {
        return new PagedBytes((bits >>> 3) + 1);
    }

    public long length() {
        return length;
    }

    public byte get(long i) {
        return pages[(int) (i >>> SHIFT)][(int) (i & MASK)];
    }

    public void set(long i, byte b) {
        pages[(int) (i >>> SHIFT)][(int) (i & MASK)] = b;
    }

    /** Copies {@code n} bytes of {@code src} from index {@code from} into this array at {@code to}, page by page. O(n). */
    public void copyFrom(PagedBytes src, long from, long to, long n) {
        while (n > 0) {
            int chunk = (int) Math.min(n, Math.min((1L << SHIFT) - (from & MASK), (1L << SHIFT) - (to & MASK)));
            System.arraycopy(src.pages[(int) (from >>> SHIFT)], (int) (from & MASK), pages[(int) (to >>> SHIFT)],
                    (int) (to & MASK), chunk);
            from += chunk;
            to += chunk;
            n -= chunk;
        }
    }

    /** Bit {@code i} (of the {@code 8 · length} bits). */
    public boolean getBit(long i) {
        return (get(i >>> 3) & (1 << (i & 7))) != 0;
    }

    public void setBit(long i) {
        long b = i >>> 3;
        set(b, (byte) (get(b) | (1 << (i & 7))));
    }
}
