package dockline.monitor;

/**
 * A deterministic automaton over integer weights (energy deltas in units), used as one factor of
 * the product game. States are small non-negative ints; {@link #REJECT} is the losing sink.
 *
 * <p>Contract: {@link #step} is a pure function; the set of states reachable from
 * {@link #initialState()} is finite, and at most {@link #stateBound()}.
 */
public interface Monitor {

    /** The losing sink: the threshold question is already answered "no". */
    int REJECT = -1;

    /** The state before any weight was read. */
    int initialState();

    /** The state after reading weight {@code w} in state {@code s}, or {@link #REJECT}. */
    int step(int s, int w);

    /**
     * Whether a run that completes the mission in state {@code s} (and then reads weight 0 forever,
     * in the absorbing "mission complete" vertex) is accepted.
     */
    boolean acceptsAtCompletion(int s);

    /** An upper bound on the number of non-sink states (for the memory estimate). */
    long stateBound();

    /** The state in words, e.g. {@code 42 units}. */
    String describe(int s);
}
