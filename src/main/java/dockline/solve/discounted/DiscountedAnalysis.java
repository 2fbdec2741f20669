package dockline.solve.discounted;

import dockline.arena.Action;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import java.util.List;
import java.util.Optional;

/**
 * Everything one run of {@link DiscountedSolver#analyse} found out about a mission with the
 * discounted objective. Scores are discounted sums of energy deltas in units of the mission's
 * energy scale.
 *
 * @param mission              the mission as analysed
 * @param objective            discount factor, threshold and relation
 * @param verdict              whether the robot can always complete the mission with the score
 *                             condition (and, if {@code reserveKept}, the reserve floor) met
 * @param maxAbsWeight         the weight bound mu of the comparator (largest energy delta in the arena)
 * @param reserveKept          whether the reserve floor was checked as well
 * @param comparatorStates     comparator states discovered (initial state and accepting sink included)
 * @param comparatorStateBound the comparator's a-priori state bound
 * @param productVertices      vertices of the product game
 * @param productEdges         edges of the product game
 * @param estimate             its size estimated before building
 * @param buildMillis          time to build the product
 * @param solveMillis          time to build and solve it
 * @param totalMillis          time of the whole analysis (baseline included)
 * @param worstCaseScore       when guaranteed: the lowest score any allowed disturbance sequence can
 *                             force against the robot's strategy (empty if 64-bit rationals do not suffice)
 * @param nominalPlan          when guaranteed: the robot's actions when no disturbance happens
 * @param baseline             the optimisation baseline, when asked for
 * @param game                 the product game
 * @param solution             its solution
 * @param notes                things the reader should know
 *
 * <p>Data only (an immutable result).
 */
public record DiscountedAnalysis(Mission mission, Objective.Discounted objective, Verdict verdict, int maxAbsWeight,
                                 boolean reserveKept, int comparatorStates, long comparatorStateBound,
                                 long productVertices, long productEdges, SizeEstimate estimate, long buildMillis,
                                 long solveMillis, long totalMillis, Optional<Rational> worstCaseScore,
                                 List<Action> nominalPlan, Optional<Baseline> baseline, ProductGame game,
                                 Solution solution, List<String> notes) {

    public DiscountedAnalysis {
        nominalPlan = List.copyOf(nominalPlan);
        notes = List.copyOf(notes);
    }

    public boolean guaranteed() {
        return verdict == Verdict.GUARANTEED;
    }

    /**
     * The optimisation route on the arena without the tasks and without the battery: value
     * iteration for the optimal discounted value, then the comparison with the threshold.
     *
     * @param holds                the optimisation route's answer to "score relation threshold"
     * @param lower                lower end of the value enclosure at the start
     * @param upper                upper end of the value enclosure at the start
     * @param optimalValue         the exact optimal value (empty if 64-bit rationals do not suffice)
     * @param optimalPlayCompletes whether the play of the value-optimal strategies completes the
     *                             mission (empty when the value could not be pinned)
     * @param sweeps               value-iteration rounds
     */
    public record Baseline(boolean holds, Rational lower, Rational upper, Optional<Rational> optimalValue,
                           Optional<Boolean> optimalPlayCompletes, int sweeps) {
    }
}
