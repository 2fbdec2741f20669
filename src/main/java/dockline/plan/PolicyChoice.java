package dockline.plan;

/** Which of the guaranteed policies a product route reports, certifies, exports and replays. */
public enum PolicyChoice {
    /**
     * The default: among the guaranteed policies, one whose worst case is the highest guaranteed floor,
     * and among those one that finishes in the fewest moves in the worst case. Its worst level is the
     * highest floor itself, so it does not depend on how equally short choices are ordered. Costs the
     * search for the highest floor and one more solve at that floor.
     */
    SAFEST,
    /**
     * The attractor's policy at the mission's floor: it finishes in the fewest moves in the worst case
     * (its worst level can be anywhere from the floor up, and two routes may break ties between
     * equally short choices differently).
     */
    FEWEST_MOVES
}
