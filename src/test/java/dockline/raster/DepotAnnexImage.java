package dockline.raster;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Draws the demo occupancy image {@code maps/depot-annex.pgm}: the annex of a spare-parts depot of
 * our own invention (invented demo data, no real building), as a mapping run might have left it.
 * 120 x 84 pixels of 0.1 m, raw PGM (P5), maxval 255: 0 = occupied, 254 = free, 205 = not seen.
 *
 * <ul>
 *   <li>a band of unseen grey around the outer walls (the mapping run never saw outside);</li>
 *   <li>the west store: three shelving racks with aisles between them, a pallet left in the middle
 *       aisle, and a few dark specks of sensor noise;</li>
 *   <li>a partition with a doorway 0.9 m wide and a staff gap 0.3 m wide (too narrow for the robot);</li>
 *   <li>the east charging bay, and an office in its north-east corner that was never mapped (unseen).</li>
 * </ul>
 *
 * <p>Run {@link #main} to rewrite the file; {@code DepotAnnexImageTest} checks that the committed
 * file is exactly what this draws.
 */
public final class DepotAnnexImage {

    static final int W = 120;
    static final int H = 84;
    static final int OCCUPIED = 0;
    static final int FREE = 254;
    static final int UNSEEN = 205;

    private DepotAnnexImage() {
    }

    public static void main(String[] args) throws IOException {
        Files.write(Path.of("maps/depot-annex.pgm"), bytes());
    }

    /** The file's bytes. */
    static byte[] bytes() {
        int[] g = draw();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] header = ("P5\n# Depot annex (demo, invented): 0.1 m per pixel, 0 occupied, 254 free, 205 not seen\n"
                + W + " " + H + "\n255\n").getBytes(StandardCharsets.US_ASCII);
        out.writeBytes(header);
        for (int v : g) {
            out.write(v);
        }
        return out.toByteArray();
    }

    static int[] draw() {
        int[] g = new int[W * H];
        fill(g, 0, 0, W, H, UNSEEN);
        fill(g, 3, 3, W - 3, H - 3, OCCUPIED);            // outer walls, 0.3 m thick
        fill(g, 6, 6, W - 6, H - 6, FREE);
        // west store: three racks, 0.9 m deep and 4.8 m long, aisles 1.5 m wide
        for (int r = 0; r < 3; r++) {
            int x0 = 15 + r * 24;
            fill(g, x0, 15, x0 + 9, 63, OCCUPIED);
        }
        fill(g, 27, 36, 33, 42, OCCUPIED);                // a pallet left in the first aisle
        // partition between the store and the charging bay
        fill(g, 84, 6, 87, H - 6, OCCUPIED);
        fill(g, 84, 30, 87, 39, FREE);                    // doorway, 0.9 m
        fill(g, 84, 66, 87, 69, FREE);                    // staff gap, 0.3 m: too narrow for the robot
        // office in the north-east corner, never mapped
        fill(g, 99, 6, W - 6, 24, UNSEEN);
        fill(g, 96, 6, 99, 27, OCCUPIED);
        fill(g, 96, 24, W - 6, 27, OCCUPIED);
        // sensor noise: a few dark and unseen specks in the free space (a fixed pattern)
        int[][] specks = {{50, 8, OCCUPIED}, {9, 70, OCCUPIED}, {70, 75, 120}, {100, 60, OCCUPIED}, {40, 68, 180}};
        for (int[] s : specks) {
            g[s[1] * W + s[0]] = s[2];
        }
        return g;
    }

    private static void fill(int[] g, int x0, int y0, int x1, int y1, int v) {
        for (int y = y0; y < y1; y++) {
            for (int x = x0; x < x1; x++) {
                g[y * W + x] = v;
            }
        }
    }
}
