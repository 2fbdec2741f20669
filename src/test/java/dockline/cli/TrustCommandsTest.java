package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.fixtures.DemoFiles;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TrustCommandsTest {

    @TempDir
    Path tmp;

    @Test
    void replay_guaranteedMission_isCertified_printsTableExplanationAndCaveats() throws Exception {
        Path csv = tmp.resolve("worst.csv");
        Path json = tmp.resolve("worst.json");
        CliRun r = run("replay", "missions/night-round.yaml", "--csv", csv.toString(), "--json-file", json.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("guaranteed").contains("certified: true").contains("Worst case of the certified policy")
                .contains("step  cell").contains("Safety: ");
        String header = Files.readAllLines(csv).get(0);
        assertThat(header).startsWith("step,cell,action,event,eventDetail,levelUnits,levelWh,budgetLeft,progress");
        JsonNode j = new ObjectMapper().readTree(json.toFile());
        assertThat(j.get("replay").asText()).isEqualTo("worst");
        assertThat(j.get("steps").size()).isEqualTo(Files.readAllLines(csv).size() - 1);
    }

    /** Same input, byte-identical CSV from two separate runs of the command. */
    @Test
    void replay_csv_isByteIdenticalAcrossRuns() throws Exception {
        Path a = tmp.resolve("a.csv");
        Path b = tmp.resolve("b.csv");
        assertThat(run("replay", "missions/supply-run.yaml", "--csv", a.toString()).code()).isZero();
        assertThat(run("replay", "missions/supply-run.yaml", "--csv", b.toString()).code()).isZero();
        assertThat(Files.readAllBytes(a)).isEqualTo(Files.readAllBytes(b));
        Path n1 = tmp.resolve("n1.csv");
        Path n2 = tmp.resolve("n2.csv");
        run("replay", "missions/supply-run.yaml", "--disturbance", "nominal", "--csv", n1.toString());
        run("replay", "missions/supply-run.yaml", "--disturbance", "nominal", "--csv", n2.toString());
        assertThat(Files.readAllBytes(n1)).isEqualTo(Files.readAllBytes(n2)).isNotEqualTo(Files.readAllBytes(a));
    }

    /**
     * The late return with the research block's fire doors and hall blockage read as momentary (the
     * reading before lasting events; missions/README.md gives its figures): a copy of the demo in tmp.
     */
    private String momentaryLateReturn() throws java.io.IOException {
        String map = Files.readString(Path.of("maps/research-block.yaml"))
                .replace("      where: [west-fire-door, east-fire-door]\n",
                        "      where: [west-fire-door, east-fire-door]\n      duration: momentary\n")
                .replace("      where: east-hall    # carts left in the hall\n",
                        "      where: east-hall    # carts left in the hall\n      duration: momentary\n");
        assertThat(map).contains("duration: momentary\n    - kind: drag");
        Files.createDirectories(tmp.resolve("maps"));
        Files.createDirectories(tmp.resolve("missions"));
        Files.writeString(tmp.resolve("maps/research-block.yaml"), map);
        Path mission = tmp.resolve("missions/late-return.yaml");
        Files.writeString(mission, Files.readString(Path.of("missions/late-return.yaml")));
        return mission.toString();
    }

    /** With lasting fire doors no start charge guarantees the late return: a shut bridge door cuts off both docks. */
    @Test
    void lateReturn_withLastingFireDoors_isNotGuaranteedEvenWhenFull() {
        CliRun r = run("check", "missions/late-return.yaml", "--start-charge", "100%");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("cannot force completion");
    }

    @Test
    void replay_notGuaranteed_showsTheCounterexample_exit1() throws Exception {
        CliRun r = run("replay", momentaryLateReturn());
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("NOT guaranteed").contains("counterexample").contains("below the reserve floor")
                .contains("link-bridge").contains("Safety: ");
    }

    @Test
    void replay_impossibleForcedEvent_isExit2_andWritesNoFile() {
        Path csv = tmp.resolve("never.csv");
        // the policy of fewest moves (the default before the safest policy): its step 5 is a move past no door
        CliRun r = run("replay", "missions/night-round.yaml", "--fewest-moves", "--force", "5:door-shut", "--csv",
                csv.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("step 5: door-shut cannot happen there").contains("is not a door that may shut");
        assertThat(csv).doesNotExist();
        assertThat(run("replay", "missions/night-round.yaml", "--force", "4:fog").err()).contains("unknown event 'fog'");
        assertThat(run("replay", "missions/night-round.yaml", "--force", "4:door-shut", "--disturbance", "worst").code())
                .isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void replay_forcedDoor_isAnswered() {
        // the policy of fewest moves walks through ward A's door at step 4 (the safest one charges first)
        CliRun r = run("replay", "missions/night-round.yaml", "--fewest-moves", "--force", "4:door-shut");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("door ward-a-entry at 3:4 shut").contains("The mission completes");
    }

    @Test
    void badMissionFile_isExit2_withFileLineColumn() throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, "name: x\nmap: ../nowhere.yaml\nresrve: 20%\n");
        CliRun r = run("replay", bad.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).containsPattern("bad\\.yaml:\\d+:\\d+: ");
        assertThat(run("margin", bad.toString()).code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void margin_guaranteed_jsonHasBothMethods() throws Exception {
        Path json = tmp.resolve("m.json");
        CliRun r = run("margin", "missions/night-round.yaml", "--json-file", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("bisection over the threshold solver").contains("minimum-credit fixpoint")
                .contains("the two methods agree").contains("Safety: ");
        JsonNode j = new ObjectMapper().readTree(json.toFile());
        for (String k : new String[] {"highestReserveUnits", "lowestStartUnits"}) {
            assertThat(j.has(k)).isTrue();
            assertThat(j.get("bisection").get(k)).isEqualTo(j.get("fixpoint").get(k)).isEqualTo(j.get(k));
        }
        assertThat(j.get("bisection").has("millis")).isTrue();
        assertThat(j.get("fixpoint").has("millis")).isTrue();
    }

    @Test
    void margin_notGuaranteed_printsSuggestions_exit1() throws Exception {
        CliRun r = run("margin", momentaryLateReturn(), "--json");
        assertThat(r.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("\"suggestions\"").contains("start-charge");
    }

    /** The demo missions with the reserve objective (the certificate covers that objective). */
    static java.util.stream.Stream<Path> reserveDemoMissions() throws Exception {
        java.util.List<Path> out = new java.util.ArrayList<>();
        for (Path p : DemoFiles.missions().toList()) {
            if (dockline.io.MissionLoader.load(p).objective() instanceof dockline.model.Objective.Reserve) {
                out.add(p);
            }
        }
        assertThat(out).hasSizeGreaterThanOrEqualTo(3);
        return out.stream();
    }

    /** Every guaranteed demo mission is certified by `check`, in text and in JSON; none is silently guaranteed. */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.MethodSource("reserveDemoMissions")
    void check_certifiesEveryGuaranteedDemoMission(Path file) throws Exception {
        CliRun text = run("check", file.toString());
        CliRun json = run("check", "--json", file.toString());
        JsonNode j = new ObjectMapper().readTree(json.out());
        assertThat(json.code()).isEqualTo(text.code());
        if (text.code() == ExitCodes.OK) {
            assertThat(text.out()).contains("certified: true");
            assertThat(j.get("certified").asBoolean()).isTrue();
            assertThat(j.get("certifiedLowestLevelUnits").asInt()).isEqualTo(j.get("lowestLevelUnits").asInt());
            assertThat(j.get("suggestions").size()).isZero();
        } else {
            assertThat(text.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
            assertThat(j.get("certified").asBoolean()).isFalse();
            assertThat(text.out()).contains("To make it guaranteed");
        }
    }

    /**
     * The suggested start charge for the late return with momentary fire doors (164 units = 82 Wh)
     * makes replay certify it.
     */
    @Test
    void replay_withSuggestedStartCharge_isGuaranteed() throws Exception {
        String mission = momentaryLateReturn();
        CliRun r = run("replay", mission, "--start-charge", "82");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("certified: true");
        assertThat(run("replay", mission, "--start-charge", "81.5").code())
                .isEqualTo(ExitCodes.NOT_GUARANTEED);
    }
}
