package dockline.plan;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.charging.ChargingPolicies;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import dockline.solve.charging.FloorSweep;
import dockline.solve.fast.MinChargeSolver;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.BooleanSupplier;

/**
 * The charging route on a mission with lasting closures, phase by phase: the same figures as the charging
 * route on the whole arena (verdict at the mission's floor, highest guaranteed floor, lowest starting charge),
 * found on an arena of only some closure phases
 * ({@code states} must be {@link #states}'s for the mission). A <em>phase</em> is a set of closed doors and zones (all
 * disturbance states with those closures); a round compiles the kept phases only
 * ({@link ArenaCompiler#compileWithin}: a closure into a left-out phase is an edge of energy change
 * {@link ArenaCompiler#LEFT_OUT}). Two games live on it:
 * <ul>
 *   <li>the <em>weakened</em> game (a left-out closure loses): its wins are real wins, so its highest floor
 *       h<sub>w</sub> is a lower bound of the mission's and its need at the start an upper bound;</li>
 *   <li>the <em>strengthened</em> game (a left-out closure is not the building's to choose): its losses are
 *       real losses, so h<sub>s</sub> is an upper bound and its need a lower bound.</li>
 * </ul>
 * A round runs the strengthened pass and plays its threshold policy from the start (at floor h<sub>s</sub> from
 * the starting level, and at the mission's floor from the strengthened lowest start), every outcome followed.
 * If those plays meet no left-out closure, the policy wins the weakened game as well, so h<sub>w</sub> =
 * h<sub>s</sub> and the needs agree: the figures are the mission's, and the weakened pass, run once at the end,
 * gives the policy (its figures are checked to agree; if they did not, the whole arena would answer). Otherwise
 * the phases of the left-out closures the plays meet are added and the next round starts; each such round adds
 * a phase, so the rounds end. When the strengthened game wins nothing from the start, neither does the mission.
 * For the verdict alone the plays at the mission's floor from the starting level decide. This is two-sided
 * abstraction refinement for games (T. A. Henzinger, R. Jhala and R. Majumdar, "Counterexample-guided
 * control", ICALP 2003): the abstract strategy is checked on the concrete game and the abstraction refined
 * only where it relies on what was left out.
 *
 * <p>At the end the weakened game on the final restricted arena gives the policy (certified there by the
 * independent checker, for which a left-out closure loses, so a certified policy never risks one and plays
 * the same in the mission) and the strengthened one the counterexample's region (its losses are real, and the
 * building's answers outside it never need a left-out closure).
 *
 * <p>Cost: per round one restricted compile, one charging pass on the kept phases
 * ({@link dockline.solve.charging.FloorSweep}) and a walk of the strengthened policy's plays, and one more pass
 * in the last round; at most as many
 * rounds as there are closure sets (a mission that needs every phase is then no cheaper than the whole arena).
 */
final class LastingPhases {

    private LastingPhases() {
    }

    /**
     * What the refinement found.
     *
     * @param arena         the restricted arena of the last round
     * @param solver        the charging game on it
     * @param weakened      the weakened pass (a left-out closure loses): the plan's figures and policy; the
     *                      strengthened pass itself when that one wins nothing from the start (nor at the floor),
     *                      and for the verdict alone (whose plays then met no left-out closure)
     * @param strengthened  the strengthened pass (a left-out closure is not the building's): the region of the
     *                      counterexample
     * @param rounds        rounds of the refinement
     * @param keptStates    disturbance states kept in the end
     * @param totalStates   the mission's disturbance states
     * @param compileMillis wall time of the restricted compiles, all rounds
     */
    record Result(Arena arena, ChargingSolver solver, ChargingRoute.Analysis weakened,
                  ChargingRoute.Analysis strengthened, int rounds, int keptStates, int totalStates,
                  long compileMillis) {

        /** The note of the plan. */
        String note() {
            return PhaseRounds.note(keptStates, totalStates, rounds, "a closure into a left-out phase counted as not"
                    + " the building's, until the policy's plays meet none; the figures checked with such a closure lost");
        }
    }

    /**
     * Disturbance states above which the phases are not tried: the table of states is built whole before the
     * first round (about a hundred bytes a state), and an arena of that many states is refused by the whole
     * arena's compile anyway, with its real size and what to change, unless the heap is very large.
     */
    static final int MAX_STATES = 1 << 18;

    /**
     * The mission's disturbance states when it has doors or zones that a lasting event closes (only then is
     * there a phase to leave out) and at most {@link #MAX_STATES} of them; else empty (the whole arena).
     */
    static Optional<DisturbanceStates> states(Mission mission) {
        if (ArenaCompiler.disturbanceStateCount(mission, MAX_STATES) < 0) {
            return Optional.empty();
        }
        DisturbanceStates st = ArenaCompiler.states(mission);
        return st.itemCount() > 0 ? Optional.of(st) : Optional.empty();
    }

    /**
     * {@link #solve} when the mission has something a lasting event closes (and at most {@link #MAX_STATES}
     * states), with the plan's cancellation flag; empty for the whole arena.
     */
    static Optional<Result> of(Mission mission, PlanOptions options, boolean fastFirst) {
        Optional<DisturbanceStates> st = states(mission);
        if (st.isEmpty()) {
            return Optional.empty();
        }
        return solve(mission, st.get(), GoalAutomaton.of(mission), fastFirst, options.cancelled());
    }

    /**
     * The charging route's figures phase by phase, exact; empty when the mission is to be planned on the whole
     * arena: the fast path may apply ({@code fastFirst}, the automatic route: the robot may be unable to charge
     * before the end), the charging game does not apply, or a round could not refine (never expected; the whole
     * arena then answers, never a guess).
     */
    static Optional<Result> solve(Mission mission, DisturbanceStates st, GoalAutomaton goal, boolean fastFirst,
                                  BooleanSupplier cancelled) {
        return refine(mission, st, goal, fastFirst, false, cancelled);
    }

    /**
     * The verdict at the mission's floor only (the rounds stop once a weakened win or a strengthened loss is
     * found); empty as for {@link #solve}.
     */
    static Optional<Boolean> wins(Mission mission, DisturbanceStates st, GoalAutomaton goal,
                                  BooleanSupplier cancelled) {
        return refine(mission, st, goal, false, true, cancelled).map(r -> r.weakened().guaranteed());
    }

    /** The rounds; every pass polls {@code cancelled} (a {@code CancellationException} when it is raised). */
    private static Optional<Result> refine(Mission mission, DisturbanceStates st, GoalAutomaton goal,
                                           boolean fastFirst, boolean verdictOnly, BooleanSupplier cancelled) {
        PhaseRounds rounds = new PhaseRounds(mission, st);
        int cap = mission.capacityUnits();
        int floor = mission.reserveUnits();
        int start = mission.startUnits();
        while (true) {
            Arena a = rounds.compile();
            // the restricted arena's plays are plays of the mission, so a charge it can reach before the end is
            // one the whole arena can reach: only when it finds none may the fast path apply
            if (rounds.round() == 1 && fastFirst && MinChargeSolver.applicable(a, goal)) {
                return Optional.empty();
            }
            ChargingSolver solver;
            try {
                solver = new ChargingSolver(a, goal, cancelled);
            } catch (IllegalArgumentException | ArithmeticException e) {
                return Optional.empty();
            }
            ChargingRoute.Analysis s = ChargingRoute.analyse(solver, cap, floor, start, true);
            java.util.function.IntConsumer mark = rounds::meet;
            // the strengthened policy's plays: where they meet no left-out closure, that policy wins the weakened
            // game too, so the weakened figure is the same; the weakened pass is run only once all of them agree
            OptionalInt hs = s.highestFloorUnits();
            boolean lost;
            if (verdictOnly) {
                lost = !s.guaranteed();
                if (!lost) {
                    ChargingPolicies.leftOutOutcomes(solver, s.values(), floor, start, cap, mark);
                }
            } else {
                lost = hs.isEmpty() && s.startNeed() == ChargingSolver.INFINITE;
                if (hs.isPresent()) {
                    ChargingPolicies.leftOutOutcomes(solver, s.highest(), hs.getAsInt(), start, cap, mark);
                }
                if (s.startNeed() != ChargingSolver.INFINITE) {
                    ChargingPolicies.leftOutOutcomes(solver, s.values(), floor, floor + s.startNeed(), cap, mark);
                }
            }
            // the weakened pass: in full when the plays met nothing left out (its figures must then agree); else
            // only while its highest floor can still reach the strengthened one (or the mission's floor, for the
            // verdict), which it often cannot, and then the phases met are added without finishing it
            ChargingRoute.Analysis w = null;
            if (lost || verdictOnly && !rounds.met()) {
                w = s; // nothing won, so nothing in the weakened game either; or the plays won it as they are
            } else if (verdictOnly || hs.isPresent()) {
                long tw = System.nanoTime();
                Optional<FloorSweep> ws = FloorSweep.runReaching(solver, cap, floor, start,
                        verdictOnly ? floor : hs.getAsInt());
                w = ws.isPresent() ? ChargingRoute.of(ws.get(), tw) : null;
            } else if (!rounds.met()) {
                w = ChargingRoute.analyse(solver, cap, floor, start, false);
            }
            boolean agree = lost || w != null && (verdictOnly ? w.guaranteed()
                    : w.highestFloorUnits().equals(hs) && w.startNeed() == s.startNeed());
            if (agree) {
                return Optional.of(new Result(a, solver, w, s, rounds.round(), rounds.kept(), rounds.total(),
                        rounds.compileMillis()));
            }
            if (!rounds.met() || !rounds.refine()) {
                return Optional.empty(); // not expected (class comment): the whole arena answers
            }
        }
    }
}
