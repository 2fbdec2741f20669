package dockline.io;

import dockline.model.Charge;
import java.math.BigDecimal;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parses the quantities people write in files and on the command line: decimal numbers (read
 * exactly as {@link BigDecimal}, never through a {@code double}), Wh figures and charges
 * ({@code 20%}, {@code 15 Wh}, {@code 15}).
 */
public final class Quantities {

    /** Most digits before the decimal point: 10^12 Wh is already absurd for a robot. */
    public static final int MAX_INTEGER_DIGITS = 12;
    /** Most digits after the decimal point. */
    public static final int MAX_FRACTION_DIGITS = 9;

    private static final Pattern DECIMAL = Pattern.compile("([+-]?)(\\d*)(?:\\.(\\d*))?");
    private static final Pattern CHARGE = Pattern.compile("(.*?)\\s*(%|wh)?", Pattern.CASE_INSENSITIVE);
    private static final BigDecimal HUNDRED = BigDecimal.valueOf(100);

    private Quantities() {
    }

    /**
     * A plain decimal number such as {@code 12}, {@code -0.75} or {@code 0.5}: digits with an
     * optional sign and decimal point. No exponents, no thousands separators.
     *
     * @throws IllegalArgumentException with a message that says what is wrong
     */
    public static BigDecimal parseDecimal(String text) {
        String t = text == null ? "" : text.trim();
        Matcher m = DECIMAL.matcher(t);
        if (t.isEmpty() || !m.matches() || (m.group(2).isEmpty() && (m.group(3) == null || m.group(3).isEmpty()))) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' is not a decimal number"
                    + (t.matches("(?i).*\\d[eE][+-]?\\d.*") ? " (write it out without an exponent)" : " (write digits, e.g. 12.5)"));
        }
        String intDigits = m.group(2).replaceFirst("^0+(?=\\d)", "");
        String frac = m.group(3) == null ? "" : m.group(3);
        if (intDigits.length() > MAX_INTEGER_DIGITS) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' is too large (at most "
                    + MAX_INTEGER_DIGITS + " digits before the decimal point)");
        }
        if (frac.length() > MAX_FRACTION_DIGITS) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' has too many decimals (at most "
                    + MAX_FRACTION_DIGITS + ")");
        }
        return new BigDecimal(m.group(1) + (intDigits.isEmpty() ? "0" : intDigits) + (frac.isEmpty() ? "" : "." + frac));
    }

    /**
     * An energy in Wh: a decimal, optionally followed by {@code Wh}; not negative.
     *
     * @throws IllegalArgumentException with a message that says what is wrong
     */
    public static BigDecimal parseWh(String text) {
        String t = text == null ? "" : text.trim();
        if (t.toLowerCase(Locale.ROOT).endsWith("wh")) {
            t = t.substring(0, t.length() - 2).trim();
        } else if (t.endsWith("%")) {
            throw new IllegalArgumentException("'" + Loading.shorten(text.trim()) + "': a percentage is not allowed here, give Wh");
        }
        BigDecimal v = parseDecimal(t);
        if (v.signum() < 0) {
            throw new IllegalArgumentException("'" + Loading.shorten(text.trim()) + "' is negative");
        }
        return v;
    }

    /**
     * A charge: {@code 20%} (of the battery capacity), {@code 15 Wh}, or a bare number (Wh).
     * Not negative, and a percentage not above 100.
     *
     * @throws IllegalArgumentException with a message that says what is wrong
     */
    public static Charge parseCharge(String text) {
        String t = text == null ? "" : text.trim();
        Matcher m = CHARGE.matcher(t);
        if (t.isEmpty() || !m.matches()) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' is not a charge (write e.g. 20% or 15 Wh)");
        }
        boolean percent = "%".equals(m.group(2));
        BigDecimal v;
        try {
            v = parseDecimal(m.group(1));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(e.getMessage() + "; a charge is written e.g. 20% or 15 Wh");
        }
        if (v.signum() < 0) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' is negative; a charge is at least 0");
        }
        if (percent && v.compareTo(HUNDRED) > 0) {
            throw new IllegalArgumentException("'" + Loading.shorten(t) + "' is above 100% of the battery");
        }
        return percent ? Charge.percent(v) : Charge.wh(v);
    }

    /**
     * Checks a charge against a battery capacity: {@code null} when it fits, else what is wrong
     * (for command-line overrides of the reserve or the starting charge).
     */
    public static String checkAgainstCapacity(Charge charge, BigDecimal capacityWh) {
        if (charge.percent() && charge.amount().compareTo(HUNDRED) > 0) {
            return charge + " is above 100% of the battery";
        }
        if (charge.toWh(capacityWh).compareTo(capacityWh) > 0) {
            return charge + " is above the battery capacity of " + capacityWh.stripTrailingZeros().toPlainString() + " Wh";
        }
        return null;
    }
}
