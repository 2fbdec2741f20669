package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.margin.Suggestion;
import dockline.margin.Suggestions;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.report.Caveats;
import dockline.solve.ProductOptions;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine;

/**
 * {@code dockline check MISSION}: decides whether the robot can always complete the mission
 * without its battery dropping below the reserve floor, and reports the worst level under the
 * policy, the highest floor that can be guaranteed, the size of the game and the time taken.
 * Every "guaranteed" verdict is re-checked by {@link CertificateChecker} before it is reported; a
 * failed certificate is an internal error (exit 4), never a silent "guaranteed". A mission that is
 * not guaranteed gets {@link Suggestions}. A mission without charging before the end goes by the fast
 * path instead ({@link CheckRoute}); {@code --method} forces a route, {@code --verdict-only} asks for
 * the verdict alone.
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
public final class CheckCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Mixin
    MissionOptions mission;

    @Mixin
    SafestPolicyOption safest;

    @Option(names = "--json", description = "print the result as one JSON object instead of the text")
    boolean json;

    @Mixin
    DiscountedCheck discounted;

    @Mixin
    CheckRoute route;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            Mission m = mission.load(err);
            Objective objective = discounted.objective(m.objective(), err);
            if (objective == null) {
                return ExitCodes.BAD_INPUT;
            }
            if (m.beyondOneTrip()) {
                String refused = RoundsCheck.refusedOption(safest.on, route.nonDefault(),
                        objective instanceof Objective.Discounted);
                if (refused != null) {
                    err.println("dockline: " + refused);
                    return ExitCodes.BAD_INPUT;
                }
                return RoundsCheck.run(m, mission.memoryBudgetBytes(), safest.on, json, out, err);
            }
            if (objective instanceof Objective.Discounted && safest.on) {
                err.println("dockline: --safest-policy applies to the reserve objective only");
                return ExitCodes.BAD_INPUT;
            }
            if (objective instanceof Objective.Discounted && route.nonDefault()) {
                err.println("dockline: --method and --verdict-only apply to the reserve objective only");
                return ExitCodes.BAD_INPUT;
            }
            if (objective instanceof Objective.Discounted d) {
                return discounted.run(m.withObjective(d), d, mission.memoryBudgetBytes(), json, out, err);
            }
            Integer routed = route.run(m, mission.missionFile, safest.on, mission.memoryBudgetBytes(), json,
                    out, err);
            if (routed != null) {
                return routed; // the fast path or a verdict-only route
            }
            ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults()
                    .withMemoryBudget(mission.memoryBudgetBytes()).withSafestPolicy(safest.on)
                    .withRoute(route.stored() ? ReserveOptions.Route.PRODUCT : ReserveOptions.Route.IMPLICIT));
            // never a silent "guaranteed": the policy is re-checked on an independent code path
            Certificate cert = null;
            if (a.guaranteed()) {
                cert = CertificateChecker.check(a.arena(), a.policy().orElseThrow(), a.reserveUnits(),
                        a.startUnits());
                if (!cert.ok()) {
                    err.println("dockline: internal error: the solver says guaranteed, but its policy failed the"
                            + " independent certificate: " + cert.reason());
                    err.println("No verdict is given. Please report this with the input files.");
                    return ExitCodes.INTERNAL;
                }
            }
            List<Suggestion> suggestions = a.guaranteed() ? List.of()
                    : Suggestions.find(m, ProductOptions.defaults().withMemoryBudget(mission.memoryBudgetBytes()),
                            a.highestReserveSearched() ? a.highestGuaranteedReserveUnits() : OptionalInt.empty());
            if (json) {
                out.println(json(a, cert, suggestions));
            } else {
                human(a, cert, suggestions, out);
            }
            return a.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
        } catch (MissionOptions.BadInput e) {
            return ExitCodes.BAD_INPUT;
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        } finally {
            out.flush();
            err.flush();
        }
    }

    static void human(ReserveAnalysis a, PrintWriter out) {
        human(a, null, List.of(), out);
    }

    /** The summary with the certificate line (when guaranteed) and the suggestions (when not). */
    static void human(ReserveAnalysis a, Certificate cert, List<Suggestion> suggestions, PrintWriter out) {
        Mission m = a.mission();
        EnergyScale s = a.scale();
        verdictLine(m, a.guaranteed(), out);
        if (a.worstCaseMinimumUnits().isPresent()) {
            out.println("  Worst battery level under the policy:  " + amount(a.worstCaseMinimumUnits().getAsInt(), a)
                    + (a.policyFloorUnits() > a.reserveUnits() ? " (the safest policy; it may take more moves)"
                    : " (the policy finishes in the fewest moves in the worst case)"));
        } else {
            out.println("  Worst battery level under the policy:  none (there is no safe policy)");
        }
        OptionalInt h = a.highestGuaranteedReserveUnits();
        if (h.isPresent()) {
            out.println("  Highest reserve floor guaranteed:      " + amount(h.getAsInt(), a));
        } else if (a.highestReserveSearched()) {
            out.println("  Highest reserve floor guaranteed:      none (not even a floor of 0 can be guaranteed)");
        } else {
            out.println("  Highest reserve floor guaranteed:      not computed");
        }
        out.println("  Start " + amount(a.startUnits(), a) + ", reserve floor " + amount(a.reserveUnits(), a)
                + ", capacity " + s.formatWh(a.capacityUnits()) + " (" + a.capacityUnits() + " units)");
        if (a.storedProduct()) {
            out.println("  Method: product game (arena x goal x battery levels) stored in arrays, and attractor");
            out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges; solved in "
                    + a.solveMillis() + " ms (" + a.totalMillis() + " ms in all)");
        } else {
            out.println("  Method: product game (arena x goal x battery levels) with its moves generated on demand,"
                    + " and attractor");
            out.println("  Game: " + a.productVertices() + " vertices (every place x task progress x battery level), "
                    + a.productEdges() + " moves scanned until the start was decided; solved in " + a.solveMillis()
                    + " ms (" + a.totalMillis() + " ms in all)");
        }
        out.println("  Energy: " + s.describe());
        if (cert != null) {
            out.println("  certified: " + cert.ok() + " (the policy re-checked independently over " + cert.statesChecked()
                    + " situations; never below " + amount(cert.worstMinimumUnits(), a) + ")");
        }
        if (!suggestions.isEmpty()) {
            out.println("  To make it guaranteed, change one of (smallest change first):");
            for (Suggestion sg : suggestions) {
                out.println("    - " + sg.text());
            }
        }
        for (String note : a.notes()) {
            out.println("  Note: " + note);
        }
        out.println(Caveats.block());
    }

    /** E.g. {@code 49 units = 24.5 Wh (40.8%)}. */
    static String amount(int units, ReserveAnalysis a) {
        return amount(units, a.mission());
    }

    /** E.g. {@code 49 units = 24.5 Wh (40.8%)}; the share of the capacity in Wh, one decimal, is for display only. */
    static String amount(int units, Mission m) {
        EnergyScale s = m.scale();
        BigDecimal cap = m.robot().capacityWh();
        String pct = cap.signum() == 0 ? "0" : s.toWh(units).multiply(BigDecimal.valueOf(100))
                .divide(cap, 1, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
        return units + " units = " + s.formatWh(units) + " (" + pct + "%)";
    }

    /** The first line of a reserve verdict, e.g. {@code GUARANTEED: Night round — the robot can always ...}. */
    static void verdictLine(Mission m, boolean guaranteed, PrintWriter out) {
        int k = m.map().disturbances().budget();
        String events = k == 0 ? "with no disturbances" : "under up to " + k + " disturbance" + (k == 1 ? "" : "s");
        if (guaranteed) {
            out.println("GUARANTEED: " + m.name() + " — the robot can always finish and dock " + events
                    + " without going below the reserve floor.");
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — no policy can always finish and dock " + events
                    + " while staying at or above the reserve floor.");
        }
    }

    static String json(ReserveAnalysis a) {
        return json(a, null, List.of());
    }

    static String json(ReserveAnalysis a, Certificate cert, List<Suggestion> suggestions) {
        ObjectNode o = Json.object();
        Mission m = a.mission();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", a.verdict().word());
        o.put("method", a.storedProduct() ? "stored-product" : "product");
        o.put("startUnits", a.startUnits());
        o.put("reserveUnits", a.reserveUnits());
        o.put("capacityUnits", a.capacityUnits());
        putOptional(o, "worstCaseMinimumUnits", a.worstCaseMinimumUnits());
        putOptional(o, "highestGuaranteedReserveUnits", a.highestGuaranteedReserveUnits());
        o.put("highestReserveSearched", a.highestReserveSearched());
        o.put("policyFloorUnits", a.policyFloorUnits());
        o.put("unitWh", a.scale().unitWh().stripTrailingZeros());
        o.put("budget", m.map().disturbances().budget());
        Json.putGameSize(o, a.productVertices(), a.productEdges(), a.estimate(), a.buildMillis(), a.solveMillis(),
                a.totalMillis());
        if (a.policy().isPresent()) {
            o.put("policyRows", a.policy().get().size());
        } else {
            o.putNull("policyRows");
        }
        o.put("certified", cert != null && cert.ok());
        if (cert != null) {
            o.put("certifiedStates", cert.statesChecked());
            o.put("certifiedWorstMinimumUnits", cert.worstMinimumUnits());
        }
        Json.putSuggestions(o, suggestions);
        o.put("discretisation", a.scale().describe());
        ArrayNode notes = o.putArray("notes");
        a.notes().forEach(notes::add);
        return Json.withCaveats(o);
    }

    private static void putOptional(ObjectNode o, String key, OptionalInt v) {
        if (v.isPresent()) {
            o.put(key, v.getAsInt());
        } else {
            o.putNull(key);
        }
    }
}
