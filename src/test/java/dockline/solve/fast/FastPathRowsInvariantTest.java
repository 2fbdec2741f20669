package dockline.solve.fast;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.bench.TinyMissions;
import dockline.fixtures.BruteForce;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.policy.PolicyEntry;
import org.junit.jupiter.api.Test;

/**
 * The invariant of {@link FastPath#rows}: the closed loop it walks meets only pairs (robot vertex, goal state)
 * with a chosen action, none of whose outcomes enters the reject sink. Asked for a start that breaks it, the
 * walk stops with an internal error naming the invariant (not an index out of bounds); on guaranteed starts
 * every row it writes is a situation the robot wins, by the explicit-state brute force of the reserve game
 * ({@link BruteForce}: the attractor of Grädel, Thomas and Wilke 2002, "Automata, Logics, and Infinite Games",
 * ch. 2, on its own state space).
 */
class FastPathRowsInvariantTest {

    @Test
    void aStartThatCannotWin_stopsTheRowsWithTheNamedInvariant() {
        int found = 0;
        for (long seed = 1; seed <= 400 && found < 5; seed++) {
            Mission m = TinyMissions.random(seed, false);
            Arena arena = ArenaCompiler.compile(m);
            GoalAutomaton goal = GoalAutomaton.of(m);
            if (!MinChargeSolver.applicable(arena, goal)) {
                continue;
            }
            MinChargeSolver.Values values = new MinChargeSolver(arena, goal).solveStart();
            if (values.result().startNeed() != MinChargeSolver.INFINITE) {
                continue;
            }
            found++;
            assertThatThrownBy(() -> FastPath.rows(arena, goal, values, m.startUnits(), 10_000))
                    .isInstanceOf(IllegalStateException.class)
                    .hasMessageContaining("internal:").hasMessageContaining("read only from a guaranteed start");
        }
        assertThat(found).as("tiny missions whose start no charge wins").isEqualTo(5);
    }

    @Test
    void onGuaranteedStarts_everyRowIsASituationTheRobotWins_bruteForce() {
        int found = 0;
        long rows = 0;
        for (long seed = 1; seed <= 400 && found < 20; seed++) {
            Mission m = TinyMissions.random(seed, false);
            Arena arena = ArenaCompiler.compile(m);
            GoalAutomaton goal = GoalAutomaton.of(m);
            if (!MinChargeSolver.applicable(arena, goal)) {
                continue;
            }
            MinChargeSolver.Values values = new MinChargeSolver(arena, goal).solveStart();
            if (!values.result().guaranteed()) {
                continue;
            }
            found++;
            BruteForce brute = new BruteForce(m, m.reserveUnits());
            assertThat(brute.guaranteed()).as("seed %d", seed).isTrue();
            var r = FastPath.rows(arena, goal, values, m.startUnits(), 10_000);
            for (PolicyEntry e : r.entries()) {
                rows++;
                assertThat(brute.wins(e.cell(), e.budgetLeft(), e.progress(), e.level()))
                        .as("seed %d row %s", seed, e).isTrue();
            }
        }
        assertThat(found).as("guaranteed tiny missions").isEqualTo(20);
        assertThat(rows).as("rows checked").isPositive();
    }
}
