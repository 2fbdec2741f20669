package dockline.view;

import dockline.arena.Action;
import dockline.certify.RoundsCertificate;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.policy.Policy;
import dockline.replay.RoundsReplay;
import dockline.solve.ProductOptions;
import dockline.util.ProgressListener;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.BooleanSupplier;

/**
 * {@link ViewData} of a patrol or a deadline mission: the core's {@link RoundsPlan} (verdict, policy,
 * certificate) and its replay ({@link RoundsPlan#replay}: a patrol's lasso, the way in and then the lap
 * that repeats for ever, or a deadline mission's slowest play). It computes nothing itself. There is
 * no charge-needed map for these missions (that figure is a one-trip one), and no forcing.
 *
 * <p>Cancelling: the rounds solvers do not poll a flag, so a cancel takes effect between the solve and
 * the replay, and the result is then thrown away.
 */
record RoundsData(Mission mission, VerdictSummary verdict, List<ViewReplay> replays, Optional<Policy> policy)
        implements ViewData {

    RoundsData {
        replays = List.copyOf(replays);
    }

    static RoundsData analyze(Mission m, BooleanSupplier cancelled, ProgressListener progress) {
        long budget = ProductOptions.defaults().effectiveMemoryBudget();
        boolean patrol = m.tasks().patrols();
        progress.stage(5, patrol ? "solving the patrol game and certifying its policy"
                : "solving the deadline game and certifying its policy");
        RoundsPlan plan;
        Optional<RoundsReplay> play;
        try {
            plan = RoundsPlan.of(m, budget, PolicyChoice.SAFEST);
            SolverAnalyzer.stopIf(cancelled);
            progress.stage(60, patrol ? "finding the lasso: the way in and the lap" : "finding the slowest play");
            play = RoundsPlan.replay(m, budget, PolicyChoice.SAFEST);
        } catch (dockline.model.ResourceLimitException e) {
            throw new IllegalArgumentException("the game is too large: " + e.getMessage() + " (" + e.advice() + ")", e);
        }
        SolverAnalyzer.stopIf(cancelled);
        List<ViewReplay> runs = new ArrayList<>();
        play.ifPresent(r -> runs.add(run(m, r)));
        Optional<Policy> policy = plan.patrol().isPresent() ? plan.patrol().get().policy()
                : plan.deadline().orElseThrow().policy();
        return new RoundsData(m, verdictOf(plan), runs, policy);
    }

    /** The replay with its loop: the lap from {@code loopStart} repeats. */
    static ViewReplay run(Mission m, RoundsReplay r) {
        boolean patrol = m.tasks().patrols();
        ViewReplay.Kind kind = !r.guaranteed() ? ViewReplay.Kind.COUNTEREXAMPLE
                : patrol ? ViewReplay.Kind.LASSO : ViewReplay.Kind.WORST_CASE;
        List<ViewStep> steps = ReplayAdapter.steps(r.replay());
        String what = !r.guaranteed() ? "counterexample" : patrol ? "patrol lasso" : "slowest play";
        String title = what + " (" + (steps.size() - 1) + " steps" + (r.loopStart() >= 0 ? ", lap from step "
                + r.loopStart() : "") + ", lowest " + Units.wh(m, r.replay().minimumUnits()) + ")";
        List<String> notes = new ArrayList<>(r.replay().explanation());
        if (r.loopStart() >= 0) {
            notes.add(0, "Playing goes round the lap for ever: after step " + (steps.size() - 1) + " comes step "
                    + r.loopStart() + " again.");
        }
        return new ViewReplay(kind, title, steps, notes, r.loopStart());
    }

    static VerdictSummary verdictOf(RoundsPlan plan) {
        Mission m = plan.mission();
        String floor = Units.both(m, m.reserveUnits());
        int k = m.map().disturbances().budget();
        String disturbances = k == 0 ? "with no disturbance" : "under every disturbance the map allows (at most " + k
                + (plan.mission().map().disturbances().budgetPerLap() ? " per lap" : "") + ")";
        StringBuilder words = new StringBuilder();
        OptionalInt lowest = OptionalInt.empty();
        OptionalInt highest;
        if (plan.patrol().isPresent()) {
            var a = plan.patrol().get();
            highest = a.highestGuaranteedReserveUnits();
            if (a.guaranteed()) {
                lowest = a.lowestLevelUnits();
                words.append("the robot can patrol ").append(String.join(", ", m.tasks().patrol()))
                        .append(" again and again for ever without the battery dropping below the floor of ").append(floor)
                        .append(", ").append(disturbances).append('.');
                a.lowestLevelUnits().ifPresent(u -> words.append(" Lowest level ever: ").append(Units.both(m, u)).append('.'));
                a.longestLapTicks().ifPresent(t -> words.append(" Longest lap: ").append(m.timing().describeTicks(t))
                        .append('.'));
            } else {
                words.append("the building can, whatever the robot does, stop it from patrolling ")
                        .append(String.join(", ", m.tasks().patrol())).append(" for ever above the floor of ").append(floor)
                        .append('.');
            }
        } else {
            var a = plan.deadline().orElseThrow();
            highest = a.highestGuaranteedReserveUnits();
            if (a.guaranteed()) {
                lowest = a.worstCaseMinimumUnits();
                words.append("the robot can always finish and dock within ").append(m.timing().describeTicks(a.deadlineTicks()))
                        .append(" without the battery dropping below the floor of ").append(floor).append(", ")
                        .append(disturbances).append('.');
                a.worstFinishTicks().ifPresent(t -> words.append(" Slowest finish: ").append(m.timing().describeTicks(t))
                        .append('.'));
            } else {
                words.append("the building can make the robot miss the deadline of ")
                        .append(m.timing().describeTicks(a.deadlineTicks())).append(" or drop below the floor of ")
                        .append(floor).append('.');
            }
        }
        if (!plan.guaranteed() && highest.isPresent()) {
            words.append(" A floor of ").append(Units.both(m, highest.getAsInt())).append(" can be guaranteed.");
        }
        VerdictSummary.Outcome outcome = plan.guaranteed() ? VerdictSummary.Outcome.GUARANTEED
                : VerdictSummary.Outcome.NOT_GUARANTEED;
        RoundsCertificate c = plan.certificate();
        String cert;
        if (!plan.guaranteed()) {
            cert = "not applicable (nothing to certify for a verdict of not guaranteed); the counterexample replay shows"
                    + " how the building wins";
        } else if (c != null && !plan.certificateDisagrees()) {
            cert = "passed \u2014 the policy's closed loop was re-checked independently of the solver (" + c.statesChecked()
                    + " situations)";
        } else {
            // never trust a guarantee whose policy failed the check: say so, loudly
            outcome = VerdictSummary.Outcome.NOT_CHECKED;
            words.insert(0, "the solver says guaranteed, but its policy FAILED the independent check; do not rely on it. ");
            cert = "FAILED \u2014 " + (c == null ? "no certificate" : c.reason());
        }
        return new VerdictSummary(outcome, words.toString(), cert, lowest, highest);
    }

    @Override
    public boolean solved() {
        return true;
    }

    @Override
    public Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
        if (policy.isEmpty()) {
            return Optional.empty();
        }
        return policy.get().lookup(Cell.ofIndex(cellIndex, mission.map().width()), levelUnits, budgetLeft, progressMask);
    }
}
