package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check}'s choice of route: the fast path on a mission without charging (the night round
 * with docks that do not charge), the product route otherwise, {@code --method} forcing either, and
 * {@code --verdict-only}. The product route is the reference the fast path's figures are held to.
 */
class CheckRouteTest {

    @TempDir
    Path dir;

    private Path noCharge;

    @BeforeEach
    void missionWithoutCharging() throws Exception {
        String text = Files.readString(Path.of("missions/night-round.yaml"))
                .replaceAll("charge-rate: 1 .*", "charge-rate: 0")
                .replace("../maps/clinic-wing.yaml", Path.of("maps/clinic-wing.yaml").toAbsolutePath().toString());
        noCharge = dir.resolve("no-charge.yaml");
        Files.writeString(noCharge, text);
    }

    private static JsonNode json(CliRun r) throws Exception {
        return new ObjectMapper().readTree(r.out());
    }

    @Test
    void auto_takesTheFastPath_andAgreesWithTheProductRoute() throws Exception {
        CliRun fast = CliRun.run("check", noCharge.toString(), "--json");
        CliRun product = CliRun.run("check", noCharge.toString(), "--json", "--method", "product");
        assertThat(fast.code()).as(fast.err()).isEqualTo(ExitCodes.OK);
        assertThat(product.code()).as(product.err()).isEqualTo(ExitCodes.OK);
        JsonNode f = json(fast);
        JsonNode p = json(product);
        assertThat(f.get("method").asText()).isEqualTo("fast");
        assertThat(p.get("method").asText()).isEqualTo("product");
        assertThat(f.get("verdict").asText()).isEqualTo(p.get("verdict").asText());
        assertThat(f.get("highestReserveUnits").asInt()).isEqualTo(p.get("highestReserveUnits").asInt());
        assertThat(f.get("certified").asBoolean()).isTrue();
        // the policy of least need is the safest one: its worst level is the highest floor
        assertThat(f.get("lowestLevelUnits").asInt()).isEqualTo(f.get("highestReserveUnits").asInt());
        assertThat(f.get("certifiedLowestLevelUnits").asInt()).isEqualTo(f.get("lowestLevelUnits").asInt());
        CliRun text = CliRun.run("check", noCharge.toString());
        assertThat(text.out()).contains("Method: fast path", "certified: true", "Highest reserve floor guaranteed:");
    }

    @Test
    void chargingMission_takesTheChargingRoute_andRefusesAForcedFastPath() throws Exception {
        CliRun auto = CliRun.run("check", "missions/night-round.yaml", "--json");
        assertThat(json(auto).get("method").asText()).isEqualTo("charging");
        assertThat(CliRun.run("check", "missions/night-round.yaml").out()).contains("Method: charging route");
        CliRun fewest = CliRun.run("check", "missions/night-round.yaml", "--json",
                "--fewest-moves");
        assertThat(json(fewest).get("method").asText()).isEqualTo("product");
        CliRun forced = CliRun.run("check", "missions/night-round.yaml", "--method", "fast");
        assertThat(forced.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(forced.err()).contains("--method fast does not apply", "charge").doesNotContain("Exception");
        assertThat(forced.out()).isEmpty();
        CliRun bad = CliRun.run("check", "missions/night-round.yaml", "--method", "quick");
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("auto, fast, charging, product or stored");
    }

    /** The stored product (the reference route) and the default implicit one agree on verdict and figures. */
    @Test
    void storedRoute_agreesWithTheDefaultProductRoute() throws Exception {
        for (String file : new String[] {"missions/night-round.yaml", "missions/late-return.yaml"}) {
            JsonNode implicit = json(CliRun.run("check", file, "--json", "--method", "product"));
            CliRun storedRun = CliRun.run("check", file, "--json", "--method", "stored");
            JsonNode stored = json(storedRun);
            assertThat(stored.get("method").asText()).isEqualTo("stored-product");
            assertThat(implicit.get("method").asText()).isEqualTo("product");
            assertThat(stored.get("verdict")).isEqualTo(implicit.get("verdict"));
            assertThat(stored.get("highestReserveUnits")).isEqualTo(implicit.get("highestReserveUnits"));
            assertThat(stored.get("certified")).isEqualTo(implicit.get("certified"));
        }
        assertThat(CliRun.run("check", "missions/night-round.yaml", "--method", "stored").out())
                .contains("stored in arrays");
        CliRun both = CliRun.run("check", "missions/night-round.yaml", "--method", "stored",
                "--verdict-only");
        assertThat(both.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(both.err()).contains("drop --method stored");
    }

    @Test
    void verdictOnly_saysItIsNotCertified() throws Exception {
        for (String[] args : new String[][] {{"check", noCharge.toString(), "--verdict-only"},
            {"check", "missions/night-round.yaml", "--verdict-only"},
            {"check", noCharge.toString(), "--verdict-only", "--method", "product"}}) {
            CliRun r = CliRun.run(args);
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
            assertThat(r.out()).startsWith("GUARANTEED: ").contains("Verdict only, not certified").contains("Safety:");
        }
        CliRun implicit = CliRun.run("check", "missions/night-round.yaml", "--verdict-only", "--json");
        JsonNode j = json(implicit);
        assertThat(j.get("method").asText()).isEqualTo("implicit-product");
        assertThat(j.get("certified").asBoolean()).isFalse();
        assertThat(j.get("exploredVertices").asLong()).isPositive();
        assertThat(j.get("forecastVertices").asLong()).isPositive();
        CliRun lost = CliRun.run("check", "missions/late-return.yaml", "--verdict-only");
        assertThat(lost.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(lost.out()).startsWith("NOT GUARANTEED: ");
    }
}
