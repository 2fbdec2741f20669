package dockline.model;

/**
 * How long a door-shut or blockage event lasts once it happens (maps/README.md, "Game semantics").
 */
public enum EventDuration {
    /** The door or zone stays closed for the rest of the mission (the default in map files). */
    REST_OF_MISSION("rest-of-mission"),
    /** The robot stays one turn, pays the wait energy and may try again (the reference semantics). */
    MOMENTARY("momentary");

    private final String word;

    EventDuration(String word) {
        this.word = word;
    }

    /** The word used in files and reports. */
    public String word() {
        return word;
    }

    /** The duration spelled {@code w}, or {@code null}. */
    public static EventDuration ofWord(String w) {
        for (EventDuration d : values()) {
            if (d.word.equals(w)) {
                return d;
            }
        }
        return null;
    }
}
