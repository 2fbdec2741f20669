package dockline.raster;

import java.util.List;

/** An image or an import option is not usable; carries every problem found (never empty). */
public final class RasterException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient List<RasterProblem> problems;

    public RasterException(List<RasterProblem> problems) {
        super(problems.isEmpty() ? "" : problems.get(0).format(), null, false, false);
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a RasterException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public RasterException(RasterProblem problem) {
        this(List.of(problem));
    }

    /** Every problem, in the order found. */
    public List<RasterProblem> problems() {
        return problems;
    }
}
