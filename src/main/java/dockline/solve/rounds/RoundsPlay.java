package dockline.solve.rounds;

/**
 * One play of a patrol or a deadline mission, turn by turn, as replays show it: row 0 is the start, row i
 * the situation after the i-th turn. A patrol's play is a lasso: rows {@code loopStart ..} repeat for ever
 * (the row after the last is row {@code loopStart} again).
 *
 * @param cell       per row: the cell (row-major index) after the turn
 * @param level      per row: the battery level after the turn (below the floor on a last row that is lost)
 * @param budgetLeft per row: disturbances left
 * @param mask       per row: tasks done (visit) or checkpoints of the current lap (patrol), as a bit mask
 * @param action     per row: the arena disturbance vertex of the action taken (-1 on row 0)
 * @param edge       per row: the arena outcome edge of the turn (-1 on row 0)
 * @param loopStart  the first row of the loop, or -1 when the play ends
 * @param ending     how it ends
 */
public record RoundsPlay(int[] cell, int[] level, int[] budgetLeft, int[] mask, int[] action, int[] edge,
                         int loopStart, Ending ending) {

    /** How a play ends. */
    public enum Ending {
        /** A visit mission: complete. */
        COMPLETE,
        /** The last turn took the battery below the floor. */
        BELOW_FLOOR,
        /** The last turn put the robot in an avoided zone. */
        AVOIDED_ZONE,
        /** The rows from {@code loopStart} repeat for ever. */
        REPEATS
    }

    public int rows() {
        return cell.length;
    }

    /** Rows in the loop (0 when the play ends). */
    public int loopLength() {
        return loopStart < 0 ? 0 : cell.length - loopStart;
    }
}
