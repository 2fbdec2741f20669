package dockline.goal;

import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.ZoneLabels;
import java.util.ArrayList;
import java.util.List;

/**
 * Deterministic automaton of a patrol's laps over the zone sets of the cells the robot occupies: its
 * state is the set of checkpoints visited in the current lap (a bit mask over the patrol list, 2^n
 * states). When the set becomes complete the lap is done: that state, {@link #lapDone()}, is the
 * accepting (Büchi) state, and the next cell occupied starts a new lap from the empty set. Occupying an
 * avoided zone goes to the losing sink {@link #REJECT}.
 *
 * <p>So a play visits every checkpoint infinitely often exactly when it passes {@link #lapDone()}
 * infinitely often. Each step is O(n) for n checkpoints, on zone bit masks (no allocation).
 */
public final class LapAutomaton {

    public static final int REJECT = GoalAutomaton.REJECT;

    private final long[] checkpointZoneBit;
    private final long avoidMask;
    private final List<String> names;

    private LapAutomaton(long[] checkpointZoneBit, long avoidMask, List<String> names) {
        this.checkpointZoneBit = checkpointZoneBit;
        this.avoidMask = avoidMask;
        this.names = List.copyOf(names);
    }

    /**
     * The lap automaton of a patrol mission.
     *
     * @throws IllegalArgumentException if the mission is not a patrol, or names an unknown zone
     */
    public static LapAutomaton of(Mission mission) {
        Tasks t = mission.tasks();
        if (!t.patrols()) {
            throw new IllegalArgumentException("not a patrol");
        }
        if (t.patrol().size() > GoalAutomaton.MAX_TASKS) {
            throw new IllegalArgumentException("at most " + GoalAutomaton.MAX_TASKS + " checkpoints per patrol");
        }
        BuildingMap map = mission.map();
        ZoneLabels labels = ZoneLabels.of(t);
        long[] bits = new long[t.patrol().size()];
        for (int i = 0; i < bits.length; i++) {
            bits[i] = GoalAutomaton.zoneBit(map, labels, t.patrol().get(i));
        }
        for (String a : t.avoid()) {
            GoalAutomaton.known(map, a);
        }
        return new LapAutomaton(bits, labels.avoidMask(), t.patrol());
    }

    public int checkpointCount() {
        return checkpointZoneBit.length;
    }

    public List<String> checkpointNames() {
        return names;
    }

    public int stateCount() {
        return 1 << checkpointZoneBit.length;
    }

    /** The accepting state: every checkpoint of the lap visited. */
    public int lapDone() {
        return (1 << checkpointZoneBit.length) - 1;
    }

    /** The state after occupying the start cell. */
    public int initial(long startZones) {
        return step(0, startZones);
    }

    /** The state after occupying a cell with the given zone mask: a completed lap starts afresh first. */
    public int step(int g, long zones) {
        if ((zones & avoidMask) != 0) {
            return REJECT;
        }
        int s = g == lapDone() ? 0 : g;
        for (int i = 0; i < checkpointZoneBit.length; i++) {
            if ((zones & checkpointZoneBit[i]) != 0) {
                s |= 1 << i;
            }
        }
        return s;
    }

    /** The checkpoints not yet visited in state g, by name. */
    public List<String> missing(int g) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            if ((g & (1 << i)) == 0) {
                out.add(names.get(i));
            }
        }
        return out;
    }
}
