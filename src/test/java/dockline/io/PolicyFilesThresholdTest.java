package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.policy.ThresholdPolicy;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The threshold form of the policy file (format version 4, missions/POLICY-FORMAT.md): round trips in JSON
 * and CSV, with and without closures, the version-3 row form still read beside it, and the problems of bad
 * threshold files reported as file:line:column.
 */
class PolicyFilesThresholdTest {

    @TempDir
    Path dir;

    static ThresholdPolicy sample(String closures) {
        return new ThresholdPolicy(List.of(
                new ThresholdPolicy.Row(new Cell(1, 6), 1, 0, closures, List.of(
                        new ThresholdPolicy.Step(60, new Action(ActionKind.MOVE, new Cell(2, 6))),
                        new ThresholdPolicy.Step(24, new Action(ActionKind.CHARGE, new Cell(1, 6))))),
                new ThresholdPolicy.Row(new Cell(2, 6), 0, 1, "", List.of(
                        new ThresholdPolicy.Step(31, new Action(ActionKind.WAIT, new Cell(2, 6)))))));
    }

    @Test
    void jsonAndCsv_roundTrip_withAndWithoutClosures() throws Exception {
        for (String closures : List.of("", "closed: door court-fire-door; used: 1")) {
            for (String name : List.of("t.json", "t.csv")) {
                Path f = dir.resolve(name);
                ThresholdPolicy tp = sample(closures);
                PolicyFiles.write(f, PolicyFilesTest.HEADER, tp);
                PolicyFiles.Document d = PolicyFiles.read(f);
                assertThat(d.thresholdForm()).isTrue();
                assertThat(d.header()).isEqualTo(PolicyFilesTest.HEADER);
                assertThat(d.thresholds().rows()).isEqualTo(tp.rows());
                assertThat(d.policy().size()).isZero();
                String text = Files.readString(f);
                assertThat(text).contains(name.endsWith(".csv") ? "# dockline-policy 4" : "\"version\" : 4");
            }
        }
        // the row form is still version 3 and still read
        Path rows = dir.resolve("r.json");
        PolicyFiles.write(rows, PolicyFilesTest.HEADER, PolicyFilesTest.sample());
        assertThat(Files.readString(rows)).contains("\"version\" : 3");
        assertThat(PolicyFiles.read(rows).thresholdForm()).isFalse();
    }

    @Test
    void lookUp_takesTheFirstStepAtOrBelowTheLevel() {
        ThresholdPolicy tp = sample("");
        Cell c = new Cell(1, 6);
        assertThat(tp.lookup(c, 120, 1, 0, "")).hasValue(new Action(ActionKind.MOVE, new Cell(2, 6)));
        assertThat(tp.lookup(c, 60, 1, 0, "")).hasValue(new Action(ActionKind.MOVE, new Cell(2, 6)));
        assertThat(tp.lookup(c, 59, 1, 0, "")).hasValue(new Action(ActionKind.CHARGE, c));
        assertThat(tp.lookup(c, 24, 1, 0, "")).hasValue(new Action(ActionKind.CHARGE, c));
        assertThat(tp.lookup(c, 23, 1, 0, "")).isEmpty();
        assertThat(tp.lookup(c, 100, 0, 0, "")).isEmpty();
    }

    @Test
    void badThresholdFiles_areReportedWithTheirPlace() throws Exception {
        Path csv = dir.resolve("bad.csv");
        Files.writeString(csv, String.join("\n", "# dockline-policy 4", "# mission: m", "# unitWh: 0.5",
                "# reserveUnits: 24", "# capacityUnits: 120", "# budget: 1", "# tasks: ward-a",
                "cell,budgetLeft,progress,atLeastUnits,action,to", "1:6,1,0,sixty,move,2:6", "1:6,1,0,24,charge,",
                "1:6,1,0,24,wait,", ""));
        assertThatThrownBy(() -> PolicyFiles.read(csv)).isInstanceOf(InputException.class)
                .hasMessageContaining("bad.csv:9:").hasMessageContaining("bad.csv:11:")
                .hasMessageContaining("a second row for cell 1:6, level 24");
        Path json = dir.resolve("bad.json");
        Files.writeString(json, "{\"format\":\"dockline-policy\",\"version\":4,\"mission\":\"m\",\"unitWh\":\"0.5\","
                + "\"reserveUnits\":24,\"capacityUnits\":120,\"budget\":1,\"tasks\":[],\n"
                + "\"thresholds\":[{\"cell\":\"1:6\",\"budgetLeft\":1,\"progress\":0,\"atLeastUnit\":24,\"action\":\"wait\"}],"
                + "\"rows\":[]}");
        assertThatThrownBy(() -> PolicyFiles.read(json)).isInstanceOf(InputException.class)
                .hasMessageContaining("bad.json:2:").hasMessageContaining("did you mean 'atLeastUnits'")
                .hasMessageContaining("'rows' or 'thresholds', not both");
    }
}
