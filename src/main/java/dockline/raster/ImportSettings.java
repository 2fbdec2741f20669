package dockline.raster;

import dockline.model.Cell;
import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;

/**
 * Everything an import is told, besides the image: each of it is recorded in the written map's
 * comment block.
 *
 * @param pixelSize  metres per pixel edge, more than 0
 * @param cellSize   metres per cell edge, a whole multiple of {@code pixelSize}
 * @param radius     the robot's radius in metres, or {@code null} for no footprint
 * @param thresholds how grey levels are classified
 * @param docks      cells to hold a charging dock, in map coordinates (x from the left, y from the top)
 * @param surface    the surface name of free cells (it needs a move energy in a mission's robot)
 * @param name       the map's {@code name}
 */
public record ImportSettings(BigDecimal pixelSize, BigDecimal cellSize, BigDecimal radius, Thresholds thresholds,
                             List<Cell> docks, String surface, String name) {

    public ImportSettings {
        Objects.requireNonNull(pixelSize, "pixelSize");
        Objects.requireNonNull(cellSize, "cellSize");
        Objects.requireNonNull(thresholds, "thresholds");
        Objects.requireNonNull(surface, "surface");
        Objects.requireNonNull(name, "name");
        docks = List.copyOf(docks);
    }

    /** The options as a command line would give them, every default written out. */
    public String asOptions() {
        StringBuilder sb = new StringBuilder();
        sb.append("--pixel-size ").append(Downsampler.plain(pixelSize));
        sb.append(" --cell-size ").append(Downsampler.plain(cellSize));
        sb.append(" --occupied-at-most ").append(thresholds.occupiedAtMost());
        sb.append(" --free-at-least ").append(thresholds.freeAtLeast());
        if (thresholds.invert()) {
            sb.append(" --invert");
        }
        if (radius != null) {
            sb.append(" --robot-radius ").append(Downsampler.plain(radius));
        }
        if (!docks.isEmpty()) {
            StringBuilder d = new StringBuilder();
            for (Cell c : docks) {
                d.append(d.length() == 0 ? "" : ";").append(c.x()).append(',').append(c.y());
            }
            sb.append(" --docks '").append(d).append('\'');
        }
        sb.append(" --surface ").append(surface);
        sb.append(" --name '").append(name.replace("'", "'\\''")).append('\'');
        return sb.toString();
    }
}
