package dockline.plan;

import dockline.arena.Arena;
import dockline.arena.DisturbanceStates;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.solve.fast.FastPath;
import dockline.solve.fast.MinChargeSolver;
import java.util.Optional;

/**
 * The fast path (no charging before the end) on a mission with lasting closures, phase by phase: the same
 * figures as {@link FastPath} on the whole closure arena (the start's need, hence the verdict, the highest
 * guaranteed floor and the worst level under the policy of least need) and a policy of least need, found on an
 * arena of only some closure phases ({@link PhaseRounds}). Each round runs the <em>strengthened</em> pass
 * ({@link FastPath#analyseStrengthened}: a closure into a left-out phase is not the building's to choose), whose
 * need is a lower bound of the mission's: when it is infinite (or, for the verdict alone, above the energy
 * available) the mission's is too. Otherwise the closed loop of its policy from the start is walked: when it
 * meets no left-out closure that policy plays in the mission as it is, so its need is also an upper bound and
 * the figures are the mission's (its policy is then certified by the independent checker on the restricted
 * arena, where a left-out closure loses). Else the phases of the closures it meets are added and the next
 * round starts; each such round adds a phase, so the rounds end. Without charging the need is additive along a
 * play, so the loop's pairs (cell, disturbance state, goal state) decide, not their levels. This is two-sided
 * abstraction refinement for games (T. A. Henzinger, R. Jhala and R. Majumdar, "Counterexample-guided
 * control", ICALP 2003), as {@link LastingPhases} does for the charging route.
 *
 * <p>When it applies: the mission has something a lasting event closes (at most {@link LastingPhases#MAX_STATES}
 * states) and the first round's arena reaches no charge before the end. That arena's plays, with a left-out
 * closure read as staying put, reach every pair (cell, goal state) the whole arena's do (a closed cell only takes
 * moves away, and a closure only spends an event), so the whole arena reaches no charge before the end either:
 * the fast path applies to the mission.
 *
 * <p>Cost: per round one restricted compile, one Knuth search on it and a walk of the policy's loop; at most as
 * many rounds as there are closure sets (a mission that needs every phase is then no cheaper than the whole
 * arena).
 */
final class LastingFast {

    private LastingFast() {
    }

    /**
     * What the refinement found.
     *
     * @param analysis      the fast path's analysis on the last round's arena (the plan's figures and policy)
     * @param goal          the goal automaton it was solved with
     * @param rounds        rounds of the refinement
     * @param keptStates    disturbance states kept in the end
     * @param totalStates   the mission's disturbance states
     * @param compileMillis wall time of the restricted compiles, all rounds
     */
    record Result(FastPath.Analysis analysis, GoalAutomaton goal, int rounds, int keptStates, int totalStates,
                  long compileMillis) {

        Arena arena() {
            return analysis.arena();
        }

        /** The note of the plan. */
        String note() {
            return PhaseRounds.note(keptStates, totalStates, rounds, "the fast path with a closure into a left-out"
                    + " phase counted as not the building's, until its policy's plays meet none");
        }
    }

    /**
     * The fast path's analysis phase by phase, exact; empty when the mission is to be planned on the whole arena:
     * nothing a lasting event closes (or too many states), the robot may charge before the end, or a round could
     * not refine (never expected; the whole arena then answers, never a guess).
     *
     * @param verdictOnly as for {@link FastPath#analyse(Mission, Arena, GoalAutomaton, int, boolean, long)}
     * @throws dockline.solve.ProductTooLargeException if a round's arena × goal is over the memory budget
     */
    static Optional<Result> of(Mission mission, int maxPolicyRows, boolean verdictOnly, long memoryBudgetBytes) {
        Optional<DisturbanceStates> st = LastingPhases.states(mission);
        if (st.isEmpty()) {
            return Optional.empty();
        }
        GoalAutomaton goal = GoalAutomaton.of(mission);
        PhaseRounds rounds = new PhaseRounds(mission, st.get());
        while (true) {
            Arena a = rounds.compile();
            if (rounds.round() == 1 && !MinChargeSolver.applicable(a, goal)) {
                return Optional.empty(); // a charge before the end (class comment)
            }
            Optional<FastPath.Analysis> f = FastPath.analyseStrengthened(mission, a, goal, maxPolicyRows, verdictOnly,
                    memoryBudgetBytes, rounds::meet);
            if (f.isEmpty()) {
                return Optional.empty(); // not expected: the first round's arena was found to apply
            }
            if (!rounds.met()) {
                return Optional.of(new Result(f.get(), goal, rounds.round(), rounds.kept(), rounds.total(),
                        rounds.compileMillis()));
            }
            if (!rounds.refine()) {
                return Optional.empty(); // not expected (class comment): the whole arena answers
            }
        }
    }

    /**
     * The fast path's verdict on a variant of the mission (another budget, compiled on its own): phase by phase
     * when it applies so, else on the whole arena; empty when the fast path does not apply to the variant.
     */
    static Optional<Boolean> wins(Mission mission, long memoryBudgetBytes) {
        Optional<Result> r = of(mission, FastPath.DEFAULT_MAX_POLICY_ROWS, true, memoryBudgetBytes);
        if (r.isPresent()) {
            return Optional.of(r.get().analysis().guaranteed());
        }
        return FastPath.analyse(mission, dockline.arena.ArenaCompiler.compile(mission), GoalAutomaton.of(mission),
                FastPath.DEFAULT_MAX_POLICY_ROWS, true, memoryBudgetBytes).map(FastPath.Analysis::guaranteed);
    }
}
