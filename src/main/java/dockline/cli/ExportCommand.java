package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.io.PolicyFiles;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.plan.Certification;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.plan.Route;
import dockline.report.Caveats;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.policy.Policy;
import dockline.policy.ThresholdPolicy;
import dockline.solve.Verdict;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code dockline export MISSION --policy FILE}: plans the mission ({@link MissionPlanner#plan}: the
 * charging route with its safest policy, as level thresholds per game position it can meet (format
 * version 4); the product route where the charging route does not apply, and with {@code --fewest-moves},
 * one row per situation it can meet (format version 3); missions/POLICY-FORMAT.md; CSV for a {@code .csv}
 * name, else JSON), atomically. Nothing is written when the mission is not guaranteed, and nothing
 * is written unless the policy passed its independent certificate (in the plan): a failed certificate is exit 4. For a
 * mission with a discounted objective the rows carry the robot's score memory (format version 2,
 * see missions/POLICY-FORMAT.md); the reserve floor is kept as well, as {@code check} does by default.
 */
@Command(name = "export",
        description = {"Writes the certified policy of a guaranteed mission: the action to take in every situation the"
                + " robot can meet.",
                "A situation is the cell, the battery level, the disturbances left, the tasks done and, for a discounted"
                + " score, the score gap. The safest policy of a mission with charging is written as level thresholds"
                + " per position (at or above X units do this, below it do that). JSON, or CSV for a .csv name;"
                + " nothing is written when the mission is not guaranteed."},
        exitCodeList = {"0:policy certified and written", "1:not guaranteed (nothing written)", "2:bad input or usage",
                "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (e.g. the policy failed its independent certificate; nothing written)"})
public final class ExportCommand extends MissionCommand {

    @Mixin
    PolicyOption policy;

    @Option(names = "--policy", required = true, paramLabel = "FILE", description = "where to write the policy (.json or .csv)")
    Path policyFile;

    @Mixin
    JsonOption json;

    @Override
    int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        try {
            Mission m = mission.load(err);
            if (!mission.outputOk("--policy", policyFile, m, err)) {
                return ExitCodes.BAD_INPUT;
            }
            if (m.beyondOneTrip()) {
                return rounds(m, out, err);
            }
            boolean discounted = m.objective() instanceof Objective.Discounted;
            if (discounted && policy.given()) {
                return MissionOptions.reserveObjectiveOnly(err, policy.name());
            }
            // the safest policy of a mission with charging comes as level thresholds (missions/POLICY-FORMAT.md)
            Route route = discounted ? Route.Discounted.defaults()
                    : policy.choice() == PolicyChoice.SAFEST ? Route.Charging.exportedPolicy(false, false)
                    : new Route.Product(policy.choice(), false, false, false, false);
            Plan p = MissionPlanner.plan(m, PlanOptions.of(route).withMemoryBudget(mission.memoryBudgetBytes()));
            if (!p.guaranteed()) {
                notGuaranteed(m, discounted ? "there is no policy meeting "
                        + DiscountedCheck.condition((Objective.Discounted) m.objective()) + " to export"
                        : "there is no safe policy to export", out);
                return ExitCodes.NOT_GUARANTEED;
            }
            if (Failures.uncertified(p, "No policy is written.", err)) {
                return ExitCodes.INTERNAL;
            }
            Policy pol = p.policy().orElseThrow();
            int states = p.certification() instanceof Certification.Reserve r ? r.certificate().statesChecked()
                    : ((Certification.Discounted) p.certification()).certificate().statesChecked();
            if (p.detail() instanceof Plan.Detail.Discounted dd) {
                DiscountedAnalysis a = dd.analysis();
                Objective.Discounted o = a.objective();
                PolicyFiles.write(policyFile, PolicyFiles.Header.of(m, o, a.maxAbsWeight(), a.reserveKept()), pol);
                if (json.requested) {
                    ObjectNode j = summary(m, pol, states);
                    j.put("lowestScore", ((Certification.Discounted) p.certification()).certificate().worstScore()
                            .map(Object::toString).orElse(null));
                    out.println(Json.withCaveats(j));
                } else {
                    String worst = a.worstCaseScore().map(DiscountedCheck::show).orElse("not shown");
                    out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + pol.size()
                            + " rows with the score memory; worst score " + worst + " against "
                            + DiscountedCheck.condition(o) + ".");
                    certifiedLines(m, states, out);
                }
                return ExitCodes.OK;
            }
            int lowest = p.lowestLevelUnits().getAsInt();
            if (p.detail() instanceof Plan.Detail.Charging ch && ch.thresholds() != null) {
                ThresholdPolicy tp = ch.thresholds();
                PolicyFiles.write(policyFile, PolicyFiles.Header.of(m), tp);
                if (json.requested) {
                    ObjectNode o = summary(m, pol, states);
                    o.put("thresholdPositions", tp.size());
                    o.put("thresholds", tp.stepCount());
                    o.put("lowestLevelUnits", lowest);
                    o.put("policyChoice", "safest");
                    out.println(Json.withCaveats(o));
                } else {
                    out.println("Wrote the policy for " + m.name() + " to " + policyFile + " as level thresholds: "
                            + tp.size() + " positions, " + tp.stepCount() + " thresholds (" + pol.size()
                            + " situations met from the start); battery never below " + CheckReport.amount(lowest, m)
                            + " (the safest policy).");
                    certifiedLines(m, states, out);
                }
                return ExitCodes.OK;
            }
            PolicyFiles.write(policyFile, PolicyFiles.Header.of(m), pol);
            if (json.requested) {
                ObjectNode o = summary(m, pol, states);
                o.put("lowestLevelUnits", lowest);
                o.put("policyChoice", p.policyChoice() == PolicyChoice.SAFEST ? "safest" : "fewest-moves");
                out.println(Json.withCaveats(o));
            } else {
                out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + pol.size()
                        + " rows; battery never below " + CheckReport.amount(lowest, m) + " ("
                        + (p.policyChoice() == PolicyChoice.SAFEST ? "the safest policy" : "the policy of fewest moves")
                        + ").");
                certifiedLines(m, states, out);
            }
            return ExitCodes.OK;
        } catch (IOException e) {
            err.println("dockline: cannot write " + policyFile + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
    }

    /**
     * A patrol or a deadline mission: planned by {@link RoundsPlan} (solve, then the independent certificate);
     * the policy file's header says the goal (missions/POLICY-FORMAT.md, "Patrols and deadlines").
     */
    private int rounds(Mission m, PrintWriter out, PrintWriter err) throws IOException {
        RoundsPlan plan = RoundsPlan.of(m, RoundsCheck.budget(mission.memoryBudgetBytes()), policy.choice());
        boolean patrol = plan.patrol().isPresent();
        if (!plan.guaranteed()) {
            notGuaranteed(m, "there is no policy that " + (patrol ? "keeps the patrol going above the floor"
                    : "docks within the deadline above the floor") + " to export", out);
            return ExitCodes.NOT_GUARANTEED;
        }
        if (plan.certificateDisagrees()) {
            err.println("dockline: internal error: the solver says guaranteed, but its policy " + (plan.certificate().ok()
                    ? "has other figures under" : "failed") + " the independent certificate: "
                    + plan.certificate().reason());
            err.println("No policy is written. Please report this with the input files.");
            return ExitCodes.INTERNAL;
        }
        Policy pol = patrol ? plan.patrol().get().policy().orElseThrow() : plan.deadline().get().policy().orElseThrow();
        int lowest = plan.certificate().worstMinimumUnits();
        boolean safest = (patrol ? plan.patrol().get().policyFloorUnits() : plan.deadline().get().policyFloorUnits())
                > m.reserveUnits();
        PolicyFiles.write(policyFile, PolicyFiles.Header.ofRounds(m), pol);
        int states = plan.certificate().statesChecked();
        if (json.requested) {
            ObjectNode o = summary(m, pol, states);
            o.put("goal", patrol ? "patrol" : "deadline");
            o.put("lowestLevelUnits", lowest);
            o.put("policyChoice", safest ? "safest" : "fewest-moves");
            if (patrol) {
                o.put("longestLapTicks", plan.certificate().longestLapTicks());
            } else {
                o.put("worstFinishTicks", plan.certificate().longestLapTicks());
                o.put("deadlineTicks", plan.deadline().get().deadlineTicks());
            }
            out.println(Json.withCaveats(o));
        } else {
            String turns = m.timing().describeTicks(plan.certificate().longestLapTicks());
            out.println("Wrote the " + (patrol ? "patrol" : "deadline") + " policy for " + m.name() + " to "
                    + policyFile + ": " + pol.size() + " rows; battery never below " + CheckReport.amount(lowest, m)
                    + (patrol ? "; longest lap " + turns : "; docked within " + turns + " (deadline "
                    + m.timing().describeTicks(plan.deadline().get().deadlineTicks()) + ")") + " ("
                    + (safest ? "the safest policy" : patrol ? "the policy of shortest laps" : "the policy of fewest turns")
                    + ").");
            certifiedLines(m, states, out);
        }
        return ExitCodes.OK;
    }

    private static void certifiedLines(Mission m, int states, PrintWriter out) {
        out.println("  certified: true (the policy re-checked independently over " + states + " situations)");
        out.println("  Energy: " + m.scale().describe());
        out.println(Caveats.block());
    }

    private void notGuaranteed(Mission m, String why, PrintWriter out) {
        if (json.requested) {
            ObjectNode o = Json.header(m, Verdict.NOT_GUARANTEED);
            o.put("written", false);
            o.putNull("policyFile");
            o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
            o.put("rounding", m.scale().describe());
            out.println(Json.withCaveats(o));
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — " + why + "; nothing written.");
            out.println(Caveats.block());
        }
    }

    private ObjectNode summary(Mission m, Policy p, int certifiedStates) {
        ObjectNode o = Json.header(m, Verdict.GUARANTEED);
        o.put("written", true);
        o.put("policyFile", policyFile.toString());
        o.put("policyRows", p.size());
        o.put("certified", true);
        o.put("certifiedStates", certifiedStates);
        o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
        o.put("rounding", m.scale().describe());
        return o;
    }
}
