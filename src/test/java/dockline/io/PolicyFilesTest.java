package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The policy file formats of missions/POLICY-FORMAT.md: round trips and the problems of bad files. */
class PolicyFilesTest {

    @TempDir
    Path dir;

    static final PolicyFiles.Header HEADER = new PolicyFiles.Header("Corridor, test", new BigDecimal("0.5"), 24, 120, 1,
            List.of("ward-a", "ward-b"));

    static Policy sample() {
        return new Policy(List.of(
                new PolicyEntry(new Cell(1, 6), 96, 1, 0, new Action(ActionKind.MOVE, new Cell(2, 6))),
                new PolicyEntry(new Cell(2, 6), 95, 1, 0, new Action(ActionKind.WAIT, new Cell(2, 6))),
                new PolicyEntry(new Cell(1, 6), 40, 0, 3, new Action(ActionKind.CHARGE, new Cell(1, 6)))));
    }

    @Test
    void jsonAndCsv_roundTrip() throws Exception {
        for (String name : List.of("p.json", "p.csv", "P.CSV")) {
            Fixtures.policyRoundTrip(dir, name, HEADER, sample());
        }
    }

    @Test
    void csv_looksAsDocumented() throws Exception {
        List<String> lines = Fixtures.writtenPolicy(dir, "p.csv", HEADER, sample());
        assertThat(lines.get(0)).isEqualTo("# dockline-policy 3");
        assertThat(lines).contains("cell,levelUnits,budgetLeft,progress,action,to", "1:6,96,1,0,move,2:6",
                "2:6,95,1,0,wait,", "# tasks: ward-a ward-b", "# unitWh: 0.5");
    }

    @Test
    void json_hasOneRowPerLine() throws Exception {
        assertThat(Fixtures.writtenPolicy(dir, "p.json", HEADER, sample())).anyMatch(l -> l.trim().equals(
                "{\"cell\":\"1:6\",\"levelUnits\":96,\"budgetLeft\":1,\"progress\":0,\"action\":\"move\",\"to\":\"2:6\"},"));
    }

    @Test
    void badJson_reportsEveryProblemWithItsPosition() throws Exception {
        Path f = dir.resolve("bad.json");
        Files.writeString(f, String.join("\n",
                "{\"format\": \"dockline-policy\", \"version\": 1, \"mission\": \"m\", \"unit-wh\": \"0.5\",",
                " \"floor-units\": 2, \"capacity-units\": 10, \"budget\": 0, \"tasks\": [], \"rowz\": [],",
                " \"rows\": [",
                "  {\"cell\": \"1-2\", \"level\": 3, \"budget-left\": 0, \"progress\": 0, \"action\": \"wait\"},",
                "  {\"cell\": \"1:2\", \"level\": -3, \"budget-left\": 0, \"progress\": 0, \"action\": \"jump\"},",
                "  {\"cell\": \"1:2\", \"level\": 3, \"budget-left\": 0, \"progress\": 0, \"action\": \"move\"}",
                " ]}"));
        assertThatThrownBy(() -> PolicyFiles.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            List<String> msgs = e.problems().stream().map(Problem::format).toList();
            assertThat(msgs).anyMatch(m -> m.contains("bad.json:2:") && m.contains("unknown key 'rowz'")
                    && m.contains("did you mean 'rows'"));
            assertThat(msgs).anyMatch(m -> m.contains("bad.json:4:12: '1-2' is not a cell"));
            assertThat(msgs).anyMatch(m -> m.contains("bad.json:5:") && m.contains("'levelUnits' must be a whole number"));
            assertThat(msgs).anyMatch(m -> m.contains("bad.json:5:") && m.contains("unknown action 'jump'"));
            assertThat(msgs).anyMatch(m -> m.contains("bad.json:6:") && m.contains("a move needs 'to'"));
        });
    }

    @Test
    void badCsv_reportsDuplicatesAndBadFields() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, String.join("\n", "# dockline-policy 1", "# mission: m", "# unit-wh: 0.5",
                "# floor-units: 2", "# capacity-units: 10", "# budget: 0", "# tasks:",
                "cell,level,budget-left,progress,action,to",
                "1:2,3,0,0,wait,",
                "1:2,3,0,0,charge,",
                "1:2,4,0,0,wait,3:3",
                "1:2,5,0,0"));
        assertThatThrownBy(() -> PolicyFiles.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            List<String> msgs = e.problems().stream().map(Problem::format).toList();
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":10:1: a second row for cell 1:2"));
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":11:16: 'wait' stays on its cell"));
            assertThat(msgs).anyMatch(m -> m.startsWith(f + ":12:1: a row has 6 fields"));
        });
    }

    @Test
    void notAPolicy_isSaidSo() throws Exception {
        Path f = dir.resolve("x.json");
        Files.writeString(f, "[1, 2]");
        assertThatThrownBy(() -> PolicyFiles.read(f)).hasMessageContaining("x.json:1:1: a policy file in JSON is one object");
        Files.writeString(f, "{\"format\": \"other\", ");
        assertThatThrownBy(() -> PolicyFiles.read(f)).hasMessageContaining("not valid JSON");
        assertThatThrownBy(() -> PolicyFiles.read(dir.resolve("missing.csv"))).hasMessageContaining("no such file");
    }
}
