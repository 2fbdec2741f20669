package dockline.plan;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.certify.ClosedLoop;
import dockline.certify.DiscountedCertificate;
import dockline.certify.DiscountedCertificateChecker;
import dockline.goal.GoalAutomaton;
import dockline.margin.FixpointMargins;
import dockline.margin.MarginReport;
import dockline.margin.Margins;
import dockline.margin.Suggestion;
import dockline.margin.Suggestions;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.monitor.ReserveMonitor;
import dockline.solve.reserve.ChargeNeeded;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import dockline.solve.fast.FastPath;
import dockline.solve.charging.ChargingPolicies;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import dockline.solve.charging.FloorSweep;
import dockline.solve.WinningRegion;
import dockline.policy.ThresholdPolicy;
import dockline.util.MonotoneSearch;
import dockline.util.Progress;
import dockline.policy.Policy;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The one entry point from a loaded mission to everything the front ends report: {@link #plan}.
 *
 * <p>What it computes, by route ({@link Route}): the verdict; the method and why; the policy and its
 * independent certificate ({@link CertificateChecker}, {@link DiscountedCertificateChecker}; a failed
 * certificate is reported in {@link Plan#certification()}, never hidden); the lowest battery level the
 * disturbances can force under the policy; the highest guaranteed floor; with {@link Route.Margins} the
 * lowest starting charge, both two ways; the suggestions when not guaranteed; on request the replays and
 * the charge needed per situation; sizes, timings and notes.
 *
 * <p>The arena and the goal automaton are compiled once per plan and shared by every solve of the
 * mission's figures (the suggestions and margins probe variants of the figures, each compiled on its own).
 *
 * <p>Cost: one arena compile, O(cells × out-degree × budget); then the route's solve — fast path
 * O(m·G·log(n·G)) on arena × goal (Knuth 1977), the charging route one pass over arena × goal with every
 * floor at once ({@link dockline.solve.charging.FloorSweep}; its suggestions O(log K) more passes), product routes O(|V| + |E|) of the product
 * (linear-time attractor, Grädel, Thomas and Wilke 2002, ch. 2), times O(log start) for the highest
 * floor by bisection and one more solve for the safest policy; suggestions add O(log capacity + log K)
 * verdicts; the certificate is O(closed loop).
 */
public final class MissionPlanner {

    private MissionPlanner() {
    }

    /** How the charging route's note of its pass begins ({@link Plan#passNote}). */
    static final String CHARGING_NOTE_START = "charging route: one pass, ";

    /** The shared inputs of one plan. */
    record Context(Mission mission, Arena arena, GoalAutomaton goal, PlanOptions options, long t0,
                           long compileMillis) {
        ProductOptions product() {
            return options.product();
        }

        long elapsed() {
            return millis(System.nanoTime() - t0);
        }
    }

    /**
     * Plans the mission by the options' route.
     *
     * @throws RouteNotApplicableException                if the route asked for does not apply to the mission
     * @throws ProductTooLargeException                   if a game is over the memory budget
     * @throws ClosedLoop.TooLargeException               if a policy's closed loop is too large to certify
     * @throws java.util.concurrent.CancellationException if the options' cancellation flag was raised
     * @throws ArithmeticException                        if a figure needs more than exact 64-bit arithmetic
     * @throws IllegalArgumentException                   if the mission breaks an invariant of the arena or goal,
     *                                                    or the discounted route is asked for a mission without
     *                                                    a discounted objective
     */
    public static Plan plan(Mission mission, PlanOptions options) {
        long t0 = System.nanoTime();
        Optional<Plan> phased = FastPlans.phased(mission, options, t0);
        if (phased.isEmpty()) {
            phased = phasedCharging(mission, options, t0);
        }
        if (phased.isEmpty()) {
            phased = phasedMargins(mission, options, t0);
        }
        if (phased.isPresent()) {
            return phased.get();
        }
        Arena arena = ArenaCompiler.compile(mission);
        GoalAutomaton goal = GoalAutomaton.of(mission);
        Context c = new Context(mission, arena, goal, options, t0, millis(System.nanoTime() - t0));
        Route r = options.route();
        if (r instanceof Route.Auto a) {
            Optional<FastPath.Analysis> f = FastPath.analyse(mission, arena, goal, FastPath.DEFAULT_MAX_POLICY_ROWS,
                    false, options.memoryBudgetBytes());
            if (f.isPresent()) {
                return FastPlans.plan(c, f.get(), FastPlans.AUTO_REASON, null);
            }
            if (a.policy() == PolicyChoice.SAFEST) {
                Optional<ChargingSolver> cs = chargingSolver(c);
                if (cs.isPresent()) {
                    return charging(c, cs.get(), false, true, "the robot can charge on a dock before the mission is"
                            + " complete: the least charge per position with the good docks as targets, every floor"
                            + " in one pass, no battery levels in the game");
                }
            }
            return product(c, Route.Product.of(a.policy()), "the robot can charge on a dock before the mission is"
                    + " complete, so the battery levels are part of the game");
        }
        if (r instanceof Route.Charging ch) {
            Optional<ChargingSolver> cs = chargingSolver(c);
            if (cs.isPresent()) {
                return PictureRoute.withBounds(ch, cs.get(), options.cancelled(), charging(c, cs.get(), ch.replays(), ch.suggestions(),
                        "the charging route was asked for: the least charge per position with the good docks as"
                                + " targets, every floor in one pass"));
            }
            if (!ch.orProduct()) {
                throw new RouteNotApplicableException("the charging route does not apply: an energy gain other than"
                        + " a charge step on a dock");
            }
            // the pictures asked for heat bounds: here the product route's exact heat map stands in for them
            return product(c, PolicyChoice.SAFEST, false, null, true, ch.suggestions(), ch.replays(), ch.heatBounds(),
                    "the charging route does not apply (an energy gain other than a charge step on a dock), so the"
                            + " product game");
        }
        if (r instanceof Route.Fast f) {
            FastPath.Analysis a = FastPath.analyse(mission, arena, goal, f.maxPolicyRows(), false,
                            options.memoryBudgetBytes()).orElseThrow(MissionPlanner::fastDoesNotApply);
            return FastPlans.plan(c, a, FastPlans.FAST_REASON, null);
        }
        if (r instanceof Route.Product p) {
            return product(c, p, "the product game was asked for");
        }
        if (r instanceof Route.Stored s) {
            return product(c, s, "the reference route was asked for: the product game stored in arrays");
        }
        if (r instanceof Route.VerdictOnly v) {
            return verdictOnly(c, v);
        }
        if (r instanceof Route.Margins) {
            return margins(c);
        }
        return discounted(c, (Route.Discounted) r);
    }

    private static RouteNotApplicableException fastDoesNotApply() {
        return new RouteNotApplicableException("the fast path does not apply: the robot can charge on a dock before"
                + " the mission is complete, and the fast path counts consumption only");
    }

    // ---- charging route

    /** The charging route's solver, when its game applies (the only energy gains are charge steps on a dock). */
    private static Optional<ChargingSolver> chargingSolver(Context c) {
        try {
            return Optional.of(new ChargingSolver(c.arena(), c.goal(), c.options().cancelled()));
        } catch (IllegalArgumentException | ArithmeticException e) {
            return Optional.empty();
        }
    }

    private static Plan charging(Context c, ChargingSolver solver, boolean wantReplays, boolean wantSuggestions,
                                 String reason) {
        Mission m = c.mission();
        Progress.stage(5, "solving the game, every floor in one pass");
        ChargingRoute.Analysis a = ChargingRoute.analyse(solver, m.capacityUnits(), m.reserveUnits(), m.startUnits());
        return charging(c, solver, a, a, wantReplays, wantSuggestions, reason, null);
    }

    /**
     * The charging route on a mission with lasting closures, phase by phase ({@link LastingPhases}), when the
     * route asked for is the automatic one with the safest policy or the charging route: the whole arena is then
     * never built. Empty when the route is another, the mission has nothing a lasting event closes, or the
     * refinement hands the mission back to the whole arena (the fast path may apply, or no round could refine).
     */
    private static Optional<Plan> phasedCharging(Mission mission, PlanOptions options, long t0) {
        Route r = options.route();
        boolean auto = r instanceof Route.Auto a && a.policy() == PolicyChoice.SAFEST;
        if (!auto && !(r instanceof Route.Charging)) {
            return Optional.empty();
        }
        Optional<LastingPhases.Result> lp = LastingPhases.of(mission, options, auto);
        if (lp.isEmpty()) {
            return Optional.empty();
        }
        LastingPhases.Result p = lp.get();
        Context c = phasedContext(mission, options, t0, p);
        if (auto) {
            return Optional.of(charging(c, p.solver(), p.weakened(), p.strengthened(), false, true, "the robot can"
                    + " charge on a dock before the mission is complete: the least charge per position with the good"
                    + " docks as targets, every floor in one pass, no battery levels in the game", p.note()));
        }
        Route.Charging ch = (Route.Charging) r;
        return Optional.of(PictureRoute.withBounds(ch, p.solver(), options.cancelled(), charging(c, p.solver(), p.weakened(),
                p.strengthened(), ch.replays(), ch.suggestions(), "the charging route was asked for: the least charge"
                        + " per position with the good docks as targets, every floor in one pass", p.note())));
    }

    /**
     * The plan of the charging route from its analysis {@code a} on the context's arena; {@code losses} is an
     * analysis whose losses are real (the same one on a whole arena, the strengthened one on a restricted arena),
     * whose values at the mission's floor give the counterexample's region; {@code note} (or null) goes first
     * in the notes.
     */
    private static Plan charging(Context c, ChargingSolver solver, ChargingRoute.Analysis a,
                                 ChargingRoute.Analysis losses, boolean wantReplays, boolean wantSuggestions,
                                 String reason, String note) {
        List<String> notes = new ArrayList<>();
        if (note != null) {
            notes.add(note);
        }
        Mission m = c.mission();
        int floor = m.reserveUnits();
        int start = m.startUnits();
        int cap = m.capacityUnits();
        if (a.sweep().floorUnits() != floor || losses.sweep().floorUnits() != floor) {
            throw new IllegalArgumentException("internal: a charging analysis of another floor than the mission's");
        }
        OptionalInt highest = a.highestFloorUnits();
        ThresholdPolicy thresholds = null;
        ClosedLoop loop = null;
        Certification cert;
        Progress.stage(55, a.guaranteed() ? "certifying the policy" : "certifying the best effort"
                + (wantSuggestions ? " and looking for suggestions" : ""));
        if (highest.isPresent()) {
            int hf = highest.getAsInt();
            thresholds = ChargingPolicies.thresholds(solver, a.highest(), hf, start, cap);
            // never a silent "guaranteed": the thresholds are re-checked on an independent code path; a mission
            // that is not guaranteed gets its best effort certified at the highest floor, for the replays
            ClosedLoop l = CertificateChecker.closedLoop(c.arena(), thresholds, a.guaranteed() ? floor : hf, start);
            Certificate ct = CertificateChecker.certify(l);
            if (a.guaranteed()) {
                Optional<String> problem = ct.ok() && ct.worstMinimumUnits() == hf ? Optional.empty()
                        : Optional.of("the charging route says guaranteed with a worst level of " + hf + " units, but"
                        + " its threshold policy " + (ct.ok() ? "has a worst level of " + ct.worstMinimumUnits()
                        + " units under" : "failed") + " the independent certificate: " + ct.reason());
                cert = new Certification.Reserve(ct, problem);
            } else {
                cert = new Certification.NotChecked("not guaranteed: there is no policy to certify");
            }
            if (ct.ok()) {
                loop = l;
            } else if (!a.guaranteed() && wantReplays) {
                throw new IllegalStateException("internal: the policy for the highest guaranteed floor " + hf
                        + " units could not be certified: " + ct.reason());
            }
        } else {
            cert = new Certification.NotChecked("not guaranteed: there is no policy to certify");
        }
        Optional<Policy> policy = a.guaranteed() && cert.ok() ? Optional.of(loop.policy()) : Optional.empty();
        List<Suggestion> suggestions = List.of();
        if (wantSuggestions && !a.guaranteed()) {
            int k = m.map().disturbances().budget();
            int budget = MonotoneSearch.highest(-1, k - 1, b -> chargingWins(m.withBudget(b), c.options().cancelled()));
            suggestions = Suggestions.find(m, a.lowestStartUnits().orElse(-1), highest.orElse(-1), budget);
        }
        Optional<PlanReplays> replays = Optional.empty();
        if (wantReplays) {
            Progress.stage(65, "preparing the replays");
            if (a.guaranteed()) {
                String why = cert instanceof Certification.Reserve r ? r.certificate().reason() : "no certificate";
                replays = Optional.of(new PlanReplays(true, c.arena(), floor, start, cert.ok() ? loop : null, -1,
                        null, why));
            } else {
                ChargingSolver.Values v = losses.values();
                GoalAutomaton goal = c.goal();
                WinningRegion region = (vertex, mask, level) -> level >= floor && level <= cap
                        && v.need(vertex, goal.stateOfMask(mask)) <= level - floor;
                replays = Optional.of(new PlanReplays(false, c.arena(), floor, start, loop, highest.orElse(-1), region,
                        null));
            }
        }
        FloorSweep.Result sw = a.sweep();
        notes.add(CHARGING_NOTE_START + sw.batches() + " batch" + (sw.batches() == 1 ? "" : "es") + " ("
                + (sw.batches() - 1) + " dock position" + (sw.batches() == 2 ? "" : "s") + " added in decreasing"
                + " floor), " + sw.historyEntries() + " policy entries"
                + (thresholds == null ? "" : "; threshold policy over " + thresholds.size() + " positions, "
                + thresholds.stepCount() + " thresholds"));
        long positions = (long) c.arena().robotCount() * c.goal().stateCount();
        return new Plan(m, new Objective.Reserve(), a.verdict(), Method.CHARGING, reason, policy, PolicyChoice.SAFEST,
                highest.orElse(floor), cert, a.guaranteed() ? highest : OptionalInt.empty(), Optional.empty(),
                highest, true, a.lowestStartUnits(), suggestions, null, replays, Optional.empty(),
                new Plan.Size(positions, -1, sw.historyEntries(), null),
                new Plan.Timings(c.compileMillis(), 0, a.millis(), c.elapsed()), notes,
                new Plan.Detail.Charging(a, thresholds));
    }

    /** The charging route's verdict on a variant of the mission (compiled on its own). */
    private static boolean chargingWins(Mission m, java.util.function.BooleanSupplier cancelled) {
        Optional<DisturbanceStates> st = LastingPhases.states(m);
        if (st.isPresent()) {
            Optional<Boolean> w = LastingPhases.wins(m, st.get(), GoalAutomaton.of(m), cancelled);
            if (w.isPresent()) {
                return w.get();
            }
        }
        Arena arena = ArenaCompiler.compile(m);
        ChargingSolver s = new ChargingSolver(arena, GoalAutomaton.of(m), cancelled);
        return ChargingRoute.analyse(s, m.capacityUnits(), m.reserveUnits(), m.startUnits()).guaranteed();
    }

    // ---- verdict only

    private static Plan verdictOnly(Context c, Route.VerdictOnly v) {
        Mission m = c.mission();
        if (v.where() != Route.VerdictOnly.Where.PRODUCT) {
            Optional<FastPath.Analysis> f = FastPath.analyse(m, c.arena(), c.goal(), FastPath.DEFAULT_MAX_POLICY_ROWS,
                    true, c.options().memoryBudgetBytes());
            if (f.isPresent()) {
                return FastPlans.verdictOnly(c, f.get(), List.of());
            }
            if (v.where() == Route.VerdictOnly.Where.FAST) {
                throw fastDoesNotApply();
            }
        }
        ReserveSolver.ImplicitVerdict iv = ReserveSolver.decideImplicitly(m, c.arena(), c.goal(), c.product());
        return new Plan(m, new Objective.Reserve(), iv.verdict(), Method.IMPLICIT_PRODUCT, "only the verdict was asked"
                + " for: the product game without storing it, its attractor stopped once the start was decided",
                Optional.empty(), null, m.reserveUnits(), new Certification.NotChecked("verdict only, not certified"),
                OptionalInt.empty(), Optional.empty(), OptionalInt.empty(), false, OptionalInt.empty(), List.of(), null,
                Optional.empty(), Optional.empty(),
                new Plan.Size(iv.forecastVertices(), iv.edgesScanned(), iv.exploredVertices(), null),
                new Plan.Timings(c.compileMillis(), 0, iv.millis(), c.elapsed()), List.of(),
                new Plan.Detail.VerdictOnlyProduct(iv));
    }

    // ---- product routes

    private static Plan product(Context c, Route.Product p, String reason) {
        return product(c, p.policy(), false, null, p.highestFloor(), p.suggestions(),
                p.replays(), p.heatMap(), reason);
    }

    private static Plan product(Context c, Route.Stored s, String reason) {
        return product(c, s.policy(), true, s.solver(), true, true, false, false, reason);
    }

    private static Plan product(Context c, PolicyChoice choice, boolean stored,
                                dockline.solve.game.GameSolver.Factory solver, boolean highestFloor, boolean wantSuggestions,
                                boolean wantReplays, boolean wantHeatMap, String reason) {
        Mission m = c.mission();
        ReserveOptions ro = ReserveOptions.defaults().withMemoryBudget(c.options().memoryBudgetBytes())
                .withCancelled(c.options().cancelled()).withHighestReserve(highestFloor)
                .withSafestPolicy(choice == PolicyChoice.SAFEST)
                .withRoute(!stored ? ReserveOptions.Route.IMPLICIT : solver == null ? ReserveOptions.Route.PRODUCT
                        : ReserveOptions.Route.stored(solver));
        Progress.stage(5, "solving the game" + (highestFloor || choice == PolicyChoice.SAFEST
                ? ", the highest floor and the safest policy" : ""));
        ReserveAnalysis a = ReserveSolver.analyse(m, c.arena(), c.goal(), ro);
        if (wantReplays && !a.guaranteed() && !highestFloor) {
            // the best effort of the replays needs the highest guaranteed floor
            a = ReserveSolver.analyse(m, c.arena(), c.goal(), ro.withHighestReserve(true));
        }
        Certification cert;
        ClosedLoop loop = null;
        Progress.stage(55, a.guaranteed() ? "certifying the policy" : "looking for suggestions");
        if (a.guaranteed()) {
            // never a silent "guaranteed": the policy is re-checked on an independent code path
            ClosedLoop l = CertificateChecker.closedLoop(c.arena(), a.policy().orElseThrow(), a.reserveUnits(),
                    a.startUnits());
            Certificate ct = CertificateChecker.certify(l);
            cert = new Certification.Reserve(ct, ct.ok() ? Optional.empty()
                    : Optional.of("the solver says guaranteed, but its policy failed the independent certificate: "
                    + ct.reason()));
            loop = ct.ok() ? l : null;
        } else {
            cert = new Certification.NotChecked("not guaranteed: there is no policy to certify");
        }
        List<Suggestion> suggestions = !wantSuggestions || a.guaranteed() ? List.of()
                : Suggestions.find(m, c.product(), a.highestReserveSearched() ? a.highestGuaranteedReserveUnits()
                        : OptionalInt.empty());
        Optional<PlanReplays> replays = Optional.empty();
        if (wantReplays) {
            Progress.stage(65, "preparing the replays");
            replays = Optional.of(replays(c, a, loop, cert));
        }
        Optional<ChargeNeeded> heat = Optional.empty();
        if (wantHeatMap) {
            Progress.stage(75, "the charge needed on every cell");
            heat = Optional.of(ChargeNeeded.computeImplicitly(c.arena(), c.goal(),
                    new ReserveMonitor(a.reserveUnits(), a.capacityUnits(), a.startUnits()), c.product()));
        }
        Progress.stage(100, "planned");
        return new Plan(m, new Objective.Reserve(), a.verdict(), a.storedProduct() ? Method.STORED_PRODUCT
                : Method.PRODUCT, reason, a.policy(), choice, a.policyFloorUnits(), cert, a.worstCaseMinimumUnits(),
                Optional.empty(), a.highestGuaranteedReserveUnits(), a.highestReserveSearched(), OptionalInt.empty(),
                suggestions, null, replays, heat, new Plan.Size(a.productVertices(), a.productEdges(), -1,
                a.estimate()), new Plan.Timings(c.compileMillis(), a.buildMillis(), a.solveMillis(), c.elapsed()),
                a.notes(), new Plan.Detail.Product(a));
    }

    /**
     * The replays: of the certified policy when guaranteed; else of the best effort, the certified
     * policy for the highest floor that can be guaranteed from the start (when there is one).
     */
    private static PlanReplays replays(Context c, ReserveAnalysis a, ClosedLoop certified, Certification cert) {
        int floor = a.reserveUnits();
        int start = a.startUnits();
        if (a.guaranteed()) {
            String why = cert instanceof Certification.Reserve r ? r.certificate().reason() : "no certificate";
            return new PlanReplays(true, c.arena(), floor, start, certified, -1, null, why);
        }
        int best = a.highestReserveSearched() ? a.highestGuaranteedReserveUnits().orElse(-1)
                // the solver skipped the search (memory); the charging route's pass needs far less
                : FixpointMargins.highestFloor(c.arena(), c.goal(), start);
        ClosedLoop loop = null;
        if (best >= 0) {
            Mission lower = c.mission().withReserve(Charge.wh(c.mission().scale().toWh(best)));
            ReserveAnalysis b = ReserveSolver.analyse(lower, c.arena(), c.goal(), ReserveOptions.defaults()
                    .withMemoryBudget(c.options().memoryBudgetBytes()).withCancelled(c.options().cancelled())
                    .withHighestReserve(false).withSafestPolicy(false));
            if (b.guaranteed() && b.reserveUnits() == best) {
                ClosedLoop l = CertificateChecker.closedLoop(c.arena(), b.policy().orElseThrow(), best, start);
                if (CertificateChecker.certify(l).ok()) {
                    loop = l;
                }
            }
            if (loop == null) {
                throw new IllegalStateException("internal: the policy for the highest guaranteed floor " + best
                        + " units could not be certified");
            }
        }
        // not guaranteed: every route solved its game to the end, so the whole winning region is known
        var region = a.region().orElseThrow(() -> new IllegalStateException(
                "internal: the solver did not keep the winning region of a mission that is not guaranteed"));
        return new PlanReplays(false, c.arena(), floor, start, loop, best, region, null);
    }

    // ---- margins

    private static Plan margins(Context c) {
        return margins(c, Margins.compute(c.mission(), c.arena(), c.goal(), c.product()), null);
    }

    /** The plan's context on the last round's restricted arena. */
    private static Context phasedContext(Mission mission, PlanOptions options, long t0, LastingPhases.Result p) {
        return new Context(mission, p.arena(), p.solver().goal(), options, t0, p.compileMillis());
    }

    /**
     * The margins of a mission with lasting closures without the whole closure arena: the bisection decides
     * each probe phase by phase on the product game ({@code PhasedLastingSolver}), and the minimum-credit
     * figures come from the charging route phase by phase ({@link LastingPhases}), two independent
     * computations as on the whole arena. Empty when the route is another, the mission has nothing a lasting
     * event closes, its floor is above the capacity, or the phases hand it back to the whole arena.
     */
    private static Optional<Plan> phasedMargins(Mission mission, PlanOptions options, long t0) {
        if (!(options.route() instanceof Route.Margins) || mission.reserveUnits() > mission.capacityUnits()) {
            return Optional.empty();
        }
        return LastingPhases.of(mission, options, false).map(p -> {
            Context c = phasedContext(mission, options, t0, p);
            return margins(c, Margins.compute(mission, () -> new FixpointMargins.Both(p.weakened().highestFloorUnits()
                    .orElse(-1), p.weakened().lowestStartUnits().orElse(-1)), c.product()), p.note());
        });
    }

    private static Plan margins(Context c, MarginReport r, String note) {
        Mission m = c.mission();
        List<String> notes = new ArrayList<>();
        if (note != null) {
            notes.add(note);
        }
        if (!r.agree()) {
            notes.add("the bisection over the threshold solver and the minimum-credit fixpoint disagree");
        }
        return new Plan(m, new Objective.Reserve(), Verdict.of(r.guaranteed()), Method.MARGINS,
                "the margins were asked for: each is computed two independent ways, which must agree",
                Optional.empty(), null, m.reserveUnits(), new Certification.NotChecked("the margins give no policy"),
                OptionalInt.empty(), Optional.empty(), r.highestReserveUnits(), true, r.lowestStartUnits(),
                r.suggestions(), null, Optional.empty(), Optional.empty(), new Plan.Size(-1, -1, -1, null),
                new Plan.Timings(c.compileMillis(), 0, r.bisection().millis() + r.fixpoint().millis(), c.elapsed()),
                notes, new Plan.Detail.Margins(r));
    }

    // ---- discounted

    private static Plan discounted(Context c, Route.Discounted d) {
        Mission m = c.mission();
        if (!(m.objective() instanceof Objective.Discounted o)) {
            throw new IllegalArgumentException("the discounted route needs a mission with a discounted objective");
        }
        DiscountedAnalysis a = DiscountedSolver.analyse(m, c.arena(), c.goal(), o, DiscountedOptions.defaults()
                .withKeepReserve(d.keepReserve()).withAlsoOptimise(d.alsoOptimise())
                .withMemoryBudget(c.options().memoryBudgetBytes()).withCancelled(c.options().cancelled()));
        Optional<Policy> policy = Optional.empty();
        Certification cert = new Certification.NotChecked("not guaranteed: there is no policy to certify");
        OptionalInt lowest = OptionalInt.empty();
        if (a.guaranteed()) {
            Policy p = DiscountedPolicies.of(a);
            policy = Optional.of(p);
            DiscountedCertificate ct = DiscountedCertificateChecker.check(c.arena(), p, o,
                    a.reserveKept() ? OptionalInt.of(m.reserveUnits()) : OptionalInt.empty(), m.startUnits());
            cert = new Certification.Discounted(ct, Optional.ofNullable(certificateProblem(a, ct)));
            if (ct.ok() && ct.reserveKept()) {
                lowest = OptionalInt.of(ct.worstMinimumUnits());
            }
        }
        SizeEstimate est = a.estimate();
        return new Plan(m, o, a.verdict(), Method.COMPARATOR_PRODUCT, "the mission's objective is a discounted score:"
                + " a comparator automaton decides it exactly on the product game" + (a.reserveKept()
                ? ", with the reserve floor" : ", without the reserve floor"), policy, null, m.reserveUnits(), cert,
                lowest, a.worstCaseScore(), OptionalInt.empty(), false, OptionalInt.empty(), List.of(), null,
                Optional.empty(), Optional.empty(), new Plan.Size(a.productVertices(), a.productEdges(), -1, est),
                new Plan.Timings(c.compileMillis(), a.buildMillis(), a.solveMillis(), c.elapsed()), a.notes(),
                new Plan.Detail.Discounted(a));
    }

    /**
     * What is wrong with the certificate of a guaranteed discounted analysis (failed, or its exact worst
     * score differs from the solver's), or null when nothing is.
     */
    public static String certificateProblem(DiscountedAnalysis a, DiscountedCertificate cert) {
        if (!cert.ok()) {
            return "the solver says guaranteed, but its policy failed the independent certificate: " + cert.reason();
        }
        if (a.worstCaseScore().isPresent() && !cert.worstScore().orElseThrow().sameValue(a.worstCaseScore().get())) {
            return "the solver says guaranteed, but its worst score " + a.worstCaseScore().get() + " differs from the"
                    + " certificate's exact worst score " + cert.worstScore().get();
        }
        return null;
    }

    private static long millis(long nanos) {
        return nanos / 1_000_000L;
    }
}
