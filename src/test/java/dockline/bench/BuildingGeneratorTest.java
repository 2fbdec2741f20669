package dockline.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.ArenaCompiler;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Zone;
import java.util.HashSet;
import java.util.Set;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleGraph;

class BuildingGeneratorTest {

    @Example
    void sameSeed_sameFloor_otherSeed_otherFloor() {
        BuildingMap a = BuildingGenerator.generate(64, 11, 2);
        BuildingMap b = BuildingGenerator.generate(64, 11, 2);
        BuildingMap c = BuildingGenerator.generate(64, 12, 2);
        assertThat(a.rows()).isEqualTo(b.rows());
        assertThat(a.zones()).isEqualTo(b.zones());
        assertThat(a.disturbances()).isEqualTo(b.disturbances());
        assertThat(a.rows()).isNotEqualTo(c.rows());
    }

    @Example
    void everyBenchmarkSize_hasTheAdvertisedFeatures() {
        for (int side : new int[] {32, 64, 128, 256, 512}) {
            BuildingMap m = BuildingGenerator.generate(side, 1, 2);
            assertThat(m.width()).isEqualTo(side);
            assertThat(m.height()).isEqualTo(side);
            assertThat(m.docks()).isNotEmpty();
            assertThat(m.zones().size()).isLessThanOrEqualTo(BuildingGenerator.MAX_ROOM_ZONES + 3);
            assertThat(m.zone("wet-floor")).isPresent();
            assertThat(m.zone("loading-lane")).isPresent();
            assertThat(m.zone("quiet-area")).isPresent();
            assertThat(m.zones().stream().filter(z -> z.name().startsWith("room-")).count()).isGreaterThanOrEqualTo(3);
            Set<String> surfaces = new HashSet<>();
            for (int y = 0; y < side; y++) {
                for (int x = 0; x < side; x++) {
                    if (m.isFree(new Cell(x, y))) {
                        surfaces.add(m.terrainAt(new Cell(x, y)).surface());
                    }
                }
            }
            assertThat(surfaces).containsExactlyInAnyOrder("tile", "carpet", "ramp");
            Set<EventKind> kinds = new HashSet<>();
            for (EventRule r : m.disturbances().rules()) {
                kinds.add(r.kind());
            }
            assertThat(kinds).containsExactlyInAnyOrder(EventKind.values());
        }
    }

    /** Zones and event rules only cover free cells; shutting cells are doors; the outer ring is wall. */
    @Property(tries = 20)
    void zonesAndRules_coverFreeCellsOnly(@ForAll @IntRange(min = 32, max = 90) int side, @ForAll long seed) {
        BuildingMap m = BuildingGenerator.generate(side, seed, 1);
        for (Zone z : m.zones()) {
            assertThat(z.cells()).isNotEmpty().allMatch(m::isFree);
        }
        for (EventRule r : m.disturbances().rules()) {
            assertThat(r.cells()).allMatch(m::isFree);
            if (r.kind() == EventKind.DOOR_SHUT) {
                assertThat(r.cells()).allMatch(c -> m.terrainAt(c).door());
            }
        }
        for (int i = 0; i < side; i++) {
            assertThat(m.isFree(new Cell(i, 0)) || m.isFree(new Cell(0, i)) || m.isFree(new Cell(i, side - 1))
                    || m.isFree(new Cell(side - 1, i))).isFalse();
        }
    }

    /**
     * Every free cell can reach every other one: checked with jgrapht's ConnectivityInspector
     * (an independent reference implementation) on the 4-neighbour grid graph.
     */
    @Property(tries = 20)
    void freeCells_formOneConnectedComponent(@ForAll @IntRange(min = 32, max = 100) int side, @ForAll long seed) {
        BuildingMap m = BuildingGenerator.generate(side, seed, 0);
        Graph<Integer, DefaultEdge> grid = new SimpleGraph<>(DefaultEdge.class);
        for (int y = 0; y < side; y++) {
            for (int x = 0; x < side; x++) {
                if (m.isFree(new Cell(x, y))) {
                    grid.addVertex(y * side + x);
                }
            }
        }
        for (int y = 0; y < side; y++) {
            for (int x = 0; x < side; x++) {
                int v = y * side + x;
                if (!grid.containsVertex(v)) {
                    continue;
                }
                if (grid.containsVertex(v + 1) && x + 1 < side) {
                    grid.addEdge(v, v + 1);
                }
                if (grid.containsVertex(v + side)) {
                    grid.addEdge(v, v + side);
                }
            }
        }
        assertThat(new ConnectivityInspector<>(grid).isConnected()).isTrue();
    }

    @Property(tries = 20)
    void missions_startOnADock_andNameRoomsOfTheMap(@ForAll @IntRange(min = 32, max = 90) int side, @ForAll long seed) {
        BuildingMap m = BuildingGenerator.generate(side, seed, 1);
        Mission mi = MissionGenerator.generate(m, MissionSpec.consumptionOnly(2), seed);
        assertThat(m.terrainAt(mi.start()).dock()).isTrue();
        assertThat(mi.tasks().visit()).hasSize(3).doesNotHaveDuplicates().allMatch(n -> m.zone(n).isPresent());
        assertThat(mi.map().disturbances().budget()).isEqualTo(2);
        assertThat(mi.capacityUnits()).isEqualTo(1000); // 100 Wh at 0.1 Wh
        assertThat(mi.startUnits()).isEqualTo(1000);
        assertThat(mi.reserveUnits()).isEqualTo(200);
        // deterministic
        assertThat(MissionGenerator.generate(m, MissionSpec.consumptionOnly(2), seed)).isEqualTo(mi);
        // and it compiles
        assertThat(ArenaCompiler.compile(mi).vertexCount()).isPositive();
    }

    @Example
    void tooSmall_isRejected() {
        assertThatThrownBy(() -> BuildingGenerator.generate(10, 1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> BuildingGenerator.generate(64, 1, -1)).isInstanceOf(IllegalArgumentException.class);
    }
}
