package dockline.cli;

import dockline.plan.PolicyChoice;
import picocli.CommandLine.Option;

/**
 * Which guaranteed policy to report (a picocli mixin), for the commands that choose a policy:
 * {@code check}, {@code export} and {@code replay}. Not for {@code margin}, whose answer does not
 * depend on it. The default is the safest policy ({@link PolicyChoice#SAFEST}).
 */
final class PolicyOption {

    @Option(names = "--fewest-moves",
            description = "use the policy that finishes in the fewest moves in the worst case at the mission's floor,"
                    + " instead of the default, the safest policy (whose worst case is the highest guaranteed floor;"
                    + " it may take more moves, for example to top up on a dock)")
    boolean fewestMoves;

    @Option(names = "--safest-policy",
            description = "accepted and ignored: the safest policy is the default (kept so that older scripts run)")
    boolean safestPolicy;

    /** The policy asked for. */
    PolicyChoice choice() {
        return fewestMoves ? PolicyChoice.FEWEST_MOVES : PolicyChoice.SAFEST;
    }

    /** Whether a policy option was given at all. */
    boolean given() {
        return fewestMoves || safestPolicy;
    }

    /** The option given, for messages. */
    String name() {
        return fewestMoves ? "--fewest-moves" : "--safest-policy";
    }
}
