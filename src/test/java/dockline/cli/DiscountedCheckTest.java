package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.fixtures.CliRun;
import dockline.report.Caveats;
import org.junit.jupiter.api.Test;

/**
 * {@code dockline check} with the discounted objective: exit codes, the text and JSON reports, and
 * bad usage. Expected scores are hand-worked with the geometric series on the demo
 * missions/discounted-trap.yaml (see missions/README.md): the plan charges once (+3 units) and
 * makes 15 moves of -2, so its score is 3 - 2 * (1 - 2^-15) = 16385/16384.
 */
class DiscountedCheckTest {

    @Test
    void trapDemo_guaranteed_andTheBaselinesPolicyNeverCompletes() {
        CliRun r = CliRun.run("check", "missions/discounted-trap.yaml", "--also-optimise");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).startsWith("GUARANTEED: Gauge reading, pump hall")
                .contains("DS >= 3/4 (discount 2)")
                .contains("Worst score under the policy:  16385/16384")
                .contains("Plan with no disturbance:      charge, move 2:1")
                .contains("never completes the mission")
                .contains(Caveats.block());
    }

    @Test
    void trapDemo_atTheOptimum_notGuaranteed() {
        CliRun r = CliRun.run("check", "missions/discounted-trap.yaml", "--threshold", "6");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).startsWith("NOT GUARANTEED:");
    }

    @Test
    void json_addsTheObjectiveAndTheComparatorSize() throws Exception {
        CliRun r = CliRun.run("check", "missions/night-round.yaml", "--objective", "discounted",
                "--discount", "2", "--threshold", "3/4", "--relation", ">=", "--json", "--also-optimise");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("objective").asText()).isEqualTo("discounted");
        assertThat(j.get("discount").asInt()).isEqualTo(2);
        assertThat(j.get("threshold").asText()).isEqualTo("3/4");
        assertThat(j.get("relation").asText()).isEqualTo(">=");
        assertThat(j.get("comparatorStates").asInt()).isPositive()
                .isLessThanOrEqualTo(j.get("comparatorStateBound").asInt());
        assertThat(j.get("reserveKept").asBoolean()).isTrue();
        assertThat(j.get("optimisationBaseline").get("holds").isBoolean()).isTrue();
        assertThat(j.get("caveats").size()).isEqualTo(Caveats.LINES.size());
    }

    @Test
    void scoreOnly_dropsTheReserve() throws Exception {
        CliRun r = CliRun.run("check", "missions/discounted-trap.yaml", "--score-only", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(new ObjectMapper().readTree(r.out()).get("reserveKept").asBoolean()).isFalse();
    }

    @Test
    void badUsage_exitsTwoWithAMessage() {
        CliRun a = CliRun.run("check", "missions/discounted-trap.yaml", "--relation", "=>");
        assertThat(a.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(a.err()).contains("--relation must be '>=' (at-least) or '>' (above)");
        CliRun b = CliRun.run("check", "missions/night-round.yaml", "--objective", "discounted");
        assertThat(b.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(b.err()).contains("needs --discount").contains("needs --threshold");
        CliRun c = CliRun.run("check", "missions/night-round.yaml", "--objective", "reserve",
                "--discount", "2");
        assertThat(c.code()).isEqualTo(ExitCodes.BAD_INPUT);
        CliRun d = CliRun.run("check", "missions/discounted-trap.yaml", "--threshold", "1/0");
        assertThat(d.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(d.err()).doesNotContain("Exception");
        CliRun e = CliRun.run("check", "missions/discounted-trap.yaml", "--discount", "1");
        assertThat(e.code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void reserveObjectiveOverride_onADiscountedMission_checksTheReserve() {
        CliRun r = CliRun.run("check", "missions/discounted-trap.yaml", "--objective", "reserve");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).contains("Highest reserve floor guaranteed:");
    }

    @Test
    void hugeThreshold_isAResourceLimit() {
        CliRun r = CliRun.run("check", "missions/discounted-trap.yaml", "--threshold",
                "1/999999999999999999");
        assertThat(r.code()).isEqualTo(ExitCodes.RESOURCE_LIMIT);
        assertThat(r.err()).doesNotContain("Exception");
    }
}
