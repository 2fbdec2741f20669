package dockline.solve.discounted;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Terrain;
import dockline.model.Zone;
import dockline.monitor.DiscountedComparator;
import dockline.solve.TinyProductGame;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The trap the discounted demo shows, on a corridor built in code (invented data): a dock at each
 * end, the task cell beside the far dock, a door between that may shut once. Charging pays 3 units a
 * step, every move costs 2. Hand-worked with the geometric series: charging for ever scores
 * {@code 3 * 2/(2-1) = 6}, the best any play can do, but never does the task; a play that charges k
 * times, walks 8 cells and docks scores {@code 6 - 10 * 2^-k + 2^-k/64 < 6}.
 */
class DiscountedTrapExampleTest {

    static Mission corridor(Rational threshold) {
        Map<Character, Terrain> legend = Map.of(
                '.', new Terrain('.', "tile", false, false),
                'D', new Terrain('D', "tile", false, true),
                'C', new Terrain('C', "tile", true, false));
        BuildingMap map = new BuildingMap("corridor", null, BigDecimal.ONE, List.of("C..D....C"), legend,
                List.of(new Zone("gauge", List.of(new Cell(7, 0)))), Map.of(),
                new DisturbanceModel(1, List.of(new EventRule(EventKind.DOOR_SHUT, "door", List.of(new Cell(3, 0)), null))));
        RobotProfile robot = new RobotProfile(BigDecimal.valueOf(40), new BigDecimal("0.5"),
                Map.of("tile", BigDecimal.ONE), new BigDecimal("0.5"), new BigDecimal("1.5"), Neighbourhood.FOUR);
        return new Mission("trap", null, map, robot, new Cell(0, 0), Charge.percent(BigDecimal.valueOf(50)),
                Charge.percent(BigDecimal.valueOf(20)), new Tasks(List.of("gauge"), true, List.of(), true),
                new Objective.Discounted(2, threshold, Relation.AT_LEAST));
    }

    /** Whether a lasso play of robot vertices ever completes the mission (goal automaton along it). */
    static boolean completes(Arena a, GoalAutomaton goal, DiscountedValueIteration.Lasso play) {
        int[] v = play.vertices();
        int g = goal.initial(a.cellZones(a.cell(v[0])));
        int rounds = goal.taskCount() + 1; // progress is monotone: enough loop rounds to see every change
        int len = play.loopStart() + rounds * (v.length - play.loopStart());
        for (int i = 0; i < len; i++) {
            int r = i < v.length ? v[i] : v[play.loopStart() + (i - play.loopStart()) % (v.length - play.loopStart())];
            if (i > 0) {
                g = goal.step(g, a.cellZones(a.cell(r)));
            }
            if (g == GoalAutomaton.REJECT) {
                return false;
            }
            if (goal.accepting(g, a.isDock(a.cell(r)))) {
                return true;
            }
        }
        return false;
    }

    @Test
    void optimisationSaysYes_withAPolicyThatNeverDoesTheTask() {
        Mission m = corridor(Rational.of(3, 4));
        Arena a = ArenaCompiler.compile(m);
        DiscountedValueIteration vi = new DiscountedValueIteration(a, 2);
        DiscountedValueIteration.Result best = vi.solve();
        assertThat(best.exactValue()).isEqualTo(Rational.of(6));
        assertThat(vi.decide(Rational.of(3, 4), Relation.AT_LEAST).holds()).isTrue();
        assertThat(completes(a, GoalAutomaton.of(m), best.play())).isFalse();
    }

    @Test
    void comparatorProduct_meetsTheThresholdAndDocks() {
        Mission m = corridor(Rational.of(3, 4));
        Arena a = ArenaCompiler.compile(m);
        assertThat(TinyProductGame.robotWinsWithGoal(a,
                new DiscountedComparator(2, a.maxAbsWeight(), Rational.of(3, 4), Relation.AT_LEAST),
                GoalAutomaton.of(m))).isTrue();
    }

    @Test
    void atTheOptimumItself_onlyTheComparatorSaysNo() {
        // DS >= 6 is reachable only by charging for ever; no play that docks after the task gets there
        Mission m = corridor(Rational.of(6));
        Arena a = ArenaCompiler.compile(m);
        assertThat(new DiscountedValueIteration(a, 2).decide(Rational.of(6), Relation.AT_LEAST).holds()).isTrue();
        assertThat(TinyProductGame.robotWinsWithGoal(a,
                new DiscountedComparator(2, a.maxAbsWeight(), Rational.of(6), Relation.AT_LEAST),
                GoalAutomaton.of(m))).isFalse();
        // just below: charge long enough first, then go (without a shut door 6 - 10/2^k + 2^-k/64 >= 5.9 from k = 7)
        assertThat(TinyProductGame.robotWinsWithGoal(a,
                new DiscountedComparator(2, a.maxAbsWeight(), Rational.of(59, 10), Relation.AT_LEAST),
                GoalAutomaton.of(m))).isTrue();
    }
}
