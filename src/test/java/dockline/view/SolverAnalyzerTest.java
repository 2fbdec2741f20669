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

    @Test
    void the_view_model_repeats_the_solver_figures() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        SolverAnalyzer.SolvedData d = (SolverAnalyzer.SolvedData) new SolverAnalyzer().analyze(m, () -> false);
        var plan = d.plan();
        var a = ((dockline.plan.Plan.Detail.Product) plan.detail()).analysis();
        // the heat map the solver gives on its own (ReserveSolver with the heat map switched on)
        var heat = dockline.solve.reserve.ReserveSolver.analyse(m, dockline.solve.reserve.ReserveOptions.defaults().withChargeNeeded(true))
                .chargeNeeded().orElseThrow();
        assertThat(d.verdict().outcome() == VerdictSummary.Outcome.GUARANTEED).isEqualTo(a.guaranteed());
        assertThat(d.verdict().worstCaseMinimumUnits()).isEqualTo(a.worstCaseMinimumUnits());
        // the view shows the safest policy: its worst case is the highest guaranteed floor
        assertThat(d.verdict().worstCaseMinimumUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        assertThat(d.verdict().highestReserveUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        // the certified worst case is the first replay, and its lowest level is the solver's worst-case minimum
        assertThat(d.verdict().certificate()).startsWith("passed");
        ViewReplay worst = d.replays().get(0);
        assertThat(worst.kind()).isEqualTo(ViewReplay.Kind.WORST_CASE);
        assertThat(worst.minimumUnits()).isEqualTo(a.worstCaseMinimumUnits().getAsInt());
        assertThat(worst.steps().get(0).cell()).isEqualTo(m.start());
        int w = m.map().width();
        int k = m.map().disturbances().budget();
        for (int c = 0; c < m.map().cellCount(); c++) {
            int expected = heat.unitsNeeded(c, k, 0);
            int shown = d.chargeNeeded(c, k, 0);
            assertThat(shown).isEqualTo(expected == dockline.solve.reserve.ChargeNeeded.IMPOSSIBLE ? ViewData.IMPOSSIBLE : expected);
        }
        // every policy entry is found again, by exact look-up and among the cell's actions
        for (dockline.policy.PolicyEntry e : a.policy().orElseThrow().entries()) {
            int ci = e.cell().index(w);
            assertThat(d.policyAction(ci, e.level(), e.budgetLeft(), e.progress())).contains(e.action());
            assertThat(d.policyActions(ci, e.budgetLeft(), e.progress())).contains(e.action());
        }
    }
}
