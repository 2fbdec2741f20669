package dockline.raster;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

/**
 * The distance transform and the footprint against brute force. The oracles are the definitions
 * themselves, sharing no code with production: the squared Euclidean distance to the nearest site
 * by trying every site, and the distance from a cell centre to every obstacle square (nearest
 * point by clamping, elementary geometry) and to the map's four edges, decided with BigDecimal.
 */
class DistanceTransformProperties {

    /** Random grids of random density; the transform equals the nearest-site search by brute force. */
    @Property(tries = 400)
    void transform_equals_brute_force(@ForAll @IntRange(min = 1, max = 17) int w, @ForAll @IntRange(min = 1, max = 17) int h,
                                      @ForAll @IntRange(min = 0, max = 100) int percent, @ForAll long seed) {
        Random rnd = new Random(seed);
        boolean[] site = new boolean[w * h];
        int sites = 0;
        for (int i = 0; i < site.length; i++) {
            site[i] = rnd.nextInt(100) < percent;
            sites += site[i] ? 1 : 0;
        }
        Statistics.label("sites").collect(sites == 0 ? "none" : sites == site.length ? "all" : sites == 1 ? "one" : "some");
        Statistics.label("sites").coverage(c -> {
            c.check("none").count(n -> n > 0);
            c.check("one").count(n -> n > 0);
            c.check("some").percentage(p -> p > 50);
        });
        int[] d = DistanceTransform.squared(site, w, h);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                long best = Long.MAX_VALUE;
                for (int sy = 0; sy < h; sy++) {
                    for (int sx = 0; sx < w; sx++) {
                        if (site[sy * w + sx]) {
                            best = Math.min(best, (long) (x - sx) * (x - sx) + (long) (y - sy) * (y - sy));
                        }
                    }
                }
                int expected = best == Long.MAX_VALUE ? DistanceTransform.NONE : (int) best;
                assertThat(d[y * w + x]).as("%d:%d in %dx%d", x, y, w, h).isEqualTo(expected);
            }
        }
    }

    /** Sparse sites on a long thin grid: the envelope's many pops and the far end of rows. */
    @Property(tries = 100)
    void long_rows_with_few_sites(@ForAll @IntRange(min = 1, max = 3) int h, @ForAll @IntRange(min = 20, max = 300) int w,
                                  @ForAll long seed) {
        Random rnd = new Random(seed);
        boolean[] site = new boolean[w * h];
        for (int k = rnd.nextInt(4); k > 0; k--) {
            site[rnd.nextInt(site.length)] = true;
        }
        int[] d = DistanceTransform.squared(site, w, h);
        for (int i = 0; i < site.length; i++) {
            long best = Long.MAX_VALUE;
            for (int j = 0; j < site.length; j++) {
                if (site[j]) {
                    long dx = i % w - j % w;
                    long dy = i / w - j / w;
                    best = Math.min(best, dx * dx + dy * dy);
                }
            }
            assertThat(d[i]).isEqualTo(best == Long.MAX_VALUE ? DistanceTransform.NONE : (int) best);
        }
    }

    /**
     * The footprint keeps exactly the free cells whose centre is at least the radius from every
     * non-free cell (a closed square) and from the map's edges, computed by brute force.
     */
    @Property(tries = 300)
    void footprint_equals_geometry(@ForAll @IntRange(min = 1, max = 14) int w, @ForAll @IntRange(min = 1, max = 14) int h,
                                   @ForAll @IntRange(min = 0, max = 25) int percent, @ForAll long seed,
                                   @ForAll @IntRange(min = 1, max = 25) int radiusTenths, @ForAll @IntRange(min = 5, max = 100) int cellCm) {
        Random rnd = new Random(seed);
        boolean[] free = new boolean[w * h];
        for (int i = 0; i < free.length; i++) {
            free[i] = rnd.nextInt(100) >= percent;
        }
        BigDecimal c = BigDecimal.valueOf(cellCm, 2);
        BigDecimal r = c.multiply(BigDecimal.valueOf(radiusTenths, 1)); // 0.1 to 2.5 cells, ties with the lattice included
        boolean[] kept = Footprint.apply(free, w, h, r, c);
        int keptCount = 0;
        int lost = 0;
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                boolean expected = free[y * w + x] && fits(free, w, h, x, y, r, c);
                assertThat(kept[y * w + x]).as("%d:%d", x, y).isEqualTo(expected);
                keptCount += expected ? 1 : 0;
                lost += free[y * w + x] && !expected ? 1 : 0;
            }
        }
        Statistics.label("outcome").collect(keptCount == 0 ? "nothing kept" : lost == 0 ? "nothing lost" : "some lost");
        Statistics.label("outcome").coverage(cv -> cv.check("some lost").percentage(p -> p > 15));
    }

    /** Distances in metres, squared, as exact decimals: centre (x + 1/2, y + 1/2) cells. */
    private static boolean fits(boolean[] free, int w, int h, int x, int y, BigDecimal r, BigDecimal c) {
        BigDecimal half = new BigDecimal("0.5");
        BigDecimal cx = BigDecimal.valueOf(x).add(half);
        BigDecimal cy = BigDecimal.valueOf(y).add(half);
        BigDecimal r2 = r.multiply(r);
        // the map's edges: the lines 0 and w (x), 0 and h (y)
        BigDecimal edge = cx.min(BigDecimal.valueOf(w).subtract(cx)).min(cy).min(BigDecimal.valueOf(h).subtract(cy)).multiply(c);
        if (edge.multiply(edge).compareTo(r2) < 0) {
            return false;
        }
        for (int oy = 0; oy < h; oy++) {
            for (int ox = 0; ox < w; ox++) {
                if (free[oy * w + ox]) {
                    continue;
                }
                // nearest point of the square [ox, ox+1] x [oy, oy+1] to the centre: clamp
                BigDecimal px = cx.max(BigDecimal.valueOf(ox)).min(BigDecimal.valueOf(ox + 1L));
                BigDecimal py = cy.max(BigDecimal.valueOf(oy)).min(BigDecimal.valueOf(oy + 1L));
                BigDecimal dx = cx.subtract(px).multiply(c);
                BigDecimal dy = cy.subtract(py).multiply(c);
                if (dx.multiply(dx).add(dy.multiply(dy)).compareTo(r2) < 0) {
                    return false;
                }
            }
        }
        return true;
    }
}
