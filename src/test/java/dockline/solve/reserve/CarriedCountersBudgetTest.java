package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import org.junit.jupiter.api.Test;

/**
 * A lasting round holds counters on top of its game's own: its copy of the weakened fixpoint, kept for the next
 * round, and the previous round's copy until it is carried into the new numbering. Both count against the memory
 * budget when they are held: a budget one byte short of the game with them is refused with the usual "too large"
 * message, and one that fits them solves as without a budget. Tiny lasting missions, invented
 * ({@link LastingMissions}); the budgets are the sizes the games themselves report, so nothing here is tuned.
 */
class CarriedCountersBudgetTest {

    /** A first round (only the phases without closures kept) whose solve keeps its weakened copy. */
    private record FirstRound(Mission mission, Arena arena, GoalAutomaton goal, ReserveMonitor monitor,
                              ImplicitReserveGame solved, long counters) {
        ImplicitReserveGame fresh() {
            return new ImplicitReserveGame(arena, goal, monitor, true);
        }
    }

    private static FirstRound firstRound() {
        for (long seed = 1; seed <= 2000; seed++) {
            Mission m = LastingMissions.fromSeed(seed, true);
            DisturbanceStates st = ArenaCompiler.states(m);
            boolean[] keep = new boolean[st.count()];
            for (int s = 0; s < keep.length; s++) {
                keep[s] = st.closed(s).length == 0; // the first round's phases, as PhasedLastingSolver keeps them
            }
            Arena a = ArenaCompiler.compileWithin(m, st, keep);
            GoalAutomaton goal = GoalAutomaton.of(m);
            ReserveMonitor mon = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
            ImplicitReserveGame g = new ImplicitReserveGame(a, goal, mon, true);
            g.solveWithStrategy(() -> false);
            if (g.weakened != null) {
                return new FirstRound(m, a, goal, mon, g, g.weakened.length());
            }
        }
        throw new AssertionError("no tiny lasting mission whose first round keeps its weakened fixpoint");
    }

    @Test
    void theRoundsOwnCopyForTheNextRound_countsAgainstTheBudget() {
        FirstRound f = firstRound();
        assertThat(f.counters()).isPositive();
        ImplicitReserveGame tight = f.fresh();
        tight.limitWorklist(0, f.counters() - 1);
        assertThatThrownBy(() -> tight.solveWithStrategy(() -> false))
                .isInstanceOf(ProductTooLargeException.class)
                .hasMessageContaining("over the memory budget");
        assertThat(tight.weakened).as("the copy is refused before it is made").isNull();
        ImplicitReserveGame fits = f.fresh();
        fits.limitWorklist(0, f.counters());
        assertThat(fits.solveWithStrategy(() -> false).startWon()).isEqualTo(f.solved().solveWithStrategy(() -> false)
                .startWon());
    }

    @Test
    void thePreviousRoundsCounters_countUntilTheyAreCarried() {
        FirstRound f = firstRound();
        // the next round on the same arena (a superset of its own phases): what it holds at the start is its own
        // game and the previous round's counters
        ImplicitReserveGame next = f.fresh();
        long own = 1000;
        next.limitWorklist(own, own + f.counters() - 1);
        assertThatThrownBy(() -> next.carryFrom(f.solved()))
                .isInstanceOf(ProductTooLargeException.class)
                .hasMessageContaining("over the memory budget");
        assertThat(next.previous).as("nothing is held when refused").isNull();
        ImplicitReserveGame roomy = f.fresh();
        roomy.limitWorklist(own, own + 2 * f.counters());
        roomy.carryFrom(f.solved());
        boolean won = roomy.solveWithStrategy(() -> false).startWon();
        assertThat(roomy.previous).as("let go once copied").isNull();
        assertThat(won).isEqualTo(f.fresh().solveWithStrategy(() -> false).startWon());
    }

    @Test
    void thePhasedSolve_isRefusedUnderABudgetWithoutRoomForTheCarriedCounters() {
        FirstRound f = firstRound();
        ImplicitReserveGame g = ReserveSolver.budgeted(f.fresh(), f.arena(), ProductOptions.defaults());
        long game = g.fixedBytes; // the bytes the budget check counts for the first round's game
        ProductOptions tight = ProductOptions.defaults().withMemoryBudget(game + f.counters() - 1);
        assertThatThrownBy(() -> PhasedLastingSolver.solve(f.mission(), f.goal(), f.monitor(), tight))
                .isInstanceOf(ProductTooLargeException.class);
        PhasedLastingSolver.Result free = PhasedLastingSolver.solve(f.mission(), f.goal(), f.monitor(),
                ProductOptions.defaults());
        assertThat(free.rounds()).isPositive();
    }
}
