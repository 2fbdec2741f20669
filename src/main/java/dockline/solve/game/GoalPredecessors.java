package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * The goal automaton's step function inverted, per distinct zone mask of the arena's cells: for a
 * cell c and a goal state g', the states g with {@code goal.step(g, zones(c)) == g'}. Lets a
 * backward search enumerate the predecessors of (arena vertex, goal state) without any product
 * graph in memory.
 *
 * <p>Built in O(F + Z·G) for F free cells, Z distinct zone masks and G goal states; each query is
 * O(1) plus the answer, read from int arrays (no allocation).
 *
 * <p>Algorithm: the inverse of a deterministic transition function, tabulated per zone mask
 * (common practice).
 */
public final class GoalPredecessors {

    private final int stride;
    private final int[] cellMaskId;
    private final int[] start;
    private final int[] states;

    public GoalPredecessors(Arena arena, GoalAutomaton goal) {
        int gc = goal.stateCount();
        this.stride = gc + 1;
        this.cellMaskId = new int[arena.width() * arena.height()];
        Map<Long, Integer> ids = new HashMap<>();
        long[] masks = new long[16];
        for (int slot = 0; slot < arena.freeCellCount(); slot++) {
            int c = arena.freeCell(slot);
            long m = arena.cellZones(c);
            Integer id = ids.get(m);
            if (id == null) {
                id = ids.size();
                ids.put(m, id);
                if (id == masks.length) {
                    masks = Arrays.copyOf(masks, masks.length * 2);
                }
                masks[id] = m;
            }
            cellMaskId[c] = id;
        }
        int distinct = ids.size();
        int[] count = new int[distinct * stride];
        for (int id = 0; id < distinct; id++) {
            for (int g = 0; g < gc; g++) {
                int g2 = goal.step(g, masks[id]);
                if (g2 != GoalAutomaton.REJECT) {
                    count[id * stride + g2]++;
                }
            }
        }
        this.start = new int[count.length + 1];
        for (int i = 0; i < count.length; i++) {
            start[i + 1] = start[i] + count[i];
        }
        this.states = new int[start[count.length]];
        int[] fill = Arrays.copyOf(start, count.length);
        for (int id = 0; id < distinct; id++) {
            for (int g = 0; g < gc; g++) {
                int g2 = goal.step(g, masks[id]);
                if (g2 != GoalAutomaton.REJECT) {
                    states[fill[id * stride + g2]++] = g;
                }
            }
        }
    }

    /** Index of the first predecessor state of (cell, g'); the range ends at {@link #end}. */
    public int begin(int cell, int g2) {
        return start[cellMaskId[cell] * stride + g2];
    }

    public int end(int cell, int g2) {
        return start[cellMaskId[cell] * stride + g2 + 1];
    }

    /** The i-th predecessor state, for {@code begin <= i < end}. */
    public int state(int i) {
        return states[i];
    }
}
