package dockline.model;

/** Which neighbours a move may go to. */
public enum Neighbourhood {
    /** Up, down, left, right. */
    FOUR,
    /** Also the diagonals; a diagonal move may not cut a wall corner. Costs the surface energy times √2, rounded up. */
    EIGHT
}
