package dockline.view;

import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.model.ZoneLabels;
import java.util.ArrayList;
import java.util.List;

/**
 * The task-progress values a user can pick for the heat map and the policy overlay: every
 * state of the mission's goal automaton, as its progress bit mask with a label in words.
 */
final class ProgressChoices {

    /** One choice: the bit mask and its words. */
    record Choice(int mask, String label) {
        @Override
        public String toString() {
            return label;
        }
    }

    private ProgressChoices() {
    }

    static List<Choice> of(Mission m) {
        if (m.tasks().patrols()) {
            // a patrol's progress is the set of checkpoints of the current lap (its lap automaton's mask)
            List<String> cps = m.tasks().patrol();
            List<Choice> out = new ArrayList<>();
            for (int mask = 0; mask < 1 << cps.size(); mask++) {
                List<String> done = new ArrayList<>();
                for (int i = 0; i < cps.size(); i++) {
                    if ((mask & 1 << i) != 0) {
                        done.add(cps.get(i));
                    }
                }
                out.add(new Choice(mask, "lap: " + (done.isEmpty() ? "nothing yet" : String.join(", ", done))));
            }
            return out;
        }
        GoalAutomaton g = GoalAutomaton.of(m);
        List<Choice> out = new ArrayList<>();
        for (int s = 0; s < g.stateCount(); s++) {
            out.add(new Choice(g.progressMask(s), g.describe(s)));
        }
        return out;
    }

    /** The progress right after the start cell (its zones may already complete a task). */
    static int initialMask(Mission m) {
        if (m.tasks().patrols()) {
            return 0;
        }
        GoalAutomaton g = GoalAutomaton.of(m);
        BuildingMap map = m.map();
        long zones = ZoneLabels.of(m).cellMasks(map)[m.start().index(map.width())];
        int s = g.initial(zones);
        return s == GoalAutomaton.REJECT ? 0 : g.progressMask(s);
    }
}
