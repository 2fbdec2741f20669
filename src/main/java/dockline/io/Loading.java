package dockline.io;

import dockline.model.Cell;
import dockline.model.Charge;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Typed reading of {@link Node} values for the loaders: every reader either returns a value or
 * records a problem at the value's position and returns {@code null}. A {@link Node.Bad} value was
 * reported already and yields {@code null} silently, so one mistake gives one message.
 */
final class Loading {

    final Problems problems;
    /** Unknown keys found per mapping, so that a misspelt key is not also reported as a missing one. */
    private final java.util.IdentityHashMap<Node.MapNode, List<String>> unknown = new java.util.IdentityHashMap<>();

    Loading(Problems problems) {
        this.problems = problems;
    }

    /** Most characters of file content a message quotes. */
    static final int QUOTED = 80;

    /**
     * File content as a message may quote it: at most {@link #QUOTED} characters (then "..."), with
     * control characters, bidirectional overrides and other invisible formatting characters shown as
     * {@code \\u202E} escapes, so that a message can neither be reordered on screen nor carry a long
     * stretch of a file.
     */
    static String shorten(String s) {
        if (s == null) {
            return "";
        }
        return escaped(s, QUOTED, false);
    }

    /**
     * {@code s} with every hidden character ({@link #hidden}) shown as a {@code \\uXXXX} escape, cut
     * (then "...") once {@code limit} characters of {@code s} were taken, or, with {@code limitOutput},
     * once the text built is {@code limit} characters long.
     */
    static String escaped(String s, int limit, boolean limitOutput) {
        StringBuilder sb = new StringBuilder();
        int shown = 0;
        int i = 0;
        while (i < s.length() && (limitOutput ? sb.length() : shown) < limit) {
            int cp = s.codePointAt(i);
            i += Character.charCount(cp);
            shown++;
            if (hidden(cp)) {
                sb.append(String.format("\\u%04X", cp));
            } else {
                sb.appendCodePoint(cp);
            }
        }
        if (i < s.length()) {
            sb.append("...");
        }
        return sb.toString();
    }

    /**
     * A character a terminal would not show as itself: C0 and C1 controls, the bidirectional
     * embeddings, overrides and isolates (U+202A..U+202E, U+2066..U+2069), the marks U+200E/U+200F
     * and U+061C, and other format characters (Unicode category Cf, e.g. zero-width spaces),
     * line and paragraph separators, unpaired surrogates and non-characters.
     */
    static boolean hidden(int cp) {
        if (Character.isISOControl(cp) || cp == 0x2028 || cp == 0x2029 || cp == 0xFFFE || cp == 0xFFFF) {
            return true;
        }
        int t = Character.getType(cp);
        return t == Character.FORMAT || t == Character.SURROGATE || t == Character.UNASSIGNED && cp >= 0xFDD0
                && cp <= 0xFDEF;
    }

    /** Example lines for a missing key, so that its hint shows what to write. */
    private static final java.util.Map<String, String> EXAMPLES = java.util.Map.ofEntries(
            java.util.Map.entry("cell-size", "cell-size: 2            # metres per cell edge"),
            java.util.Map.entry("legend", "legend: followed by lines such as  \"#\": wall  and  \".\": tile"),
            java.util.Map.entry("plan", "plan: |  followed by the rows of the floor plan, indented"),
            java.util.Map.entry("surface", "surface: tile"),
            java.util.Map.entry("kind", "kind: door-shut (an event) or kind: reserve (an objective)"),
            java.util.Map.entry("where", "where: [door]  (legend symbols or zone names)"),
            java.util.Map.entry("map", "map: ../maps/clinic-wing.yaml"),
            java.util.Map.entry("robot", "robot:  followed by capacity, resolution, move-energy and wait-energy"),
            java.util.Map.entry("start", "start:  followed by  cell: [1, 6]  and  charge: 80%"),
            java.util.Map.entry("cell", "cell: [1, 6]"),
            java.util.Map.entry("reserve", "reserve: 20%"),
            java.util.Map.entry("capacity", "capacity: 60            # Wh, usable"),
            java.util.Map.entry("resolution", "resolution: 0.5         # Wh per energy unit"),
            java.util.Map.entry("move-energy", "move-energy:  followed by one line per surface, e.g.  tile: 0.5"),
            java.util.Map.entry("wait-energy", "wait-energy: 0.5        # Wh per idle step"),
            java.util.Map.entry("discount", "discount: 2"),
            java.util.Map.entry("threshold", "threshold: \"3/4\""));

    /** The hint for a missing key: an example line, and where the format is described. */
    static String missingHint(String key, String where) {
        String example = EXAMPLES.get(key);
        String doc = where.contains("map") || where.contains("event") ? "maps/README.md" : "missions/README.md";
        return (example != null ? "add a line such as '" + example + "'" : "add '" + key + ":' with its value")
                + " under " + where + " (see " + doc + ")";
    }

    /** The node as a mapping, or a problem. */
    Node.MapNode map(Node n, String what) {
        if (n instanceof Node.MapNode m) {
            return m;
        }
        if (n != null && !(n instanceof Node.Bad)) {
            problems.add(n.pos(), what + " must be a mapping of keys to values, not " + n.describe(),
                    "write the keys on the lines below, indented");
        }
        return null;
    }

    /** Reports every key that is not one of the known ones, with the closest known key as a hint. */
    void onlyKeys(Node.MapNode m, String where, String... known) {
        List<String> k = Arrays.asList(known);
        for (Node.Entry e : m.entries()) {
            if (!k.contains(e.key())) {
                List<String> u = unknown.computeIfAbsent(m, x -> new ArrayList<>());
                if (problems.count() >= Problems.LIMIT) {
                    problems.dropOne(); // the report is full: count it without the cost of wording it
                    continue;
                }
                u.add(e.key());
                String near = Spelling.closest(e.key(), k);
                problems.add(e.keyPos(), near != null
                                ? "unknown key '" + shorten(e.key()) + "', did you mean '" + near + "'?"
                                : "unknown key '" + shorten(e.key()) + "' in " + where,
                        "known keys here: " + String.join(", ", known));
            }
        }
    }

    /** The value of a key that must be there, or a problem at the mapping. */
    Node require(Node.MapNode m, String key, String where) {
        Node v = m.get(key);
        if (v == null && !misspelt(m, key)) {
            problems.add(m.pos(), where + ": missing key '" + key + "'", missingHint(key, where));
        }
        return v;
    }

    private boolean misspelt(Node.MapNode m, String key) {
        for (String u : unknown.getOrDefault(m, List.of())) {
            if (Spelling.closest(u, List.of(key)) != null) {
                return true; // already reported as "unknown key ..., did you mean '<key>'?"
            }
        }
        return false;
    }

    String string(Node n, String what) {
        if (n instanceof Node.Scalar s && s.kind() != Node.Kind.NULL) {
            if (s.text().isBlank()) {
                problems.add(n.pos(), what + " must not be blank", "write a value after the colon, or remove the line");
                return null;
            }
            return s.text().trim();
        }
        wrong(n, what, "text");
        return null;
    }

    BigDecimal decimal(Node n, String what) {
        return quantity(n, what, Quantities::parseDecimal, "write a plain decimal number, e.g. 2 or 0.5", "a number");
    }

    /** An energy in Wh (a number, optionally followed by {@code Wh}), not negative. */
    BigDecimal wh(Node n, String what) {
        return quantity(n, what, Quantities::parseWh, "give the energy in Wh, e.g. 0.5 or 0.5 Wh", "an energy in Wh");
    }

    /** A whole number in [min, max]. */
    Integer integer(Node n, String what, long min, long max) {
        if (n instanceof Node.Scalar s && s.kind() != Node.Kind.NULL && s.kind() != Node.Kind.BOOLEAN) {
            String t = s.text().trim();
            if (!t.matches("[+-]?\\d{1,18}")) {
                if (t.matches("[+-]?\\d+")) {
                    problems.add(n.pos(), what + ": " + shorten(t) + " is far too large (at most " + max + ")",
                            "write a whole number from " + min + " to " + max);
                } else {
                    problems.add(n.pos(), what + " must be a whole number, not '" + shorten(t) + "'",
                            "write digits only, e.g. " + Math.max(min, Math.min(max, 2)));
                }
                return null;
            }
            long v = Long.parseLong(t);
            if (v < min || v > max) {
                problems.add(n.pos(), what + " must be " + (max == Integer.MAX_VALUE ? "at least " + min
                        : "between " + min + " and " + max) + ", not " + v,
                        "write a whole number from " + min + (max == Integer.MAX_VALUE ? " up" : " to " + max));
                return null;
            }
            return (int) v;
        }
        wrong(n, what, "a whole number");
        return null;
    }

    Boolean bool(Node n, String what) {
        if (n instanceof Node.Scalar s && s.kind() == Node.Kind.BOOLEAN) {
            String t = s.text().trim();
            if (t.equals("true")) {
                return true;
            }
            if (t.equals("false")) {
                return false;
            }
            problems.add(n.pos(), what + " must be true or false, not '" + shorten(t) + "'", "write true or false");
            return null;
        }
        wrong(n, what, "true or false");
        return null;
    }

    /** A cell written {@code [x, y]}. Does not check that it lies on the plan. */
    Cell cell(Node n, String what) {
        if (n instanceof Node.SeqNode s && s.items().size() == 2) {
            Integer x = integer(s.items().get(0), what + " x", 0, Integer.MAX_VALUE);
            Integer y = integer(s.items().get(1), what + " y", 0, Integer.MAX_VALUE);
            return x == null || y == null ? null : new Cell(x, y);
        }
        if (n == null || n instanceof Node.Bad) {
            return null;
        }
        problems.add(n.pos(), what + " must be a cell [x, y], not " + (n instanceof Node.SeqNode s
                        ? "a list of " + s.items().size() + (s.items().size() == 1 ? " value" : " values") : n.describe()),
                "x is the column from the left, y the row from the top, both from 0, e.g. [3, 7]");
        return null;
    }

    /** A name with the position where it is written. */
    record Named(String name, Pos pos) {
    }

    /** One name, or a list of names. */
    List<String> names(Node n, String what) {
        List<Named> l = named(n, what);
        return l == null ? null : l.stream().map(Named::name).toList();
    }

    /** One name, or a list of names, each with its position. */
    List<Named> named(Node n, String what) {
        List<Named> out = new ArrayList<>();
        if (n instanceof Node.SeqNode s) {
            for (Node item : s.items()) {
                String t = string(item, what + " entry");
                if (t != null) {
                    out.add(new Named(t, item.pos()));
                }
            }
            return out;
        }
        if (n instanceof Node.Scalar sc && sc.kind() != Node.Kind.NULL) {
            String t = string(n, what);
            if (t != null) {
                out.add(new Named(t, n.pos()));
            }
            return out;
        }
        wrong(n, what, "a name or a list of names");
        return null;
    }

    /** A charge ({@code 20%}, {@code 15 Wh}, {@code 15}). */
    Charge charge(Node n, String what) {
        return quantity(n, what, Quantities::parseCharge, "write a percentage of the capacity (20%) or Wh (12 Wh)", "a charge such as 20% or 12 Wh");
    }

    /**
     * A quantity written as a scalar, read by {@code parser}; a parse failure is a problem with
     * {@code hint}, anything but a scalar a problem saying it should be {@code expected}.
     */
    private <T> T quantity(Node n, String what, java.util.function.Function<String, T> parser, String hint,
                           String expected) {
        if (n instanceof Node.Scalar s && s.kind() != Node.Kind.NULL && s.kind() != Node.Kind.BOOLEAN) {
            try {
                return parser.apply(s.text());
            } catch (IllegalArgumentException e) {
                problems.add(n.pos(), what + ": " + e.getMessage(), hint);
                return null;
            }
        }
        wrong(n, what, expected);
        return null;
    }

    private void wrong(Node n, String what, String expected) {
        if (n == null || n instanceof Node.Bad) {
            return;
        }
        problems.add(n.pos(), what + " must be " + expected + ", not " + n.describe(),
                "write " + expected + " here (see maps/README.md or missions/README.md for this key)");
    }
}
