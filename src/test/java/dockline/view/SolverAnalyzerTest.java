package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import org.junit.jupiter.api.Test;

/** The adapter from the solver to the view model. */
class SolverAnalyzerTest {

    @Test
    void a_mission_that_is_not_guaranteed_comes_with_its_counterexample() throws Exception {
        // missions/README.md lists late-return as not guaranteed
        Mission m = MissionLoader.load(Path.of("missions/late-return.yaml"));
        ViewData d = new SolverAnalyzer().analyze(m, () -> false);
        assertThat(d.verdict().outcome()).isEqualTo(VerdictSummary.Outcome.NOT_GUARANTEED);
        ViewReplay ce = d.replays().get(0);
        assertThat(ce.kind()).isEqualTo(ViewReplay.Kind.COUNTEREXAMPLE);
        assertThat(ce.minimumUnits()).isLessThan(m.reserveUnits());
    }

    @Test
    void a_raised_cancellation_flag_stops_the_solve() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/night-round.yaml"));
        assertThatThrownBy(() -> new SolverAnalyzer().analyze(m, () -> true)).isInstanceOf(CancellationException.class);
    }

    /**
     * Oracle: the product game solved on its own (ReserveSolver with the highest floor and the heat map switched on;
     * the window plans on the exported policy's route, the charging passes, which share no code with it): the
     * verdict, the worst case of the safest policy (the highest guaranteed floor) and the exact heat map.
     */
    @Test
    void the_view_model_repeats_the_solver_figures() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        SolverAnalyzer.SolvedData d = (SolverAnalyzer.SolvedData) new SolverAnalyzer().analyze(m, () -> false);
        var plan = d.plan();
        var a = dockline.solve.reserve.ReserveSolver.analyse(m, dockline.solve.reserve.ReserveOptions.defaults()
                .withChargeNeeded(true).withHighestReserve(true));
        var heat = a.chargeNeeded().orElseThrow();
        assertThat(d.verdict().outcome() == VerdictSummary.Outcome.GUARANTEED).isEqualTo(a.guaranteed()).isTrue();
        // the view shows the safest policy: its worst case is the highest guaranteed floor
        assertThat(d.verdict().worstCaseMinimumUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        assertThat(d.verdict().highestReserveUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        // the certified worst case is the first replay, and its lowest level is the highest guaranteed floor
        assertThat(d.verdict().certificate()).startsWith("passed");
        ViewReplay worst = d.replays().get(0);
        assertThat(worst.kind()).isEqualTo(ViewReplay.Kind.WORST_CASE);
        assertThat(worst.minimumUnits()).isEqualTo(a.highestGuaranteedReserveUnits().getAsInt());
        assertThat(worst.steps().get(0).cell()).isEqualTo(m.start());
        int w = m.map().width();
        int k = m.map().disturbances().budget();
        assertThat(d.heatNote()).isNull(); // exact on every cell
        for (int c = 0; c < m.map().cellCount(); c++) {
            int expected = heat.unitsNeeded(c, k, 0);
            int shown = d.chargeNeeded(c, k, 0);
            assertThat(shown).isEqualTo(expected == dockline.solve.reserve.ChargeNeeded.IMPOSSIBLE ? ViewData.IMPOSSIBLE : expected);
            assertThat(d.chargeNeededAtLeast(c, k, 0)).isEqualTo(shown);
        }
        // every entry of the plan's policy is found again, by exact look-up and among the cell's actions
        for (dockline.policy.PolicyEntry e : plan.policy().orElseThrow().entries()) {
            int ci = e.cell().index(w);
            assertThat(d.policyAction(ci, e.level(), e.budgetLeft(), e.progress())).contains(e.action());
            assertThat(d.policyActions(ci, e.budgetLeft(), e.progress())).contains(e.action());
        }
    }

    /**
     * The lasting demos are small, so the window's heat map is computed on the whole closure arena although the
     * policy comes from the kept phases: exact on every cell. Oracle: the product game's heat map on the whole arena
     * (ReserveSolver with the heat map switched on: every closure phase and every battery level, no charging pass).
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"missions/vault-check.yaml", "missions/late-return.yaml"})
    void on_the_small_lasting_demos_the_heat_map_is_exact(String file) throws Exception {
        Mission m = MissionLoader.load(Path.of(file));
        ViewData d = new SolverAnalyzer().analyze(m, () -> false);
        var heat = dockline.solve.reserve.ReserveSolver.analyse(m, dockline.solve.reserve.ReserveOptions.defaults()
                .withChargeNeeded(true)).chargeNeeded().orElseThrow();
        assertThat(d.heatNote()).isNull();
        int k = m.map().disturbances().budget();
        int compared = 0;
        for (int left = 0; left <= k; left++) {
            for (int c = 0; c < m.map().cellCount(); c++) {
                int expected = heat.unitsNeeded(c, left, 0);
                int shown = d.chargeNeeded(c, left, 0);
                assertThat(shown).as("cell %d, %d left", c, left).isEqualTo(
                        expected == dockline.solve.reserve.ChargeNeeded.IMPOSSIBLE ? ViewData.IMPOSSIBLE : expected);
                assertThat(d.chargeNeededAtLeast(c, left, 0)).isEqualTo(shown);
                compared += expected == dockline.solve.reserve.ChargeNeeded.IMPOSSIBLE ? 0 : 1;
            }
        }
        assertThat(compared).as("cells with a level that will do").isPositive();
    }
}
