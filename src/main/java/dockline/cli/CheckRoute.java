package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.margin.Suggestion;
import dockline.margin.Suggestions;
import dockline.model.Mission;
import dockline.report.Caveats;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.fast.FastPath;
import dockline.solve.fast.MinChargeSolver;
import dockline.solve.reserve.ReserveSolver;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine.Option;

/**
 * Which route {@code check} takes for the reserve objective (a picocli mixin): the fast path
 * ({@link FastPath}, Knuth 1977 on arena × goal) when the mission does not charge before the end, the
 * product route ({@link ReserveSolver#analyse}) otherwise, or with {@code --verdict-only} the verdict
 * alone (the fast path's early exit, or the product game without storing it,
 * {@link ReserveSolver#decideImplicitly}). Every output names its route; a fast-path policy is certified
 * by {@link CertificateChecker} when its closed loop is small enough, and says so when it is not.
 */
final class CheckRoute {

    /** The route asked for on the command line. */
    enum Method { AUTO, FAST, PRODUCT, STORED }

    @Option(names = "--method", paramLabel = "ROUTE", defaultValue = "auto",
            description = "auto (default: the fast path when the robot cannot charge before the end, else the product"
                    + " game with its moves generated on demand), fast, product, or stored (the product game"
                    + " stored in arrays: the reference route, far more memory)")
    String method;

    @Option(names = "--verdict-only",
            description = "the verdict alone, stopping as soon as it is known: no policy, no certificate, no margins")
    boolean verdictOnly;

    /** The parsed {@code --method}, or null (the problem printed) when it is not a route. */
    Method method(PrintWriter err) {
        String m = method == null ? "auto" : method.trim().toLowerCase(java.util.Locale.ROOT);
        return switch (m) {
            case "auto" -> Method.AUTO;
            case "fast" -> Method.FAST;
            case "product" -> Method.PRODUCT;
            case "stored" -> Method.STORED;
            default -> {
                err.println("dockline: --method must be auto, fast, product or stored, not '" + method + "'");
                yield null;
            }
        };
    }

    /** Whether {@code --method stored} asks for the product stored in arrays. */
    boolean stored() {
        return "stored".equalsIgnoreCase(method == null ? "" : method.trim());
    }

    /** Whether the options ask for anything but the default route. */
    boolean nonDefault() {
        return verdictOnly || !"auto".equalsIgnoreCase(method == null ? "auto" : method.trim());
    }

    /**
     * Runs the fast path or a verdict-only route when the options and the mission call for it, and
     * returns the exit code; null when the caller should take the product route.
     */
    Integer run(Mission m, Path file, boolean safestPolicy, long budgetBytes, boolean json, PrintWriter out,
                PrintWriter err) {
        Method how = method(err);
        if (how == null) {
            return ExitCodes.BAD_INPUT;
        }
        if ((how == Method.PRODUCT || how == Method.STORED) && !verdictOnly) {
            return null;
        }
        if (how == Method.STORED) {
            err.println("dockline: --verdict-only decides on the product game without storing it; drop --method stored");
            return ExitCodes.BAD_INPUT;
        }
        if (verdictOnly && safestPolicy) {
            err.println("dockline: --safest-policy needs a policy; --verdict-only gives none");
            return ExitCodes.BAD_INPUT;
        }
        if (how == Method.PRODUCT) {
            return implicit(m, budgetBytes, json, out);
        }
        Optional<FastPath.Analysis> fast = FastPath.analyse(m, FastPath.DEFAULT_MAX_POLICY_ROWS, verdictOnly);
        if (fast.isEmpty()) {
            if (how == Method.FAST) {
                err.println("dockline: " + file + ": --method fast does not apply: the robot can charge on a dock"
                        + " before the mission is complete, and the fast path counts consumption only. Use"
                        + " --method product (or auto).");
                return ExitCodes.BAD_INPUT;
            }
            return verdictOnly ? implicit(m, budgetBytes, json, out) : null;
        }
        FastPath.Analysis a = fast.get();
        if (verdictOnly) {
            print(a, null, List.of(), null, json, out);
            return a.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
        }
        Certificate cert = null;
        if (a.policy().isPresent()) {
            cert = CertificateChecker.check(a.arena(), a.policy().get(), a.reserveUnits(), a.startUnits());
            int worst = a.worstCaseMinimumUnits().getAsInt();
            if (!cert.ok() || cert.worstMinimumUnits() != worst) {
                err.println("dockline: internal error: the fast path says guaranteed with a worst level of " + worst
                        + " units, but its policy " + (cert.ok() ? "has a worst level of " + cert.worstMinimumUnits()
                        + " units under" : "failed") + " the independent certificate: " + cert.reason());
                err.println("No verdict is given. Please report this with the input files.");
                return ExitCodes.INTERNAL;
            }
        }
        List<Suggestion> suggestions = List.of();
        String suggestionNote = null;
        if (!a.guaranteed()) {
            try {
                suggestions = Suggestions.find(m, ProductOptions.defaults().withMemoryBudget(budgetBytes),
                        a.highestGuaranteedReserveUnits().isPresent() ? a.highestGuaranteedReserveUnits()
                                : java.util.OptionalInt.of(-1));
            } catch (ProductTooLargeException e) {
                suggestionNote = "no suggestions: they are searched on the product game, and " + e.getMessage();
            }
        }
        print(a, cert, suggestions, suggestionNote, json, out);
        return a.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    private static Integer implicit(Mission m, long budgetBytes, boolean json, PrintWriter out) {
        ReserveSolver.ImplicitVerdict v = ReserveSolver.decideImplicitly(m,
                ProductOptions.defaults().withMemoryBudget(budgetBytes));
        boolean ok = v.verdict() == dockline.solve.Verdict.GUARANTEED;
        if (json) {
            ObjectNode o = header(m, ok, "implicit-product", true);
            o.put("exploredVertices", v.exploredVertices());
            o.put("exploredEdges", v.edgesScanned());
            o.put("forecastVertices", v.forecastVertices());
            o.put("stoppedEarly", v.stoppedEarly());
            o.put("totalMillis", v.millis());
            o.put("certified", false);
            o.put("discretisation", m.scale().describe());
            out.println(Json.withCaveats(o));
        } else {
            CheckCommand.verdictLine(m, ok, out);
            out.println("  Method: product game without storing it (arena x goal x battery levels), attractor stopped"
                    + " once the start was decided");
            out.println("  Verdict only, not certified: no policy, worst level, highest reserve floor or suggestions"
                    + " (run without --verdict-only for them).");
            out.println("  Explored " + v.exploredVertices() + " vertices and " + v.edgesScanned() + " edges; the product"
                    + " reachable from the start has " + (v.forecastVertices() < 0 ? "too many vertices to forecast"
                    : "at most " + v.forecastVertices() + " vertices (forecast)") + "; " + v.millis() + " ms");
            out.println("  Start " + m.startUnits() + " units, reserve floor " + m.reserveUnits() + " units, capacity "
                    + m.capacityUnits() + " units");
            out.println("  Energy: " + m.scale().describe());
            out.println(Caveats.block());
        }
        return ok ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    private static void print(FastPath.Analysis a, Certificate cert, List<Suggestion> suggestions, String suggestionNote,
                              boolean json, PrintWriter out) {
        Mission m = a.mission();
        String certified = certifiedText(a, cert);
        if (json) {
            ObjectNode o = header(m, a.guaranteed(), "fast", a.verdictOnly());
            o.put("startUnits", a.startUnits());
            o.put("reserveUnits", a.reserveUnits());
            o.put("capacityUnits", a.capacityUnits());
            if (a.startNeedUnits() == MinChargeSolver.INFINITE) {
                o.putNull("startNeedUnits");
            } else {
                o.put("startNeedUnits", a.startNeedUnits());
            }
            if (!a.verdictOnly()) {
                put(o, "worstCaseMinimumUnits", a.worstCaseMinimumUnits());
                put(o, "highestGuaranteedReserveUnits", a.highestGuaranteedReserveUnits());
                o.put("highestReserveSearched", true);
                o.put("policyFloorUnits", a.highestGuaranteedReserveUnits().orElse(a.reserveUnits()));
            }
            o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
            o.put("budget", m.map().disturbances().budget());
            o.put("exploredVertices", a.exploredVertices());
            o.put("productVertices", a.pairVertices());
            o.put("solveMillis", a.solveMillis());
            o.put("totalMillis", a.totalMillis());
            if (a.policy().isPresent()) {
                o.put("policyRows", a.policy().get().size());
            } else {
                o.putNull("policyRows");
            }
            o.put("certified", cert != null && cert.ok());
            o.put("certification", certified);
            if (cert != null) {
                o.put("certifiedStates", cert.statesChecked());
                o.put("certifiedWorstMinimumUnits", cert.worstMinimumUnits());
            }
            Json.putSuggestions(o, suggestions);
            o.put("discretisation", m.scale().describe());
            ArrayNode notes = o.putArray("notes");
            if (suggestionNote != null) {
                notes.add(suggestionNote);
            }
            out.println(Json.withCaveats(o));
            return;
        }
        CheckCommand.verdictLine(m, a.guaranteed(), out);
        out.println("  Method: fast path (minimum charge on arena x goal, Knuth 1977): the robot cannot charge before"
                + " the end, so the battery levels need not be in the game");
        if (a.verdictOnly()) {
            out.println("  Verdict only, not certified: no policy, worst level, highest reserve floor or suggestions"
                    + " (run without --verdict-only for them).");
        } else {
            if (a.worstCaseMinimumUnits().isPresent()) {
                out.println("  Worst battery level under the policy:  "
                        + CheckCommand.amount(a.worstCaseMinimumUnits().getAsInt(), m)
                        + " (the policy of least energy needed; it does not depend on the battery level)");
            } else {
                out.println("  Worst battery level under the policy:  none (there is no safe policy)");
            }
            if (a.highestGuaranteedReserveUnits().isPresent()) {
                out.println("  Highest reserve floor guaranteed:      "
                        + CheckCommand.amount(a.highestGuaranteedReserveUnits().getAsInt(), m));
            } else {
                out.println("  Highest reserve floor guaranteed:      none (not even a floor of 0 can be guaranteed)");
            }
        }
        out.println("  Energy needed from the start: " + (a.startNeedUnits() == MinChargeSolver.INFINITE
                ? (a.verdictOnly() ? "more than is available" : "the robot cannot force completion")
                : a.startNeedUnits() + " units") + " (available above the floor: " + (a.startUnits() - a.reserveUnits())
                + " units)");
        out.println("  Start " + CheckCommand.amount(a.startUnits(), m) + ", reserve floor "
                + CheckCommand.amount(a.reserveUnits(), m)
                + ", capacity " + m.scale().formatWh(a.capacityUnits()) + " (" + a.capacityUnits() + " units)");
        out.println("  Game: " + a.pairVertices() + " vertices of arena x goal, " + a.exploredVertices()
                + " explored; solved in " + a.solveMillis() + " ms (" + a.totalMillis() + " ms in all)");
        out.println("  Energy: " + m.scale().describe());
        if (certified != null) {
            out.println("  " + certified);
        }
        if (!suggestions.isEmpty()) {
            out.println("  To make it guaranteed, change one of (smallest change first):");
            for (Suggestion sg : suggestions) {
                out.println("    - " + sg.text());
            }
        }
        if (suggestionNote != null) {
            out.println("  Note: " + suggestionNote);
        }
        out.println(Caveats.block());
    }

    /** The certificate line, or null when there is nothing to certify (not guaranteed). */
    private static String certifiedText(FastPath.Analysis a, Certificate cert) {
        if (a.verdictOnly()) {
            return "verdict only, not certified";
        }
        if (!a.guaranteed()) {
            return null;
        }
        if (cert != null) {
            return "certified: " + cert.ok() + " (the policy re-checked independently over " + cert.statesChecked()
                    + " situations; never below " + CheckCommand.amount(cert.worstMinimumUnits(), a.mission()) + ")";
        }
        return "not certified: the closed loop is too large (" + (a.loopTooLarge() ? "more than " + a.maxPolicyRows()
                : Long.toString(a.loopStates())) + " states; the policy rows are written out and re-checked up to "
                + a.maxPolicyRows() + ")";
    }

    private static ObjectNode header(Mission m, boolean ok, String method, boolean verdictOnly) {
        ObjectNode o = Json.object();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", ok ? dockline.solve.Verdict.GUARANTEED.word() : dockline.solve.Verdict.NOT_GUARANTEED.word());
        o.put("method", method);
        o.put("verdictOnly", verdictOnly);
        return o;
    }

    private static void put(ObjectNode o, String key, java.util.OptionalInt v) {
        if (v.isPresent()) {
            o.put(key, v.getAsInt());
        } else {
            o.putNull(key);
        }
    }
}
