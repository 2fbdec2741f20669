package dockline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.solve.BruteForceMinimax;
import dockline.solve.RandomMissions;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The planner's charging route ({@link Route.Charging}: one pass, threshold policy, independent
 * certificate) against two other computations on random tiny missions with charging, capacity saturation
 * and disturbances ({@link RandomMissions#tiny}), on verdict, highest floor, lowest start and the certified
 * worst case:
 * <ul>
 * <li>the stored product route ({@link Route.Stored}: arena × goal × battery levels in CSR arrays and the
 *     compact attractor, the reference route of {@code check --method stored});</li>
 * <li>{@link BruteForceMinimax}: minimax over explicit (cell, events left, level, tasks) states with the moves
 *     read from the map and mission records, sharing no code with the arena compiler, the goal automaton or any
 *     solver; its depth bound is the attractor's (Grädel, Thomas, Wilke (eds., 2002), "Automata, Logics, and
 *     Infinite Games", LNCS 2500, ch. 2). The lowest start is its verdict scanned over every start level.</li>
 * </ul>
 * The charging route's safest policy must have the highest floor as its certified worst level (a policy
 * whose worst level were higher would guarantee a higher floor).
 */
class ChargingPlanAgreementProperties {

    @Property(tries = 2500)
    void chargingRoute_agreesWithStoredRouteAndBruteForce(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        String why = RandomMissions.describe(m);
        Plan ch = MissionPlanner.plan(m, PlanOptions.of(Route.Charging.defaults()));
        Plan st = MissionPlanner.plan(m, PlanOptions.of(new Route.Stored(PolicyChoice.SAFEST, null)));
        BruteForceMinimax bf = new BruteForceMinimax(m);
        int floor = m.reserveUnits();
        int cap = m.capacityUnits();

        boolean expected = bf.wins(floor);
        assertThat(ch.guaranteed()).as("verdict against brute force\n%s", why).isEqualTo(expected);
        assertThat(st.guaranteed()).as("verdict of the stored route\n%s", why).isEqualTo(expected);
        int highest = bf.highestFloor();
        assertThat(ch.highestFloorUnits().orElse(-1)).as("highest floor\n%s", why).isEqualTo(highest);
        assertThat(st.highestFloorUnits().orElse(-1)).as("stored highest floor\n%s", why).isEqualTo(highest);
        int lowest = -1;
        for (int s = floor; s <= cap && lowest < 0; s++) {
            if (bf.wins(floor, s)) {
                lowest = s;
            }
        }
        assertThat(ch.lowestStartUnits().orElse(-1)).as("lowest start\n%s", why).isEqualTo(lowest);

        boolean charging = m.scale().gain(m.robot().chargeWh()) > 0;
        boolean saturates = charging && m.startUnits() + m.scale().gain(m.robot().chargeWh()) > cap;
        Statistics.label("case").collect((charging ? "charging" : "no charging") + ", "
                + (expected ? "guaranteed" : "not guaranteed"));
        Statistics.label("charge step saturates from the start level").collect(saturates);
        Statistics.label("disturbance budget").collect(m.map().disturbances().budget());
        Statistics.label("case").coverage(c -> {
            c.check("charging, guaranteed").percentage(p -> p > 10);
            c.check("charging, not guaranteed").percentage(p -> p > 5);
            c.check("no charging, guaranteed").percentage(p -> p > 5);
        });
        Statistics.label("charge step saturates from the start level").coverage(c -> c.check(true).count(n -> n > 50));
        Statistics.label("disturbance budget").coverage(c -> c.check(2).count(n -> n > 100));
        if (!expected) {
            assertThat(ch.policy()).isEmpty();
            return;
        }
        assertThat(ch.certification().ok()).as("certified\n%s", why).isTrue();
        assertThat(st.certification().ok()).as("stored certified\n%s", why).isTrue();
        int certified = ((Certification.Reserve) ch.certification()).certificate().worstMinimumUnits();
        assertThat(certified).as("certified worst case = highest floor\n%s", why).isEqualTo(highest);
        assertThat(ch.lowestLevelUnits()).as("worst case\n%s", why).hasValue(highest);
        assertThat(st.lowestLevelUnits()).as("stored safest worst case\n%s", why).hasValue(highest);
        assertThat(((Plan.Detail.Charging) ch.detail()).thresholds()).isNotNull();
    }
}
