package dockline.view;

import dockline.bench.Benchmark;
import dockline.bench.BuildingGenerator;
import dockline.bench.MissionGenerator;
import dockline.bench.MissionSpec;
import dockline.model.DisturbanceModel;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.List;

/**
 * Test support: the benchmark's generated reserve floors (invented data, deterministic from the quick
 * configuration's seed) with their door-shut events lasting, as the benchmark's lasting rows have them (the
 * blockage lane, slips and drags as they are): missions whose whole closure arena is far too large for the
 * pictures' exact route (DEVELOPERS.md, "Lasting doors").
 */
final class LargeLastingMissions {

    private LargeLastingMissions() {
    }

    /** The {@code side}² generated reserve floor with its doors lasting. */
    static Mission floor(int side) {
        Benchmark.Config c = Benchmark.Config.quick();
        Mission m = MissionGenerator.generate(BuildingGenerator.generate(side, c.seed(), c.budget()),
                MissionSpec.docking(c.budget()), c.seed());
        List<EventRule> rules = new ArrayList<>();
        for (EventRule r : m.map().disturbances().rules()) {
            rules.add(r.kind() == EventKind.DOOR_SHUT ? r.withDuration(EventDuration.REST_OF_MISSION) : r);
        }
        return new Mission(m.name(), m.source(), m.map().withDisturbances(new DisturbanceModel(
                m.map().disturbances().budget(), rules)), m.robot(), m.start(), m.startCharge(), m.reserve(),
                m.tasks(), m.objective());
    }
}
