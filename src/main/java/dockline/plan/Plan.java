package dockline.plan;

import dockline.margin.MarginReport;
import dockline.margin.Suggestion;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.solve.reserve.ChargeNeeded;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.fast.FastPath;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.NeedBounds;
import dockline.policy.ThresholdPolicy;
import dockline.policy.Policy;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveSolver;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Everything {@link MissionPlanner#plan} found out about one mission: the one result every front end
 * prints or shows. Energy figures are in units of the mission's energy scale.
 *
 * @param mission             the mission as planned (overrides applied)
 * @param objective           the objective answered: the reserve floor, or the mission's discounted score
 * @param verdict             guaranteed or not
 * @param method              the method used
 * @param methodReason        why that method, in words
 * @param policy              the reported policy (certified when {@code certification.ok()}), when there is one
 * @param policyChoice        which guaranteed policy it is (null when no choice was made: fast path,
 *                            discounted, verdict only, margins)
 * @param policyFloorUnits    the floor of the game the policy comes from (the highest floor for the safest policy)
 * @param certification       the independent certificate of the policy
 * @param lowestLevelUnits    the lowest battery level the disturbances can force under the policy
 * @param worstScore          the lowest discounted score they can force under it (discounted objective)
 * @param highestFloorUnits   the highest reserve floor that can be guaranteed from the start; empty when none
 *                            can, or when it was not searched
 * @param highestFloorSearched whether that search ran to the end
 * @param lowestStartUnits    the lowest starting charge that guarantees the mission's floor (margins and the
 *                            charging route)
 * @param suggestions         what would make a mission that is not guaranteed guaranteed, smallest change first
 * @param suggestionsNote     why there are no suggestions although they were asked for, or null
 * @param replays             the replays, when asked for
 * @param heatMap             the charge needed from every situation, when asked for (the product route: exact)
 * @param heatBounds          the charge needed from every situation as a lower and an upper bound, when asked for
 *                            (the charging route: exact on a whole arena, bounds on the kept closure phases)
 * @param size                the size of the game solved
 * @param timings             where the time went
 * @param notes               things the reader should know
 * @param detail              what only this method computes (for the front ends' method-specific lines)
 */
public record Plan(Mission mission, Objective objective, Verdict verdict, Method method, String methodReason,
                   Optional<Policy> policy, PolicyChoice policyChoice, int policyFloorUnits,
                   Certification certification, OptionalInt lowestLevelUnits, Optional<Rational> worstScore,
                   OptionalInt highestFloorUnits, boolean highestFloorSearched, OptionalInt lowestStartUnits,
                   List<Suggestion> suggestions, String suggestionsNote, Optional<PlanReplays> replays,
                   Optional<ChargeNeeded> heatMap, Optional<NeedBounds> heatBounds, Size size, Timings timings,
                   List<String> notes, Detail detail) {

    public Plan {
        suggestions = List.copyOf(suggestions);
        notes = List.copyOf(notes);
    }

    /** A plan without heat bounds (every route but the charging route asked for a heat map). */
    public Plan(Mission mission, Objective objective, Verdict verdict, Method method, String methodReason,
                Optional<Policy> policy, PolicyChoice policyChoice, int policyFloorUnits, Certification certification,
                OptionalInt lowestLevelUnits, Optional<Rational> worstScore, OptionalInt highestFloorUnits,
                boolean highestFloorSearched, OptionalInt lowestStartUnits, List<Suggestion> suggestions,
                String suggestionsNote, Optional<PlanReplays> replays, Optional<ChargeNeeded> heatMap, Size size,
                Timings timings, List<String> notes, Detail detail) {
        this(mission, objective, verdict, method, methodReason, policy, policyChoice, policyFloorUnits, certification,
                lowestLevelUnits, worstScore, highestFloorUnits, highestFloorSearched, lowestStartUnits, suggestions,
                suggestionsNote, replays, heatMap, Optional.empty(), size, timings, notes, detail);
    }

    /** This plan with the given heat bounds. */
    public Plan withHeatBounds(NeedBounds bounds) {
        return new Plan(mission, objective, verdict, method, methodReason, policy, policyChoice, policyFloorUnits,
                certification, lowestLevelUnits, worstScore, highestFloorUnits, highestFloorSearched, lowestStartUnits,
                suggestions, suggestionsNote, replays, heatMap, Optional.of(bounds), size, timings, notes, detail);
    }

    public boolean guaranteed() {
        return verdict == Verdict.GUARANTEED;
    }

    /**
     * Whether a note of {@link #notes()} only tells how the charging route's pass went: {@code check} prints it for
     * the record, a picture's headline leaves it out.
     */
    public static boolean passNote(String note) {
        return note.startsWith(MissionPlanner.CHARGING_NOTE_START);
    }

    /** Whether a note of {@link #notes()} tells how many closure phases were kept (a plan phase by phase). */
    public static boolean phasesNote(String note) {
        return note.startsWith(PhaseRounds.NOTE_START);
    }

    /** Whether only the verdict was computed. */
    public boolean verdictOnly() {
        return detail instanceof Detail.VerdictOnlyFast || detail instanceof Detail.VerdictOnlyProduct;
    }

    /**
     * The size of the game solved.
     *
     * @param vertices          vertices of the game (for the fast path: arena × goal)
     * @param edges             its edges (implicit route: edges scanned until the start was decided); -1 unknown
     * @param exploredVertices  vertices the solver expanded (-1 when not counted)
     * @param estimate          the size estimated before building, or null
     */
    public record Size(long vertices, long edges, long exploredVertices, SizeEstimate estimate) {
    }

    /**
     * Where the time went, in milliseconds.
     *
     * @param compileMillis compiling the arena and the goal automaton (once per plan)
     * @param buildMillis   building the game of the verdict
     * @param solveMillis   building and solving it, with the policy and worst case
     * @param totalMillis   the whole plan (certificate, highest floor, suggestions, replays included)
     */
    public record Timings(long compileMillis, long buildMillis, long solveMillis, long totalMillis) {
    }

    /** What only one method computes; the front ends use it for their method-specific lines. */
    public sealed interface Detail permits Detail.Product, Detail.Fast, Detail.Charging, Detail.VerdictOnlyFast,
            Detail.VerdictOnlyProduct, Detail.Margins, Detail.Discounted {

        /** The product route's (implicit or stored) analysis. */
        record Product(ReserveAnalysis analysis) implements Detail {
        }

        /** The fast path's analysis (need from the start, closed loop of the policy). */
        record Fast(FastPath.Analysis analysis) implements Detail {
        }

        /**
         * The charging route's analysis and its threshold policy (null when no floor can be guaranteed).
         */
        record Charging(ChargingRoute.Analysis analysis, ThresholdPolicy thresholds) implements Detail {
        }

        /** The fast path's early exit. */
        record VerdictOnlyFast(FastPath.Analysis analysis) implements Detail {
        }

        /** The product game decided without storing it. */
        record VerdictOnlyProduct(ReserveSolver.ImplicitVerdict verdict) implements Detail {
        }

        /** Both margins computations. */
        record Margins(MarginReport report) implements Detail {
        }

        /** The comparator product's analysis. */
        record Discounted(DiscountedAnalysis analysis) implements Detail {
        }
    }
}
