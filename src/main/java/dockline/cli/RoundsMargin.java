package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.model.Mission;
import dockline.model.Timing;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.report.Caveats;
import dockline.solve.Verdict;
import dockline.solve.rounds.DeadlineAnalysis;
import dockline.solve.rounds.PatrolAnalysis;
import java.io.PrintWriter;
import java.util.List;
import java.util.OptionalInt;

/**
 * {@code margin} for the missions beyond one trip. The figures are those {@code check} reports, taken from the
 * core's {@link RoundsPlan} (no search of its own): for a patrol the highest reserve floor that keeps it going
 * for ever; for a deadline mission the highest floor that still keeps the deadline and the tightest deadline
 * still guaranteed at the mission's floor (the start's attractor rank, see
 * {@link dockline.solve.rounds.DeadlineSolver}); for both the lowest starting charge that guarantees the
 * mission's floor ({@link RoundsPlan#withLowestStart}). The JSON object follows
 * src/main/resources/dockline/schemas/margin-rounds.schema.json.
 */
final class RoundsMargin {

    private RoundsMargin() {
    }

    /** The figures of one run, for the text and the JSON. */
    record Figures(Mission mission, boolean guaranteed, String goal, int startUnits, int reserveUnits,
                   int capacityUnits, OptionalInt highestReserveUnits, OptionalInt tightestDeadlineTicks,
                   int deadlineTicks, RoundsPlan plan, List<RoundsPlan.Change> changes) {
    }

    /** Plans the mission (the highest floor included) and reads off the margins. */
    static Figures of(Mission m, long memoryBudgetBytes) {
        long bytes = RoundsCheck.budget(memoryBudgetBytes);
        RoundsPlan first = RoundsPlan.of(m, bytes, PolicyChoice.FEWEST_MOVES);
        if (first.certificateDisagrees()) {
            throw new IllegalStateException("the solver says guaranteed, but its policy failed the independent"
                    + " certificate: " + first.certificate().reason());
        }
        RoundsPlan plan = first.withLowestStart(bytes);
        if (plan.patrol().isPresent()) {
            PatrolAnalysis a = plan.patrol().get();
            return new Figures(m, a.guaranteed(), "patrol", a.startUnits(), a.reserveUnits(), a.capacityUnits(),
                    a.highestGuaranteedReserveUnits(), OptionalInt.empty(), -1, plan, RoundsCheck.changes(plan));
        }
        DeadlineAnalysis a = plan.deadline().orElseThrow();
        return new Figures(m, a.guaranteed(), "deadline", a.startUnits(), a.reserveUnits(), a.capacityUnits(),
                a.highestGuaranteedReserveUnits(), a.tightestTicks(), a.deadlineTicks(), plan, RoundsCheck.changes(plan));
    }

    static void text(Figures f, String title, PrintWriter out) {
        Mission m = f.mission();
        Timing t = m.timing();
        boolean patrol = f.goal().equals("patrol");
        out.println(title + ": " + (f.guaranteed() ? "guaranteed" : "NOT guaranteed") + " as written (a "
                + (patrol ? "patrol" : "mission with a deadline of " + t.describeTicks(f.deadlineTicks())) + "; start "
                + CheckReport.amount(f.startUnits(), m) + ", reserve floor " + CheckReport.amount(f.reserveUnits(), m)
                + ")");
        out.println("highest reserve floor guaranteed from this start" + (patrol ? "" : " within the deadline") + ": "
                + (f.highestReserveUnits().isPresent() ? CheckReport.amount(f.highestReserveUnits().getAsInt(), m)
                : "none (not even a floor of 0)"));
        out.println("lowest starting charge that guarantees this floor" + (patrol ? "" : " within the deadline") + ": "
                + RoundsCheck.lowestStartWords(f.plan()));
        if (!patrol) {
            out.println("tightest deadline guaranteed at this floor: " + (f.tightestDeadlineTicks().isPresent()
                    ? t.describeTicks(f.tightestDeadlineTicks().getAsInt())
                    : "none (the robot cannot always finish at this floor)"));
        }
        out.println("  (the same figures as 'dockline check'; found by bisection over the floor on the "
                + (patrol ? "recurrence game" : "attractor ranks") + ", and the start from one game of every starting"
                + " level)");
        if (!f.changes().isEmpty()) {
            out.println();
            out.println("to make it guaranteed, change one of:");
            int i = 1;
            for (RoundsPlan.Change c : f.changes()) {
                out.println("  " + i++ + ". " + c.text());
            }
        } else if (!f.guaranteed()) {
            out.println();
            String what = f.plan().lowestStartSearched() ? (patrol ? "the reserve floor or the starting charge"
                    : "the reserve floor, the starting charge or the deadline") : patrol ? "the reserve floor"
                    : "the reserve floor or the deadline";
            out.println("no change of " + what + " alone makes it guaranteed; consider another route, a second dock or"
                    + " a different robot");
        }
        out.println();
        out.println("Energy: " + m.scale().describe() + ".");
        out.println(Caveats.block());
    }

    static String json(Figures f) {
        Mission m = f.mission();
        ObjectNode o = Json.header(m, Verdict.of(f.guaranteed()));
        o.put("guaranteed", f.guaranteed());
        o.put("goal", f.goal());
        Json.putBattery(o, f.startUnits(), f.reserveUnits(), f.capacityUnits());
        Json.putUnitAndBudget(o, m);
        Json.putUnitsAndWh(o, "highestReserve", f.highestReserveUnits(), m.scale());
        Json.putUnitsAndWh(o, "lowestStart", f.plan().lowestStartUnits(), m.scale());
        o.put("lowestStartSearched", f.plan().lowestStartSearched());
        if (!f.goal().equals("patrol")) {
            o.put("deadlineTicks", f.deadlineTicks());
            Json.putOptional(o, "tightestDeadlineTicks", f.tightestDeadlineTicks());
            RoundsCheck.seconds(o, "tightestDeadlineSeconds", m, f.tightestDeadlineTicks());
        }
        RoundsCheck.changesJson(o, f.changes());
        o.put("rounding", m.scale().describe());
        return Json.withCaveats(o) + "\n";
    }
}
