package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.Certificate;
import dockline.certify.DiscountedCertificate;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.plan.Certification;
import dockline.plan.Plan;
import dockline.plan.PolicyChoice;
import dockline.report.Caveats;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.fast.FastPath;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.fast.MinChargeSolver;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveSolver;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What {@code check} prints for a {@link Plan}: the text for people, or one JSON object with the keys
 * of the vocabulary in DEVELOPERS.md ("Output vocabulary"), whatever route the plan took. It only
 * prints; every figure comes from the plan.
 */
final class CheckReport {

    private CheckReport() {
    }

    // ---- text

    static void text(Plan p, PrintWriter out) {
        Plan.Detail d = p.detail();
        if (d instanceof Plan.Detail.Discounted dd) {
            discountedText(p, dd.analysis(), out);
        } else if (d instanceof Plan.Detail.VerdictOnlyProduct v) {
            implicitVerdictText(p, v.verdict(), out);
        } else if (d instanceof Plan.Detail.Fast f) {
            fastText(p, f.analysis(), out);
        } else if (d instanceof Plan.Detail.VerdictOnlyFast f) {
            fastText(p, f.analysis(), out);
        } else if (d instanceof Plan.Detail.Charging ch) {
            chargingText(p, ch, out);
        } else {
            productText(p, ((Plan.Detail.Product) d).analysis(), out);
        }
    }

    private static void chargingText(Plan p, Plan.Detail.Charging ch, PrintWriter out) {
        Mission m = p.mission();
        EnergyScale s = m.scale();
        ChargingRoute.Analysis a = ch.analysis();
        verdictLine(m, p.guaranteed(), out);
        if (p.lowestLevelUnits().isPresent()) {
            out.println("  Worst battery level under the policy:  " + amount(p.lowestLevelUnits().getAsInt(), m)
                    + " (the safest policy: its worst case is the highest guaranteed floor; it may take more moves)");
        } else {
            out.println("  Worst battery level under the policy:  none (there is no safe policy)");
        }
        OptionalInt h = p.highestFloorUnits();
        out.println("  Highest reserve floor guaranteed:      " + (h.isPresent() ? amount(h.getAsInt(), m)
                : "none (not even a floor of 0 can be guaranteed)"));
        out.println("  Lowest starting charge for the floor:  " + (p.lowestStartUnits().isPresent()
                ? amount(p.lowestStartUnits().getAsInt(), m) : "none (no starting charge is enough)"));
        batteryLine(m.startUnits(), m.reserveUnits(), m.capacityUnits(), m, out);
        out.println("  Method: charging route (least charge per place x task progress, the good docks as targets,"
                + " every floor in one pass): no battery levels in the game");
        out.println("  Game: " + p.size().vertices() + " positions of arena x goal, one pass of " + a.rounds() + " batch"
                + (a.rounds() == 1 ? "" : "es") + "; solved in " + a.millis() + " ms (" + p.timings().totalMillis()
                + " ms in all)");
        if (ch.thresholds() != null && p.guaranteed()) {
            out.println("  Policy: level thresholds over " + ch.thresholds().size() + " positions ("
                    + ch.thresholds().stepCount() + " thresholds; `dockline export` writes them)");
        }
        reserveTail(p, s, out);
    }

    private static void productText(Plan p, ReserveAnalysis a, PrintWriter out) {
        Mission m = p.mission();
        EnergyScale s = m.scale();
        verdictLine(m, p.guaranteed(), out);
        if (p.lowestLevelUnits().isPresent()) {
            out.println("  Worst battery level under the policy:  " + amount(p.lowestLevelUnits().getAsInt(), m)
                    + (p.policyChoice() == PolicyChoice.SAFEST
                    ? " (the safest policy: its worst case is the highest guaranteed floor; it may take more moves)"
                    : " (the policy finishes in the fewest moves in the worst case)"));
        } else {
            out.println("  Worst battery level under the policy:  none (there is no safe policy)");
        }
        OptionalInt h = p.highestFloorUnits();
        if (h.isPresent()) {
            out.println("  Highest reserve floor guaranteed:      " + amount(h.getAsInt(), m));
        } else if (p.highestFloorSearched()) {
            out.println("  Highest reserve floor guaranteed:      none (not even a floor of 0 can be guaranteed)");
        } else {
            out.println("  Highest reserve floor guaranteed:      not computed");
        }
        batteryLine(a.startUnits(), a.reserveUnits(), a.capacityUnits(), m, out);
        if (a.storedProduct()) {
            out.println("  Method: product game (arena x goal x battery levels) stored in arrays, and attractor");
            out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges; solved in "
                    + a.solveMillis() + " ms (" + p.timings().totalMillis() + " ms in all)");
        } else {
            out.println("  Method: product game (arena x goal x battery levels) with its moves generated on demand,"
                    + " and attractor");
            out.println("  Game: " + a.productVertices() + " vertices (every place x task progress x battery level), "
                    + a.productEdges() + " moves scanned until the start was decided; solved in " + a.solveMillis()
                    + " ms (" + p.timings().totalMillis() + " ms in all)");
        }
        reserveTail(p, s, out);
    }

    /** The lines every reserve route ends with: the rounding, the certificate, suggestions, notes, cautions. */
    private static void reserveTail(Plan p, EnergyScale s, PrintWriter out) {
        out.println("  Energy: " + s.describe());
        reserveCertificateLine(p, out);
        suggestions(p, out);
        for (String note : p.notes()) {
            out.println("  Note: " + note);
        }
        out.println(Caveats.block());
    }

    private static void reserveCertificateLine(Plan p, PrintWriter out) {
        if (p.certification() instanceof Certification.Reserve r) {
            Certificate c = r.certificate();
            out.println("  certified: " + c.ok() + " (the policy re-checked independently over " + c.statesChecked()
                    + " situations; never below " + amount(c.worstMinimumUnits(), p.mission()) + ")");
        }
    }

    private static void suggestions(Plan p, PrintWriter out) {
        if (!p.suggestions().isEmpty()) {
            out.println("  To make it guaranteed, change one of (smallest change first):");
            p.suggestions().forEach(sg -> out.println("    - " + sg.text()));
        }
    }

    private static void fastText(Plan p, FastPath.Analysis a, PrintWriter out) {
        Mission m = p.mission();
        verdictLine(m, p.guaranteed(), out);
        out.println("  Method: fast path (minimum charge on arena x goal, Knuth 1977): the robot cannot charge before"
                + " the end, so the battery levels need not be in the game");
        if (a.verdictOnly()) {
            out.println("  Verdict only, not certified: no policy, worst level, highest reserve floor or suggestions"
                    + " (run without --verdict-only for them).");
        } else {
            if (p.lowestLevelUnits().isPresent()) {
                out.println("  Worst battery level under the policy:  " + amount(p.lowestLevelUnits().getAsInt(), m)
                        + " (the policy of least energy needed; it does not depend on the battery level)");
            } else {
                out.println("  Worst battery level under the policy:  none (there is no safe policy)");
            }
            if (p.highestFloorUnits().isPresent()) {
                out.println("  Highest reserve floor guaranteed:      " + amount(p.highestFloorUnits().getAsInt(), m));
            } else {
                out.println("  Highest reserve floor guaranteed:      none (not even a floor of 0 can be guaranteed)");
            }
        }
        out.println("  Energy needed from the start: " + (a.startNeedUnits() == MinChargeSolver.INFINITE
                ? (a.verdictOnly() ? "more than is available" : "the robot cannot force completion")
                : a.startNeedUnits() + " units") + " (available above the floor: " + (a.startUnits() - a.reserveUnits())
                + " units)");
        batteryLine(a.startUnits(), a.reserveUnits(), a.capacityUnits(), m, out);
        out.println("  Game: " + a.pairVertices() + " vertices of arena x goal, " + a.exploredVertices()
                + " explored; solved in " + a.solveMillis() + " ms (" + p.timings().totalMillis() + " ms in all)");
        out.println("  Energy: " + m.scale().describe());
        String certified = fastCertification(p, a);
        if (certified != null) {
            out.println("  " + certified);
        }
        suggestions(p, out);
        if (p.suggestionsNote() != null) {
            out.println("  Note: " + p.suggestionsNote());
        }
        for (String note : p.notes()) {
            if (!note.equals(p.suggestionsNote())) {
                out.println("  Note: " + note);
            }
        }
        out.println(Caveats.block());
    }

    /** The fast path's certificate line, or null when there is nothing to certify (not guaranteed). */
    private static String fastCertification(Plan p, FastPath.Analysis a) {
        if (a.verdictOnly()) {
            return "verdict only, not certified";
        }
        if (!p.guaranteed()) {
            return null;
        }
        if (p.certification() instanceof Certification.Reserve r) {
            Certificate c = r.certificate();
            return "certified: " + c.ok() + " (the policy re-checked independently over " + c.statesChecked()
                    + " situations; never below " + amount(c.worstMinimumUnits(), p.mission()) + ")";
        }
        return "not certified: " + ((Certification.NotChecked) p.certification()).why();
    }

    private static void implicitVerdictText(Plan p, ReserveSolver.ImplicitVerdict v, PrintWriter out) {
        Mission m = p.mission();
        verdictLine(m, p.guaranteed(), out);
        out.println("  Method: product game without storing it (arena x goal x battery levels), attractor stopped"
                + " once the start was decided");
        out.println("  Verdict only, not certified: no policy, worst level, highest reserve floor or suggestions"
                + " (run without --verdict-only for them).");
        out.println("  Explored " + v.exploredVertices() + " vertices and " + v.edgesScanned() + " edges; the product"
                + " reachable from the start has " + (v.forecastVertices() < 0 ? "too many vertices to forecast"
                : "at most " + v.forecastVertices() + " vertices (forecast)") + "; " + p.timings().totalMillis()
                + " ms");
        out.println("  Start " + m.startUnits() + " units, reserve floor " + m.reserveUnits() + " units, capacity "
                + m.capacityUnits() + " units");
        out.println("  Energy: " + m.scale().describe());
        out.println(Caveats.block());
    }

    private static void discountedText(Plan p, DiscountedAnalysis a, PrintWriter out) {
        Mission m = p.mission();
        Objective.Discounted o = a.objective();
        int k = m.map().disturbances().budget();
        String events = k == 0 ? "with no disturbances" : "under up to " + k + " disturbance" + (k == 1 ? "" : "s");
        String battery = a.reserveKept() ? " and never going below the reserve floor" : "";
        if (p.guaranteed()) {
            out.println("GUARANTEED: " + m.name() + " — the robot can always finish and dock " + events
                    + " with a discounted score " + DiscountedCheck.condition(o) + battery + ".");
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — no policy can always finish and dock " + events
                    + " with a discounted score " + DiscountedCheck.condition(o) + battery + ".");
        }
        DiscountedCertificate cert = p.certification() instanceof Certification.Discounted dc ? dc.certificate() : null;
        if (a.worstCaseScore().isPresent()) {
            out.println("  Worst score under the policy:  " + DiscountedCheck.show(a.worstCaseScore().get()));
        } else if (cert != null && cert.worstScore().isPresent()) {
            out.println("  Worst score under the policy:  " + cert.worstScore().get() + " (by the certificate)");
        }
        if (!a.nominalPlan().isEmpty()) {
            out.println("  Plan with no disturbance:      " + DiscountedCheck.plan(a.nominalPlan()));
        }
        out.println("  Score: the discounted sum of the energy changes in units, w0 + w1/" + o.discount() + " + w2/"
                + o.discount() + "^2 + ..., counted until the mission is complete (0 afterwards)"
                + (a.reserveKept() ? "; the reserve floor is checked as well" : "; the reserve floor is not checked"
                + " (--score-only)"));
        out.println("  Comparator: " + a.comparatorStates() + " states (bound " + a.comparatorStateBound()
                + "), energy changes up to " + a.maxAbsWeight() + " units per step");
        out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges; solved in "
                + a.solveMillis() + " ms (" + p.timings().totalMillis() + " ms in all)");
        a.baseline().ifPresent(b -> {
            out.println("  Optimisation baseline (best score by value iteration, tasks and battery ignored): "
                    + b.optimalValue().map(DiscountedCheck::show).orElse("between " + DiscountedCheck.show(b.lower())
                    + " and " + DiscountedCheck.show(b.upper())) + "; compared with " + o.threshold() + ": "
                    + (b.holds() ? "yes" : "no"));
            b.optimalPlayCompletes().ifPresent(c -> out.println("    its value-optimal play "
                    + (c ? "completes the mission" : "never completes the mission")));
        });
        out.println("  Energy: " + m.scale().describe());
        if (cert != null) {
            out.println("  certified: " + cert.ok() + " (the policy re-checked independently over " + cert.statesChecked()
                    + " situations; worst score exactly " + cert.worstScore().map(Object::toString).orElse("?")
                    + (cert.reserveKept() ? "; battery never below " + cert.worstMinimumUnits() + " units = "
                    + m.scale().formatWh(cert.worstMinimumUnits()) : "") + ")");
        }
        for (String note : p.notes()) {
            out.println("  Note: " + note);
        }
        out.println(Caveats.block());
    }

    /** E.g. {@code 49 units = 24.5 Wh (40.8%)}; the share of the capacity in Wh, one decimal, is for display only. */
    /** E.g. {@code   Start 90 units = 45 Wh (75%), reserve floor ..., capacity 60 Wh (120 units)}. */
    static void batteryLine(int startUnits, int reserveUnits, int capacityUnits, Mission m, PrintWriter out) {
        out.println("  Start " + amount(startUnits, m) + ", reserve floor " + amount(reserveUnits, m) + ", capacity "
                + m.scale().formatWh(capacityUnits) + " (" + capacityUnits + " units)");
    }

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

    // ---- JSON

    /** The plan as one JSON object (with the caveats), keys as in the check schema. */
    static String json(Plan p) {
        Mission m = p.mission();
        ObjectNode o = Json.header(m, p.verdict());
        o.put("method", p.method().word());
        o.put("methodReason", p.methodReason());
        o.put("verdictOnly", p.verdictOnly());
        Plan.Detail d = p.detail();
        if (d instanceof Plan.Detail.Discounted dd) {
            discountedJson(o, p, dd.analysis());
        } else {
            o.put("objective", "reserve");
            Json.putBattery(o, m.startUnits(), m.reserveUnits(), m.capacityUnits());
            if (!p.verdictOnly()) {
                Json.putOptional(o, "lowestLevelUnits", p.lowestLevelUnits());
                Json.putOptional(o, "highestReserveUnits", p.highestFloorUnits());
                o.put("highestReserveSearched", p.highestFloorSearched());
                o.put("policyReserveUnits", p.policyFloorUnits());
                if (p.policyChoice() != null) {
                    o.put("policyChoice", p.policyChoice() == PolicyChoice.SAFEST ? "safest" : "fewest-moves");
                }
            }
            if (d instanceof Plan.Detail.Fast f) {
                fastJson(o, f.analysis());
            } else if (d instanceof Plan.Detail.VerdictOnlyFast f) {
                fastJson(o, f.analysis());
            } else if (d instanceof Plan.Detail.Charging ch) {
                Json.putOptional(o, "lowestStartUnits", p.lowestStartUnits());
                o.put("productVertices", p.size().vertices());
                o.put("exploredVertices", p.size().exploredVertices());
                o.put("solveMillis", ch.analysis().millis());
                if (ch.thresholds() != null && p.guaranteed()) {
                    o.put("thresholdPositions", ch.thresholds().size());
                    o.put("thresholds", ch.thresholds().stepCount());
                }
            } else if (d instanceof Plan.Detail.VerdictOnlyProduct v) {
                ReserveSolver.ImplicitVerdict iv = v.verdict();
                o.put("exploredVertices", iv.exploredVertices());
                o.put("exploredEdges", iv.edgesScanned());
                o.put("forecastVertices", iv.forecastVertices());
                o.put("stoppedEarly", iv.stoppedEarly());
            } else {
                ReserveAnalysis a = ((Plan.Detail.Product) d).analysis();
                Json.putGameSize(o, a.productVertices(), a.productEdges(), a.estimate(), a.buildMillis(),
                        a.solveMillis());
            }
            Json.putUnitAndBudget(o, m);
        }
        o.put("compileMillis", p.timings().compileMillis());
        o.put("totalMillis", p.timings().totalMillis());
        if (!p.verdictOnly()) {
            if (p.policy().isPresent()) {
                o.put("policyRows", p.policy().get().size());
            } else {
                o.putNull("policyRows");
            }
        }
        certificationJson(o, p);
        if (!(d instanceof Plan.Detail.Discounted)) {
            Json.putSuggestions(o, p.suggestions());
        }
        o.put("rounding", m.scale().describe());
        ArrayNode notes = o.putArray("notes");
        p.notes().forEach(notes::add);
        return Json.withCaveats(o);
    }

    private static void fastJson(ObjectNode o, FastPath.Analysis a) {
        Json.putOptional(o, "startNeedUnits", a.startNeedUnits() == MinChargeSolver.INFINITE ? OptionalInt.empty()
                : OptionalInt.of(a.startNeedUnits()));
        o.put("exploredVertices", a.exploredVertices());
        o.put("productVertices", a.pairVertices());
        o.put("solveMillis", a.solveMillis());
    }

    private static void certificationJson(ObjectNode o, Plan p) {
        Certification c = p.certification();
        o.put("certified", c.ok());
        if (c instanceof Certification.Reserve r) {
            o.put("certification", "certified: " + r.certificate().ok() + " (" + r.certificate().statesChecked()
                    + " situations re-checked independently)");
            o.put("certifiedStates", r.certificate().statesChecked());
            o.put("certifiedLowestLevelUnits", r.certificate().worstMinimumUnits());
        } else if (c instanceof Certification.Discounted dc) {
            DiscountedCertificate cert = dc.certificate();
            o.put("certification", "certified: " + cert.ok() + " (" + cert.statesChecked()
                    + " situations re-checked independently)");
            o.put("certifiedStates", cert.statesChecked());
            o.put("certifiedLowestScore", cert.worstScore().map(Object::toString).orElse(null));
            if (cert.reserveKept()) {
                o.put("certifiedLowestLevelUnits", cert.worstMinimumUnits());
            }
        } else {
            o.put("certification", "not certified: " + ((Certification.NotChecked) c).why());
        }
    }

    private static void discountedJson(ObjectNode o, Plan p, DiscountedAnalysis a) {
        Mission m = p.mission();
        Objective.Discounted ob = a.objective();
        o.put("objective", "discounted");
        o.put("discount", ob.discount());
        o.put("threshold", ob.threshold().toString());
        o.put("relation", ob.relation().symbol());
        o.put("reserveKept", a.reserveKept());
        Json.putBattery(o, m.startUnits(), m.reserveUnits(), m.capacityUnits());
        o.put("weightBoundUnits", a.maxAbsWeight());
        o.put("comparatorStates", a.comparatorStates());
        o.put("comparatorStateBound", a.comparatorStateBound());
        Optional<dockline.model.Rational> worst = a.worstCaseScore();
        if (worst.isPresent()) {
            o.put("lowestScore", worst.get().toString());
        } else {
            o.putNull("lowestScore");
        }
        ArrayNode plan = o.putArray("nominalPlan");
        a.nominalPlan().forEach(x -> plan.add(x.toString()));
        Json.putUnitAndBudget(o, m);
        Json.putGameSize(o, a.productVertices(), a.productEdges(), a.estimate(), a.buildMillis(), a.solveMillis());
        if (a.baseline().isPresent()) {
            DiscountedAnalysis.Baseline b = a.baseline().get();
            ObjectNode bo = o.putObject("optimisationBaseline");
            bo.put("holds", b.holds());
            bo.put("lower", b.lower().toString());
            bo.put("upper", b.upper().toString());
            if (b.optimalValue().isPresent()) {
                bo.put("optimalValue", b.optimalValue().get().toString());
            } else {
                bo.putNull("optimalValue");
            }
            if (b.optimalPlayCompletes().isPresent()) {
                bo.put("optimalPlayCompletes", b.optimalPlayCompletes().get());
            } else {
                bo.putNull("optimalPlayCompletes");
            }
            bo.put("sweeps", b.sweeps());
        }
    }
}
