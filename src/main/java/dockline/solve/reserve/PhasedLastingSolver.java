package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.goal.GoalAutomaton;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import java.util.Arrays;
import java.util.function.BooleanSupplier;

/**
 * The reserve game of a mission with lasting events, solved phase by phase: a <em>phase</em> is a set of
 * doors and zones closed (all disturbance states with that closure set; each closure spends an event, so a
 * phase with C closed is a game of the map with C closed and at most K - |C| events). Only the phases the
 * robot's winning attempts rely on are built.
 *
 * <p>The kept phases are compiled into a restricted arena ({@link ArenaCompiler#compileWithin}) in which a
 * closure into a left-out phase ends the play. Each round solves the <em>strengthened</em> game on it
 * ({@link ImplicitReserveGame} with such a closure counted as won for the robot): the building there can do
 * no more than in the mission, so a start the robot loses there is lost in the mission, and the round ends
 * with "not guaranteed" without building any other phase. Otherwise the solve stopped as soon as the start
 * was won, and the closed loop of its recorded choices from the start (robot follows its choice, the
 * building plays every outcome) is walked: if no play of it meets a left-out closure, that strategy plays in
 * the mission itself (every outcome it meets is real and leads into a kept phase) and wins: "guaranteed",
 * with that strategy as the policy. Else the phases of the left-out closures that loop meets, and only
 * those, are added and the next round starts. Each round adds a phase, so the rounds end, and the verdict
 * is exact either way. This is two-sided abstraction refinement for games (Henzinger, Jhala and Majumdar,
 * "Counterexample-guided control", ICALP 2003: an abstract strategy of the player is checked on the
 * concrete game and the abstraction refined where it fails), here with no approximation left at the end; the
 * attractor is that of Grädel, Thomas and Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500
 * (2002), ch. 2.
 *
 * <p>Adding phases only adds vertices and turns left-out closures into real outcomes, so the weakened game's
 * won triples of one round are won in the next: each round after the first starts from the previous round's
 * weakened fixpoint ({@link ImplicitReserveGame#carryFrom}: its counters copied over, the attractor continued
 * from the new phases) instead of winning the kept phases again.
 *
 * <p>Cost: per round one restricted compile, a copy of the previous round's counters and one solve that
 * stops once the start is won, O(size of the new phases' product) for the weakened part (the strengthened
 * part, with the left-out closures won, is solved afresh each round), and a walk of the closed loop; at most
 * as many rounds as there are closure sets (a mission that needs every phase is then no cheaper than the
 * whole arena).
 */
public final class PhasedLastingSolver {

    private PhasedLastingSolver() {
    }

    /**
     * What the phased solve found.
     *
     * @param startWon   the verdict at the monitor's floor (exact)
     * @param arena      the restricted arena of the last round (its kept phases)
     * @param game       the (strengthened) game on it
     * @param strategy   the last round's solve; when the start is won its closed loop from the start meets no
     *                   left-out closure, so its policy and worst case are those of a strategy in the mission
     * @param rounds     rounds of the refinement
     * @param keptStates disturbance states kept in the end, of {@code totalStates}
     * @param totalStates the mission's disturbance states
     */
    public record Result(boolean startWon, Arena arena, ImplicitReserveGame game, ImplicitReserveGame.Strategy strategy,
                         int rounds, int keptStates, int totalStates) {
    }

    /** Solves the mission at the monitor's floor; the strategy records the robot's choices (fewest moves in the kept phases). */
    public static Result solve(Mission mission, GoalAutomaton goal, ReserveMonitor monitor, ProductOptions po) {
        DisturbanceStates st = ArenaCompiler.states(mission);
        boolean[] keep = new boolean[st.count()];
        for (int s = 0; s < st.count(); s++) {
            keep[s] = st.closed(s).length == 0;
        }
        BooleanSupplier cancelled = po.cancelled();
        int rounds = 0;
        ImplicitReserveGame previous = null;
        while (true) {
            rounds++;
            Arena a = ArenaCompiler.compileWithin(mission, st, keep);
            ImplicitReserveGame game = ReserveSolver.budgeted(new ImplicitReserveGame(a, goal, monitor, true), a, po);
            if (previous != null) {
                game.carryFrom(previous);
            }
            previous = null;
            ImplicitReserveGame.Strategy s = game.solveWithStrategy(cancelled);
            int kept = 0;
            for (boolean k : keep) {
                kept += k ? 1 : 0;
            }
            if (!s.startWon()) {
                return new Result(false, a, game, s, rounds, kept, st.count());
            }
            boolean[] add = reliedOn(game, st, s, keep);
            if (!addPhases(st, keep, add)) {
                return new Result(true, a, game, s, rounds, kept, st.count());
            }
            previous = game;
        }
    }

    /**
     * One round on the given phases only, with no refinement: the weakened game (a closure into a left-out
     * phase counts as lost) on {@code ArenaCompiler.compileWithin(mission, states, keep)}, solved with the
     * robot's choices. Its win is a real win; its loss is real only when no phase the mission needs was left
     * out. The benchmark uses it with the phases a {@link #solve} ended with, given in advance, to measure what
     * its last round costs even when no earlier round is needed. Cost: one restricted compile and one
     * solve that stops once the start is won.
     */
    public static ImplicitReserveGame.Strategy solveKept(Mission mission, GoalAutomaton goal, ReserveMonitor monitor,
                                                         DisturbanceStates states, boolean[] keep, ProductOptions po) {
        Arena a = ArenaCompiler.compileWithin(mission, states, keep);
        return ReserveSolver.budgeted(new ImplicitReserveGame(a, goal, monitor, false), a, po)
                .solveWithStrategy(po.cancelled());
    }

    /** The phases a result kept (per disturbance state of the mission, whether its vertices are in the last arena). */
    public static boolean[] kept(Result r) {
        boolean[] keep = new boolean[r.totalStates()];
        Arena a = r.arena();
        for (int v = 0; v < a.vertexCount(); v++) {
            keep[a.state(v)] = true;
        }
        return keep;
    }

    /** Whether the robot wins at the monitor's floor (exact); see {@link #solve}. */
    public static boolean wins(Mission mission, GoalAutomaton goal, ReserveMonitor monitor, ProductOptions po) {
        return solve(mission, goal, monitor, po).startWon();
    }

    /**
     * Adds to {@code keep} the whole phase (every state with the same closures) of each state marked in
     * {@code add} that is not kept yet. O(states² · budget).
     *
     * @return whether anything was added
     */
    public static boolean addPhases(DisturbanceStates st, boolean[] keep, boolean[] add) {
        boolean any = false;
        for (int t = 0; t < add.length; t++) {
            if (add[t] && !keep[t]) {
                any = true;
                int[] closed = st.closed(t);
                for (int u = 0; u < st.count(); u++) {
                    if (!keep[u] && Arrays.equals(st.closed(u), closed)) {
                        keep[u] = true;
                    }
                }
            }
        }
        return any;
    }

    /**
     * The disturbance state (an id of {@code st}, the states {@code a} was restricted from) that outcome
     * {@code e} of a restricted arena would lead into if the phase it closes into were kept: for an edge of
     * energy change {@link ArenaCompiler#LEFT_OUT} the state after its closure (the door tried, or the
     * blockage rule's zone); -1 when the rule allows no more events there.
     */
    public static int leftOutState(Arena a, DisturbanceStates st, int e) {
        int d = a.source(e);
        int item = a.event(e) == EventKind.DOOR_SHUT.ordinal() ? st.doorItem(a.actionTarget(d))
                : st.blockageItem(a.rule(e));
        return st.after(a.state(d), a.rule(e), item);
    }

    /**
     * The left-out states the strengthened strategy relies on: per disturbance triple of the closed loop of
     * its recorded choices from the start, the state each of its left-out closure outcomes leads to. None:
     * the strategy never meets a left-out closure, so it is a winning strategy in the mission.
     * O(closed loop x out-degree).
     */
    private static boolean[] reliedOn(ImplicitReserveGame game, DisturbanceStates st, ImplicitReserveGame.Strategy s,
                                      boolean[] keep) {
        boolean[] add = new boolean[st.count()];
        Arena a = game.arena;
        int rc = a.robotCount();
        ImplicitWalks.forEachInLoop(game, s, p -> {
            int d = game.vertexOf(p);
            if (d < rc) {
                return;
            }
            for (int e = a.outBegin(d); e < a.outEnd(d); e++) {
                if (a.weight(e) != ArenaCompiler.LEFT_OUT) {
                    continue;
                }
                int t = leftOutState(a, st, e);
                if (t >= 0 && !keep[t]) {
                    add[t] = true;
                }
            }
        });
        return add;
    }
}
