package dockline.bench;

import java.util.ArrayList;
import java.util.List;

/**
 * How the benchmark times a method: the best of a few runs by the wall clock and by the solving thread's CPU
 * time plus the collector's pauses (other processes on a shared machine hardly change the latter), with the heap
 * settled before each run outside the timing and the peak heap sampled during the first; short runs are repeated
 * until a small time budget is spent, and methods whose ratio is a target can be measured in interleaved rounds.
 * Common practice of micro-benchmarking on the JVM (warm-up elsewhere, best of several runs).
 */
final class Timing {

    private Timing() {
    }

    /** Something timed; its value is kept from the last run. */
    @FunctionalInterface
    interface Body<T> {
        T run();
    }

    /** The value of the last run, the best wall and CPU times over the runs, the peak heap of the first run. */
    record Timed<T>(T value, double millis, double cpuMillis, long peak) {
    }

    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    /**
     * CPU time of this thread plus the garbage collector's pauses so far, in ns (other processes on the
     * machine do not count); -1 when the platform cannot tell. Thread CPU time has nanosecond
     * resolution (process CPU time on Linux only clock ticks); the pauses are added because the
     * collector's work is done by its own threads.
     */
    private static long cpuNow() {
        if (!THREADS.isCurrentThreadCpuTimeSupported()) {
            return -1;
        }
        long gcMillis = 0;
        for (java.lang.management.GarbageCollectorMXBean gc
                : java.lang.management.ManagementFactory.getGarbageCollectorMXBeans()) {
            gcMillis += Math.max(0, gc.getCollectionTime());
        }
        return THREADS.getCurrentThreadCpuTime() + gcMillis * 1_000_000L;
    }

    /** A first run shorter than this is repeated (see {@link #time(HeapSampler, long, int, Body)}). */
    private static final double SHORT_RUN_MILLIS = 200;
    private static final int SHORT_RUN_REPS = 7;
    private static final int SHORT_RUN_MAX = 50;
    private static final double SHORT_RUN_BUDGET_MILLIS = 300;

    /** A run longer than this is not repeated (its time is stable enough, and the full run must stay short). */
    private static final double REPEAT_BELOW_MILLIS = 2_000;

    /**
     * Runs {@code body} up to {@code reps} times (once when the first run takes over
     * {@value #REPEAT_BELOW_MILLIS} ms); the heap is sampled during the first run, above {@code base}.
     */
    static <T> Timed<T> time(HeapSampler sampler, long base, int reps, Body<T> body) {
        double best = Double.MAX_VALUE;
        double bestCpu = Double.MAX_VALUE;
        long peak = -1;
        T value = null;
        // a method whose first run is under SHORT_RUN_MILLIS is run again until SHORT_RUN_BUDGET_MILLIS
        // have been spent on it (at least SHORT_RUN_REPS runs, at most SHORT_RUN_MAX): the best of three is
        // at the mercy of one collection or scheduling hiccup when a run takes a few milliseconds, and the
        // best of many is a stable estimate of the undisturbed time
        int tries = reps;
        double spent = 0;
        for (int r = 0; r < tries; r++) {
            if (r == 0) {
                // settled first, so that the peak is this method's and not also the garbage of the one before
                System.gc();
                sampler.start();
            } else if (r < reps) {
                // (the extra runs of a short method skip this: a collection costs more than such a run,
                // and the best of many runs leaves out the few a collection falls into)
                // Settle the heap between repetitions, outside the timing: without this a repetition starts
                // with the previous one's result still referenced and its garbage uncollected, and pays
                // (in the collector's pauses counted by cpuNow) for memory it did not allocate; the first
                // repetition already starts from the heap the caller settled. A method's own collections
                // during a repetition are still counted.
                value = null;
                System.gc();
            }
            long c0 = cpuNow();
            long t0 = System.nanoTime();
            value = body.run();
            double ms = (System.nanoTime() - t0) / 1e6;
            long c1 = cpuNow();
            if (r == 0) {
                peak = sampler.stop() - base;
            }
            best = Math.min(best, ms);
            bestCpu = Math.min(bestCpu, c0 < 0 ? -1 : (c1 - c0) / 1e6);
            spent += ms;
            if (r == 0 && ms < SHORT_RUN_MILLIS && reps > 1) {
                tries = SHORT_RUN_MAX;
            }
            if (tries == SHORT_RUN_MAX && r + 1 >= Math.max(reps, SHORT_RUN_REPS) && spent >= SHORT_RUN_BUDGET_MILLIS) {
                break;
            }
            if (ms > REPEAT_BELOW_MILLIS) {
                break;
            }
        }
        return new Timed<>(value, best, bestCpu, peak);
    }

    /**
     * Several methods whose ratio is a target, measured in {@code rounds} interleaved rounds: each round
     * runs every method once after settling the heap (a method whose run is under
     * {@value #SHORT_RUN_MILLIS} ms is run again within the round, until its share of
     * {@value #SHORT_RUN_BUDGET_MILLIS} ms is spent), so that a slow phase of a shared machine, which
     * lasts seconds, falls on every method alike instead of on whichever ran then. Per method: the best
     * times over all rounds, the peak heap of its first run (above the heap settled just before it) and
     * the value of its last run.
     */
    static List<Timed<Object>> timeInterleaved(HeapSampler sampler, int rounds, List<Body<?>> bodies) {
        int k = bodies.size();
        double[] best = new double[k];
        double[] bestCpu = new double[k];
        long[] peak = new long[k];
        Object[] value = new Object[k];
        java.util.Arrays.fill(best, Double.MAX_VALUE);
        java.util.Arrays.fill(bestCpu, Double.MAX_VALUE);
        int minRuns = Math.max(1, (SHORT_RUN_REPS + rounds - 1) / rounds);
        int maxRuns = Math.max(minRuns, SHORT_RUN_MAX / rounds);
        double budget = SHORT_RUN_BUDGET_MILLIS / rounds;
        for (int r = 0; r < rounds; r++) {
            for (int i = 0; i < k; i++) {
                value[i] = null;
                long base = HeapSampler.settledUsed();
                double spent = 0;
                for (int run = 0; run < maxRuns; run++) {
                    if (r == 0 && run == 0) {
                        sampler.start();
                    }
                    long c0 = cpuNow();
                    long t0 = System.nanoTime();
                    value[i] = bodies.get(i).run();
                    double ms = (System.nanoTime() - t0) / 1e6;
                    long c1 = cpuNow();
                    if (r == 0 && run == 0) {
                        peak[i] = sampler.stop() - base;
                    }
                    best[i] = Math.min(best[i], ms);
                    bestCpu[i] = Math.min(bestCpu[i], c0 < 0 ? -1 : (c1 - c0) / 1e6);
                    spent += ms;
                    if (ms >= SHORT_RUN_MILLIS || (run + 1 >= minRuns && spent >= budget)) {
                        break;
                    }
                }
            }
        }
        List<Timed<Object>> out = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            out.add(new Timed<>(value[i], best[i], bestCpu[i], peak[i]));
        }
        return out;
    }
}
