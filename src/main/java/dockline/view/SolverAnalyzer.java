package dockline.view;

import dockline.arena.Action;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.certify.Certificate;
import dockline.replay.ForcedEventException;
import dockline.plan.Certification;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PictureRoute;
import dockline.plan.PlanReplays;
import dockline.replay.Replay;
import dockline.solve.charging.NeedBounds;
import dockline.solve.reserve.ChargeNeeded;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.util.Progress;
import dockline.util.ProgressListener;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The real {@link Analyzer}: asks the core ({@link MissionPlanner#plan} on the route of {@link PictureRoute}: the
 * route {@code export} writes the safest policy from, with its replays and heat map, so the window plays the
 * exported policy) and turns the {@link Plan} into the view's own
 * {@link ViewData}; it computes nothing itself. The cancellation flag goes down to every solve.
 */
public final class SolverAnalyzer implements Analyzer {

    @Override
    public ViewData analyze(Mission mission, BooleanSupplier cancelled) {
        return analyze(mission, cancelled, ProgressListener.NONE);
    }

    /**
     * Plans the mission and adapts the plan. Progress: the plan's own stages scaled to 0-85 %, with the
     * solver's phases inside them, then the worst case (85 %) and the run with no disturbance (93 %); a
     * patrol or deadline mission reports its two stages (solve and certify, then its replay).
     */
    @Override
    public ViewData analyze(Mission mission, BooleanSupplier cancelled, ProgressListener progress) {
        if (mission.beyondOneTrip()) {
            return RoundsData.analyze(mission, cancelled, progress);
        }
        Plan plan;
        // the core tells this thread's listener: the plan's stages take the first 85 % of the bar (the replays
        // below the rest), the solver's phases pass as they are
        try (Progress.Scope scope = Progress.listen(new ProgressListener() {
            @Override
            public void stage(int percent, String stage) {
                progress.stage(percent * 85 / 100, stage);
            }

            @Override
            public void phase(String phase, int percent) {
                progress.phase(phase, percent);
            }
        })) {
            // the exported policy's route, with its replays and heat map
            plan = MissionPlanner.plan(mission, PlanOptions.of(PictureRoute.of(mission)).withCancelled(cancelled));
        } catch (dockline.model.ResourceLimitException e) {
            throw new IllegalArgumentException("the game is too large: " + e.getMessage() + " (" + e.advice() + ")", e);
        }
        stopIf(cancelled);
        ViewData data = of(plan, progress);
        stopIf(cancelled);
        return data;
    }

    /**
     * The view's data of a plan with replays and a heat map or heat bounds (as {@link #analyze} makes):
     * the worst case or counterexample, and the nominal run when there is a policy. Used by the report's pictures.
     */
    static ViewData of(Plan plan) {
        return of(plan, ProgressListener.NONE);
    }

    private static ViewData of(Plan plan, ProgressListener progress) {
        Mission mission = plan.mission();
        PlanReplays mr = plan.replays().orElseThrow();
        List<ViewReplay> replays = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        progress.stage(85, plan.guaranteed() ? "replaying the worst case" : "replaying the counterexample");
        try {
            Replay w = mr.worstCase();
            replays.add(ReplayAdapter.of(mission, w, plan.guaranteed() ? ViewReplay.Kind.WORST_CASE
                    : ViewReplay.Kind.COUNTEREXAMPLE, title(mission, w, plan.guaranteed() ? "worst case" : "counterexample")));
        } catch (IllegalStateException e) {
            problems.add(e.getMessage());
        }
        if (mr.policy().isPresent()) {
            progress.stage(93, "replaying the run with no disturbance");
            try {
                Replay n = mr.nominal();
                replays.add(ReplayAdapter.of(mission, n, ViewReplay.Kind.NOMINAL, title(mission, n, "no disturbance")));
            } catch (IllegalStateException e) {
                problems.add(e.getMessage());
            }
        }
        return new SolvedData(plan, verdictOf(plan, problems), replays);
    }

    static void stopIf(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("cancelled");
        }
    }

    static String title(Mission m, Replay r, String what) {
        return what + " (" + (r.steps().size() - 1) + " steps, lowest " + Units.wh(m, r.minimumUnits()) + ")";
    }

    /** The verdict in words, with the certificate status. */
    static VerdictSummary verdictOf(Plan a, List<String> problems) {
        PlanReplays mr = a.replays().orElseThrow();
        Mission m = a.mission();
        int k = m.map().disturbances().budget();
        String floor = Units.both(m, m.reserveUnits());
        String disturbances = k == 0 ? "with no disturbance" : "under every disturbance the map allows (at most " + k + ")";
        StringBuilder words = new StringBuilder();
        if (a.guaranteed()) {
            words.append("the robot can always finish its tasks and dock without the battery dropping below the floor of ")
                    .append(floor).append(", ").append(disturbances).append('.');
            a.lowestLevelUnits().ifPresent(u -> words.append(" Worst case: ").append(Units.both(m, u)).append('.'));
        } else {
            words.append(k == 0 ? "even with no disturbance, " : "some sequence of at most " + k + " disturbances can, whatever the robot does, ")
                    .append("drive the battery below the floor of ").append(floor).append(" before the tasks are done and the robot docks.");
            if (a.highestFloorUnits().isPresent()) {
                words.append(" A floor of ").append(Units.both(m, a.highestFloorUnits().getAsInt()))
                        .append(" can be guaranteed.");
            } else if (a.highestFloorSearched() || mr.bestEffortFloor() < 0) {
                words.append(" No floor can be guaranteed from this start.");
            }
        }
        if (m.objective() instanceof Objective.Discounted) {
            words.append(" (This answers the reserve floor; the mission's discounted objective is checked by 'dockline check'.)");
        }
        // how the pass went is for check's record, not the headline; the phases kept are said where the heat map
        // comes from them too (on a small mission it comes from the whole arena, exact, and the phases are the
        // solver's business)
        boolean phasedHeat = a.heatBounds().map(NeedBounds::restricted).orElse(false);
        for (String n : a.notes()) {
            if (!Plan.passNote(n) && (phasedHeat || !Plan.phasesNote(n))) {
                words.append(" Note: ").append(n).append('.');
            }
        }
        String cert;
        VerdictSummary.Outcome outcome = a.guaranteed() ? VerdictSummary.Outcome.GUARANTEED : VerdictSummary.Outcome.NOT_GUARANTEED;
        if (a.guaranteed()) {
            Certificate c = a.certification() instanceof Certification.Reserve r ? r.certificate() : null;
            if (c != null && c.ok()) {
                cert = "passed \u2014 the policy was re-checked independently of the solver (" + c.statesChecked()
                        + " situations, every disturbance choice; longest run " + c.longestRunSteps() + " steps)";
            } else {
                // never trust a guarantee whose policy failed the check: say so, loudly
                outcome = VerdictSummary.Outcome.NOT_CHECKED;
                words.insert(0, "the solver says guaranteed, but its policy FAILED the independent check; do not rely on it. ");
                cert = "FAILED \u2014 " + (c == null ? "no certificate" : c.reason());
            }
        } else {
            cert = "not applicable (nothing to certify for a verdict of not guaranteed); the counterexample replay shows"
                    + " the breach" + (mr.bestEffortFloor() >= 0 ? "; the policy shown is the best effort, certified for a floor of "
                    + Units.both(m, mr.bestEffortFloor()) : "");
        }
        for (String p : problems) {
            if (p != null && p.startsWith("internal")) {
                // a defect of the tool is an error, never a footnote: the verdict is not to be relied on
                outcome = VerdictSummary.Outcome.NOT_CHECKED;
                words.insert(0, "INTERNAL ERROR: " + p + "; do not rely on this result and please report it. ");
            }
            cert += "; " + p;
        }
        return new VerdictSummary(outcome, words.toString(), cert, a.lowestLevelUnits(), a.highestFloorUnits());
    }

    /** {@link ViewData} over a {@link Plan}; the policy is indexed by cell once, at construction. */
    static final class SolvedData implements ViewData {

        private final PlanReplays replaysSource;
        private final Plan plan;
        private final Optional<ChargeNeeded> heat;
        private final Optional<NeedBounds> bounds;
        private final VerdictSummary verdict;
        private final List<ViewReplay> replays;
        private final Optional<Policy> policy;
        private final Map<Long, List<Action>> byCell;
        private final PolicyRules rules;

        SolvedData(Plan plan, VerdictSummary verdict, List<ViewReplay> replays) {
            this.replaysSource = plan.replays().orElseThrow();
            this.plan = plan;
            this.heat = plan.heatMap();
            this.bounds = plan.heatBounds();
            this.verdict = verdict;
            this.replays = List.copyOf(replays);
            this.policy = replaysSource.policy();
            this.byCell = indexByCell(policy, plan.mission().map().width());
            this.rules = policy.map(p -> PolicyRules.of(p.entries(), plan.mission().map().width())).orElse(PolicyRules.NONE);
        }

        private static long key(int cellIndex, int budgetLeft, int progress) {
            return ((long) cellIndex << 40) | ((long) budgetLeft << 20) | progress;
        }

        /** Distinct actions per (cell, budget, progress), most frequent first. O(entries). */
        private static Map<Long, List<Action>> indexByCell(Optional<Policy> policy, int width) {
            Map<Long, Map<Action, Integer>> counts = new HashMap<>();
            policy.ifPresent(p -> {
                for (PolicyEntry e : p.entries()) {
                    counts.computeIfAbsent(key(e.cell().index(width), e.budgetLeft(), e.progress()), k -> new LinkedHashMap<>())
                            .merge(e.action(), 1, Integer::sum);
                }
            });
            Map<Long, List<Action>> out = new HashMap<>();
            for (Map.Entry<Long, Map<Action, Integer>> e : counts.entrySet()) {
                List<Map.Entry<Action, Integer>> l = new ArrayList<>(e.getValue().entrySet());
                l.sort((x, y) -> Integer.compare(y.getValue(), x.getValue()));
                out.put(e.getKey(), l.stream().map(Map.Entry::getKey).toList());
            }
            return out;
        }

        Plan plan() {
            return plan;
        }

        @Override
        public Mission mission() {
            return plan.mission();
        }

        @Override
        public VerdictSummary verdict() {
            return verdict;
        }

        @Override
        public boolean solved() {
            return true;
        }

        @Override
        public List<ViewReplay> replays() {
            return replays;
        }

        @Override
        public int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
            try {
                if (heat.isPresent()) {
                    int u = heat.get().unitsNeeded(cellIndex, budgetLeft, progressMask);
                    return u == ChargeNeeded.IMPOSSIBLE ? IMPOSSIBLE : u;
                }
                if (bounds.isEmpty()) {
                    return UNKNOWN;
                }
                int u = bounds.get().atMostUnits(cellIndex, budgetLeft, progressMask);
                return u == NeedBounds.IMPOSSIBLE ? IMPOSSIBLE : u == NeedBounds.UNBOUNDED ? UNKNOWN : u;
            } catch (IllegalArgumentException outOfRange) {
                return UNKNOWN;
            }
        }

        @Override
        public int chargeNeededAtLeast(int cellIndex, int budgetLeft, int progressMask) {
            if (heat.isPresent() || bounds.isEmpty()) {
                return chargeNeeded(cellIndex, budgetLeft, progressMask);
            }
            try {
                int u = bounds.get().atLeastUnits(cellIndex, budgetLeft, progressMask);
                return u == NeedBounds.IMPOSSIBLE ? IMPOSSIBLE : u;
            } catch (IllegalArgumentException outOfRange) {
                return UNKNOWN;
            }
        }

        @Override
        public String heatNote() {
            if (heat.isPresent() || bounds.isPresent() && !bounds.get().restricted()) {
                return null;
            }
            if (bounds.isEmpty()) {
                return "No charge-needed map: this check did not compute one (the charging route did not apply).";
            }
            return "Charge needed with nothing closed yet, from the check by closure phases: an exact figure on every"
                    + " cell would need the game with every door and zone the building may close, too large for a"
                    + " quick answer here. Each coloured cell shows enough charge (a sure upper bound): exact where the"
                    + " cell has no corner mark; a marked cell may need less (point at it for the range), and a marked"
                    + " cell without colour has no level known to be enough.";
        }

        @Override
        public Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
            if (policy.isEmpty()) {
                return Optional.empty();
            }
            Cell c = Cell.ofIndex(cellIndex, plan.mission().map().width());
            return policy.get().lookup(c, levelUnits, budgetLeft, progressMask);
        }

        @Override
        public List<Action> policyActions(int cellIndex, int budgetLeft, int progressMask) {
            return byCell.getOrDefault(key(cellIndex, budgetLeft, progressMask), List.of());
        }

        @Override
        public PolicyRules policyRules() {
            return rules;
        }

        @Override
        public boolean canForce() {
            return policy.isPresent();
        }

        /**
         * Replays the policy with the given events (nominal outcomes elsewhere; with no events, the run
         * with no disturbance).
         *
         * @throws IllegalArgumentException when an event cannot happen where it was put
         */
        @Override
        public Optional<ViewReplay> force(List<ScenarioEvent> events) {
            if (policy.isEmpty()) {
                return Optional.empty();
            }
            List<dockline.replay.ForcedEvent> fs = new ArrayList<>();
            StringBuilder what = new StringBuilder();
            for (ScenarioEvent e : events) {
                fs.add(new dockline.replay.ForcedEvent(e.step(), e.kind(), e.slipTo()));
                what.append(what.length() == 0 ? "" : ", ").append(e.step()).append(':').append(e.kind().word())
                        .append(e.slipTo() != null ? "@" + e.slipTo() : "");
            }
            try {
                Replay r = replaysSource.forced(fs);
                return Optional.of(ReplayAdapter.of(mission(), r, ViewReplay.Kind.FORCED,
                        title(mission(), r, events.isEmpty() ? "nothing forced" : "forced " + what)));
            } catch (ForcedEventException e) {
                throw new IllegalArgumentException(e.getMessage(), e);
            } catch (IllegalStateException e) {
                throw new IllegalArgumentException(e.getMessage(), e);
            }
        }
    }
}
