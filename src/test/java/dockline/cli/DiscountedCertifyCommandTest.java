package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dockline.certify.DiscountedCertificate;
import dockline.certify.DiscountedCertificateChecker;
import dockline.fixtures.CliRun;
import dockline.io.MissionLoader;
import dockline.io.PolicyFiles;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.report.Caveats;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} certifies discounted verdicts and {@code export} writes discounted policies, on the demo
 * missions/discounted-trap.yaml (invented data). The expected worst score 16385/16384 is hand-worked
 * with the finite geometric sum, the definition of the discounted sum (one charge of +3 units, then
 * 15 moves of -2 with d = 2: 3 - 2 (1 - 2^-15)), as missions/README.md quotes it.
 */
class DiscountedCertifyCommandTest {

    @TempDir
    Path dir;

    @Test
    void check_printsCertified_andTheWorstScoreEqualsTheCertificates() throws Exception {
        CliRun text = CliRun.run("check", "missions/discounted-trap.yaml");
        assertThat(text.code()).as(text.err()).isEqualTo(ExitCodes.OK);
        assertThat(text.out()).contains("certified: true").contains("worst score exactly 16385/16384")
                .contains(Caveats.block());
        CliRun json = CliRun.run("check", "missions/discounted-trap.yaml", "--json");
        JsonNode j = new ObjectMapper().readTree(json.out());
        assertThat(j.get("certified").asBoolean()).isTrue();
        assertThat(j.get("certifiedLowestScore").asText()).isEqualTo(j.get("lowestScore").asText())
                .isEqualTo("16385/16384");
        assertThat(j.get("certifiedLowestLevelUnits").asInt()).isGreaterThanOrEqualTo(j.get("reserveUnits").asInt());
    }

    @Test
    void check_scoreOnly_andOtherThresholds_areCertifiedToo() throws Exception {
        for (String[] extra : List.of(new String[] {"--score-only"}, new String[] {"--threshold", "1", "--relation", ">"},
                new String[] {"--threshold", "-40"})) {
            List<String> args = new ArrayList<>(List.of("check", "missions/discounted-trap.yaml", "--json"));
            args.addAll(List.of(extra));
            CliRun r = CliRun.run(args.toArray(new String[0]));
            assertThat(r.code()).as(String.join(" ", extra) + r.err()).isEqualTo(ExitCodes.OK);
            JsonNode j = new ObjectMapper().readTree(r.out());
            assertThat(j.get("certified").asBoolean()).as(String.join(" ", extra)).isTrue();
            assertThat(j.get("certifiedLowestScore").asText()).isEqualTo(j.get("lowestScore").asText());
        }
        CliRun no = CliRun.run("check", "missions/discounted-trap.yaml", "--threshold", "6",
                "--json");
        assertThat(no.code()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(new ObjectMapper().readTree(no.out()).get("certified").asBoolean()).isFalse();
    }

    @Test
    void export_writesADiscountedPolicy_thatReadsBackAndIsCertified() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        for (String name : List.of("trap.json", "trap.csv")) {
            Path f = dir.resolve(name);
            CliRun r = CliRun.run("export", "missions/discounted-trap.yaml", "--policy",
                    f.toString());
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
            assertThat(r.out()).contains("rows with the score memory").contains(Caveats.block());
            PolicyFiles.Document d = PolicyFiles.read(f);
            assertThat(d.header().score()).isPresent();
            assertThat(d.header().score().get().objective()).isEqualTo(o);
            assertThat(d.policy().scored()).isTrue();
            DiscountedCertificate c = DiscountedCertificateChecker.check(m, d.policy(), d.header().score().get()
                    .objective(), d.header().score().get().reserveKept());
            assertThat(c.ok()).as(c.reason()).isTrue();
            assertThat(c.worstScore().orElseThrow().sameValue(Rational.of(16385, 16384))).isTrue();
        }
    }

    @Test
    void export_ofANotGuaranteedDiscountedMission_writesNothing() throws Exception {
        Path maps = Files.createDirectories(dir.resolve("maps"));
        Files.copy(Path.of("maps/pump-hall.yaml"), maps.resolve("pump-hall.yaml"));
        Path missions = Files.createDirectories(dir.resolve("missions"));
        Path mission = missions.resolve("six.yaml");
        Files.writeString(mission, Files.readString(Path.of("missions/discounted-trap.yaml"))
                .replace("threshold: \"3/4\"", "threshold: 6"));
        Path f = dir.resolve("p.json");
        CliRun r = CliRun.run("export", mission.toString(), "--policy", f.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.NOT_GUARANTEED);
        assertThat(r.out()).startsWith("NOT GUARANTEED:");
        assertThat(f).doesNotExist();
    }

    /** A certificate that fails, or whose worst score differs from the solver's, is reported as a problem. */
    @Test
    void certificateProblem_namesAFailedCertificate_andAScoreMismatch() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults());
        DiscountedCertificate good = DiscountedCertificateChecker.check(a.game().arena(), DiscountedPolicies.of(a), o,
                java.util.OptionalInt.of(m.reserveUnits()), m.startUnits());
        assertThat(dockline.plan.MissionPlanner.certificateProblem(a, good)).isNull();
        // drop the start's row: the certificate fails with a missing entry
        Policy p = DiscountedPolicies.of(a);
        List<PolicyEntry> rows = new ArrayList<>(p.entries());
        rows.removeIf(e -> e.cell().equals(m.start()) && e.level() == m.startUnits() && e.progress() == 0
                && e.budgetLeft() == m.map().disturbances().budget());
        assertThat(rows).hasSize(p.size() - 1);
        DiscountedCertificate bad = DiscountedCertificateChecker.check(m, new Policy(rows), o, true);
        assertThat(dockline.plan.MissionPlanner.certificateProblem(a, bad)).contains("failed the independent certificate")
                .contains("no entry");
        DiscountedCertificate other = new DiscountedCertificate(true, "", good.statesChecked(),
                Optional.of(dockline.certify.ExactScore.of(Rational.of(1))), good.worstMinimumUnits(),
                good.longestRunSteps(), o, true, good.floorUnits(), good.startUnits());
        assertThat(dockline.plan.MissionPlanner.certificateProblem(a, other)).contains("differs from the certificate's exact worst score");
    }
}
