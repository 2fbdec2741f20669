package dockline.arena;

/** What the robot can choose to do at a robot vertex. */
public enum ActionKind {
    /** Move to a neighbouring free cell. */
    MOVE("move"),
    /** Stay one step, paying the idle energy. */
    WAIT("wait"),
    /** Stay one step on a dock, gaining the charge rate. */
    CHARGE("charge");

    private final String word;

    ActionKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    public static ActionKind ofWord(String w) {
        for (ActionKind k : values()) {
            if (k.word.equals(w)) {
                return k;
            }
        }
        return null;
    }
}
