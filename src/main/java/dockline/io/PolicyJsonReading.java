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
            while (j.nextToken() == JsonToken.FIELD_NAME) {
                String key = canonical(j.currentName());
                Pos kp = pos(j.currentTokenLocation());
                JsonToken t = j.nextToken();
                Pos vp = pos(j.currentTokenLocation());
                if (!known(key, TOP_KEYS, kp, false)) {
                    j.skipChildren();
                    continue;
                }
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
                        if (!t.isScalarValue()) {
                            p.addPolicy(vp, "'" + key + "' must be a single value");
                            j.skipChildren();
                            continue;
                        }
                        values.put(key, j.getText());
                        at.put(key, vp);
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
        while (j.nextToken() == JsonToken.FIELD_NAME) {
            String key = canonical(j.currentName());
            Pos kp = pos(j.currentTokenLocation());
            JsonToken t = j.nextToken();
            Pos vp = pos(j.currentTokenLocation());
            if (!known(key, keys, kp, true)) {
                j.skipChildren();
                bad = true;
                continue;
            }
            if (!t.isScalarValue()) {
                p.addPolicy(vp, "'" + key + "' must be a single value");
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
