package dockline.model;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * The clock of a mission: how long one turn of the robot takes (a move, a wait or a charge step, the
 * robot's {@code tick}) and, for a visit mission, the deadline by which it must be docked with its
 * tasks done. Both in seconds, exact decimals; either may be absent ({@code null}).
 *
 * <p>The deadline counts in whole turns and is rounded <b>down</b> (against the robot):
 * {@code floor(deadline / tick)} turns, exactly (no floating point).
 *
 * @param tickSeconds     seconds per turn, more than 0, or {@code null} (no clock)
 * @param deadlineSeconds seconds from the start by which the mission must be complete, or {@code null}
 */
public record Timing(BigDecimal tickSeconds, BigDecimal deadlineSeconds) {

    /** No tick and no deadline. */
    public static final Timing NONE = new Timing(null, null);

    public Timing {
        if (tickSeconds != null && tickSeconds.signum() <= 0) {
            throw new IllegalArgumentException("a tick must be more than 0 s");
        }
        if (deadlineSeconds != null && tickSeconds == null) {
            throw new IllegalArgumentException("a deadline needs the robot's tick");
        }
        if (deadlineSeconds != null && deadlineSeconds.compareTo(tickSeconds) < 0) {
            throw new IllegalArgumentException("a deadline must be at least one tick");
        }
    }

    public boolean hasTick() {
        return tickSeconds != null;
    }

    public boolean hasDeadline() {
        return deadlineSeconds != null;
    }

    /**
     * The deadline in whole turns, rounded down; at least 1.
     *
     * @throws IllegalStateException if there is no deadline
     * @throws ArithmeticException   if it does not fit in an int
     */
    public int deadlineTicks() {
        if (deadlineSeconds == null) {
            throw new IllegalStateException("no deadline");
        }
        return deadlineSeconds.divide(tickSeconds, 0, RoundingMode.FLOOR).intValueExact();
    }

    /** The time of {@code ticks} turns in seconds (exact). */
    public BigDecimal seconds(long ticks) {
        if (tickSeconds == null) {
            throw new IllegalStateException("no tick");
        }
        return tickSeconds.multiply(BigDecimal.valueOf(ticks));
    }

    /** E.g. {@code 168 turns = 11 min 12 s}, or {@code 168 turns} without a tick. */
    public String describeTicks(long ticks) {
        String t = ticks + (ticks == 1 ? " turn" : " turns");
        return tickSeconds == null ? t : t + " = " + clock(seconds(ticks));
    }

    /** Seconds as {@code 1 h 2 min 3.5 s} (zero parts left out; {@code 0 s} for zero). */
    public static String clock(BigDecimal seconds) {
        BigDecimal s = seconds.stripTrailingZeros();
        long whole = s.setScale(0, RoundingMode.FLOOR).longValueExact();
        BigDecimal frac = s.subtract(BigDecimal.valueOf(whole));
        long h = whole / 3600;
        long min = (whole % 3600) / 60;
        BigDecimal sec = BigDecimal.valueOf(whole % 60).add(frac).stripTrailingZeros();
        StringBuilder b = new StringBuilder();
        if (h > 0) {
            b.append(h).append(" h");
        }
        if (min > 0) {
            b.append(b.length() > 0 ? " " : "").append(min).append(" min");
        }
        if (sec.signum() > 0 || b.length() == 0) {
            b.append(b.length() > 0 ? " " : "").append(sec.toPlainString()).append(" s");
        }
        return b.toString();
    }
}
