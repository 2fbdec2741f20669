package dockline.io;

import static dockline.io.Fixtures.edit;
import static dockline.io.Fixtures.missionFiles;
import static dockline.io.Fixtures.missionProblems;
import static dockline.io.Fixtures.pos;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MissionLoaderTest {

    @TempDir
    Path dir;

    private List<Problem> problems(String mission) throws Exception {
        return missionProblems(missionFiles(dir, Fixtures.MAP, mission));
    }

    private static void assertAt(Problem p, String text, String needle) {
        int[] lc = pos(text, needle);
        assertThat(new int[] {p.line(), p.column()}).as(p.format()).containsExactly(lc[0], lc[1]);
    }

    @Test
    void fixture_loads() throws Exception {
        Mission m = MissionLoader.load(missionFiles(dir, Fixtures.MAP, Fixtures.MISSION));
        assertThat(m.name()).isEqualTo("test mission");
        assertThat(m.map().name()).isEqualTo("test floor");
        assertThat(m.map().source()).isEqualTo(dir.resolve("map.yaml"));
        assertThat(m.start()).isEqualTo(new Cell(1, 1));
        assertThat(m.robot().capacityWh()).isEqualByComparingTo("60");
        assertThat(m.robot().moveWh()).containsOnlyKeys("tile", "carpet", "ramp");
        assertThat(m.robot().neighbourhood()).isEqualTo(Neighbourhood.FOUR);
        // 80% of 60 Wh = 48 Wh = 96 units of 0.5 Wh; 20% = 12 Wh = 24 units (hand-worked)
        assertThat(m.startUnits()).isEqualTo(96);
        assertThat(m.reserveUnits()).isEqualTo(24);
        assertThat(m.tasks().visit()).containsExactly("corner");
        assertThat(m.tasks().finishOnDock()).isTrue();
        assertThat(m.objective()).isEqualTo(new Objective.Reserve());
    }

    @Test
    void demo_missions_load() throws Exception {
        for (String f : List.of("missions/night-round.yaml", "missions/supply-run.yaml", "missions/late-return.yaml")) {
            Mission m = MissionLoader.load(Path.of(f));
            assertThat(m.map().source()).as(f).isNotNull();
            assertThat(m.startUnits()).as(f).isGreaterThanOrEqualTo(m.reserveUnits());
        }
    }

    @Test
    void three_mistakes_give_exactly_three_problems() throws Exception {
        String text = edit(Fixtures.MISSION, "    tile: 0.5\n", "    tile: 0.5\n");
        text = edit(text, "  wait-energy: 0.5", "  wiat-energy: 0.5");   // misspelt key
        text = edit(text, "cell: [1, 1]", "cell: [0, 1]");             // start on a wall
        text = edit(text, "reserve: 20%", "reserve: 120%");            // reserve above 100%
        List<Problem> ps = problems(text);
        assertThat(ps).hasSize(3);
        assertThat(ps.get(0).message()).isEqualTo("unknown key 'wiat-energy', did you mean 'wait-energy'?");
        assertAt(ps.get(0), text, "wiat-energy");
        assertThat(ps.get(1).message()).isEqualTo("start cell 0:1 is a wall");
        assertAt(ps.get(1), text, "[0, 1]");
        assertThat(ps.get(2).message()).isEqualTo("reserve: '120%' is above 100% of the battery");
        assertAt(ps.get(2), text, "120%");
        assertThat(ps).allSatisfy(p -> assertThat(p.format()).matches(".*mission\\.yaml:\\d+:\\d+: .*"));
    }

    @Test
    void start_outside_the_map() throws Exception {
        String text = edit(Fixtures.MISSION, "cell: [1, 1]", "cell: [8, 1]");
        assertThat(problems(text)).singleElement().satisfies(p -> {
            assertThat(p.message()).isEqualTo("start cell 8:1 is outside the map (8 x 5 cells: x from 0 to 7, y from 0 to 4)");
            assertAt(p, text, "[8, 1]");
        });
    }

    @Test
    void start_in_an_avoided_zone() throws Exception {
        String text = edit(Fixtures.MISSION, "  order: given\n", "  order: given\n  avoid: [room]\n");
        assertThat(problems(text)).singleElement().satisfies(p ->
                assertThat(p.message()).isEqualTo("start cell 1:1 is in the avoided zone 'room'"));
    }

    @Test
    void reserve_above_the_starting_charge() throws Exception {
        String text = edit(Fixtures.MISSION, "charge: 80%", "charge: 10 Wh");
        assertThat(problems(text)).singleElement().satisfies(p -> {
            assertThat(p.message()).isEqualTo("the reserve floor (20% = 12 Wh, 24 units of 0.5 Wh) is above the starting"
                    + " charge (10 Wh, 20 units of 0.5 Wh)");
            assertAt(p, text, "20%");
        });
    }

    @Test
    void reserve_above_the_starting_charge_only_after_rounding() throws Exception {
        // 12.1 Wh rounds up to 25 units, 12.4 Wh down to 24 units (hand-worked at 0.5 Wh)
        String text = edit(Fixtures.MISSION, "charge: 80%", "charge: 12.4 Wh");
        text = edit(text, "reserve: 20%", "reserve: 12.1 Wh");
        assertThat(problems(text)).singleElement().satisfies(p -> {
            assertThat(p.message()).endsWith("after rounding to whole energy units");
            assertThat(p.hint()).contains("finer resolution");
        });
    }

    @Test
    void charges_above_capacity_or_100_percent() throws Exception {
        String text = edit(Fixtures.MISSION, "charge: 80%", "charge: 61 Wh");
        text = edit(text, "reserve: 20%", "reserve: 100.5%");
        List<Problem> ps = problems(text);
        assertThat(ps).extracting(Problem::message).containsExactly(
                "start charge 61 Wh is above the battery capacity of 60 Wh",
                "reserve: '100.5%' is above 100% of the battery");
        String wh = edit(Fixtures.MISSION, "reserve: 20%", "reserve: 70 Wh");
        assertThat(problems(wh)).singleElement().satisfies(p ->
                assertThat(p.message()).isEqualTo("reserve 70 Wh is above the battery capacity of 60 Wh"));
    }

    @Test
    void negative_or_zero_capacity_and_resolution() throws Exception {
        String text = edit(Fixtures.MISSION, "capacity: 60", "capacity: -60");
        text = edit(text, "resolution: 0.5", "resolution: 0");
        List<Problem> ps = problems(text);
        assertThat(ps).extracting(Problem::message).containsExactly(
                "capacity: '-60' is negative", "resolution must be more than 0 Wh");
        assertAt(ps.get(0), text, "-60");
    }

    @Test
    void unit_count_that_does_not_fit_an_int() throws Exception {
        // 60 Wh at 0.00000001 Wh per unit is 6 000 000 000 units > 2^31 - 1
        String text = edit(Fixtures.MISSION, "resolution: 0.5", "resolution: 0.00000001");
        List<Problem> ps = problems(text);
        assertThat(ps).isNotEmpty();
        assertThat(ps.get(0).message()).startsWith("capacity: 60 Wh does not fit in the solver's whole-number range");
        assertAt(ps.get(0), text, "60\n");
    }

    @Test
    void surface_without_move_energy_hints_at_the_misspelling() throws Exception {
        String text = edit(Fixtures.MISSION, "    carpet: 1", "    carpt: 1");
        assertThat(problems(text)).singleElement().satisfies(p -> {
            assertThat(p.message()).isEqualTo("no move energy for surface 'carpet', which the plan uses");
            assertThat(p.hint()).contains("'carpt'").contains("misspelling");
            assertAt(p, text, "move-energy");
        });
        String none = edit(Fixtures.MISSION, "    ramp: 1.5\n", "");
        assertThat(problems(none)).singleElement().satisfies(p ->
                assertThat(p.message()).isEqualTo("no move energy for surface 'ramp', which the plan uses"));
    }

    @Test
    void tasks_naming_unknown_zones() throws Exception {
        String text = edit(Fixtures.MISSION, "visit: [corner]", "visit: [corner, rooom, attic]");
        List<Problem> ps = problems(text);
        assertThat(ps).extracting(Problem::message).containsExactly(
                "no zone named 'rooom' in the map, did you mean 'room'?",
                "no zone named 'attic' in the map");
        assertAt(ps.get(0), text, "rooom");
        assertThat(ps.get(1).hint()).isEqualTo("zones of the map: room, rug, corner");
    }

    @Test
    void too_many_tasks() throws Exception {
        String visit = String.join(", ", java.util.Collections.nCopies(17, "corner"));
        String text = edit(Fixtures.MISSION, "visit: [corner]", "visit: [" + visit + "]");
        assertThat(problems(text)).singleElement().satisfies(p ->
                assertThat(p.message()).isEqualTo("the mission lists 17 zones to visit; at most 16 are allowed"));
    }

    @Test
    void discounted_objective_loads_and_its_mistakes_are_reported() throws Exception {
        String ok = edit(Fixtures.MISSION, "  kind: reserve", "  kind: discounted\n  discount: 2\n  threshold: -3/4\n  relation: \">\"");
        Mission m = MissionLoader.load(missionFiles(dir, Fixtures.MAP, ok));
        assertThat(m.objective()).isEqualTo(new Objective.Discounted(2, Rational.of(-3, 4), Relation.ABOVE));

        String words = edit(Fixtures.MISSION, "  kind: reserve", "  kind: discounted\n  discount: 3\n  threshold: 0.25\n  relation: at-least");
        assertThat(MissionLoader.load(missionFiles(dir, Fixtures.MAP, words)).objective())
                .isEqualTo(new Objective.Discounted(3, Rational.of(1, 4), Relation.AT_LEAST));

        String bad = edit(Fixtures.MISSION, "  kind: reserve", "  kind: discounted\n  discount: 2.5\n  threshold: 3/0\n  relation: >");
        List<Problem> ps = problems(bad);
        assertThat(ps).extracting(Problem::message).containsExactly(
                "discount (a whole number, at least 2) must be a whole number, not '2.5'",
                "threshold '3/0' is not a rational number",
                "relation: a bare '>' starts a folded text block in YAML");
        String notRational = edit(Fixtures.MISSION, "  kind: reserve", "  kind: discounted\n  discount: 1\n  threshold: three quarters");
        assertThat(problems(notRational)).extracting(Problem::message).containsExactly(
                "discount (a whole number, at least 2) must be between 2 and 1000000, not 1",
                "threshold 'three quarters' is not a rational number");
    }

    @Test
    void reserve_objective_rejects_discount_keys() throws Exception {
        String text = edit(Fixtures.MISSION, "  kind: reserve", "  kind: reserve\n  discount: 2");
        assertThat(problems(text)).extracting(Problem::message).contains("'discount' applies only to kind: discounted");
    }

    @Test
    void map_problems_are_reported_with_the_map_file_name() throws Exception {
        String map = edit(Fixtures.MAP, "  #...#,,#", "  #...#,x#");
        Path mission = missionFiles(dir, map, edit(Fixtures.MISSION, "capacity: 60", "capacity: lots"));
        List<Problem> ps = missionProblems(mission);
        assertThat(ps).hasSize(2);
        assertThat(ps.get(0).file()).isEqualTo(mission);
        assertThat(ps.get(0).message()).startsWith("capacity");
        assertThat(ps.get(1).file()).isEqualTo(dir.resolve("map.yaml"));
        assertThat(ps.get(1).message()).isEqualTo("character 'x' is not in the legend");
        int[] lc = pos(map, "x#");
        assertThat(ps.get(1).line()).isEqualTo(lc[0]);
        assertThat(ps.get(1).column()).isEqualTo(lc[1]);
    }

    @Test
    void map_path_is_relative_to_the_mission_file() throws Exception {
        Path sub = Files.createDirectories(dir.resolve("missions"));
        Files.createDirectories(dir.resolve("maps"));
        Files.writeString(dir.resolve("maps/floor.yaml"), Fixtures.MAP);
        Path mission = Fixtures.write(sub, "m.yaml", edit(Fixtures.MISSION, "map: map.yaml", "map: ../maps/floor.yaml"));
        assertThat(MissionLoader.load(mission).map().source()).isEqualTo(dir.resolve("maps/floor.yaml"));
        Path wrong = Fixtures.write(sub, "w.yaml", edit(Fixtures.MISSION, "map: map.yaml", "map: ../maps/flor.yaml"));
        assertThat(missionProblems(wrong)).singleElement().satisfies(p -> {
            assertThat(p.message()).startsWith("map file '../maps/flor.yaml' not found");
            assertThat(p.hint()).contains("did you mean 'floor.yaml'?");
            assertThat(p.line()).isEqualTo(2);
            assertThat(p.column()).isEqualTo(6);
        });
    }

    @Test
    void finish_on_dock_needs_a_dock() throws Exception {
        String map = edit(Fixtures.MAP, "  #C..D,,#", "  #...D,,#");
        Path mission = missionFiles(dir, map, Fixtures.MISSION);
        assertThat(missionProblems(mission)).singleElement().satisfies(p ->
                assertThat(p.message()).isEqualTo("the mission must finish on a dock, but the map has no dock"));
    }

    @Test
    void missing_keys_and_wrong_shapes() throws Exception {
        String text = edit(Fixtures.MISSION, "reserve: 20%\n", "");
        text = edit(text, "  neighbourhood: 4", "  neighbourhood: 6");
        text = edit(text, "  order: given", "  order: anny");
        text = edit(text, "  finish-on-dock: true", "  finish-on-dock: yes");
        List<Problem> ps = problems(text);
        assertThat(ps).extracting(Problem::message).containsExactly(
                "the mission: missing key 'reserve'",
                "neighbourhood must be 4 or 8, not 6",
                "order must be 'given' or 'any', not 'anny' (did you mean 'any'?)",
                "finish-on-dock must be true or false, not 'yes'");
        assertThat(ps.get(0).line()).isEqualTo(1);
    }

    @Test
    void nothing_to_do_is_a_problem() throws Exception {
        String text = edit(Fixtures.MISSION, "  visit: [corner]\n", "");
        text = edit(text, "finish-on-dock: true", "finish-on-dock: false");
        assertThat(problems(text)).singleElement().satisfies(p -> assertThat(p.message()).contains("nothing to do"));
    }

    @Test
    void wh_figures_with_units_and_exact_decimals() throws Exception {
        String text = edit(Fixtures.MISSION, "capacity: 60", "capacity: 60.10 Wh");
        text = edit(text, "    tile: 0.5", "    tile: 0.30000000000000004"); // a double's noise: too many decimals
        List<Problem> ps = problems(text);
        assertThat(ps).singleElement().satisfies(p ->
                assertThat(p.message()).contains("too many decimals"));
        String exact = edit(Fixtures.MISSION, "capacity: 60", "capacity: 60.10 Wh");
        exact = edit(exact, "    tile: 0.5", "    tile: 0.1");
        Mission m = MissionLoader.load(missionFiles(dir, Fixtures.MAP, exact));
        assertThat(m.robot().capacityWh()).isEqualByComparingTo("60.10");
        assertThat(m.robot().moveWh().get("tile").toPlainString()).isEqualTo("0.1"); // never a double
    }
}
