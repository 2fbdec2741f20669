package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.solve.ProductOptions;
import dockline.solve.charging.NeedBounds;
import java.util.OptionalInt;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The heat bounds of the pictures' phase-by-phase route ({@code Route.Charging} with heat bounds, on a mission
 * with lasting closures: {@link NeedBounds} on the kept closure phases) on random tiny maps with lasting and
 * momentary doors and blockages, at-most limits, slips, drags and budgets 0-3 ({@link LastingMissions}), against
 * two oracles:
 * <ul>
 *   <li>the exact heat map of the whole arena ({@link ChargeNeeded}: the product game over every closure phase
 *       and every battery level, solved by the implicit attractor, which shares no code with the charging passes
 *       it checks): at every position (free cell, disturbances left, tasks done) the lower bound is at most the
 *       exact need and the upper bound at least it, and a position the bounds call exact has exactly that need;</li>
 *   <li>{@link LastingBruteForce}, the separately written explicit-state oracle (own move generation, closure sets
 *       in its states; no arena compiler, goal automaton or solver), with the start moved to each free cell and
 *       the least start it guarantees found by bisection over the start (winning is upward closed in it; the
 *       bisection of {@code LastingChargingPlanProperties}): the
 *       same bracket at the full budget with no task done.</li>
 * </ul>
 * "No level will do" counts as above every level, and "no level is known to be enough" as an upper bound of
 * infinity.
 */
class HeatBoundsProperties {

    private static final long NONE = Long.MAX_VALUE; // no level will do (exact), or no upper bound known

    @Property(tries = 400)
    void heatBounds_bracketTheWholeArenasExactNeed_andTheBruteForce(@ForAll long seed) {
        Mission m = LastingMissions.fromSeed(seed, true);
        String why = LastingMissions.describe(m);
        Plan p = MissionPlanner.plan(m, PlanOptions.of(new Route.Charging(true, false, true, true)));
        boolean bounded = p.heatBounds().isPresent();
        Statistics.label("heat bounds given (the charging route applies)").collect(bounded);
        Statistics.label("heat bounds given (the charging route applies)").coverage(c -> c.check(true)
                .percentage(q -> q >= 80));
        if (!bounded) {
            return;
        }
        NeedBounds b = p.heatBounds().get();
        ChargeNeeded exact = ChargeNeeded.computeImplicitly(ArenaCompiler.compile(m), GoalAutomaton.of(m),
                new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()), ProductOptions.defaults());
        int masks = 1 << GoalAutomaton.of(m).taskCount();
        int k = m.map().disturbances().budget();
        int w = m.map().width();
        int apart = 0;
        int exactMarked = 0;
        for (int cell = 0; cell < m.map().cellCount(); cell++) {
            if (!m.map().isFree(Cell.ofIndex(cell, w))) {
                continue;
            }
            for (int left = 0; left <= k; left++) {
                for (int mask = 0; mask < masks; mask++) {
                    int e;
                    try {
                        e = exact.unitsNeeded(cell, left, mask);
                    } catch (IllegalArgumentException notAState) {
                        continue; // a mask that is no state of ordered tasks
                    }
                    long ex = e == ChargeNeeded.IMPOSSIBLE ? NONE : e;
                    long lo = low(b, cell, left, mask);
                    long hi = high(b, cell, left, mask);
                    String at = "cell " + Cell.ofIndex(cell, w) + ", " + left + " left, tasks " + mask;
                    assertThat(lo).as("lower bound at %s\n%s", at, why).isLessThanOrEqualTo(ex);
                    assertThat(hi).as("upper bound at %s\n%s", at, why).isGreaterThanOrEqualTo(ex);
                    if (b.exact(cell, left, mask)) {
                        exactMarked++;
                        assertThat(hi).as("marked exact at %s\n%s", at, why).isEqualTo(ex);
                    } else {
                        apart++;
                    }
                }
            }
        }
        // the brute force with the start on each free cell, the full budget, no task done
        int bruteChecked = 0;
        for (int cell = 0; cell < m.map().cellCount(); cell++) {
            Cell c = Cell.ofIndex(cell, w);
            if (!m.map().isFree(c)) {
                continue;
            }
            long least = leastStart(m, c);
            String at = "start moved to " + c;
            assertThat(low(b, cell, k, 0)).as("lower bound against the brute force, %s\n%s", at, why)
                    .isLessThanOrEqualTo(least);
            assertThat(high(b, cell, k, 0)).as("upper bound against the brute force, %s\n%s", at, why)
                    .isGreaterThanOrEqualTo(least);
            bruteChecked++;
        }
        assertThat(bruteChecked).as("free cells checked against the brute force").isPositive();
        Statistics.label("some phase left out").collect(b.restricted());
        Statistics.label("some position known only as a range").collect(apart > 0);
        Statistics.label("some position marked exact").collect(exactMarked > 0);
        Statistics.label("some phase left out").coverage(c -> c.check(true).percentage(q -> q >= 10));
        Statistics.label("some position known only as a range").coverage(c -> c.check(true).percentage(q -> q >= 3));
        Statistics.label("some position marked exact").coverage(c -> c.check(true).percentage(q -> q >= 50));
    }

    private static long low(NeedBounds b, int cell, int left, int mask) {
        int u = b.atLeastUnits(cell, left, mask);
        return u == NeedBounds.IMPOSSIBLE ? NONE : u;
    }

    private static long high(NeedBounds b, int cell, int left, int mask) {
        int u = b.atMostUnits(cell, left, mask);
        return u == NeedBounds.IMPOSSIBLE || u == NeedBounds.UNBOUNDED ? NONE : u;
    }

    /** The least start on cell {@code c} that the brute force guarantees, or {@link #NONE}. */
    private static long leastStart(Mission m, Cell c) {
        Mission moved = new Mission(m.name(), m.source(), m.map(), m.robot(), c, m.startCharge(), m.reserve(),
                m.tasks(), m.objective());
        OptionalInt least = LastingChargingPlanProperties.lowestStart(moved);
        return least.isPresent() ? least.getAsInt() : NONE;
    }
}
