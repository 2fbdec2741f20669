package dockline.bench;

/**
 * One measured (or skipped) method on one benchmark instance.
 *
 * @param size        side of the generated floor in cells (the floor is size × size)
 * @param instance    which mission on it: {@code reserve}, {@code consumption} or {@code discounted}
 * @param method      {@code attractor}, {@code compact}, {@code bfs}, {@code sweep}, {@code implicit},
 *                    {@code early}, {@code implicit-bfs}, {@code implicit-policy}, {@code fixpoint}, {@code vi} or {@code fast}
 *                    (see {@link Benchmark}), or a row of lasting door-shut events: {@code lasting}, {@code lasting-phased},
 *                    {@code lasting-known-phases}, {@code lasting-check} (see {@link LastingBench})
 * @param vertices    vertices of the graph the method worked on (for a skipped product method: the estimate)
 * @param edges       edges of that graph
 * @param buildMillis time to build that graph (0 when the method works on the arena directly)
 * @param solveMillis time to solve it, wall clock (best of the repetitions)
 * @param solveCpuMillis CPU time of the solving thread plus the garbage collector's pauses during the
 *                    same run (other processes taking the cores hardly change it; best of the
 *                    repetitions; -1 when the platform cannot tell)
 * @param peakBytes   highest heap use above the instance's baseline seen while the method ran
 *                    (sampled; includes garbage not yet collected); -1 when not measured
 * @param verdict     {@code guaranteed} or {@code not-guaranteed}; {@code null} for {@code bfs}
 *                    (a traversal, no verdict) and for skipped methods
 * @param wallMillis  time from the mission to the verdict: arena compile, build and solve (-1 when skipped)
 * @param estimatedVertices the product size estimated before the build by the main route
 *                    ({@code ProductGame.estimate}), or -1 when there is none
 * @param forecastVertices the product size forecast before the build by {@code ReserveSizeForecast},
 *                    or -1 when there is none
 * @param note        why a method was skipped, or a remark (e.g. how much the early exit explored)
 * @param momentaryCpuMillis for a row of lasting disturbances ({@link LastingBench}): the CPU time of the momentary
 *                    counterpart on the same instance, timed back to back with it in the same run (the ratio of the
 *                    issue's target is {@link #overMomentary()}); -1 for every other row
 */
public record BenchRow(int size, String instance, String method, long vertices, long edges, double buildMillis,
                       double solveMillis, double solveCpuMillis, long peakBytes, String verdict, double wallMillis, long estimatedVertices,
                       long forecastVertices, String note, double momentaryCpuMillis) {

    /** A row without a momentary counterpart. */
    public BenchRow(int size, String instance, String method, long vertices, long edges, double buildMillis,
                    double solveMillis, double solveCpuMillis, long peakBytes, String verdict, double wallMillis,
                    long estimatedVertices, long forecastVertices, String note) {
        this(size, instance, method, vertices, edges, buildMillis, solveMillis, solveCpuMillis, peakBytes, verdict,
                wallMillis, estimatedVertices, forecastVertices, note, -1);
    }

    /** The same row with its momentary counterpart's CPU time (a lasting row). */
    BenchRow withMomentary(double cpuMillis) {
        return new BenchRow(size, instance, method, vertices, edges, buildMillis, solveMillis, solveCpuMillis, peakBytes,
                verdict, wallMillis, estimatedVertices, forecastVertices, note, cpuMillis);
    }

    /** A lasting row's CPU time over its momentary counterpart's, both of one run; NaN for other rows. */
    public double overMomentary() {
        return ran() && momentaryCpuMillis > 0 && solveCpuMillis >= 0 ? solveCpuMillis / momentaryCpuMillis : Double.NaN;
    }

    /** Whether the method ran (rather than being skipped). */
    public boolean ran() {
        return solveMillis >= 0;
    }

    /** The solve time the ratios use: CPU time (thread + collector pauses) when known, else wall clock. */
    public double ratioMillis() {
        return solveCpuMillis >= 0 ? solveCpuMillis : solveMillis;
    }

    /** Edges handled per second during the solve (wall clock), in millions. */
    public double megaEdgesPerSecond() {
        return solveMillis > 0 ? edges / (solveMillis * 1000.0) : Double.NaN;
    }

    /** Peak heap per vertex of the graph. */
    public double bytesPerVertex() {
        return peakBytes >= 0 && vertices > 0 ? (double) peakBytes / vertices : Double.NaN;
    }

    static BenchRow skipped(int size, String instance, String method, long vertices, long edges, String why) {
        return new BenchRow(size, instance, method, vertices, edges, -1, -1, -1, -1, null, -1, vertices, -1, why);
    }

    /** A row as one short progress line (the full row is in the final table). */
    String compact() {
        return String.format(java.util.Locale.ROOT, "  %s: %s", method(), ran()
                ? String.format(java.util.Locale.ROOT, "%.1f ms%s", solveMillis(),
                        verdict() == null ? "" : ", " + verdict())
                : "skipped");
    }
}
