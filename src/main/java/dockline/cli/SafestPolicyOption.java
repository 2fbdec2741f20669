package dockline.cli;

import picocli.CommandLine.Option;

/**
 * {@code --safest-policy} (a picocli mixin), for the commands that choose a policy: {@code check},
 * {@code export} and {@code replay}. Not for {@code margin}, whose answer does not depend on it.
 */
final class SafestPolicyOption {

    @Option(names = "--safest-policy",
            description = "use the policy that keeps the battery at or above the highest guaranteed floor (it may take"
                    + " more moves, for example to top up on a dock) instead of the one with the fewest moves")
    boolean on;
}
