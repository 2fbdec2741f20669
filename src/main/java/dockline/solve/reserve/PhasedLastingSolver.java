package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.goal.GoalAutomaton;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.monitor.ReserveMonitor;
import dockline.solve.ProductOptions;
import dockline.util.LongIntMap;
import java.util.Arrays;
import java.util.function.BooleanSupplier;

/**
 * The reserve game of a mission with lasting events, solved phase by phase: a <em>phase</em> is a set of
 * doors and zones closed (all disturbance states with that closure set; each closure spends an event, so a
 * phase with C closed is a game of the map with C closed and at most K - |C| events). Only the phases the
 * robot's winning attempts run into are built.
 *
 * <p>The kept phases are compiled into a restricted arena ({@link ArenaCompiler#compileWithin}) in which a
 * closure into a left-out phase loses; that game is solved with {@link ImplicitReserveGame}. If the start is
 * won there it is won in the mission (the robot's winning policy never risks a left-out closure). If not,
 * the solve ran to the end and its winning region W is the least fixpoint of the restricted game. From the
 * start, a forward search follows the plays the building can keep outside W: from a robot triple not in W
 * every action, and from an action every real outcome not in W. An action met there whose real outcomes are
 * all in W but which has a left-out closure outcome is the frontier: the phase of that closure is added, and
 * the game is solved again. When the search meets no frontier, the building has a strategy in the mission
 * itself that keeps every play from the start outside W using real outcomes only (every action it meets has a
 * real outcome outside W, or a real loss), and W holds every completion, so the start is lost in the mission
 * as well: the verdict is exact either way. The attractor is that of
 * Grädel, Thomas and Wilke (eds.), "Automata, Logics, and Infinite Games", LNCS 2500 (2002), ch. 2; the
 * refinement of a pessimistic abstraction by its frontier is the counterexample-guided idea of Henzinger,
 * Jhala and Majumdar, "Counterexample-guided control" (ICALP 2003), here without any approximation left at
 * the end.
 *
 * <p>Cost: one restricted compile and solve per round, each O(size of the kept phases' product); at most
 * as many rounds as there are closure sets, and then no cheaper than the whole arena (a mission the robot
 * cannot win needs every phase its attempts reach).
 */
public final class PhasedLastingSolver {

    private PhasedLastingSolver() {
    }

    /**
     * What the phased solve found.
     *
     * @param startWon   the verdict at the monitor's floor (exact)
     * @param arena      the restricted arena of the last round (its kept phases)
     * @param game       the game on it
     * @param strategy   the last round's solve (its recorded choices give a policy when the start is won)
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
        while (true) {
            rounds++;
            Arena a = ArenaCompiler.compileWithin(mission, st, keep);
            ImplicitReserveGame game = ReserveSolver.implicitGame(a, goal, monitor, po);
            ImplicitReserveGame.Strategy s = game.solveWithStrategy(cancelled);
            int kept = 0;
            for (boolean k : keep) {
                kept += k ? 1 : 0;
            }
            if (s.startWon()) {
                return new Result(true, a, game, s, rounds, kept, st.count());
            }
            boolean[] add = frontier(a, st, goal, monitor, s, keep, game.start());
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
            if (!any) {
                return new Result(false, a, game, s, rounds, kept, st.count());
            }
        }
    }

    /** Whether the robot wins at the monitor's floor (exact); see {@link #solve}. */
    public static boolean wins(Mission mission, GoalAutomaton goal, ReserveMonitor monitor, ProductOptions po) {
        return solve(mission, goal, monitor, po).startWon();
    }

    /**
     * The left-out states worth adding, found from the start: a forward search over the robot triples that
     * are not won (the plays the building can keep outside W), following at each action every real outcome that
     * is not won; an action whose real outcomes are all won but that has a left-out closure outcome is the
     * frontier, and the state that closure leads to is added. When there is none, the building keeps every play
     * from the start outside W with real outcomes only, so the start is lost in the mission too (exact).
     * O(triples searched x out-degree).
     */
    private static boolean[] frontier(Arena a, DisturbanceStates st, GoalAutomaton goal, ReserveMonitor monitor,
                                      ImplicitReserveGame.Strategy s, boolean[] keep, long startTriple) {
        boolean[] add = new boolean[st.count()];
        if (startTriple < 0) {
            return add; // the start itself is lost (below the floor, or in an avoided zone)
        }
        long levels = monitor.stateBound();
        long gc = goal.stateCount();
        int a0 = a.startVertex();
        int g0 = goal.initial(a.cellZones(a.cell(a0)));
        int s0 = monitor.initialState();
        LongIntMap seen = new LongIntMap(1 << 12);
        long[] queue = new long[1 << 12];
        int head = 0;
        int tail = 0;
        long k0 = (a0 * gc + g0) * levels + s0;
        seen.put(k0, 1);
        queue[tail++] = k0;
        while (head < tail) {
            long key = queue[head++];
            int lv = (int) (key % levels);
            int g = (int) ((key / levels) % gc);
            int r = (int) (key / levels / gc);
            for (int re = a.outBegin(r); re < a.outEnd(r); re++) {
                int d = a.target(re);
                int leftOut = -1;
                boolean realNotWon = false;
                for (int e = a.outBegin(d); e < a.outEnd(d); e++) {
                    if (a.weight(e) == ArenaCompiler.LEFT_OUT) {
                        leftOut = e;
                        continue;
                    }
                    int ns = monitor.step(lv, a.weight(e));
                    int u = a.target(e);
                    int ng = ns == ReserveMonitor.REJECT ? GoalAutomaton.REJECT : goal.step(g, a.cellZones(a.cell(u)));
                    if (ng == GoalAutomaton.REJECT) {
                        realNotWon = true; // a real loss: the building may end the play here
                        continue;
                    }
                    if (s.robotWins(u, ng, ns)) {
                        continue;
                    }
                    realNotWon = true;
                    long ku = (u * gc + ng) * levels + ns;
                    if (seen.get(ku) < 0) {
                        seen.put(ku, 1);
                        if (tail == queue.length) {
                            queue = Arrays.copyOf(queue, 2 * queue.length);
                        }
                        queue[tail++] = ku;
                    }
                }
                if (leftOut >= 0 && !realNotWon) {
                    // the item the closure would close: the door tried, or the blockage rule's zone
                    int item = a.event(leftOut) == EventKind.DOOR_SHUT.ordinal() ? st.doorItem(a.actionTarget(d))
                            : st.blockageItem(a.rule(leftOut));
                    int t = st.after(a.state(d), a.rule(leftOut), item);
                    if (t >= 0 && !keep[t]) {
                        add[t] = true;
                    }
                }
            }
        }
        return add;
    }

    /** Whether every outcome of disturbance vertex d but {@code skip}, from goal state g and level lv, is won. */
    private static boolean othersWon(Arena a, GoalAutomaton goal, ReserveMonitor monitor,
                                     ImplicitReserveGame.Strategy s, int d, int skip, int g, int lv) {
        for (int e = a.outBegin(d); e < a.outEnd(d); e++) {
            if (e == skip) {
                continue;
            }
            int ns = monitor.step(lv, a.weight(e));
            if (ns == ReserveMonitor.REJECT) {
                return false;
            }
            int u = a.target(e);
            int ng = goal.step(g, a.cellZones(a.cell(u)));
            if (ng == GoalAutomaton.REJECT || !s.robotWins(u, ng, ns)) {
                return false;
            }
        }
        return true;
    }
}
