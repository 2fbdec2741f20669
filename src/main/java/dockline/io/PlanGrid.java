package dockline.io;

import dockline.model.Cell;
import dockline.model.Terrain;
import java.util.List;
import java.util.Map;

/** The plan's rows, where each row sits in the file, and what is known about each cell. */
final class PlanGrid {
    final List<String> rows;
    final int width;
    final int height;
    /** File line of each row. */
    final int[] rowLine;
    /** Column of each row's first character, or 0 when it could not be located exactly. */
    final int[] rowColumn;
    /** Some cells have characters the legend does not know (or the legend is broken). */
    boolean incomplete;
    /** The legend as a table indexed by character (no boxing in the per-cell loops). */
    final Terrain[] table = new Terrain[65536];
    private final Map<Character, Terrain> legend;

    PlanGrid(List<String> rows, int width, int[] rowLine, int[] rowColumn, Map<Character, Terrain> legend) {
        this.rows = rows;
        this.height = rows.size();
        this.width = width;
        this.rowLine = rowLine;
        this.rowColumn = rowColumn;
        this.legend = legend;
        if (legend != null) {
            legend.forEach((c, t) -> table[c] = t);
        }
    }

    boolean inside(Cell c) {
        return c.x() >= 0 && c.y() >= 0 && c.x() < width && c.y() < height;
    }

    /** The terrain of a cell, or {@code null} when unknown. */
    Terrain at(Cell c) {
        if (legend == null || !inside(c) || c.x() >= rows.get(c.y()).length()) {
            return null;
        }
        return table[rows.get(c.y()).charAt(c.x())];
    }

    String describeSize() {
        return width + " x " + height + " cells: x from 0 to " + (width - 1) + ", y from 0 to " + (height - 1);
    }
}
