package dockline.replay;

import dockline.model.Worded;
import java.util.List;

/**
 * A replayed run of the robot against one sequence of disturbance choices.
 *
 * @param kind         which replay this is
 * @param steps        the rows, start first
 * @param ending       how the run ends
 * @param minimumUnits the lowest battery level of the run (start included)
 * @param floorUnits   the reserve floor the run is judged against
 * @param explanation  plain-words lines: what happened and why
 */
public record Replay(Kind kind, List<ReplayStep> steps, Ending ending, int minimumUnits, int floorUnits,
                     List<String> explanation) {

    public Replay {
        steps = List.copyOf(steps);
        explanation = List.copyOf(explanation);
    }

    /** Which replay. */
    public enum Kind implements Worded {
        /** Certified policy, disturbance choices that drive the battery lowest. */
        WORST,
        /** Certified policy, no events. */
        NOMINAL,
        /** Certified policy, events named by the user. */
        FORCED,
        /** Not guaranteed: the disturbance's winning strategy against the robot's best effort. */
        COUNTEREXAMPLE;
    }

    /** How a run ends. */
    public enum Ending implements Worded {
        /** All tasks done and on a dock (when required). */
        COMPLETE,
        /** The battery fell below the reserve floor at the last step. */
        BELOW_FLOOR,
        /** The last step put the robot into an avoided zone. */
        AVOIDED_ZONE,
        /** The last step returned to an earlier situation: the disturbance can repeat this forever. */
        REPEATS,
        /** The policy has no action for the situation reached. */
        NO_POLICY;
    }

    /** The last row. */
    public ReplayStep last() {
        return steps.get(steps.size() - 1);
    }
}
