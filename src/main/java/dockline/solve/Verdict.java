package dockline.solve;

/** The answer to the threshold question for a mission. */
public enum Verdict {
    /** The robot has a policy that completes the mission within the floor under every allowed disturbance. */
    GUARANTEED("guaranteed"),
    /** Some sequence of allowed disturbances defeats every policy. */
    NOT_GUARANTEED("not-guaranteed");

    private final String word;

    Verdict(String word) {
        this.word = word;
    }

    /** The word used in JSON and reports. */
    public String word() {
        return word;
    }

    public static Verdict of(boolean guaranteed) {
        return guaranteed ? GUARANTEED : NOT_GUARANTEED;
    }
}
