package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The commands on lasting events: a model too large for memory, and the vault-check demo. */
class LastingCommandsTest {

    @TempDir
    Path tmp;

    /** A 120 x 60 hall with a lasting door every fourth cell and K = 3: far too many closure sets. */
    @Test
    void check_overTheMemoryBudget_isExit3_withTheRealSizeAndWhatToChange() throws Exception {
        StringBuilder plan = new StringBuilder();
        int w = 120;
        int h = 60;
        for (int y = 0; y < h; y++) {
            plan.append("  ");
            for (int x = 0; x < w; x++) {
                boolean wall = y == 0 || y == h - 1 || x == 0 || x == w - 1;
                plan.append(wall ? '#' : x == 1 && y == 1 ? 'C' : x % 4 == 0 && y % 4 == 0 ? 'D' : '.');
            }
            plan.append('\n');
        }
        Files.writeString(tmp.resolve("hall.yaml"), "name: hall\ncell-size: 1\nlegend:\n  \"#\": wall\n  \".\": tile\n"
                + "  \"D\": {surface: tile, door: true}\n  \"C\": {surface: tile, dock: true}\nplan: |\n" + plan
                + "disturbances:\n  budget: 3\n  events:\n    - kind: door-shut\n      where: all-doors\n");
        Files.writeString(tmp.resolve("m.yaml"), Files.readString(Path.of("missions/vault-check.yaml"))
                .replace("../maps/herbarium-annex.yaml", "hall.yaml").replace("  visit: [seed-vault]\n", ""));
        long t0 = System.nanoTime();
        CliRun r = CliRun.run("check", tmp.resolve("m.yaml").toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(r.err()).contains("robot vertices", "disturbance states", "duration: momentary", "at-most");
        assertThat(System.nanoTime() - t0).as("refused quickly").isLessThan(60_000_000_000L);
    }

    /** missions/README.md, "The shut fire door": not guaranteed as written, highest 4 units. */
    @Test
    void vaultCheck_isNotGuaranteed_exit1() {
        CliRun r = CliRun.run("check", "missions/vault-check.yaml");
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("Highest reserve floor guaranteed:      4 units = 2 Wh (5%)").contains("Safety: ");
    }
}
