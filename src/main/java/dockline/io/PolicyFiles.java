package dockline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.solve.Policy;
import dockline.solve.PolicyEntry;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads and writes exported robot policies in dockline's own plain formats, JSON or CSV chosen by
 * the file name's extension; both are documented in missions/POLICY-FORMAT.md. One row per
 * situation the robot can meet while following the policy: cell, battery level (units), budget
 * left, task progress (bit mask over the mission's visit list) and the action.
 *
 * <p>Writing is atomic ({@link AtomicFiles}). Reading checks the format (not whether the policy is
 * any good: that is the certificate checker's job) and reports every problem at once as
 * {@code file:line:column: message}.
 */
public final class PolicyFiles {

    /** The value of the {@code format} key (JSON) / the first comment line (CSV). */
    public static final String FORMAT = "dockline-policy";
    public static final int VERSION = 1;

    /**
     * What the rows are about, so a reader can tell whether a policy fits a mission.
     *
     * @param mission       mission name
     * @param unitWh        size of one energy unit in Wh (levels are in these units)
     * @param floorUnits    reserve floor the policy was computed for
     * @param capacityUnits battery capacity
     * @param budget        disturbance budget K
     * @param tasks         the visit list; bit i of a row's progress is task i
     */
    public record Header(String mission, BigDecimal unitWh, int floorUnits, int capacityUnits, int budget,
                         List<String> tasks) {
        public Header {
            tasks = List.copyOf(tasks);
        }

        /** The header for a policy computed for this mission (its reserve floor and budget). */
        public static Header of(Mission m) {
            return new Header(m.name(), m.scale().unitWh(), m.reserveUnits(), m.capacityUnits(),
                    m.map().disturbances().budget(), m.tasks().visit());
        }
    }

    /** A policy file's content. */
    public record Document(Header header, Policy policy) {
    }

    private static final List<String> TOP_KEYS = List.of("format", "version", "mission", "unit-wh", "floor-units",
            "capacity-units", "budget", "tasks", "rows");
    private static final List<String> ROW_KEYS = List.of("cell", "level", "budget-left", "progress", "action", "to");
    private static final String CSV_HEADER = String.join(",", ROW_KEYS);
    private static final Pattern CELL = Pattern.compile("(\\d{1,6}):(\\d{1,6})");

    private PolicyFiles() {
    }

    /** Whether the file name asks for CSV ({@code .csv}, any case); anything else is JSON. */
    public static boolean isCsv(Path file) {
        return file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv");
    }

    /** Writes the policy atomically, as CSV for a {@code .csv} name, else as JSON. */
    public static void write(Path file, Header header, Policy policy) throws IOException {
        AtomicFiles.write(file, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            if (isCsv(file)) {
                writeCsv(w, header, policy);
            } else {
                writeJson(w, header, policy);
            }
            w.flush();
        });
    }

    private static void writeJson(Writer w, Header h, Policy policy) throws IOException {
        JsonFactory f = new JsonFactory();
        try (JsonGenerator g = f.createGenerator(w)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
            pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE);
            g.setPrettyPrinter(pp);
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeStringField("mission", h.mission());
            g.writeStringField("unit-wh", h.unitWh().stripTrailingZeros().toPlainString());
            g.writeNumberField("floor-units", h.floorUnits());
            g.writeNumberField("capacity-units", h.capacityUnits());
            g.writeNumberField("budget", h.budget());
            g.writeArrayFieldStart("tasks");
            for (String t : h.tasks()) {
                g.writeString(t);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("rows");
            for (PolicyEntry e : policy.entries()) {
                // one row per line: written compactly, placed raw by the pretty printer
                g.writeRawValue(compactRow(f, e));
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        w.write(System.lineSeparator());
    }

    private static String compactRow(JsonFactory f, PolicyEntry e) throws IOException {
        java.io.StringWriter sw = new java.io.StringWriter();
        try (JsonGenerator g = f.createGenerator(sw)) {
            g.writeStartObject();
            g.writeStringField("cell", e.cell().toString());
            g.writeNumberField("level", e.level());
            g.writeNumberField("budget-left", e.budgetLeft());
            g.writeNumberField("progress", e.progress());
            g.writeStringField("action", e.action().kind().word());
            if (e.action().kind() == ActionKind.MOVE) {
                g.writeStringField("to", e.action().target().toString());
            }
            g.writeEndObject();
        }
        return sw.toString();
    }

    private static void writeCsv(Writer w, Header h, Policy policy) throws IOException {
        String nl = "\n";
        w.write("# " + FORMAT + " " + VERSION + nl);
        w.write("# mission: " + h.mission().replace('\n', ' ').replace('\r', ' ') + nl);
        w.write("# unit-wh: " + h.unitWh().stripTrailingZeros().toPlainString() + nl);
        w.write("# floor-units: " + h.floorUnits() + nl);
        w.write("# capacity-units: " + h.capacityUnits() + nl);
        w.write("# budget: " + h.budget() + nl);
        w.write("# tasks: " + String.join(" ", h.tasks()) + nl);
        w.write(CSV_HEADER + nl);
        StringBuilder sb = new StringBuilder();
        for (PolicyEntry e : policy.entries()) {
            sb.setLength(0);
            sb.append(e.cell()).append(',').append(e.level()).append(',').append(e.budgetLeft()).append(',')
                    .append(e.progress()).append(',').append(e.action().kind().word()).append(',');
            if (e.action().kind() == ActionKind.MOVE) {
                sb.append(e.action().target());
            }
            w.write(sb.append(nl).toString());
        }
    }

    // ------------------------------------------------------------------ reading

    /**
     * Reads a policy file (CSV for a {@code .csv} name, else JSON).
     *
     * @throws InputException with every problem found (unreadable file, bad syntax, missing or
     *                        unknown keys, bad values, two rows for one situation)
     */
    public static Document read(Path file) throws InputException {
        Problems problems = new Problems(file);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(new Problem(file, 1, 1, "no such file", "check the path"));
        } catch (IOException e) {
            throw new InputException(new Problem(file, 1, 1, "cannot read the file: " + e.getMessage()));
        }
        Document d = isCsv(file) ? new CsvReading(problems, bytes).read() : new JsonReading(problems, bytes).read();
        problems.throwIfAny();
        return d;
    }

    /** Collects rows, checks each, and builds the policy (reporting duplicates at their row). */
    private static final class Rows {
        final Problems problems;
        final List<PolicyEntry> entries = new ArrayList<>();
        final Set<String> seen = new HashSet<>();

        Rows(Problems problems) {
            this.problems = problems;
        }

        void add(Pos pos, PolicyEntry e) {
            String key = e.cell() + "/" + e.level() + "/" + e.budgetLeft() + "/" + e.progress();
            if (!seen.add(key)) {
                problems.add(pos, "a second row for cell " + e.cell() + ", level " + e.level() + ", budget left "
                        + e.budgetLeft() + ", progress " + e.progress(), "keep one action per situation");
                return;
            }
            entries.add(e);
        }

        Policy policy() {
            return new Policy(entries);
        }
    }

    private static Cell cell(String text) {
        Matcher m = CELL.matcher(text.trim());
        return m.matches() ? new Cell(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))) : null;
    }

    private static String actionWords() {
        List<String> w = new ArrayList<>();
        for (ActionKind k : ActionKind.values()) {
            w.add(k.word());
        }
        return String.join(", ", w);
    }

    /** Checks the fields of one row; reports problems at the given positions; null when bad. */
    private static PolicyEntry row(Problems p, Pos rowPos, Map<String, String> values, Map<String, Pos> at) {
        boolean ok = true;
        for (String k : List.of("cell", "level", "budget-left", "progress", "action")) {
            if (!values.containsKey(k)) {
                p.add(rowPos, "row has no '" + k + "'");
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
        int level = nonNegative(p, values, at, "level");
        int budget = nonNegative(p, values, at, "budget-left");
        int progress = nonNegative(p, values, at, "progress");
        ok &= level >= 0 && budget >= 0 && progress >= 0;
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
                p.add(at.getOrDefault("to", rowPos), "a move needs 'to', the cell it goes to");
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
        return ok ? new PolicyEntry(c, level, budget, progress, new Action(kind, target)) : null;
    }

    private static int nonNegative(Problems p, Map<String, String> values, Map<String, Pos> at, String key) {
        String v = values.get(key).trim();
        if (!v.matches("\\d{1,9}")) {
            p.add(at.get(key), "'" + key + "' must be a whole number of at least 0, not '" + Loading.shorten(v) + "'");
            return -1;
        }
        return Integer.parseInt(v);
    }

    private static Header header(Problems p, Pos pos, Map<String, String> values, Map<String, Pos> at,
                                 List<String> tasks) {
        for (String k : List.of("mission", "unit-wh", "floor-units", "capacity-units", "budget")) {
            if (!values.containsKey(k)) {
                p.add(pos, "no '" + k + "' in the policy file");
                return null;
            }
        }
        BigDecimal unit;
        try {
            unit = Quantities.parseDecimal(values.get("unit-wh"));
            if (unit.signum() <= 0) {
                p.add(at.get("unit-wh"), "'unit-wh' must be positive");
                return null;
            }
        } catch (IllegalArgumentException e) {
            p.add(at.get("unit-wh"), e.getMessage());
            return null;
        }
        int floor = nonNegative(p, values, at, "floor-units");
        int cap = nonNegative(p, values, at, "capacity-units");
        int budget = nonNegative(p, values, at, "budget");
        if (floor < 0 || cap < 0 || budget < 0) {
            return null;
        }
        return new Header(values.get("mission"), unit, floor, cap, budget, tasks);
    }

    /** JSON through Jackson's streaming parser, so every value keeps its line and column. */
    private static final class JsonReading {
        private final Problems p;
        private final byte[] bytes;

        JsonReading(Problems p, byte[] bytes) {
            this.p = p;
            this.bytes = bytes;
        }

        private static Pos pos(JsonLocation l) {
            return new Pos(l.getLineNr(), l.getColumnNr());
        }

        Document read() {
            JsonFactory f = new JsonFactory();
            try (JsonParser j = f.createParser(bytes)) {
                if (j.nextToken() != JsonToken.START_OBJECT) {
                    p.add(pos(j.currentTokenLocation()), "a policy file in JSON is one object", "see missions/POLICY-FORMAT.md");
                    return null;
                }
                Map<String, String> values = new LinkedHashMap<>();
                Map<String, Pos> at = new LinkedHashMap<>();
                List<String> tasks = new ArrayList<>();
                Rows rows = new Rows(p);
                boolean sawRows = false;
                Pos top = pos(j.currentTokenLocation());
                while (j.nextToken() == JsonToken.FIELD_NAME) {
                    String key = j.currentName();
                    Pos kp = pos(j.currentTokenLocation());
                    JsonToken t = j.nextToken();
                    Pos vp = pos(j.currentTokenLocation());
                    if (!TOP_KEYS.contains(key)) {
                        String near = Spelling.closest(key, TOP_KEYS);
                        p.add(kp, "unknown key '" + Loading.shorten(key) + "'", near != null ? "did you mean '" + near + "'?" : null);
                        j.skipChildren();
                        continue;
                    }
                    switch (key) {
                        case "tasks" -> {
                            if (t != JsonToken.START_ARRAY) {
                                p.add(vp, "'tasks' must be a list of zone names");
                                j.skipChildren();
                                continue;
                            }
                            while (j.nextToken() != JsonToken.END_ARRAY) {
                                if (j.currentToken() != JsonToken.VALUE_STRING) {
                                    p.add(pos(j.currentTokenLocation()), "a task is a zone name in quotes");
                                    j.skipChildren();
                                } else {
                                    tasks.add(j.getText());
                                }
                            }
                        }
                        case "rows" -> {
                            sawRows = true;
                            if (t != JsonToken.START_ARRAY) {
                                p.add(vp, "'rows' must be a list of rows");
                                j.skipChildren();
                                continue;
                            }
                            while (j.nextToken() != JsonToken.END_ARRAY) {
                                readRow(j, rows);
                            }
                        }
                        default -> {
                            if (!t.isScalarValue()) {
                                p.add(vp, "'" + key + "' must be a single value");
                                j.skipChildren();
                                continue;
                            }
                            values.put(key, j.getText());
                            at.put(key, vp);
                        }
                    }
                }
                if (!FORMAT.equals(values.get("format"))) {
                    p.add(at.getOrDefault("format", top), "not a dockline policy: 'format' must be \"" + FORMAT + "\"");
                }
                if (values.containsKey("version") && !String.valueOf(VERSION).equals(values.get("version"))) {
                    p.add(at.get("version"), "policy format version " + Loading.shorten(values.get("version"))
                            + " is not known (this dockline reads version " + VERSION + ")");
                }
                if (!sawRows) {
                    p.add(top, "no 'rows' in the policy file");
                }
                Header h = header(p, top, values, at, tasks);
                return h == null || p.any() ? null : new Document(h, rows.policy());
            } catch (JsonParseException e) {
                p.add(pos(e.getLocation()), "not valid JSON: " + e.getOriginalMessage());
                return null;
            } catch (IOException e) {
                p.add(Pos.START, "cannot read the file: " + e.getMessage());
                return null;
            }
        }

        private void readRow(JsonParser j, Rows rows) throws IOException {
            Pos rp = pos(j.currentTokenLocation());
            if (j.currentToken() != JsonToken.START_OBJECT) {
                p.add(rp, "a row is an object with " + String.join(", ", ROW_KEYS));
                j.skipChildren();
                return;
            }
            Map<String, String> values = new LinkedHashMap<>();
            Map<String, Pos> at = new LinkedHashMap<>();
            boolean bad = false;
            while (j.nextToken() == JsonToken.FIELD_NAME) {
                String key = j.currentName();
                Pos kp = pos(j.currentTokenLocation());
                JsonToken t = j.nextToken();
                Pos vp = pos(j.currentTokenLocation());
                if (!ROW_KEYS.contains(key)) {
                    String near = Spelling.closest(key, ROW_KEYS);
                    p.add(kp, "unknown key '" + Loading.shorten(key) + "' in a row", near != null ? "did you mean '" + near + "'?" : null);
                    j.skipChildren();
                    bad = true;
                    continue;
                }
                if (!t.isScalarValue()) {
                    p.add(vp, "'" + key + "' must be a single value");
                    j.skipChildren();
                    bad = true;
                    continue;
                }
                values.put(key, j.getText());
                at.put(key, vp);
            }
            PolicyEntry e = row(p, rp, values, at);
            if (e != null && !bad) {
                rows.add(rp, e);
            }
        }
    }

    /** CSV: {@code #} comment lines with the header, then a header row, then one row per line. */
    private static final class CsvReading {
        private final Problems p;
        private final byte[] bytes;

        CsvReading(Problems p, byte[] bytes) {
            this.p = p;
            this.bytes = bytes;
        }

        Document read() {
            String text = new String(bytes, StandardCharsets.UTF_8);
            String[] lines = text.split("\r?\n", -1);
            Map<String, String> values = new LinkedHashMap<>();
            Map<String, Pos> at = new LinkedHashMap<>();
            List<String> tasks = new ArrayList<>();
            Rows rows = new Rows(p);
            boolean headerRow = false;
            boolean formatLine = false;
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i];
                int ln = i + 1;
                if (line.isBlank()) {
                    continue;
                }
                if (line.startsWith("#")) {
                    String c = line.substring(1).trim();
                    if (!formatLine && !headerRow) {
                        formatLine = true;
                        if (!c.equals(FORMAT + " " + VERSION)) {
                            p.add(new Pos(ln, 1), "not a dockline policy: the first line must be '# " + FORMAT + " "
                                    + VERSION + "'");
                        }
                        continue;
                    }
                    int colon = c.indexOf(':');
                    if (colon < 0) {
                        continue; // a plain comment
                    }
                    String key = c.substring(0, colon).trim();
                    String value = c.substring(colon + 1).trim();
                    int col = line.indexOf(':') + 2;
                    if (!TOP_KEYS.contains(key)) {
                        String near = Spelling.closest(key, TOP_KEYS);
                        p.add(new Pos(ln, line.indexOf(key) + 1), "unknown key '" + Loading.shorten(key) + "'",
                                near != null ? "did you mean '" + near + "'?" : null);
                        continue;
                    }
                    if (key.equals("tasks")) {
                        for (String t : value.split("\\s+")) {
                            if (!t.isEmpty()) {
                                tasks.add(t);
                            }
                        }
                    } else {
                        values.put(key, value);
                        at.put(key, new Pos(ln, col));
                    }
                    continue;
                }
                if (!headerRow) {
                    headerRow = true;
                    if (!line.trim().equals(CSV_HEADER)) {
                        p.add(new Pos(ln, 1), "the header row must be '" + CSV_HEADER + "'");
                        return null;
                    }
                    continue;
                }
                readRow(line, ln, rows);
            }
            if (!formatLine) {
                p.add(Pos.START, "not a dockline policy: the first line must be '# " + FORMAT + " " + VERSION + "'");
            }
            if (!headerRow) {
                p.add(new Pos(lines.length, 1), "no header row '" + CSV_HEADER + "'");
            }
            Header h = header(p, Pos.START, values, at, tasks);
            return h == null || p.any() ? null : new Document(h, rows.policy());
        }

        private void readRow(String line, int ln, Rows rows) {
            Map<String, String> values = new LinkedHashMap<>();
            Map<String, Pos> at = new LinkedHashMap<>();
            int field = 0;
            int start = 0;
            for (int i = 0; i <= line.length(); i++) {
                if (i == line.length() || line.charAt(i) == ',') {
                    if (field < ROW_KEYS.size()) {
                        String v = line.substring(start, i);
                        if (!(field == ROW_KEYS.size() - 1 && v.isBlank())) {
                            values.put(ROW_KEYS.get(field), v);
                        }
                        at.put(ROW_KEYS.get(field), new Pos(ln, start + 1));
                    }
                    field++;
                    start = i + 1;
                }
            }
            if (field != ROW_KEYS.size()) {
                p.add(new Pos(ln, 1), "a row has " + ROW_KEYS.size() + " fields (" + CSV_HEADER + "), this one has " + field);
                return;
            }
            PolicyEntry e = row(p, new Pos(ln, 1), values, at);
            if (e != null) {
                rows.add(new Pos(ln, 1), e);
            }
        }
    }
}
