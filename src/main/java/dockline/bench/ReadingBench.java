package dockline.bench;

import dockline.io.InputException;
import dockline.io.MapLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The reading benchmark: the map loader on 8 MiB of input laid out three ways (short lines; one
 * line; lines of 64 Ki characters, the longest read) to show that reading is linear in the file size
 * whatever the line lengths. The YAML scanner's cost per token grows with the length of its line, so
 * lines over the limit are refused after one pass; the last layout is the worst case still parsed.
 * Each figure is the best of a few runs; the target is every layout within 2x of short lines.
 */
public final class ReadingBench {

    /** About 8 MiB: just under the loader's file limit. */
    static final int SIZE = (8 << 20) - 4096;

    /** One layout: its name, size, lines, best time and what the loader made of it. */
    public record Row(String layout, long bytes, int lines, double bestMillis, String outcome) {
    }

    /** The rows, and the slowest layout's time over that of short lines. */
    public record Result(List<Row> rows, double worstRatio) {

        public boolean met() {
            return worstRatio <= 2.0;
        }

        public String toText() {
            StringBuilder sb = new StringBuilder("Reading (map loader, 8 MiB of input, best of runs):\n");
            for (Row r : rows) {
                sb.append(String.format(Locale.ROOT, "  %-26s %9d bytes %7d lines %9.1f ms  %s%n", r.layout(), r.bytes(),
                        r.lines(), r.bestMillis(), r.outcome()));
            }
            sb.append(String.format(Locale.ROOT, "  slowest layout / short lines: %.2f (target <= 2: %s)%n", worstRatio,
                    met() ? "met" : "NOT met"));
            return sb.toString();
        }
    }

    private ReadingBench() {
    }

    /** Short lines of keys and values (72 bytes each). */
    static byte[] shortLines() {
        StringBuilder sb = new StringBuilder(SIZE + 100);
        for (int i = 0; sb.length() + 72 <= SIZE; i++) {
            sb.append(String.format(Locale.ROOT, "k%07d: abcdefghijklmnopqrstuvwxyz0123456789abcdefghijklmnopqrstu%n", i));
        }
        return sb.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** The same size on one line: a name of 8 MiB. */
    static byte[] oneLine() {
        return ("name: " + "a".repeat(SIZE - 7) + "\n").getBytes(StandardCharsets.US_ASCII);
    }

    /** Lines of 65 000 characters, each a key with a quoted value (just under the line limit). */
    static byte[] longLines() {
        StringBuilder sb = new StringBuilder(SIZE + 70_000);
        String value = "v".repeat(65_000 - 12);
        for (int i = 0; sb.length() + 65_001 <= SIZE; i++) {
            sb.append(String.format(Locale.ROOT, "k%06d: \"", i)).append(value).append("\"\n");
        }
        return sb.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** Runs each layout {@code reps} times (after one warm-up run of each) and keeps the best. */
    public static Result run(int reps) {
        List<String> names = List.of("short lines (72 B)", "one line", "long lines (65 000 B)");
        List<byte[]> inputs = List.of(shortLines(), oneLine(), longLines());
        List<Row> rows = new ArrayList<>();
        for (int k = 0; k < inputs.size(); k++) {
            load(inputs.get(k)); // warm-up: the parser's code compiled
        }
        for (int k = 0; k < inputs.size(); k++) {
            byte[] in = inputs.get(k);
            double best = Double.MAX_VALUE;
            String outcome = "";
            for (int r = 0; r < Math.max(1, reps); r++) {
                long t0 = System.nanoTime();
                outcome = load(in);
                best = Math.min(best, (System.nanoTime() - t0) / 1e6);
            }
            int lines = 0;
            for (byte b : in) {
                lines += b == '\n' ? 1 : 0;
            }
            rows.add(new Row(names.get(k), in.length, lines, best, outcome));
        }
        double base = rows.get(0).bestMillis();
        double worst = 0;
        for (Row r : rows) {
            worst = Math.max(worst, r.bestMillis() / base);
        }
        return new Result(rows, worst);
    }

    private static String load(byte[] content) {
        try {
            MapLoader.load(Path.of("reading-bench.yaml"), content);
            return "read";
        } catch (InputException e) {
            String first = e.problems().get(0).message();
            return "refused (" + e.problems().size() + " problems; first: "
                    + (first.length() > 60 ? first.substring(0, 60) + "..." : first) + ")";
        }
    }
}
