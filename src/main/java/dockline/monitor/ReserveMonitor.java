package dockline.monitor;

/**
 * The battery as a deterministic safety automaton (README.md, "How it decides"): the state is the battery level
 * in units minus the reserve floor, so states run from {@code 0} (exactly at the floor) to
 * {@code capacity - floor} (full). Reading a weight adds it, saturates at the capacity, and goes to
 * {@link #REJECT} the moment the level is below the floor.
 *
 * <p>Every run that completes the mission without being rejected is accepted (the floor is a
 * safety condition), so {@link #acceptsAtCompletion} is always {@code true}. Each step is O(1)
 * in long arithmetic, so no sum can overflow.
 *
 * @param floorUnits    the reserve floor in units (0 &le; floor &le; capacity)
 * @param capacityUnits the battery capacity in units
 * @param startUnits    the starting level in units; above the capacity it is cut to the capacity,
 *                      below the floor the monitor starts in {@link #REJECT}
 */
public record ReserveMonitor(int floorUnits, int capacityUnits, int startUnits) implements Monitor {

    /** @throws IllegalArgumentException if the floor is negative or above the capacity */
    public ReserveMonitor {
        if (floorUnits < 0) {
            throw new IllegalArgumentException("reserve floor must not be negative: " + floorUnits);
        }
        if (floorUnits > capacityUnits) {
            throw new IllegalArgumentException("reserve floor " + floorUnits + " units is above the capacity "
                    + capacityUnits + " units");
        }
        startUnits = Math.min(startUnits, capacityUnits);
    }

    /** The battery level in units of a (non-sink) state. */
    public int level(int s) {
        return floorUnits + s;
    }

    /** The state of a battery level, or {@link #REJECT} below the floor (above the capacity: full). */
    public int stateOf(int level) {
        if (level < floorUnits) {
            return REJECT;
        }
        return Math.min(level, capacityUnits) - floorUnits;
    }

    @Override
    public int initialState() {
        return stateOf(startUnits);
    }

    @Override
    public int step(int s, int w) {
        long level = (long) floorUnits + s + w;
        if (level < floorUnits) {
            return REJECT;
        }
        return (int) Math.min(level, capacityUnits) - floorUnits;
    }

    @Override
    public boolean acceptsAtCompletion(int s) {
        return true;
    }

    /** Exactly {@code capacity - floor + 1}: every state is in {@code 0 .. stateBound()-1}. */
    @Override
    public long stateBound() {
        return (long) capacityUnits - floorUnits + 1;
    }

    @Override
    public String describe(int s) {
        return s == REJECT ? "below the reserve floor" : level(s) + " units";
    }

    /** The same battery with another reserve floor. */
    public ReserveMonitor withFloor(int floorUnits) {
        return new ReserveMonitor(floorUnits, capacityUnits, startUnits);
    }

    @Override
    public String toString() {
        return "ReserveMonitor[floor=" + floorUnits + ", capacity=" + capacityUnits + ", start=" + startUnits + "]";
    }
}
