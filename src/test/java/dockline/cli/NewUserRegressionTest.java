package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.io.PolicyFiles;
import dockline.report.Caveats;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Regression tests from a session of using the commands as a new user would, following README.md:
 * each test retells what went wrong. Checked against the documented contract (README.md,
 * README.md, "What you can ask"): bad input is one clear line and exit 2, a limit is exit 3, outputs are
 * never half-written, clobbered or written over an input, and every output carries the caveats.
 */
class NewUserRegressionTest {

    private static final String NIGHT = "missions/night-round.yaml";

    @TempDir
    Path dir;

    /**
     * {@code export --policy /tmp/typo/sub/p.json} created the folders {@code typo/sub} and wrote
     * the policy there; a mistyped folder name should be an error, not a new folder.
     */
    @Test
    void export_intoAMissingFolder_isRefused_andCreatesNothing() {
        Path target = dir.resolve("typo").resolve("sub").resolve("p.json");
        CliRun r = run("export", NIGHT, "--policy", target.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).startsWith("dockline: --policy " + target + ": the folder ").contains("does not exist")
                .doesNotContain(".part").doesNotContain("Exception");
        assertThat(dir.resolve("typo")).doesNotExist();
        assertThat(r.out()).isEmpty();
    }

    /**
     * {@code export MISSION --policy MISSION} overwrote the mission file with the policy (the same
     * could happen to the map). An output never overwrites an input now.
     */
    @Test
    void export_overTheMissionOrItsMap_isRefused_andTheInputsAreUntouched() throws Exception {
        byte[] mission = Files.readAllBytes(Path.of(NIGHT));
        byte[] map = Files.readAllBytes(Path.of("maps/clinic-wing.yaml"));
        for (String target : new String[] {NIGHT, "maps/clinic-wing.yaml", "missions/../maps/clinic-wing.yaml"}) {
            CliRun r = run("export", NIGHT, "--policy", target);
            assertThat(r.code()).as(target).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.err()).contains("input file of this mission");
        }
        CliRun replay = run("replay", NIGHT, "--csv", NIGHT);
        assertThat(replay.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readAllBytes(Path.of(NIGHT))).isEqualTo(mission);
        assertThat(Files.readAllBytes(Path.of("maps/clinic-wing.yaml"))).isEqualTo(map);
    }

    /**
     * {@code replay --csv /tmp/qa/} (a folder) solved the whole mission and then said
     * {@code cannot write output: /tmp/.qa.155…part -> /tmp/qa: Is a directory}; an empty name
     * ({@code --csv ""}) said the same about the working folder. Both are refused up front now, in words.
     */
    @Test
    void outputThatIsAFolderOrEmpty_isRefusedBeforeSolving_inPlainWords() {
        CliRun folder = run("replay", NIGHT, "--csv", dir.toString());
        assertThat(folder.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(folder.err().trim()).isEqualTo("dockline: --csv " + dir + ": it is a folder, not a file");
        CliRun empty = run("margin", NIGHT, "--json-file", "");
        assertThat(empty.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(empty.err().trim()).isEqualTo("dockline: --json-file '': the file name is empty");
        assertThat(run("export", NIGHT, "--policy", "").err()).contains("the file name is empty");
    }

    /** An existing output file survives every kind of failing run: bad option, not guaranteed, bad target. */
    @Test
    void existingOutput_survivesFailingRuns() throws Exception {
        Path policy = Files.writeString(dir.resolve("policy.json"), "the policy of yesterday");
        assertThat(run("export", NIGHT, "--policy", policy.toString(), "--reserve", "150%").code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("export", NIGHT, "--policy", policy.toString(), "--start-charge", "100%", "--reserve", "59Wh")
                .code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(run("export", NIGHT, "--policy", policy.toString(), "--start-charge", "1").code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("export", "missions/nope.yaml", "--policy", policy.toString()).code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        Path csv = Files.writeString(dir.resolve("replay.csv"), "old replay");
        assertThat(run("replay", NIGHT, "--csv", csv.toString(), "--force", "5:door-shut").code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("replay", NIGHT, "--csv", csv.toString(), "--json-file", dir.toString()).code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(policy)).isEqualTo("the policy of yesterday");
        assertThat(Files.readString(csv)).isEqualTo("old replay");
    }

    /**
     * {@code replay --force ""} (or {@code --force ,}) silently replayed the worst case under a
     * request for forced events; it is an error now.
     */
    @Test
    void replay_forceWithNoEvent_isExit2() {
        for (String f : new String[] {"", ",", " , "}) {
            CliRun r = run("replay", NIGHT, "--force", f);
            assertThat(r.code()).as("'" + f + "'").isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.err()).contains("names no event").contains("STEP:EVENT");
            assertThat(r.out()).isEmpty();
        }
    }

    /**
     * {@code --budget 1000000} allocated until the heap ran out ("Java heap space", exit 3, after a
     * long wait), although a map file may give at most 1000. The override has the map's limit now.
     */
    @Test
    void budgetOverride_aboveTheMapLimit_isExit2() {
        CliRun r = run("check", NIGHT, "--budget", "1000000");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().trim()).isEqualTo("dockline: --budget must be a whole number from 0 to 1000, not 1000000");
        assertThat(run("margin", NIGHT, "--budget", "-1").err()).contains("from 0 to 1000, not -1");
    }

    /** {@code --start-charge 10 Wh} unquoted said only "Unmatched argument at index 4: 'Wh'"; it says how to write it now. */
    @Test
    void unquotedAmountWithUnit_getsAHint() {
        CliRun r = run("check", NIGHT, "--start-charge", "10", "Wh");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("Unmatched argument").contains("write 12Wh, or '12 Wh' in quotes");
        assertThat(run("check", NIGHT, "--start-charge", "30Wh").code()).isIn(ExitCodes.OK, ExitCodes.NOT_GUARANTEED);
    }

    /**
     * {@code --start-charge} below the reserve floor was answered "not guaranteed", while a mission file
     * with the same figures is rejected by {@code validate}; the option is now rejected the same way.
     */
    @Test
    void startChargeBelowTheFloor_isBadInputLikeInTheFile() {
        // night-round: 60 Wh battery, reserve 20 % = 12 Wh
        CliRun r = run("check", NIGHT, "--start-charge", "10Wh");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("the reserve floor (12 Wh) is above the starting charge (10 Wh)")
                .contains("raise --start-charge").doesNotContain("Exception");
        CliRun both = run("margin", NIGHT, "--start-charge", "50%", "--reserve", "60%");
        assertThat(both.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(both.err()).contains("lower --reserve or raise --start-charge");
    }

    /**
     * {@code check maps/clinic-wing.yaml} (a map where the mission belongs) printed ten lines of
     * missing and unknown keys; it is one line saying what the file is now.
     */
    @Test
    void mapGivenAsMission_isOneClearLine() {
        CliRun r = run("check", "maps/clinic-wing.yaml");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().lines().toList()).hasSize(1);
        assertThat(r.err()).startsWith("maps/clinic-wing.yaml:").contains("this is a map file, not a mission");
    }

    /** A mission whose {@code map:} names a folder said "map file not found" although the path exists. */
    @Test
    void mapPathThatIsAFolder_saysSo() throws Exception {
        Path m = dir.resolve("m.yaml");
        Files.writeString(m, Files.readString(Path.of(NIGHT)).replace("map: ../maps/clinic-wing.yaml",
                "map: " + Path.of("maps").toAbsolutePath()));
        CliRun r = run("validate", m.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("is a folder, not a map file").doesNotContain("not found");
    }

    /**
     * With a capacity that is not a whole number of units, {@code --reserve 100%} rounds the floor up
     * above the capacity: check and margin said "(60.5 Wh) is above the capacity (60 Wh)", export
     * "the reserve floor is above the capacity", replay "reserve floor 121 units is above the capacity
     * 120 units". One message, with the reason, for all four now.
     */
    @Test
    void reserveAboveCapacityByRounding_isOneMessageForEveryCommand() throws Exception {
        Path m = dir.resolve("odd-capacity.yaml");
        Files.writeString(m, Files.readString(Path.of(NIGHT))
                .replace("map: ../maps/clinic-wing.yaml", "map: " + Path.of("maps/clinic-wing.yaml").toAbsolutePath())
                .replace("capacity: 60 ", "capacity: 60.3 "));
        List<String> messages = new ArrayList<>();
        for (String[] args : new String[][] {{"check"}, {"margin"}, {"replay"},
                {"export", "--policy", dir.resolve("p.json").toString()}}) {
            List<String> a = new ArrayList<>(List.of(args));
            a.add(1, m.toString());
            a.addAll(List.of("--reserve", "100%", "--start-charge", "100%"));
            CliRun r = run(a.toArray(String[]::new));
            assertThat(r.code()).as(args[0]).isEqualTo(ExitCodes.BAD_INPUT);
            messages.add(r.err());
        }
        assertThat(messages).allMatch(e -> e.equals(messages.get(0)));
        assertThat(messages.get(0)).contains("the reserve floor (60.5 Wh) is above the capacity (60 Wh)")
                .contains("rounds up");
        assertThat(dir.resolve("p.json")).doesNotExist();
    }

    /**
     * {@code margin} listed and accepted {@code --safest-policy}, which changes nothing there; it is
     * not an option of margin any more (check, export and replay keep it).
     */
    @Test
    void margin_hasNoSafestPolicyOption() {
        assertThat(run("margin", "--help").out()).doesNotContain("--safest-policy");
        assertThat(run("margin", NIGHT, "--safest-policy").code()).isEqualTo(ExitCodes.BAD_INPUT);
        for (String c : new String[] {"check", "export", "replay"}) {
            assertThat(run(c, "--help").out()).as(c).contains("--safest-policy");
        }
    }

    /**
     * {@code --json} meant "print JSON" for check but "write JSON to FILE" for replay and margin
     * ({@code margin X --json} failed with "Missing required parameter"), and validate and export had
     * none. It is a flag on every command now, with the caveats as an array; files are written with
     * {@code --json-file}.
     */
    @Test
    void json_isTheSameFlagOnEveryCommand_withTheCaveats() throws Exception {
        ObjectMapper om = new ObjectMapper();
        Path policy = dir.resolve("p.csv");
        String[][] runs = {{"validate", NIGHT, "maps/clinic-wing.yaml", "--json"}, {"check", NIGHT, "--json"},
            {"export", NIGHT, "--policy", policy.toString(), "--json"}, {"replay", NIGHT, "--json"},
            {"margin", NIGHT, "--json"}, {"export", "missions/late-return.yaml", "--policy", policy + ".x", "--json"},
            {"check", "missions/late-return.yaml", "--json"}, {"check", "missions/late-return.yaml", "--json", "--verdict-only"}};
        for (String[] args : runs) {
            CliRun r = run(args);
            assertThat(r.code()).as(String.join(" ", args) + r.err()).isIn(ExitCodes.OK, ExitCodes.NOT_GUARANTEED);
            JsonNode j = om.readTree(r.out());
            assertThat(j.get("caveats")).as(args[0]).hasSize(Caveats.LINES.size());
            for (int i = 0; i < Caveats.LINES.size(); i++) {
                assertThat(j.get("caveats").get(i).asText()).isEqualTo(Caveats.LINES.get(i));
            }
            assertThat(r.out()).as(args[0]).doesNotContain("Safety: ");
        }
        JsonNode v = om.readTree(run("validate", NIGHT, "--json").out());
        assertThat(v.get("valid").asBoolean()).isTrue();
        assertThat(v.get("files").get(0).get("kind").asText()).isEqualTo("mission");
        assertThat(run("margin", NIGHT, "--help").out()).contains("--json-file=FILE");
    }

    /** A bad file under {@code validate --json} is still one {@code file:line:column} line on stderr, and in the JSON. */
    @Test
    void validateJson_carriesTheProblems() throws Exception {
        Path bad = Files.writeString(dir.resolve("bad.yaml"), "name: x\nmap: ../nowhere.yaml\n");
        CliRun r = run("validate", "--json", bad.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).containsPattern("bad\\.yaml:\\d+:\\d+: ");
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("valid").asBoolean()).isFalse();
        JsonNode p = j.get("files").get(0).get("problems");
        assertThat(p.size()).isEqualTo(r.err().lines().count());
        assertThat(p.get(0).get("line").asInt()).isPositive();
    }

    /** The JSON written by {@code --json-file} is the same object {@code --json} prints, caveats included. */
    @Test
    void jsonFile_equalsThePrintedJson() throws Exception {
        Path file = dir.resolve("m.json");
        CliRun text = run("margin", NIGHT, "--json-file", file.toString());
        assertThat(text.out()).contains("Safety: ");
        JsonNode printed = new ObjectMapper().readTree(run("margin", NIGHT, "--json").out());
        JsonNode written = new ObjectMapper().readTree(file.toFile());
        assertThat(written.get("caveats")).isEqualTo(printed.get("caveats"));
        assertThat(written.get("highestReserveUnits")).isEqualTo(printed.get("highestReserveUnits"));
        Path rj = dir.resolve("r.json");
        run("replay", NIGHT, "--json-file", rj.toString());
        JsonNode replay = new ObjectMapper().readTree(rj.toFile());
        assertThat(replay.get("caveats")).hasSize(Caveats.LINES.size());
        assertThat(replay.get("verdict").asText()).isEqualTo("guaranteed");
        assertThat(replay.get("certified").asBoolean()).isTrue();
    }

    /**
     * {@code export} wrote the solver's policy without the independent certificate that {@code check}
     * and {@code replay} run; it certifies before it writes now and says so.
     */
    @Test
    void export_certifiesBeforeWriting() throws Exception {
        for (String mission : new String[] {NIGHT, "missions/discounted-trap.yaml"}) {
            Path f = dir.resolve(Path.of(mission).getFileName() + ".json");
            CliRun r = run("export", mission, "--policy", f.toString());
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
            assertThat(r.out()).contains("certified: true").contains(Caveats.block());
            PolicyFiles.Document d = PolicyFiles.read(f);
            // a mission with charging is exported as level thresholds (format version 4), the others as rows
            assertThat(d.thresholdForm() ? d.thresholds().size() : d.policy().size()).isPositive();
            JsonNode j = new ObjectMapper().readTree(run("export", mission, "--policy", f.toString(), "--json").out());
            assertThat(j.get("certified").asBoolean()).isTrue();
            assertThat(j.get("certifiedStates").asInt()).isPositive();
        }
    }

    /**
     * The top-level {@code --help} cut the summaries of check and export mid-sentence ("...without
     * its battery going", "...situation it can meet (cell,"), because their first description line
     * was half a sentence. Each owned command's first line is a whole sentence now, and no help text
     * shows a doubled or stray percent sign.
     */
    @Test
    void help_summariesAreWholeSentences_andPercentSignsRender() {
        CommandLine cl = Main.commandLine();
        for (String c : new String[] {"validate", "check", "export", "replay", "margin"}) {
            String first = cl.getSubcommands().get(c).getCommandSpec().usageMessage().description()[0];
            assertThat(first).as(c).endsWith(".");
            CliRun help = run(c, "--help");
            assertThat(help.code()).isZero();
            assertThat(help.err()).as(c).isEmpty();
            assertThat(help.out()).as(c).doesNotContain("%%").doesNotContain("%n").contains("--json").contains("Exit codes:");
        }
        assertThat(run("check", "--help").out()).contains("(20%)");
    }

    /**
     * {@code --threshold 99999999999999999999999} was called "not a rational number (e.g. 3/4, -2,
     * 0.75)" although it is written like one; it is out of range, and the message says so now.
     */
    @Test
    void threshold_outOfRange_isToldApartFromBadSyntax() {
        CliRun big = run("check", "missions/discounted-trap.yaml", "--threshold", "99999999999999999999999");
        assertThat(big.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(big.err()).contains("is out of range").contains("64-bit").doesNotContain("not a rational");
        assertThat(run("check", "missions/discounted-trap.yaml", "--threshold", "1/0").err()).contains("denominator not 0");
        assertThat(run("check", "missions/discounted-trap.yaml", "--threshold", "three").err())
                .contains("is not a rational number");
    }

    /** The top-level help ends by saying how to get the options of a command. */
    @Test
    void topLevelHelp_pointsToTheCommandsHelp() {
        assertThat(run("--help").out()).contains("Run 'dockline COMMAND --help' for the options of a command.");
    }

    /**
     * A policy whose closed loop was over the certificate checker's limit made {@code check} say
     * "internal error: dockline.certify.ClosedLoop$TooLargeException ..." with exit 4: a resource
     * limit, reported as a bug. Every mission command maps resource limits (by their type) to exit 3
     * now, in words with advice; an exception of any other type is an internal error (exit 4), not
     * "bad input" or "too large" because of its class (issue 15).
     */
    @Test
    void solverFailures_mapToTheirExitCodes_inWords() {
        MissionOptions o = new MissionOptions();
        o.missionFile = Path.of("missions/x.yaml");
        java.io.StringWriter text = new java.io.StringWriter();
        java.io.PrintWriter err = new java.io.PrintWriter(text, true);
        assertThat(o.failure(new dockline.certify.ClosedLoop.TooLargeException(20), err)).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(o.failure(new OutOfMemoryError("Java heap space"), err)).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(text.toString()).contains("dockline: missions/x.yaml: the closed loop of the policy has more than 20"
                + " states, too many to certify").contains("more memory does not help").doesNotContain("Exception")
                .doesNotContain("internal");
        assertThat(o.failure(new ArithmeticException("integer overflow"), err)).isEqualTo(ExitCodes.INTERNAL);
        assertThat(o.failure(new IllegalArgumentException("no dock"), err)).isEqualTo(ExitCodes.INTERNAL);
        assertThat(o.failure(new IllegalStateException("bug"), err)).isEqualTo(ExitCodes.INTERNAL);
        assertThat(text.toString()).contains("internal error: ArithmeticException: integer overflow")
                .contains("internal error: IllegalArgumentException: no dock").doesNotContain("\tat ");
    }

    /** check said {@code reserveUnits} while margin and replay said {@code floorUnits} for the same figure. */
    @Test
    void reserveFloor_hasOneJsonNameInEveryCommand() throws Exception {
        ObjectMapper om = new ObjectMapper();
        JsonNode check = om.readTree(run("check", NIGHT, "--json").out());
        JsonNode margin = om.readTree(run("margin", NIGHT, "--json").out());
        JsonNode replay = om.readTree(run("replay", NIGHT, "--json").out());
        // night-round: reserve 20 % of 60 Wh = 12 Wh = 24 units of 0.5 Wh
        for (JsonNode j : List.of(check, margin, replay)) {
            assertThat(j.get("reserveUnits").asInt()).isEqualTo(24);
            assertThat(j.has("floorUnits")).isFalse();
        }
        assertThat(replay.get("reserveWh").decimalValue()).isEqualByComparingTo("12");
    }
}
