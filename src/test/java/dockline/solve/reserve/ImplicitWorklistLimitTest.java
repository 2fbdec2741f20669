package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductTooLargeException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The implicit route's worklist, whose size is only known while solving, stays under its cap: a
 * solve that would pass it stops with the usual "too large" message instead of running out of memory.
 */
class ImplicitWorklistLimitTest {

    @Test
    void aWorklistOverItsCap_stopsWithTheTooLargeMessage() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        Arena arena = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        ReserveMonitor monitor = new ReserveMonitor(m.reserveUnits(), m.capacityUnits(), m.startUnits());
        ImplicitReserveGame capped = new ImplicitReserveGame(arena, goal, monitor);
        // the rest of the solve is said to take all but 1 KB of a 64 MB budget
        capped.limitWorklist((64L << 20) - 1024, 64L << 20);
        assertThatThrownBy(() -> capped.solveWithStrategy(() -> false))
                .isInstanceOf(ProductTooLargeException.class)
                .hasMessageContaining("grew past the memory budget").hasMessageContaining("64 MB");
        // without the cap the same solve wins (the demo is guaranteed: missions/README.md)
        ImplicitReserveGame free = new ImplicitReserveGame(arena, goal, monitor);
        assertThat(free.solveWithStrategy(() -> false).startWon()).isTrue();
    }
}
