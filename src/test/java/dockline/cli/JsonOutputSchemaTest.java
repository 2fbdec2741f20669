package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import dockline.fixtures.CliRun;
import java.io.File;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every command's {@code --json} output, and every JSON file the tool writes (policy, replay,
 * margins), validated against the JSON Schema files published in the jar
 * (src/main/resources/dockline/schemas). The reference is a general-purpose JSON Schema validator
 * (networknt json-schema-validator, JSON Schema draft 2020-12), which shares no code with the
 * commands. The schemas forbid keys they do not list, so a figure under another name fails here.
 */
class JsonOutputSchemaTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    static JsonSchema schema(String name) throws Exception {
        try (InputStream in = JsonOutputSchemaTest.class.getResourceAsStream("/dockline/schemas/" + name
                + ".schema.json")) {
            assertThat(in).as("schema %s in the jar's resources", name).isNotNull();
            // a schema's $ref to another one (check's array form names check-rounds) is read from the jar,
            // never fetched
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012, b -> b.schemaMappers(
                    m -> m.mapPrefix("https://dockline.invalid/schemas/", "classpath:dockline/schemas/")))
                    .getSchema(in);
        }
    }

    private static JsonNode valid(String schema, String json) throws Exception {
        JsonNode node = JSON.readTree(json);
        Set<ValidationMessage> problems = schema(schema).validate(node);
        assertThat(problems).as("%s against %s.schema.json", json, schema).isEmpty();
        return node;
    }

    private static JsonNode command(String schema, int exit, String... args) throws Exception {
        CliRun r = CliRun.run(args);
        assertThat(r.code()).as(String.join(" ", args) + "\n" + r.err()).isEqualTo(exit);
        return valid(schema, r.out());
    }

    @Test
    void check_everyRoute_andObjective() throws Exception {
        command("check", ExitCodes.OK, "check", "missions/night-round.yaml", "--json");
        command("check", ExitCodes.OK, "check", "missions/night-round.yaml", "--json", "--fewest-moves");
        command("check", ExitCodes.OK, "check", "missions/night-round.yaml", "--json", "--method", "stored");
        command("check", ExitCodes.OK, "check", "missions/night-round.yaml", "--json", "--verdict-only");
        command("check", ExitCodes.OK, "check", "missions/supply-run.yaml", "--json");
        JsonNode fast = command("check", ExitCodes.NOT_GUARANTEED, "check", "missions/late-return.yaml", "--json");
        assertThat(fast.get("method").asText()).isEqualTo("fast");
        command("check", ExitCodes.NOT_GUARANTEED, "check", "missions/late-return.yaml", "--json", "--verdict-only");
        command("check", ExitCodes.NOT_GUARANTEED, "check", "missions/late-return.yaml", "--json", "--method",
                "product");
        command("check", ExitCodes.NOT_GUARANTEED, "check", "missions/late-return.yaml", "--json", "--method",
                "product", "--verdict-only");
        // late-return is lost at any charge once its bridge fire door lasts; aisle-return is the fast path's guaranteed case
        JsonNode fastOk = command("check", ExitCodes.OK, "check", "missions/aisle-return.yaml", "--json");
        assertThat(fastOk.get("method").asText()).isEqualTo("fast");
        command("check", ExitCodes.OK, "check", "missions/discounted-trap.yaml", "--json", "--also-optimise");
        command("check", ExitCodes.OK, "check", "missions/discounted-trap.yaml", "--json", "--score-only");
        command("check", ExitCodes.NOT_GUARANTEED, "check", "missions/discounted-trap.yaml", "--json",
                "--threshold", "6");
    }

    /**
     * Several missions: an array of one result each, in order (a plan, a patrol's result, the errors of a bad
     * file), valid against check's schema; the exit code is the worst (2 for the bad file).
     */
    @Test
    void check_severalMissions_isAnArrayOfTheSingleResults() throws Exception {
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "name: x\nmap: nowhere.yaml\n");
        JsonNode a = command("check", ExitCodes.BAD_INPUT, "check", "missions/late-return.yaml",
                "missions/night-patrol.yaml", bad.toString(), "missions/night-round.yaml", "--json");
        assertThat(a.isArray()).isTrue();
        assertThat(a).hasSize(4);
        valid("check", a.get(0).toString());
        valid("check-rounds", a.get(1).toString());
        assertThat(a.get(2).get("file").asText()).isEqualTo(bad.toString());
        assertThat(a.get(2).get("exitCode").asInt()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(a.get(2).get("errors").get(0).get("line").asInt()).isPositive();
        assertThat(a.get(3).get("verdict").asText()).isEqualTo("guaranteed");
        // the array form can fail: one item missing its caveats is refused
        com.fasterxml.jackson.databind.node.ArrayNode broken = (com.fasterxml.jackson.databind.node.ArrayNode) a.deepCopy();
        ((ObjectNode) broken.get(3)).remove("caveats");
        assertThat(schema("check").validate(broken)).isNotEmpty();
        // one mission is still one object, not an array
        assertThat(command("check", ExitCodes.OK, "check", "missions/night-round.yaml", "--json").isObject()).isTrue();
    }

    /** {@code report --json FILE}: the demo folder and a bad file, validated against report.schema.json. */
    @Test
    void report_jsonFile() throws Exception {
        dockline.report.DemoReport.Made r = dockline.report.DemoReport.get();
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        JsonNode j = valid("report", Files.readString(r.json()));
        assertThat(j.get("missions")).hasSize(dockline.report.DemoReport.DEMOS.length + 1);
        ObjectNode broken = (ObjectNode) j.deepCopy();
        ((ObjectNode) broken.get("missions").get(0)).remove("verdict");
        assertThat(schema("report").validate(broken)).as("a checked mission without its verdict").isNotEmpty();
        ObjectNode renamed = (ObjectNode) j.deepCopy();
        ObjectNode first = (ObjectNode) renamed.get("missions").get(0);
        first.set("worstCaseUnits", first.remove("lowestLevelUnits"));
        assertThat(schema("report").validate(renamed)).isNotEmpty();
    }

    /** Patrol and deadline missions have their own shape of check output, in the same vocabulary. */
    @Test
    void check_patrolAndDeadline_followTheRoundsSchema() throws Exception {
        JsonNode patrol = command("check-rounds", ExitCodes.OK, "check", "missions/night-patrol.yaml", "--json");
        assertThat(patrol.get("method").asText()).isEqualTo("patrol");
        JsonNode deadline = command("check-rounds", ExitCodes.NOT_GUARANTEED, "check", "missions/early-clean.yaml",
                "--json");
        assertThat(deadline.get("method").asText()).isEqualTo("deadline");
        // the same figure has the same name as in the one-trip output
        assertThat(patrol.has("highestReserveUnits")).isTrue();
        assertThat(deadline.has("rounding")).isTrue();
        assertThat(patrol.has("highestGuaranteedReserveUnits") || deadline.has("discretisation")).isFalse();
    }

    @Test
    void export_andThePolicyFilesItWrites() throws Exception {
        Path p = dir.resolve("p.json");
        command("export", ExitCodes.OK, "export", "missions/night-round.yaml", "--json", "--policy", p.toString());
        valid("policy", Files.readString(p));
        Path q = dir.resolve("q.json");
        command("export", ExitCodes.OK, "export", "missions/discounted-trap.yaml", "--json", "--policy", q.toString());
        valid("policy", Files.readString(q));
        command("export", ExitCodes.NOT_GUARANTEED, "export", "missions/late-return.yaml", "--json", "--policy",
                dir.resolve("r.json").toString());
    }

    /** A patrol's and a deadline mission's export: the summary, and the policy file with its goal in the header. */
    @Test
    void export_patrolAndDeadline_andTheirPolicyFiles() throws Exception {
        Path p = dir.resolve("patrol.json");
        JsonNode j = command("export", ExitCodes.OK, "export", "missions/night-patrol.yaml", "--json", "--policy",
                p.toString());
        assertThat(j.get("goal").asText()).isEqualTo("patrol");
        JsonNode file = valid("policy", Files.readString(p));
        assertThat(file.get("goal").asText()).isEqualTo("patrol");
        assertThat(file.get("budgetPer").asText()).isEqualTo("mission");
        Path d = dir.resolve("deadline.json");
        JsonNode dj = command("export", ExitCodes.OK, "export", RoundsCommandsTest.earlyClean(dir, "3 min").toString(),
                "--json", "--policy", d.toString());
        assertThat(dj.get("goal").asText()).isEqualTo("deadline");
        assertThat(valid("policy", Files.readString(d)).get("deadlineTicks").asInt()).isEqualTo(45);
        command("export", ExitCodes.NOT_GUARANTEED, "export", "missions/early-clean.yaml", "--json", "--policy",
                dir.resolve("late.json").toString());
        assertThat(dir.resolve("late.json")).doesNotExist();
    }

    @Test
    void margin_patrolAndDeadline_followTheRoundsSchema() throws Exception {
        Path f = dir.resolve("margin-patrol.json");
        JsonNode p = command("margin-rounds", ExitCodes.OK, "margin", "missions/night-patrol.yaml", "--json",
                "--json-file", f.toString());
        valid("margin-rounds", Files.readString(f));
        assertThat(p.has("tightestDeadlineTicks")).isFalse();
        JsonNode d = command("margin-rounds", ExitCodes.NOT_GUARANTEED, "margin", "missions/early-clean.yaml",
                "--json");
        assertThat(d.get("tightestDeadlineTicks").asInt()).isEqualTo(43);
        // the deadline schema needs the deadline figures, the patrol schema refuses them
        ObjectNode noTightest = (ObjectNode) d.deepCopy();
        noTightest.remove("tightestDeadlineTicks");
        assertThat(schema("margin-rounds").validate(noTightest)).isNotEmpty();
        ObjectNode patrolWithDeadline = (ObjectNode) p.deepCopy();
        patrolWithDeadline.put("deadlineTicks", 3);
        assertThat(schema("margin-rounds").validate(patrolWithDeadline)).isNotEmpty();
    }

    @Test
    void replay_andItsFile() throws Exception {
        Path f = dir.resolve("replay.json");
        command("replay", ExitCodes.OK, "replay", "missions/night-round.yaml", "--json", "--json-file", f.toString());
        valid("replay", Files.readString(f));
        command("replay", ExitCodes.OK, "replay", "missions/supply-run.yaml", "--json", "--disturbance", "nominal");
        command("replay", ExitCodes.NOT_GUARANTEED, "replay", "missions/late-return.yaml", "--json");
    }

    @Test
    void margin_andItsFile() throws Exception {
        Path f = dir.resolve("margin.json");
        command("margin", ExitCodes.OK, "margin", "missions/night-round.yaml", "--json", "--json-file", f.toString());
        valid("margin", Files.readString(f));
        command("margin", ExitCodes.NOT_GUARANTEED, "margin", "missions/late-return.yaml", "--json");
    }

    @Test
    void validate_validAndNot() throws Exception {
        command("validate", ExitCodes.OK, "validate", "missions/night-round.yaml", "maps/clinic-wing.yaml", "--json");
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "name: x\nmap: nowhere.yaml\n");
        command("validate", ExitCodes.BAD_INPUT, "validate", bad.toString(), "--json");
    }

    /** {@code import --json}: the summary of the demo image, and the problems of an image that is not one. */
    @Test
    void import_summaryAndProblems() throws Exception {
        Path out = dir.resolve("annex.yaml");
        JsonNode ok = command("import", ExitCodes.OK, "import", "maps/depot-annex.pgm", "--pixel-size", "0.1",
                "--cell-size", "0.3", "--robot-radius", "0.25", "--docks", "36,13", "--out", out.toString(), "--json");
        assertThat(ok.get("imported").asBoolean()).isTrue();
        Path bad = dir.resolve("bad.pgm");
        Files.writeString(bad, "P2\n2 2\n0\n0 0 0 0\n");
        JsonNode no = command("import", ExitCodes.BAD_INPUT, "import", bad.toString(), "--pixel-size", "0.1",
                "--cell-size", "0.3", "--out", dir.resolve("no.yaml").toString(), "--json");
        assertThat(no.get("imported").asBoolean()).isFalse();
        assertThat(no.get("problems")).isNotEmpty();
        assertThat(Files.exists(dir.resolve("no.yaml"))).isFalse();
    }

    /** {@code view --json} with a file that cannot be opened: the messages as JSON, no window. */
    @Test
    void view_messages() throws Exception {
        JsonNode j = command("view", ExitCodes.BAD_INPUT, "view", dir.resolve("missing.yaml").toString(), "--json");
        assertThat(j.get("ok").asBoolean()).isFalse();
        assertThat(j.get("messages")).isNotEmpty();
    }

    /** {@code render --json} in a fresh JVM (the toolkit starts headless there, as in {@code RenderCommandTest}). */
    @Test
    void render_inAFreshJvm() throws Exception {
        JsonNode j = renderJson("missions/night-round.yaml");
        assertThat(j.get("verdict").asText()).isEqualTo("guaranteed");
    }

    /** A patrol's picture (its lasso), in the same shape. */
    @Test
    void render_patrol_inAFreshJvm() throws Exception {
        JsonNode j = renderJson("missions/night-patrol.yaml");
        assertThat(j.get("verdict").asText()).isEqualTo("guaranteed");
        assertThat(j.get("lowestLevelUnits").asInt()).isPositive();
    }

    private JsonNode renderJson(String mission) throws Exception {
        Path png = dir.resolve("picture.png");
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "dockline.cli.Main", "render",
                mission, "--out", png.toString(), "--size", "600x400", "--json"));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        pb.environment().remove("JAVA_TOOL_OPTIONS");
        File out = dir.resolve("out.json").toFile();
        pb.redirectOutput(out);
        pb.redirectError(dir.resolve("err.txt").toFile());
        Process p = pb.start();
        boolean done = p.waitFor(5, TimeUnit.MINUTES);
        if (!done) {
            p.destroyForcibly();
        }
        assertThat(done).isTrue();
        assertThat(p.exitValue()).as(Files.readString(dir.resolve("err.txt"))).isEqualTo(ExitCodes.OK);
        assertThat(png).isRegularFile();
        return valid("render", Files.readString(out.toPath()));
    }

    /** The schemas can fail: a key under an earlier name, or a missing key, is a problem. */
    @Test
    void schemas_rejectOtherNames_andMissingKeys() throws Exception {
        ObjectNode o = (ObjectNode) JSON.readTree(CliRun.run("check", "missions/night-round.yaml",
                "--json").out());
        ObjectNode renamed = o.deepCopy();
        renamed.set("worstCaseMinimumUnits", renamed.remove("lowestLevelUnits"));
        assertThat(schema("check").validate(renamed)).isNotEmpty();
        ObjectNode missing = o.deepCopy();
        missing.remove("caveats");
        assertThat(schema("check").validate(missing)).isNotEmpty();
    }
}
