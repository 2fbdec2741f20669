package dockline.raster;

import dockline.io.MapLoader;
import dockline.model.Cell;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Turns an occupancy image into a dockline map: pixels are classified by grey level
 * ({@link Thresholds}), down-sampled conservatively to cells ({@link Downsampler}: a cell is free
 * only if every pixel in it is free), cells the robot's footprint does not fit in become walls
 * ({@link Footprint}), docks are placed, the connected free areas are counted ({@link FreeAreas})
 * and the map is written ({@link MapText}). No zones and no doors are invented.
 *
 * <p>Cost: linear in the number of pixels and cells.
 */
public final class Importer {

    private Importer() {
    }

    /**
     * Imports the image.
     *
     * @throws RasterException with every problem of the settings against this image (sizes, docks)
     */
    public static ImportResult run(SourceImage src, ImportSettings s) throws RasterException {
        GreyImage img = src.image();
        List<RasterProblem> problems = new ArrayList<>();
        Thresholds.Levels levels;
        try {
            levels = s.thresholds().levels(img.maxval());
        } catch (IllegalArgumentException e) {
            throw new RasterException(RasterProblem.of(src.file(), e.getMessage(), "the image's maxval is " + img.maxval()));
        }
        int k = Downsampler.factor(s.pixelSize(), s.cellSize());
        int w = Downsampler.cellsFor(img.width(), k);
        int h = Downsampler.cellsFor(img.height(), k);
        if (w > MapLoader.MAX_SIDE || h > MapLoader.MAX_SIDE) {
            throw new RasterException(RasterProblem.of(src.file(), "the map would be " + w + " x " + h + " cells, more than "
                    + MapLoader.MAX_SIDE + " on a side", "choose a larger --cell-size (now " + k + " pixels a cell)"));
        }
        byte[] classes = new byte[img.samples().length];
        for (int i = 0; i < classes.length; i++) {
            classes[i] = levels.classify(img.samples()[i]);
        }
        boolean[] inImage = Downsampler.freeCells(classes, img.width(), img.height(), k, w, h);
        boolean[] free = inImage;
        if (s.radius() != null) {
            BigDecimal across = s.cellSize().multiply(BigDecimal.valueOf(Math.min(w, h)));
            if (s.radius().add(s.radius()).compareTo(across) > 0) {
                throw new RasterException(RasterProblem.of(src.file(), "the robot (radius " + Downsampler.plain(s.radius())
                        + " m) is wider than the whole map (" + Downsampler.plain(s.cellSize().multiply(BigDecimal.valueOf(w)))
                        + " x " + Downsampler.plain(s.cellSize().multiply(BigDecimal.valueOf(h))) + " m)",
                        "--robot-radius is in metres, like --pixel-size and --cell-size"));
            }
            free = Footprint.apply(inImage, w, h, s.radius(), s.cellSize());
        }
        int freeInImage = count(inImage);
        int freeCount = count(free);
        for (Cell d : s.docks()) {
            if (d.x() < 0 || d.y() < 0 || d.x() >= w || d.y() >= h) {
                problems.add(RasterProblem.of(src.file(), "dock " + d.x() + ":" + d.y() + " is outside the map of " + w + " x "
                        + h + " cells", "x is 0 to " + (w - 1) + " and y 0 to " + (h - 1) + ", counted in cells from the"
                        + " top-left corner"));
            } else if (!inImage[d.y() * w + d.x()]) {
                problems.add(RasterProblem.of(src.file(), "dock " + d.x() + ":" + d.y() + " is on an occupied cell: pixels "
                        + d.x() * k + ".." + (Math.min((d.x() + 1) * k, img.width()) - 1) + " by " + d.y() * k + ".."
                        + (Math.min((d.y() + 1) * k, img.height()) - 1) + " are not all free",
                        "put the dock on a free cell, or check the thresholds and --invert"));
            } else if (!free[d.y() * w + d.x()]) {
                problems.add(RasterProblem.of(src.file(), "dock " + d.x() + ":" + d.y() + " is on a cell the robot does not"
                        + " fit in (closer than " + Downsampler.plain(s.radius()) + " m to an obstacle)",
                        "put the dock further from walls, or check --robot-radius"));
            }
        }
        if (freeCount == 0) {
            problems.add(RasterProblem.of(src.file(), "no free cell is left (" + freeInImage + " free in the image, "
                    + (freeInImage - freeCount) + " lost to the robot's footprint)",
                    "check the thresholds (--occupied-at-most, --free-at-least), --invert, the cell size and the radius"));
        }
        if (!problems.isEmpty()) {
            throw new RasterException(problems);
        }
        FreeAreas.Result areas = FreeAreas.of(free, w, h);
        List<String> warnings = new ArrayList<>();
        if (s.docks().isEmpty()) {
            warnings.add("no docks were placed (--docks): a mission that finishes on a dock needs one");
        }
        for (Cell d : s.docks()) {
            int a = areas.label()[d.y() * w + d.x()];
            if (a != 0) {
                warnings.add("dock " + d.x() + ":" + d.y() + " is in a free area of " + areas.sizes()[a]
                        + " cells, not connected to the largest free area (" + areas.sizes()[0] + " cells)");
            }
        }
        List<Integer> sizes = new ArrayList<>();
        for (int z : areas.sizes()) {
            sizes.add(z);
        }
        String text = MapText.write(src, s, levels, k, w, h, inImage, free, freeInImage - freeCount);
        return new ImportResult(text, w, h, k, levels, freeInImage, freeInImage - freeCount, freeCount, sizes, s.docks(),
                warnings);
    }

    private static int count(boolean[] b) {
        int n = 0;
        for (boolean x : b) {
            if (x) {
                n++;
            }
        }
        return n;
    }
}
