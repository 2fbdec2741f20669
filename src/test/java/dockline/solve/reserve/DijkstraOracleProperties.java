package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import dockline.solve.MissionFixture;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleDirectedWeightedGraph;

/**
 * With no disturbances and no charging, the battery only falls, so the mission "dock without going
 * below the reserve" is guaranteed exactly when start − (least energy to a dock) ≥ reserve. The
 * least energy is computed by jgrapht's {@link DijkstraShortestPath} (Dijkstra 1959, "A note on two
 * problems in connexion with graphs") on the map graph: vertices are free cells, an edge to a
 * 4-neighbour weighs the units to enter it, ⌈Wh / unit⌉ (rounding up, missions/README.md, "robot").
 */
class DijkstraOracleProperties {

    @Property(tries = 400)
    void noDisturbanceNoCharging_verdictIsStartMinusShortestPathAtLeastReserve(@ForAll long seed) {
        Random r = new Random(seed);
        int w = 1 + r.nextInt(6);
        int h = 1 + r.nextInt(6);
        String[] rows = new String[h];
        List<Cell> free = new ArrayList<>();
        for (int y = 0; y < h; y++) {
            StringBuilder sb = new StringBuilder();
            for (int x = 0; x < w; x++) {
                int k = r.nextInt(10);
                char c = k < 3 ? '#' : k < 6 ? '.' : k < 9 ? 'c' : 'D';
                sb.append(c);
                if (c != '#') {
                    free.add(new Cell(x, y));
                }
            }
            rows[y] = sb.toString();
        }
        if (free.isEmpty()) {
            rows[0] = "." + rows[0].substring(1);
            free.add(new Cell(0, 0));
        }
        Cell start = free.get(r.nextInt(free.size()));
        BigDecimal unit = new BigDecimal("0.5");
        BigDecimal tileWh = BigDecimal.valueOf(r.nextInt(30), 1); // 0.0 .. 2.9 Wh
        BigDecimal carpetWh = BigDecimal.valueOf(5 + r.nextInt(40), 1);
        int capacityWh = 5 + r.nextInt(40);
        int startWh = r.nextInt(capacityWh + 1);
        int reserveWh = r.nextInt(startWh + 1);
        MissionFixture f = MissionFixture.grid(rows).resolution("0.5").capacity(capacityWh).startWh(startWh)
                .reserveWh(reserveWh).start(start.x(), start.y()).waitWh(r.nextInt(2)).chargeWh(0)
                .budget(r.nextInt(3));
        Mission m = f.build();
        m = new Mission(m.name(), null, m.map(), new dockline.model.RobotProfile(m.robot().capacityWh(), unit,
                java.util.Map.of("tile", tileWh, "carpet", carpetWh), m.robot().waitWh(), BigDecimal.ZERO,
                m.robot().neighbourhood()), m.start(), m.startCharge(), m.reserve(), m.tasks(), m.objective());

        SimpleDirectedWeightedGraph<Cell, DefaultWeightedEdge> g = new SimpleDirectedWeightedGraph<>(DefaultWeightedEdge.class);
        free.forEach(g::addVertex);
        int[][] d4 = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}};
        for (Cell c : free) {
            for (int[] d : d4) {
                Cell n = new Cell(c.x() + d[0], c.y() + d[1]);
                if (g.containsVertex(n)) {
                    BigDecimal wh = rows[n.y()].charAt(n.x()) == 'c' ? carpetWh : tileWh;
                    g.setEdgeWeight(g.addEdge(c, n), wh.divide(unit, 0, RoundingMode.CEILING).doubleValue());
                }
            }
        }
        DijkstraShortestPath<Cell, DefaultWeightedEdge> dsp = new DijkstraShortestPath<>(g);
        double best = Double.POSITIVE_INFINITY;
        for (Cell c : free) {
            if (rows[c.y()].charAt(c.x()) == 'D') {
                best = Math.min(best, dsp.getPathWeight(start, c));
            }
        }
        // units: start rounds down, reserve rounds up (missions/README.md, "robot"); here both are whole
        // multiples of 0.5 Wh
        int startUnits = startWh * 2;
        int reserveUnits = reserveWh * 2;
        boolean expected = best != Double.POSITIVE_INFINITY && startUnits - best >= reserveUnits;

        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(a.startUnits()).isEqualTo(startUnits);
        assertThat(a.reserveUnits()).isEqualTo(reserveUnits);
        String why = String.join("\n", rows) + "\nshortest " + best;
        assertThat(a.guaranteed()).as(why).isEqualTo(expected);
        // the highest floor any policy keeps is the level on arrival along a shortest path
        int highest = best == Double.POSITIVE_INFINITY ? -1 : startUnits - (int) best;
        assertThat(a.highestGuaranteedReserveUnits().orElse(-1)).as(why).isEqualTo(Math.max(-1, highest));
        if (expected) {
            assertThat(a.worstCaseMinimumUnits().getAsInt()).as(why).isBetween(reserveUnits, highest);
        }
    }
}
