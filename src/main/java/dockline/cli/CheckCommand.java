package dockline.cli;

import dockline.model.Mission;
import dockline.model.Objective;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.plan.RouteNotApplicableException;
import java.io.PrintWriter;
import java.util.Optional;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code dockline check MISSION}: parses the options into a {@link Route}, asks the core
 * ({@link MissionPlanner#plan}) and prints the {@link Plan} ({@link CheckReport}): the verdict, the worst
 * level under the policy (by default the safest policy), the highest floor that can be guaranteed,
 * the certificate, the suggestions, the size of the game and the time taken. A plan whose policy
 * failed its independent certificate is an internal error (exit 4), never a silent "guaranteed".
 * Exit code 0 guaranteed, 1 not guaranteed, 2 bad input, 3 over the memory limit, 4 internal error.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Decides whether the robot can always finish the mission and dock without its battery going"
                + " below the reserve floor, whatever the building's disturbance model allows.",
                "With a discounted objective (in the mission, or --objective discounted) the score is checked too."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:guaranteed (and its policy certified, unless --verdict-only)", "1:not guaranteed",
                "2:bad input or usage", "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (e.g. the policy failed its independent certificate)"})
public final class CheckCommand extends MissionCommand {

    @Mixin
    PolicyOption policy;

    @Option(names = "--json", description = "print the result as one JSON object instead of the text")
    boolean json;

    @Mixin
    DiscountedCheck discounted;

    @Mixin
    CheckRoute route;

    @Override
    int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        try {
            Mission m = mission.load(err);
            Objective objective = discounted.objective(m.objective(), err);
            if (objective == null) {
                return ExitCodes.BAD_INPUT;
            }
            if (m.beyondOneTrip()) {
                String refused = RoundsCheck.refusedOption(false, route.nonDefault(),
                        objective instanceof Objective.Discounted);
                if (refused != null) {
                    err.println("dockline: " + refused);
                    return ExitCodes.BAD_INPUT;
                }
                return RoundsCheck.run(m, mission.memoryBudgetBytes(), policy.choice() == dockline.plan.PolicyChoice.SAFEST, json,
                        out, err);
            }
            Route r;
            if (objective instanceof Objective.Discounted d) {
                if (policy.given()) {
                    err.println("dockline: " + policy.name() + " applies to the reserve objective only");
                    return ExitCodes.BAD_INPUT;
                }
                if (route.nonDefault()) {
                    err.println("dockline: --method and --verdict-only apply to the reserve objective only");
                    return ExitCodes.BAD_INPUT;
                }
                m = m.withObjective(d);
                r = discounted.route();
            } else {
                r = route.route(policy, err);
                if (r == null) {
                    return ExitCodes.BAD_INPUT;
                }
            }
            Plan p;
            try {
                p = MissionPlanner.plan(m, PlanOptions.of(r).withMemoryBudget(mission.memoryBudgetBytes()));
            } catch (RouteNotApplicableException e) {
                if (r instanceof Route.Charging) {
                    err.println("dockline: " + mission.missionFile + ": --method charging does not apply: "
                            + e.getMessage() + ". Use --method product (or auto).");
                } else {
                    err.println("dockline: " + mission.missionFile + ": --method fast does not apply: the robot can"
                            + " charge on a dock before the mission is complete, and the fast path counts consumption"
                            + " only. Use --method product (or auto).");
                }
                return ExitCodes.BAD_INPUT;
            }
            // never a silent "guaranteed": a policy that failed its independent certificate is an internal error
            Optional<String> problem = p.certification().problem();
            if (problem.isPresent()) {
                err.println("dockline: internal error: " + problem.get());
                err.println("No verdict is given. Please report this with the input files.");
                return ExitCodes.INTERNAL;
            }
            if (json) {
                out.println(CheckReport.json(p));
            } else {
                CheckReport.text(p, out);
            }
            return p.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
    }
}
