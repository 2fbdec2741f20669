package dockline.model;

/**
 * How long a door-shut or blockage event lasts once it happens (maps/README.md, "Game semantics").
 */
public enum EventDuration implements Worded {
    /** The door or zone stays closed for the rest of the mission (the default in map files). */
    REST_OF_MISSION,
    /** The robot stays one turn, pays the wait energy and may try again (the reference semantics). */
    MOMENTARY;

    /** The constant spelled {@code w}, or {@code null}. */
    public static EventDuration ofWord(String w) {
        return Worded.ofWord(EventDuration.class, w);
    }
}
