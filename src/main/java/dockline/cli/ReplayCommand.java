package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.Certificate;
import dockline.io.AtomicFiles;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.replay.ForcedEvent;
import dockline.replay.ForcedEventException;
import dockline.replay.Replay;
import dockline.replay.ReplayFormats;
import dockline.report.Caveats;
import dockline.plan.Certification;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PlanReplays;
import dockline.plan.Route;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Mixin;

/**
 * {@code dockline replay MISSION}: one run of the robot's policy, step by step. For a guaranteed
 * mission the policy is first certified independently; the default replay is the worst case (the
 * disturbance choices that drive the battery lowest). For a mission that is not guaranteed the worst
 * case is the counterexample: the disturbance's winning strategy against the robot's best effort.
 */
@Command(name = "replay",
        description = {"Replays the robot's policy for a mission step by step, with what the disturbances do.",
                "Guaranteed missions: the certified policy; not guaranteed: the counterexample that defeats every plan."},
        exitCodeList = {"0:guaranteed (policy certified)", "1:not guaranteed", "2:bad input or usage (also an impossible --force event)",
                "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (e.g. the policy failed its certificate)"})
public final class ReplayCommand extends MissionCommand {

    /**
     * Said when the fewest-moves policy is replayed on a mission with lasting closures: its attractor order is
     * that of the whole closure arena, which the phases of the charging route do not reproduce.
     */
    static final String WHOLE_ARENA_NOTE = "note: --fewest-moves on a mission with lasting closures is solved on the"
            + " whole closure arena (every set of closed doors and zones is built), which may be slow and need much"
            + " memory; the default, the safest policy, is decided phase by phase";

    /** Which disturbance choices to replay. */
    enum Disturbance { nominal, worst }

    @Mixin
    PolicyOption policy;

    @Option(names = "--disturbance", paramLabel = "nominal|worst",
            description = "nominal: no events; worst (default): the events that drive the battery lowest,"
                    + " or the counterexample when the mission is not guaranteed")
    Disturbance disturbance;

    @Option(names = "--force", paramLabel = "STEP:EVENT,...",
            description = "force events at steps, nominal elsewhere, e.g. 14:door-shut,20:slip@3:4; or at a named"
                    + " door or zone the first time the robot tries to enter it, e.g. door-shut@west-fire-door"
                    + " (a lasting rule closes it for the rest of the mission)"
                    + " (events: door-shut, blockage, slip, drag; a slip may name its cell)")
    String force;

    @Option(names = "--csv", paramLabel = "FILE", description = "also write the replay to FILE as CSV")
    Path csv;

    @Option(names = "--json-file", paramLabel = "FILE", description = "also write the replay to FILE as JSON")
    Path jsonFile;

    @Option(names = "--json", description = "print the replay as one JSON object instead of the text")
    boolean json;

    @Override
    int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        List<ForcedEvent> forced = List.of();
        if (force != null) {
            if (disturbance == Disturbance.worst) {
                err.println("dockline: --force replays the named events with nominal outcomes elsewhere;"
                        + " it cannot be combined with --disturbance worst");
                return ExitCodes.BAD_INPUT;
            }
            try {
                forced = ForcedEvent.parseList(force);
            } catch (IllegalArgumentException e) {
                err.println("dockline: --force: " + e.getMessage());
                return ExitCodes.BAD_INPUT;
            }
        }
        Mission m = mission.load(err);
        if (!mission.outputOk("--csv", csv, m, err) || !mission.outputOk("--json-file", jsonFile, m, err)) {
            return ExitCodes.BAD_INPUT;
        }
        if (csv != null && jsonFile != null
                && csv.toAbsolutePath().normalize().equals(jsonFile.toAbsolutePath().normalize())) {
            err.println("dockline: --csv and --json-file name the same file " + csv + "; give two names");
            return ExitCodes.BAD_INPUT;
        }
        if (m.beyondOneTrip()) {
            return RoundsReplayCommand.run(m, mission, force != null || disturbance == Disturbance.nominal,
                    policy.choice() == dockline.plan.PolicyChoice.SAFEST, json, csv, jsonFile, out, err);
        }
        boolean lasting = m.map().disturbances().anyLasting();
        boolean safest = policy.choice() == dockline.plan.PolicyChoice.SAFEST;
        String wholeArenaNote = lasting && !safest ? WHOLE_ARENA_NOTE : null;
        if (wholeArenaNote != null && json) {
            err.println("dockline: " + wholeArenaNote); // the JSON has no place for notes; stdout stays one object
        }
        Plan plan;
        try {
            // the safest policy is replayed from the route export writes it from, so every run shown (worst case,
            // counterexample, nominal, forced events) is a run of the very policy in the file; with lasting closures
            // that route is phase by phase and never builds the whole closure arena: the policy is certified on the
            // kept phases, where a closure into a left-out phase loses, so no play of it (forced events included)
            // can meet one, and it plays the same in the mission
            Route route = safest ? Route.Charging.exportedPolicy(true, false)
                    : new Route.Product(policy.choice(), false, false, true, false);
            plan = MissionPlanner.plan(m, PlanOptions.of(route).withMemoryBudget(mission.memoryBudgetBytes()));
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
        if (Failures.uncertified(plan, "No replay is shown.", err)) {
            return ExitCodes.INTERNAL;
        }
        PlanReplays mr = plan.replays().orElseThrow();
        Replay replay;
        String what;
        try {
            if (!forced.isEmpty()) {
                replay = mr.forced(forced);
                what = "forced events " + force;
            } else if (disturbance == Disturbance.nominal) {
                replay = mr.nominal();
                what = "nominal (no events)";
            } else {
                replay = mr.worstCase();
                what = plan.guaranteed() ? "worst case (the events that drive the battery lowest)"
                        : "counterexample (the disturbance's winning strategy)";
            }
        } catch (ForcedEventException e) {
            err.println("dockline: --force: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } catch (IllegalStateException e) {
            err.println("dockline: " + e.getMessage());
            return plan.guaranteed() ? ExitCodes.INTERNAL : ExitCodes.NOT_GUARANTEED;
        }
        String jsonText = json || jsonFile != null ? json(m, plan, replay) : null;
        if (!writeFiles(err, csv, csv == null ? null : ReplayFormats.csv(replay), jsonFile, jsonText)) {
            return ExitCodes.BAD_INPUT;
        }
        if (json) {
            out.println(jsonText);
        } else {
            print(out, m, plan, mr, replay, what, wholeArenaNote);
        }
        return plan.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    /**
     * Writes the replay's CSV and JSON files that were asked for (each atomically: a file is whole or
     * not there). On a failure says which file on stderr and returns false.
     */
    static boolean writeFiles(PrintWriter err, Path csv, String csvText, Path jsonFile, String jsonText) {
        Path writing = null;
        try {
            if (csv != null) {
                writing = csv;
                AtomicFiles.writeString(csv, csvText);
            }
            if (jsonFile != null) {
                writing = jsonFile;
                AtomicFiles.writeString(jsonFile, jsonText + "\n");
            }
            return true;
        } catch (IOException e) {
            err.println("dockline: cannot write " + writing + ": " + e.getMessage());
            return false;
        }
    }

    /** The replay's JSON with the verdict, the certificate and the caveats. */
    private static String json(Mission m, Plan plan, Replay replay) {
        ObjectNode o = Json.header(m, plan.verdict());
        o.put("certified", plan.certification().ok());
        o.setAll(ReplayFormats.jsonTree(m, replay));
        return Json.withCaveats(o);
    }

    private void print(PrintWriter out, Mission m, Plan plan, PlanReplays mr, Replay replay, String what,
                       String note) {
        out.println(mission.title(m) + ": " + (plan.guaranteed() ? "guaranteed" : "NOT guaranteed"));
        if (plan.certification() instanceof Certification.Reserve r) {
            Certificate c = r.certificate();
            out.println("certified: " + c.ok() + " (" + c.statesChecked()
                    + " situations of the policy checked independently)");
        }
        if (!plan.guaranteed()) {
            out.println(mr.bestEffortFloor() >= 0
                    ? "best effort: the policy for the highest reserve that can be guaranteed, " + mr.bestEffortFloor()
                            + " units (" + m.scale().formatWh(mr.bestEffortFloor()) + ")"
                    : "best effort: none (no reserve floor at all can be guaranteed from this start)");
        }
        if (!(m.objective() instanceof Objective.Reserve)) {
            out.println("note: this mission's objective is a discounted score; the replay follows the reserve objective"
                    + " (the floor and the tasks) only");
        }
        if (note != null) {
            out.println(note);
        }
        out.println("replay: " + what + ", " + (replay.steps().size() - 1) + " steps, ends " + replay.ending().word());
        out.println();
        out.print(ReplayFormats.table(replay));
        out.println();
        for (String line : replay.explanation()) {
            out.println(line);
        }
        out.println();
        out.println("Energy: " + m.scale().describe() + ".");
        out.println(Caveats.block());
    }
}
