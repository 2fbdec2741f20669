package dockline.certify;

import dockline.arena.Arena;
import dockline.model.Mission;
import java.util.List;

/**
 * What the wording of both checkers' reasons starts from: the loop, its arena and mission, how
 * many steps of a trace are shown, and an amount of energy in units and watt-hours.
 */
abstract class LoopWords<L extends LoopNodes> {
    /** The last steps of a run a trace shows. */
    static final int TRACE_STEPS = 12;
    final L loop;
    final Arena arena;
    final Mission mission;

    LoopWords(L loop) {
        this.loop = loop;
        this.arena = loop.arena();
        this.mission = arena.mission();
    }

    /** {@code 1 unit (0.1 Wh)}, {@code 12 units (1.2 Wh)}. */
    String units(int u) {
        return u + (u == 1 || u == -1 ? " unit (" : " units (") + mission.scale().formatWh(u) + ")";
    }

    /** The situation at the node in words. */
    abstract String state(int node);

    /** The last steps of the run from the start to the node in words. */
    abstract String trace(int node);

    /** The start of a cycle's wording: where the robot reaches the cycle's first node, then "then ". */
    StringBuilder cycleStart(List<Integer> cycle) {
        StringBuilder sb = new StringBuilder("the disturbance can keep the robot going round forever without"
                + " completing the mission: ");
        int first = cycle.get(0);
        sb.append("the robot reaches ").append(state(first)).append(" [").append(trace(first)).append("], then ");
        return sb;
    }
}
