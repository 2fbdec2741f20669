package dockline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.certify.DiscountedCertificate;
import dockline.certify.DiscountedCertificateChecker;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.report.Caveats;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.OptionalInt;
import picocli.CommandLine.Option;

/**
 * The discounted-objective part of {@code check} (a picocli mixin): the options that choose or
 * override the objective, and the report of {@link DiscountedSolver#analyse}, as text or JSON.
 * Every guaranteed verdict is re-checked by {@link DiscountedCertificateChecker} on the exported
 * policy ({@link DiscountedPolicies}) before it is reported, and the worst score the solver reports
 * must equal the certificate's exact worst score; otherwise exit 4, never a silent "guaranteed".
 */
final class DiscountedCheck {

    @Option(names = "--objective", paramLabel = "KIND",
            description = "reserve or discounted, instead of the mission's objective")
    String kind;

    @Option(names = "--discount", paramLabel = "D",
            description = "discount factor of the discounted score, a whole number of at least 2")
    Integer discount;

    @Option(names = "--threshold", paramLabel = "V",
            description = "threshold of the discounted score, a rational such as 3/4, -2 or 0.75 (energy units)")
    String threshold;

    @Option(names = "--relation", paramLabel = "REL",
            description = "'>=' (at-least) or '>' (above): how the score is compared with the threshold")
    String relation;

    @Option(names = "--score-only",
            description = "discounted objective: check the score alone, without the reserve floor")
    boolean scoreOnly;

    @Option(names = "--also-optimise",
            description = "discounted objective: also run the optimisation baseline (value iteration for the best"
                    + " score, tasks and battery ignored) and say whether its optimal play completes the mission")
    boolean alsoOptimise;

    /** How a threshold is written: {@code p/q}, a whole number or a decimal. */
    private static final String THRESHOLD_SYNTAX = "[+-]?\\d+\\s*/\\s*[+-]?\\d+|[+-]?\\d+(\\.\\d+)?";

    /** Largest discount factor accepted (as in mission files). */
    static final int MAX_DISCOUNT = 1_000_000;

    /**
     * The objective to check: the mission's, with any option applied; {@code null} after printing
     * the problems when an option is bad.
     */
    Objective objective(Objective fromFile, PrintWriter err) {
        boolean bad = false;
        String k = kind;
        if (k != null && !k.equals("reserve") && !k.equals("discounted")) {
            err.println("dockline: --objective must be reserve or discounted, not '" + k + "'");
            return null;
        }
        boolean scoreGiven = discount != null || threshold != null || relation != null;
        if (k == null) {
            k = fromFile instanceof Objective.Discounted || scoreGiven ? "discounted" : "reserve";
        }
        if (k.equals("reserve")) {
            if (scoreGiven || scoreOnly || alsoOptimise) {
                err.println("dockline: --discount, --threshold, --relation, --score-only and --also-optimise apply"
                        + " only to the discounted objective");
                return null;
            }
            return new Objective.Reserve();
        }
        Objective.Discounted base = fromFile instanceof Objective.Discounted d ? d : null;
        Integer d = discount != null ? discount : base != null ? Integer.valueOf(base.discount()) : null;
        if (d == null) {
            err.println("dockline: the discounted objective needs --discount D (the mission file gives none)");
            bad = true;
        } else if (d < 2 || d > MAX_DISCOUNT) {
            err.println("dockline: --discount must be a whole number from 2 to " + MAX_DISCOUNT + ", not " + d);
            bad = true;
        }
        Rational v = base != null ? base.threshold() : null;
        if (threshold != null) {
            v = parseThreshold(threshold);
            if (v == null) {
                boolean written = threshold.trim().matches(THRESHOLD_SYNTAX);
                err.println("dockline: --threshold '" + threshold + "' " + (written
                        ? "is out of range: numerator and denominator are 64-bit whole numbers, the denominator not 0"
                        : "is not a rational number (e.g. 3/4, -2, 0.75)"));
                bad = true;
            }
        } else if (v == null) {
            err.println("dockline: the discounted objective needs --threshold V (the mission file gives none)");
            bad = true;
        }
        Relation rel = base != null ? base.relation() : Relation.AT_LEAST;
        if (relation != null) {
            rel = switch (relation.trim()) {
                case ">=", "at-least" -> Relation.AT_LEAST;
                case ">", "above" -> Relation.ABOVE;
                default -> null;
            };
            if (rel == null) {
                err.println("dockline: --relation must be '>=' (at-least) or '>' (above), not '" + relation + "'");
                bad = true;
            }
        }
        return bad ? null : new Objective.Discounted(d, v, rel);
    }

    static Rational parseThreshold(String t) {
        String s = t.trim();
        if (!s.matches(THRESHOLD_SYNTAX)) {
            return null;
        }
        try {
            return Rational.parse(s);
        } catch (NumberFormatException | ArithmeticException e) {
            return null;
        }
    }

    DiscountedOptions options(long memoryBudgetBytes) {
        return DiscountedOptions.defaults().withKeepReserve(!scoreOnly).withAlsoOptimise(alsoOptimise)
                .withMemoryBudget(memoryBudgetBytes);
    }

    /** Analyses, certifies and prints; returns the exit code. Other exceptions are mapped by the caller. */
    int run(Mission m, Objective.Discounted o, long memoryBudgetBytes, boolean json, PrintWriter out, PrintWriter err) {
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o, options(memoryBudgetBytes));
        DiscountedCertificate cert = null;
        if (a.guaranteed()) {
            cert = certify(a); // a closed loop over its limit is mapped to exit 3 by the caller
            String problem = certificateProblem(a, cert);
            if (problem != null) {
                err.println("dockline: internal error: the solver says guaranteed, but " + problem);
                err.println("No verdict is given. Please report this with the input files.");
                return ExitCodes.INTERNAL;
            }
        }
        if (json) {
            out.println(json(a, cert));
        } else {
            human(a, cert, out);
        }
        return a.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    /** The certificate of a guaranteed analysis: its policy re-checked on the independent code path. */
    static DiscountedCertificate certify(DiscountedAnalysis a) {
        return certify(a, DiscountedPolicies.of(a));
    }

    /** The certificate of the given policy of a guaranteed analysis (the one that is exported). */
    static DiscountedCertificate certify(DiscountedAnalysis a, Policy policy) {
        Mission m = a.mission();
        return DiscountedCertificateChecker.check(a.game().arena(), policy, a.objective(),
                a.reserveKept() ? OptionalInt.of(m.reserveUnits()) : OptionalInt.empty(), m.startUnits());
    }

    /** What is wrong with the certificate of a guaranteed analysis, or {@code null} when nothing is. */
    static String certificateProblem(DiscountedAnalysis a, DiscountedCertificate cert) {
        if (!cert.ok()) {
            return "its policy failed the independent certificate: " + cert.reason();
        }
        if (a.worstCaseScore().isPresent() && !cert.worstScore().orElseThrow().sameValue(a.worstCaseScore().get())) {
            return "its worst score " + a.worstCaseScore().get() + " differs from the certificate's exact worst score "
                    + cert.worstScore().get();
        }
        return null;
    }

    static String condition(Objective.Discounted o) {
        return "DS " + o.relation().symbol() + " " + o.threshold() + " (discount " + o.discount() + ")";
    }

    static void human(DiscountedAnalysis a, PrintWriter out) {
        human(a, null, out);
    }

    /** The summary, with the certificate line when guaranteed. */
    static void human(DiscountedAnalysis a, DiscountedCertificate cert, PrintWriter out) {
        Mission m = a.mission();
        Objective.Discounted o = a.objective();
        int k = m.map().disturbances().budget();
        String events = k == 0 ? "with no disturbances" : "under up to " + k + " disturbance" + (k == 1 ? "" : "s");
        String battery = a.reserveKept() ? " and never going below the reserve floor" : "";
        if (a.guaranteed()) {
            out.println("GUARANTEED: " + m.name() + " — the robot can always finish and dock " + events
                    + " with a discounted score " + condition(o) + battery + ".");
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — no policy can always finish and dock " + events
                    + " with a discounted score " + condition(o) + battery + ".");
        }
        if (a.worstCaseScore().isPresent()) {
            out.println("  Worst score under the policy:  " + show(a.worstCaseScore().get()));
        } else if (cert != null && cert.worstScore().isPresent()) {
            out.println("  Worst score under the policy:  " + cert.worstScore().get() + " (by the certificate)");
        }
        if (!a.nominalPlan().isEmpty()) {
            out.println("  Plan with no disturbance:      " + plan(a.nominalPlan()));
        }
        out.println("  Score: the discounted sum of the energy changes in units, w0 + w1/" + o.discount() + " + w2/"
                + o.discount() + "^2 + ..., counted until the mission is complete (0 afterwards)"
                + (a.reserveKept() ? "; the reserve floor is checked as well" : "; the reserve floor is not checked"
                + " (--score-only)"));
        out.println("  Comparator: " + a.comparatorStates() + " states (bound " + a.comparatorStateBound()
                + "), energy changes up to " + a.maxAbsWeight() + " units per step");
        out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges; solved in "
                + a.solveMillis() + " ms (" + a.totalMillis() + " ms in all)");
        a.baseline().ifPresent(b -> {
            out.println("  Optimisation baseline (best score by value iteration, tasks and battery ignored): "
                    + b.optimalValue().map(DiscountedCheck::show).orElse("between " + show(b.lower()) + " and "
                    + show(b.upper())) + "; compared with " + o.threshold() + ": " + (b.holds() ? "yes" : "no"));
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
        for (String note : a.notes()) {
            out.println("  Note: " + note);
        }
        out.println(Caveats.block());
    }

    /** A rational with a decimal reading for people, e.g. {@code 16385/16384 (about 1.00006)}. */
    static String show(Rational r) {
        if (r.den() == 1) {
            return r.toString();
        }
        BigDecimal dec = new BigDecimal(r.num()).divide(new BigDecimal(r.den()), new MathContext(6));
        return r + " (about " + dec.stripTrailingZeros().toPlainString() + ")";
    }

    /** E.g. {@code charge x2, move 2:1, ..., move 12:3 (17 steps)}. */
    static String plan(List<Action> plan) {
        StringBuilder sb = new StringBuilder();
        int i = 0;
        int shown = 0;
        while (i < plan.size() && shown < 12) {
            Action x = plan.get(i);
            int j = i;
            while (j < plan.size() && x.kind() != ActionKind.MOVE && plan.get(j).equals(x)) {
                j++;
            }
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(x);
            if (j - i > 1) {
                sb.append(" x").append(j - i);
            }
            i = Math.max(j, i + 1);
            shown++;
        }
        if (i < plan.size()) {
            sb.append(", ... ").append(plan.get(plan.size() - 1));
        }
        return sb.append(" (").append(plan.size()).append(plan.size() == 1 ? " step)" : " steps)").toString();
    }

    static String json(DiscountedAnalysis a) {
        return json(a, null);
    }

    static String json(DiscountedAnalysis a, DiscountedCertificate cert) {
        ObjectNode o = Json.object();
        Mission m = a.mission();
        Objective.Discounted ob = a.objective();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", a.verdict().word());
        o.put("objective", "discounted");
        o.put("discount", ob.discount());
        o.put("threshold", ob.threshold().toString());
        o.put("relation", ob.relation().symbol());
        o.put("reserveKept", a.reserveKept());
        o.put("startUnits", m.startUnits());
        o.put("reserveUnits", m.reserveUnits());
        o.put("capacityUnits", m.capacityUnits());
        o.put("maxAbsWeightUnits", a.maxAbsWeight());
        o.put("comparatorStates", a.comparatorStates());
        o.put("comparatorStateBound", a.comparatorStateBound());
        if (a.worstCaseScore().isPresent()) {
            o.put("worstCaseScore", a.worstCaseScore().get().toString());
        } else {
            o.putNull("worstCaseScore");
        }
        ArrayNode plan = o.putArray("nominalPlan");
        a.nominalPlan().forEach(x -> plan.add(x.toString()));
        o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
        o.put("budget", m.map().disturbances().budget());
        Json.putGameSize(o, a.productVertices(), a.productEdges(), a.estimate(), a.buildMillis(), a.solveMillis(),
                a.totalMillis());
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
        o.put("certified", cert != null && cert.ok());
        if (cert != null) {
            o.put("certifiedStates", cert.statesChecked());
            o.put("certifiedWorstScore", cert.worstScore().map(Object::toString).orElse(null));
            if (cert.reserveKept()) {
                o.put("certifiedWorstMinimumUnits", cert.worstMinimumUnits());
            }
        }
        o.put("discretisation", m.scale().describe());
        ArrayNode notes = o.putArray("notes");
        a.notes().forEach(notes::add);
        return Json.withCaveats(o);
    }
}
