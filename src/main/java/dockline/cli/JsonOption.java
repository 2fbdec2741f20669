package dockline.cli;

import picocli.CommandLine.Option;

/**
 * {@code --json} (a picocli mixin) on the commands whose JSON output is their result: {@code check},
 * {@code export} and {@code render}; one JSON object on standard output instead of the text, following its
 * schema in src/main/resources/dockline/schemas/. Commands whose JSON is something else (a summary, a
 * replay, the margins, messages) word their own {@code --json}.
 */
final class JsonOption {

    @Option(names = "--json", description = "print the result as one JSON object instead of the text")
    boolean requested;
}
