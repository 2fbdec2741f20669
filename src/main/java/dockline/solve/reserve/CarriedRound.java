package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.util.PagedBytes;
import java.util.Arrays;

/**
 * How a round of {@link PhasedLastingSolver} starts from the round before
 * ({@link ImplicitReserveGame#carryFrom}): the weakened fixpoint's counters are copied into the new numbering,
 * then the new actions' outcomes into triples already won are counted forward, so the attractor goes on from
 * the new phases instead of winning the kept ones again. Costs are given per method; the attractor itself is
 * {@link ImplicitReserveGame}'s (the attractor of Grädel, Thomas and Wilke 2002, as there).
 */
final class CarriedRound {

    private CarriedRound() {
    }

    /**
     * Counts {@code bytes} of counters held on top of the game's own against its memory budget
     * ({@link ImplicitReserveGame#limitWorklist}): the previous round's weakened fixpoint until it is copied
     * ({@link ImplicitReserveGame#carryFrom}), or the round's own copy of it kept for the next round. Called
     * before they are held, so a round whose counters and carried counters pass the budget is refused with the
     * usual "too large" message (and the real total) instead of holding more than the budget. O(1).
     *
     * @param whileSolving whether the solve has begun (the message then says the game grew past the budget)
     * @throws ProductTooLargeException if the game's bytes with {@code bytes} more pass the budget
     */
    static void hold(ImplicitReserveGame game, long bytes, boolean whileSolving) {
        long total = Math.addExact(game.fixedBytes, bytes);
        if (total > game.budgetBytes) {
            throw new ProductTooLargeException(new SizeEstimate(game.vertexCount, game.edgeCount(), total, 0),
                    game.budgetBytes, whileSolving);
        }
        game.fixedBytes = total;
    }

    /**
     * The vertices carried over from the previous round ({@link ImplicitReserveGame#carryFrom}) with their
     * counters copied into {@code count}, or null without a previous round or when {@code carry} is false (a
     * solve that keeps per-triple flags starts afresh); the previous round's counters are let go either way.
     */
    static boolean[] take(ImplicitReserveGame game, PagedBytes count, boolean carry) {
        if (game.previous == null) {
            return null;
        }
        boolean[] carried = carry ? carry(game, count) : null;
        game.fixedBytes -= game.previous.weakened.length(); // copied: they may go
        game.previous = null;
        return carried;
    }

    /**
     * Copies the weakened fixpoint of {@link ImplicitReserveGame#previous} into {@code count} (per arena vertex of the previous
     * arena, the block of its goal states and levels, which is contiguous in both numberings) and returns
     * which of this arena's vertices were there. O(previous slots).
     */
    static boolean[] carry(ImplicitReserveGame game, PagedBytes count) {
        ImplicitReserveGame old = game.previous;
        Arena arena = game.arena;
        Arena oa = old.arena;
        int orc = oa.robotCount();
        int rc = arena.robotCount();
        // robot vertices are numbered cell slot x kept states + the state's place among the kept ones
        int oldPer = orc / Math.max(1, oa.freeCellCount());
        int newPer = rc / Math.max(1, arena.freeCellCount());
        int[] place = new int[arena.states().count()];
        Arrays.fill(place, -1);
        for (int v = 0; v < newPer; v++) {
            place[arena.state(v)] = v;
        }
        int[] map = new int[oa.vertexCount()];
        boolean[] carried = new boolean[arena.vertexCount()];
        for (int v = 0; v < oa.vertexCount(); v++) {
            int nv;
            if (v < orc) {
                int at = place[oa.state(v)];
                nv = at < 0 ? -1 : v / oldPer * newPer + at;
            } else {
                int no = map[old.ownerOf[v - orc]];
                nv = arena.target(arena.outBegin(no) + old.actionIndex[v - orc]);
            }
            if (nv < 0 || arena.cell(nv) != oa.cell(v) || arena.state(nv) != oa.state(v) || (v < orc) != (nv < rc)) {
                throw new IllegalStateException("the previous round's vertex " + v + " is not in this arena");
            }
            map[v] = nv;
            carried[nv] = true;
        }
        int b = game.gBits + game.lBits;
        PagedBytes from = old.weakened;
        for (int v = 0; v < map.length; v++) {
            if (b == 0) {
                // one nibble per vertex: two vertices share a byte
                int nib = (from.get(v >>> 1) >>> ((v & 1) << 2)) & 15;
                int t = map[v];
                count.set(t >>> 1, (byte) (count.get(t >>> 1) | (nib << ((t & 1) << 2))));
                continue;
            }
            count.copyFrom(from, (long) v << (b - 1), (long) map[v] << (b - 1), 1L << (b - 1));
        }
        return carried;
    }

    /**
     * After {@link #carry}: the outcomes of this arena's new actions into won triples of the carried vertices,
     * counted forward (those triples were expanded in an earlier round, before these actions existed), with
     * the owners so won joining the worklist. {@code tally[0]} counts the disturbance triples won. Returns
     * whether the start was won (when {@code stopAtStart}). O(new actions x outcomes x goal states x levels).
     */
    static boolean countIntoCarried(ImplicitReserveGame game, PagedBytes count, Worklist wl, boolean[] carried,
                                    long start, boolean stopAtStart, long[] tally) {
        Arena arena = game.arena;
        int gc = game.gc;
        int levels = game.levels;
        int rc = arena.robotCount();
        for (int d = rc; d < arena.vertexCount(); d++) {
            if (carried[d]) {
                continue;
            }
            int need = arena.outEnd(d) - arena.outBegin(d);
            int choice = game.actionIndex[d - rc] + 1;
            int owner = game.ownerOf[d - rc];
            for (int e = arena.outBegin(d); e < arena.outEnd(d); e++) {
                int x = arena.target(e);
                int w = arena.weight(e);
                if (!carried[x] || w == ArenaCompiler.LEFT_OUT) {
                    continue;
                }
                long zones = arena.cellZones(arena.cell(x));
                for (int g = 0; g < gc; g++) {
                    int g2 = game.goal.step(g, zones);
                    if (g2 == GoalAutomaton.REJECT) {
                        continue;
                    }
                    for (int s = 0; s < levels; s++) {
                        int s2 = game.monitor.step(s, w);
                        if (s2 == Monitor.REJECT) {
                            continue;
                        }
                        long t = game.id(x, g2, s2);
                        if (((count.get(t >>> 1) >>> ((t & 1) << 2)) & 15) == 0) {
                            continue;
                        }
                        if (need > 1 && !NibbleCounters.wonByOneMore(count, game.id(d, g, s), need)) {
                            continue;
                        }
                        tally[0]++;
                        long o = game.id(owner, g, s);
                        if (NibbleCounters.winOwner(count, wl, null, o, choice) && o == start && stopAtStart) {
                            return true;
                        }
                    }
                }
            }
        }
        return false;
    }
}
