package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad patrol and deadline input: exit 2, located as file:line:column, with a hint, never a stack trace; and
 * the demo missions of patrols and deadlines give their documented verdicts (missions/README.md).
 */
class RoundsInputTest {

    @TempDir
    Path dir;

    private Path mission(String tail, String robotExtra) throws Exception {
        Path map = Path.of("maps/clinic-wing.yaml").toAbsolutePath();
        String text = "name: test\nmap: " + map + "\nrobot:\n  capacity: 60\n  resolution: 0.5\n  move-energy:\n"
                + "    tile: 0.5\n    carpet: 1\n    ramp: 1.5\n  wait-energy: 0.5\n  charge-rate: 1\n" + robotExtra
                + "start:\n  cell: [1, 6]\n  charge: 80%\nreserve: 20%\n" + tail;
        Path p = dir.resolve("m.yaml");
        Files.writeString(p, text);
        return p;
    }

    private static CliRun check(Path p) {
        return CliRun.run("check", p.toString());
    }

    private static void badAt(CliRun r, Path p, int line, String message) {
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains(p + ":" + line + ":").contains(message).contains("hint:")
                .doesNotContain("Exception").doesNotContain("\tat ");
    }

    /** One bad mission: the tasks and what the robot says beyond the common profile, the line blamed, the message. */
    record BadCase(String name, String tail, String robotExtra, int line, String message) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<BadCase> badCases() {
        return Stream.of(
                new BadCase("empty patrol", "tasks:\n  patrol: []\n", "", 17, "the patrol has no checkpoints"),
                new BadCase("checkpoint also avoided", "tasks:\n  patrol: [ward-a, sluice]\n  avoid: [sluice]\n", "", 18,
                        "both a checkpoint of the patrol and avoided"),
                new BadCase("deadline below one tick", "deadline: 3 s\ntasks:\n  visit: [ward-a]\n", "  tick: 4 s\n", 17,
                        "shorter than one tick"),
                new BadCase("deadline without tick", "deadline: 45 min\ntasks:\n  visit: [ward-a]\n", "", 16,
                        "a deadline needs the robot's tick"),
                new BadCase("tick zero", "deadline: 45 min\ntasks:\n  visit: [ward-a]\n", "  tick: 0 s\n", 12,
                        "tick must be more than 0 s"),
                new BadCase("tick without unit", "tasks:\n  visit: [ward-a]\n", "  tick: 4\n", 12, "has no unit"));
    }

    @ParameterizedTest
    @MethodSource("badCases")
    void badPatrolOrDeadlineInput_isLocatedWithAHint(BadCase c) throws Exception {
        Path p = mission(c.tail(), c.robotExtra());
        badAt(check(p), p, c.line(), c.message());
    }

    @Test
    void budgetPerUnknown() throws Exception {
        String map = Files.readString(Path.of("maps/clinic-wing.yaml")).replace("  budget: 1 ",
                "  budget-per: night\n  budget: 1 ");
        Path mp = dir.resolve("map.yaml");
        Files.writeString(mp, map);
        Path p = mission("tasks:\n  patrol: [ward-a]\n", "").toAbsolutePath();
        Files.writeString(p, Files.readString(p).replace(Path.of("maps/clinic-wing.yaml").toAbsolutePath().toString(),
                mp.toString()));
        CliRun r = check(p);
        int line = map.lines().toList().indexOf("  budget-per: night") + 1;
        badAt(r, mp, line, "budget-per must be 'mission' or 'lap', not 'night'");
    }

    @Test
    void allProblemsAtOnce() throws Exception {
        Path p = mission("deadline: 45 min\ntasks:\n  patrol: []\n", "  tick: 0 s\n");
        CliRun r = check(p);
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("tick must be more than 0 s").contains("the patrol has no checkpoints");
    }

    @Test
    void demoNightPatrol_isGuaranteedAndCertified() {
        CliRun r = CliRun.run("check", "missions/night-patrol.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).startsWith("GUARANTEED: Night patrol").contains("Longest lap in the worst case:")
                .contains("certified: true").contains("Safety:");
    }

    @Test
    void demoEarlyClean_failsOnlyBecauseOfTheDeadline() {
        CliRun r = CliRun.run("check", "missions/early-clean.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("Only the deadline is missed").contains("43 turns = 2 min 52 s");
    }

    @Test
    void patrolReplay_marksTheLoopInJsonAndCsv() throws Exception {
        Path csv = dir.resolve("lap.csv");
        CliRun r = CliRun.run("replay", "missions/night-patrol.yaml", "--json", "--csv",
                csv.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        com.fasterxml.jackson.databind.JsonNode j = new com.fasterxml.jackson.databind.ObjectMapper().readTree(r.out());
        int start = j.get("loop").get("startStep").asInt();
        int length = j.get("loop").get("length").asInt();
        int steps = j.get("steps").size();
        assertThat(start + length).isEqualTo(steps);
        assertThat(j.get("lapSteps").size()).isPositive();
        java.util.List<String> lines = Files.readAllLines(csv);
        assertThat(lines.get(0)).endsWith(",part");
        assertThat(lines.get(1 + start)).endsWith(",loop");
        assertThat(lines.get(start)).endsWith(",way-in");
        assertThat(j.get("caveats").size()).isPositive();
    }

    @Test
    void patrolReplay_text_marksTheLoop() {
        CliRun r = CliRun.run("replay", "missions/night-patrol.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("---- the loop: steps ").contains("repeat for ever ----").contains("---- back to step ")
                .contains("Safety:");
    }

    @Test
    void earlyClean_withThreeMinutes_isGuaranteed() throws Exception {
        // 3 min at 4 s is 45 turns, at least the 43 turns the worst case needs (missions/README.md)
        Path p = dir.resolve("early-clean-3min.yaml");
        Files.writeString(p, Files.readString(Path.of("missions/early-clean.yaml"))
                .replace("../maps/clinic-wing.yaml", Path.of("maps/clinic-wing.yaml").toAbsolutePath().toString())
                .replaceFirst("deadline: 2.5 min", "deadline: 3 min"));
        CliRun r = CliRun.run("check", p.toString(), "--fewest-moves");
        assertThat(r.code()).as(r.out() + r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("Worst finishing time under the policy:  43 turns").contains("certified: true");
        // the default, the safest policy, keeps the highest floor that still meets the deadline (45 turns)
        CliRun safest = check(p);
        assertThat(safest.code()).isEqualTo(ExitCodes.OK);
        assertThat(safest.out()).contains("Worst finishing time under the policy:  45 turns")
                .contains("(the safest policy that keeps the deadline)").contains("certified: true");
    }
}
