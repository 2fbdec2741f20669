package dockline.plan;

import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.margin.Suggestion;
import dockline.margin.Suggestions;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.solve.ProductTooLargeException;
import dockline.solve.fast.FastPath;
import dockline.solve.fast.MinChargeSolver;
import dockline.solve.reserve.ReserveSolver;
import dockline.util.MonotoneSearch;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The plans of the fast path ({@link FastPath}, no charging before the end) for {@link MissionPlanner}: on the
 * whole arena, and phase by phase on a mission with lasting closures ({@link LastingFast}) for the automatic
 * route, the fast route and the verdict alone. The policy of least need is re-checked by the independent
 * {@link CertificateChecker} on the arena it was found on (on a restricted arena a closure into a left-out phase
 * loses there, so a certified policy never risks one). Cost: the route's solve, the certificate O(closed loop),
 * and when not guaranteed the suggestions (phase by phase: O(log K) verdicts, the other two from the need).
 */
final class FastPlans {

    private FastPlans() {
    }

    /** Why the automatic route takes the fast path. */
    static final String AUTO_REASON = "the robot cannot charge on a dock before the mission is complete, so the"
            + " battery levels need not be in the game";

    /** Why the fast route is taken when asked for. */
    static final String FAST_REASON = "the fast path was asked for, and it applies: the robot cannot charge before"
            + " the end";

    /**
     * The fast path phase by phase when the route asked for may take it (automatic, fast, or the verdict alone
     * where the fast path may answer) and the mission has lasting closures; empty for the whole arena (see
     * {@link LastingFast#of}).
     */
    static Optional<Plan> phased(Mission mission, PlanOptions options, long t0) {
        Route r = options.route();
        int maxRows = FastPath.DEFAULT_MAX_POLICY_ROWS;
        boolean verdictOnly = false;
        String reason = AUTO_REASON;
        if (r instanceof Route.Fast f) {
            maxRows = f.maxPolicyRows();
            reason = FAST_REASON;
        } else if (r instanceof Route.VerdictOnly v && v.where() != Route.VerdictOnly.Where.PRODUCT) {
            verdictOnly = true;
        } else if (!(r instanceof Route.Auto)) {
            return Optional.empty();
        }
        Optional<LastingFast.Result> lf = LastingFast.of(mission, maxRows, verdictOnly, options.memoryBudgetBytes());
        if (lf.isEmpty()) {
            return Optional.empty();
        }
        LastingFast.Result p = lf.get();
        MissionPlanner.Context c = new MissionPlanner.Context(mission, p.arena(), p.goal(), options, t0,
                p.compileMillis());
        return Optional.of(verdictOnly ? verdictOnly(c, p.analysis(), List.of(p.note()))
                : plan(c, p.analysis(), reason, p.note()));
    }

    /**
     * The plan of the fast path's analysis {@code a} on the context's arena; {@code note} (or null: the whole
     * arena) is the phases' note, which also has the suggestions found from the need and phased verdicts.
     */
    static Plan plan(MissionPlanner.Context c, FastPath.Analysis a, String reason, String note) {
        Mission m = c.mission();
        Certification cert;
        if (a.policy().isPresent()) {
            Certificate ct = CertificateChecker.check(c.arena(), a.policy().get(), a.reserveUnits(), a.startUnits());
            int worst = a.worstCaseMinimumUnits().getAsInt();
            Optional<String> problem = ct.ok() && ct.worstMinimumUnits() == worst ? Optional.empty()
                    : Optional.of("the fast path says guaranteed with a worst level of " + worst + " units, but its"
                    + " policy " + (ct.ok() ? "has a worst level of " + ct.worstMinimumUnits() + " units under"
                    : "failed") + " the independent certificate: " + ct.reason());
            cert = new Certification.Reserve(ct, problem);
        } else if (a.guaranteed()) {
            cert = new Certification.NotChecked("the closed loop is too large (" + (a.loopTooLarge() ? "more than "
                    + a.maxPolicyRows() : Long.toString(a.loopStates())) + " states; the policy rows are written out"
                    + " and re-checked up to " + a.maxPolicyRows() + ")");
        } else {
            cert = new Certification.NotChecked("not guaranteed: there is no policy to certify");
        }
        List<Suggestion> suggestions = List.of();
        String suggestionsNote = null;
        List<String> notes = new ArrayList<>();
        if (note != null) {
            notes.add(note);
        }
        if (!a.guaranteed()) {
            try {
                suggestions = note != null ? phasedSuggestions(c, a) : Suggestions.find(m, c.product(),
                        a.highestGuaranteedReserveUnits().isPresent() ? a.highestGuaranteedReserveUnits()
                                : OptionalInt.of(-1));
            } catch (ProductTooLargeException e) {
                suggestionsNote = "no suggestions: they are searched on the product game, and " + e.getMessage();
                notes.add(suggestionsNote);
            }
        }
        return new Plan(m, new Objective.Reserve(), a.verdict(), Method.FAST, reason, a.policy(), null,
                a.highestGuaranteedReserveUnits().orElse(a.reserveUnits()), cert, a.worstCaseMinimumUnits(),
                Optional.empty(), a.highestGuaranteedReserveUnits(), true, OptionalInt.empty(), suggestions,
                suggestionsNote, Optional.empty(), Optional.empty(),
                new Plan.Size(a.pairVertices(), -1, a.exploredVertices(), null),
                new Plan.Timings(c.compileMillis(), 0, a.solveMillis(), c.elapsed()), notes, new Plan.Detail.Fast(a));
    }

    /**
     * The suggestions of a mission the fast path does not guarantee, without the product game's bisections: the
     * lowest start is floor + need (the need does not depend on the start, and guaranteed ⇔ need ≤ start −
     * floor; FastPath's class comment), the highest floor start − need, and the largest budget below K by
     * bisection over the fast path's verdicts (phase by phase; a variant it does not apply to is decided on the
     * product game, as {@link Suggestions#find(Mission, dockline.solve.ProductOptions, OptionalInt)} does).
     */
    private static List<Suggestion> phasedSuggestions(MissionPlanner.Context c, FastPath.Analysis a) {
        Mission m = c.mission();
        int floor = m.reserveUnits();
        int cap = m.capacityUnits();
        long need = a.startNeedUnits();
        int lowest = need != MinChargeSolver.INFINITE && floor <= cap && floor + need <= cap ? (int) (floor + need)
                : -1;
        int k = m.map().disturbances().budget();
        int budget = MonotoneSearch.highest(-1, k - 1, b -> {
            Mission v = m.withBudget(b);
            return LastingFast.wins(v, c.options().memoryBudgetBytes())
                    .orElseGet(() -> ReserveSolver.guaranteed(v, c.product()));
        });
        return Suggestions.find(m, lowest, a.highestGuaranteedReserveUnits().orElse(-1), budget);
    }

    /** The plan of the verdict alone by the fast path ({@code notes}: the phases', or none). */
    static Plan verdictOnly(MissionPlanner.Context c, FastPath.Analysis a, List<String> notes) {
        return new Plan(c.mission(), new Objective.Reserve(), a.verdict(), Method.FAST, "only the verdict was asked"
                + " for, and the robot cannot charge before the end: the fast path stops once it is known",
                Optional.empty(), null, a.reserveUnits(), new Certification.NotChecked(
                "verdict only, not certified"), OptionalInt.empty(), Optional.empty(), OptionalInt.empty(),
                false, OptionalInt.empty(), List.of(), null, Optional.empty(), Optional.empty(),
                new Plan.Size(a.pairVertices(), -1, a.exploredVertices(), null),
                new Plan.Timings(c.compileMillis(), 0, a.solveMillis(), c.elapsed()), notes,
                new Plan.Detail.VerdictOnlyFast(a));
    }
}
