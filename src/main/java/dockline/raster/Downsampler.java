package dockline.raster;

import java.math.BigDecimal;

/**
 * Conservative down-sampling of classified pixels to map cells: one cell covers {@code k x k}
 * pixels ({@code k} = cell size / pixel size, a whole number), and a cell is free only if every
 * pixel in it is free; an occupied or unknown pixel makes the whole cell a wall. Cells along the
 * right and bottom edges that reach past the image are walls too (the pixels they miss are unknown).
 *
 * <p>Cost: one pass over the pixels, one byte per cell.
 */
public final class Downsampler {

    private Downsampler() {
    }

    /**
     * The number of pixels per cell edge, exactly: {@code cellSize / pixelSize} when that is a whole
     * number of at least 1.
     *
     * @throws IllegalArgumentException with a message and a hint otherwise
     */
    public static int factor(BigDecimal pixelSize, BigDecimal cellSize) {
        if (pixelSize.signum() <= 0 || cellSize.signum() <= 0) {
            throw new IllegalArgumentException("the pixel size and the cell size must be more than 0");
        }
        BigDecimal[] qr = cellSize.divideAndRemainder(pixelSize);
        if (qr[1].signum() != 0 || qr[0].signum() == 0) {
            BigDecimal lower = qr[0].signum() == 0 ? pixelSize : qr[0].multiply(pixelSize);
            BigDecimal upper = qr[0].add(BigDecimal.ONE).multiply(pixelSize);
            throw new IllegalArgumentException("the cell size " + plain(cellSize) + " m is not a whole multiple of the pixel size "
                    + plain(pixelSize) + " m (hint: a cell covers whole pixels; try --cell-size " + plain(lower)
                    + (lower.compareTo(upper) == 0 ? "" : " or " + plain(upper)) + ")");
        }
        try {
            return qr[0].intValueExact();
        } catch (ArithmeticException e) {
            throw new IllegalArgumentException("the cell size is more than 2^31 pixels", e);
        }
    }

    /**
     * The cells: {@code ceil(width / k)} by {@code ceil(height / k)}, row by row, {@code true} where free.
     *
     * @param classes one of {@link Thresholds#FREE}, {@link Thresholds#OCCUPIED}, {@link Thresholds#UNKNOWN} per pixel
     */
    public static boolean[] freeCells(byte[] classes, int width, int height, int k, int cellsWide, int cellsHigh) {
        boolean[] free = new boolean[cellsWide * cellsHigh];
        java.util.Arrays.fill(free, true);
        for (int cy = 0; cy < cellsHigh; cy++) {
            for (int cx = 0; cx < cellsWide; cx++) {
                if ((long) (cx + 1) * k > width || (long) (cy + 1) * k > height) {
                    free[cy * cellsWide + cx] = false;
                }
            }
        }
        for (int y = 0; y < height; y++) {
            int row = (y / k) * cellsWide;
            for (int x = 0; x < width; x++) {
                if (classes[y * width + x] != Thresholds.FREE) {
                    free[row + x / k] = false;
                }
            }
        }
        return free;
    }

    /** Cells needed to cover {@code pixels} pixels, {@code k} to a cell. */
    public static int cellsFor(int pixels, int k) {
        return (int) ((pixels + (long) k - 1) / k);
    }

    /** The decimal without trailing zeros, never in exponent form. */
    public static String plain(BigDecimal d) {
        return d.stripTrailingZeros().toPlainString();
    }
}
