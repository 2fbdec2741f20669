package dockline.cli;

import dockline.arena.Action;
import dockline.model.Mission;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.policy.Policy;
import dockline.replay.Replay;
import dockline.replay.ReplayEvent;
import dockline.replay.ReplayStep;
import dockline.replay.RoundsReplay;
import dockline.view.VerdictSummary;
import dockline.view.ViewData;
import dockline.view.ViewReplay;
import dockline.view.ViewStep;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What {@code render} draws for a patrol or a deadline mission, read off the core's {@link RoundsPlan} and its
 * replay ({@link RoundsReplay}): the verdict with the certificate, and as the path the lasso of a patrol (the
 * way in, then one lap of the loop that repeats for ever) or the slowest play of a deadline mission. There is
 * no heat map for these goals (the charge needed depends on the lap's progress and the turns left), so the
 * heat layer shows the map alone. O(size of the plan and of the lasso).
 */
final class RoundsRender {

    private RoundsRender() {
    }

    /** The view data of a planned patrol or deadline mission (safest policy). */
    static Data of(Mission m, long budgetBytes) {
        RoundsPlan plan = RoundsPlan.of(m, budgetBytes, PolicyChoice.SAFEST);
        Optional<RoundsReplay> replay = RoundsPlan.replay(m, budgetBytes, PolicyChoice.SAFEST);
        boolean patrol = plan.patrol().isPresent();
        Optional<Policy> policy = patrol ? plan.patrol().get().policy() : plan.deadline().get().policy();
        OptionalInt highest = patrol ? plan.patrol().get().highestGuaranteedReserveUnits()
                : plan.deadline().get().highestGuaranteedReserveUnits();
        VerdictSummary v;
        if (plan.certificateDisagrees()) {
            v = new VerdictSummary(VerdictSummary.Outcome.NOT_CHECKED, "the solver's policy failed its independent"
                    + " certificate; no verdict is given", "failed: " + plan.certificate().reason(), OptionalInt.empty(),
                    highest);
        } else if (plan.guaranteed()) {
            int low = plan.certificate().worstMinimumUnits();
            int ticks = plan.certificate().longestLapTicks();
            v = new VerdictSummary(VerdictSummary.Outcome.GUARANTEED, (patrol
                    ? "the robot can patrol " + String.join(", ", m.tasks().patrol()) + " for ever; longest lap "
                    : "the robot always docks in time; slowest play ") + m.timing().describeTicks(ticks)
                    + ", battery never below " + CheckReport.amount(low, m),
                    "checked independently over " + plan.certificate().statesChecked() + " situations",
                    OptionalInt.of(low), highest);
        } else {
            v = new VerdictSummary(VerdictSummary.Outcome.NOT_GUARANTEED, patrol
                    ? "the building can stop the patrol (the battery or a checkpoint is lost)"
                    : "the building can keep the robot from docking within the deadline above the floor",
                    "no policy to certify", OptionalInt.empty(), highest);
        }
        List<ViewReplay> replays = new ArrayList<>();
        replay.ifPresent(r -> replays.add(viewReplay(m, r)));
        return new Data(m, v, policy, replays);
    }

    /** The lasso (or the slowest play) as the view's replay; its notes say where the loop starts. */
    static ViewReplay viewReplay(Mission m, RoundsReplay r) {
        Replay rep = r.replay();
        List<ViewStep> steps = new ArrayList<>();
        for (ReplayStep s : rep.steps()) {
            ReplayEvent e = s.event() == null ? ReplayEvent.NONE : s.event();
            steps.add(new ViewStep(s.step(), s.cell(), s.action().orElse(null), e.kind(), e.describe(), e.cell(),
                    s.batteryUnits(), s.budgetLeft(), s.progressMask(), e.closedCells()));
        }
        String title;
        if (r.loopStart() >= 0) {
            title = (r.guaranteed() ? "worst lasso" : "the building's play") + ": way in steps 0-" + r.loopStart()
                    + ", then steps " + r.loopStart() + "-" + rep.last().step() + " repeat";
        } else {
            title = (r.guaranteed() ? "slowest play" : "counterexample") + " (" + rep.last().step() + " turns)";
        }
        return new ViewReplay(r.guaranteed() ? ViewReplay.Kind.WORST_CASE : ViewReplay.Kind.COUNTEREXAMPLE, title,
                steps, rep.explanation());
    }

    /** The view's model of a patrol or deadline mission: verdict, policy look-ups and the lasso. */
    record Data(Mission mission, VerdictSummary verdict, Optional<Policy> policy, List<ViewReplay> replays)
            implements ViewData {

        Data {
            replays = List.copyOf(replays);
        }

        @Override
        public boolean solved() {
            return true;
        }

        @Override
        public int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
            return UNKNOWN;
        }

        @Override
        public Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
            return policy.flatMap(p -> p.lookup(dockline.model.Cell.ofIndex(cellIndex, mission.map().width()),
                    levelUnits, budgetLeft, progressMask));
        }
    }
}
