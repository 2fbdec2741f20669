package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.io.MapLoader;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.report.Caveats;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code dockline import} through the command line: the demo image gives the committed map, the
 * map loads with the project's loader, a mission on an imported map gives the same verdict as the
 * same plan typed by hand, and bad input is refused with exit 2 and nothing written.
 */
class ImportCommandTest {

    @TempDir
    Path dir;

    private static final ObjectMapper JSON = new ObjectMapper();

    private static final String[] DEMO_OPTIONS = {"--pixel-size", "0.1", "--cell-size", "0.3", "--robot-radius", "0.25",
        "--docks", "36,13;36,20", "--name", "Depot annex (demo, imported)"};

    @Test
    void demo_image_gives_the_committed_map_and_it_validates() throws IOException {
        Path out = dir.resolve("depot-annex.yaml");
        String[] args = Stream.concat(Stream.of("import", "maps/depot-annex.pgm"),
                Stream.concat(Stream.of(DEMO_OPTIONS), Stream.of("--out", out.toString()))).toArray(String[]::new);
        CliRun r = run(args);
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.err()).isEmpty();
        assertThat(Files.readString(out)).isEqualTo(Files.readString(Path.of("maps/depot-annex.yaml")));
        assertThat(r.out()).contains("map: 40 x 28 cells of 0.3 m (3 x 3 pixels each)")
                .contains("free cells: 334 (649 free in the image, 315 lost to the robot's footprint of radius 0.25 m)")
                .contains("connected free areas: 2 (largest 283 cells; the others 51)")
                .contains("docks: 36:13, 36:20")
                .contains(Caveats.LINES.get(0)).doesNotContain("warning");
        // the comment block records the source's name, size, SHA-256 (computed here with the JDK) and every option
        String text = Files.readString(out);
        assertThat(text).contains("# source image: depot-annex.pgm (PGM raw (P5), 120 x 84 pixels, maxval 255")
                .contains("# source SHA-256: " + sha256(Path.of("maps/depot-annex.pgm")))
                .contains("# options: --pixel-size 0.1 --cell-size 0.3 --occupied-at-most 25% --free-at-least 90%"
                        + " --robot-radius 0.25 --docks '36,13;36,20' --surface floor --name 'Depot annex (demo, imported)'")
                .doesNotContain("zones:").doesNotContain("doors:");
        CliRun v = run("validate", out.toString());
        assertThat(v.code()).as(v.err()).isZero();
        assertThat(v.out()).contains("40 x 28 cells of 0.3 m (334 free), 0 zones, 2 docks, 0 doors");
    }

    @Test
    void demo_mission_verdicts_as_documented() {
        // missions/README.md: guaranteed from 35 %, 47 units needed; not from 30 %
        CliRun ok = run("check", "missions/aisle-return.yaml", "--json");
        assertThat(ok.code()).as(ok.err()).isEqualTo(ExitCodes.OK);
        assertThat(ok.out()).contains("\"startNeedUnits\" : 47").contains("\"lowestLevelUnits\" : 23")
                .contains("\"highestReserveUnits\" : 23");
        assertThat(run("check", "missions/aisle-return.yaml", "--start-charge", "30%").code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
    }

    @Test
    void a_dock_cut_off_from_the_largest_area_is_warned_about_in_text_and_json() throws IOException {
        Path out = dir.resolve("m.yaml");
        // 3,10 is in the west strip that a speck of noise cuts off (maps/README.md)
        CliRun r = run("import", "maps/depot-annex.pgm", "--pixel-size", "0.1", "--cell-size", "0.3", "--robot-radius", "0.25",
                "--docks", "3,10;36,13", "--out", out.toString(), "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("imported").asBoolean()).isTrue();
        assertThat(j.get("freeCells").asInt()).isEqualTo(334);
        assertThat(j.get("lostToFootprint").asInt()).isEqualTo(315);
        assertThat(j.get("areas").asInt()).isEqualTo(2);
        assertThat(j.get("docksInLargestArea").asBoolean()).isFalse();
        assertThat(j.get("warnings").get(0).asText()).isEqualTo("dock 3:10 is in a free area of 51 cells, not connected to"
                + " the largest free area (283 cells)");
        assertThat(j.get("caveats")).hasSize(Caveats.LINES.size());
        assertThat(j.get("sha256").asText()).isEqualTo(sha256(Path.of("maps/depot-annex.pgm")));
    }

    // ---- the same verdict as the same plan typed by hand ----

    /** A room with a pillar, typed by hand. */
    private static final List<String> ROOM = List.of(
            "##############",
            "#C...........#",
            "#............#",
            "#............#",
            "#.....##.....#",
            "#............#",
            "#............#",
            "#............#",
            "##############");

    /**
     * The same room after the footprint of a robot of radius 0.15 m on 0.2 m cells, worked by hand:
     * a cell next to a wall (0.1 m to it) or diagonal to one (0.141 m to its corner) is lost, the
     * next ring (0.3 m or more) is kept.
     */
    private static final List<String> ROOM_FOOTPRINT = List.of(
            "##############",
            "#++++++++++++#",
            "#+C.........+#",
            "#+...++++...+#",
            "#+...+##+...+#",
            "#+...++++...+#",
            "#+..........+#",
            "#++++++++++++#",
            "##############");

    /**
     * Draws a plan as a raw PGM of 4 x 4 pixels a cell: free cells in light greys (all at or above
     * the free bound), wall cells with only some pixels dark or unseen, so that only the conservative
     * rule (one non-free pixel makes a wall) gives the plan back.
     */
    private static byte[] pgm(List<String> plan) {
        int k = 4;
        int w = plan.get(0).length() * k;
        int h = plan.size() * k;
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes(("P5\n" + w + " " + h + "\n255\n").getBytes(StandardCharsets.US_ASCII));
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                char c = plan.get(y / k).charAt(x / k);
                int v = 240 + (x * 7 + y * 3) % 15;           // free: 240..254
                if (c == '#') {
                    int which = (x / k + y / k) % 3;
                    int px = x % k;
                    int py = y % k;
                    if (which == 0 && px == 1 && py == 2) {
                        v = 10;                                  // one dark pixel
                    } else if (which == 1 && px == 3 && py == 3) {
                        v = 205;                                 // one unseen pixel
                    } else if (which == 2) {
                        v = 0;                                   // all dark
                    }
                }
                b.write(v);
            }
        }
        return b.toByteArray();
    }

    private static String handMap(List<String> plan) {
        StringBuilder sb = new StringBuilder("name: typed by hand\ncell-size: 0.2\nlegend:\n  \"#\": wall\n  \"+\": wall\n"
                + "  \".\": floor\n  \"C\": {surface: floor, dock: true}\nplan: |\n");
        plan.forEach(l -> sb.append("  ").append(l).append('\n'));
        return sb.toString();
    }

    private static String mission(String map, int startX, int startY, int chargeRate) {
        return "name: back to the dock\nmap: " + map + "\nrobot:\n  capacity: 10\n  resolution: 0.5\n  move-energy:\n"
                + "    floor: 0.5\n  wait-energy: 0.5\n  charge-rate: " + chargeRate + "\n  neighbourhood: 8\nstart:\n"
                + "  cell: [" + startX + ", " + startY + "]\n  charge: 100%\nreserve: 0\n";
    }

    private void sameVerdicts(List<String> drawn, List<String> typed, String radius, int sx, int sy) throws IOException {
        Path img = dir.resolve("room.pgm");
        Files.write(img, pgm(drawn));
        Path imported = dir.resolve("imported.yaml");
        String[] base = {"import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--docks", "2,2",
            "--out", imported.toString()};
        String[] args = radius == null ? base : Stream.concat(Stream.of(base), Stream.of("--robot-radius", radius))
                .toArray(String[]::new);
        // the dock: where the hand plan has its C
        int dy = 0;
        while (typed.get(dy).indexOf('C') < 0) {
            dy++;
        }
        args[7] = typed.get(dy).indexOf('C') + "," + dy;
        CliRun r = run(args);
        assertThat(r.code()).as(r.err()).isZero();
        Path hand = dir.resolve("hand.yaml");
        Files.writeString(hand, handMap(typed));

        // the plans agree cell by cell, as the project's loader reads them
        BuildingMap a = load(imported);
        BuildingMap b = load(hand);
        assertThat(a.width()).isEqualTo(b.width());
        assertThat(a.height()).isEqualTo(b.height());
        for (int y = 0; y < b.height(); y++) {
            for (int x = 0; x < b.width(); x++) {
                Cell c = new Cell(x, y);
                assertThat(a.isFree(c)).as("cell %s", c).isEqualTo(b.isFree(c));
            }
        }
        assertThat(a.docks()).isEqualTo(b.docks());

        // and the checks through the command line give the same answers, at every starting charge
        int guaranteed = 0;
        int notGuaranteed = 0;
        for (int chargeRate : new int[] {0, 1}) {
            Files.writeString(dir.resolve("on-imported.yaml"), mission("imported.yaml", sx, sy, chargeRate));
            Files.writeString(dir.resolve("on-hand.yaml"), mission("hand.yaml", sx, sy, chargeRate));
            for (String start : new String[] {"1", "2", "3", "4", "5", "6", "8", "10"}) {
                CliRun ri = run("check", dir.resolve("on-imported.yaml").toString(), "--start-charge", start, "--json");
                CliRun rh = run("check", dir.resolve("on-hand.yaml").toString(), "--start-charge", start, "--json");
                assertThat(ri.code()).as(ri.err()).isIn(ExitCodes.OK, ExitCodes.NOT_GUARANTEED);
                assertThat(ri.code()).as("start " + start).isEqualTo(rh.code());
                JsonNode ji = JSON.readTree(ri.out());
                JsonNode jh = JSON.readTree(rh.out());
                for (String key : new String[] {"verdict", "startNeedUnits", "lowestLevelUnits",
                    "highestReserveUnits"}) {
                    assertThat(String.valueOf(ji.get(key))).as(key + " from " + start).isEqualTo(String.valueOf(jh.get(key)));
                }
                if (ri.code() == ExitCodes.OK) {
                    guaranteed++;
                } else {
                    notGuaranteed++;
                }
            }
        }
        // both verdicts occur, so the comparison could have failed either way
        assertThat(guaranteed).isPositive();
        assertThat(notGuaranteed).isPositive();
    }

    private static BuildingMap load(Path p) {
        try {
            return MapLoader.load(p);
        } catch (dockline.io.InputException e) {
            throw new AssertionError(e.formatAll(), e);
        }
    }

    /** A named pipe as the image would block the reader for ever: it is refused before it is opened. */
    @Test
    void a_named_pipe_as_the_image_is_refused_at_once() throws Exception {
        Path fifo = dir.resolve("scan.pgm");
        boolean made;
        try {
            Process pr = new ProcessBuilder("mkfifo", fifo.toString()).redirectErrorStream(true).start();
            made = pr.waitFor(10, java.util.concurrent.TimeUnit.SECONDS) && pr.exitValue() == 0;
        } catch (IOException e) {
            made = false;
        }
        if (!made) {
            System.out.println("SKIPPED a_named_pipe_as_the_image_is_refused_at_once: mkfifo is not available here");
            org.junit.jupiter.api.Assumptions.assumeTrue(false, "mkfifo is not available");
        }
        Path out = dir.resolve("out.yaml");
        long t0 = System.nanoTime();
        CliRun r = run("import", fifo.toString(), "--pixel-size", "0.1", "--cell-size", "0.3", "--out", out.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("not a regular file");
        assertThat(out).doesNotExist();
        assertThat(System.nanoTime() - t0).isLessThan(5_000_000_000L);
    }

    @Test
    void imported_map_gives_the_same_verdict_as_the_plan_typed_by_hand() throws IOException {
        sameVerdicts(ROOM, ROOM, null, 12, 7);
    }

    @Test
    void with_a_footprint_the_same_verdict_as_the_plan_worked_out_by_hand() throws IOException {
        sameVerdicts(ROOM, ROOM_FOOTPRINT, "0.15", 11, 6);
    }

    // ---- bad input: exit 2, a clear message, nothing written ----

    private CliRun refused(String... args) {
        Path out = dir.resolve("never.yaml");
        String[] all = Stream.concat(Stream.of(args), Stream.of("--out", out.toString())).toArray(String[]::new);
        CliRun r = run(all);
        assertThat(r.code()).as(r.out() + r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(out).doesNotExist();
        assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
        try (Stream<Path> s = Files.list(dir)) {
            assertThat(s.filter(p -> p.getFileName().toString().endsWith(".part"))).isEmpty();
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        return r;
    }

    private Path file(String name, byte[] content) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    @Test
    void unreadable_truncated_and_bad_maxval_images() throws IOException {
        CliRun missing = refused("import", dir.resolve("none.pgm").toString(), "--pixel-size", "0.1", "--cell-size", "0.1");
        assertThat(missing.err()).contains("none.pgm: cannot read the image: it does not exist");
        CliRun folder = refused("import", dir.toString(), "--pixel-size", "0.1", "--cell-size", "0.1");
        assertThat(folder.err()).contains(": cannot read the image: it is a folder");
        Path cut = file("cut.pgm", "P5\n4 4\n255\nabc".getBytes(StandardCharsets.US_ASCII));
        assertThat(refused("import", cut.toString(), "--pixel-size", "0.1", "--cell-size", "0.1").err())
                .startsWith(cut + ": the raster is cut short: the header promises 16 bytes").contains("(hint: ");
        Path zero = file("zero.pgm", "P2\n1 1\n0\n0\n".getBytes(StandardCharsets.US_ASCII));
        assertThat(refused("import", zero.toString(), "--pixel-size", "0.1", "--cell-size", "0.1").err())
                .startsWith(zero + ":3:1: the maxval is 0, outside 1 to 65535");
        Path big = file("big.pgm", "P2\n1 1\n65536\n0\n".getBytes(StandardCharsets.US_ASCII));
        assertThat(refused("import", big.toString(), "--pixel-size", "0.1", "--cell-size", "0.1").err())
                .startsWith(big + ":3:1: the maxval is 65536, outside 1 to 65535");
        Path png = file("cut.png", new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n', 0, 0, 0});
        assertThat(refused("import", png.toString(), "--pixel-size", "0.1", "--cell-size", "0.1").err())
                .startsWith(png + ": the PNG image cannot be decoded");
        Path text = file("notes.pgm", "hello".getBytes(StandardCharsets.US_ASCII));
        assertThat(refused("import", text.toString(), "--pixel-size", "0.1", "--cell-size", "0.1").err())
                .contains("neither a Netpbm (PGM/PBM) nor a PNG image");
    }

    @Test
    void cell_size_must_be_a_whole_multiple_of_the_pixel_size() throws IOException {
        Path img = file("room.pgm", pgm(ROOM));
        // 0.3 / 0.2 = 1.5 pixels: exact decimal arithmetic, no binary rounding (0.3 / 0.1 is exactly 3)
        CliRun r = refused("import", img.toString(), "--pixel-size", "0.2", "--cell-size", "0.3");
        assertThat(r.err()).contains("--cell-size 0.3: the cell size 0.3 m is not a whole multiple of the pixel size 0.2 m"
                + " (hint: a cell covers whole pixels; try --cell-size 0.2 or 0.4)");
        assertThat(refused("import", img.toString(), "--pixel-size", "0.5", "--cell-size", "0.25").err())
                .contains("try --cell-size 0.5");
        // every option problem at once
        CliRun all = refused("import", img.toString(), "--pixel-size", "abc", "--cell-size", "0", "--docks", "1;2,x",
                "--free-at-least", "lots");
        assertThat(all.err().lines().filter(l -> l.startsWith("dockline import: ")).count()).isEqualTo(5);
        assertThat(run("import", img.toString(), "--pixel-size", "0.1", "--cell-size", "0.3", "--out",
                dir.resolve("ok.yaml").toString()).code()).isZero();
    }

    @Test
    void a_radius_larger_than_the_map_and_docks_on_occupied_cells_or_outside() throws IOException {
        Path img = file("room.pgm", pgm(ROOM));
        // the room is 14 x 9 cells of 0.2 m: 2.8 x 1.8 m
        CliRun wide = refused("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--robot-radius", "1");
        assertThat(wide.err()).isEqualTo(img + ": the robot (radius 1 m) is wider than the whole map (2.8 x 1.8 m)"
                + " (hint: --robot-radius is in metres, like --pixel-size and --cell-size)" + System.lineSeparator());
        CliRun docks = refused("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--robot-radius", "0.15",
                "--docks", "0,0;14,2;1,1;6,4;3,3");
        List<String> lines = docks.err().lines().toList();
        assertThat(lines).containsExactly(
                img + ": dock 0:0 is on an occupied cell: pixels 0..3 by 0..3 are not all free (hint: put the dock on a free"
                        + " cell, or check the thresholds and --invert)",
                img + ": dock 14:2 is outside the map of 14 x 9 cells (hint: x is 0 to 13 and y 0 to 8, counted in cells"
                        + " from the top-left corner)",
                img + ": dock 1:1 is on a cell the robot does not fit in (closer than 0.15 m to an obstacle) (hint: put the"
                        + " dock further from walls, or check --robot-radius)",
                img + ": dock 6:4 is on an occupied cell: pixels 24..27 by 16..19 are not all free (hint: put the dock on a"
                        + " free cell, or check the thresholds and --invert)");
        CliRun json = refused("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--docks", "0,0", "--json");
        JsonNode j = JSON.readTree(json.out());
        assertThat(j.get("imported").asBoolean()).isFalse();
        assertThat(j.get("problems").get(0).get("message").asText()).startsWith("dock 0:0 is on an occupied cell");
        assertThat(j.get("caveats")).isNotEmpty();
    }

    @Test
    void never_over_the_input_and_an_existing_map_survives_a_failed_import() throws IOException {
        Path img = file("room.pgm", pgm(ROOM));
        byte[] before = Files.readAllBytes(img);
        CliRun r = run("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--out", img.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("that is the input image");
        assertThat(Files.readAllBytes(img)).isEqualTo(before);
        Path old = dir.resolve("old.yaml");
        Files.writeString(old, "kept\n");
        CliRun bad = run("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--docks", "0,0",
                "--out", old.toString());
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(old)).isEqualTo("kept\n");
        CliRun noFolder = run("import", img.toString(), "--pixel-size", "0.05", "--cell-size", "0.2", "--out",
                dir.resolve("missing/m.yaml").toString());
        assertThat(noFolder.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(noFolder.err()).contains("does not exist");
    }

    @Test
    void thresholds_and_invert() throws IOException {
        // a 2 x 1 bitmap, one cell per pixel: black | white; inverted, the black pixel is the free one
        Path pbm = file("two.pbm", "P1\n2 1\n1 0\n".getBytes(StandardCharsets.US_ASCII));
        Path out = dir.resolve("two.yaml");
        assertThat(run("import", pbm.toString(), "--pixel-size", "1", "--cell-size", "1", "--out", out.toString()).code()).isZero();
        assertThat(Files.readString(out)).contains("plan: |\n  #.\n");
        assertThat(run("import", pbm.toString(), "--pixel-size", "1", "--cell-size", "1", "--invert", "--out",
                out.toString()).code()).isZero();
        assertThat(Files.readString(out)).contains("plan: |\n  .#\n").contains("--invert");
        // grey levels as levels and as percentages; between the two is unknown (a wall)
        Path pgm = file("three.pgm", "P2\n3 1\n100\n20 50 95\n".getBytes(StandardCharsets.US_ASCII));
        assertThat(run("import", pgm.toString(), "--pixel-size", "1", "--cell-size", "1", "--occupied-at-most", "20",
                "--free-at-least", "50%", "--out", out.toString()).code()).isZero();
        assertThat(Files.readString(out)).contains("plan: |\n  #..\n");
        assertThat(run("import", pgm.toString(), "--pixel-size", "1", "--cell-size", "1", "--free-at-least", "51%",
                "--out", out.toString()).code()).isZero();
        assertThat(Files.readString(out)).contains("plan: |\n  ##.\n");
        CliRun above = refused("import", pgm.toString(), "--pixel-size", "1", "--cell-size", "1", "--free-at-least", "101");
        assertThat(above.err()).contains("level 101 is above the image's maxval 100");
        CliRun crossed = refused("import", pgm.toString(), "--pixel-size", "1", "--cell-size", "1", "--occupied-at-most", "60%",
                "--free-at-least", "60%");
        assertThat(crossed.err()).contains("must be below the free bound");
    }

    private static String sha256(Path p) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p)));
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }
}
