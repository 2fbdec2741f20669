package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.solve.BruteForceMinimax;
import dockline.solve.ProductOptions;
import dockline.solve.RandomMissions;
import dockline.solve.game.AttractorSolver;
import java.math.BigDecimal;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The heat map against the brute-force minimax of {@link BruteForceMinimax} (independent oracle):
 * for every free cell c and budget k, the value at (c, k, no task done) must be the least starting
 * charge from which the mission started at c with budget k is guaranteed. (From a robot vertex with
 * budget k only budgets up to k are reachable, so that sub-game is the game with budget k.)
 */
class ChargeNeededProperties {

    @Property(tries = 200)
    void unitsNeeded_isTheLeastGuaranteedStartingCharge(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withChargeNeeded(true)
                .withHighestReserve(false));
        ChargeNeeded heat = a.chargeNeeded().orElseThrow();
        int floor = m.reserveUnits();
        for (int y = 0; y < m.map().height(); y++) {
            for (int x = 0; x < m.map().width(); x++) {
                Cell c = new Cell(x, y);
                for (int k = 0; k <= m.map().disturbances().budget(); k++) {
                    int got = heat.unitsNeeded(c, k, 0);
                    if (!m.map().isFree(c)) {
                        assertThat(got).isEqualTo(ChargeNeeded.IMPOSSIBLE);
                        continue;
                    }
                    Mission from = new Mission(m.name(), null, m.map().withBudget(k), m.robot(), c, m.startCharge(),
                            m.reserve(), m.tasks(), m.objective());
                    int least = ChargeNeeded.IMPOSSIBLE;
                    for (int u = floor; u <= m.capacityUnits() && least < 0; u++) {
                        if (new BruteForceMinimax(from.withStartCharge(Charge.wh(BigDecimal.valueOf(u)))).wins(floor)) {
                            least = u;
                        }
                    }
                    assertThat(got).as("cell %s budget %d\n%s", c, k, RandomMissions.describe(m)).isEqualTo(least);
                }
            }
        }
        assertThat(heat.maxUnitsNeeded()).isBetween(floor, m.capacityUnits());
    }

    @Property(tries = 200)
    void heatMapAtTheStart_agreesWithTheVerdict(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withChargeNeeded(true)
                .withHighestReserve(false));
        int need = a.chargeNeeded().orElseThrow().unitsNeeded(m.start(), m.map().disturbances().budget(), 0);
        boolean startOk = m.startUnits() >= m.reserveUnits();
        assertThat(a.guaranteed()).as(RandomMissions.describe(m))
                .isEqualTo(startOk && need != ChargeNeeded.IMPOSSIBLE && m.startUnits() >= need);
    }

    /** The implicit table (the default) and the stored product's agree at every position and progress. */
    @Property(tries = 300)
    void implicitTable_equalsTheStoredProductsTable(@ForAll long seed, @ForAll boolean charging) {
        Mission m = dockline.bench.TinyMissions.random(seed, charging);
        dockline.arena.Arena arena = dockline.arena.ArenaCompiler.compile(m);
        dockline.goal.GoalAutomaton goal = dockline.goal.GoalAutomaton.of(m);
        dockline.monitor.ReserveMonitor monitor = new dockline.monitor.ReserveMonitor(m.reserveUnits(),
                m.capacityUnits(), m.startUnits());
        ChargeNeeded stored = ChargeNeeded.compute(arena, goal, monitor, ProductOptions.defaults(), AttractorSolver::new);
        ChargeNeeded implicit = ChargeNeeded.computeImplicitly(arena, goal, monitor, ProductOptions.defaults());
        int masks = 1 << m.tasks().visit().size();
        for (int c = 0; c < arena.width() * arena.height(); c++) {
            for (int k = 0; k <= arena.budget(); k++) {
                for (int mask = 0; mask < masks; mask++) {
                    if (goal.stateOfMask(mask) == dockline.goal.GoalAutomaton.REJECT) {
                        continue;
                    }
                    assertThat(implicit.unitsNeeded(c, k, mask)).as("cell %d budget %d mask %d", c, k, mask)
                            .isEqualTo(stored.unitsNeeded(c, k, mask));
                }
            }
        }
    }
}
