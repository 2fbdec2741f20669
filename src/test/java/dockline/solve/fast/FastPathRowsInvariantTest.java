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
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
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

    /** A tiny mission the fast path applies to, with its game solved from the start. */
    private record Solved(long seed, Mission mission, Arena arena, GoalAutomaton goal, MinChargeSolver.Values values) {
        int startNeed() {
            return values.result().startNeed();
        }
    }

    /** The first {@code n} tiny missions (seeds 1 to 400) the fast path applies to and {@code keep} accepts. */
    private static List<Solved> tiny(int n, Predicate<Solved> keep) {
        List<Solved> out = new ArrayList<>();
        for (long seed = 1; seed <= 400 && out.size() < n; seed++) {
            Mission m = TinyMissions.random(seed, false);
            Arena arena = ArenaCompiler.compile(m);
            GoalAutomaton goal = GoalAutomaton.of(m);
            if (MinChargeSolver.applicable(arena, goal)) {
                Solved s = new Solved(seed, m, arena, goal, new MinChargeSolver(arena, goal).solveStart());
                if (keep.test(s)) {
                    out.add(s);
                }
            }
        }
        assertThat(out).as("tiny missions found").hasSize(n);
        return out;
    }

    @Test
    void aStartThatCannotWin_stopsTheRowsWithTheNamedInvariant() {
        for (Solved s : tiny(5, x -> x.startNeed() == MinChargeSolver.INFINITE)) {
            assertThatThrownBy(() -> FastPath.rows(s.arena(), s.goal(), s.values(), s.mission().startUnits(), 10_000))
                    .as("seed %d", s.seed())
                    .isInstanceOf(IllegalStateException.class)
                    .hasMessageContaining("internal:").hasMessageContaining("read only from a guaranteed start");
        }
    }

    @Test
    void onGuaranteedStarts_everyRowIsASituationTheRobotWins_bruteForce() {
        long rows = 0;
        for (Solved s : tiny(20, x -> x.values().result().guaranteed())) {
            BruteForce brute = new BruteForce(s.mission(), s.mission().reserveUnits());
            assertThat(brute.guaranteed()).as("seed %d", s.seed()).isTrue();
            var r = FastPath.rows(s.arena(), s.goal(), s.values(), s.mission().startUnits(), 10_000);
            for (PolicyEntry e : r.entries()) {
                rows++;
                assertThat(brute.wins(e.cell(), e.budgetLeft(), e.progress(), e.level()))
                        .as("seed %d row %s", s.seed(), e).isTrue();
            }
        }
        assertThat(rows).as("rows checked").isPositive();
    }
}
