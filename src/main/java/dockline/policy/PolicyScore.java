package dockline.policy;

import dockline.model.Rational;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * The score memory of one row of a policy for a discounted mission (missions/README.md, "The discounted
 * objective"): the scaled gap
 * between the robot's discounted score so far and the threshold, which is all the robot must
 * remember of its past energy changes to act on the threshold question.
 *
 * <p>After the energy changes {@code w_0 .. w_i} of its steps so far the gap is
 * {@code s_i = d^i * (DS(w_0..w_i) - v)}, with {@code s_{-1} = -v/d} before the first step and
 * {@code s_{i+1} = d * s_i + w_{i+1}}. The robot can keep it exactly from its own gauge readings.
 * Once it is beyond the bound {@code B = mu/(d-1)} ({@code s >= B} for the relation {@code >=},
 * {@code s > B} for {@code >}; mu the largest energy change of any step of the mission's arena)
 * the threshold is met whatever follows, and the row says {@link #SECURED} instead of the number
 * (the gap only grows from there, so the exact value no longer matters and need not be kept).
 *
 * <p>Immutable; ordered by value with {@link #SECURED} last. Text form: {@code n/q} in lowest
 * terms ({@code n} when q = 1) or {@code secured}.
 */
public final class PolicyScore implements Comparable<PolicyScore> {

    /** The word for {@link #SECURED} in files and reports. */
    public static final String SECURED_WORD = "secured";

    /** The gap is beyond the bound: the threshold is met whatever follows. */
    public static final PolicyScore SECURED = new PolicyScore(null);

    private static final Pattern TEXT = Pattern.compile("[+-]?\\d{1,18}(/\\d{1,18})?");

    private final Rational gap;

    private PolicyScore(Rational gap) {
        this.gap = gap;
    }

    /** The exact gap as memory. */
    public static PolicyScore gap(Rational gap) {
        return new PolicyScore(Objects.requireNonNull(gap, "gap"));
    }

    /**
     * Reads {@code secured}, {@code n/q} or {@code n} (whole numbers, q &gt; 0).
     *
     * @throws NumberFormatException if the text is neither
     */
    public static PolicyScore parse(String text) {
        String t = text.trim();
        if (t.equals(SECURED_WORD)) {
            return SECURED;
        }
        if (!TEXT.matcher(t).matches()) {
            throw new NumberFormatException("not a score gap: '" + t + "'");
        }
        try {
            return gap(Rational.parse(t));
        } catch (ArithmeticException e) {
            throw new NumberFormatException(e.getMessage());
        }
    }

    public boolean isSecured() {
        return gap == null;
    }

    /**
     * The exact gap.
     *
     * @throws IllegalStateException for {@link #SECURED}
     */
    public Rational gapValue() {
        if (gap == null) {
            throw new IllegalStateException("a secured score holds no gap value");
        }
        return gap;
    }

    /** {@code n/q}, {@code n} or {@code secured}. */
    public String text() {
        return gap == null ? SECURED_WORD : gap.toString();
    }

    @Override
    public int compareTo(PolicyScore o) {
        if (gap == null || o.gap == null) {
            return Boolean.compare(gap == null, o.gap == null);
        }
        return gap.compareTo(o.gap);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PolicyScore s && Objects.equals(gap, s.gap);
    }

    @Override
    public int hashCode() {
        return Objects.hashCode(gap);
    }

    @Override
    public String toString() {
        return text();
    }
}
