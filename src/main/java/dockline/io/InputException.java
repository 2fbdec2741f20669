package dockline.io;

import java.util.List;

/**
 * An input file (a map or a mission, or the map a mission names) is not valid. Carries every
 * problem found in one run, sorted by file and position; never empty.
 */
public final class InputException extends Exception {

    private final transient List<Problem> problems;

    public InputException(List<Problem> problems) {
        super(message(problems));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("an InputException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public InputException(Problem problem) {
        this(List.of(problem));
    }

    /** Every problem, in the order they should be shown. */
    public List<Problem> problems() {
        return problems;
    }

    /** All problems, one {@link Problem#format()} line each. */
    public String formatAll() {
        return message(problems);
    }

    private static String message(List<Problem> problems) {
        StringBuilder sb = new StringBuilder();
        for (Problem p : problems) {
            if (sb.length() > 0) {
                sb.append(System.lineSeparator());
            }
            sb.append(p.format());
        }
        return sb.toString();
    }
}
