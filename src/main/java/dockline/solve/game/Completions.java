package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import java.util.Arrays;

/**
 * The robot positions of arena × goal automaton that complete the mission: a robot vertex on a free cell and a
 * goal state accepting there (on a dock when the goal asks for one), over every disturbance state of the cell.
 * These are the targets every backward solver seeds its search with. O(free cells × goal states × disturbance
 * states).
 */
public final class Completions {

    private Completions() {
    }

    /**
     * The completing positions as a flat array of pairs {@code (robot vertex, goal state)}, in the order of the
     * arena's free cells, then goal states, then disturbance states.
     */
    public static int[] of(Arena arena, GoalAutomaton goal) {
        int gc = goal.stateCount();
        int[] out = new int[16];
        int n = 0;
        for (int slot = 0; slot < arena.freeCellCount(); slot++) {
            int c = arena.freeCell(slot);
            boolean dock = arena.isDock(c);
            for (int g = 0; g < gc; g++) {
                if (!goal.accepting(g, dock)) {
                    continue;
                }
                for (int k = 0; k < arena.stateCount(); k++) {
                    if (n + 2 > out.length) {
                        out = Arrays.copyOf(out, 2 * out.length);
                    }
                    out[n++] = arena.robotVertexInState(c, k);
                    out[n++] = g;
                }
            }
        }
        return Arrays.copyOf(out, n);
    }
}
