package dockline.replay;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.RandomMissions;
import dockline.model.BuildingMap;
import dockline.model.DisturbanceModel;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import dockline.model.Zone;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * Patrol replays on random tiny games keep the lasso's promises, checked from the rows alone with this test's
 * own lap bookkeeping (the zones of each row's cell, read from the map records): a guaranteed patrol's loop
 * completes a lap and never goes below the floor; a counterexample either ends below the floor or in an
 * avoided zone, or loops without ever completing a lap; every row's lap mask follows from the previous one and
 * the cell entered (maps/README.md: task progress updates on every cell occupied).
 */
class RoundsReplayProperties {

    static Mission patrolOf(long seed) {
        Mission m = RandomMissions.fromSeed(seed);
        BuildingMap map = m.map();
        List<Zone> zones = new ArrayList<>(map.zones());
        zones.add(new Zone("home", List.of(map.docks().get(0))));
        List<String> cps = new ArrayList<>(m.tasks().visit());
        cps.add("home");
        BuildingMap pm = new BuildingMap(map.name(), null, map.cellSizeMetres(), map.rows(), map.legend(), zones,
                map.doorNames(), new DisturbanceModel(map.disturbances().budget(), map.disturbances().rules(),
                seed % 2 == 0));
        return new Mission(m.name(), null, pm, m.robot(), m.start(), m.startCharge(), m.reserve(),
                Tasks.patrol(cps, List.of()), m.objective(), new Timing(BigDecimal.ONE, null));
    }

    // Oracle: the rows themselves, re-read with this test's own lap bookkeeping from the zone records.
    @Property(tries = 400)
    void lasso_keepsItsPromises(@ForAll long seed) {
        Mission m = patrolOf(seed);
        RoundsReplay r = RoundsReplay.patrol(m, 1L << 28, seed % 3 == 0);
        List<ReplayStep> rows = r.replay().steps();
        List<String> cps = m.tasks().patrol();
        int full = (1 << cps.size()) - 1;
        int floor = m.reserveUnits();
        boolean lost = r.replay().ending() == Replay.Ending.BELOW_FLOOR || r.replay().ending() == Replay.Ending.AVOIDED_ZONE;
        int checked = lost ? rows.size() - 1 : rows.size();
        int prev = 0;
        for (int i = 0; i < checked; i++) {
            int mask = prev == full ? 0 : prev;
            for (int c = 0; c < cps.size(); c++) {
                if (m.map().zone(cps.get(c)).orElseThrow().contains(rows.get(i).cell())) {
                    mask |= 1 << c;
                }
            }
            assertThat(rows.get(i).progressMask()).as("lap mask at step " + i).isEqualTo(mask);
            prev = mask;
        }
        boolean lapInLoop = false;
        for (int i = Math.max(0, r.loopStart()); r.loopStart() >= 0 && i < rows.size(); i++) {
            lapInLoop |= rows.get(i).progressMask() == full;
        }
        if (r.guaranteed()) {
            assertThat(r.replay().ending()).isEqualTo(Replay.Ending.REPEATS);
            assertThat(r.loopLength()).isPositive();
            assertThat(lapInLoop).as("a lap in the loop").isTrue();
            assertThat(r.replay().minimumUnits()).isGreaterThanOrEqualTo(floor);
        } else if (r.replay().ending() == Replay.Ending.REPEATS) {
            assertThat(lapInLoop).as("no lap in the counterexample's loop").isFalse();
        } else {
            assertThat(lost).isTrue();
            assertThat(r.loopStart()).isEqualTo(-1);
            if (r.replay().ending() == Replay.Ending.BELOW_FLOOR) {
                assertThat(rows.get(rows.size() - 1).batteryUnits()).isLessThan(floor);
            }
        }
        Statistics.label("ending").collect(r.guaranteed() + " " + r.replay().ending().word());
        Statistics.label("ending").coverage(c -> {
            c.check("true repeats").percentage(p -> p >= 10);
            c.check("false repeats").percentage(p -> p >= 1);
            c.check("false below-floor").percentage(p -> p >= 1);
        });
    }
}
