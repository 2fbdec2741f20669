package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import dockline.policy.Policy;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Small input files for the loader tests (invented test data), and helpers to find positions in them. */
final class Fixtures {

    private Fixtures() {
    }

    /** An 8 x 5 map: one room with a dock and a door, a carpeted corner and a ramp. */
    static final String MAP = """
            name: test floor
            cell-size: 1
            legend:
              "#": wall
              ".": tile
              ",": carpet
              "/": ramp
              "C": {surface: tile, dock: true}
              "D": {surface: tile, door: true}
            plan: |
              ########
              #C..D,,#
              #...#,,#
              #../#..#
              ########
            zones:
              room: {from: [1, 1], to: [3, 3]}
              rug: {from: [5, 1], to: [6, 3]}
              corner: {cells: [[6, 3]]}
            doors:
              gate: [4, 1]
            disturbances:
              budget: 1
              events:
                - kind: door-shut
                  where: gate
                - kind: drag
                  where: rug
                  extra: 0.5
            """;

    /** A mission on {@link #MAP}, which it expects in {@code map.yaml} beside it. */
    static final String MISSION = """
            name: test mission
            map: map.yaml
            robot:
              capacity: 60
              resolution: 0.5
              move-energy:
                tile: 0.5
                carpet: 1
                ramp: 1.5
              wait-energy: 0.5
              charge-rate: 1
              neighbourhood: 4
            start:
              cell: [1, 1]
              charge: 80%
            reserve: 20%
            tasks:
              visit: [corner]
              order: given
              finish-on-dock: true
            objective:
              kind: reserve
            """;

    static Path write(Path dir, String name, String content) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, content, StandardCharsets.UTF_8);
        return p;
    }

    static Path write(Path dir, String name, byte[] content) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    /** The lines of the policy file that {@link PolicyFiles#write} makes of {@code policy} at dir/name. */
    static List<String> writtenPolicy(Path dir, String name, PolicyFiles.Header header, Policy policy)
            throws IOException {
        Path f = dir.resolve(name);
        PolicyFiles.write(f, header, policy);
        return Files.readAllLines(f);
    }

    /**
     * Writes {@code policy} to dir/name and reads it back: the header and the rows must come back as they
     * were. Returns what was read.
     */
    static PolicyFiles.Document policyRoundTrip(Path dir, String name, PolicyFiles.Header header, Policy policy)
            throws IOException, InputException {
        Path f = dir.resolve(name);
        PolicyFiles.write(f, header, policy);
        PolicyFiles.Document d = PolicyFiles.read(f);
        assertThat(d.header()).isEqualTo(header);
        assertThat(d.policy().entries()).isEqualTo(policy.entries());
        return d;
    }

    /** Writes the map and the mission into dir; returns the mission's path. */
    static Path missionFiles(Path dir, String map, String mission) throws IOException {
        write(dir, "map.yaml", map);
        return write(dir, "mission.yaml", mission);
    }

    /** The problems of loading a map that must be invalid. */
    static List<Problem> mapProblems(Path file) {
        InputException e = catchThrowableOfType(InputException.class, () -> MapLoader.load(file));
        assertThat(e).as("map should be rejected").isNotNull();
        return e.problems();
    }

    /** The problems of loading a mission that must be invalid. */
    static List<Problem> missionProblems(Path file) {
        InputException e = catchThrowableOfType(InputException.class, () -> MissionLoader.load(file));
        assertThat(e).as("mission should be rejected").isNotNull();
        return e.problems();
    }

    /**
     * 1-based line and column of the n-th (0-based) occurrence of needle in text, counted by
     * hand here (independently of the loader's own line table).
     */
    static int[] pos(String text, String needle, int occurrence) {
        int idx = -1;
        for (int i = 0; i <= occurrence; i++) {
            idx = text.indexOf(needle, idx + 1);
            if (idx < 0) {
                throw new IllegalArgumentException("'" + needle + "' not found");
            }
        }
        int line = 1;
        int col = 1;
        for (int i = 0; i < idx; i++) {
            if (text.charAt(i) == '\n') {
                line++;
                col = 1;
            } else {
                col++;
            }
        }
        return new int[] {line, col};
    }

    static int[] pos(String text, String needle) {
        return pos(text, needle, 0);
    }

    /** Replaces exactly one occurrence (fails if the text is not there, so a fixture edit cannot silently do nothing). */
    static String edit(String text, String from, String to) {
        int i = text.indexOf(from);
        if (i < 0 || text.indexOf(from, i + 1) >= 0) {
            throw new IllegalArgumentException("'" + from + "' must occur exactly once");
        }
        return text.substring(0, i) + to + text.substring(i + from.length());
    }
}
