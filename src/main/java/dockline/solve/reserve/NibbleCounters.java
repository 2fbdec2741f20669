package dockline.solve.reserve;

import dockline.util.PagedBytes;

/**
 * The attractor's half-byte counters of {@link ImplicitReserveGame} (two triples a byte): for a disturbance
 * triple the outcomes known to be won, for a robot triple 0 while not won, else 1 + its chosen action's
 * index. Each operation is O(1), except the copy (O(length)).
 */
final class NibbleCounters {

    private NibbleCounters() {
    }

    /**
     * One more outcome of disturbance triple q (out-degree {@code need}) is known to be won: counts it unless q
     * is won already, and returns whether that made q won (all its outcomes won).
     */
    static boolean wonByOneMore(PagedBytes count, long q, int need) {
        int qs = ((int) q & 1) << 2;
        int cell8 = count.get(q >>> 1);
        int c = (cell8 >>> qs) & 15;
        if (c >= need) {
            return false;
        }
        count.set(q >>> 1, (byte) (cell8 + (1 << qs)));
        return c + 1 == need;
    }

    /** A copy of the counters (the weakened fixpoint kept for the next round). */
    static PagedBytes copyOf(PagedBytes count) {
        PagedBytes out = new PagedBytes(count.length());
        out.copyFrom(count, 0, 0, count.length());
        return out;
    }

    /**
     * Robot triple o is won by the action of index {@code choice - 1} unless it is won already: its counter
     * records the choice, and it joins the worklist (and the flags, when kept). Returns whether it was new.
     */
    static boolean winOwner(PagedBytes count, Worklist wl, boolean[] flags, long o, int choice) {
        int os = ((int) o & 1) << 2;
        int o8 = count.get(o >>> 1);
        if (((o8 >>> os) & 15) != 0) {
            return false;
        }
        count.set(o >>> 1, (byte) (o8 | (choice << os)));
        wl.push(o);
        if (flags != null) {
            flags[(int) o] = true;
        }
        return true;
    }
}
