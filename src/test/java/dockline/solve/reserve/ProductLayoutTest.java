package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.TinyMissions;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.fixtures.BruteForce;
import dockline.solve.ProductOptions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.CompactAttractorSolver;
import dockline.solve.game.GameGraph;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The two leaner layouts of the reserve product game against the landed main route
 * ({@link ProductGame} + {@link AttractorSolver}) and against the brute-force reserve game, on
 * random small missions with and without charging.
 */
class ProductLayoutTest {

    private static ReserveMonitor monitor(Mission m) {
        return new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
    }

    /** Same winning set and ranks as AttractorSolver; every chosen edge lowers the rank. */
    @Property(tries = 300)
    void compactAttractor_matchesAttractorSolver(@ForAll long seed, @ForAll boolean charging, @ForAll boolean everywhere) {
        Mission m = TinyMissions.random(seed, charging);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ProductGame game = everywhere ? ProductGame.everywhere(arena, goal, monitor(m), ProductOptions.defaults())
                : ProductGame.fromStart(arena, goal, monitor(m), ProductOptions.defaults());
        GameGraph g = game.graph();
        Solution ref = new AttractorSolver(g).solve();
        Solution compact = new CompactAttractorSolver(g).solve();
        for (int v = 0; v < g.vertexCount(); v++) {
            assertThat(compact.rank(v)).as("rank of %d", v).isEqualTo(ref.rank(v));
            int e = compact.strategyEdge(v);
            if (g.isRobot(v) && compact.rank(v) > 0) {
                assertThat(e).isBetween(g.outBegin(v), g.outEnd(v) - 1);
                assertThat(compact.rank(g.target(e))).isEqualTo(compact.rank(v) - 1);
            } else {
                assertThat(e).isEqualTo(Solution.NONE);
            }
        }
        // stopping at the start decides the start the same way
        CompactAttractorSolver early = new CompactAttractorSolver(g, () -> false, game.start());
        assertThat(early.solve().winning(game.start())).isEqualTo(ref.winning(game.start()));
        assertThat(early.wonCount()).isLessThanOrEqualTo(ref.winningCount());
    }

    /**
     * The implicit product is the same game: its breadth-first search reaches exactly the triples
     * ProductGame builds, each triple is won in one iff in the other, and the start verdict agrees
     * with ProductGame and with the brute-force reserve game.
     */
    @Property(tries = 300)
    void implicitProduct_isTheSameGameAsProductGame(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ReserveMonitor mon = monitor(m);
        ProductGame game = ProductGame.fromStart(arena, goal, mon, ProductOptions.defaults());
        Solution ref = new AttractorSolver(game.graph()).solve();
        ImplicitReserveGame imp = new ImplicitReserveGame(arena, goal, mon);
        boolean expected = ref.winning(game.start());
        assertThat(imp.solve(false).startWon()).isEqualTo(expected);
        assertThat(imp.solve(true).startWon()).isEqualTo(expected);
        assertThat(new BruteForce(m, m.reserveUnits()).guaranteed()).isEqualTo(expected);
        if (!game.isSink(game.start())) {
            assertThat(imp.bfs().wonVertices()).isEqualTo(game.vertexCount() - 2L);
            boolean[] won = imp.wonFlags();
            for (int p = 2; p < game.vertexCount(); p++) {
                int id = Math.toIntExact(imp.id(game.arenaVertex(p), game.goalState(p), game.monitorState(p)));
                assertThat(won[id]).as("triple %s", game.describe(p)).isEqualTo(ref.winning(p));
            }
        }
    }
}
