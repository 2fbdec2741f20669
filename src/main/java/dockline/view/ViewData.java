package dockline.view;

import dockline.arena.Action;
import dockline.model.Mission;
import java.util.List;
import java.util.Optional;

/**
 * Everything the window and the rendered picture show about one mission: the view's own narrow
 * model, so that drawing code never reaches into solver or certificate internals. Implementations
 * are immutable and may be read from any thread.
 *
 * <p>Cells are row-major indices ({@code y * width + x}) of the mission's map.
 */
public interface ViewData {

    /** {@link #chargeNeeded}: no starting charge at all lets the robot finish from there. */
    int IMPOSSIBLE = -1;
    /** {@link #chargeNeeded}: not known (a wall, or the mission was not solved). */
    int UNKNOWN = -2;

    /** The mission as solved (with the reserve floor and starting charge that were asked). */
    Mission mission();

    /** The verdict in words, with the certificate status. */
    VerdictSummary verdict();

    /** Whether there is a solution behind this data (heat map, policy, replays); not for a map or a run alone. */
    default boolean solved() {
        return false;
    }

    /**
     * The least battery level, in units, with which the robot standing on the cell can still be
     * sure to finish, given the disturbances left and the tasks already done; or {@link #IMPOSSIBLE}
     * or {@link #UNKNOWN}. {@link #UNKNOWN} everywhere for data without a charge-needed map.
     */
    default int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
        return UNKNOWN;
    }

    /**
     * The lower bound of the need where {@link #chargeNeeded} gives only an upper bound (enough charge, or
     * {@link #UNKNOWN} when no level is known to be enough); equal to {@link #chargeNeeded} where that is exact,
     * which is every position unless {@link #heatNote} says otherwise.
     */
    default int chargeNeededAtLeast(int cellIndex, int budgetLeft, int progressMask) {
        return chargeNeeded(cellIndex, budgetLeft, progressMask);
    }

    /**
     * What the charge-needed map claims, in a sentence, when it is not exact at every position (some needs are
     * known only as a range) or there is none for a solved mission; {@code null} when it is exact.
     */
    default String heatNote() {
        return null;
    }

    /** The policy's action in that situation, if the policy has one; none for data without a policy. */
    default Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
        return Optional.empty();
    }

    /**
     * The distinct actions the policy takes on the cell, at any battery level, with the given
     * disturbances left and tasks done; the most frequent first. Empty when the policy never
     * gets there in that situation.
     */
    default List<Action> policyActions(int cellIndex, int budgetLeft, int progressMask) {
        return List.of();
    }

    /**
     * The policy in threshold form (per situation, the levels where its move changes), for the
     * policy layer and its words; {@link PolicyRules#NONE} when there is no policy.
     */
    default PolicyRules policyRules() {
        return PolicyRules.NONE;
    }

    /** The runs to play: the worst case (if guaranteed), the counterexample (if not); none for a map alone. */
    default List<ViewReplay> replays() {
        return List.of();
    }

    /**
     * Plays a scenario with the given disturbances forced, if this data can do that.
     *
     * @throws IllegalArgumentException when an event cannot happen where it was put (message in words)
     */
    default Optional<ViewReplay> force(List<ScenarioEvent> events) {
        return Optional.empty();
    }

    /** Whether {@link #force} can run scenarios. */
    default boolean canForce() {
        return false;
    }
}
