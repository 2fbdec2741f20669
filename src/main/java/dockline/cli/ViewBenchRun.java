package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.bench.BuildingGenerator;
import dockline.io.InputException;
import dockline.io.MapLoader;
import dockline.model.BuildingMap;
import dockline.view.ViewBench;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * {@code dockline bench --view}: the view benchmark ({@link ViewBench}) on the bundled maps in
 * {@code maps/} and on generated floors, as a table or JSON ({@code bench.schema.json}, the view form).
 */
final class ViewBenchRun {

    /** The row the 50 ms per step target of issue 17 applies to. */
    static final String RESEARCH_BLOCK = "research-block";

    private ViewBenchRun() {
    }

    static int run(List<Integer> sizes, long seed, boolean json, PrintWriter out, PrintWriter err) {
        List<Integer> sides = sizes != null && !sizes.isEmpty() ? sizes : List.of(512);
        for (int s : sides) {
            if (s < BuildingGenerator.MIN_SIDE || s > 1024) {
                err.println("dockline: --sizes: " + s + " is outside " + BuildingGenerator.MIN_SIDE + "..1024 for --view");
                err.println("Try 'dockline bench --help'.");
                err.flush();
                return ExitCodes.BAD_INPUT;
            }
        }
        List<ViewBench.Input> maps = new ArrayList<>();
        Path folder = Path.of("maps");
        if (Files.isDirectory(folder)) {
            try (Stream<Path> files = Files.list(folder)) {
                for (Path p : files.filter(f -> f.getFileName().toString().endsWith(".yaml")).sorted().toList()) {
                    BuildingMap m = MapLoader.load(p);
                    String name = p.getFileName().toString();
                    maps.add(new ViewBench.Input(name.substring(0, name.length() - ".yaml".length()), m));
                }
            } catch (InputException | IOException e) {
                err.println("dockline: the bundled maps could not be read: " + e.getMessage());
                err.flush();
                return ExitCodes.BAD_INPUT;
            }
        } else {
            err.println("dockline bench --view: no folder maps/ here; only the generated floors are measured");
        }
        for (int s : sides) {
            maps.add(new ViewBench.Input("generated-" + s, BuildingGenerator.generate(s, seed, 2)));
        }
        err.println("dockline bench --view: " + maps.size() + " maps, headless");
        err.flush();
        ViewBench.Result r;
        try {
            r = ViewBench.run(maps, 900, 640, 5, 40, RESEARCH_BLOCK);
        } catch (Exception e) {
            err.println("dockline: internal error: the view benchmark failed: " + e);
            err.flush();
            return ExitCodes.INTERNAL;
        }
        out.print(json ? toJson(r) : toText(r));
        out.flush();
        return ExitCodes.OK;
    }

    static String toText(ViewBench.Result r) {
        StringBuilder sb = new StringBuilder();
        sb.append("View (headless, 900x640 view, fitted zoom; best of 40 steps and of 5 full repaints after a warm-up)\n\n");
        sb.append("| map | cells | cell px | steps | open ms | full repaint ms | step ms | step / full | static tiles in steps"
                + " | policy step ms |\n");
        sb.append("|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|\n");
        for (ViewBench.Row row : r.rows()) {
            sb.append(String.format(Locale.ROOT, "| %s | %dx%d | %.1f | %d | %.1f | %.1f | %.2f | %.3f | %d | %.2f |%n",
                    row.map(), row.width(), row.height(), row.cellPx(), row.replaySteps(), row.openMillis(),
                    row.viewFullRepaintMillis(), row.viewStepMillis(), row.viewStepOverFullRepaint(),
                    row.staticTilesDuringSteps(), row.viewPolicyStepMillis()));
        }
        sb.append('\n');
        for (String t : r.targets()) {
            sb.append("* ").append(t).append('\n');
        }
        sb.append('\n');
        for (String c : dockline.report.Caveats.LINES) {
            sb.append(c).append('\n');
        }
        return sb.toString();
    }

    static String toJson(ViewBench.Result r) {
        ObjectNode o = Json.object();
        ArrayNode rows = o.putArray("view");
        for (ViewBench.Row row : r.rows()) {
            rows.add(Json.record(row)); // the record's components are the schema's keys
        }
        ArrayNode t = o.putArray("targets");
        r.targets().forEach(t::add);
        o.put("met", r.met());
        o.put("totalMillis", r.totalMillis());
        return Json.withCaveats(o) + System.lineSeparator();
    }
}
