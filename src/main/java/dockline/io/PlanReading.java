package dockline.io;

import dockline.model.Terrain;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a map's {@code plan:} block into a {@link PlanGrid}: one character per cell, row by row, each
 * looked up in the legend. Every row keeps its file line and column so that a problem points at the
 * very character; an unknown character is reported {@value #SHOWN_PER_CHAR} times, then counted.
 * Linear in the plan's size; no object per cell.
 */
final class PlanReading {

    /** Characters that YAML gives a meaning at the start of a plain key; such legend keys must be quoted. */
    private static final String YAML_INDICATORS = "#&*!|>'\"%@`{}[],:?-";
    /** How often one unknown plan character is reported before the rest are counted. */
    private static final int SHOWN_PER_CHAR = 3;

    /** The legend, {@code null} when it is broken (then no character is reported as unknown). */
    private final Map<Character, Terrain> legend;

    private final YamlReader.Document doc;
    private final Problems problems;

    PlanReading(YamlReader.Document doc, Problems problems, Map<Character, Terrain> legend) {
        this.doc = doc;
        this.problems = problems;
        this.legend = legend;
    }

    /** The grid of the plan, or {@code null} when it cannot be read at all. */
    PlanGrid read(Node n) {
        if (!(n instanceof Node.Scalar s) || s.kind() != Node.Kind.STRING || !isLiteralBlock(s.pos())) {
            if (n instanceof Node.Bad) {
                return null;
            }
            problems.add(n.pos(), "plan must be a block of rows written after 'plan: |'",
                    "write 'plan: |' and then the rows on the following lines, indented by two spaces");
            return null;
        }
        String[] split = s.text().split("\n", -1);
        int count = split.length;
        while (count > 0 && split[count - 1].isEmpty()) {
            count--;
        }
        if (count == 0) {
            problems.add(n.pos(), "the plan has no rows", "write the rows on the lines after 'plan: |'");
            return null;
        }
        if (count > MapLoader.MAX_SIDE) {
            problems.add(n.pos(), "the plan has " + count + " rows; at most " + MapLoader.MAX_SIDE + " are allowed",
                    "use a coarser cell size");
            return null;
        }
        List<String> rows = Arrays.asList(split).subList(0, count);
        int[] rowLine = new int[count];
        int[] rowColumn = new int[count];
        for (int i = 0; i < count; i++) {
            // A literal block keeps its lines one for one: row i is on the i-th line after the '|'.
            int line = s.pos().line() + 1 + i;
            String fileLine = doc.source().line(line);
            String row = rows.get(i);
            rowLine[i] = line;
            int lead = fileLine.length() - row.length();
            if (lead >= 0 && fileLine.endsWith(row) && fileLine.substring(0, lead).isBlank()) {
                rowColumn[i] = fileLine.codePointCount(0, lead) + 1;
            }
        }
        int ref = 0; // the first row that is not empty sets the width
        while (rows.get(ref).isEmpty()) {
            ref++;
        }
        int width = rows.get(ref).codePointCount(0, rows.get(ref).length());
        if (width > MapLoader.MAX_SIDE) {
            problems.add(at(rowLine, rowColumn, ref, 0, n.pos()), "plan rows are " + width + " cells wide; at most "
                    + MapLoader.MAX_SIDE + " are allowed", "use a coarser cell size");
            return null;
        }
        PlanGrid g = new PlanGrid(rows, width, rowLine, rowColumn, legend);
        g.incomplete = legend == null;
        Map<Integer, Integer> seen = new HashMap<>();
        boolean anyFree = false;
        for (int y = 0; y < count; y++) {
            String row = rows.get(y);
            if (row.isEmpty()) {
                problems.add(new Pos(rowLine[y], 1), "plan row " + y + " is empty",
                        "remove the blank line inside the plan, or fill the row with wall characters");
                g.incomplete = true;
                continue;
            }
            int x = 0;
            for (int i = 0; i < row.length(); ) {
                int cp = row.codePointAt(i);
                Terrain known = cp <= 0xFFFF ? g.table[cp] : null;
                if (x < width && (known != null || legend == null)) {
                    // the common case: a known character inside the width; no objects made
                    anyFree |= known != null && known.free();
                    i += Character.charCount(cp);
                    x++;
                    continue;
                }
                Pos p = at(rowLine, rowColumn, y, x, n.pos());
                if (x == width) {
                    problems.add(p, "plan row " + y + " is " + row.codePointCount(0, row.length()) + " cells wide, but row "
                            + ref + " is " + width, "all rows must be equally wide; fill with wall characters"
                            + (row.endsWith(" ") ? " (this row ends in spaces)" : ""));
                    g.incomplete = true;
                }
                if (legend != null && known == null) {
                    g.incomplete = true;
                    int times = seen.merge(cp, 1, Integer::sum);
                    if (times <= SHOWN_PER_CHAR) {
                        problems.add(p, unknownChar(cp), unknownCharHint(cp));
                    } else if (times == SHOWN_PER_CHAR + 1) {
                        int more = countFrom(rows, y, i, cp);
                        problems.add(p, "character " + quote(cp) + " is not in the legend (here and " + (more - 1)
                                + " more time" + (more == 2 ? "" : "s") + " below)", unknownCharHint(cp));
                    }
                } else if (known != null && known.free()) {
                    anyFree = true;
                }
                i += Character.charCount(cp);
                x++;
            }
            if (x < width) {
                problems.add(at(rowLine, rowColumn, y, x, n.pos()), "plan row " + y + " is " + x
                        + " cells wide, but row " + ref + " is " + width, "all rows must be equally wide; fill with wall characters");
                g.incomplete = true;
            }
        }
        if (legend != null && !anyFree && !g.incomplete) {
            problems.add(n.pos(), "the plan has no free cell: every character is a wall",
                    "mark the floor with a legend symbol that is not a wall, e.g. \".\": tile");
        }
        return g;
    }

    private boolean isLiteralBlock(Pos p) {
        return DocumentReading.writtenWith(doc, p, '|');
    }

    private static int countFrom(List<String> rows, int y0, int i0, int cp) {
        int n = 0;
        for (int y = y0; y < rows.size(); y++) {
            String r = rows.get(y);
            for (int i = y == y0 ? i0 : 0; i < r.length(); ) {
                int c = r.codePointAt(i);
                if (c == cp) {
                    n++;
                }
                i += Character.charCount(c);
            }
        }
        return n;
    }

    private static Pos at(int[] rowLine, int[] rowColumn, int y, int x, Pos fallback) {
        if (rowColumn[y] == 0) {
            return new Pos(rowLine[y], 1);
        }
        return new Pos(rowLine[y], rowColumn[y] + x);
    }

    private String unknownChar(int cp) {
        if (cp == ' ') {
            return "a space in the plan";
        }
        return "character " + quote(cp) + " is not in the legend";
    }

    private String unknownCharHint(int cp) {
        if (cp == ' ') {
            return "every cell needs a legend character, e.g. '#' for a wall";
        }
        if (cp <= 0xFFFF && YAML_INDICATORS.indexOf(cp) >= 0) {
            return "add it to the legend, in quotes (YAML needs them for this character), e.g. \""
                    + (char) cp + "\": wall";
        }
        return "add it to the legend, or use one of: " + legendChars();
    }

    private String legendChars() {
        StringBuilder sb = new StringBuilder();
        legend.keySet().stream().sorted().forEach(c -> sb.append(sb.length() == 0 ? "" : " ").append(c));
        return sb.toString();
    }

    private static String quote(int cp) {
        if (Character.isISOControl(cp) || cp == 0xFFFD || !Character.isDefined(cp)) {
            return String.format("U+%04X", cp);
        }
        return "'" + new String(Character.toChars(cp)) + "'";
    }
}
