package dockline.io;

/** A 1-based line and column (in code points) in an input file. */
record Pos(int line, int column) {

    static final Pos START = new Pos(1, 1);

    Pos {
        line = Math.max(1, line);
        column = Math.max(1, column);
    }

    @Override
    public String toString() {
        return line + ":" + column;
    }
}
