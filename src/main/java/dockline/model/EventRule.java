package dockline.model;

import java.math.BigDecimal;
import java.util.List;

/**
 * Where one kind of disturbance can happen.
 *
 * <p>For {@link EventKind#DOOR_SHUT} the cells are door cells that may shut; for
 * {@link EventKind#BLOCKAGE} and {@link EventKind#DRAG} the cells a move may be blocked or dragged
 * on entering; for {@link EventKind#SLIP} the cells where a move that starts or ends there may slip.
 *
 * @param kind     the event kind
 * @param label    a short name for reports, e.g. the zone or door name ("door D2", "wet floor by the lifts")
 * @param cells    the cells the rule covers (sorted, distinct)
 * @param extraWh  for {@link EventKind#DRAG}: the extra energy per affected move in Wh; zero otherwise
 * @param duration for door-shut and blockage: whether the door (each door cell on its own) or the
 *                 whole zone stays closed once the event happened; always momentary for slip and drag
 * @param atMost   the most events of this rule's group in one mission, or -1 for no limit of its own
 *                 (the shared budget still applies)
 * @param group    rules with the same group share one {@code at-most} count (one event entry of the map
 *                 file naming several places); -1: the rule is a group of its own
 */
public record EventRule(EventKind kind, String label, List<Cell> cells, BigDecimal extraWh,
                        EventDuration duration, int atMost, int group) {

    public EventRule {
        cells = Cell.sortedDistinct(cells);
        if (extraWh == null) {
            extraWh = BigDecimal.ZERO;
        }
        if (extraWh.signum() < 0) {
            throw new IllegalArgumentException("drag extra must not be negative");
        }
        if (duration == null) {
            duration = EventDuration.MOMENTARY;
        }
        if (duration == EventDuration.REST_OF_MISSION && kind != EventKind.DOOR_SHUT && kind != EventKind.BLOCKAGE) {
            throw new IllegalArgumentException(kind.word() + " events are momentary by nature");
        }
        if (atMost < -1) {
            throw new IllegalArgumentException("at-most must not be negative");
        }
    }

    /** A momentary rule without a limit of its own (the reference semantics). */
    public EventRule(EventKind kind, String label, List<Cell> cells, BigDecimal extraWh) {
        this(kind, label, cells, extraWh, EventDuration.MOMENTARY, -1, -1);
    }

    /** Whether a door or zone closed by this rule stays closed for the rest of the mission. */
    public boolean lasting() {
        return duration == EventDuration.REST_OF_MISSION;
    }

    /** Whether the rule has an {@code at-most} limit of its own. */
    public boolean limited() {
        return atMost >= 0;
    }

    /** The same rule with another duration. */
    public EventRule withDuration(EventDuration d) {
        return new EventRule(kind, label, cells, extraWh, d, atMost, group);
    }

    /** The same rule with another limit ({@code -1}: none). */
    public EventRule withAtMost(int n, int g) {
        return new EventRule(kind, label, cells, extraWh, duration, n, g);
    }

    public boolean covers(Cell c) {
        return java.util.Collections.binarySearch(cells, c) >= 0;
    }
}
