package dockline.model;

import java.util.List;

/**
 * A named set of free cells (a room, an aisle, a wet-floor patch). Cells are kept sorted and
 * distinct.
 */
public record Zone(String name, List<Cell> cells) {

    public Zone {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("zone name must not be blank");
        }
        cells = Cell.sortedDistinct(cells);
    }

    public boolean contains(Cell c) {
        return java.util.Collections.binarySearch(cells, c) >= 0;
    }
}
