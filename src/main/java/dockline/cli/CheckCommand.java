package dockline.cli;

import dockline.model.Mission;
import dockline.model.Objective;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.plan.RouteNotApplicableException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline check MISSION}: parses the options into a {@link Route}, asks the core
 * ({@link MissionPlanner#plan}) and prints the {@link Plan} ({@link CheckReport}): the verdict, the worst
 * level under the policy (by default the safest policy), the highest floor that can be guaranteed,
 * the certificate, the suggestions, the size of the game and the time taken. A plan whose policy
 * failed its independent certificate is an internal error (exit 4), never a silent "guaranteed".
 * Exit code 0 guaranteed, 1 not guaranteed, 2 bad input, 3 over the memory limit, 4 internal error.
 *
 * <p>Several missions are checked one after the other with the same options, one result each in the
 * order given (with {@code --json} a JSON array of the single results, a mission that could not be
 * checked as its errors object); the exit code is the worst of them. One mission prints exactly what it
 * did before (one JSON object), so scripts and the schema's object form hold.
 */
@Command(name = "check",
        description = {"Decides, for each mission given, whether the robot can always finish the mission and dock without its battery going"
                + " below the reserve floor, whatever the building's disturbance model allows.",
                "With a discounted objective (in the mission, or --objective discounted) the score is checked too."},
        exitCodeList = {"0:guaranteed (and its policy certified, unless --verdict-only); with several missions: all are",
                "1:not guaranteed (several: at least one, and none of the worse codes)",
                "2:bad input or usage", "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (e.g. the policy failed its independent certificate)"})
public final class CheckCommand extends MissionCommand {

    @Parameters(index = "1..*", paramLabel = "MORE", description = "more mission files, checked in order with the"
            + " same options (one result each; with --json an array)")
    List<Path> more = new ArrayList<>();

    @Mixin
    PolicyOption policy;

    @Mixin
    JsonOption json;

    @Mixin
    DiscountedCheck discounted;

    @Mixin
    CheckRoute route;

    @Override
    int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        for (Path p : more) {
            String w = p.toString();
            if ((w.equalsIgnoreCase("wh") || w.equals("%")) && !java.nio.file.Files.exists(p)) {
                // `--start-charge 10 Wh` unquoted: the shell splits the amount, and the unit is no mission file
                err.println("dockline: Unmatched argument '" + w + "': it is not a mission file");
                err.println("An amount with a unit is one argument: write 12Wh, or '12 Wh' in quotes.");
                return ExitCodes.BAD_INPUT;
            }
        }
        if (more.isEmpty()) {
            return runOne(out, err);
        }
        List<Path> files = new ArrayList<>();
        files.add(mission.missionFile);
        files.addAll(more);
        ObjectMapper mapper = new ObjectMapper();
        ArrayNode array = mapper.createArrayNode();
        int worst = ExitCodes.OK;
        for (int i = 0; i < files.size(); i++) {
            mission.missionFile = files.get(i);
            StringWriter captured = new StringWriter();
            PrintWriter o = json.requested ? new PrintWriter(captured, true) : out;
            Failures.Tee tee = new Failures.Tee(err);
            PrintWriter e = new PrintWriter(tee, true);
            if (!json.requested) {
                out.println((i == 0 ? "" : System.lineSeparator()) + "== " + files.get(i) + " (" + (i + 1) + " of "
                        + files.size() + ")");
                out.flush();
            }
            int code;
            try {
                code = runOne(o, e);
            } catch (MissionOptions.BadInput bad) {
                code = ExitCodes.BAD_INPUT;
            }
            o.flush();
            e.flush();
            worst = Math.max(worst, code);
            if (json.requested) {
                array.add(result(mapper, captured.toString(), tee.copy.toString(), code, files.get(i)));
            }
        }
        if (json.requested) {
            out.println(Json.pretty(array));
        }
        return worst;
    }

    /** One mission's JSON result, or its errors object ({@link Failures#jsonErrors}) when it printed none. */
    private static JsonNode result(ObjectMapper mapper, String printed, String errors, int code, Path file) {
        if (!printed.isBlank()) {
            try {
                return mapper.readTree(printed);
            } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
                throw new IllegalStateException("internal: check printed no JSON: " + e.getMessage(), e);
            }
        }
        ObjectNode o = Failures.jsonErrors(errors, code);
        ObjectNode withFile = Json.object();
        withFile.put("file", file.toString());
        withFile.setAll(o);
        var caveats = withFile.putArray("caveats");
        dockline.report.Caveats.LINES.forEach(caveats::add);
        return withFile;
    }

    /** Checks the mission of {@link MissionOptions#missionFile}; prints its result; returns its exit code. */
    private int runOne(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
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
                return RoundsCheck.run(m, mission.memoryBudgetBytes(), policy.choice() == dockline.plan.PolicyChoice.SAFEST, json.requested,
                        out, err);
            }
            Route r;
            if (objective instanceof Objective.Discounted d) {
                if (policy.given()) {
                    return MissionOptions.reserveObjectiveOnly(err, policy.name());
                }
                if (route.nonDefault()) {
                    return MissionOptions.reserveObjectiveOnly(err, "--method", "--verdict-only");
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
            if (Failures.uncertified(p, "No verdict is given.", err)) {
                return ExitCodes.INTERNAL;
            }
            if (json.requested) {
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
