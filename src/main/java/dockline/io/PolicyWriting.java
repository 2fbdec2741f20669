package dockline.io;

import static dockline.io.PolicyFiles.CLOSED;
import static dockline.io.PolicyFiles.CSV_CLOSED_HEADER;
import static dockline.io.PolicyFiles.CSV_HEADER;
import static dockline.io.PolicyFiles.CSV_SCORE_CLOSED_HEADER;
import static dockline.io.PolicyFiles.CSV_SCORE_HEADER;
import static dockline.io.PolicyFiles.CSV_STEP_CLOSED_HEADER;
import static dockline.io.PolicyFiles.CSV_STEP_HEADER;
import static dockline.io.PolicyFiles.FORMAT;
import static dockline.io.PolicyFiles.SCORE_KEYS;
import static dockline.io.PolicyFiles.VERSION_THRESHOLDS;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.io.PolicyFiles.Header;
import dockline.io.PolicyFiles.Rounds;
import dockline.io.PolicyFiles.ScoreTerms;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.ThresholdPolicy;
import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes the two policy file formats of missions/POLICY-FORMAT.md. Both formats carry the same
 * fields under the same keys, so each file is first put into ordered key-value pairs (the header's,
 * then each row's) and then written once as JSON and once as CSV: JSON gets a header object with one
 * compact row object per line, CSV {@code # key: value} comment lines, a header row and one line per
 * row. Linear in the number of rows.
 */
final class PolicyWriting {

    private PolicyWriting() {
    }

    /** Writes a policy of rows as CSV or JSON. */
    static void write(Writer w, boolean csv, Header h, Policy policy) throws IOException {
        requireMatch(h, policy);
        List<Map<String, Object>> rows = new ArrayList<>();
        for (PolicyEntry e : policy.entries()) {
            rows.add(row(e));
        }
        Map<String, Object> header = header(h, h.version(), true);
        if (!csv) {
            json(w, header, "rows", rows);
            return;
        }
        boolean scored = h.score().isPresent();
        boolean closed = policy.entries().stream().anyMatch(e -> !e.closures().isEmpty());
        csv(w, header, scored ? closed ? CSV_SCORE_CLOSED_HEADER : CSV_SCORE_HEADER : closed ? CSV_CLOSED_HEADER : CSV_HEADER,
                rows);
    }

    /** Writes a threshold policy as CSV or JSON (format version {@value PolicyFiles#VERSION_THRESHOLDS}). */
    static void write(Writer w, boolean csv, Header h, ThresholdPolicy policy) throws IOException {
        Map<String, Object> header = header(h, VERSION_THRESHOLDS, false);
        if (!csv) {
            json(w, header, "thresholds", steps(policy));
            return;
        }
        boolean closed = policy.rows().stream().anyMatch(r -> !r.closures().isEmpty());
        csv(w, header, closed ? CSV_STEP_CLOSED_HEADER : CSV_STEP_HEADER, steps(policy));
    }

    /** A header with score terms goes with rows with a score memory, and only with them. */
    static void requireMatch(Header h, Policy policy) {
        if (policy.size() > 0 && policy.scored() != h.score().isPresent()) {
            throw new IllegalArgumentException(h.score().isPresent()
                    ? "a header with a discounted objective needs rows with a score memory"
                    : "rows with a score memory need a header with the discounted objective");
        }
    }

    // ------------------------------------------------------------------ the fields

    /**
     * The header's fields in the order they are written: format, version, mission, unit, floor,
     * capacity, budget, tasks (a list), then, with {@code terms}, the discounted objective and the goal
     * beyond one trip when the header has them.
     */
    private static Map<String, Object> header(Header h, int version, boolean terms) {
        Map<String, Object> f = new LinkedHashMap<>();
        f.put("format", FORMAT);
        f.put("version", version);
        f.put("mission", h.mission());
        f.put("unitWh", h.unitWh().stripTrailingZeros().toPlainString());
        f.put("reserveUnits", h.floorUnits());
        f.put("capacityUnits", h.capacityUnits());
        f.put("budget", h.budget());
        f.put("tasks", h.tasks());
        if (terms && h.score().isPresent()) {
            ScoreTerms t = h.score().get();
            // the keys the reader checks, in their order
            Object[] v = {"discounted", t.discount(), t.threshold().toString(), t.relation().symbol(), t.weightBound(),
                    t.reserveKept()};
            for (int i = 0; i < v.length; i++) {
                f.put(SCORE_KEYS.get(i), v[i]);
            }
        }
        if (terms && h.rounds().isPresent()) {
            Rounds r = h.rounds().get();
            f.put("goal", r.goal());
            if (r.patrol()) {
                f.put("budgetPer", r.budgetPerLap() ? "lap" : "mission");
            } else {
                f.put("deadlineTicks", r.deadlineTicks());
            }
        }
        return f;
    }

    /** A row's fields; the score only with a score memory, the closures only when there are some. */
    private static Map<String, Object> row(PolicyEntry e) {
        Map<String, Object> f = new LinkedHashMap<>();
        f.put("cell", e.cell().toString());
        f.put("levelUnits", e.level());
        f.put("budgetLeft", e.budgetLeft());
        f.put("progress", e.progress());
        if (e.scored()) {
            f.put("score", e.score().text());
        }
        action(f, e.action(), e.closures());
        return f;
    }

    /** The fields of every threshold, position by position, each position's thresholds falling. */
    private static List<Map<String, Object>> steps(ThresholdPolicy policy) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (ThresholdPolicy.Row r : policy.rows()) {
            for (ThresholdPolicy.Step st : r.steps()) {
                Map<String, Object> f = new LinkedHashMap<>();
                f.put("cell", r.cell().toString());
                f.put("budgetLeft", r.budgetLeft());
                f.put("progress", r.progress());
                f.put("atLeastUnits", st.atLeastUnits());
                action(f, st.action(), r.closures());
                out.add(f);
            }
        }
        return out;
    }

    /** The action, its target for a move, and the closures when there are some. */
    private static void action(Map<String, Object> f, Action a, String closures) {
        f.put("action", a.kind().word());
        if (a.kind() == ActionKind.MOVE) {
            f.put("to", a.target().toString());
        }
        if (!closures.isEmpty()) {
            f.put(CLOSED, closures);
        }
    }

    // ------------------------------------------------------------------ the two formats

    /** The header object, then the rows under {@code rowsKey}, one compact object per line. */
    private static void json(Writer w, Map<String, Object> header, String rowsKey, List<Map<String, Object>> rows)
            throws IOException {
        JsonFactory f = new JsonFactory();
        try (JsonGenerator g = f.createGenerator(w)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
            pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE);
            g.setPrettyPrinter(pp);
            g.writeStartObject();
            fields(g, header);
            g.writeArrayFieldStart(rowsKey);
            for (Map<String, Object> r : rows) {
                // one row per line: written compactly, placed raw by the pretty printer
                StringWriter sw = new StringWriter();
                try (JsonGenerator rg = f.createGenerator(sw)) {
                    rg.writeStartObject();
                    fields(rg, r);
                    rg.writeEndObject();
                }
                g.writeRawValue(sw.toString());
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        w.write(System.lineSeparator());
    }

    /** Numbers and booleans as JSON numbers and booleans, a list as an array of strings, the rest as strings. */
    private static void fields(JsonGenerator g, Map<String, Object> fields) throws IOException {
        for (Map.Entry<String, Object> e : fields.entrySet()) {
            g.writeFieldName(e.getKey());
            Object v = e.getValue();
            if (v instanceof Integer i) {
                g.writeNumber(i);
            } else if (v instanceof Boolean b) {
                g.writeBoolean(b);
            } else if (v instanceof List<?> list) {
                g.writeStartArray();
                for (Object item : list) {
                    g.writeString(item.toString());
                }
                g.writeEndArray();
            } else {
                g.writeString(v.toString());
            }
        }
    }

    /**
     * The first line {@code # dockline-policy <version>}, a {@code # key: value} line per other header
     * field (a list space-separated; the mission's name on one line), the header row, then per row its values in the header row's
     * columns (empty where a row has none). The closures are the last column: they may hold commas, the
     * reader takes the rest of the line.
     */
    private static void csv(Writer w, Map<String, Object> header, String headerRow, List<Map<String, Object>> rows)
            throws IOException {
        String nl = "\n";
        w.write("# " + FORMAT + " " + header.get("version") + nl);
        for (Map.Entry<String, Object> e : header.entrySet()) {
            if (!e.getKey().equals("format") && !e.getKey().equals("version")) {
                Object v = e.getValue();
                String text = v instanceof List<?> list ? String.join(" ", list.stream().map(Object::toString).toList())
                        : v.toString();
                w.write("# " + e.getKey() + ": " + (e.getKey().equals("mission") ? oneLine(text) : text) + nl);
            }
        }
        w.write(headerRow + nl);
        String[] columns = headerRow.split(",");
        StringBuilder sb = new StringBuilder();
        for (Map<String, Object> r : rows) {
            sb.setLength(0);
            for (int c = 0; c < columns.length; c++) {
                Object v = r.get(columns[c]);
                String text = v == null ? "" : v.toString();
                sb.append(c == 0 ? "" : ",").append(columns[c].equals(CLOSED) ? oneLine(text) : text);
            }
            w.write(sb.append(nl).toString());
        }
    }

    /** A value on one line: line breaks become spaces. */
    private static String oneLine(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }
}
