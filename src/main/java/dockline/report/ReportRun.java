package dockline.report;

import dockline.util.ProgressListener;
import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Checks many missions for one report, several at once: a fixed pool of at most {@code threads} workers
 * (one per core by default), each mission on one worker through {@link MissionChecker}. The results come
 * back in the order of the inputs whatever order they finish in. Each game's memory budget is the default
 * one divided by the workers, so that the missions checked together fit in the heap.
 *
 * <p>Cost: the sum of the missions' checks divided by the workers, at best.
 */
public final class ReportRun {

    private ReportRun() {
    }

    /** A file that looks like a mission to the report: a YAML file whose first lines name a map. */
    static final String[] SUFFIXES = {".yaml", ".yml"};

    /**
     * The mission files of the arguments: a file as given, a folder as every mission file in it (YAML files
     * with a {@code map:} key, sorted by name; not recursive).
     *
     * @throws IllegalArgumentException with the message and hint when an argument is a folder without missions
     *                                  or does not exist
     */
    public static List<Path> missionFiles(List<Path> args) throws IOException {
        List<Path> out = new ArrayList<>();
        for (Path a : args) {
            if (Files.isDirectory(a, LinkOption.NOFOLLOW_LINKS)) {
                List<Path> in = new ArrayList<>();
                try (DirectoryStream<Path> ds = Files.newDirectoryStream(a)) {
                    for (Path p : ds) {
                        if (isMissionFile(p)) {
                            in.add(p);
                        }
                    }
                }
                if (in.isEmpty()) {
                    throw new IllegalArgumentException(a + ": the folder holds no mission files (hint: a mission is a"
                            + " .yaml file with a 'map:' key, see missions/README.md; give mission files or a folder"
                            + " of them)");
                }
                in.sort((x, y) -> x.getFileName().toString().compareTo(y.getFileName().toString()));
                out.addAll(in);
            } else {
                out.add(a); // a missing or unreadable file is reported as that mission's error
            }
        }
        return out;
    }

    private static boolean isMissionFile(Path p) {
        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean yaml = false;
        for (String s : SUFFIXES) {
            yaml |= n.endsWith(s);
        }
        if (!yaml || !Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
            return false;
        }
        try (var lines = Files.lines(p)) {
            // a map file has a plan, a mission names its map: a top-level key at the start of a line
            return lines.limit(400).anyMatch(l -> l.startsWith("map:"));
        } catch (IOException | java.io.UncheckedIOException e) {
            return true; // unreadable: listed, so that its error is reported rather than the file skipped
        }
    }

    /**
     * Checks the missions, at most {@code threads} at once.
     *
     * @param files    the mission files, in report order
     * @param threads  the most missions checked at once (at least 1)
     * @param pictures draws the map pictures
     * @param progress told, as a stage, each mission that is done (from a worker thread; one call at a time):
     *                 the per cent of the missions done and e.g. {@code [2/5] missions/a.yaml: guaranteed (812 ms)};
     *                 or null
     */
    public static List<MissionResult> check(List<Path> files, int threads, Pictures pictures,
                                            ProgressListener progress) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1");
        }
        int workers = Math.max(1, Math.min(threads, files.size()));
        long budget = Math.max(1L << 20, Runtime.getRuntime().maxMemory() / 2 / workers);
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "dockline-report");
            t.setDaemon(true);
            return t;
        });
        AtomicInteger finished = new AtomicInteger();
        Object lock = new Object();
        try {
            List<Future<MissionResult>> futures = new ArrayList<>();
            for (Path f : files) {
                futures.add(pool.submit(() -> {
                    long t0 = System.nanoTime();
                    MissionResult r = MissionChecker.check(f, budget, pictures);
                    if (progress != null) {
                        synchronized (lock) {
                            int done = finished.incrementAndGet();
                            progress.stage(done * 100 / files.size(), "[" + done + "/" + files.size() + "] " + r.file()
                                    + ": " + r.status().word() + " (" + (System.nanoTime() - t0) / 1_000_000L + " ms)");
                        }
                    }
                    return r;
                }));
            }
            List<MissionResult> out = new ArrayList<>();
            for (Future<MissionResult> fu : futures) {
                try {
                    out.add(fu.get());
                } catch (ExecutionException e) {
                    Throwable c = e.getCause();
                    if (c instanceof Error err) {
                        throw err;
                    }
                    throw new IllegalStateException("internal: a report worker failed: " + c, c);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IllegalStateException("interrupted", e);
                }
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * The exit code of the whole run: the highest of the missions' codes (0 all guaranteed, 1 some not, 2 bad
     * input, 3 over a resource limit, 4 internal error), whatever their order, as for several missions in
     * {@code check}. A code above 1 is a mission without a verdict, and the higher one takes more than editing
     * an input to clear, so it is not hidden behind a bad file elsewhere (README.md, "Exit codes"). O(missions).
     */
    public static int exitCode(List<MissionResult> results) {
        int code = 0;
        for (MissionResult r : results) {
            code = Math.max(code, r.status().exitCode());
        }
        return code;
    }
}
