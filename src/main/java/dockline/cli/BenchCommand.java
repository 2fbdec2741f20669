package dockline.cli;

import dockline.bench.BenchReport;
import dockline.bench.Benchmark;
import dockline.bench.BuildingGenerator;
import dockline.bench.ResolutionBench;
import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code dockline bench}: measures every solving method on generated buildings of growing size in
 * one run and prints the table, the ratios and the targets; {@code --json} prints the same as JSON.
 * Exit 0 when every method agrees on every instance, 4 when any two disagree (an internal error).
 */
@Command(name = "bench",
        description = {"Measures the solving methods on generated buildings, from 32x32 up to 512x512 cells.",
                "In one run it prints product vertices and edges, build and solve time, edges per second, peak heap, and the ratios",
                "between methods. Every method must give the same verdict on an instance."},
        exitCodeList = {"0:all methods agree on every instance", "2:bad usage",
                "4:two methods disagree on an instance (internal error)"})
public final class BenchCommand extends CommandBase {

    @Option(names = "--quick", description = "a short run (under a minute on two cores): 32x32 to 128x128,"
            + " and the fast path on 512x512")
    boolean quick;

    @Option(names = "--json", description = "print the report as JSON on standard output (progress always goes to standard error)")
    boolean json;

    @Option(names = "--seed", paramLabel = "N", description = "seed of the generated buildings and missions (default: ${DEFAULT-VALUE})")
    long seed = 7;

    @Option(names = "--sizes", paramLabel = "SIDE", split = ",",
            description = "floor sides to run instead of the default series, e.g. 32,64 (each at least 32)")
    List<Integer> sizes;

    @Option(names = "--instances", paramLabel = "NAME", split = ",",
            description = "run only these instances (reserve, consumption, discounted), e.g. discounted;"
                    + " or patrol and/or deadline (their own rows and slope, on small floors);"
                    + " a development aid: the ratios between instances are then missing")
    List<String> instances;

    @Option(names = "--reading", description = "run only the reading section: 8 MiB map files on one line, in short"
            + " lines and in the longest lines read (reading must be linear in the file size)")
    boolean reading;
    @Option(names = "--resolution-row", description = "run only the row \"resolution independence\": the charging"
            + " route's full check on one generated floor (the first of --sizes, default 256) at 1,000 and 10,000 battery"
            + " levels; further --sizes: the full check at 1,000 levels once")
    boolean resolutionRow;
    @Option(names = "--lasting-row", description = "run only the rows \"lasting doors\" (the reserve instance with its"
            + " door-shut events lasting, against the momentary main route) on the sides from --sizes (default 32,64)")
    boolean lastingRow;

    @Option(names = "--view", description = "run only the view section: the map view, headless, on the bundled maps"
            + " (folder maps/) and a generated floor (side from --sizes, default 512): a full repaint and a replay step per map")
    boolean view;

    @Override
    int run(PrintWriter out, PrintWriter err) {
        if (view) {
            return ViewBenchRun.run(sizes, seed, json, out, err);
        }
        if (resolutionRow) {
            int side = sizes != null && !sizes.isEmpty() ? sizes.get(0) : 256;
            if (!sideOk(side, err)) {
                return ExitCodes.BAD_INPUT;
            }
            ResolutionBench.Row row = ResolutionBench.run(side, seed, 2, 3);
            out.print(row.toText());
            out.flush();
            // further sides: the full check at 1,000 levels once (e.g. --sizes 256,512)
            for (int i = 1; sizes != null && i < sizes.size(); i++) {
                int s = sizes.get(i);
                if (!inRange(s)) {
                    continue;
                }
                out.print(ResolutionBench.coarseText(s, ResolutionBench.coarseOnly(s, seed, 2)));
                out.flush();
            }
            return row.agree() ? ExitCodes.OK : ExitCodes.INTERNAL;
        }
        if (lastingRow) {
            List<Integer> sides = sizes != null && !sizes.isEmpty() ? sizes : List.of(32, 64);
            Benchmark.Config c = new Benchmark.Config(sides, List.of(), seed, 2, 3, 1, 8_000, 20_000_000L,
                    40_000_000L);
            for (dockline.bench.BenchRow r : new Benchmark(c, line -> {
                err.println(line);
                err.flush();
            }).lastingOnly()) {
                out.println(r.size() + "x" + r.size() + " " + r.method() + ": " + (r.ran() ? String.format(
                        java.util.Locale.ROOT, "%d product vertices (%s), solve %.1f ms CPU (%.1f ms wall), %s; ",
                        r.vertices(), r.method().equals("lasting") ? "reachable from the start"
                                : "numbered in the last round", r.solveCpuMillis(), r.solveMillis(), r.verdict())
                        : "") + r.note());
            }
            out.flush();
            return ExitCodes.OK;
        }
        if (reading) {
            dockline.bench.ReadingBench.Result r = dockline.bench.ReadingBench.run(3);
            out.print(json ? Json.readingJson(r) : r.toText());
            out.flush();
            return ExitCodes.OK;
        }
        Benchmark.Config base = quick ? Benchmark.Config.quick() : Benchmark.Config.full();
        if (sizes != null) {
            for (int s : sizes) {
                if (!sideOk(s, err)) {
                    return ExitCodes.BAD_INPUT;
                }
            }
        }
        if (instances != null && !instances.isEmpty() && dockline.bench.RoundsBench.INSTANCES.containsAll(instances)) {
            return RoundsBenchRun.run(sizes, instances, seed, json, out, err);
        }
        if (instances != null) {
            for (String i : instances) {
                if (!Benchmark.INSTANCES.contains(i)) {
                    err.println("dockline: --instances: '" + i + "' is not one of " + String.join(", ", Benchmark.INSTANCES)
                            + " (or patrol, deadline on their own)");
                    err.println("Try 'dockline bench --help'.");
                    err.flush();
                    return ExitCodes.BAD_INPUT;
                }
            }
        }
        Benchmark.Config config = new Benchmark.Config(sizes != null ? sizes : base.sizes(),
                sizes != null ? List.of() : base.fastOnlySizes(), seed, base.budget(),
                base.reps(), base.warmups(), base.sweepCapMillis(), base.maxProductVertices(),
                base.maxImplicitVertices(), instances != null && !instances.isEmpty() ? instances : Benchmark.INSTANCES);
        // progress in a compact form on standard error, so standard output has the table (or the JSON) once
        PrintWriter progress = err;
        progress.println(quick ? "dockline bench --quick" : "dockline bench (full run, up to ten minutes)");
        progress.flush();
        BenchReport report = new Benchmark(config, line -> {
            progress.println(line);
            progress.flush();
        }).run();
        if (json) {
            out.println(report.toJson());
        } else {
            out.print(report.toText());
        }
        out.flush();
        if (!report.mismatches().isEmpty()) {
            err.println("dockline: internal error: methods disagree on " + report.mismatches());
            err.flush();
            return ExitCodes.INTERNAL;
        }
        return ExitCodes.OK;
    }

    private static boolean inRange(int side) {
        return side >= BuildingGenerator.MIN_SIDE && side <= BuildingGenerator.MAX_SIDE;
    }

    /** Whether a floor side of --sizes is in range; if not, says so (exit 2 follows). */
    private static boolean sideOk(int side, PrintWriter err) {
        if (inRange(side)) {
            return true;
        }
        err.println("dockline: --sizes: " + side + " is outside " + BuildingGenerator.MIN_SIDE + ".."
                + BuildingGenerator.MAX_SIDE);
        err.println("Try 'dockline bench --help'.");
        err.flush();
        return false;
    }
}
