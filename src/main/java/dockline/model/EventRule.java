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
 * @param kind    the event kind
 * @param label   a short name for reports, e.g. the zone or door name ("door D2", "wet floor by the lifts")
 * @param cells   the cells the rule covers (sorted, distinct)
 * @param extraWh for {@link EventKind#DRAG}: the extra energy per affected move in Wh; zero otherwise
 */
public record EventRule(EventKind kind, String label, List<Cell> cells, BigDecimal extraWh) {

    public EventRule {
        cells = Cell.sortedDistinct(cells);
        if (extraWh == null) {
            extraWh = BigDecimal.ZERO;
        }
        if (extraWh.signum() < 0) {
            throw new IllegalArgumentException("drag extra must not be negative");
        }
    }

    public boolean covers(Cell c) {
        return java.util.Collections.binarySearch(cells, c) >= 0;
    }
}
