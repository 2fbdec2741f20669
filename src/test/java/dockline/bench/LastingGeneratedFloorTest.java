package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The generated floor names both cells of a corridor-wide fire door alike (one name, two door cells), so
 * with lasting door-shut events two closure items shared one name, and the charging route's threshold
 * policy had two rows for one situation key ("two threshold rows ..."): {@code check} on that mission
 * stopped with an internal error. Every closure item now has a name of its own.
 */
class LastingGeneratedFloorTest {

    private static Mission lastingFloor() {
        Benchmark b = new Benchmark(Benchmark.Config.quick(), s -> { });
        return LastingBench.lastingMission(b.instance(32, Benchmark.RESERVE).mission());
    }

    @Test
    void closureItems_haveNamesOfTheirOwn_evenWhenDoorCellsShareAName() {
        Mission m = lastingFloor();
        DisturbanceStates st = ArenaCompiler.states(m);
        Set<String> names = new HashSet<>();
        for (int i = 0; i < st.itemCount(); i++) {
            names.add(st.itemName(i));
        }
        assertThat(st.itemCount()).as("the floor has closable doors").isGreaterThan(1);
        assertThat(names).hasSize(st.itemCount());
        assertThat(names).anyMatch(n -> n.contains(" at "));
    }

    /**
     * The benchmark's lasting instance (its door-shut events lasting). Oracle: the independent certificate checker (it plays the exported threshold policy against every
     * disturbance of the arena); the plan must be certified, not stopped by a key clash.
     */
    @Test
    void check_onTheLastingGeneratedFloor_isCertified() {
        Mission m = lastingFloor();
        Plan p = MissionPlanner.plan(m, PlanOptions.defaults(m));
        assertThat(p.guaranteed()).isTrue();
        assertThat(p.certification().ok()).as(p.certification().toString()).isTrue();
    }
}
