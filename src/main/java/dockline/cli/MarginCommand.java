package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.io.AtomicFiles;
import dockline.margin.MarginReport;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.margin.Suggestion;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.report.Caveats;
import dockline.solve.Verdict;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.OptionalInt;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code dockline margin MISSION}: asks the core for the margins ({@link Route.Margins}) and prints
 * them: the highest reserve floor that can be guaranteed from the
 * mission's starting charge and the lowest starting charge that guarantees its floor, each computed
 * by bisection over the threshold solver and by the minimum-credit pass of the charging route (still called
 * "fixpoint" in the output), with both timings. The
 * two must agree; if they do not, that is an internal error (exit 4).
 */
@Command(name = "margin",
        description = {"Finds the highest reserve floor and the lowest starting charge that still guarantee a mission,"
                + " two independent ways, and what would make a mission that is not guaranteed guaranteed."},
        exitCodeList = {"0:the mission as written is guaranteed", "1:not guaranteed", "2:bad input or usage",
                "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (the two methods disagree)"})
public final class MarginCommand extends MissionCommand {

    @Option(names = "--json", description = "print the margins as one JSON object instead of the text")
    boolean json;

    @Option(names = "--json-file", paramLabel = "FILE", description = "also write the margins to FILE as JSON")
    Path jsonFile;

    @Override
    int run(PrintWriter out, PrintWriter err) throws MissionOptions.BadInput {
        Mission m = mission.load(err);
        if (!mission.outputOk("--json-file", jsonFile, m, err)) {
            return ExitCodes.BAD_INPUT;
        }
        if (m.beyondOneTrip()) {
            return rounds(m, out, err);
        }
        MarginReport r;
        try {
            Plan plan = MissionPlanner.plan(m, PlanOptions.of(new Route.Margins())
                    .withMemoryBudget(mission.memoryBudgetBytes()));
            r = ((Plan.Detail.Margins) plan.detail()).report();
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
        if (jsonFile != null) {
            try {
                AtomicFiles.writeString(jsonFile, json(m, r));
            } catch (IOException e) {
                err.println("dockline: cannot write " + jsonFile + ": " + e.getMessage());
                return ExitCodes.BAD_INPUT;
            }
        }
        if (json) {
            out.print(json(m, r));
        } else {
            print(out, m, r);
        }
        if (!r.agree()) {
            err.println("dockline: internal error: the bisection over the threshold solver and the fixpoint disagree"
                    + " (bisection: highest reserve " + show(r.bisection().highestReserveUnits()) + ", lowest start "
                    + show(r.bisection().lowestStartUnits()) + "; fixpoint: " + show(r.fixpoint().highestReserveUnits())
                    + ", " + show(r.fixpoint().lowestStartUnits()) + "). Please report this with the input files.");
            return ExitCodes.INTERNAL;
        }
        return r.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    /** A patrol or a deadline mission: the figures {@code check} has ({@link RoundsMargin}). */
    private int rounds(Mission m, PrintWriter out, PrintWriter err) {
        RoundsMargin.Figures f;
        try {
            f = RoundsMargin.of(m, mission.memoryBudgetBytes());
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        }
        String text = RoundsMargin.json(f);
        if (jsonFile != null) {
            try {
                AtomicFiles.writeString(jsonFile, text);
            } catch (IOException e) {
                err.println("dockline: cannot write " + jsonFile + ": " + e.getMessage());
                return ExitCodes.BAD_INPUT;
            }
        }
        if (json) {
            out.print(text);
        } else {
            RoundsMargin.text(f, mission.title(m), out);
        }
        return f.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    private void print(PrintWriter out, Mission m, MarginReport r) {
        EnergyScale s = m.scale();
        int cap = r.capacityUnits();
        out.println(mission.title(m) + ": " + (r.guaranteed() ? "guaranteed" : "NOT guaranteed")
                + " as written (start " + charge(s, r.startUnits(), cap) + ", reserve floor " + charge(s, r.floorUnits(), cap) + ")");
        if (!(m.objective() instanceof Objective.Reserve)) {
            out.println("note: this mission's objective is a discounted score; the margins are those of the reserve"
                    + " objective (the floor and the tasks) only");
        }
        out.println("highest reserve floor guaranteed from this start: " + charge(s, r.highestReserveUnits(), cap));
        out.println("lowest starting charge that guarantees this floor: " + charge(s, r.lowestStartUnits(), cap));
        out.println();
        String[][] rows = {
            {"method", "highest reserve", "lowest start", "time"},
            {"bisection over the threshold solver", show(r.bisection().highestReserveUnits()),
                show(r.bisection().lowestStartUnits()), r.bisection().millis() + " ms"},
            {"minimum-credit fixpoint", show(r.fixpoint().highestReserveUnits()),
                show(r.fixpoint().lowestStartUnits()), r.fixpoint().millis() + " ms"}};
        int[] w = new int[4];
        for (String[] row : rows) {
            for (int i = 0; i < 4; i++) {
                w[i] = Math.max(w[i], row[i].length());
            }
        }
        for (String[] row : rows) {
            StringBuilder sb = new StringBuilder("  ");
            for (int i = 0; i < 4; i++) {
                sb.append(i == 0 ? pad(row[i], w[i]) : "  " + padLeft(row[i], w[i]));
            }
            out.println(sb.toString().stripTrailing());
        }
        out.println("  the two methods " + (r.agree() ? "agree" : "DISAGREE"));
        if (!r.suggestions().isEmpty()) {
            out.println();
            out.println("to make it guaranteed, change one of (smallest change first):");
            int i = 1;
            for (Suggestion sg : r.suggestions()) {
                out.println("  " + i++ + ". " + sg.text());
            }
        } else if (!r.guaranteed()) {
            out.println();
            out.println("no change of the start charge, the reserve floor or the disturbance budget alone makes it"
                    + " guaranteed; consider another route, a second dock or a different robot");
        }
        out.println();
        out.println("Energy: " + s.describe() + ".");
        out.println(Caveats.block());
    }

    private static String pad(String s, int w) {
        return s + " ".repeat(w - s.length());
    }

    private static String padLeft(String s, int w) {
        return " ".repeat(w - s.length()) + s;
    }

    private static String show(OptionalInt u) {
        return u.isPresent() ? u.getAsInt() + " units" : "none";
    }

    private static String charge(EnergyScale s, OptionalInt u, int cap) {
        return u.isPresent() ? charge(s, u.getAsInt(), cap) : "none";
    }

    private static String charge(EnergyScale s, int u, int cap) {
        return u + (u == 1 ? " unit (" : " units (") + s.formatWh(u) + ", " + percent(u, cap) + "% of capacity)";
    }

    /** For display only; no decision depends on it. */
    private static String percent(int u, int cap) {
        return cap == 0 ? "0" : BigDecimal.valueOf(u * 100L).divide(BigDecimal.valueOf(cap), 1, RoundingMode.HALF_UP)
                .stripTrailingZeros().toPlainString();
    }

    static String json(Mission m, MarginReport r) {
        EnergyScale s = m.scale();
        ObjectNode root = Json.header(m, Verdict.of(r.guaranteed()));
        root.put("guaranteed", r.guaranteed());
        Json.putBattery(root, r.startUnits(), r.floorUnits(), r.capacityUnits());
        Json.putUnitAndBudget(root, m);
        Json.putUnitsAndWh(root, "highestReserve", r.highestReserveUnits(), s);
        Json.putUnitsAndWh(root, "lowestStart", r.lowestStartUnits(), s);
        root.put("agree", r.agree());
        method(root.putObject("bisection"), r.bisection(), s);
        method(root.putObject("fixpoint"), r.fixpoint(), s);
        Json.putSuggestions(root, r.suggestions());
        root.put("rounding", s.describe());
        return Json.withCaveats(root) + "\n";
    }

    private static void method(ObjectNode o, MarginReport.Method m, EnergyScale s) {
        Json.putUnitsAndWh(o, "highestReserve", m.highestReserveUnits(), s);
        Json.putUnitsAndWh(o, "lowestStart", m.lowestStartUnits(), s);
        o.put("millis", m.millis());
    }
}
