package dockline.solve.fast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.BuildingGenerator;
import dockline.bench.MissionGenerator;
import dockline.bench.MissionSpec;
import dockline.bench.TinyMissions;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.fixtures.BruteForce;
import dockline.solve.ProductOptions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.reserve.ChargeNeeded;
import java.math.BigDecimal;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.jgrapht.Graph;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.DirectedWeightedPseudograph;

class MinChargeSolverTest {

    /**
     * Per robot vertex, goal state and level, the fast path's need agrees with the brute-force
     * solution of the explicit reserve game: the robot wins at level l iff l − floor ≥ need.
     */
    @Property(tries = 300)
    void need_matchesBruteForceGame_atEveryLevel(@ForAll long seed) {
        Mission m = TinyMissions.random(seed, false);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        MinChargeSolver fast = new MinChargeSolver(arena, goal);
        MinChargeSolver.Values all = fast.solveAll();
        BruteForce brute = new BruteForce(m, m.reserveUnits());
        for (int v = 0; v < arena.robotCount(); v++) {
            for (int g = 0; g < goal.stateCount(); g++) {
                int need = all.need(v, g);
                for (int l = brute.floor(); l <= brute.cap(); l++) {
                    boolean fastWins = need != MinChargeSolver.INFINITE && need <= l - brute.floor();
                    assertThat(fastWins).as("vertex %d goal %d level %d need %d", v, g, l, need)
                            .isEqualTo(brute.wins(arena.cellOf(v), arena.budgetLeft(v), goal.progressMask(g), l));
                }
            }
        }
        assertThat(fast.decide().guaranteed()).isEqualTo(brute.guaranteed());
        assertThat(all.result().guaranteed()).isEqualTo(brute.guaranteed());
    }

    /** Early exit never changes the verdict, and the start need agrees whenever decided within budget. */
    @Property(tries = 300)
    void decide_agreesWithFullSolve(@ForAll long seed) {
        Mission m = TinyMissions.random(seed, false);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        MinChargeSolver fast = new MinChargeSolver(arena, goal);
        MinChargeSolver.Result early = fast.decide();
        MinChargeSolver.Result full = fast.solveAll().result();
        assertThat(early.guaranteed()).isEqualTo(full.guaranteed());
        if (early.guaranteed()) {
            assertThat(early.startNeed()).isEqualTo(full.startNeed());
        }
        assertThat(early.explored()).isLessThanOrEqualTo(full.explored());
    }

    /**
     * Without disturbances (budget 0) each disturbance vertex has one outcome, so the need is the
     * shortest energy path to completion in arena × goal: checked against jgrapht's
     * DijkstraShortestPath (Dijkstra, 1959, "A note on two problems in connexion with graphs").
     */
    @Property(tries = 200)
    void budgetZero_needIsTheShortestPath_jgraphtDijkstra(@ForAll long seed) {
        Mission m = TinyMissions.random(seed, false).withBudget(0);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int gc = goal.stateCount();
        Graph<Integer, DefaultWeightedEdge> g = new DirectedWeightedPseudograph<>(DefaultWeightedEdge.class);
        int sink = arena.vertexCount() * gc; // the completion vertex
        g.addVertex(sink);
        for (int p = 0; p < arena.vertexCount() * gc; p++) {
            g.addVertex(p);
        }
        // reversed edges, so one single-source search from the completion vertex gives every distance
        for (int v = 0; v < arena.vertexCount(); v++) {
            for (int q = 0; q < gc; q++) {
                int p = v * gc + q;
                if (arena.isRobot(v)) {
                    if (goal.accepting(q, arena.isDock(arena.cell(v)))) {
                        g.setEdgeWeight(g.addEdge(sink, p), 0);
                        continue;
                    }
                    for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                        g.setEdgeWeight(g.addEdge(arena.target(e) * gc + q, p), 0);
                    }
                } else {
                    for (int e = arena.outBegin(v); e < arena.outEnd(v); e++) {
                        int r = arena.target(e);
                        int q2 = goal.step(q, arena.cellZones(arena.cell(r)));
                        if (q2 != GoalAutomaton.REJECT) {
                            g.setEdgeWeight(g.addEdge(r * gc + q2, p), -arena.weight(e));
                        }
                    }
                }
            }
        }
        var paths = new DijkstraShortestPath<>(g).getPaths(sink);
        MinChargeSolver.Values all = new MinChargeSolver(arena, goal).solveAll();
        for (int v = 0; v < arena.robotCount(); v++) {
            for (int q = 0; q < gc; q++) {
                double d = paths.getWeight(v * gc + q);
                int need = all.need(v, q);
                if (Double.isInfinite(d)) {
                    assertThat(need).isEqualTo(MinChargeSolver.INFINITE);
                } else {
                    assertThat(need).isEqualTo((int) d);
                }
            }
        }
    }

    /**
     * Against the landed main route: the verdict of ProductGame + AttractorSolver, and per position
     * the heat map of ChargeNeeded (one solve of the product over all levels): the least level is
     * floor + need when that is within the capacity, impossible otherwise.
     */
    @Property(tries = 200)
    void agreesWithTheProductRoute_verdictAndHeatMap(@ForAll long seed) {
        Mission m = TinyMissions.random(seed, false);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ProductGame game = ProductGame.fromStart(arena, goal, monitor, ProductOptions.defaults());
        boolean product = new AttractorSolver(game.graph()).solve().winning(game.start());
        MinChargeSolver fast = new MinChargeSolver(arena, goal);
        assertThat(fast.decide().guaranteed()).isEqualTo(product);
        MinChargeSolver.Values values = fast.solveAll();
        ChargeNeeded heat = ChargeNeeded.compute(arena, goal, monitor, ProductOptions.defaults(), AttractorSolver::new);
        int floor = m.reserveUnits();
        int cap = m.capacityUnits();
        for (int v = 0; v < arena.robotCount(); v++) {
            int cell = arena.cell(v);
            for (int g = 0; g < goal.stateCount(); g++) {
                int mask = goal.progressMask(g);
                int gn = goal.step(g, arena.cellZones(cell));
                int need = gn == GoalAutomaton.REJECT ? MinChargeSolver.INFINITE : values.need(v, gn);
                int expected = need != MinChargeSolver.INFINITE && floor + (long) need <= cap ? floor + need
                        : ChargeNeeded.IMPOSSIBLE;
                assertThat(heat.unitsNeeded(cell, arena.budgetLeft(v), mask))
                        .as("cell %d budget %d progress %d", cell, arena.budgetLeft(v), mask).isEqualTo(expected);
            }
        }
    }

    @Property(tries = 100)
    void charging_beforeCompletion_isRefused_orProvablyIrrelevant(@ForAll long seed) {
        Mission m = TinyMissions.random(seed, true);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        if (MinChargeSolver.applicable(arena, goal)) {
            assertThat(new MinChargeSolver(arena, goal).decide().guaranteed())
                    .isEqualTo(new BruteForce(m, m.reserveUnits()).guaranteed());
        } else {
            assertThatThrownBy(() -> new MinChargeSolver(arena, goal)).isInstanceOf(IllegalArgumentException.class);
        }
    }

    /**
     * A hand-checked corridor: a 1 × 4 strip {@code k . . .} on tile at 1 unit a cell, no
     * disturbances, task zone on the far cell, finish on the dock: out 3 cells and back 3 = 6 units.
     */
    @Example
    void straightCorridor_outAndBack_needsSixUnits() {
        Mission m = TinyMissions.strip();
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        MinChargeSolver.Result r = new MinChargeSolver(arena, goal).decide();
        assertThat(r.startNeed()).isEqualTo(6);
        assertThat(r.guaranteed()).isTrue();
        Mission tight = m.withStartCharge(dockline.model.Charge.wh(new BigDecimal("0.5")));
        assertThat(new MinChargeSolver(ArenaCompiler.compile(tight), goal).decide().guaranteed()).isFalse();
    }

    @Example
    void generatedFloor_earlyExit_exploresLessThanTheWholeProduct() {
        Mission m = MissionGenerator.generate(BuildingGenerator.generate(128, 3, 2), MissionSpec.consumptionOnly(2), 3);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        MinChargeSolver s = new MinChargeSolver(arena, goal);
        MinChargeSolver.Result early = s.decide();
        MinChargeSolver.Result full = s.solveAll().result();
        assertThat(early.guaranteed()).isEqualTo(full.guaranteed());
        assertThat(early.explored()).isLessThan(full.explored());
    }
}
