package dockline.replay;

import dockline.model.Cell;
import dockline.model.EventKind;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/**
 * An event the user forces in a replay: at a step, e.g. {@code 14:door-shut} or {@code 20:slip@3:4}, or
 * at a named door or zone, e.g. {@code door-shut@west-fire-door} or {@code blockage@east-hall} (the first
 * time the policy's move tries to enter it). A lasting rule closes the door or zone for good.
 *
 * @param step  the step (1 = the robot's first action); 0 for an event at a named place
 * @param kind  the event
 * @param cell  for a slip, the cell to slip to ({@code null}: the only possible one)
 * @param place for an event at a named place: the door or zone name; {@code null} otherwise
 */
public record ForcedEvent(int step, EventKind kind, Cell cell, String place) {

    private static final String HINT = "write STEP:EVENT, STEP:slip@X:Y or door-shut@DOOR / blockage@ZONE, e.g. "
            + "14:door-shut, 20:slip@3:4 or door-shut@west-fire-door; events: door-shut, blockage, slip, drag";

    /** An event at a step. */
    public ForcedEvent(int step, EventKind kind, Cell cell) {
        this(step, kind, cell, null);
    }

    /** Whether the event is put at a named door or zone rather than at a step. */
    public boolean atPlace() {
        return place != null;
    }

    /**
     * Parses a comma-separated list {@code STEP:EVENT[@X:Y],...}.
     *
     * @throws IllegalArgumentException with a message in words when the text is malformed, names a
     *                                  step twice or names no event at all
     */
    public static List<ForcedEvent> parseList(String text) {
        TreeMap<Integer, ForcedEvent> byStep = new TreeMap<>();
        List<ForcedEvent> placed = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (String part : text.split(",")) {
            String p = part.trim();
            if (p.isEmpty()) {
                continue;
            }
            try {
                ForcedEvent f = parse(p);
                if (f.atPlace()) {
                    placed.add(f);
                    continue;
                }
                if (byStep.put(f.step(), f) != null) {
                    problems.add("step " + f.step() + " is named twice");
                }
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", problems));
        }
        if (byStep.isEmpty() && placed.isEmpty()) {
            // an empty list would quietly replay something else (the worst case) under a forced-events request
            throw new IllegalArgumentException("'" + text.trim() + "' names no event; " + HINT);
        }
        List<ForcedEvent> out = new ArrayList<>(byStep.values());
        out.addAll(placed);
        return List.copyOf(out);
    }

    /** Parses one {@code STEP:EVENT[@X:Y]}. */
    public static ForcedEvent parse(String text) {
        String hint = HINT;
        int at0 = text.indexOf('@');
        String head = at0 >= 0 ? text.substring(0, at0).trim() : "";
        EventKind placeKind = EventKind.ofWord(head);
        if (placeKind == EventKind.DOOR_SHUT || placeKind == EventKind.BLOCKAGE) {
            String name = text.substring(at0 + 1).trim();
            if (name.isEmpty()) {
                throw new IllegalArgumentException("'" + text + "': name the door or zone after '@'; " + hint);
            }
            return new ForcedEvent(0, placeKind, null, name);
        }
        if (placeKind != null) {
            throw new IllegalArgumentException("'" + text + "': only door-shut and blockage can be put at a named place; "
                    + hint);
        }
        int colon = text.indexOf(':');
        if (colon <= 0) {
            throw new IllegalArgumentException("'" + text + "' is not a forced event; " + hint);
        }
        int step;
        try {
            step = Integer.parseInt(text.substring(0, colon).trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "': the step must be a whole number; " + hint);
        }
        if (step < 1) {
            throw new IllegalArgumentException("'" + text + "': steps count from 1 (the robot's first action)");
        }
        String rest = text.substring(colon + 1).trim();
        Cell cell = null;
        int at = rest.indexOf('@');
        if (at >= 0) {
            String c = rest.substring(at + 1).trim();
            rest = rest.substring(0, at).trim();
            String[] xy = c.split(":");
            try {
                if (xy.length != 2) {
                    throw new NumberFormatException();
                }
                cell = new Cell(Integer.parseInt(xy[0].trim()), Integer.parseInt(xy[1].trim()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + text + "': '" + c + "' is not a cell x:y");
            }
        }
        EventKind kind = EventKind.ofWord(rest);
        if (kind == null) {
            throw new IllegalArgumentException("'" + text + "': unknown event '" + rest + "'; " + hint);
        }
        if (cell != null && kind != EventKind.SLIP) {
            throw new IllegalArgumentException("'" + text + "': only a slip takes a cell (@x:y)");
        }
        return new ForcedEvent(step, kind, cell);
    }

    @Override
    public String toString() {
        if (place != null) {
            return kind.word() + "@" + place;
        }
        return step + ":" + kind.word() + (cell != null ? "@" + cell : "");
    }
}
