package dockline.replay;

import dockline.model.Cell;
import dockline.model.EventKind;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/**
 * An event the user forces at a step of a replay, e.g. {@code 14:door-shut} or {@code 20:slip@3:4}.
 *
 * @param step  the step (1 = the robot's first action)
 * @param kind  the event
 * @param cell  for a slip, the cell to slip to ({@code null}: the only possible one)
 */
public record ForcedEvent(int step, EventKind kind, Cell cell) {

    private static final String HINT = "write STEP:EVENT or STEP:slip@X:Y, e.g. 14:door-shut or 20:slip@3:4; events: "
            + "door-shut, blockage, slip, drag";

    /**
     * Parses a comma-separated list {@code STEP:EVENT[@X:Y],...}.
     *
     * @throws IllegalArgumentException with a message in words when the text is malformed, names a
     *                                  step twice or names no event at all
     */
    public static List<ForcedEvent> parseList(String text) {
        TreeMap<Integer, ForcedEvent> byStep = new TreeMap<>();
        List<String> problems = new ArrayList<>();
        for (String part : text.split(",")) {
            String p = part.trim();
            if (p.isEmpty()) {
                continue;
            }
            try {
                ForcedEvent f = parse(p);
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
        if (byStep.isEmpty()) {
            // an empty list would quietly replay something else (the worst case) under a forced-events request
            throw new IllegalArgumentException("'" + text.trim() + "' names no event; " + HINT);
        }
        return List.copyOf(byStep.values());
    }

    /** Parses one {@code STEP:EVENT[@X:Y]}. */
    public static ForcedEvent parse(String text) {
        String hint = HINT;
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
        return step + ":" + kind.word() + (cell != null ? "@" + cell : "");
    }
}
