package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.model.Cell;
import dockline.raster.Downsampler;
import dockline.raster.GreyImage;
import dockline.raster.ImportResult;
import dockline.raster.ImportSettings;
import dockline.raster.ImportRequest;
import dockline.raster.RasterException;
import dockline.raster.RasterProblem;
import dockline.raster.SourceImage;
import dockline.raster.Thresholds;
import dockline.report.Caveats;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline import IMAGE --pixel-size M --cell-size M --out MAP.yaml}: turns an occupancy
 * image (PGM, PBM or PNG) into a map file (see {@link Importer} for the steps) and prints a
 * summary: free cells, cells lost to the robot's footprint, connected free areas and the docks.
 * Every option is checked before the image is read, the image before anything is written, and the
 * map is written atomically; on any problem nothing is written (exit 2).
 */
@Command(name = "import",
        description = {"Turns an occupancy image (PGM P2/P5, PBM P1/P4 or PNG; dark = occupied, light = free) into a map.",
                "A cell is free only if every pixel in it is free (unknown counts as occupied).",
                "With --robot-radius, cells whose centre is closer than the radius to an obstacle become walls.",
                "No zones or doors are added; see maps/README.md, \"Imported maps\"."},
        exitCodeList = {"0:map written", "2:bad image, option or output path (nothing written)"})
public final class ImportCommand extends CommandBase {

    @Parameters(index = "0", paramLabel = "IMAGE", description = "the occupancy image (PGM, PBM or PNG; told by its content)")
    Path image;

    @Option(names = "--pixel-size", required = true, paramLabel = "M", description = "edge of one pixel in metres, e.g. 0.05")
    String pixelSize;

    @Option(names = "--cell-size", required = true, paramLabel = "M",
            description = "edge of one map cell in metres: a whole multiple of the pixel size, at most 1000")
    String cellSize;

    @Option(names = "--robot-radius", paramLabel = "M",
            description = "the robot's radius in metres: cells whose centre is closer to an obstacle become walls")
    String robotRadius;

    @Option(names = "--docks", paramLabel = "x,y;...",
            description = "cells (in map cells, from the top-left, from 0) that hold a charging dock, e.g. '2,3;40,12'")
    String docks;

    @Option(names = "--occupied-at-most", paramLabel = "LEVEL", defaultValue = Thresholds.DEFAULT_OCCUPIED,
            description = "pixels at or below this grey level are occupied: a level (60) or %% of the image's"
                    + " maxval (default: ${DEFAULT-VALUE})")
    String occupiedAtMost;

    @Option(names = "--free-at-least", paramLabel = "LEVEL", defaultValue = Thresholds.DEFAULT_FREE,
            description = "pixels at or above this grey level are free; between the two they are unknown (default:"
                    + " ${DEFAULT-VALUE})")
    String freeAtLeast;

    @Option(names = "--invert", description = "the image is light where it is occupied (levels are read as maxval - level)")
    boolean invert;

    @Option(names = "--surface", paramLabel = "NAME", defaultValue = "floor",
            description = "surface name of the free cells (missions need a move energy for it) (default: ${DEFAULT-VALUE})")
    String surface;

    @Option(names = "--name", paramLabel = "TEXT", description = "the map's name (default: the image's file name)")
    String name;

    @Option(names = "--out", required = true, paramLabel = "MAP.yaml", description = "the map file to write")
    Path out;

    @Option(names = "--json", description = "print the summary as one JSON object instead of the text")
    boolean json;

    @Override
    int run(PrintWriter outw, PrintWriter err) {
        List<String> bad = new ArrayList<>();
        ImportRequest request = new ImportRequest(image, pixelSize, cellSize, robotRadius, docks, occupiedAtMost,
                freeAtLeast, invert, surface, name);
        ImportSettings settings = request.settings(bad);
        String outWhy = request.outputProblem(out);
        if (outWhy != null) {
            bad.add("--out " + (out.toString().isEmpty() ? "''" : out) + ": " + outWhy);
        }
        if (!bad.isEmpty()) {
            for (String b : bad) {
                err.println("dockline import: " + b);
            }
            return done(outw, err, ExitCodes.BAD_INPUT, List.of(), bad);
        }
        ImportRequest.Done done;
        try {
            done = ImportRequest.run(image, settings, out);
        } catch (RasterException e) {
            for (RasterProblem p : e.problems()) {
                err.println(p.format());
            }
            return done(outw, err, ExitCodes.BAD_INPUT, e.problems(), List.of());
        } catch (IOException e) {
            String msg = "--out " + out + ": cannot write the map: " + e.getMessage();
            err.println("dockline import: " + msg);
            return done(outw, err, ExitCodes.BAD_INPUT, List.of(), List.of(msg));
        }
        SourceImage src = done.source();
        ImportResult result = done.result();
        BigDecimal cell = settings.cellSize();
        BigDecimal radius = settings.radius();
        if (json) {
            outw.println(Json.withCaveats(toJson(src, result, cell, radius)));
        } else {
            printSummary(outw, src, result, cell, radius);
        }
        outw.flush();
        err.flush();
        return ExitCodes.OK;
    }

    private int done(PrintWriter outw, PrintWriter err, int code, List<RasterProblem> problems, List<String> optionProblems) {
        if (json) {
            ObjectNode root = Json.object();
            root.put("imported", false);
            ArrayNode arr = root.putArray("problems");
            for (RasterProblem p : problems) {
                ObjectNode po = arr.addObject();
                po.put("file", p.file().toString());
                if (p.line() > 0) {
                    po.put("line", p.line());
                    po.put("column", p.column());
                }
                po.put("message", p.message());
                po.put("hint", p.hint());
            }
            for (String s : optionProblems) {
                arr.addObject().put("message", s);
            }
            outw.println(Json.withCaveats(root));
        }
        outw.flush();
        err.flush();
        return code;
    }

    private void printSummary(PrintWriter o, SourceImage src, ImportResult r, BigDecimal cell, BigDecimal radius) {
        GreyImage img = src.image();
        o.println("imported " + image + " (" + img.format() + ", " + img.width() + " x " + img.height() + " pixels, maxval "
                + img.maxval() + ") into " + out);
        o.println("map: " + r.width() + " x " + r.height() + " cells of " + Downsampler.plain(cell) + " m (" + r.pixelsPerCell()
                + " x " + r.pixelsPerCell() + " pixels each); occupied at or below grey " + r.levels().occupiedAtMost()
                + ", free at or above " + r.levels().freeAtLeast() + (invert ? " (inverted)" : "") + ", unknown between");
        o.println("free cells: " + r.free() + " (" + r.freeInImage() + " free in the image, " + r.lostToFootprint()
                + " lost to the robot's footprint" + (radius == null ? ": no --robot-radius given" : " of radius "
                + Downsampler.plain(radius) + " m") + ")");
        List<Integer> sizes = r.areaSizes();
        o.println("connected free areas: " + sizes.size() + " (largest " + sizes.get(0) + " cells"
                + (sizes.size() > 1 ? "; the others " + joinSizes(sizes.subList(1, sizes.size())) : "") + ")");
        if (!r.docks().isEmpty()) {
            StringBuilder d = new StringBuilder();
            for (Cell c : r.docks()) {
                d.append(d.length() == 0 ? "" : ", ").append(c.x()).append(':').append(c.y());
            }
            o.println("docks: " + d);
        }
        for (String w : r.warnings()) {
            o.println("warning: " + w);
        }
        o.println("The map has no zones or doors: add them by hand (maps/README.md) and check it with 'dockline validate "
                + out + "'.");
        o.println(Caveats.block());
    }

    private static String joinSizes(List<Integer> sizes) {
        StringBuilder sb = new StringBuilder();
        int shown = Math.min(sizes.size(), 10);
        for (int i = 0; i < shown; i++) {
            sb.append(i == 0 ? "" : ", ").append(sizes.get(i));
        }
        if (sizes.size() > shown) {
            sb.append(" and ").append(sizes.size() - shown).append(" more");
        }
        return sb.toString();
    }

    private ObjectNode toJson(SourceImage src, ImportResult r, BigDecimal cell, BigDecimal radius) {
        GreyImage img = src.image();
        ObjectNode o = Json.object();
        o.put("imported", true);
        o.put("image", image.toString());
        o.put("format", img.format());
        o.put("imageWidth", img.width());
        o.put("imageHeight", img.height());
        o.put("maxval", img.maxval());
        o.put("sha256", src.sha256());
        o.put("out", out.toString());
        o.put("width", r.width());
        o.put("height", r.height());
        o.put("cellSize", cell.stripTrailingZeros());
        o.put("pixelsPerCell", r.pixelsPerCell());
        o.put("occupiedAtMost", r.levels().occupiedAtMost());
        o.put("freeAtLeast", r.levels().freeAtLeast());
        o.put("invert", invert);
        if (radius != null) {
            o.put("robotRadius", radius.stripTrailingZeros());
        }
        o.put("freeCells", r.free());
        o.put("freeInImage", r.freeInImage());
        o.put("lostToFootprint", r.lostToFootprint());
        o.put("areas", r.areaSizes().size());
        r.areaSizes().forEach(o.putArray("areaSizes")::add);
        ArrayNode d = o.putArray("docks");
        for (Cell c : r.docks()) {
            d.addArray().add(c.x()).add(c.y());
        }
        o.put("docksInLargestArea", r.warnings().stream().noneMatch(w -> w.contains("not connected to the largest")));
        r.warnings().forEach(o.putArray("warnings")::add);
        return o;
    }
}
