package dockline.cli;

import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.model.Mission;
import dockline.replay.RoundsReplay;
import dockline.report.Caveats;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;

/**
 * {@code replay} for a patrol (its lasso: the way in, then the loop that repeats, or the building's winning
 * play) and for a deadline mission (the slowest play of its policy). A deadline mission the robot cannot
 * finish at all at its floor has no such play; then its one-trip counterexample is the replay to read, and
 * the command says so.
 */
final class RoundsReplayCommand {

    private RoundsReplayCommand() {
    }

    static int run(Mission m, MissionOptions mission, boolean nonWorst, boolean safest, boolean json, Path csv,
                   Path jsonFile, PrintWriter out, PrintWriter err) {
        if (nonWorst) {
            err.println("dockline: a patrol or deadline replay shows the worst case (or the counterexample) of the"
                    + " checked policy; --disturbance nominal and --force apply to one-trip missions");
            return ExitCodes.BAD_INPUT;
        }
        RoundsReplay r;
        try {
            long budget = RoundsCheck.budget(mission.memoryBudgetBytes());
            Optional<RoundsReplay> d = RoundsPlan.replay(m, budget, safest ? PolicyChoice.SAFEST
                    : PolicyChoice.FEWEST_MOVES);
            if (d.isEmpty()) {
                err.println("dockline: " + mission.missionFile + ": the robot cannot always finish this mission at"
                        + " its floor, deadline or not; for the play that defeats it, check the mission without"
                        + " its deadline (remove deadline:) and replay that.");
                return ExitCodes.NOT_GUARANTEED;
            }
            r = d.get();
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
        ObjectNode o = Json.object();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", r.guaranteed() ? "guaranteed" : "not-guaranteed");
        o.setAll(r.jsonTree(m));
        String jsonText = Json.withCaveats(o);
        if (!ReplayCommand.writeFiles(err, csv, csv == null ? null : r.csv(), jsonFile, jsonText)) {
            return ExitCodes.BAD_INPUT;
        }
        if (json) {
            out.println(jsonText);
        } else {
            out.println(mission.title(m) + ": " + (r.guaranteed() ? "guaranteed" : "NOT guaranteed"));
            String what = m.tasks().patrols() ? (r.guaranteed() ? "the lasso of the policy through its lowest level"
                    : "counterexample (the building's winning play)") : "the slowest play of the policy";
            out.println("replay: " + what + ", " + (r.replay().steps().size() - 1) + " steps, ends "
                    + r.replay().ending().word() + (r.loopStart() >= 0 ? " (loop from step " + r.loopStart()
                    + ", length " + r.loopLength() + ")" : ""));
            out.println();
            out.print(r.table());
            out.println();
            for (String line : r.replay().explanation()) {
                out.println(line);
            }
            out.println();
            out.println("Energy: " + m.scale().describe() + ".");
            out.println(Caveats.block());
        }
        return r.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }
}
