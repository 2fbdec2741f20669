package dockline.solve;

import dockline.model.Worded;

/** The answer to the threshold question for a mission. */
public enum Verdict implements Worded {
    /** The robot has a policy that completes the mission within the floor under every allowed disturbance. */
    GUARANTEED,
    /** Some sequence of allowed disturbances defeats every policy. */
    NOT_GUARANTEED;

    public static Verdict of(boolean guaranteed) {
        return guaranteed ? GUARANTEED : NOT_GUARANTEED;
    }
}
