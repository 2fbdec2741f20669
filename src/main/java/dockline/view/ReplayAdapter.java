package dockline.view;

import dockline.model.Mission;
import dockline.replay.Replay;
import dockline.replay.ReplayEvent;
import dockline.replay.ReplayStep;
import java.util.ArrayList;
import java.util.List;

/** Turns the trust package's replays into the view's own {@link ViewReplay}. O(steps). */
final class ReplayAdapter {

    private ReplayAdapter() {
    }

    static ViewReplay of(Mission m, Replay r, ViewReplay.Kind kind, String title) {
        List<ViewStep> steps = steps(r);
        List<String> notes = new ArrayList<>(r.explanation());
        notes.add(0, "Ends: " + endingWords(r.ending()) + "; lowest battery " + Units.both(m, r.minimumUnits())
                + " against a floor of " + Units.both(m, r.floorUnits()) + ".");
        return new ViewReplay(kind, title, steps, notes);
    }

    /** The replay's steps as the view shows them. */
    static List<ViewStep> steps(Replay r) {
        List<ViewStep> steps = new ArrayList<>();
        for (ReplayStep s : r.steps()) {
            ReplayEvent e = s.event() == null ? ReplayEvent.NONE : s.event();
            steps.add(new ViewStep(s.step(), s.cell(), s.action().orElse(null), e.kind(), e.describe(), e.cell(),
                    s.batteryUnits(), s.budgetLeft(), s.progressMask(), e.closedCells()));
        }
        return steps;
    }

    static String endingWords(Replay.Ending e) {
        return switch (e) {
            case COMPLETE -> "mission complete";
            case BELOW_FLOOR -> "the battery fell below the reserve floor";
            case AVOIDED_ZONE -> "the robot was put into a zone it must avoid";
            case REPEATS -> "back in an earlier situation: the disturbance can repeat this for ever";
            case NO_POLICY -> "the policy has no action for the situation reached";
        };
    }
}
