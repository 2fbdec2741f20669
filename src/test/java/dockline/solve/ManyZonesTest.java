package dockline.solve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleDirectedWeightedGraph;
import org.junit.jupiter.api.Test;

/**
 * Maps with more zones than a 64-bit mask over all of them would hold (64 rooms with one zone each, and
 * 200 rooms): only the zones the tasks name get a label bit. Without disturbances and without charging
 * the battery only falls, so the highest guaranteed floor is the start minus the least energy of a walk
 * start → first room → second → third → a dock that never enters the avoided room, and the mission is
 * guaranteed exactly when that is at least the floor. The oracle computes that least energy with
 * jgrapht's {@link DijkstraShortestPath} (Dijkstra 1959, "A note on two problems in connexion with
 * graphs") on its own layered graph (cell, rooms done), built from the room layout here, not from the
 * arena or the goal automaton. Generated floors: invented data.
 */
class ManyZonesTest {

    /** A floor of rows x cols rooms of 3 x 3 cells, walls between them with one opening to each neighbour. */
    private record Floor(String[] plan, int rows, int cols) {

        static Floor of(int rows, int cols, Random r) {
            int w = cols * 4 + 1;
            int h = rows * 4 + 1;
            char[][] g = new char[h][w];
            for (char[] row : g) {
                java.util.Arrays.fill(row, '#');
            }
            for (int ry = 0; ry < rows; ry++) {
                for (int rx = 0; rx < cols; rx++) {
                    char floor = r.nextInt(4) == 0 ? 'c' : '.';
                    for (int y = 0; y < 3; y++) {
                        for (int x = 0; x < 3; x++) {
                            g[ry * 4 + 1 + y][rx * 4 + 1 + x] = floor;
                        }
                    }
                    if (rx + 1 < cols) {
                        g[ry * 4 + 2][rx * 4 + 4] = '.';
                    }
                    if (ry + 1 < rows) {
                        g[ry * 4 + 4][rx * 4 + 2] = '.';
                    }
                }
            }
            String[] plan = new String[h];
            for (int y = 0; y < h; y++) {
                plan[y] = new String(g[y]);
            }
            return new Floor(plan, rows, cols);
        }

        List<Cell> room(int i) {
            int ry = i / cols;
            int rx = i % cols;
            List<Cell> cells = new ArrayList<>();
            for (int y = 0; y < 3; y++) {
                for (int x = 0; x < 3; x++) {
                    cells.add(new Cell(rx * 4 + 1 + x, ry * 4 + 1 + y));
                }
            }
            return cells;
        }

        Cell centre(int i) {
            return room(i).get(4);
        }
    }

    @Test
    void sixtyFourRoomsOneZoneEach() {
        check(8, 8, 11L);
    }

    @Test
    void twoHundredZones() {
        check(10, 20, 12L);
    }

    private static void check(int rows, int cols, long seed) {
        Random r = new Random(seed);
        Floor f = Floor.of(rows, cols, r);
        int rooms = rows * cols;
        int[] task = {rooms - 1, cols - 1, rooms / 2};
        int avoid = cols + 1;
        int dockRoom = rooms - cols;
        Cell dock = f.centre(dockRoom);
        String[] plan = f.plan().clone();
        plan[dock.y()] = plan[dock.y()].substring(0, dock.x()) + 'D' + plan[dock.y()].substring(dock.x() + 1);
        long least = leastEnergy(plan, f, task, avoid, dock);
        assertThat(least).as("the oracle finds a walk").isPositive();
        int capacity = (int) least + 40;
        for (int floor : new int[] {40, 41}) {
            MissionFixture mf = MissionFixture.grid(plan).capacity(capacity).startWh(capacity).reserveWh(floor)
                    .start(f.centre(0).x(), f.centre(0).y()).waitWh(1).chargeWh(0).budget(0);
            for (int i = 0; i < rooms; i++) {
                mf.zone("room-" + i, f.room(i));
            }
            mf.visit(true, "room-" + task[0], "room-" + task[1], "room-" + task[2]).avoid("room-" + avoid);
            Mission m = mf.build();
            assertThat(m.map().zones()).hasSize(rooms);
            boolean expected = capacity - least >= floor;
            for (Route route : List.of(new Route.Auto(PolicyChoice.SAFEST), Route.Product.of(PolicyChoice.SAFEST))) {
                Plan p = MissionPlanner.plan(m, PlanOptions.of(route));
                assertThat(p.guaranteed()).as(route + " floor " + floor).isEqualTo(expected);
                assertThat(p.highestFloorUnits().getAsInt()).as(route.toString()).isEqualTo(capacity - least);
                if (expected) {
                    assertThat(p.certification().ok()).as(route.toString()).isTrue();
                }
            }
        }
    }

    /** Least Wh (1 per tile cell entered, 2 per carpet cell) of start → task rooms in order → dock, never in the avoided room. */
    private static long leastEnergy(String[] plan, Floor f, int[] task, int avoid, Cell dock) {
        int w = plan[0].length();
        int stages = task.length + 1;
        List<Set<Cell>> taskCells = new ArrayList<>();
        for (int t : task) {
            taskCells.add(new HashSet<>(f.room(t)));
        }
        Set<Cell> avoided = new HashSet<>(f.room(avoid));
        SimpleDirectedWeightedGraph<Integer, DefaultWeightedEdge> g = new SimpleDirectedWeightedGraph<>(DefaultWeightedEdge.class);
        for (int y = 0; y < plan.length; y++) {
            for (int x = 0; x < w; x++) {
                for (int s = 0; s < stages; s++) {
                    g.addVertex((y * w + x) * stages + s);
                }
            }
        }
        int[][] d4 = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}};
        for (int y = 0; y < plan.length; y++) {
            for (int x = 0; x < w; x++) {
                if (plan[y].charAt(x) == '#' || avoided.contains(new Cell(x, y))) {
                    continue;
                }
                for (int[] d : d4) {
                    int nx = x + d[0];
                    int ny = y + d[1];
                    if (nx < 0 || ny < 0 || nx >= w || ny >= plan.length || plan[ny].charAt(nx) == '#') {
                        continue;
                    }
                    Cell n = new Cell(nx, ny);
                    if (avoided.contains(n)) {
                        continue;
                    }
                    int wh = plan[ny].charAt(nx) == 'c' ? 2 : 1;
                    for (int s = 0; s < stages; s++) {
                        int s2 = s < task.length && taskCells.get(s).contains(n) ? s + 1 : s;
                        g.setEdgeWeight(g.addEdge((y * w + x) * stages + s, (ny * w + nx) * stages + s2), wh);
                    }
                }
            }
        }
        Cell start = f.centre(0);
        double d = new DijkstraShortestPath<>(g).getPathWeight((start.y() * w + start.x()) * stages,
                (dock.y() * w + dock.x()) * stages + task.length);
        return Double.isInfinite(d) ? -1 : (long) d;
    }
}
