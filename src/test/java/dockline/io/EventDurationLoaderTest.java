package dockline.io;

import static dockline.io.Fixtures.edit;
import static dockline.io.Fixtures.mapProblems;
import static dockline.io.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.BuildingMap;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.EventRule;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The map keys {@code duration} and {@code at-most} of an event (maps/README.md), read and rejected. */
class EventDurationLoaderTest {

    @TempDir
    Path dir;

    private static final String GATE = "    - kind: door-shut\n      where: gate\n";

    private String withGate(String extra) {
        return edit(Fixtures.MAP, GATE, GATE + extra);
    }

    @Test
    void doorShutAndBlockage_lastByDefault_slipAndDragAreMomentary() throws Exception {
        BuildingMap m = MapLoader.load(write(dir, "m.yaml", Fixtures.MAP));
        for (EventRule r : m.disturbances().rules()) {
            assertThat(r.duration()).isEqualTo(r.kind() == EventKind.DOOR_SHUT ? EventDuration.REST_OF_MISSION
                    : EventDuration.MOMENTARY);
            assertThat(r.limited()).isFalse();
        }
    }

    @Test
    void momentaryAndAtMost_areRead() throws Exception {
        BuildingMap m = MapLoader.load(write(dir, "m.yaml", withGate("      duration: momentary\n"
                + "      at-most: 1\n")));
        EventRule door = m.disturbances().rules().get(0);
        assertThat(door.duration()).isEqualTo(EventDuration.MOMENTARY);
        assertThat(door.atMost()).isEqualTo(1);
    }

    @Test
    void misspelledDuration_getsTheAllowedValues() throws Exception {
        String text = withGate("      duration: rest-of-misson\n");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(1);
        assertThat(ps.get(0).message()).contains("unknown duration 'rest-of-misson'", "did you mean 'rest-of-mission'");
        assertThat(ps.get(0).hint()).contains("rest-of-mission", "momentary");
        assertThat(ps.get(0).line()).isEqualTo(text.substring(0, text.indexOf("duration:")).split("\n", -1).length);
        assertThat(ps.get(0).column()).isGreaterThan(1);
    }

    @Test
    void misspelledKey_getsADidYouMean() throws Exception {
        List<Problem> ps = mapProblems(write(dir, "m.yaml", withGate("      duraton: momentary\n")));
        assertThat(ps).anyMatch(p -> p.message().contains("did you mean 'duration'"));
    }

    @Test
    void durationOnDrag_isAnError_withAHint() throws Exception {
        String text = edit(Fixtures.MAP, "      extra: 0.5\n",
                "      extra: 0.5\n      duration: momentary\n");
        List<Problem> ps = mapProblems(write(dir, "m.yaml", text));
        assertThat(ps).hasSize(1);
        assertThat(ps.get(0).message()).contains("'duration' applies only to kind: door-shut and kind: blockage",
                "momentary by nature");
        assertThat(ps.get(0).hint()).isEqualTo("remove it");
    }

    @Test
    void atMostAboveTheBudgetOrNegative_isAnError_namingTheRange() throws Exception {
        for (String v : List.of("2", "-1")) {
            List<Problem> ps = mapProblems(write(dir, "m.yaml", withGate("      at-most: " + v + "\n")));
            assertThat(ps).as(v).hasSize(1);
            assertThat(ps.get(0).message()).contains("at-most must be between 0 and the budget (1), not " + v);
            assertThat(ps.get(0).hint()).contains("from 0 to 1");
        }
    }

    @Test
    void everyProblemAtOnce() throws Exception {
        String text = edit(withGate("      duration: forever\n      at-most: 7\n"),
                "      extra: 0.5\n", "      extra: 0.5\n      duration: momentary\n");
        assertThat(mapProblems(write(dir, "m.yaml", text))).hasSize(3);
    }
}
