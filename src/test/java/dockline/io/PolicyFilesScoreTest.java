package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.PolicyScore;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Policy files with a score memory (discounted missions, missions/POLICY-FORMAT.md):
 * round trips, the documented layout, old version-1 and version-2 files still read, and the problems of bad files.
 */
class PolicyFilesScoreTest {

    @TempDir
    Path dir;

    static final PolicyFiles.Header HEADER = new PolicyFiles.Header("Gauge, test", new BigDecimal("0.5"), 16, 80, 1,
            List.of("gauge"), Optional.of(new PolicyFiles.ScoreTerms(2, Rational.of(3, 4), Relation.AT_LEAST, 3, true)));

    static Policy sample() {
        Cell a = new Cell(1, 1);
        return new Policy(List.of(
                new PolicyEntry(a, 48, 1, 0, new Action(ActionKind.CHARGE, a), PolicyScore.gap(Rational.of(-3, 8))),
                new PolicyEntry(a, 51, 1, 0, new Action(ActionKind.MOVE, new Cell(2, 1)), PolicyScore.gap(Rational.of(9, 4))),
                new PolicyEntry(a, 51, 1, 0, new Action(ActionKind.WAIT, a), PolicyScore.gap(Rational.of(2))),
                new PolicyEntry(new Cell(2, 1), 49, 0, 1, new Action(ActionKind.MOVE, a), PolicyScore.SECURED)));
    }

    @Test
    void jsonAndCsv_roundTrip_withTheScoreMemory() throws Exception {
        for (String name : List.of("p.json", "p.csv")) {
            PolicyFiles.Document d = Fixtures.policyRoundTrip(dir, name, HEADER, sample());
            assertThat(d.policy().lookup(new Cell(1, 1), 51, 1, 0, PolicyScore.gap(Rational.of(9, 4))))
                    .contains(new Action(ActionKind.MOVE, new Cell(2, 1)));
        }
    }

    @Test
    void csv_looksAsDocumented() throws Exception {
        List<String> lines = Fixtures.writtenPolicy(dir, "p.csv", HEADER, sample());
        assertThat(lines.get(0)).isEqualTo("# dockline-policy 3");
        assertThat(lines).contains("# objective: discounted", "# discount: 2", "# threshold: 3/4", "# relation: >=",
                "# weightBoundUnits: 3", "# reserveKept: true", "cell,levelUnits,budgetLeft,progress,score,action,to",
                "1:1,48,1,0,-3/8,charge,", "2:1,49,0,1,secured,move,1:1", "1:1,51,1,0,2,wait,");
    }

    @Test
    void json_hasTheScoreInEachRow() throws Exception {
        List<String> lines = Fixtures.writtenPolicy(dir, "p.json", HEADER, sample());
        assertThat(lines).anyMatch(l -> l.trim().equals("\"version\" : 3,"));
        assertThat(lines).anyMatch(l -> l.trim().equals("\"objective\" : \"discounted\","));
        assertThat(lines).anyMatch(l -> l.trim().replaceAll(",$", "").equals(
                "{\"cell\":\"1:1\",\"levelUnits\":48,\"budgetLeft\":1,\"progress\":0,\"score\":\"-3/8\",\"action\":\"charge\"}"));
    }

    @Test
    void version1Files_areStillRead_andWrittenAgainAsVersion3() throws Exception {
        Path f = dir.resolve("old.csv");
        Files.writeString(f, String.join("\n", "# dockline-policy 1", "# mission: m", "# unit-wh: 0.5",
                "# floor-units: 2", "# capacity-units: 10", "# budget: 0", "# tasks: ",
                "cell,level,budget-left,progress,action,to", "1:2,3,0,0,wait,", ""));
        PolicyFiles.Document d = PolicyFiles.read(f);
        assertThat(d.header().score()).isEmpty();
        assertThat(d.policy().scored()).isFalse();
        assertThat(d.policy().lookup(new Cell(1, 2), 3, 0, 0)).isPresent();
        Path g = dir.resolve("new.csv");
        PolicyFiles.write(g, d.header(), d.policy());
        // the same content under the keys of version 3 (missions/POLICY-FORMAT.md)
        assertThat(Files.readString(g)).isEqualTo(String.join("\n", "# dockline-policy 3", "# mission: m",
                "# unitWh: 0.5", "# reserveUnits: 2", "# capacityUnits: 10", "# budget: 0", "# tasks: ",
                "cell,levelUnits,budgetLeft,progress,action,to", "1:2,3,0,0,wait,", ""));
        PolicyFiles.Document again = PolicyFiles.read(g);
        assertThat(again.header()).isEqualTo(d.header());
        assertThat(again.policy().entries()).isEqualTo(d.policy().entries());
    }

    @Test
    void badScores_andMismatches_areReportedWithTheirPosition() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, String.join("\n", "# dockline-policy 2", "# mission: m", "# unit-wh: 0.5",
                "# floor-units: 2", "# capacity-units: 10", "# budget: 0", "# tasks:", "# objective: discounted",
                "# discount: 2", "# threshold: 3/4", "# relation: =>", "# weight-bound: 3",
                "cell,level,budget-left,progress,score,action,to",
                "1:2,3,0,0,0.5,wait,",
                "1:2,3,0,0,1/0,wait,",
                "1:2,4,0,0,,wait,"));
        assertThatThrownBy(() -> PolicyFiles.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            List<String> msgs = e.problems().stream().map(Problem::format).toList();
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":11:") && m.contains("'relation' must be"));
        });
        Files.writeString(f, Files.readString(f).replace("=>", ">="));
        assertThatThrownBy(() -> PolicyFiles.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            List<String> msgs = e.problems().stream().map(Problem::format).toList();
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":14:11: '0.5' is not a score memory"));
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":15:11: '1/0' is not a score memory"));
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":16:1: row has no 'score'"));
        });
        Path j = dir.resolve("bad.json");
        Files.writeString(j, String.join("\n",
                "{\"format\": \"dockline-policy\", \"version\": 1, \"mission\": \"m\", \"unit-wh\": \"0.5\",",
                " \"floor-units\": 2, \"capacity-units\": 10, \"budget\": 0, \"tasks\": [],",
                " \"rows\": [",
                "  {\"cell\": \"1:2\", \"level\": 3, \"budget-left\": 0, \"progress\": 0, \"score\": \"2\", \"action\": \"wait\"}",
                " ]}"));
        assertThatThrownBy(() -> PolicyFiles.read(j)).hasMessageContaining("bad.json:4:3: a row with a 'score' needs"
                + " 'objective: discounted' in the header");
        Files.writeString(j, Files.readString(j).replace("\"tasks\": [],", "\"tasks\": [], \"discount\": 2,"));
        assertThatThrownBy(() -> PolicyFiles.read(j)).hasMessageContaining("'discount' belongs to a policy for a"
                + " discounted mission");
    }
}
