package dockline.replay;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Timing;
import dockline.solve.rounds.RoundsPlay;
import dockline.solve.rounds.RoundsPlays;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The replay of a patrol or a deadline mission: a {@link Replay} of the play {@link RoundsPlays} found, and
 * for a patrol the lasso's loop (the rows from {@code loopStart} repeat for ever), with the steps where a lap
 * is complete. Text, CSV and JSON mark the loop: the table has a mark column and two marker lines, the CSV a
 * {@code part} column ({@code way-in} or {@code loop}), the JSON {@code "loop": {"startStep": n, "length": m}}.
 *
 * @param replay      the rows, the ending and the explanation
 * @param loopStart   the first step of the loop, or -1 when the play ends
 * @param loopLength  the steps of the loop (0 when the play ends)
 * @param lapSteps    the steps at which a lap is complete (patrols)
 * @param guaranteed  the verdict the replay belongs to
 */
public record RoundsReplay(Replay replay, int loopStart, int loopLength, List<Integer> lapSteps, boolean guaranteed) {

    public RoundsReplay {
        lapSteps = List.copyOf(lapSteps);
    }

    /**
     * The replay of a patrol: its worst lasso when guaranteed (of the safest policy, or of the one of shortest
     * laps), else the building's winning play.
     */
    public static RoundsReplay patrol(Mission m, long budgetBytes, boolean safest) {
        RoundsPlays.PatrolPlay pp = RoundsPlays.patrol(m, budgetBytes, safest);
        Arena arena = ArenaCompiler.compile(m);
        return of(m, arena, pp.play(), pp.guaranteed());
    }

    /**
     * The slowest play of a deadline mission's policy (guaranteed or late), or empty when the robot cannot
     * finish at all at this floor (then the one-trip counterexample applies).
     */
    public static Optional<RoundsReplay> deadline(Mission m, long budgetBytes, boolean safest) {
        Optional<RoundsPlay> play = RoundsPlays.deadline(m, budgetBytes, safest);
        if (play.isEmpty()) {
            return Optional.empty();
        }
        int turns = play.get().rows() - 1;
        return Optional.of(of(m, ArenaCompiler.compile(m), play.get(), turns <= m.timing().deadlineTicks()));
    }

    private static RoundsReplay of(Mission m, Arena arena, RoundsPlay play, boolean guaranteed) {
        boolean patrol = m.tasks().patrols();
        int floor = m.reserveUnits();
        Replayer.Explainer ex = new Replayer.Explainer(arena, floor);
        List<ReplayStep> rows = new ArrayList<>();
        List<Integer> laps = new ArrayList<>();
        int full = (1 << m.tasks().patrol().size()) - 1;
        int min = Integer.MAX_VALUE;
        for (int i = 0; i < play.rows(); i++) {
            dockline.arena.Action action = i == 0 ? null : arena.action(play.action()[i]);
            ReplayEvent ev = i == 0 ? ReplayEvent.NONE : ex.event(play.edge()[i]);
            int level = play.level()[i];
            min = Math.min(min, level);
            String words = patrol ? lapWords(m, play.mask()[i]) : Replayer.progressWords(m, play.mask()[i]);
            rows.add(new ReplayStep(i, Cell.ofIndex(play.cell()[i], arena.width()), action, ev, level,
                    m.scale().toWh(level), play.budgetLeft()[i], play.mask()[i], words));
            if (patrol && play.mask()[i] == full) {
                laps.add(i);
            }
        }
        Replay.Ending ending = switch (play.ending()) {
            case COMPLETE -> Replay.Ending.COMPLETE;
            case BELOW_FLOOR -> Replay.Ending.BELOW_FLOOR;
            case AVOIDED_ZONE -> Replay.Ending.AVOIDED_ZONE;
            case REPEATS -> Replay.Ending.REPEATS;
        };
        Replay.Kind kind = guaranteed ? Replay.Kind.WORST : Replay.Kind.COUNTEREXAMPLE;
        List<String> words = explain(m, rows, play, laps, guaranteed, floor);
        return new RoundsReplay(new Replay(kind, rows, ending, min, floor, words), play.loopStart(), play.loopLength(),
                laps, guaranteed);
    }

    /** E.g. {@code lap: ward-a, ward-b; missing day-room}, or {@code lap complete}. */
    static String lapWords(Mission m, int mask) {
        List<String> cps = m.tasks().patrol();
        List<String> done = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (int i = 0; i < cps.size(); i++) {
            ((mask & (1 << i)) != 0 ? done : missing).add(cps.get(i));
        }
        if (missing.isEmpty()) {
            return "lap complete";
        }
        return "lap: " + (done.isEmpty() ? "nothing yet" : String.join(", ", done)) + "; missing "
                + String.join(", ", missing);
    }

    private static List<String> explain(Mission m, List<ReplayStep> rows, RoundsPlay play, List<Integer> laps,
                                        boolean guaranteed, int floor) {
        List<String> out = new ArrayList<>();
        Timing t = m.timing();
        int last = rows.size() - 1;
        int low = 0;
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).batteryUnits() < rows.get(low).batteryUnits()) {
                low = i;
            }
        }
        if (m.tasks().patrols()) {
            if (play.loopStart() >= 0) {
                int n = play.loopStart();
                long lapsInLoop = laps.stream().filter(s -> s >= n).count();
                out.add("The way in is steps 0 to " + n + "; then steps " + n + " to " + last + " repeat for ever (the"
                        + " step after " + last + " is step " + n + " again): " + play.loopLength() + " turns"
                        + (t.hasTick() ? " = " + Timing.clock(t.seconds(play.loopLength())) : "") + ", "
                        + (lapsInLoop == 0 ? "and no lap is ever completed in them" : lapsInLoop + " completed lap"
                        + (lapsInLoop == 1 ? "" : "s") + " each time round") + ".");
            }
            if (guaranteed) {
                out.add("The lowest level of this play is " + Replayer.units(rows.get(low).batteryUnits(), m.scale())
                        + " at step " + low + ", the lowest the building can force under the policy (floor "
                        + Replayer.units(floor, m.scale()) + ").");
            } else if (play.ending() == RoundsPlay.Ending.REPEATS) {
                int mask = play.mask()[play.loopStart()];
                out.add("The building wins: in the loop the robot never completes a lap; it never reaches "
                        + String.join(", ", missing(m, mask)) + " again.");
            } else if (play.ending() == RoundsPlay.Ending.BELOW_FLOOR) {
                out.add("The building wins: at step " + last + " the battery is at " + Replayer.units(rows.get(last)
                        .batteryUnits(), m.scale()) + ", below the floor of " + Replayer.units(floor, m.scale())
                        + " (" + rows.get(last).progressWords() + ").");
            } else {
                out.add("The building wins: at step " + last + " the robot is pushed into an avoided zone at "
                        + rows.get(last).cell() + ".");
            }
            if (!guaranteed) {
                out.add("Against any plan of the robot the building has such a play; this one is against the robot's"
                        + " best effort (it heads for the situations that hold out longest, then for the next lap).");
            }
            return out;
        }
        int deadline = t.deadlineTicks();
        out.add("The mission is complete at step " + last + " (" + t.describeTicks(last) + "), the slowest the building"
                + " can make the policy; the deadline is " + t.describeTicks(deadline) + (last <= deadline
                ? ", so it is met." : ", so it is passed after step " + deadline + "."));
        out.add("The lowest level of this play is " + Replayer.units(rows.get(low).batteryUnits(), m.scale()) + " at step "
                + low + " (floor " + Replayer.units(floor, m.scale()) + ").");
        return out;
    }

    private static List<String> missing(Mission m, int mask) {
        List<String> out = new ArrayList<>();
        List<String> cps = m.tasks().patrol();
        for (int i = 0; i < cps.size(); i++) {
            if ((mask & (1 << i)) == 0) {
                out.add(cps.get(i));
            }
        }
        return out;
    }

    /** The table with a mark column: {@code >} on the first loop row, {@code |} on the others, {@code *} a completed lap. */
    public String table() {
        String[] lines = ReplayFormats.table(replay).split("\\R");
        StringBuilder sb = new StringBuilder();
        String nl = System.lineSeparator();
        for (int i = 0; i < lines.length; i++) {
            int step = i - 1;
            if (loopStart >= 0 && step == loopStart) {
                sb.append("---- the loop: steps ").append(loopStart).append(" to ").append(loopStart + loopLength - 1)
                        .append(" repeat for ever ----").append(nl);
            }
            String mark = step < 0 ? "   " : (loopStart >= 0 && step >= loopStart ? "|" : " ")
                    + (lapSteps.contains(step) ? "* " : "  ");
            sb.append(mark).append(lines[i]).append(nl);
        }
        if (loopStart >= 0) {
            sb.append("---- back to step ").append(loopStart).append(" ----").append(nl);
        }
        return sb.toString();
    }

    /** The CSV of {@link ReplayFormats#csv} with a last column {@code part}: {@code way-in} or {@code loop}. */
    public String csv() {
        String[] lines = ReplayFormats.csv(replay).split("\r\n");
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < lines.length; i++) {
            int step = i - 1;
            sb.append(lines[i]).append(',').append(step < 0 ? "part" : loopStart >= 0 && step >= loopStart ? "loop"
                    : "way-in").append("\r\n");
        }
        return sb.toString();
    }

    /** The JSON tree of {@link ReplayFormats#jsonTree} with {@code loop} (or null) and {@code lapSteps}. */
    public ObjectNode jsonTree(Mission m) {
        ObjectNode o = ReplayFormats.jsonTree(m, replay);
        if (loopStart >= 0) {
            ObjectNode loop = o.putObject("loop");
            loop.put("startStep", loopStart);
            loop.put("length", loopLength);
        } else {
            o.putNull("loop");
        }
        ArrayNode laps = o.putArray("lapSteps");
        lapSteps.forEach(laps::add);
        if (m.timing().hasDeadline()) {
            o.put("deadlineTicks", m.timing().deadlineTicks());
        }
        return o;
    }
}
