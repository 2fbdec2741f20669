package dockline.raster;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * How grey levels become free, occupied and unknown pixels. A level is given either as a whole
 * grey level of the image ({@code 50}) or as a percentage of the image's maxval ({@code 25%}); a
 * percentage is turned into a level exactly (decimal arithmetic), rounding towards "not free": the
 * occupied bound rounds down and the free bound rounds up, so neither rounding makes a pixel free.
 *
 * @param occupiedAtMost a pixel at or below this is occupied (text as given, e.g. {@code 25%})
 * @param freeAtLeast    a pixel at or above this is free; in between is unknown
 * @param invert         the image is light where it is occupied: level v is read as maxval - v
 */
public record Thresholds(String occupiedAtMost, String freeAtLeast, boolean invert) {

    /** Default occupied bound (our choice). */
    public static final String DEFAULT_OCCUPIED = "25%";
    /**
     * Default free bound (our choice): high, so that the mid greys mapping tools commonly use for
     * "not seen" stay unknown.
     */
    public static final String DEFAULT_FREE = "90%";

    /** The pixel classes. */
    public static final byte FREE = 0;
    public static final byte OCCUPIED = 1;
    public static final byte UNKNOWN = 2;

    /**
     * The levels for an image with this maxval.
     *
     * @throws IllegalArgumentException saying what is wrong: a level above maxval, or bounds that cross
     */
    public Levels levels(int maxval) {
        int occ = level("--occupied-at-most", occupiedAtMost, maxval, RoundingMode.FLOOR);
        int free = level("--free-at-least", freeAtLeast, maxval, RoundingMode.CEILING);
        if (occ >= free) {
            throw new IllegalArgumentException("the occupied bound (" + occupiedAtMost + " = level " + occ + ") must be below"
                    + " the free bound (" + freeAtLeast + " = level " + free + ") for maxval " + maxval);
        }
        return new Levels(occ, free, maxval, invert);
    }

    /**
     * Checks what can be checked before the image is read (the form of both bounds and a
     * percentage's range); a message, or {@code null}. Whether a level fits the image's maxval is
     * checked by {@link #levels}.
     */
    public String syntaxProblem() {
        for (String[] t : new String[][] {{"--occupied-at-most", occupiedAtMost}, {"--free-at-least", freeAtLeast}}) {
            try {
                level(t[0], t[1], Integer.MAX_VALUE, RoundingMode.FLOOR);
            } catch (IllegalArgumentException e) {
                return e.getMessage();
            }
        }
        return null;
    }

    private static int level(String option, String text, int maxval, RoundingMode mode) {
        String t = text.strip();
        try {
            if (t.endsWith("%")) {
                BigDecimal pct = new BigDecimal(t.substring(0, t.length() - 1).strip());
                if (pct.signum() < 0 || pct.compareTo(BigDecimal.valueOf(100)) > 0) {
                    throw new IllegalArgumentException(option + " " + text + ": a percentage is 0% to 100%");
                }
                return pct.multiply(BigDecimal.valueOf(maxval)).divide(BigDecimal.valueOf(100), 0, mode).intValueExact();
            }
            if (!t.matches("[0-9]{1,6}")) {
                throw new NumberFormatException();
            }
            int v = Integer.parseInt(t);
            if (v > maxval) {
                throw new IllegalArgumentException(option + " " + text + ": level " + v + " is above the image's maxval "
                        + maxval + " (give a percentage to be independent of the maxval)");
            }
            return v;
        } catch (NumberFormatException | ArithmeticException e) {
            throw new IllegalArgumentException(option + " '" + text + "': give a whole grey level (e.g. 60) or a"
                    + " percentage of the image's maxval (e.g. 25%)");
        }
    }

    /**
     * The bounds as grey levels of one image.
     *
     * @param occupiedAtMost levels 0 to this are occupied
     * @param freeAtLeast    levels from this to maxval are free
     * @param maxval         the image's white level
     * @param invert         levels are read as maxval - v first
     */
    public record Levels(int occupiedAtMost, int freeAtLeast, int maxval, boolean invert) {

        /** The class ({@link #FREE}, {@link #OCCUPIED}, {@link #UNKNOWN}) of one sample. */
        public byte classify(int sample) {
            if (sample == GreyImage.NO_VALUE) {
                return UNKNOWN;
            }
            int v = invert ? maxval - sample : sample;
            if (v <= occupiedAtMost) {
                return OCCUPIED;
            }
            return v >= freeAtLeast ? FREE : UNKNOWN;
        }
    }
}
