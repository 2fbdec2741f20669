package dockline.certify;

import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.ZoneLabels;

/**
 * The checker's own task bookkeeping, read straight from the mission's tasks (maps/README.md, "Game
 * semantics"), so that
 * the certificate does not trust the goal automaton the solver uses.
 *
 * <p>Progress is a bit mask: bit i is set when task i of the visit list is done. With tasks in the
 * given order only a prefix can be done: occupying a cell finishes the next task if the cell lies in
 * its zone, and then possibly the one after (a cell in several task zones finishes them in turn). With
 * tasks in any order, occupying a cell finishes every task whose zone contains it. Occupying a cell
 * of an avoided zone loses. O(n) per step for n tasks.
 */
final class TaskProgress {

    /** The step result when an avoided zone is occupied. */
    static final int AVOIDED = -1;

    private final long[] taskBits;
    private final long avoidBits;
    private final boolean ordered;
    private final boolean finishOnDock;
    private final int allDone;

    private TaskProgress(long[] taskBits, long avoidBits, boolean ordered, boolean finishOnDock) {
        this.taskBits = taskBits;
        this.avoidBits = avoidBits;
        this.ordered = ordered;
        this.finishOnDock = finishOnDock;
        this.allDone = (1 << taskBits.length) - 1;
    }

    static TaskProgress of(Mission mission) {
        BuildingMap map = mission.map();
        Tasks tasks = mission.tasks();
        if (tasks.visit().size() > 30) {
            throw new IllegalArgumentException("too many tasks for a progress mask: " + tasks.visit().size());
        }
        // the cells' label bits are the mission's ZoneLabels: one per task zone, one for every avoided zone
        ZoneLabels labels = ZoneLabels.of(tasks);
        long[] bits = new long[tasks.visit().size()];
        for (int i = 0; i < bits.length; i++) {
            known(map, tasks.visit().get(i));
            bits[i] = labels.bit(tasks.visit().get(i));
        }
        for (String a : tasks.avoid()) {
            known(map, a);
        }
        long avoid = labels.avoidMask();
        return new TaskProgress(bits, avoid, tasks.ordered(), tasks.finishOnDock());
    }

    private static void known(BuildingMap map, String zoneName) {
        if (map.zone(zoneName).isEmpty()) {
            throw new IllegalArgumentException("the tasks name an unknown zone '" + zoneName + "'");
        }
    }

    int taskCount() {
        return taskBits.length;
    }

    /** The mask after occupying a cell with the given zone bits, or {@link #AVOIDED}. */
    int step(int mask, long zones) {
        if ((zones & avoidBits) != 0) {
            return AVOIDED;
        }
        if (ordered) {
            int next = Integer.bitCount(mask);
            while (next < taskBits.length && (zones & taskBits[next]) != 0) {
                mask |= 1 << next;
                next++;
            }
            return mask;
        }
        for (int i = 0; i < taskBits.length; i++) {
            if ((zones & taskBits[i]) != 0) {
                mask |= 1 << i;
            }
        }
        return mask;
    }

    /** The mission is complete: all tasks done and, if the mission says so, on a dock. */
    boolean complete(int mask, boolean onDock) {
        return mask == allDone && (onDock || !finishOnDock);
    }
}
