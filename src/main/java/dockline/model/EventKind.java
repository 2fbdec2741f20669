package dockline.model;

/**
 * The kinds of disturbance the building can throw at a move (maps/README.md, "Game semantics").
 * Each spends one unit of the mission's disturbance budget.
 */
public enum EventKind implements Worded {
    /** The door on the target cell is shut: the robot stays and pays the idle energy. */
    DOOR_SHUT,
    /** The target cell is blocked (a cart, a pallet): the robot stays and pays the idle energy. */
    BLOCKAGE,
    /** The wheels slip: the robot ends in a free cell beside the target, and pays that cell's surface energy. */
    SLIP,
    /** A drag (thick rug, debris): the robot arrives but pays the surface energy plus the rule's extra. */
    DRAG;

    /** The constant spelled {@code w}, or {@code null}. */
    public static EventKind ofWord(String w) {
        return Worded.ofWord(EventKind.class, w);
    }
}
