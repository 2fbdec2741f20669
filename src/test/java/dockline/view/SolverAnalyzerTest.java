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
    void a_raised_cancellation_flag_stops_the_solve() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/night-round.yaml"));
        assertThatThrownBy(() -> new SolverAnalyzer().analyze(m, () -> true)).isInstanceOf(CancellationException.class);
    }

    @Test
    void the_view_model_repeats_the_solver_figures() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        SolverAnalyzer.SolvedData d = (SolverAnalyzer.SolvedData) new SolverAnalyzer().analyze(m, () -> false);
        var a = d.analysis();
        assertThat(d.verdict().outcome() == Verdict.Outcome.GUARANTEED).isEqualTo(a.guaranteed());
        assertThat(d.verdict().worstCaseMinimumUnits()).isEqualTo(a.worstCaseMinimumUnits());
        assertThat(d.verdict().highestReserveUnits()).isEqualTo(a.highestGuaranteedReserveUnits());
        int w = m.map().width();
        int k = m.map().disturbances().budget();
        for (int c = 0; c < m.map().cellCount(); c++) {
            int expected = a.chargeNeeded().orElseThrow().unitsNeeded(c, k, 0);
            int shown = d.chargeNeeded(c, k, 0);
            assertThat(shown).isEqualTo(expected == dockline.solve.ChargeNeeded.IMPOSSIBLE ? ViewData.IMPOSSIBLE : expected);
        }
        // every policy entry is found again, by exact look-up and among the cell's actions
        for (dockline.solve.PolicyEntry e : a.policy().orElseThrow().entries()) {
            int ci = e.cell().index(w);
            assertThat(d.policyAction(ci, e.level(), e.budgetLeft(), e.progress())).contains(e.action());
            assertThat(d.policyActions(ci, e.budgetLeft(), e.progress())).contains(e.action());
        }
    }
}
