package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.bench.RoundsBench;
import dockline.solve.ProductOptions;
import java.io.PrintWriter;
import java.util.List;

/** {@code dockline bench --instances patrol,deadline}: the rows of {@link RoundsBench} and their slopes. */
final class RoundsBenchRun {

    /** Floors of the default run: small, as the stored product needs tens of bytes per vertex. */
    static final List<Integer> SIDES = List.of(32, 40, 48, 56, 64);

    private RoundsBenchRun() {
    }

    static int run(List<Integer> sizes, List<String> instances, long seed, boolean json, PrintWriter out,
                   PrintWriter err) {
        List<Integer> sides = sizes != null ? sizes : SIDES;
        for (int s : sides) {
            if (s < dockline.bench.BuildingGenerator.MIN_SIDE || s > 256) {
                err.println("dockline: --sizes: " + s + " is outside " + dockline.bench.BuildingGenerator.MIN_SIDE
                        + "..256 for the patrol and deadline rows");
                return ExitCodes.BAD_INPUT;
            }
        }
        err.println("dockline bench: patrol and deadline rows on " + sides);
        err.flush();
        List<RoundsBench.Row> rows;
        try {
            rows = RoundsBench.run(sides, instances, seed, 2, 3, ProductOptions.defaultMemoryBudget(), line -> {
                err.println(line);
                err.flush();
            });
        } catch (RuntimeException | OutOfMemoryError e) {
            err.println("dockline: bench: " + e.getMessage());
            return ExitCodes.RESOURCE_LIMIT;
        }
        if (json) {
            ObjectNode o = Json.object();
            ArrayNode a = o.putArray("rows");
            for (RoundsBench.Row r : rows) {
                ObjectNode x = a.addObject();
                x.put("size", r.side());
                x.put("instance", r.instance());
                x.put("productVertices", r.vertices());
                x.put("productEdges", r.edges());
                x.put("millis", r.millis());
                x.put("verdict", r.verdict());
            }
            ObjectNode slopes = o.putObject("slopes");
            for (String i : instances) {
                double s = RoundsBench.slope(rows, i);
                if (Double.isNaN(s)) {
                    slopes.putNull(i);
                } else {
                    slopes.put(i, Math.round(s * 100) / 100.0);
                }
            }
            out.println(o.toPrettyString());
        } else {
            out.print(RoundsBench.table(rows, instances));
        }
        out.flush();
        return ExitCodes.OK;
    }
}
