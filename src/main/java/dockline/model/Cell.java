package dockline.model;

/**
 * A grid cell: {@code x} is the column (0 = left), {@code y} the row (0 = top line of the plan).
 * Users see cells written as {@code x:y}.
 */
public record Cell(int x, int y) implements Comparable<Cell> {

    /** Row-major index of this cell in a plan of the given width. */
    public int index(int width) {
        return y * width + x;
    }

    /** The cell with the given row-major index. */
    public static Cell ofIndex(int index, int width) {
        return new Cell(index % width, index / width);
    }

    /**
     * The cells sorted (row-major) without repeats, as an unmodifiable list. Linear when they are
     * already in order (as the loader produces them), O(n log n) otherwise.
     */
    public static java.util.List<Cell> sortedDistinct(java.util.List<Cell> cells) {
        boolean ordered = true;
        for (int i = 1; i < cells.size() && ordered; i++) {
            ordered = cells.get(i - 1).compareTo(cells.get(i)) < 0;
        }
        return ordered ? java.util.List.copyOf(cells) : java.util.List.copyOf(cells.stream().distinct().sorted().toList());
    }

    @Override
    public int compareTo(Cell o) {
        return y != o.y ? Integer.compare(y, o.y) : Integer.compare(x, o.x);
    }

    @Override
    public String toString() {
        return x + ":" + y;
    }
}
