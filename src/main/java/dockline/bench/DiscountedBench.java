package dockline.bench;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Terrain;
import dockline.solve.discounted.DiscountedValueIteration;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Benchmark rows for the discounted objective: on the same generated instances, the comparator
 * route ({@link ImplicitDiscountedGame}: product with the comparator, generated on demand, one
 * linear-time attractor; {@link DiscountedThresholdGame} on arenas it does not apply to)
 * against the optimisation route ({@link DiscountedValueIteration#decide}: value iteration, then
 * compare), both without the dock goal so that they answer the same question. Not a test: callers
 * (the {@code bench} command) print the rows and the ratios measured in one run.
 *
 * <p>Instances ({@link #instance}) are square floors of invented data: tile and carpet, about one
 * cell in ten a wall, docks in two opposite corners, the start beside one of them, doors that may
 * shut along a middle row and a disturbance budget of 1; generated from a fixed seed per size, so
 * every run measures the same arenas.
 *
 * <p>No algorithm of its own: a timing harness, one run of each route per instance (the routes'
 * class comments name their algorithms and sources).
 */
final class DiscountedBench {

    private DiscountedBench() {
    }

    /**
     * One instance measured both ways.
     *
     * @param size                 side of the square floor in cells
     * @param threshold            the threshold v of {@code DS relation v}
     * @param arenaVertices        vertices of the arena
     * @param arenaEdges           edges of the arena
     * @param productVertices      vertices of the comparator product
     * @param productEdges         edges of the comparator product
     * @param comparatorStates     comparator states discovered
     * @param comparatorNanos      time to build and solve the comparator product
     * @param valueIterationNanos  time for value iteration to decide
     * @param sweeps               value-iteration rounds used
     * @param comparatorAnswer     the comparator route's answer
     * @param valueIterationAnswer the optimisation route's answer
     */
    public record Row(int size, Rational threshold, int arenaVertices, int arenaEdges, int productVertices, int productEdges,
                      int comparatorStates, long comparatorNanos, long valueIterationNanos, int sweeps,
                      boolean comparatorAnswer, boolean valueIterationAnswer) {

        public boolean sameAnswer() {
            return comparatorAnswer == valueIterationAnswer;
        }
    }

    /**
     * The default series: discount 2, relation {@code >=}, and as threshold each instance's exact
     * optimal value (found by an untimed value-iteration solve first), the hardest threshold for
     * both routes: value iteration must pin the value exactly, and the comparator product must
     * explore every play that stays within reach of it. Every answer is "yes".
     *
     * @throws ArithmeticException if an instance's value needs more than 64-bit rationals
     */
    public static List<Row> run(int... sizes) {
        return run(sizes, 2, null, Relation.AT_LEAST);
    }

    /**
     * Measures each size once, after one untimed warm-up run on the smallest size.
     *
     * @param threshold the threshold for every instance, or {@code null} for each instance's exact optimal value
     * @throws ArithmeticException if value iteration cannot pin a value with 64-bit rationals
     */
    public static List<Row> run(int[] sizes, int discount, Rational threshold, Relation relation) {
        if (sizes.length > 0) {
            measure(sizes[0], discount, threshold, relation);
        }
        List<Row> rows = new ArrayList<>();
        for (int s : sizes) {
            rows.add(measure(s, discount, threshold, relation));
        }
        return rows;
    }

    static Row measure(int size, int discount, Rational fixedThreshold, Relation relation) {
        Arena arena = ArenaCompiler.compile(instance(size, 0x5eedL + size));
        Rational threshold = fixedThreshold != null ? fixedThreshold
                : new DiscountedValueIteration(arena, discount).solve().exactValue();
        long t0 = System.nanoTime();
        dockline.monitor.DiscountedComparator comparator =
                new dockline.monitor.DiscountedComparator(discount, arena.maxAbsWeight(), threshold, relation);
        boolean byComparator;
        int productVertices;
        int productEdges;
        if (ImplicitDiscountedGame.applicable(arena)) {
            ImplicitDiscountedGame game = ImplicitDiscountedGame.solve(arena, comparator);
            byComparator = game.robotWins();
            productVertices = game.vertexCount();
            productEdges = game.edgeCount();
        } else {
            DiscountedThresholdGame game = DiscountedThresholdGame.build(arena, comparator);
            byComparator = game.robotWins();
            productVertices = game.vertexCount();
            productEdges = game.edgeCount();
        }
        long t1 = System.nanoTime();
        DiscountedValueIteration.Result vi = new DiscountedValueIteration(arena, discount).decide(threshold, relation);
        long t2 = System.nanoTime();
        return new Row(size, threshold, arena.vertexCount(), arena.edgeCount(), productVertices, productEdges,
                comparator.stateCount(), t1 - t0, t2 - t1, vi.sweeps(), byComparator, vi.holds());
    }

    /** A generated square floor of {@code size x size} cells (size at least 2), deterministic in the seed. */
    public static Mission instance(int size, long seed) {
        if (size < 2) {
            throw new IllegalArgumentException("size must be at least 2");
        }
        Random rnd = new Random(seed);
        Map<Character, Terrain> legend = Map.of(
                '#', Terrain.wall('#'),
                '.', new Terrain('.', "tile", false, false),
                ',', new Terrain(',', "carpet", false, false),
                'D', new Terrain('D', "tile", false, true),
                'C', new Terrain('C', "tile", true, false));
        List<String> rows = new ArrayList<>();
        List<Cell> doors = new ArrayList<>();
        int mid = size / 2;
        for (int y = 0; y < size; y++) {
            StringBuilder sb = new StringBuilder();
            for (int x = 0; x < size; x++) {
                char c;
                if ((x == 0 && y == 0) || (x == size - 1 && y == size - 1)) {
                    c = 'C';
                } else if (y == mid && x % 3 == 1) {
                    c = 'D';
                    doors.add(new Cell(x, y));
                } else {
                    int r = rnd.nextInt(10);
                    c = r == 0 && y != mid ? '#' : r < 4 ? ',' : '.';
                }
                sb.append(c);
            }
            rows.add(sb.toString());
        }
        BuildingMap map = new BuildingMap("bench " + size, null, BigDecimal.ONE, rows, legend, List.of(), Map.of(),
                new DisturbanceModel(1, List.of(new EventRule(EventKind.DOOR_SHUT, "corridor doors", doors, null))));
        RobotProfile robot = new RobotProfile(BigDecimal.valueOf(500), new BigDecimal("0.5"),
                Map.of("tile", BigDecimal.ONE, "carpet", new BigDecimal("1.5")), new BigDecimal("0.5"),
                BigDecimal.ONE, Neighbourhood.FOUR);
        // start beside the corner dock, so optimal values keep small denominators
        Cell start = new Cell(1, 0);
        if (rows.get(0).charAt(1) == '#') {
            rows.set(0, "C." + rows.get(0).substring(2));
            map = new BuildingMap(map.name(), null, map.cellSizeMetres(), rows, legend, List.of(), Map.of(),
                    map.disturbances());
        }
        return new Mission("bench " + size, null, map, robot, start, Charge.percent(BigDecimal.valueOf(80)),
                Charge.percent(BigDecimal.valueOf(20)), Tasks.justDock(),
                new Objective.Discounted(2, Rational.of(3, 4), Relation.AT_LEAST));
    }
}
