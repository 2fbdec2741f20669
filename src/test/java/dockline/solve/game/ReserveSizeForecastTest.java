package dockline.solve.game;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.BuildingGenerator;
import dockline.bench.MissionGenerator;
import dockline.bench.MissionSpec;
import dockline.bench.TinyMissions;
import dockline.goal.GoalAutomaton;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import java.math.BigDecimal;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/** The size forecast against the product actually built (issue 7: within 20% before the build). */
class ReserveSizeForecastTest {

    private static ReserveMonitor monitor(Mission m) {
        return new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
    }

    /** An upper bound always, exact when waiting costs one unit (the robot can shed one unit at a time). */
    @Property(tries = 300)
    void forecast_boundsTheBuiltProduct_exactWhenWaitingCostsOneUnit(@ForAll long seed, @ForAll boolean charging) {
        Mission m = TinyMissions.random(seed, charging);
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ProductGame game = ProductGame.fromStart(arena, goal, monitor(m), ProductOptions.defaults());
        ReserveSizeForecast.Forecast f = ReserveSizeForecast.of(arena, goal, monitor(m));
        assertThat(f.vertices()).isGreaterThanOrEqualTo(game.vertexCount());
        assertThat(f.edges()).isGreaterThanOrEqualTo(game.edgeCount());
        if (m.scale().consumption(m.robot().waitWh()) == 1) {
            assertThat(f.vertices()).isEqualTo(game.vertexCount());
            assertThat(f.edges()).isEqualTo(game.edgeCount());
        }
    }

    /** Within 20% on the generated buildings, with and without charging (exact, in fact: waiting costs 1 unit). */
    @Example
    void generatedBuildings_forecastWithinTwentyPercent() {
        for (int side : new int[] {32, 48, 64}) {
            for (MissionSpec spec : new MissionSpec[] {MissionSpec.docking(2),
                MissionSpec.consumptionOnly(2).withBattery(new BigDecimal("8"), new BigDecimal("0.1"),
                        Charge.percent(new BigDecimal("100")), Charge.percent(new BigDecimal("20")))}) {
                Mission m = MissionGenerator.generate(BuildingGenerator.generate(side, 5, 2), spec, 5);
                Arena arena = ArenaCompiler.compile(m);
                GoalAutomaton goal = GoalAutomaton.of(m);
                long real = ProductGame.fromStart(arena, goal, monitor(m), ProductOptions.defaults()).vertexCount();
                long forecast = ReserveSizeForecast.of(arena, goal, monitor(m)).vertices();
                assertThat((double) forecast).as("%dx%d", side, side).isBetween(0.8 * real, 1.2 * real);
            }
        }
    }
}
