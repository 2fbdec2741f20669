package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import dockline.io.MapLoader;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The largest plan the reader accepts (2048 x 2048 cells) under a small heap: {@code check} refuses it
 * with exit 3, the real size of the move graph and the heap that applied, and never runs out of memory
 * ("Java heap space") on the way, not even in the per-cell tables built before the vertices. Runs in a
 * child JVM with {@code -Xmx256m}. The floor (invented) is an open hall with a wall every 64 rows.
 */
class LargestPlanTest {

    @TempDir
    Path dir;

    @Test
    void theLargestPlanUnderASmallHeap_isRefusedWithItsSize() throws Exception {
        int n = MapLoader.MAX_SIDE;
        Path map = dir.resolve("hall.yaml");
        long free = writeHall(map, n);
        Path mission = Files.writeString(dir.resolve("run.yaml"), """
                name: Largest hall run
                map: hall.yaml
                robot:
                  capacity: 500
                  resolution: 0.5
                  move-energy:
                    tile: 0.05
                  wait-energy: 0.05
                  charge-rate: 0.5
                  neighbourhood: 4
                start:
                  cell: [1, 1]
                  charge: 100%
                reserve: 20%
                tasks:
                  visit: [far-corner]
                  finish-on-dock: true
                objective:
                  kind: reserve
                """);
        CliRun.Forked p = CliRun.fork(dir, Duration.ofMinutes(5), List.of("-Xmx256m"), "check", mission.toString());
        String text = p.all();
        assertThat(p.finished()).as("check finished:\n%s", text).isTrue();
        assertThat(p.code()).as(text).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(text).contains(3 * free + " robot positions (" + free + " free cells x 3 disturbance states)")
                .contains("more than the JVM's maximum heap of 256 MB (set by -Xmx)").contains("hint: give the JVM more memory")
                .doesNotContain("Java heap space").doesNotContain("ran out of memory").doesNotContain("Exception");
    }

    /** Writes the hall: walls round it and along every 64th row (with a gap), docks in two corners; returns the free cells. */
    private static long writeHall(Path file, int n) throws IOException {
        long free = 0;
        try (Writer w = Files.newBufferedWriter(file)) {
            w.write("name: Largest hall (generated test)\ncell-size: 0.25\nlegend:\n  \"#\": wall\n  \".\": tile\n"
                    + "  \"C\": {surface: tile, dock: true}\nplan: |\n");
            char[] row = new char[n];
            for (int y = 0; y < n; y++) {
                for (int x = 0; x < n; x++) {
                    boolean wall = y == 0 || y == n - 1 || x == 0 || x == n - 1 || y % 64 == 0 && x % 64 != 32;
                    row[x] = wall ? '#' : (x == 1 && y == 1) || (x == n - 2 && y == n - 2) ? 'C' : '.';
                    free += wall ? 0 : 1;
                }
                w.write("  ");
                w.write(row);
                w.write('\n');
            }
            w.write("zones:\n  far-corner: {from: [2040, 2040], to: [2045, 2045]}\n");
            w.write("disturbances:\n  budget: 2\n  events:\n    - kind: slip\n      where: far-corner\n");
        }
        return free;
    }
}
