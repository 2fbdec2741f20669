package dockline.io;

import dockline.model.Timing;
import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the clock of a mission and the checkpoints of a patrol: {@code robot: tick:}, {@code deadline:}
 * and {@code tasks: patrol:}, with every problem located and given a hint. Durations are a decimal and a
 * unit ({@code 4 s}, {@code 45 min}, {@code 1.5 h}), read exactly (never as binary floating point).
 */
final class ClockReading {

    private static final Pattern DURATION = Pattern.compile("(\\S+?)\\s*(s|sec|min|h)?", Pattern.CASE_INSENSITIVE);
    private static final String DURATION_HINT = "a number and a unit: s, min or h, e.g. 4 s or 45 min";

    private ClockReading() {
    }

    /**
     * A duration in seconds, or null (reported) when it is not one.
     *
     * @param what the key, for messages
     */
    static BigDecimal seconds(Node n, String what, Problems problems) {
        if (!(n instanceof Node.Scalar s) || s.kind() == Node.Kind.NULL || s.kind() == Node.Kind.BOOLEAN) {
            if (n != null && !(n instanceof Node.Bad)) {
                problems.add(n.pos(), what + " must be a duration, not " + n.describe(), DURATION_HINT);
            }
            return null;
        }
        String t = s.text().trim();
        Matcher m = DURATION.matcher(t);
        if (!m.matches()) {
            problems.add(n.pos(), what + ": '" + Loading.shorten(t) + "' is not a duration", DURATION_HINT);
            return null;
        }
        if (m.group(2) == null) {
            problems.add(n.pos(), what + ": '" + Loading.shorten(t) + "' has no unit", DURATION_HINT);
            return null;
        }
        BigDecimal v;
        try {
            v = Quantities.parseDecimal(m.group(1));
        } catch (IllegalArgumentException e) {
            problems.add(n.pos(), what + ": " + e.getMessage(), DURATION_HINT);
            return null;
        }
        if (v.signum() < 0) {
            problems.add(n.pos(), what + " must not be negative, not " + Loading.shorten(t), DURATION_HINT);
            return null;
        }
        return switch (m.group(2).toLowerCase(Locale.ROOT)) {
            case "min" -> v.multiply(BigDecimal.valueOf(60));
            case "h" -> v.multiply(BigDecimal.valueOf(3600));
            default -> v;
        };
    }

    /** The robot's tick in seconds, or null (reported) when it is missing its value, zero or not a duration. */
    static BigDecimal tick(Node n, Problems problems) {
        BigDecimal s = seconds(n, "tick", problems);
        if (s != null && s.signum() == 0) {
            problems.add(n.pos(), "tick must be more than 0 s",
                    "the time one turn takes (a move, a wait or a charge step), e.g. tick: 4 s");
            return null;
        }
        return s;
    }

    /**
     * The mission's timing from the nodes read, with the checks across them: a deadline needs a tick, is at
     * least one tick, and belongs to a visit mission (not a patrol). Returns null when any of that is wrong
     * (reported).
     *
     * @param tick          the tick in seconds, or null when absent or wrong
     * @param tickNode      the tick's node, or null when the robot has none
     * @param deadlineNode  the deadline's node, or null when the mission has none
     * @param robotPos      where the robot section is (for "the robot has no tick")
     * @param patrol        whether the tasks are a patrol
     */
    static Timing timing(BigDecimal tick, Node tickNode, Node deadlineNode, Pos robotPos, boolean patrol,
                         Problems problems) {
        if (tickNode != null && tick == null) {
            return null; // already reported
        }
        if (deadlineNode == null) {
            return new Timing(tick, null);
        }
        BigDecimal deadline = seconds(deadlineNode, "deadline", problems);
        if (deadline == null) {
            return null;
        }
        boolean ok = true;
        if (patrol) {
            problems.add(deadlineNode.pos(), "a patrol goes on for ever, so it has no deadline",
                    "remove deadline:, or give the tasks as visit: [...] for one round that must end in time");
            ok = false;
        }
        if (tickNode == null) {
            problems.add(deadlineNode.pos(), "a deadline needs the robot's tick (the time one turn takes)",
                    "add tick: to the robot section, e.g. robot: tick: 4 s" + (robotPos == null ? ""
                            : " (robot at line " + robotPos.line() + ")"));
            return null;
        }
        if (deadline.compareTo(tick) < 0) {
            problems.add(deadlineNode.pos(), "deadline " + Timing.clock(deadline) + " is shorter than one tick ("
                            + Timing.clock(tick) + "); the robot could not even make one move",
                    "give a deadline of at least one tick, e.g. deadline: 45 min");
            return null;
        }
        if (deadline.divide(tick, 0, java.math.RoundingMode.FLOOR).compareTo(BigDecimal.valueOf(1_000_000)) > 0) {
            problems.add(deadlineNode.pos(), "deadline " + Timing.clock(deadline) + " is more than 1000000 ticks of "
                    + Timing.clock(tick), "use a longer tick, or leave the deadline out");
            return null;
        }
        return ok ? new Timing(tick, deadline) : null;
    }

    /**
     * Checks of a patrol's checkpoint list: not empty, no repeats, nothing also avoided, no visit list or
     * order or finish-on-dock beside it. Returns whether it is fine (problems reported).
     */
    static boolean patrol(Node patrolNode, List<Loading.Named> checkpoints, List<Loading.Named> avoid,
                          Node.MapNode tasks, Problems problems) {
        boolean ok = true;
        if (checkpoints.isEmpty()) {
            problems.add(patrolNode.pos(), "the patrol has no checkpoints",
                    "list the zones to visit on every lap, e.g. patrol: [ward-a, ward-b]");
            ok = false;
        }
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (Loading.Named c : checkpoints) {
            if (!seen.add(c.name())) {
                problems.add(c.pos(), "checkpoint '" + Loading.shorten(c.name()) + "' is listed twice in patrol",
                        "each checkpoint is visited once per lap; remove the second one");
                ok = false;
            }
        }
        for (Loading.Named a : avoid) {
            if (seen.contains(a.name())) {
                problems.add(a.pos(), "zone '" + Loading.shorten(a.name()) + "' is both a checkpoint of the patrol and"
                        + " avoided", "a checkpoint must be visited on every lap; drop it from avoid or from patrol");
                ok = false;
            }
        }
        for (String k : new String[] {"visit", "order", "finish-on-dock"}) {
            Node.Entry e = tasks.entry(k);
            if (e != null) {
                problems.add(e.keyPos(), k + " does not apply to a patrol",
                        k.equals("visit") ? "a patrol visits its checkpoints on every lap for ever; for one round,"
                                + " write visit: without patrol:" : "a lap visits the checkpoints in any order and"
                                + " never ends the mission; remove " + k + ":");
                ok = false;
            }
        }
        if (checkpoints.size() > dockline.goal.GoalAutomaton.MAX_TASKS) {
            problems.add(patrolNode.pos(), "the patrol lists " + checkpoints.size() + " checkpoints; at most "
                    + dockline.goal.GoalAutomaton.MAX_TASKS + " are allowed", "split it into several patrols");
            ok = false;
        }
        return ok;
    }
}
