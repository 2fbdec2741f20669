package dockline.solve.discounted;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.PairMonitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.TinyProductGame;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The bundled demo missions/discounted-trap.yaml (invented data) behaves as missions/README.md
 * says. Expected values are hand-worked with the geometric series: charging 1.5 Wh = 3 units a
 * step for ever scores 3 * 2/(2-1) = 6, the optimum, and never reads the gauge.
 */
class DiscountedTrapDemoTest {

    @Test
    void optimisationPicksAPolicyThatNeverDocks_comparatorFindsOneThatDoes() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = (Objective.Discounted) m.objective();
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withAlsoOptimise(true));

        DiscountedAnalysis.Baseline b = a.baseline().orElseThrow();
        assertThat(b.holds()).isTrue();
        assertThat(b.optimalValue()).contains(Rational.of(6));
        assertThat(b.optimalPlayCompletes()).contains(false);

        assertThat(a.guaranteed()).isTrue();
        assertThat(a.reserveKept()).isTrue();
        assertThat(a.worstCaseScore().orElseThrow().compareTo(Rational.of(3, 4))).isGreaterThanOrEqualTo(0);
        assertThat(a.nominalPlan().get(0).kind()).isEqualTo(ActionKind.CHARGE);
        assertThat(a.nominalPlan()).anyMatch(x -> x.kind() == ActionKind.MOVE);

        // the same verdict from the naive explicit product (independent implementation)
        Arena arena = ArenaCompiler.compile(m);
        assertThat(TinyProductGame.robotWinsWithGoal(arena, new PairMonitor(
                new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits()),
                DiscountedComparator.of(o, arena.maxAbsWeight())), GoalAutomaton.of(m))).isTrue();
    }

    @Test
    void atTheOptimumItself_theOptimisationRouteSaysYes_butNoPolicyDocks() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/discounted-trap.yaml"));
        Objective.Discounted o = new Objective.Discounted(2, Rational.of(6), dockline.model.Relation.AT_LEAST);
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, DiscountedOptions.defaults().withAlsoOptimise(true));
        assertThat(a.baseline().orElseThrow().holds()).isTrue();
        assertThat(a.guaranteed()).isFalse();
    }
}
