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

    @Override
    public int compareTo(Cell o) {
        return y != o.y ? Integer.compare(y, o.y) : Integer.compare(x, o.x);
    }

    @Override
    public String toString() {
        return x + ":" + y;
    }
}
