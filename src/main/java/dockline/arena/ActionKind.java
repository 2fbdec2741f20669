package dockline.arena;

import dockline.model.Worded;

/** What the robot can choose to do at a robot vertex. */
public enum ActionKind implements Worded {
    /** Move to a neighbouring free cell. */
    MOVE,
    /** Stay one step, paying the idle energy. */
    WAIT,
    /** Stay one step on a dock, gaining the charge rate. */
    CHARGE;

    /** The constant spelled {@code w}, or {@code null}. */
    public static ActionKind ofWord(String w) {
        return Worded.ofWord(ActionKind.class, w);
    }
}
