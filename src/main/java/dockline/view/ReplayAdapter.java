package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
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
        List<ViewStep> steps = new ArrayList<>();
        for (ReplayStep s : r.steps()) {
            ReplayEvent e = s.event() == null ? ReplayEvent.NONE : s.event();
            steps.add(new ViewStep(s.step(), s.cell(), action(s.action(), s.cell(), steps.isEmpty() ? null
                    : steps.get(steps.size() - 1).cell()), e.kind(), e.describe(), e.cell(), s.batteryUnits(),
                    s.budgetLeft(), s.progressMask(), e.closedCells()));
        }
        List<String> notes = new ArrayList<>(r.explanation());
        notes.add(0, "Ends: " + endingWords(r.ending()) + "; lowest battery " + Units.both(m, r.minimumUnits())
                + " against a floor of " + Units.both(m, r.floorUnits()) + ".");
        return new ViewReplay(kind, title, steps, notes);
    }

    /** {@code start}, {@code move x:y}, {@code wait}, {@code charge} back to an action ({@code null} for the start). */
    static Action action(String text, Cell here, Cell before) {
        String t = text == null ? "" : text.trim();
        if (t.isEmpty() || t.equals("start")) {
            return null;
        }
        if (t.startsWith(ActionKind.MOVE.word())) {
            String xy = t.substring(ActionKind.MOVE.word().length()).trim();
            String[] p = xy.split(":");
            try {
                return new Action(ActionKind.MOVE, new Cell(Integer.parseInt(p[0].trim()), Integer.parseInt(p[1].trim())));
            } catch (RuntimeException e) {
                return new Action(ActionKind.MOVE, here);
            }
        }
        ActionKind k = ActionKind.ofWord(t);
        Cell at = before != null ? before : here;
        return new Action(k == null ? ActionKind.WAIT : k, at);
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
