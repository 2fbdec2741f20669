package dockline.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.margin.Suggestion;
import dockline.report.Caveats;
import java.util.List;

/**
 * The JSON output of the commands, written one way: indented, decimals written out (never
 * {@code 1E+1}), and the safety caveats as a {@code caveats} array of one sentence each, last.
 */
final class Json {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
            .configure(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN, true);

    private Json() {
    }

    /** A new, empty JSON object. */
    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    /** Puts the {@code suggestions} array: kind, from, to (in units) and the sentence, smallest change first. */
    static void putSuggestions(ObjectNode o, List<Suggestion> suggestions) {
        ArrayNode arr = o.putArray("suggestions");
        for (Suggestion sg : suggestions) {
            ObjectNode so = arr.addObject();
            so.put("kind", sg.kind().word());
            so.put("from", sg.from());
            so.put("to", sg.to());
            so.put("text", sg.text());
        }
    }

    /**
     * Puts the size and timing of a solved product game, the same keys in the same order for every
     * objective: {@code productVertices}, {@code productEdges}, {@code estimatedVertices},
     * {@code estimatedEdges}, {@code buildMillis}, {@code solveMillis} (the plan adds {@code totalMillis}).
     */
    static void putGameSize(ObjectNode o, long vertices, long edges, dockline.solve.SizeEstimate estimate,
                            long buildMillis, long solveMillis) {
        o.put("productVertices", vertices);
        o.put("productEdges", edges);
        o.put("estimatedVertices", estimate.vertices());
        o.put("estimatedEdges", estimate.edges());
        o.put("buildMillis", buildMillis);
        o.put("solveMillis", solveMillis);
    }

    /** The keys every command's object starts with: {@code mission}, {@code file}, {@code verdict}. */
    static ObjectNode header(dockline.model.Mission m, dockline.solve.Verdict verdict) {
        ObjectNode o = object();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", verdict.word());
        return o;
    }

    /**
     * Puts the battery of the question: {@code startUnits}, {@code reserveUnits} and {@code capacityUnits},
     * in that order (the same three keys in every command's object).
     */
    static void putBattery(ObjectNode o, int startUnits, int reserveUnits, int capacityUnits) {
        o.put("startUnits", startUnits);
        o.put("reserveUnits", reserveUnits);
        o.put("capacityUnits", capacityUnits);
    }

    /** Puts the energy unit in Wh ({@code unitWh}) and the map's disturbance budget ({@code budget}). */
    static void putUnitAndBudget(ObjectNode o, dockline.model.Mission m) {
        o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
        o.put("budget", m.map().disturbances().budget());
    }

    /** Puts {@code key + "Units"} and {@code key + "Wh"} of an energy figure, both null when there is none. */
    static void putUnitsAndWh(ObjectNode o, String key, java.util.OptionalInt u, dockline.model.EnergyScale s) {
        putOptional(o, key + "Units", u);
        if (u.isPresent()) {
            o.put(key + "Wh", s.toWh(u.getAsInt()));
        } else {
            o.putNull(key + "Wh");
        }
    }

    /** Puts the value, or null when empty. */
    static void putOptional(ObjectNode o, String key, java.util.OptionalInt v) {
        if (v.isPresent()) {
            o.put(key, v.getAsInt());
        } else {
            o.putNull(key);
        }
    }

    /** The object as text (no final line break), after adding the {@code caveats} array. */
    static String withCaveats(ObjectNode o) {
        ArrayNode caveats = o.putArray("caveats");
        Caveats.LINES.forEach(caveats::add);
        try {
            return MAPPER.writeValueAsString(o);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    /** Any JSON value as indented text (no final line break). */
    static String pretty(com.fasterxml.jackson.databind.JsonNode n) {
        try {
            return MAPPER.writeValueAsString(n);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    /** A record as a JSON object: one key per component, named and ordered as the record declares them. */
    static ObjectNode record(Record r) {
        return MAPPER.valueToTree(r);
    }

    /** The reading benchmark as JSON: one object per layout and the slowest ratio. */
    static String readingJson(dockline.bench.ReadingBench.Result r) {
        ObjectNode o = object();
        ArrayNode rows = o.putArray("reading");
        for (dockline.bench.ReadingBench.Row row : r.rows()) {
            rows.add(record(row));
        }
        o.put("worstRatio", r.worstRatio());
        o.put("met", r.met());
        try {
            return MAPPER.writeValueAsString(o) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
