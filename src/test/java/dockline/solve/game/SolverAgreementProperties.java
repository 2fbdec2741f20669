package dockline.solve.game;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import dockline.solve.SolutionChecks;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The linear-time {@link AttractorSolver} and the naive {@link FixpointSweepSolver} must agree on
 * winning sets and ranks (the rank is the round of the least fixpoint in which a vertex joins,
 * Grädel, Thomas, Wilke (eds., 2002), LNCS 2500, ch. 2), on random game graphs and on product games
 * of random missions; every solution must pass {@link SolutionChecks}.
 */
class SolverAgreementProperties {

    static List<GameSolver.Factory> solvers() {
        return List.of(AttractorSolver::new, FixpointSweepSolver::new, CompactAttractorSolver::new);
    }

    /** A random game graph: random owners, 0..4 out-edges per vertex (parallel edges and self-loops allowed). */
    static GameGraph randomGraph(long seed) {
        Random r = new Random(seed);
        int n = 1 + r.nextInt(40);
        boolean[] robot = new boolean[n];
        boolean[] target = new boolean[n];
        int[] outStart = new int[n + 1];
        int[] edges = new int[n * 4];
        int m = 0;
        for (int v = 0; v < n; v++) {
            robot[v] = r.nextBoolean();
            target[v] = r.nextInt(8) == 0;
            int deg = r.nextInt(5);
            for (int i = 0; i < deg; i++) {
                edges[m++] = r.nextInt(n);
            }
            outStart[v + 1] = m;
        }
        return new GameGraph(robot, target, outStart, java.util.Arrays.copyOf(edges, m));
    }

    @Property(tries = 2000)
    void randomGraphs_attractorAndSweepAgree(@ForAll long seed) {
        GameGraph g = randomGraph(seed);
        Solution a = new AttractorSolver(g).solve();
        Solution b = new FixpointSweepSolver(g).solve();
        SolutionChecks.assertValidSolution(g, a);
        SolutionChecks.assertValidSolution(g, b);
        for (int v = 0; v < g.vertexCount(); v++) {
            assertThat(a.rank(v)).as("rank of %d", v).isEqualTo(b.rank(v));
        }
    }

    /**
     * The default solver of {@link ReserveOptions}, {@link CompactAttractorSolver}, against the
     * reference {@link AttractorSolver}: the same winning set and ranks, and a solution that passes
     * {@link SolutionChecks}, with the very chosen edges of the reference (so policies, worst cases
     * and replays do not depend on which solver ran).
     */
    @Property(tries = 2000)
    void randomGraphs_compactMatchesTheReference(@ForAll long seed) {
        GameGraph g = randomGraph(seed);
        Solution ref = new AttractorSolver(g).solve();
        Solution c = new CompactAttractorSolver(g).solve();
        SolutionChecks.assertValidSolution(g, c);
        for (int v = 0; v < g.vertexCount(); v++) {
            assertThat(c.rank(v)).as("rank of %d", v).isEqualTo(ref.rank(v));
            assertThat(c.strategyEdge(v)).as("chosen edge of %d", v).isEqualTo(ref.strategyEdge(v));
        }
    }

    @Property(tries = 300)
    void productGames_compactMatchesTheReference(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ProductGame game = ProductGame.fromStart(ArenaCompiler.compile(m), GoalAutomaton.of(m), monitor,
                ProductOptions.defaults());
        Solution ref = new AttractorSolver(game.graph()).solve();
        Solution c = new CompactAttractorSolver(game.graph()).solve();
        SolutionChecks.assertValidSolution(game, c, monitor);
        for (int v = 0; v < game.vertexCount(); v++) {
            assertThat(c.rank(v)).isEqualTo(ref.rank(v));
            assertThat(c.strategyEdge(v)).isEqualTo(ref.strategyEdge(v));
        }
        // two runs of the stored route that differ only in the solver (the implicit route runs none)
        ReserveAnalysis viaReference = ReserveSolver.analyse(m,
                ReserveOptions.defaults().withRoute(ReserveOptions.Route.stored(AttractorSolver::new)));
        ReserveAnalysis viaDefault = ReserveSolver.analyse(m, ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT));
        assertThat(viaReference.storedProduct()).isTrue();
        assertThat(viaDefault.storedProduct()).isTrue();
        assertThat(viaDefault.verdict()).isEqualTo(viaReference.verdict());
        assertThat(viaDefault.highestGuaranteedReserveUnits()).isEqualTo(viaReference.highestGuaranteedReserveUnits());
        assertThat(viaDefault.worstCaseMinimumUnits()).isEqualTo(viaReference.worstCaseMinimumUnits());
        assertThat(viaDefault.policy().map(Policy::entries)).isEqualTo(viaReference.policy().map(Policy::entries));
    }

    @Property(tries = 300)
    void productGames_attractorAndSweepAgree(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ProductGame game = ProductGame.fromStart(ArenaCompiler.compile(m), GoalAutomaton.of(m), monitor,
                ProductOptions.defaults());
        Solution a = new AttractorSolver(game.graph()).solve();
        Solution b = new FixpointSweepSolver(game.graph()).solve();
        SolutionChecks.assertValidSolution(game, a, monitor);
        SolutionChecks.assertValidSolution(game, b, monitor);
        for (int v = 0; v < game.vertexCount(); v++) {
            assertThat(a.rank(v)).isEqualTo(b.rank(v));
        }
        // the stored route solved by the naive sweep against the default route (implicit product, its own attractor)
        ReserveAnalysis viaSweep = ReserveSolver.analyse(m,
                ReserveOptions.defaults().withRoute(ReserveOptions.Route.stored(FixpointSweepSolver::new)));
        ReserveAnalysis viaAttractor = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(viaSweep.storedProduct()).isTrue();
        assertThat(viaAttractor.storedProduct()).isFalse();
        assertThat(viaSweep.verdict()).isEqualTo(viaAttractor.verdict());
        assertThat(viaSweep.highestGuaranteedReserveUnits()).isEqualTo(viaAttractor.highestGuaranteedReserveUnits());
    }

    /**
     * A small game worked by hand from the attractor's definition: target 0; robot vertex 1 → {0, 2};
     * disturbance 2 → {1, 3}; robot 3 → {3} only (a trap); disturbance 4 → {0, 1}; robot 5 → {4, 3}.
     * Round 1 adds 1 (an edge to 0); 4 needs both 0 and 1, so it joins in round 2, and 5 (an edge to
     * 4) in round 3; 2 can escape to the trap 3, so 2 and 3 lose.
     */
    @Example
    void handWorkedExample_ranks() {
        for (GameSolver.Factory factory : solvers()) {
            handWorkedExample_ranks(factory);
        }
    }

    private static void handWorkedExample_ranks(GameSolver.Factory factory) {
        boolean[] robot = {true, true, false, true, false, true};
        boolean[] target = {true, false, false, false, false, false};
        int[] outStart = {0, 1, 3, 5, 6, 8, 10};
        int[] edges = {0, 0, 2, 1, 3, 3, 0, 1, 4, 3};
        GameGraph g = new GameGraph(robot, target, outStart, edges);
        Solution s = factory.create(g, () -> false).solve();
        SolutionChecks.assertValidSolution(g, s);
        assertThat(new int[] {s.rank(0), s.rank(1), s.rank(2), s.rank(3), s.rank(4), s.rank(5)})
                .containsExactly(0, 1, Solution.LOSING, Solution.LOSING, 2, 3);
        assertThat(s.strategyEdge(1)).isEqualTo(1);
        assertThat(s.strategyEdge(5)).isEqualTo(8);
        assertThat(s.disturbanceEdge(g, 2)).isEqualTo(4);
    }

    @Example
    void disturbanceVertexWithoutMoves_isWonVacuously() {
        for (GameSolver.Factory factory : solvers()) {
            disturbanceVertexWithoutMoves_isWonVacuously(factory);
        }
    }

    private static void disturbanceVertexWithoutMoves_isWonVacuously(GameSolver.Factory factory) {
        GameGraph g = new GameGraph(new boolean[] {false, true}, new boolean[] {false, false}, new int[] {0, 0, 1},
                new int[] {0});
        Solution s = factory.create(g, () -> false).solve();
        assertThat(s.rank(0)).isEqualTo(1);
        assertThat(s.rank(1)).isEqualTo(2);
    }

    @Example
    void raisedCancellationFlag_stopsTheAttractor() {
        // a long chain of robot vertices into the target: more steps than one polling interval
        int n = 3 * AttractorSolver.POLL_INTERVAL;
        boolean[] robot = new boolean[n];
        boolean[] target = new boolean[n];
        java.util.Arrays.fill(robot, true);
        target[0] = true;
        int[] outStart = new int[n + 1];
        int[] edges = new int[n];
        for (int v = 0; v < n; v++) {
            edges[v] = Math.max(0, v - 1);
            outStart[v + 1] = v + 1;
        }
        GameGraph g = new GameGraph(robot, target, outStart, edges);
        AtomicInteger polls = new AtomicInteger();
        assertThatThrownBy(() -> new AttractorSolver(g, () -> polls.incrementAndGet() > 1).solve())
                .isInstanceOf(CancellationException.class);
        assertThat(polls.get()).isEqualTo(2);
        assertThat(new AttractorSolver(g, () -> false).solve().rank(n - 1)).isEqualTo(n - 1);
        assertThatThrownBy(() -> new FixpointSweepSolver(g, () -> true).solve()).isInstanceOf(CancellationException.class);
    }
}
