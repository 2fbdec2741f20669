package dockline.io;

import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.ThresholdPolicy;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

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
 *
 * <p>This class holds the format's records and keys; {@link PolicyWriting} writes both formats,
 * {@link PolicyJsonReading} and {@link PolicyCsvReading} read them, checking the values with
 * {@link PolicyFields} and the rows with {@link PolicyRows}.
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

    private PolicyFiles() {
    }

    /** Whether the file name asks for CSV ({@code .csv}, any case); anything else is JSON. */
    public static boolean isCsv(Path file) {
        return file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv");
    }

    /** Writes the policy atomically, as CSV for a {@code .csv} name, else as JSON. */
    public static void write(Path file, Header header, Policy policy) throws IOException {
        writeText(file, w -> PolicyWriting.write(w, isCsv(file), header, policy));
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
        writeText(file, w -> PolicyWriting.write(w, isCsv(file), header, policy));
    }

    /** Text to be written through a {@link Writer}. */
    private interface Text {
        void writeTo(Writer w) throws IOException;
    }

    /** Writes the text in UTF-8, atomically ({@link AtomicFiles}). */
    private static void writeText(Path file, Text text) throws IOException {
        AtomicFiles.write(file, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            text.writeTo(w);
            w.flush();
        });
    }

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
}
