package dockline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import dockline.io.PolicyFiles.Document;
import dockline.policy.PolicyEntry;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static dockline.io.PolicyFields.knownVersion;
import static dockline.io.PolicyFields.row;
import static dockline.io.PolicyFiles.*;

/** JSON through Jackson's streaming parser, so every value keeps its line and column. */
final class PolicyJsonReading extends PolicyReading {

    PolicyJsonReading(Problems p, byte[] bytes) {
        super(p, bytes);
    }

    private static Pos pos(JsonLocation l) {
        return new Pos(l.getLineNr(), l.getColumnNr());
    }

    @Override
    Document read() {
        JsonFactory f = new JsonFactory();
        try (JsonParser j = f.createParser(bytes)) {
            if (j.nextToken() != JsonToken.START_OBJECT) {
                p.add(pos(j.currentTokenLocation()), "a policy file in JSON is one object", "see missions/POLICY-FORMAT.md");
                return null;
            }
            boolean sawRows = false;
            boolean sawThresholds = false;
            Pos top = pos(j.currentTokenLocation());
            for (Field field = next(j, TOP_KEYS, false); field != null; field = next(j, TOP_KEYS, false)) {
                if (field == UNKNOWN) {
                    continue;
                }
                String key = field.key();
                JsonToken t = field.token();
                Pos vp = field.valuePos();
                switch (key) {
                    case "tasks" -> {
                        if (t != JsonToken.START_ARRAY) {
                            p.addPolicy(vp, "'tasks' must be a list of zone names");
                            j.skipChildren();
                            continue;
                        }
                        while (j.nextToken() != JsonToken.END_ARRAY) {
                            if (j.currentToken() != JsonToken.VALUE_STRING) {
                                p.addPolicy(pos(j.currentTokenLocation()), "a task is a zone name in quotes");
                                j.skipChildren();
                            } else {
                                tasks.add(j.getText());
                            }
                        }
                    }
                    case "thresholds", "rows" -> {
                        boolean thresholds = key.equals("thresholds");
                        sawThresholds |= thresholds;
                        sawRows |= !thresholds;
                        if (t != JsonToken.START_ARRAY) {
                            p.addPolicy(vp, "'" + key + "' must be a list of " + key);
                            j.skipChildren();
                            continue;
                        }
                        while (j.nextToken() != JsonToken.END_ARRAY) {
                            readRow(j, thresholds ? JSON_STEP_KEYS : JSON_ROW_KEYS);
                        }
                    }
                    default -> {
                        if (scalar(j, field)) {
                            values.put(key, j.getText());
                            at.put(key, vp);
                        }
                    }
                }
            }
            if (!FORMAT.equals(values.get("format"))) {
                p.addPolicy(at.getOrDefault("format", top), "not a dockline policy: 'format' must be \"" + FORMAT + "\"");
            }
            if (values.containsKey("version") && !knownVersion(values.get("version"))) {
                p.addPolicy(at.get("version"), "policy format version " + Loading.shorten(values.get("version"))
                        + " is not known (this dockline reads versions " + VERSION_1 + ", " + VERSION_WITH_SCORE
                        + ", " + VERSION + " and " + VERSION_THRESHOLDS + ")");
            }
            if (sawRows && sawThresholds) {
                p.addPolicy(top, "a policy file holds 'rows' or 'thresholds', not both");
            } else if (!sawRows && !sawThresholds) {
                p.addPolicy(top, "no 'rows' (or 'thresholds') in the policy file");
            }
            if (sawThresholds && values.containsKey("version")
                    && !values.get("version").trim().equals(String.valueOf(VERSION_THRESHOLDS))) {
                p.addPolicy(at.get("version"), "'thresholds' need format version " + VERSION_THRESHOLDS);
            }
            return document(top, sawThresholds);
        } catch (JsonParseException e) {
            p.addPolicy(pos(e.getLocation()), "not valid JSON: " + e.getOriginalMessage());
            return null;
        } catch (IOException e) {
            p.addPolicy(Pos.START, "cannot read the file: " + e.getMessage());
            return null;
        }
    }

    private void readRow(JsonParser j, List<String> keys) throws IOException {
        Pos rp = pos(j.currentTokenLocation());
        if (j.currentToken() != JsonToken.START_OBJECT) {
            p.addPolicy(rp, "a row is an object with " + String.join(", ", SCORE_ROW_KEYS) + " (score for a discounted mission)");
            j.skipChildren();
            return;
        }
        Map<String, String> values = new LinkedHashMap<>();
        Map<String, Pos> at = new LinkedHashMap<>();
        boolean bad = false;
        for (Field f = next(j, keys, true); f != null; f = next(j, keys, true)) {
            if (f == UNKNOWN || !scalar(j, f)) {
                bad = true;
                continue;
            }
            values.put(f.key(), j.getText());
            at.put(f.key(), f.valuePos());
        }
        PolicyEntry e = row(p, rp, values, at);
        if (e != null && !bad) {
            rows.add(rp, e);
        }
    }

    /** A key of an object, where it stands, and its value's first token and where that stands. */
    private record Field(String key, Pos keyPos, JsonToken token, Pos valuePos) {
    }

    /** What {@link #next} gives for a key that is not one of the keys (reported, its value skipped). */
    private static final Field UNKNOWN = new Field("", Pos.START, JsonToken.VALUE_NULL, Pos.START);

    /**
     * The next key of the object (keys of earlier versions renamed) with the parser on its value, or
     * {@code null} at the object's end; {@link #UNKNOWN} after reporting a key not in {@code keys}.
     */
    private Field next(JsonParser j, List<String> keys, boolean inRow) throws IOException {
        if (j.nextToken() != JsonToken.FIELD_NAME) {
            return null;
        }
        String key = canonical(j.currentName());
        Pos kp = pos(j.currentTokenLocation());
        JsonToken t = j.nextToken();
        Pos vp = pos(j.currentTokenLocation());
        if (!known(key, keys, kp, inRow)) {
            j.skipChildren();
            return UNKNOWN;
        }
        return new Field(key, kp, t, vp);
    }

    /** Whether the field's value is a single value; if not, reports it and skips the value. */
    private boolean scalar(JsonParser j, Field f) throws IOException {
        if (f.token().isScalarValue()) {
            return true;
        }
        p.addPolicy(f.valuePos(), "'" + f.key() + "' must be a single value");
        j.skipChildren();
        return false;
    }
}
