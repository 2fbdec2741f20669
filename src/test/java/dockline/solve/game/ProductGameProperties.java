package dockline.solve.game;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.MissionFixture;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.RandomMissions;
import dockline.solve.SizeEstimate;
import dockline.solve.SolutionChecks;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.util.concurrent.CancellationException;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/** The product game's construction: index kinds, the size estimate, the memory guard, the start. */
class ProductGameProperties {

    /** The stored CSR product route, whose game and solution these tests inspect. */
    private static final ReserveOptions STORED = ReserveOptions.defaults().withRoute(ReserveOptions.Route.PRODUCT);

    private static ReserveMonitor monitorOf(Mission m) {
        return new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
    }

    @Property(tries = 500)
    void denseAndHashIndex_buildTheSameGame(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        for (boolean everywhere : new boolean[] {false, true}) {
            ProductOptions o = ProductOptions.defaults();
            ProductGame d = everywhere ? ProductGame.everywhere(arena, goal, monitorOf(m), o.withIndex(ProductOptions.IndexKind.DENSE))
                    : ProductGame.fromStart(arena, goal, monitorOf(m), o.withIndex(ProductOptions.IndexKind.DENSE));
            ProductGame h = everywhere ? ProductGame.everywhere(arena, goal, monitorOf(m), o.withIndex(ProductOptions.IndexKind.HASH))
                    : ProductGame.fromStart(arena, goal, monitorOf(m), o.withIndex(ProductOptions.IndexKind.HASH));
            assertThat(d.denseIndex()).isTrue();
            assertThat(h.denseIndex()).isFalse();
            assertThat(d.vertexCount()).isEqualTo(h.vertexCount());
            assertThat(d.edgeCount()).isEqualTo(h.edgeCount());
            assertThat(d.start()).isEqualTo(h.start());
            for (int p = 0; p < d.vertexCount(); p++) {
                assertThat(d.arenaVertex(p)).isEqualTo(h.arenaVertex(p));
                assertThat(d.goalState(p)).isEqualTo(h.goalState(p));
                assertThat(d.monitorState(p)).isEqualTo(h.monitorState(p));
                assertThat(d.graph().outDegree(p)).isEqualTo(h.graph().outDegree(p));
                if (p > 1) {
                    assertThat(h.vertexOf(h.arenaVertex(p), h.goalState(p), h.monitorState(p))).isEqualTo(p);
                    assertThat(d.vertexOf(d.arenaVertex(p), d.goalState(p), d.monitorState(p))).isEqualTo(p);
                }
            }
            for (int e = 0; e < d.edgeCount(); e++) {
                assertThat(d.graph().target(e)).isEqualTo(h.graph().target(e));
            }
        }
    }

    @Property(tries = 500)
    void sizeEstimate_isAnUpperBound(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        for (boolean everywhere : new boolean[] {false, true}) {
            ProductGame g = everywhere ? ProductGame.everywhere(arena, goal, monitorOf(m), ProductOptions.defaults())
                    : ProductGame.fromStart(arena, goal, monitorOf(m), ProductOptions.defaults());
            assertThat(g.estimate().vertices()).as(RandomMissions.describe(m)).isGreaterThanOrEqualTo(g.vertexCount());
            assertThat(g.estimate().edges()).as(RandomMissions.describe(m)).isGreaterThanOrEqualTo(g.edgeCount());
        }
    }

    @Property(tries = 200)
    void productEdges_followTheArenaOneForOne(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Arena arena = ArenaCompiler.compile(m);
        ProductGame g = ProductGame.fromStart(arena, GoalAutomaton.of(m), monitorOf(m), ProductOptions.defaults());
        for (int p = 2; p < g.vertexCount(); p++) {
            int a = g.arenaVertex(p);
            assertThat(g.isRobot(p)).isEqualTo(arena.isRobot(a));
            assertThat(g.graph().outDegree(p)).isEqualTo(arena.outEnd(a) - arena.outBegin(a));
            for (int e = g.graph().outBegin(p); e < g.graph().outEnd(p); e++) {
                int t = g.graph().target(e);
                if (!g.isSink(t)) {
                    assertThat(g.arenaVertex(t)).isEqualTo(arena.target(g.arenaEdge(p, e)));
                }
            }
        }
    }

    @Example
    void overTheMemoryBudget_isRefusedBeforeBuilding() {
        Mission m = MissionFixture.grid("........", "........", "D.......").capacity(200).startWh(200).budget(2)
                .resolution("0.1").build();
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        SizeEstimate est = ProductGame.estimate(arena, goal, monitorOf(m), false);
        assertThatThrownBy(() -> ProductGame.fromStart(arena, goal, monitorOf(m),
                ProductOptions.defaults().withMemoryBudget(est.bytes() - 1)))
                .isInstanceOf(ProductTooLargeException.class)
                .hasMessageContaining("vertices")
                .hasMessageContaining("over the memory budget of")
                .satisfies(e -> assertThat(((ProductTooLargeException) e).advice())
                        .contains("coarser energy resolution").contains("budget K"));
        ProductGame g = ProductGame.fromStart(arena, goal, monitorOf(m), ProductOptions.defaults().withMemoryBudget(est.bytes()));
        assertThat(g.vertexCount()).isPositive();
    }

    @Example
    void analyse_propagatesTheRefusal() {
        Mission m = MissionFixture.grid("....", "D...").capacity(50).startWh(50).build();
        assertThatThrownBy(() -> ReserveSolver.analyse(m, ReserveOptions.defaults().withMemoryBudget(1000)))
                .isInstanceOf(ProductTooLargeException.class);
    }

    @Example
    void raisedCancellationFlag_stopsTheBuild() {
        Mission m = MissionFixture.grid("........", "........", "D.......").capacity(100).startWh(100).budget(2)
                .resolution("0.1").build();
        assertThatThrownBy(() -> ReserveSolver.analyse(m, ReserveOptions.defaults().withCancelled(() -> true)))
                .isInstanceOf(CancellationException.class);
    }

    @Example
    void startOnADockWithoutTasks_isWonAtOnce() {
        Mission m = MissionFixture.grid("D.").startWh(5).reserveWh(3).build();
        ReserveAnalysis a = ReserveSolver.analyse(m, STORED);
        assertThat(a.game().start()).isEqualTo(ProductGame.WIN);
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.worstCaseMinimumUnits()).hasValue(5);
        assertThat(a.highestGuaranteedReserveUnits()).hasValue(5);
        assertThat(a.policy().orElseThrow().size()).isZero();
    }

    @Example
    void startBelowTheFloor_isLostAtOnce() {
        Mission m = MissionFixture.grid(".D").startWh(2).reserveWh(3).build();
        ReserveAnalysis a = ReserveSolver.analyse(m, STORED);
        assertThat(a.game().start()).isEqualTo(ProductGame.LOSE);
        assertThat(a.guaranteed()).isFalse();
        // one tile step costs 1 Wh: from 2 Wh the robot docks at 1 Wh
        assertThat(a.highestGuaranteedReserveUnits()).hasValue(1);
    }

    @Example
    void startInAnAvoidedZone_isLostAtOnce() {
        Mission m = MissionFixture.grid(".D").zone("wet", new Cell(0, 0)).avoid("wet").build();
        assertThat(ReserveSolver.analyse(m, STORED).game().start()).isEqualTo(ProductGame.LOSE);
    }

    /**
     * A hand-checked corridor: start at the left end with 10 Wh, dock at the right end four tile
     * steps away (1 Wh each), a door in the middle that may shut once (the robot stays and pays a
     * 1 Wh wait, then passes). Worst case: 10 − 1 (door shut) − 4 = 5 Wh; so floor 5 is guaranteed,
     * floor 6 is not.
     */
    @Example
    void corridorWithOneShutDoor_handChecked() {
        Mission m = MissionFixture.grid("..d.D").startWh(10).reserveWh(5)
                .event(dockline.model.EventKind.DOOR_SHUT, 0, new Cell(2, 0)).budget(1).build();
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.worstCaseMinimumUnits()).hasValue(5);
        assertThat(a.highestGuaranteedReserveUnits()).hasValue(5);
        ReserveAnalysis six = ReserveSolver.analyse(m.withReserve(dockline.model.Charge.wh(java.math.BigDecimal.valueOf(6))),
                STORED);
        assertThat(six.guaranteed()).isFalse();
        SolutionChecks.assertValidSolution(six.game(), six.solution(), new ReserveMonitor(6, 12, 10));
    }

    @Example
    void everywhereBuild_usesTheDirectIndexForTheReserveMonitor() {
        // every (vertex, level) pair but the dock's is a triple, so the direct index is barely larger than the game
        Mission m = MissionFixture.grid("...", "..D").build();
        ProductGame g = ProductGame.everywhere(ArenaCompiler.compile(m), GoalAutomaton.of(m), monitorOf(m),
                ProductOptions.defaults());
        assertThat(g.denseIndex()).isTrue();
        assertThat(g.vertexCount()).isEqualTo(g.estimate().vertices());
    }

    @Example
    void anyMonitor_buildsThroughTheHashIndex() {
        // a monitor that counts outcomes up to 3 and accepts at completion only in state 2 or 3
        Monitor counter = new Monitor() {
            public int initialState() {
                return 0;
            }

            public int step(int s, int w) {
                return Math.min(3, s + 1);
            }

            public boolean acceptsAtCompletion(int s) {
                return s >= 2;
            }

            public long stateBound() {
                return 4;
            }

            public String describe(int s) {
                return s + " steps";
            }
        };
        // from 0:0 the dock 1:0 is one step away, but completion needs two outcomes: the robot waits once first
        Mission m = MissionFixture.grid(".D").build();
        ProductGame g = ProductGame.fromStart(ArenaCompiler.compile(m), GoalAutomaton.of(m), counter,
                ProductOptions.defaults());
        assertThat(g.denseIndex()).isFalse();
        Solution s = new AttractorSolver(g.graph()).solve();
        SolutionChecks.assertValidSolution(g.graph(), s);
        assertThat(s.winning(g.start())).isTrue();
        // robot → wait → (0:0, 1 step) → move → WIN: two rounds of each player
        assertThat(s.rank(g.start())).isEqualTo(4);
    }
}
