package dockline.solve.rounds;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.TinyMission;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Tasks;
import dockline.model.Timing;
import java.math.BigDecimal;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleDirectedWeightedGraph;

/**
 * On random floors with one dock, which is the patrol's only checkpoint, and no disturbances: the patrol is
 * guaranteed exactly when the robot can reach the dock without going below the floor and can then stay charged
 * there (it charges at least one unit a step, or waiting costs nothing), as worked by hand in
 * {@link OneDockPatrolExampleTest}. Oracle: jgrapht's Dijkstra over the floor's cells, each move weighted with the
 * energy of the cell entered (maps/README.md); with one dock the robot cannot charge on the way, so the cheapest
 * way in decides reachability.
 */
class OneDockPatrolProperties {

    @Property(tries = 300)
    void guaranteed_iffReachableAndChargedForEver(@ForAll long seed) {
        Random r = new Random(seed);
        int w = 3 + r.nextInt(3);
        int h = 2 + r.nextInt(3);
        char[][] g = new char[h][w];
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                g[y][x] = r.nextInt(5) == 0 ? '#' : r.nextInt(3) == 0 ? 'c' : '.';
            }
        }
        Cell dock = new Cell(r.nextInt(w), r.nextInt(h));
        g[dock.y()][dock.x()] = 'D';
        Cell start = new Cell(r.nextInt(w), r.nextInt(h));
        if (!start.equals(dock)) {
            g[start.y()][start.x()] = '.';
        }
        String[] rows = new String[h];
        for (int y = 0; y < h; y++) {
            rows[y] = new String(g[y]);
        }
        int tile = 1 + r.nextInt(2);
        int carpet = 1 + r.nextInt(3);
        int wait = r.nextInt(3) == 0 ? 0 : 1;
        int charge = r.nextBoolean() ? 0 : 1 + r.nextInt(2);
        int cap = 6 + r.nextInt(10);
        int startWh = 1 + r.nextInt(cap);
        int floor = r.nextInt(Math.min(4, startWh + 1));
        Mission base = TinyMission.plan(rows).zone("home", dock.x() + ":" + dock.y()).costs(tile, carpet, wait, charge)
                .capacity(cap).start(start.x() + ":" + start.y(), startWh).reserve(floor).build();
        Mission m = new Mission(base.name(), null, base.map(), base.robot(), base.start(), base.startCharge(),
                base.reserve(), Tasks.patrol(List.of("home"), List.of()), base.objective(),
                new Timing(BigDecimal.ONE, null));

        SimpleDirectedWeightedGraph<Cell, DefaultWeightedEdge> graph = new SimpleDirectedWeightedGraph<>(
                DefaultWeightedEdge.class);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                if (g[y][x] != '#') {
                    graph.addVertex(new Cell(x, y));
                }
            }
        }
        int[][] d4 = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}};
        for (Cell c : graph.vertexSet()) {
            for (int[] d : d4) {
                Cell n = new Cell(c.x() + d[0], c.y() + d[1]);
                if (graph.containsVertex(n)) {
                    DefaultWeightedEdge e = graph.addEdge(c, n);
                    graph.setEdgeWeight(e, g[n.y()][n.x()] == 'c' ? carpet : tile);
                }
            }
        }
        var path = new DijkstraShortestPath<>(graph).getPath(start, dock);
        boolean reachable = path != null && startWh - path.getWeight() >= floor;
        boolean charged = charge >= 1 || wait == 0;
        PatrolAnalysis a = PatrolSolver.analyse(m, 1L << 28);
        assertThat(a.guaranteed()).isEqualTo(reachable && charged);
        Statistics.label("guaranteed").collect(a.guaranteed());
        Statistics.label("why not").collect(a.guaranteed() ? "-" : !reachable ? "unreachable" : "cannot stay");
        Statistics.label("guaranteed").coverage(c -> {
            c.check(true).percentage(p -> p >= 15);
            c.check(false).percentage(p -> p >= 15);
        });
        Statistics.label("why not").coverage(c -> {
            c.check("unreachable").percentage(p -> p >= 3);
            c.check("cannot stay").percentage(p -> p >= 3);
        });
    }
}
