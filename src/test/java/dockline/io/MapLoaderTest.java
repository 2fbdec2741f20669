package dockline.io;

import static dockline.io.Fixtures.edit;
import static dockline.io.Fixtures.mapProblems;
import static dockline.io.Fixtures.pos;
import static dockline.io.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import java.io.ByteArrayOutputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MapLoaderTest {

    @TempDir
    Path dir;

    private static void assertAt(Problem p, String text, String needle, int occurrence) {
        int[] lc = pos(text, needle, occurrence);
        assertThat(new int[] {p.line(), p.column()}).as(p.format()).containsExactly(lc[0], lc[1]);
    }

    private static void assertAt(Problem p, String text, String needle) {
        assertAt(p, text, needle, 0);
    }

    @Test
    void fixture_loads_with_every_part() throws Exception {
        BuildingMap m = MapLoader.load(write(dir, "m.yaml", Fixtures.MAP));
        assertThat(m.name()).isEqualTo("test floor");
        assertThat(m.width()).isEqualTo(8);
        assertThat(m.height()).isEqualTo(5);
        assertThat(m.cellSizeMetres()).isEqualByComparingTo("1");
        assertThat(m.docks()).containsExactly(new Cell(1, 1));
        assertThat(m.terrainAt(new Cell(4, 1)).door()).isTrue();
        assertThat(m.terrainAt(new Cell(3, 3)).surface()).isEqualTo("ramp");
        assertThat(m.zone("room").orElseThrow().cells()).hasSize(9); // 3 x 3, all free (3:3 is the ramp)
        assertThat(m.zone("corner").orElseThrow().cells()).containsExactly(new Cell(6, 3));
        assertThat(m.doorNames()).containsEntry(new Cell(4, 1), "gate");
        assertThat(m.disturbances().budget()).isEqualTo(1);
        List<EventRule> rules = m.disturbances().rules();
        assertThat(rules).hasSize(2);
        assertThat(rules.get(0).kind()).isEqualTo(EventKind.DOOR_SHUT);
        assertThat(rules.get(0).label()).isEqualTo("door gate");
        assertThat(rules.get(0).cells()).containsExactly(new Cell(4, 1));
        assertThat(rules.get(1).kind()).isEqualTo(EventKind.DRAG);
        assertThat(rules.get(1).extraWh()).isEqualByComparingTo(new BigDecimal("0.5"));
        assertThat(rules.get(1).cells()).hasSize(6);
    }

    @Test
    void demo_maps_load() throws Exception {
        BuildingMap small = MapLoader.load(Path.of("maps/clinic-wing.yaml"));
        assertThat(small.width()).isEqualTo(20);
        assertThat(small.height()).isEqualTo(12);
        BuildingMap large = MapLoader.load(Path.of("maps/research-block.yaml"));
        assertThat(large.width()).isEqualTo(60);
        assertThat(large.height()).isEqualTo(40);
        assertThat(large.docks()).hasSize(2);
        assertThat(large.legend().values()).extracting(t -> t.surface()).contains("tile", "carpet", "ramp");
    }

    @Test
    void unknown_plan_character_points_at_that_character() throws Exception {
        String text = edit(Fixtures.MAP, "#../#..#", "#../#.?#");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(1);
        assertThat(ps.get(0).message()).contains("'?'").contains("not in the legend");
        assertAt(ps.get(0), text, "?#");
    }

    @Test
    void unknown_character_at_row_5_column_12_of_a_wider_plan() throws Exception {
        StringBuilder plan = new StringBuilder();
        for (int y = 0; y < 8; y++) {
            plan.append("    ").append(y == 5 ? "#" + ".".repeat(10) + "x" + ".".repeat(7) + "#" : "#".repeat(20)).append('\n');
        }
        // the plan indented by four spaces, to check the column is taken from the file, not the row
        String text = "cell-size: 1\nlegend:\n  \"#\": wall\n  \".\": tile\nplan: |\n" + plan;
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(1);
        // row 5 is on file line 6 + 5 = 11; x = 11 plus four spaces of indentation -> column 16
        assertThat(ps.get(0).line()).isEqualTo(11);
        assertThat(ps.get(0).column()).isEqualTo(16);
        assertAt(ps.get(0), text, "x");
    }

    @Test
    void unquoted_hash_key_is_a_comment_and_the_hint_says_so() throws Exception {
        String text = edit(Fixtures.MAP, "  \"#\": wall\n", "  #: wall\n");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).isNotEmpty();
        assertThat(ps.get(0).message()).contains("'#' is not in the legend");
        assertThat(ps.get(0).hint()).contains("in quotes");
        assertAt(ps.get(0), text, "########");
        // reported three times, then counted
        assertThat(ps).hasSize(4);
        assertThat(ps.get(3).message()).contains("more time");
    }

    @Test
    void ragged_rows_are_reported_at_the_row() throws Exception {
        String text = edit(Fixtures.MAP, "  #...#,,#\n", "  #...#,#\n");
        text = edit(text, "  #../#..#\n", "  #../#...#\n");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(2);
        assertThat(ps.get(0).message()).isEqualTo("plan row 2 is 7 cells wide, but row 0 is 8");
        int[] short0 = pos(text, "#...#,#");
        assertThat(ps.get(0).line()).isEqualTo(short0[0]);
        assertThat(ps.get(0).column()).isEqualTo(short0[1] + 7); // just after the last character
        assertThat(ps.get(1).message()).isEqualTo("plan row 3 is 9 cells wide, but row 0 is 8");
        int[] long0 = pos(text, "#../#...#");
        assertThat(ps.get(1).column()).isEqualTo(long0[1] + 8); // the first character too many
    }

    @Test
    void tabs_are_reported_where_they_are_and_nothing_else_there() throws Exception {
        String text = edit(Fixtures.MAP, "  #C..D,,#", "  #C.\tD,,#");
        text = edit(text, "name: test floor", "name:\ttest floor");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).extracting(Problem::message).containsExactly("tab character", "tab character");
        assertAt(ps.get(0), text, "\t", 0);
        assertAt(ps.get(1), text, "\t", 1);
        assertThat(ps.get(0).hint()).contains("spaces");
    }

    @Test
    void tab_indentation_is_reported_as_a_tab_not_as_a_confusing_syntax_error() throws Exception {
        String text = edit(Fixtures.MAP, "  \".\": tile", "\t\".\": tile");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps.get(0).message()).isEqualTo("tab character");
        assertAt(ps.get(0), text, "\t");
        assertThat(ps).extracting(Problem::message).noneMatch(m -> m.contains("YAML syntax") && m.contains("TAB"));
    }

    @Test
    void bytes_that_are_not_utf8_are_reported_with_line_and_column() throws Exception {
        String text = Fixtures.MAP;
        int[] at = pos(text, "test floor");
        byte[] before = text.substring(0, text.indexOf("test floor") + 5).getBytes(StandardCharsets.UTF_8);
        byte[] after = text.substring(text.indexOf("test floor") + 5).getBytes(StandardCharsets.UTF_8);
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.write(before);
        b.write(0xC3); // a lead byte without its continuation byte
        b.write(0x28);
        b.write(after);
        List<Problem> ps = mapProblems(write(dir, "m.yaml", b.toByteArray()));
        assertThat(ps).hasSize(1);
        assertThat(ps.get(0).message()).contains("0xC3").contains("not valid UTF-8");
        assertThat(ps.get(0).line()).isEqualTo(at[0]);
        assertThat(ps.get(0).column()).isEqualTo(at[1] + 5);
    }

    @Test
    void latin1_file_is_rejected_not_misread() throws Exception {
        byte[] bytes = Fixtures.MAP.replace("test floor", "caf\u00e9 floor").getBytes(StandardCharsets.ISO_8859_1);
        List<Problem> ps = mapProblems(write(dir, "m.yaml", bytes));
        assertThat(ps).singleElement().satisfies(p -> {
            assertThat(p.message()).contains("0xE9");
            assertThat(p.line()).isEqualTo(1);
            assertThat(p.column()).isEqualTo(10);
        });
    }

    @Test
    void empty_and_comment_only_files() throws Exception {
        for (String text : List.of("", "\n\n", "# nothing here\n   \n")) {
            List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
            assertThat(ps).singleElement().satisfies(p -> {
                assertThat(p.message()).isEqualTo("the file is empty");
                assertThat(p.line()).isEqualTo(1);
                assertThat(p.column()).isEqualTo(1);
            });
        }
    }

    @Test
    void missing_file_and_directory() {
        assertThat(mapProblems(dir.resolve("nope.yaml"))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("does not exist"));
        assertThat(mapProblems(dir)).singleElement().satisfies(p -> assertThat(p.message()).contains("directory"));
    }

    @Test
    void alias_bomb_is_rejected_quickly_without_expansion() throws Exception {
        // the classic exponential alias expansion: nine levels of ten aliases each
        StringBuilder sb = new StringBuilder("a0: &a0 [\"x\", \"x\", \"x\", \"x\", \"x\", \"x\", \"x\", \"x\", \"x\", \"x\"]\n");
        for (int i = 1; i < 10; i++) {
            sb.append("a").append(i).append(": &a").append(i).append(" [");
            for (int j = 0; j < 10; j++) {
                sb.append(j == 0 ? "" : ", ").append("*a").append(i - 1);
            }
            sb.append("]\n");
        }
        List<Problem> ps = mapProblems(write(dir, "m.yaml", sb.toString()));
        assertThat(ps).filteredOn(p -> p.message().contains("aliases")).isNotEmpty().allSatisfy(p -> {
            assertThat(p.message()).contains("not supported");
            assertThat(p.line()).isBetween(2, 10);
        });
        assertThat(ps).size().isLessThanOrEqualTo(Problems.LIMIT + 1);
    }

    @Test
    void deep_nesting_is_rejected() throws Exception {
        // (lines are at most 65 536 characters: the nesting check is met long before that)
        String deep = "legend: " + "[".repeat(30_000) + "]".repeat(30_000) + "\n";
        List<Problem> ps = mapProblems(write(dir, "m.yaml", deep));
        assertThat(ps).singleElement().satisfies(p -> assertThat(p.message()).contains("nested too deeply"));
        String deepMaps = "legend: " + "{a: ".repeat(5_000) + "1" + "}".repeat(5_000) + "\n";
        assertThat(mapProblems(write(dir, "m2.yaml", deepMaps))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("nested too deeply"));
    }

    @Test
    void oversized_file_is_rejected_before_parsing() throws Exception {
        String big = "# " + "x".repeat(YamlReader.MAX_BYTES) + "\n";
        assertThat(mapProblems(write(dir, "m.yaml", big))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("too large"));
    }

    @Test
    void oversized_plan_is_rejected() throws Exception {
        String row = "  " + "#".repeat(10) + "\n";
        String text = "cell-size: 1\nlegend:\n  \"#\": wall\nplan: |\n" + row.repeat(MapLoader.MAX_SIDE + 1);
        assertThat(mapProblems(write(dir, "m.yaml", text))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("2049 rows"));
        String wide = "cell-size: 1\nlegend:\n  \"#\": wall\nplan: |\n  " + "#".repeat(MapLoader.MAX_SIDE + 1) + "\n";
        assertThat(mapProblems(write(dir, "m2.yaml", wide))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("2049 cells wide"));
    }

    @Test
    void huge_and_odd_numbers_are_problems_not_crashes() throws Exception {
        for (String v : List.of("1e400", "99999999999999999999999", "0x10", ".inf", "-.nan", "1_000", "two")) {
            String text = edit(Fixtures.MAP, "cell-size: 1", "cell-size: " + v);
            List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
            assertThat(ps).as(v).singleElement().satisfies(p -> {
                assertThat(p.message()).startsWith("cell-size");
                assertThat(p.line()).isEqualTo(2);
                assertThat(p.column()).isEqualTo(12);
            });
        }
        String budget = edit(Fixtures.MAP, "budget: 1", "budget: 123456789012345678901234567890");
        assertThat(mapProblems(write(dir, "m.yaml", budget))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("too large"));
    }

    @Test
    void second_document_and_duplicate_key() throws Exception {
        assertThat(mapProblems(write(dir, "m.yaml", Fixtures.MAP + "---\nname: other\n"))).singleElement()
                .satisfies(p -> assertThat(p.message()).contains("second YAML document"));
        String dup = edit(Fixtures.MAP, "cell-size: 1\n", "cell-size: 1\ncell-size: 2\n");
        assertThat(mapProblems(write(dir, "m.yaml", dup))).singleElement().satisfies(p -> {
            assertThat(p.message()).contains("appears twice");
            assertThat(p.line()).isEqualTo(3);
        });
    }

    @Test
    void yaml_syntax_error_has_the_scanner_position() throws Exception {
        String text = edit(Fixtures.MAP, "  gate: [4, 1]", "  gate: [4, 1");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).singleElement().satisfies(p -> {
            assertThat(p.message()).startsWith("YAML syntax:");
            assertThat(p.line()).isGreaterThanOrEqualTo(pos(text, "gate:")[0]);
        });
    }

    @Test
    void unknown_key_suggests_the_closest() throws Exception {
        String text = edit(Fixtures.MAP, "zones:", "zonse:");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).anySatisfy(p -> {
            assertThat(p.message()).isEqualTo("unknown key 'zonse', did you mean 'zones'?");
            assertAt(p, text, "zonse");
        });
    }

    @Test
    void dock_on_a_wall_and_door_on_a_wall() throws Exception {
        String text = edit(Fixtures.MAP, "\"C\": {surface: tile, dock: true}", "\"C\": {surface: wall, dock: true}");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).anySatisfy(p -> {
            assertThat(p.message()).isEqualTo("a dock cannot stand on a wall");
            assertAt(p, text, "true}");
        });
        String door = edit(Fixtures.MAP, "\"D\": {surface: tile, door: true}", "\"D\": {surface: wall, door: true}");
        assertThat(mapProblems(write(dir, "m.yaml", door))).anySatisfy(p ->
                assertThat(p.message()).isEqualTo("a door cannot be a wall"));
    }

    @Test
    void zone_problems() throws Exception {
        String text = edit(Fixtures.MAP, "  corner: {cells: [[6, 3]]}",
                "  corner: {cells: [[7, 3]]}\n  far: {from: [1, 1], to: [9, 3]}\n  solid: {from: [0, 0], to: [7, 0]}\n"
                        + "  half: {from: [1, 1]}");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).extracting(Problem::message).containsExactly(
                "zone 'corner': cell 7:3 is a wall",
                "zone 'far': cell 9:3 is outside the plan (8 x 5 cells: x from 0 to 7, y from 0 to 4)",
                "zone 'solid' contains no free cell",
                "zone 'half': a rectangle needs both 'from' and 'to'");
        assertAt(ps.get(0), text, "[7, 3]");
        assertAt(ps.get(1), text, "[9, 3]");
        assertAt(ps.get(2), text, "solid");
    }

    @Test
    void many_zones_are_accepted() throws Exception {
        // 200 zones: more than a 64-bit mask over all of them would hold; only task zones get a label bit
        StringBuilder zones = new StringBuilder("zones:\n");
        for (int i = 0; i < 200; i++) {
            zones.append("  z").append(i).append(": {cells: [[1, 1]]}\n");
        }
        String text = Fixtures.MAP.substring(0, Fixtures.MAP.indexOf("zones:")) + zones;
        BuildingMap m = MapLoader.load(write(dir, "m.yaml", text));
        assertThat(m.zones()).hasSize(200);
    }

    @Test
    void door_and_event_problems() throws Exception {
        String text = edit(Fixtures.MAP, "  gate: [4, 1]", "  gate: [4, 1]\n  room: [4, 1]\n  fake: [2, 2]");
        text = edit(text, "kind: drag", "kind: dragg");
        text = edit(text, "where: gate", "where: [gaet, all-doors]");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).extracting(Problem::message).containsExactly(
                "'room' names both a zone and a door",
                "door 'fake': cell 2:2 is not a door (its character '.' means tile)",
                "no zone or door named 'gaet', did you mean 'gate'?",
                "unknown event kind 'dragg', did you mean 'drag'?");
        assertAt(ps.get(3), text, "dragg");
    }

    @Test
    void drag_needs_extra_and_other_kinds_must_not_have_it() throws Exception {
        String text = edit(Fixtures.MAP, "      extra: 0.5\n", "");
        text = edit(text, "where: gate", "where: gate\n      extra: 1");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).extracting(Problem::message).containsExactly(
                "'extra' applies only to kind: drag",
                "a drag event needs 'extra': the energy in Wh added to each dragged move");
    }

    @Test
    void all_problems_of_a_file_in_one_run() throws Exception {
        String text = edit(Fixtures.MAP, "cell-size: 1", "cell-size: -1");
        text = edit(text, "  #...#,,#", "  #...#,!#");
        text = edit(text, "budget: 1", "budget: lots");
        text = edit(text, "  rug: {from: [5, 1], to: [6, 3]}", "  rug: {from: [5, 1], to: [6, 30]}");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(4);
        assertThat(ps).isSortedAccordingTo(java.util.Comparator.comparingInt(Problem::line));
    }

    @Test
    void crlf_line_ends_and_a_byte_order_mark_keep_positions_exact() throws Exception {
        String text = edit(Fixtures.MAP, "#../#..#", "#../#.?#");
        byte[] body = text.replace("\n", "\r\n").getBytes(StandardCharsets.UTF_8);
        byte[] bytes = new byte[body.length + 3];
        bytes[0] = (byte) 0xEF;
        bytes[1] = (byte) 0xBB;
        bytes[2] = (byte) 0xBF;
        System.arraycopy(body, 0, bytes, 3, body.length);
        List<Problem> ps = mapProblems(write(dir, "m.yaml", bytes));
        assertThat(ps).singleElement().satisfies(p -> assertAt(p, text, "?#"));
        assertThat(MapLoader.load(write(dir, "ok.yaml", Fixtures.MAP.replace("\n", "\r\n")))).isNotNull();
    }

    @Test
    void explicit_indentation_keeps_columns_exact() throws Exception {
        // with "|2" the block is indented by two spaces, so the two further spaces are plan cells
        String text = edit(Fixtures.MAP, "plan: |\n  ########", "plan: |2\n    ########");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps.get(0).message()).isEqualTo("a space in the plan");
        int[] lc = pos(text, "    ########");
        assertThat(ps.get(0).line()).isEqualTo(lc[0]);
        assertThat(ps.get(0).column()).isEqualTo(3);
    }

    @Test
    void blank_line_inside_the_plan_is_an_empty_row() throws Exception {
        String text = edit(Fixtures.MAP, "  #...#,,#\n", "  #...#,,#\n\n");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).singleElement().satisfies(p -> {
            assertThat(p.message()).isEqualTo("plan row 3 is empty");
            assertThat(p.line()).isEqualTo(pos(text, "  #...#,,#")[0] + 1);
        });
    }

    @Test
    void plan_must_be_a_literal_block() throws Exception {
        String text = edit(Fixtures.MAP, "plan: |", "plan: >");
        assertThat(mapProblems(write(dir, "m.yaml", text))).anySatisfy(p -> {
            assertThat(p.message()).isEqualTo("plan must be a block of rows written after 'plan: |'");
            assertAt(p, text, ">");
        });
    }

    @Test
    void control_characters_are_reported_where_they_are() throws Exception {
        String text = edit(Fixtures.MAP, "#C..D,,#", "#C.\u0000D,,#");
        text = edit(text, "name: test floor", "name: test\u001b floor");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).extracting(Problem::message).containsExactly(
                "control character U+001B is not allowed", "control character U+0000 is not allowed");
        assertAt(ps.get(0), text, "\u001b");
        assertAt(ps.get(1), text, "\u0000");
    }
}
