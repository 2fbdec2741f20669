package dockline.raster;

import dockline.model.Cell;
import java.util.List;

/**
 * What an import made: the map file's text and the figures of the summary.
 *
 * @param mapText          the whole map file (maps/README.md format)
 * @param width            cells per row
 * @param height           rows
 * @param pixelsPerCell    pixels per cell edge
 * @param levels           the grey levels used
 * @param freeInImage      cells whose pixels are all free
 * @param lostToFootprint  of those, cells the robot's footprint does not fit in (0 without a radius)
 * @param free             free cells of the map
 * @param areaSizes        the connected free areas' sizes, largest first
 * @param docks            the docks placed
 * @param warnings         sentences about things that may be a mistake
 */
public record ImportResult(String mapText, int width, int height, int pixelsPerCell, Thresholds.Levels levels,
                           int freeInImage, int lostToFootprint, int free, List<Integer> areaSizes, List<Cell> docks,
                           List<String> warnings) {

    public ImportResult {
        areaSizes = List.copyOf(areaSizes);
        docks = List.copyOf(docks);
        warnings = List.copyOf(warnings);
    }
}
