package dockline.model;

/**
 * The kinds of disturbance the building can throw at a move (maps/README.md, "Game semantics").
 * Each spends one unit of the mission's disturbance budget.
 */
public enum EventKind {
    /** The door on the target cell is shut: the robot stays and pays the idle energy. */
    DOOR_SHUT("door-shut"),
    /** The target cell is blocked (a cart, a pallet): the robot stays and pays the idle energy. */
    BLOCKAGE("blockage"),
    /** The wheels slip: the robot ends in a free cell beside the target, and pays that cell's surface energy. */
    SLIP("slip"),
    /** A drag (thick rug, debris): the robot arrives but pays the surface energy plus the rule's extra. */
    DRAG("drag");

    private final String word;

    EventKind(String word) {
        this.word = word;
    }

    /** The word used in files and reports, e.g. {@code door-shut}. */
    public String word() {
        return word;
    }

    public static EventKind ofWord(String w) {
        for (EventKind k : values()) {
            if (k.word.equals(w)) {
                return k;
            }
        }
        return null;
    }
}
