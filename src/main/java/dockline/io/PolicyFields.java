package dockline.io;

import static dockline.io.PolicyFiles.SCORE_KEYS;
import static dockline.io.PolicyFiles.VERSION;
import static dockline.io.PolicyFiles.VERSION_1;
import static dockline.io.PolicyFiles.VERSION_THRESHOLDS;
import static dockline.io.PolicyFiles.VERSION_WITH_SCORE;
import static dockline.io.PolicyFiles.CLOSED;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.io.PolicyFiles.Header;
import dockline.io.PolicyFiles.Rounds;
import dockline.io.PolicyFiles.ScoreTerms;
import dockline.model.Cell;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.PolicyEntry;
import dockline.policy.PolicyScore;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The checks of a policy file's values, shared by the JSON and the CSV reader: both hand over the
 * values as text by key, with the position of each, and get back the header or a row, or
 * {@code null} after reporting every problem at its position (missions/POLICY-FORMAT.md describes
 * each key). Constant work per value.
 */
final class PolicyFields {

    static final Pattern CELL = Pattern.compile("(\\d{1,6}):(\\d{1,6})");

    private PolicyFields() {
    }

    /** The cell written {@code x:y}, or {@code null}. */
    static Cell cell(String text) {
        Matcher m = CELL.matcher(text.trim());
        return m.matches() ? new Cell(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))) : null;
    }

    /** The action words, for a hint. */
    static String actionWords() {
        List<String> w = new ArrayList<>();
        for (ActionKind k : ActionKind.values()) {
            w.add(k.word());
        }
        return String.join(", ", w);
    }

    /** Checks the fields of one row; reports problems at the given positions; null when bad. */
    static PolicyEntry row(Problems p, Pos rowPos, Map<String, String> values, Map<String, Pos> at) {
        if (values.containsKey("atLeastUnits")) {
            // a threshold: the same fields as a row, its level being the threshold
            values.put("levelUnits", values.remove("atLeastUnits"));
            at.put("levelUnits", at.get("atLeastUnits"));
        }
        boolean ok = true;
        for (String k : List.of("cell", "levelUnits", "budgetLeft", "progress", "action")) {
            if (!values.containsKey(k)) {
                p.addPolicy(rowPos, "row has no '" + k + "'");
                ok = false;
            }
        }
        if (!ok) {
            return null;
        }
        Cell c = cell(values.get("cell"));
        if (c == null) {
            p.add(at.get("cell"), "'" + Loading.shorten(values.get("cell")) + "' is not a cell", "write x:y, e.g. 3:4");
            ok = false;
        }
        int level = nonNegative(p, values, at, "levelUnits");
        int budget = nonNegative(p, values, at, "budgetLeft");
        int progress = nonNegative(p, values, at, "progress");
        ok &= level >= 0 && budget >= 0 && progress >= 0;
        PolicyScore score = null;
        if (values.containsKey("score") && !values.get("score").isBlank()) {
            try {
                score = PolicyScore.parse(values.get("score"));
            } catch (NumberFormatException e) {
                p.add(at.get("score"), "'" + Loading.shorten(values.get("score")) + "' is not a score memory",
                        "write the gap as n/q (e.g. -3/8, 2) or the word " + PolicyScore.SECURED_WORD);
                ok = false;
            }
        }
        ActionKind kind = ActionKind.ofWord(values.get("action").trim());
        if (kind == null) {
            p.add(at.get("action"), "unknown action '" + Loading.shorten(values.get("action")) + "'",
                    "use one of " + actionWords());
            return null;
        }
        String to = values.get("to");
        Cell target = c;
        if (kind == ActionKind.MOVE) {
            if (to == null || to.isBlank()) {
                p.addPolicy(at.getOrDefault("to", rowPos), "a move needs 'to', the cell it goes to");
                return null;
            }
            target = cell(to);
            if (target == null) {
                p.add(at.get("to"), "'" + Loading.shorten(to) + "' is not a cell", "write x:y, e.g. 3:4");
                return null;
            }
        } else if (to != null && !to.isBlank()) {
            p.add(at.get("to"), "'" + kind.word() + "' stays on its cell and takes no 'to'", "leave 'to' out");
            return null;
        }
        String closures = values.getOrDefault(CLOSED, "").trim();
        return ok ? new PolicyEntry(c, level, budget, progress, new Action(kind, target), score, closures) : null;
    }

    /** Whether this reader knows the format version. */
    static boolean knownVersion(String v) {
        String t = v.trim();
        return t.equals(String.valueOf(VERSION)) || t.equals(String.valueOf(VERSION_1))
                || t.equals(String.valueOf(VERSION_WITH_SCORE)) || t.equals(String.valueOf(VERSION_THRESHOLDS));
    }

    /** The value of {@code key} as a whole number of at least 0, or -1 after reporting it. */
    static int nonNegative(Problems p, Map<String, String> values, Map<String, Pos> at, String key) {
        String v = values.get(key).trim();
        if (!v.matches("\\d{1,9}")) {
            p.addPolicy(at.get(key), "'" + key + "' must be a whole number of at least 0, not '" + Loading.shorten(v) + "'");
            return -1;
        }
        return Integer.parseInt(v);
    }

    /** The header from the top-level values and the task list, or {@code null} after a problem. */
    static Header header(Problems p, Pos pos, Map<String, String> values, Map<String, Pos> at,
                                 List<String> tasks) {
        for (String k : List.of("mission", "unitWh", "reserveUnits", "capacityUnits", "budget")) {
            if (!values.containsKey(k)) {
                p.addPolicy(pos, "no '" + k + "' in the policy file");
                return null;
            }
        }
        BigDecimal unit;
        try {
            unit = Quantities.parseDecimal(values.get("unitWh"));
            if (unit.signum() <= 0) {
                p.addPolicy(at.get("unitWh"), "'unitWh' must be positive");
                return null;
            }
        } catch (IllegalArgumentException e) {
            p.addPolicy(at.get("unitWh"), e.getMessage());
            return null;
        }
        int floor = nonNegative(p, values, at, "reserveUnits");
        int cap = nonNegative(p, values, at, "capacityUnits");
        int budget = nonNegative(p, values, at, "budget");
        if (floor < 0 || cap < 0 || budget < 0) {
            return null;
        }
        Optional<ScoreTerms> score = scoreTerms(p, pos, values, at);
        if (score == null) {
            return null;
        }
        Optional<Rounds> rounds = rounds(p, pos, values, at);
        if (rounds == null) {
            return null;
        }
        if (rounds.isPresent() && score.isPresent()) {
            p.addPolicy(at.get("goal"), "a patrol or deadline policy has no discounted objective");
            return null;
        }
        return new Header(values.get("mission"), unit, floor, cap, budget, tasks, score, rounds);
    }

    /** The goal beyond one trip of the header, empty for a one-trip policy, null after a problem. */
    static Optional<Rounds> rounds(Problems p, Pos pos, Map<String, String> values, Map<String, Pos> at) {
        String goal = values.get("goal");
        if (goal == null || goal.trim().equals("visit")) {
            for (String k : List.of("budgetPer", "deadlineTicks")) {
                if (values.containsKey(k)) {
                    p.add(at.get(k), "'" + k + "' belongs to a patrol or deadline policy",
                            "add 'goal: " + (k.equals("budgetPer") ? "patrol" : "deadline") + "', or leave '" + k
                            + "' out");
                    return null;
                }
            }
            return Optional.empty();
        }
        switch (goal.trim()) {
            case Rounds.PATROL -> {
                if (values.containsKey("deadlineTicks")) {
                    p.add(at.get("deadlineTicks"), "'deadlineTicks' belongs to a deadline policy, not a patrol",
                            "leave 'deadlineTicks' out");
                    return null;
                }
                String per = values.getOrDefault("budgetPer", "mission").trim();
                if (!per.equals("lap") && !per.equals("mission")) {
                    p.addPolicy(at.get("budgetPer"), "'budgetPer' must be lap or mission, not '" + Loading.shorten(per)
                            + "'");
                    return null;
                }
                return Optional.of(new Rounds(Rounds.PATROL, per.equals("lap"), -1));
            }
            case Rounds.DEADLINE -> {
                if (values.containsKey("budgetPer")) {
                    p.add(at.get("budgetPer"), "'budgetPer' belongs to a patrol policy, not a deadline",
                            "leave 'budgetPer' out");
                    return null;
                }
                if (!values.containsKey("deadlineTicks")) {
                    p.addPolicy(pos, "no 'deadlineTicks' in the policy file (it is for a deadline mission)");
                    return null;
                }
                int t = nonNegative(p, values, at, "deadlineTicks");
                return t < 0 ? null : Optional.of(new Rounds(Rounds.DEADLINE, false, t));
            }
            default -> {
                p.addPolicy(at.get("goal"), "'goal' must be visit, patrol or deadline, not '" + Loading.shorten(goal)
                        + "'");
                return null;
            }
        }
    }

    /** The discounted objective of the header, empty for a reserve policy, null after a problem. */
    static Optional<ScoreTerms> scoreTerms(Problems p, Pos pos, Map<String, String> values,
                                                   Map<String, Pos> at) {
        String kind = values.get("objective");
        if (kind == null || kind.trim().equals("reserve")) {
            for (String k : SCORE_KEYS.subList(1, SCORE_KEYS.size())) {
                if (values.containsKey(k)) {
                    p.add(at.get(k), "'" + k + "' belongs to a policy for a discounted mission",
                            "add 'objective: discounted', or leave '" + k + "' out");
                    return null;
                }
            }
            return Optional.empty();
        }
        if (!kind.trim().equals("discounted")) {
            p.addPolicy(at.get("objective"), "'objective' must be reserve or discounted, not '" + Loading.shorten(kind) + "'");
            return null;
        }
        for (String k : List.of("discount", "threshold", "weightBoundUnits")) {
            if (!values.containsKey(k)) {
                p.addPolicy(pos, "no '" + k + "' in the policy file (it is for a discounted mission)");
                return null;
            }
        }
        boolean ok = true;
        int d = nonNegative(p, values, at, "discount");
        if (d >= 0 && d < 2) {
            p.addPolicy(at.get("discount"), "'discount' must be a whole number of at least 2");
            ok = false;
        }
        int mu = nonNegative(p, values, at, "weightBoundUnits");
        ok &= d >= 0 && mu >= 0;
        Rational v = null;
        String t = values.get("threshold").trim();
        if (t.matches("[+-]?\\d{1,18}(/\\d{1,18})?")) {
            try {
                v = Rational.parse(t);
            } catch (NumberFormatException | ArithmeticException e) {
                v = null;
            }
        }
        if (v == null) {
            p.addPolicy(at.get("threshold"), "'threshold' must be a rational n/q, not '" + Loading.shorten(t) + "'");
            ok = false;
        }
        Relation rel = Relation.AT_LEAST;
        if (values.containsKey("relation")) {
            rel = switch (values.get("relation").trim()) {
                case ">=", "at-least" -> Relation.AT_LEAST;
                case ">", "above" -> Relation.ABOVE;
                default -> null;
            };
            if (rel == null) {
                p.addPolicy(at.get("relation"), "'relation' must be '>=' (at-least) or '>' (above)");
                ok = false;
            }
        }
        boolean kept = true;
        if (values.containsKey("reserveKept")) {
            String k = values.get("reserveKept").trim();
            if (!k.equals("true") && !k.equals("false")) {
                p.addPolicy(at.get("reserveKept"), "'reserveKept' must be true or false");
                ok = false;
            }
            kept = k.equals("true");
        }
        return ok ? Optional.of(new ScoreTerms(d, v, rel, mu, kept)) : null;
    }
}
