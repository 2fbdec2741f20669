package dockline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.ThresholdPolicy;
import dockline.policy.PolicyScore;
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
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads and writes exported robot policies in dockline's own plain formats, JSON or CSV chosen by
 * the file name's extension; both are documented in missions/POLICY-FORMAT.md. One row per
 * situation the robot can meet while following the policy: cell, battery level (units), budget
 * left, task progress (bit mask over the mission's visit list), for a discounted mission the score
 * memory ({@link PolicyScore}), and the action. Policies are written as format version 3, whose keys
 * are those of the output vocabulary (DEVELOPERS.md); a policy with a score memory has the objective
 * in the header and a {@code score} per row. Versions 1 (reserve) and 2 (score memory), with their
 * earlier key names, are still read: their keys are renamed on the way in.
 *
 * <p>Writing is atomic ({@link AtomicFiles}). Reading checks the format (not whether the policy is
 * any good: that is the certificate checker's job) and reports every problem at once as
 * {@code file:line:column: message}.
 */
public final class PolicyFiles {

    /** The value of the {@code format} key (JSON) / the first comment line (CSV). */
    public static final String FORMAT = "dockline-policy";
    /**
     * The format version written: the keys of the output vocabulary (DEVELOPERS.md), with or without a
     * score memory.
     */
    public static final int VERSION = 3;
    /** The first format version, reserve policies, with the earlier key names (still read). */
    public static final int VERSION_1 = 1;
    /** The second format version, policies with a score memory, with the earlier key names (still read). */
    public static final int VERSION_WITH_SCORE = 2;
    /** The version that added the threshold form (level thresholds per game position). */
    public static final int VERSION_THRESHOLDS = 4;

    /**
     * The key names of versions 1 and 2 and their names since version 3; files of the earlier
     * versions are read by renaming their keys on the way in.
     */
    static final Map<String, String> OLD_KEYS = Map.of("unit-wh", "unitWh", "floor-units", "reserveUnits",
            "capacity-units", "capacityUnits", "weight-bound", "weightBoundUnits", "reserve-kept", "reserveKept",
            "level", "levelUnits", "budget-left", "budgetLeft");

    /** The name of a key since version 3 (keys of versions 1 and 2 renamed, others unchanged). */
    static String canonical(String key) {
        return OLD_KEYS.getOrDefault(key, key);
    }

    /**
     * The discounted objective a policy with a score memory was computed for: what a robot needs to
     * keep its memory (the gap, and when it is {@code secured}).
     *
     * @param discount    discount factor d
     * @param threshold   threshold v
     * @param relation    {@code >=} or {@code >}
     * @param weightBound mu, the largest energy change of a step in units; the gap is secured beyond mu/(d-1)
     * @param reserveKept whether the reserve floor of the header was kept as well
     */
    public record ScoreTerms(int discount, Rational threshold, Relation relation, int weightBound,
                             boolean reserveKept) {
        public Objective.Discounted objective() {
            return new Objective.Discounted(discount, threshold, relation);
        }
    }

    /**
     * The goal of a policy beyond one trip (missions/POLICY-FORMAT.md, "Patrols and deadlines"): for a
     * patrol the rows' {@code progress} is the lap's checkpoints visited so far and the budget may start
     * afresh on every lap; for a deadline the rows are those of a visit mission that docks in time.
     *
     * @param goal          {@code patrol} or {@code deadline}
     * @param budgetPerLap  (patrol) whether the disturbance budget starts afresh on every completed lap
     * @param deadlineTicks (deadline) the deadline in whole turns; -1 for a patrol
     */
    public record Rounds(String goal, boolean budgetPerLap, int deadlineTicks) {
        public static final String PATROL = "patrol";
        public static final String DEADLINE = "deadline";

        public Rounds {
            if (!goal.equals(PATROL) && !goal.equals(DEADLINE)) {
                throw new IllegalArgumentException("goal must be patrol or deadline");
            }
        }

        public boolean patrol() {
            return goal.equals(PATROL);
        }
    }

    /**
     * What the rows are about, so a reader can tell whether a policy fits a mission.
     *
     * @param mission       mission name
     * @param unitWh        size of one energy unit in Wh (levels are in these units)
     * @param floorUnits    reserve floor the policy was computed for
     * @param capacityUnits battery capacity
     * @param budget        disturbance budget K
     * @param tasks         the visit list (a patrol's checkpoints); bit i of a row's progress is task i
     * @param score         for a policy with a score memory: the discounted objective; empty for a reserve policy
     * @param rounds        for a patrol or a deadline mission: its goal; empty for a one-trip policy
     */
    public record Header(String mission, BigDecimal unitWh, int floorUnits, int capacityUnits, int budget,
                         List<String> tasks, Optional<ScoreTerms> score, Optional<Rounds> rounds) {
        public Header {
            tasks = List.copyOf(tasks);
            score = score == null ? Optional.empty() : score;
            rounds = rounds == null ? Optional.empty() : rounds;
        }

        /** The header of a one-trip policy, with or without a score memory. */
        public Header(String mission, BigDecimal unitWh, int floorUnits, int capacityUnits, int budget,
                      List<String> tasks, Optional<ScoreTerms> score) {
            this(mission, unitWh, floorUnits, capacityUnits, budget, tasks, score, Optional.empty());
        }

        /** The header of a reserve policy. */
        public Header(String mission, BigDecimal unitWh, int floorUnits, int capacityUnits, int budget,
                      List<String> tasks) {
            this(mission, unitWh, floorUnits, capacityUnits, budget, tasks, Optional.empty(), Optional.empty());
        }

        /** The header for a reserve policy computed for this mission (its reserve floor and budget). */
        public static Header of(Mission m) {
            return new Header(m.name(), m.scale().unitWh(), m.reserveUnits(), m.capacityUnits(),
                    m.map().disturbances().budget(), m.tasks().visit());
        }

        /**
         * The header for a patrol or deadline policy of this mission, certified at {@code floorUnits} (the
         * mission's floor: the safest policy keeps a higher one, but it is certified for the mission's).
         */
        public static Header ofRounds(Mission m) {
            if (m.tasks().patrols()) {
                return new Header(m.name(), m.scale().unitWh(), m.reserveUnits(), m.capacityUnits(),
                        m.map().disturbances().budget(), m.tasks().patrol(), Optional.empty(),
                        Optional.of(new Rounds(Rounds.PATROL, m.map().disturbances().budgetPerLap(), -1)));
            }
            return new Header(m.name(), m.scale().unitWh(), m.reserveUnits(), m.capacityUnits(),
                    m.map().disturbances().budget(), m.tasks().visit(), Optional.empty(),
                    Optional.of(new Rounds(Rounds.DEADLINE, false, m.timing().deadlineTicks())));
        }

        /** The header for a policy with a score memory computed for this mission and objective. */
        public static Header of(Mission m, Objective.Discounted o, int weightBound, boolean reserveKept) {
            return new Header(m.name(), m.scale().unitWh(), m.reserveUnits(), m.capacityUnits(),
                    m.map().disturbances().budget(), m.tasks().visit(), Optional.of(new ScoreTerms(o.discount(),
                    o.threshold(), o.relation(), weightBound, reserveKept)));
        }

        int version() {
            return VERSION;
        }
    }

    /**
     * A policy file's content: rows per situation, or level thresholds per game position.
     *
     * @param policy     the rows (a threshold file: empty rows)
     * @param thresholds the thresholds, null for a file of rows
     */
    public record Document(Header header, Policy policy, ThresholdPolicy thresholds) {
        public Document(Header header, Policy policy) {
            this(header, policy, null);
        }

        /** Whether the file holds the threshold form. */
        public boolean thresholdForm() {
            return thresholds != null;
        }
    }

    static final List<String> SCORE_KEYS = List.of("objective", "discount", "threshold", "relation",
            "weightBoundUnits", "reserveKept");
    static final List<String> TOP_KEYS = List.of("format", "version", "mission", "unitWh", "reserveUnits",
            "capacityUnits", "budget", "tasks", "objective", "discount", "threshold", "relation", "weightBoundUnits",
            "reserveKept", "goal", "budgetPer", "deadlineTicks", "rows", "thresholds");
    static final List<String> ROW_KEYS = List.of("cell", "levelUnits", "budgetLeft", "progress", "action",
            "to");
    static final List<String> SCORE_ROW_KEYS = List.of("cell", "levelUnits", "budgetLeft", "progress", "score",
            "action", "to");
    /** The situation's closures (lasting events and at-most counts); written only when some row has them. */
    static final String CLOSED = "closed";
    static final List<String> JSON_ROW_KEYS = List.of("cell", "levelUnits", "budgetLeft", "progress", "score",
            "action", "to", CLOSED);
    /** The keys of one threshold (one step of a position's list) in JSON. */
    static final List<String> JSON_STEP_KEYS = List.of("cell", "budgetLeft", "progress", "atLeastUnits", "action", "to",
            CLOSED);
    static final String CSV_STEP_HEADER = "cell,budgetLeft,progress,atLeastUnits,action,to";
    static final String CSV_STEP_CLOSED_HEADER = CSV_STEP_HEADER + "," + CLOSED;
    static final String CSV_HEADER = String.join(",", ROW_KEYS);
    static final String CSV_SCORE_HEADER = String.join(",", SCORE_ROW_KEYS);
    /** The header rows of versions 1 and 2. */
    static final String OLD_CSV_HEADER = "cell,level,budget-left,progress,action,to";
    static final String OLD_CSV_SCORE_HEADER = "cell,level,budget-left,progress,score,action,to";
    static final String CSV_CLOSED_HEADER = CSV_HEADER + "," + CLOSED;
    static final String CSV_SCORE_CLOSED_HEADER = CSV_SCORE_HEADER + "," + CLOSED;
    static final Pattern CELL = Pattern.compile("(\\d{1,6}):(\\d{1,6})");

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

    /**
     * Writes a threshold policy atomically (format version {@value #VERSION_THRESHOLDS}, the threshold form),
     * as CSV for a {@code .csv} name, else as JSON.
     *
     * @throws IllegalArgumentException if the header has a discounted objective (threshold policies are for the
     *                                  reserve floor)
     */
    public static void write(Path file, Header header, ThresholdPolicy policy) throws IOException {
        if (header.score().isPresent()) {
            throw new IllegalArgumentException("a threshold policy is for the reserve floor, not a discounted score");
        }
        AtomicFiles.write(file, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            if (isCsv(file)) {
                writeThresholdCsv(w, header, policy);
            } else {
                writeThresholdJson(w, header, policy);
            }
            w.flush();
        });
    }

    static void writeThresholdJson(Writer w, Header h, ThresholdPolicy policy) throws IOException {
        JsonFactory f = new JsonFactory();
        try (JsonGenerator g = f.createGenerator(w)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
            pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE);
            g.setPrettyPrinter(pp);
            g.writeStartObject();
            writeHeadline(g, h, VERSION_THRESHOLDS);
            g.writeArrayFieldStart("thresholds");
            for (ThresholdPolicy.Row r : policy.rows()) {
                for (ThresholdPolicy.Step st : r.steps()) {
                    g.writeRawValue(compactStep(f, r, st));
                }
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        w.write(System.lineSeparator());
    }

    static String compactStep(JsonFactory f, ThresholdPolicy.Row r, ThresholdPolicy.Step st) throws IOException {
        java.io.StringWriter sw = new java.io.StringWriter();
        try (JsonGenerator g = f.createGenerator(sw)) {
            g.writeStartObject();
            g.writeStringField("cell", r.cell().toString());
            g.writeNumberField("budgetLeft", r.budgetLeft());
            g.writeNumberField("progress", r.progress());
            g.writeNumberField("atLeastUnits", st.atLeastUnits());
            g.writeStringField("action", st.action().kind().word());
            if (st.action().kind() == ActionKind.MOVE) {
                g.writeStringField("to", st.action().target().toString());
            }
            if (!r.closures().isEmpty()) {
                g.writeStringField(CLOSED, r.closures());
            }
            g.writeEndObject();
        }
        return sw.toString();
    }

    static void writeThresholdCsv(Writer w, Header h, ThresholdPolicy policy) throws IOException {
        String nl = "\n";
        w.write("# " + FORMAT + " " + VERSION_THRESHOLDS + nl);
        w.write("# mission: " + h.mission().replace('\n', ' ').replace('\r', ' ') + nl);
        w.write("# unitWh: " + h.unitWh().stripTrailingZeros().toPlainString() + nl);
        w.write("# reserveUnits: " + h.floorUnits() + nl);
        w.write("# capacityUnits: " + h.capacityUnits() + nl);
        w.write("# budget: " + h.budget() + nl);
        w.write("# tasks: " + String.join(" ", h.tasks()) + nl);
        boolean closed = policy.rows().stream().anyMatch(r -> !r.closures().isEmpty());
        w.write((closed ? CSV_STEP_CLOSED_HEADER : CSV_STEP_HEADER) + nl);
        StringBuilder sb = new StringBuilder();
        for (ThresholdPolicy.Row r : policy.rows()) {
            for (ThresholdPolicy.Step st : r.steps()) {
                sb.setLength(0);
                sb.append(r.cell()).append(',').append(r.budgetLeft()).append(',').append(r.progress()).append(',')
                        .append(st.atLeastUnits()).append(',').append(st.action().kind().word()).append(',');
                if (st.action().kind() == ActionKind.MOVE) {
                    sb.append(st.action().target());
                }
                if (closed) {
                    sb.append(',').append(r.closures().replace('\n', ' ').replace('\r', ' '));
                }
                w.write(sb.append(nl).toString());
            }
        }
    }

    static void writeJson(Writer w, Header h, Policy policy) throws IOException {
        requireMatch(h, policy);
        JsonFactory f = new JsonFactory();
        try (JsonGenerator g = f.createGenerator(w)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
            pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE);
            g.setPrettyPrinter(pp);
            g.writeStartObject();
            writeHeadline(g, h, h.version());
            if (h.score().isPresent()) {
                ScoreTerms t = h.score().get();
                g.writeStringField("objective", "discounted");
                g.writeNumberField("discount", t.discount());
                g.writeStringField("threshold", t.threshold().toString());
                g.writeStringField("relation", t.relation().symbol());
                g.writeNumberField("weightBoundUnits", t.weightBound());
                g.writeBooleanField("reserveKept", t.reserveKept());
            }
            if (h.rounds().isPresent()) {
                Rounds r = h.rounds().get();
                g.writeStringField("goal", r.goal());
                if (r.patrol()) {
                    g.writeStringField("budgetPer", r.budgetPerLap() ? "lap" : "mission");
                } else {
                    g.writeNumberField("deadlineTicks", r.deadlineTicks());
                }
            }
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

    static String compactRow(JsonFactory f, PolicyEntry e) throws IOException {
        java.io.StringWriter sw = new java.io.StringWriter();
        try (JsonGenerator g = f.createGenerator(sw)) {
            g.writeStartObject();
            g.writeStringField("cell", e.cell().toString());
            g.writeNumberField("levelUnits", e.level());
            g.writeNumberField("budgetLeft", e.budgetLeft());
            g.writeNumberField("progress", e.progress());
            if (e.scored()) {
                g.writeStringField("score", e.score().text());
            }
            g.writeStringField("action", e.action().kind().word());
            if (e.action().kind() == ActionKind.MOVE) {
                g.writeStringField("to", e.action().target().toString());
            }
            if (!e.closures().isEmpty()) {
                g.writeStringField(CLOSED, e.closures());
            }
            g.writeEndObject();
        }
        return sw.toString();
    }

    /** A header with score terms goes with rows with a score memory, and only with them. */
    static void requireMatch(Header h, Policy policy) {
        if (policy.size() > 0 && policy.scored() != h.score().isPresent()) {
            throw new IllegalArgumentException(h.score().isPresent()
                    ? "a header with a discounted objective needs rows with a score memory"
                    : "rows with a score memory need a header with the discounted objective");
        }
    }

    static void writeCsv(Writer w, Header h, Policy policy) throws IOException {
        requireMatch(h, policy);
        String nl = "\n";
        w.write("# " + FORMAT + " " + h.version() + nl);
        w.write("# mission: " + h.mission().replace('\n', ' ').replace('\r', ' ') + nl);
        w.write("# unitWh: " + h.unitWh().stripTrailingZeros().toPlainString() + nl);
        w.write("# reserveUnits: " + h.floorUnits() + nl);
        w.write("# capacityUnits: " + h.capacityUnits() + nl);
        w.write("# budget: " + h.budget() + nl);
        w.write("# tasks: " + String.join(" ", h.tasks()) + nl);
        if (h.score().isPresent()) {
            ScoreTerms t = h.score().get();
            w.write("# objective: discounted" + nl);
            w.write("# discount: " + t.discount() + nl);
            w.write("# threshold: " + t.threshold() + nl);
            w.write("# relation: " + t.relation().symbol() + nl);
            w.write("# weightBoundUnits: " + t.weightBound() + nl);
            w.write("# reserveKept: " + t.reserveKept() + nl);
        }
        if (h.rounds().isPresent()) {
            Rounds r = h.rounds().get();
            w.write("# goal: " + r.goal() + nl);
            w.write(r.patrol() ? "# budgetPer: " + (r.budgetPerLap() ? "lap" : "mission") + nl
                    : "# deadlineTicks: " + r.deadlineTicks() + nl);
        }
        boolean scored = h.score().isPresent();
        boolean closed = policy.entries().stream().anyMatch(e -> !e.closures().isEmpty());
        w.write((scored ? closed ? CSV_SCORE_CLOSED_HEADER : CSV_SCORE_HEADER : closed ? CSV_CLOSED_HEADER : CSV_HEADER) + nl);
        StringBuilder sb = new StringBuilder();
        for (PolicyEntry e : policy.entries()) {
            sb.setLength(0);
            sb.append(e.cell()).append(',').append(e.level()).append(',').append(e.budgetLeft()).append(',')
                    .append(e.progress()).append(',');
            if (scored) {
                sb.append(e.score().text()).append(',');
            }
            sb.append(e.action().kind().word()).append(',');
            if (e.action().kind() == ActionKind.MOVE) {
                sb.append(e.action().target());
            }
            if (closed) {
                // the last column: it may hold commas, the reader takes the rest of the line
                sb.append(',').append(e.closures().replace('\n', ' ').replace('\r', ' '));
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
        YamlReader.Refusal refused = YamlReader.refusal(file);
        if (refused != null && Files.exists(file)) {
            // a pipe or a device is refused before it is opened (reading one could block or never end)
            throw new InputException(new Problem(file, 1, 1, refused.message(), refused.hint()));
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(new Problem(file, 1, 1, "no such file", "check the path"));
        } catch (IOException e) {
            throw new InputException(new Problem(file, 1, 1, "cannot read the file: " + e.getMessage(), "check the path and the file's permissions"));
        }
        Document d = isCsv(file) ? new PolicyCsvReading(problems, bytes).read() : new PolicyJsonReading(problems, bytes).read();
        problems.throwIfAny();
        return d;
    }

    /** Collects rows, checks each, and builds the policy (reporting duplicates at their row). */
    static final class Rows {
        final Problems problems;
        final List<PolicyEntry> entries = new ArrayList<>();
        final List<Pos> positions = new ArrayList<>();
        final Set<String> seen = new HashSet<>();

        Rows(Problems problems) {
            this.problems = problems;
        }

        void add(Pos pos, PolicyEntry e) {
            String key = e.cell() + "/" + e.level() + "/" + e.budgetLeft() + "/" + e.progress()
                    + (e.scored() ? "/" + e.score().text() : "") + "/" + e.closures();
            if (!seen.add(key)) {
                problems.add(pos, "a second row for cell " + e.cell() + ", level " + e.level() + ", budget left "
                        + e.budgetLeft() + (e.closures().isEmpty() ? "" : " (" + e.closures() + ")") + ", progress " + e.progress() + (e.scored() ? ", score " + e.score() : ""),
                        "keep one action per situation");
                return;
            }
            entries.add(e);
            positions.add(pos);
        }

        /**
         * The threshold policy: the steps grouped by position, thresholds falling; a threshold file is for
         * the reserve floor only.
         */
        ThresholdPolicy thresholds(Header h, Pos top) {
            if (h.score().isPresent()) {
                problems.addPolicy(top, "a threshold policy is for the reserve floor: leave out 'objective: discounted'");
                return null;
            }
            for (int i = 0; i < entries.size(); i++) {
                if (entries.get(i).scored()) {
                    problems.addPolicy(positions.get(i), "a threshold has no 'score'");
                }
            }
            if (problems.any()) {
                return null;
            }
            Map<String, List<PolicyEntry>> byPosition = new java.util.LinkedHashMap<>();
            for (PolicyEntry e : entries) {
                byPosition.computeIfAbsent(e.cell() + "/" + e.budgetLeft() + "/" + e.progress() + "/" + e.closures(),
                        k -> new ArrayList<>()).add(e);
            }
            List<ThresholdPolicy.Row> out = new ArrayList<>();
            for (List<PolicyEntry> steps : byPosition.values()) {
                steps.sort(java.util.Comparator.comparingInt(PolicyEntry::level).reversed());
                List<ThresholdPolicy.Step> st = new ArrayList<>();
                for (PolicyEntry e : steps) {
                    st.add(new ThresholdPolicy.Step(e.level(), e.action()));
                }
                PolicyEntry first = steps.get(0);
                out.add(new ThresholdPolicy.Row(first.cell(), first.budgetLeft(), first.progress(), first.closures(), st));
            }
            return new ThresholdPolicy(out);
        }

        /** The policy; every row has a score memory exactly when the header has the discounted objective. */
        Policy policy(Header h) {
            boolean scored = h.score().isPresent();
            for (int i = 0; i < entries.size(); i++) {
                if (entries.get(i).scored() != scored) {
                    problems.add(positions.get(i), scored ? "row has no 'score' (the policy is for a discounted mission)"
                            : "a row with a 'score' needs 'objective: discounted' in the header",
                            scored ? "give the score memory, e.g. 3/8 or secured" : "see missions/POLICY-FORMAT.md");
                }
            }
            return problems.any() ? null : new Policy(entries);
        }
    }

    static Cell cell(String text) {
        Matcher m = CELL.matcher(text.trim());
        return m.matches() ? new Cell(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))) : null;
    }

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

    static boolean knownVersion(String v) {
        String t = v.trim();
        return t.equals(String.valueOf(VERSION)) || t.equals(String.valueOf(VERSION_1))
                || t.equals(String.valueOf(VERSION_WITH_SCORE)) || t.equals(String.valueOf(VERSION_THRESHOLDS));
    }

    static int nonNegative(Problems p, Map<String, String> values, Map<String, Pos> at, String key) {
        String v = values.get(key).trim();
        if (!v.matches("\\d{1,9}")) {
            p.addPolicy(at.get(key), "'" + key + "' must be a whole number of at least 0, not '" + Loading.shorten(v) + "'");
            return -1;
        }
        return Integer.parseInt(v);
    }

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

    /** The fields every policy file opens with: format, version, mission, unit, floor, capacity, budget, tasks. */
    private static void writeHeadline(com.fasterxml.jackson.core.JsonGenerator g, Header h, int version)
            throws IOException {
        g.writeStringField("format", FORMAT);
        g.writeNumberField("version", version);
        g.writeStringField("mission", h.mission());
        g.writeStringField("unitWh", h.unitWh().stripTrailingZeros().toPlainString());
        g.writeNumberField("reserveUnits", h.floorUnits());
        g.writeNumberField("capacityUnits", h.capacityUnits());
        g.writeNumberField("budget", h.budget());
        g.writeArrayFieldStart("tasks");
        for (String t : h.tasks()) {
            g.writeString(t);
        }
        g.writeEndArray();
    }
}
