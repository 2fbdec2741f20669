package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Zone;
import dockline.solve.RandomMissions;
import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * Mirroring or transposing the floor plan renumbers every free cell, hence every arena and product
 * vertex and the order of every edge list, while the game stays the same up to isomorphism (the
 * 4- and 8-neighbourhoods and the corner rule are symmetric). Verdict, highest reserve and worst
 * case must not change: a check against order dependence.
 */
class RenumberingProperties {

    /** The stored product, whose size these tests compare (the implicit route scans an order-dependent part). */
    private static final ReserveOptions STORED = ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT);

    @Property(tries = 300)
    void mirroredOrTransposedMap_givesTheSameAnswers(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, STORED);
        int w = m.map().width();
        int h = m.map().height();
        for (UnaryOperator<Cell> t : List.<UnaryOperator<Cell>>of(c -> new Cell(w - 1 - c.x(), c.y()),
                c -> new Cell(c.y(), c.x()), c -> new Cell(w - 1 - c.x(), h - 1 - c.y()))) {
            Mission moved = transform(m, t);
            ReserveAnalysis b = ReserveSolver.analyse(moved, STORED);
            String why = RandomMissions.describe(m) + "\nmoved to\n" + RandomMissions.describe(moved);
            assertThat(b.verdict()).as(why).isEqualTo(a.verdict());
            assertThat(b.highestGuaranteedReserveUnits()).as(why).isEqualTo(a.highestGuaranteedReserveUnits());
            assertThat(b.productVertices()).as(why).isEqualTo(a.productVertices());
            assertThat(b.productEdges()).as(why).isEqualTo(a.productEdges());
        }
    }

    /** The default (implicit) route: the verdict and the highest floor do not depend on the numbering either. */
    @Property(tries = 200)
    void mirroredMap_implicitRoute_givesTheSameVerdictAndHighestFloor(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        int w = m.map().width();
        Mission moved = transform(m, c -> new Cell(w - 1 - c.x(), c.y()));
        ReserveAnalysis b = ReserveSolver.analyse(moved, ReserveOptions.defaults());
        String why = RandomMissions.describe(m) + "\nmoved to\n" + RandomMissions.describe(moved);
        assertThat(b.verdict()).as(why).isEqualTo(a.verdict());
        assertThat(b.highestGuaranteedReserveUnits()).as(why).isEqualTo(a.highestGuaranteedReserveUnits());
    }

    static Mission transform(Mission m, UnaryOperator<Cell> t) {
        BuildingMap map = m.map();
        int w = map.width();
        int h = map.height();
        Cell corner = t.apply(new Cell(w - 1, h - 1));
        Cell origin = t.apply(new Cell(0, 0));
        int nw = Math.max(corner.x(), origin.x()) + 1;
        int nh = Math.max(corner.y(), origin.y()) + 1;
        char[][] g = new char[nh][nw];
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                Cell c = t.apply(new Cell(x, y));
                g[c.y()][c.x()] = map.rows().get(y).charAt(x);
            }
        }
        List<String> rows = new ArrayList<>();
        for (char[] r : g) {
            rows.add(new String(r));
        }
        List<Zone> zones = map.zones().stream().map(z -> new Zone(z.name(), z.cells().stream().map(t).toList())).toList();
        List<EventRule> rules = map.disturbances().rules().stream()
                .map(r -> new EventRule(r.kind(), r.label(), r.cells().stream().map(t).toList(), r.extraWh())).toList();
        BuildingMap moved = new BuildingMap(map.name(), null, map.cellSizeMetres(), rows, map.legend(), zones,
                map.doorNames(), new dockline.model.DisturbanceModel(map.disturbances().budget(), rules));
        return new Mission(m.name(), null, moved, m.robot(), t.apply(m.start()), m.startCharge(), m.reserve(),
                m.tasks(), m.objective());
    }
}
