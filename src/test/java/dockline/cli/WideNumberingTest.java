package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.CliRun;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A product game whose implicit numbering passes 2^31 slots is solved, not refused for its numbering
 * (only memory may refuse it). The floor (invented) is an open 108 x 108 hall, 16 tasks in order and
 * 1,001 battery levels: arena vertices x 2^5 goal bits x 2^10 level bits is about 2.3 billion slots,
 * about 1.2 GB of counters, so it runs in a child JVM with 3 GB of heap. The start, the last task's
 * cell and the dock are the hall's last cells, so the triples the solve touches have numbers above
 * 2^31. Oracle (closed form, worked by hand): the start cell lies in the first 15 task zones, so the
 * robot must enter the 16th zone's cell and then the dock beside it: 2 moves of 5 units each, with no
 * disturbance (budget 0), so the highest guaranteed floor is 1000 - 10 = 990 units and the worst level 990.
 */
class WideNumberingTest {

    @TempDir
    Path dir;

    @Test
    void aProductPastTwoToThe31SlotsIsSolved() throws Exception {
        int side = 110;
        StringBuilder plan = new StringBuilder();
        for (int y = 0; y < side; y++) {
            StringBuilder row = new StringBuilder();
            for (int x = 0; x < side; x++) {
                boolean wall = x == 0 || y == 0 || x == side - 1 || y == side - 1;
                row.append(wall ? '#' : x == side - 4 && y == side - 2 ? 'C' : '.');
            }
            plan.append("  ").append(row).append('\n');
        }
        int sx = side - 2;
        int sy = side - 2;
        StringBuilder zones = new StringBuilder("zones:\n");
        StringBuilder visit = new StringBuilder();
        for (int i = 0; i < 16; i++) {
            int x = i < 15 ? sx : sx - 1;
            zones.append("  z").append(i).append(": {cells: [[").append(x).append(", ").append(sy).append("]]}\n");
            visit.append(i == 0 ? "" : ", ").append('z').append(i);
        }
        Files.writeString(dir.resolve("hall.yaml"), "name: Wide hall (generated test)\ncell-size: 1\nlegend:\n"
                + "  \"#\": wall\n  \".\": tile\n  \"C\": {surface: tile, dock: true}\nplan: |\n" + plan + zones);
        Path mission = Files.writeString(dir.resolve("run.yaml"), """
                name: Wide hall run
                map: hall.yaml
                robot:
                  capacity: 100
                  resolution: 0.1
                  move-energy:
                    tile: 0.5
                  wait-energy: 0.1
                  charge-rate: 0
                  neighbourhood: 4
                start:
                  cell: [%d, %d]
                  charge: 100%%
                reserve: 0
                tasks:
                  visit: [%s]
                  order: given
                  finish-on-dock: true
                objective:
                  kind: reserve
                """.formatted(sx, sy, visit));

        // the figures the test relies on: the numbering's size and the touched triples' numbers
        Mission m = MissionLoader.load(mission);
        Arena arena = ArenaCompiler.compile(m);
        long slots = (long) arena.vertexCount() << (5 + 10);
        assertThat(slots).as("slots of the numbering").isGreaterThan(1L << 31);
        int firstAction = arena.target(arena.outBegin(arena.startVertex()));
        assertThat((long) firstAction << 15).as("the start's actions are numbered past 2^31").isGreaterThan(1L << 31);

        CliRun.Forked p = CliRun.fork(dir, Duration.ofMinutes(10), List.of("-Xmx3g"), "check", mission.toString(),
                "--method", "product", "--max-memory", "2500", "--json");
        assertThat(p.finished()).as("check finished; stderr:\n%s", p.err()).isTrue();
        assertThat(p.code()).as(p.err() + p.out()).isEqualTo(ExitCodes.OK);
        JsonNode j = new ObjectMapper().readTree(p.out());
        assertThat(j.get("verdict").asText()).isEqualTo("guaranteed");
        assertThat(j.get("highestReserveUnits").asInt()).isEqualTo(990);
        assertThat(j.get("lowestLevelUnits").asInt()).isEqualTo(990);
        assertThat(j.get("certified").asBoolean()).isTrue();
    }
}
