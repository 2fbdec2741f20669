package dockline.cli;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import picocli.CommandLine.Option;

/**
 * The discounted-objective options of {@code check} (a picocli mixin): the options that choose or
 * override the objective, turned into the objective and the core's {@link dockline.plan.Route.Discounted};
 * and the wording of scores and plans that {@link CheckReport} and {@code export} print.
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

    /** The discounted route of the options. */
    dockline.plan.Route.Discounted route() {
        return new dockline.plan.Route.Discounted(!scoreOnly, alsoOptimise);
    }

    static String condition(Objective.Discounted o) {
        return "DS " + o.relation().symbol() + " " + o.threshold() + " (discount " + o.discount() + ")";
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
}
