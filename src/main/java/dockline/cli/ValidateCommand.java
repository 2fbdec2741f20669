package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.io.InputException;
import dockline.io.InputKind;
import dockline.io.MapLoader;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Tasks;
import dockline.report.Caveats;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline validate FILE...}: checks map and mission files (told apart by their keys) and
 * prints one {@code ok} line per valid file with a short summary, or every problem on stderr.
 * Exit code 0 when all files are valid, 2 when any is not.
 */
@Command(name = "validate",
        description = {"Checks map and mission files and reports every problem as file:line:column: message.",
                "A mission is checked together with the map it names."},
        exitCodeList = {"0:every file is valid", "2:a file has problems, or bad usage"})
public final class ValidateCommand extends CommandBase {

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "map or mission files (YAML)")
    List<Path> files;

    @Option(names = "--json", description = "print the result as one JSON object instead of the text (the problems"
            + " are printed as file:line:column lines as well)")
    boolean json;

    @Override
    int run(PrintWriter out, PrintWriter err) {
        boolean allValid = true;
        boolean anyMission = false;
        ObjectNode root = Json.object();
        ArrayNode results = root.putArray("files");
        for (Path f : files) {
            ObjectNode fo = results.addObject();
            fo.put("file", f.toString());
            try {
                List<String> lines;
                if (InputKind.of(f) == InputKind.MAP) {
                    lines = List.of(summary(MapLoader.load(f)));
                    fo.put("kind", "map");
                } else {
                    lines = summary(MissionLoader.load(f));
                    fo.put("kind", "mission");
                    anyMission = true;
                }
                fo.put("valid", true);
                lines.forEach(fo.putArray("summary")::add);
                if (!json) {
                    out.println("ok " + f + ": " + lines.get(0));
                    for (String l : lines.subList(1, lines.size())) {
                        out.println("   " + l);
                    }
                }
            } catch (InputException e) {
                allValid = false;
                fo.put("valid", false);
                ArrayNode problems = fo.putArray("problems");
                for (Problem p : e.problems()) {
                    err.println(p.format());
                    ObjectNode po = problems.addObject();
                    po.put("file", p.file().toString());
                    po.put("line", p.line());
                    po.put("column", p.column());
                    po.put("message", p.message());
                    po.put("hint", p.hint());
                }
            }
        }
        if (json) {
            root.put("valid", allValid);
            out.println(Json.withCaveats(root));
        } else if (anyMission) {
            out.println(Caveats.block());
        }
        out.flush();
        err.flush();
        return allValid ? ExitCodes.OK : ExitCodes.BAD_INPUT;
    }

    /** E.g. {@code map 'X', 20 x 12 cells (150 free), 7 zones, 1 dock, 5 doors, budget 1 with 7 event rules}. */
    static String summary(BuildingMap m) {
        int free = 0;
        int doors = 0;
        for (int y = 0; y < m.height(); y++) {
            for (int x = 0; x < m.width(); x++) {
                Cell c = new Cell(x, y);
                if (m.isFree(c)) {
                    free++;
                    if (m.terrainAt(c).door()) {
                        doors++;
                    }
                }
            }
        }
        int docks = m.docks().size();
        return "map '" + m.name() + "', " + m.width() + " x " + m.height() + " cells of " + plain(m.cellSizeMetres())
                + " m (" + free + " free), " + count(m.zones().size(), "zone") + ", " + count(docks, "dock") + ", "
                + count(doors, "door") + ", disturbance budget " + m.disturbances().budget() + " with "
                + count(m.disturbances().rules().size(), "event rule");
    }

    /** The mission in a few lines: the {@code ok} line's summary, then indented details. */
    static List<String> summary(Mission m) {
        EnergyScale s = m.scale();
        Tasks t = m.tasks();
        int n = t.visit().size();
        String head = "mission '" + m.name() + "' on " + (m.map().source() != null ? m.map().source() : m.map().name())
                + ", " + (t.patrols() ? "a patrol of " + count(t.patrol().size(), "checkpoint")
                : count(n, "zone") + " to visit" + (n > 1 ? (t.ordered() ? " in order" : " in any order") : ""))
                + ", disturbance budget " + m.map().disturbances().budget();
        String tasks = t.patrols() ? "patrol " + String.join(", ", t.patrol()) + " on every lap, for ever (budget "
                + (m.map().disturbances().budgetPerLap() ? "per lap" : "for the whole night") + ")"
                : n == 0 ? "no zones to visit" : "visit " + String.join(", ", t.visit());
        if (!t.avoid().isEmpty()) {
            tasks += "; avoid " + String.join(", ", t.avoid());
        }
        if (!t.patrols()) {
            tasks += t.finishOnDock() ? "; finish on a dock" : "; no need to finish on a dock";
        }
        if (m.timing().hasTick()) {
            tasks += "; one turn takes " + dockline.model.Timing.clock(m.timing().tickSeconds());
        }
        if (m.timing().hasDeadline()) {
            tasks += "; deadline " + dockline.model.Timing.clock(m.timing().deadlineSeconds()) + " = "
                    + m.timing().deadlineTicks() + " turns (rounded down)";
        }
        String objective = m.objective() instanceof Objective.Discounted d
                ? "discounted sum of energy deltas (discount " + d.discount() + ") " + d.relation().symbol() + " " + d.threshold()
                : "never below the reserve floor";
        return List.of(head,
                "battery: capacity " + s.formatWh(m.capacityUnits()) + " (" + m.capacityUnits() + " units), start "
                        + m.start() + " with " + charge(m.startCharge().toString(), m.startUnits(), s) + ", reserve floor "
                        + charge(m.reserve().toString(), m.reserveUnits(), s),
                "per step: " + steps(m),
                "tasks: " + tasks,
                "objective: " + objective,
                "energy: " + s.describe());
    }

    /** Move, wait and charge figures in units, so the rounding is visible, e.g. {@code move tile 1 unit, ...}. */
    private static String steps(Mission m) {
        EnergyScale s = m.scale();
        StringBuilder sb = new StringBuilder("move");
        java.util.Set<String> used = new java.util.TreeSet<>();
        for (int y = 0; y < m.map().height(); y++) {
            for (int x = 0; x < m.map().width(); x++) {
                Cell c = new Cell(x, y);
                if (m.map().isFree(c)) {
                    used.add(m.map().terrainAt(c).surface());
                }
            }
        }
        String sep = " ";
        for (String surface : used) {
            java.math.BigDecimal wh = m.robot().moveWh().get(surface);
            sb.append(sep).append(surface).append(' ').append(plain(wh)).append(" Wh = ").append(count(s.consumption(wh), "unit"));
            sep = ", ";
        }
        sb.append("; wait ").append(plain(m.robot().waitWh())).append(" Wh = ").append(count(s.consumption(m.robot().waitWh()), "unit"));
        int gain = s.gain(m.robot().chargeWh());
        if (gain > 0) {
            sb.append("; charge on a dock +").append(plain(m.robot().chargeWh())).append(" Wh = ").append(count(gain, "unit"));
        } else if (m.robot().chargeWh().signum() > 0) {
            sb.append("; no charging (").append(plain(m.robot().chargeWh())).append(" Wh rounds down to 0 units)");
        } else {
            sb.append("; no charging");
        }
        return sb.toString();
    }

    private static String charge(String written, int units, EnergyScale s) {
        String wh = s.formatWh(units);
        return (written.equals(wh) ? wh : written + " = " + wh) + " (" + units + " units)";
    }

    private static String count(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    private static String plain(java.math.BigDecimal d) {
        return d.stripTrailingZeros().toPlainString();
    }
}
