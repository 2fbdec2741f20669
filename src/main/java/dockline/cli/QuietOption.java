package dockline.cli;

import picocli.CommandLine.Option;

/**
 * {@code --quiet} (a picocli mixin) on the commands that solve ({@code check}, {@code export},
 * {@code margin}, {@code replay}, {@code render}): no progress line on standard error
 * ({@link ProgressLine}). Results and errors are printed as before.
 */
final class QuietOption {

    @Option(names = "--quiet", description = "show no progress on standard error (it is shown only on a terminal"
            + " and never with --json)")
    boolean quiet;
}
