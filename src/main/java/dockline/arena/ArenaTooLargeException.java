package dockline.arena;

import dockline.model.ResourceLimitException;

/**
 * The arena of a mission would not fit in memory: with lasting events the robot vertex is (cell,
 * disturbance state), and the disturbance states multiply the free cells. Thrown by
 * {@link ArenaCompiler} before it allocates; the message gives the real size and what to change.
 * A {@link ResourceLimitException}, so front ends report it as a resource limit (exit code 3).
 */
public final class ArenaTooLargeException extends ResourceLimitException {

    private static final long serialVersionUID = 1L;

    private final long robotVertices;
    private final int states;

    /**
     * @param atLeast whether the counting stopped at the limit, so the figures are lower bounds
     */
    public ArenaTooLargeException(int freeCells, int states, long robotVertices, long bytes, long limitBytes,
                                  boolean atLeast) {
        super("the arena would have " + (atLeast ? "more than " : "") + robotVertices + " robot vertices ("
                + freeCells + " free cells x " + (atLeast ? "more than " : "") + states
                + " disturbance states: budget left, doors and zones closed by lasting events, at-most counts),"
                + " about " + bytes / (1024 * 1024) + " MB, over the " + limitBytes / (1024 * 1024) + " MB it may use"
                + " (half the JVM's maximum heap of " + ResourceLimitException.maxHeapMb() + " MB, set by -Xmx)",
                "make some door-shut or blockage events 'duration: momentary', give them 'at-most' limits,"
                + " lower the budget K, or give the JVM more memory (-Xmx)");
        this.robotVertices = robotVertices;
        this.states = states;
    }

    public long robotVertices() {
        return robotVertices;
    }

    public int states() {
        return states;
    }
}
