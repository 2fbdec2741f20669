package dockline.goal;

import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.ZoneLabels;
import java.util.ArrayList;
import java.util.List;

/**
 * Deterministic automaton over the zone sets of the cells the robot occupies (README.md, "How it decides").
 *
 * <p>States are {@code 0 .. stateCount()-1}; {@link #REJECT} is the losing sink (an avoided zone
 * was occupied). With tasks in any order a state is the bit mask of the tasks done (2^n states);
 * with tasks in the given order it is the number of tasks done, a prefix (n+1 states). Either way
 * {@link #progressMask(int)} gives the bit mask of tasks done, the representation used in policy
 * files and reports. A state is accepting when every task is done and, if the mission says so,
 * the robot is on a dock.
 *
 * <p>Each step is O(n) for n tasks, on zone bit masks (no allocation).
 */
public final class GoalAutomaton {

    public static final int REJECT = -1;

    /** Most tasks a mission may list (any-order states are bit masks). */
    public static final int MAX_TASKS = 16;

    private final boolean ordered;
    private final boolean finishOnDock;
    private final long[] taskZoneBit;
    private final long avoidMask;
    private final List<String> taskNames;

    private GoalAutomaton(boolean ordered, boolean finishOnDock, long[] taskZoneBit, long avoidMask,
                          List<String> taskNames) {
        this.ordered = ordered;
        this.finishOnDock = finishOnDock;
        this.taskZoneBit = taskZoneBit;
        this.avoidMask = avoidMask;
        this.taskNames = List.copyOf(taskNames);
    }

    /**
     * The goal automaton of a mission; zone bits are the mission's labels ({@link ZoneLabels}, the same
     * bits as {@link dockline.arena.Arena#cellZones(int)}).
     *
     * @throws IllegalArgumentException if a task names an unknown zone or there are too many tasks
     */
    public static GoalAutomaton of(Mission mission) {
        BuildingMap map = mission.map();
        Tasks t = mission.tasks();
        if (t.visit().size() > MAX_TASKS) {
            throw new IllegalArgumentException("at most " + MAX_TASKS + " tasks per mission");
        }
        ZoneLabels labels = ZoneLabels.of(t);
        long[] bits = new long[t.visit().size()];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < bits.length; i++) {
            bits[i] = zoneBit(map, labels, t.visit().get(i));
            names.add(t.visit().get(i));
        }
        for (String a : t.avoid()) {
            known(map, a);
        }
        return new GoalAutomaton(t.ordered(), t.finishOnDock(), bits, labels.avoidMask(), names);
    }

    static long zoneBit(BuildingMap map, ZoneLabels labels, String zone) {
        known(map, zone);
        return labels.bit(zone);
    }

    static void known(BuildingMap map, String zone) {
        if (map.zone(zone).isEmpty()) {
            throw new IllegalArgumentException("unknown zone '" + zone + "'");
        }
    }

    public int taskCount() {
        return taskZoneBit.length;
    }

    public List<String> taskNames() {
        return taskNames;
    }

    public boolean ordered() {
        return ordered;
    }

    public int stateCount() {
        return ordered ? taskZoneBit.length + 1 : 1 << taskZoneBit.length;
    }

    /** The state after occupying the start cell (whose zones are given), or {@link #REJECT}. */
    public int initial(long startZones) {
        return step(0, startZones);
    }

    /** The state after occupying a cell with the given zone mask, or {@link #REJECT}. */
    public int step(int g, long zones) {
        if ((zones & avoidMask) != 0) {
            return REJECT;
        }
        if (ordered) {
            while (g < taskZoneBit.length && (zones & taskZoneBit[g]) != 0) {
                g++;
            }
            return g;
        }
        for (int i = 0; i < taskZoneBit.length; i++) {
            if ((zones & taskZoneBit[i]) != 0) {
                g |= 1 << i;
            }
        }
        return g;
    }

    /** Mission complete: every task done and, if required, on a dock. */
    public boolean accepting(int g, boolean onDock) {
        return allDone(g) && (onDock || !finishOnDock);
    }

    public boolean allDone(int g) {
        return ordered ? g == taskZoneBit.length : g == (1 << taskZoneBit.length) - 1;
    }

    /** Bit i set when task i (of the visit list) is done. */
    public int progressMask(int g) {
        return ordered ? (1 << g) - 1 : g;
    }

    /** The goal state of a progress mask, or {@link #REJECT} if the mask is not a state of this automaton. */
    public int stateOfMask(int mask) {
        if (ordered) {
            int g = Integer.numberOfTrailingZeros(~mask);
            return progressMask(g) == mask && g <= taskZoneBit.length ? g : REJECT;
        }
        return mask >= 0 && mask < (1 << taskZoneBit.length) ? mask : REJECT;
    }

    /** Task progress in words, e.g. {@code 2 of 3 tasks done (pharmacy, ward-b)}. */
    public String describe(int g) {
        int mask = progressMask(g);
        List<String> done = new ArrayList<>();
        for (int i = 0; i < taskNames.size(); i++) {
            if ((mask & (1 << i)) != 0) {
                done.add(taskNames.get(i));
            }
        }
        return done.size() + " of " + taskNames.size() + " tasks done"
                + (done.isEmpty() ? "" : " (" + String.join(", ", done) + ")");
    }
}
