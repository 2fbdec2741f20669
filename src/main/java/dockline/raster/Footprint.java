package dockline.raster;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * The robot's footprint: a free cell becomes a wall when its centre is closer than the robot's
 * radius to an obstacle, so that a robot standing at the centre of any cell that stays free does
 * not overlap anything that is not known to be free.
 *
 * <p><b>What is measured.</b> The Euclidean distance from the cell's centre to the nearest point
 * of an obstacle, where an obstacle is every non-free cell taken as a closed square of side
 * {@code cellSize}, and everything outside the map (the map's edge). A cell is kept when that
 * distance is at least the radius (touching is allowed), and becomes a wall when it is less.
 *
 * <p><b>How it is computed exactly.</b> On a lattice of half cells, {@code (2W+1) x (2H+1)}
 * points, cell {@code (x, y)} has its centre at {@code (2x+1, 2y+1)} and covers the points
 * {@code 2x..2x+2 by 2y..2y+2}. The nearest point of an axis-parallel square to a centre is found
 * by clamping each coordinate into the square, so it is always a lattice point: the distance to
 * the obstacles is the distance to the nearest obstacle lattice point, which the exact squared
 * Euclidean distance transform ({@link DistanceTransform}, Felzenszwalb and Huttenlocher 2012)
 * gives as an integer {@code d2} in half cells squared. The decision {@code sqrt(d2) * cellSize / 2
 * >= radius} is {@code d2 >= T} with the integer {@code T = ceil(4 radius² / cellSize²)}, computed
 * once with exact decimal arithmetic; no floating point takes part.
 *
 * <p>Cost: O(W x H) time, one {@code int} and one {@code boolean} per half-cell lattice point.
 */
public final class Footprint {

    private Footprint() {
    }

    /** The least squared lattice distance (in half cells) a kept cell needs: {@code ceil(4 r² / c²)}. */
    public static long threshold(BigDecimal radius, BigDecimal cellSize) {
        BigDecimal four = BigDecimal.valueOf(4);
        return four.multiply(radius).multiply(radius).divide(cellSize.multiply(cellSize), 0, RoundingMode.CEILING)
                .longValueExact();
    }

    /**
     * The cells that stay free: {@code free} with every cell closer than the radius to an obstacle
     * turned into a wall. {@code free} is not changed.
     */
    public static boolean[] apply(boolean[] free, int width, int height, BigDecimal radius, BigDecimal cellSize) {
        long t = threshold(radius, cellSize);
        int[] d2 = halfCellDistances(free, width, height);
        int lw = 2 * width + 1;
        boolean[] kept = new boolean[free.length];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int i = y * width + x;
                kept[i] = free[i] && d2[(2 * y + 1) * lw + 2 * x + 1] >= t;
            }
        }
        return kept;
    }

    /**
     * Squared distances on the half-cell lattice to the nearest point of a non-free cell or of the
     * map's edge ({@code (2W+1) x (2H+1)} values, row by row).
     */
    public static int[] halfCellDistances(boolean[] free, int width, int height) {
        int lw = 2 * width + 1;
        int lh = 2 * height + 1;
        boolean[] site = new boolean[lw * lh];
        for (int ly = 0; ly < lh; ly++) {
            for (int lx = 0; lx < lw; lx++) {
                if (lx == 0 || ly == 0 || lx == lw - 1 || ly == lh - 1) {
                    site[ly * lw + lx] = true;
                }
            }
        }
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                if (!free[y * width + x]) {
                    for (int ly = 2 * y; ly <= 2 * y + 2; ly++) {
                        for (int lx = 2 * x; lx <= 2 * x + 2; lx++) {
                            site[ly * lw + lx] = true;
                        }
                    }
                }
            }
        }
        return DistanceTransform.squared(site, lw, lh);
    }
}
