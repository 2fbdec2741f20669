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
        GoalAutomaton g = GoalAutomaton.of(m);
        List<Choice> out = new ArrayList<>();
        for (int s = 0; s < g.stateCount(); s++) {
            out.add(new Choice(g.progressMask(s), g.describe(s)));
        }
        return out;
    }

    /** The progress right after the start cell (its zones may already complete a task). */
    static int initialMask(Mission m) {
        GoalAutomaton g = GoalAutomaton.of(m);
        BuildingMap map = m.map();
        long zones = ZoneLabels.of(m).cellMasks(map)[m.start().index(map.width())];
        int s = g.initial(zones);
        return s == GoalAutomaton.REJECT ? 0 : g.progressMask(s);
    }
}
