package dockline.replay;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.List;

/**
 * A replay as CSV (RFC 4180: comma-separated, fields with a comma, quote or line break quoted, CRLF
 * line ends), as JSON, and as a text table. Output depends only on the replay, so the same input
 * gives byte-identical files. Keys and columns follow the output vocabulary of DEVELOPERS.md.
 */
public final class ReplayFormats {

    /** The CSV header (column names). */
    public static final List<String> CSV_COLUMNS = List.of("step", "cell", "action", "event", "eventDetail",
            "levelUnits", "levelWh", "budgetLeft", "progress", "progressWords");

    private static final String CRLF = "\r\n";

    private ReplayFormats() {
    }

    public static String csv(Replay replay) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.join(",", CSV_COLUMNS)).append(CRLF);
        for (ReplayStep s : replay.steps()) {
            List<String> f = List.of(Integer.toString(s.step()), s.cell().toString(), s.actionText(), s.event().word(),
                    s.event().describe(), Integer.toString(s.batteryUnits()), s.batteryWh().toPlainString(),
                    Integer.toString(s.budgetLeft()), Integer.toString(s.progressMask()), s.progressWords());
            for (int i = 0; i < f.size(); i++) {
                if (i > 0) {
                    sb.append(',');
                }
                sb.append(field(f.get(i)));
            }
            sb.append(CRLF);
        }
        return sb.toString();
    }

    /** RFC 4180 field quoting. */
    static String field(String v) {
        if (v.indexOf(',') < 0 && v.indexOf('"') < 0 && v.indexOf('\n') < 0 && v.indexOf('\r') < 0) {
            return v;
        }
        return '"' + v.replace("\"", "\"\"") + '"';
    }

    /** The replay as JSON text (the tree of {@link #jsonTree}), ending with a line break. */
    public static String json(Mission mission, Replay replay) {
        ObjectMapper om = new ObjectMapper();
        om.enable(SerializationFeature.INDENT_OUTPUT);
        om.configure(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN, true);
        try {
            return om.writeValueAsString(jsonTree(mission, replay)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The replay as a JSON tree: the summary, the explanation and one object per step. */
    public static ObjectNode jsonTree(Mission mission, Replay replay) {
        EnergyScale scale = mission.scale();
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("mission", mission.name());
        root.put("replay", replay.kind().word());
        root.put("ending", replay.ending().word());
        root.put("lowestLevelUnits", replay.minimumUnits());
        root.put("lowestLevelWh", scale.toWh(replay.minimumUnits()));
        root.put("reserveUnits", replay.floorUnits());
        root.put("reserveWh", scale.toWh(replay.floorUnits()));
        root.put("unitWh", scale.unitWh().stripTrailingZeros());
        root.put("rounding", scale.describe());
        ArrayNode ex = root.putArray("explanation");
        replay.explanation().forEach(ex::add);
        ArrayNode steps = root.putArray("steps");
        for (ReplayStep s : replay.steps()) {
            ObjectNode o = steps.addObject();
            o.put("step", s.step());
            o.put("cell", s.cell().toString());
            o.put("action", s.actionText());
            o.put("event", s.event().word());
            if (!s.event().nominal()) {
                o.put("rule", s.event().ruleLabel());
                if (!s.event().doorName().isEmpty()) {
                    o.put("door", s.event().doorName());
                }
                o.put("eventCell", s.event().cell().toString());
                if (s.event().lasting()) {
                    o.put("closedForGood", s.event().closed());
                }
            }
            o.put("levelUnits", s.batteryUnits());
            o.put("levelWh", s.batteryWh());
            o.put("budgetLeft", s.budgetLeft());
            o.put("progress", s.progressMask());
            o.put("progressWords", s.progressWords());
        }
        return root;
    }

    /** The replay as an aligned text table, one row a line. */
    public static String table(Replay replay) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"step", "cell", "action", "event", "battery", "budget", "tasks"});
        for (ReplayStep s : replay.steps()) {
            String ev = s.event().nominal() ? "-" : s.event().describe();
            rows.add(new String[] {Integer.toString(s.step()), s.cell().toString(), s.actionText(), ev,
                s.batteryUnits() + " (" + s.batteryWh().toPlainString() + " Wh)", Integer.toString(s.budgetLeft()),
                s.progressWords()});
        }
        int[] width = new int[rows.get(0).length];
        for (String[] r : rows) {
            for (int i = 0; i < r.length; i++) {
                width[i] = Math.max(width[i], r[i].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder();
            for (int i = 0; i < r.length; i++) {
                boolean right = i == 0 || i == 5;
                String cell = right ? " ".repeat(width[i] - r[i].length()) + r[i] : r[i] + " ".repeat(width[i] - r[i].length());
                line.append(i == 0 ? "" : "  ").append(cell);
            }
            sb.append(line.toString().stripTrailing()).append(System.lineSeparator());
        }
        return sb.toString();
    }
}
