package dockline.io;

import dockline.io.PolicyFiles.Document;
import dockline.policy.PolicyEntry;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static dockline.io.PolicyFields.row;
import static dockline.io.PolicyFiles.*;

/** CSV: {@code #} comment lines with the header, then a header row, then one row per line. */
final class PolicyCsvReading extends PolicyReading {
    /** The row fields, as the header row names them. */
    private List<String> columns = ROW_KEYS;

    PolicyCsvReading(Problems p, byte[] bytes) {
        super(p, bytes);
    }

    @Override
    Document read() {
        String text = new String(bytes, StandardCharsets.UTF_8);
        String[] lines = text.split("\r?\n", -1);
        boolean headerRow = false;
        boolean formatLine = false;
        boolean thresholdForm = false;
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
                    thresholdForm = c.equals(FORMAT + " " + VERSION_THRESHOLDS);
                    if (!c.equals(FORMAT + " " + VERSION) && !c.equals(FORMAT + " " + VERSION_1)
                            && !c.equals(FORMAT + " " + VERSION_WITH_SCORE) && !thresholdForm) {
                        p.addPolicy(new Pos(ln, 1), "not a dockline policy: the first line must be '# " + FORMAT + " "
                                + VERSION + "' (versions " + VERSION_1 + ", " + VERSION_WITH_SCORE + " and "
                                + VERSION_THRESHOLDS + " are read as well)");
                    }
                    continue;
                }
                int colon = c.indexOf(':');
                if (colon < 0) {
                    continue; // a plain comment
                }
                String written = c.substring(0, colon).trim();
                String key = canonical(written);
                String value = c.substring(colon + 1).trim();
                int col = line.indexOf(':') + 2;
                if (!known(key, TOP_KEYS, new Pos(ln, line.indexOf(written) + 1), false)) {
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
                String hr = line.trim();
                if (thresholdForm) {
                    if (hr.equals(CSV_STEP_HEADER) || hr.equals(CSV_STEP_CLOSED_HEADER)) {
                        columns = List.of(hr.split(","));
                    } else {
                        p.addPolicy(new Pos(ln, 1), "the header row of a threshold policy must be '" + CSV_STEP_HEADER
                                + "' (followed by '," + CLOSED + "' with lasting events)");
                        return null;
                    }
                } else if (hr.equals(CSV_SCORE_HEADER) || hr.equals(OLD_CSV_SCORE_HEADER)) {
                    columns = SCORE_ROW_KEYS;
                } else if (hr.equals(CSV_CLOSED_HEADER) || hr.equals(CSV_SCORE_CLOSED_HEADER)) {
                    columns = List.of(hr.split(","));
                } else if (!hr.equals(CSV_HEADER) && !hr.equals(OLD_CSV_HEADER)) {
                    p.addPolicy(new Pos(ln, 1), "the header row must be '" + CSV_HEADER + "' (or '" + CSV_SCORE_HEADER
                            + "' for a discounted mission; either followed by '," + CLOSED + "' with lasting events)");
                    return null;
                }
                continue;
            }
            readRow(line, ln);
        }
        if (!formatLine) {
            p.addPolicy(Pos.START, "not a dockline policy: the first line must be '# " + FORMAT + " " + VERSION + "'");
        }
        if (!headerRow) {
            p.addPolicy(new Pos(lines.length, 1), "no header row '" + CSV_HEADER + "'");
        }
        return document(Pos.START, thresholdForm);
    }

    private void readRow(String line, int ln) {
        Map<String, String> values = new LinkedHashMap<>();
        Map<String, Pos> at = new LinkedHashMap<>();
        int field = 0;
        int start = 0;
        boolean restIsClosed = columns.get(columns.size() - 1).equals(CLOSED);
        for (int i = 0; i <= line.length(); i++) {
            if (restIsClosed && field == columns.size() - 1) {
                i = line.length(); // the closures column takes the rest of the line, commas and all
            }
            if (i == line.length() || line.charAt(i) == ',') {
                if (field < columns.size()) {
                    String v = line.substring(start, i);
                    if (!(field == columns.size() - 1 && v.isBlank())) {
                        values.put(columns.get(field), v);
                    }
                    at.put(columns.get(field), new Pos(ln, start + 1));
                }
                field++;
                start = i + 1;
            }
        }
        if (field != columns.size()) {
            p.addPolicy(new Pos(ln, 1), "a row has " + columns.size() + " fields (" + String.join(",", columns)
                    + "), this one has " + field);
            return;
        }
        PolicyEntry e = row(p, new Pos(ln, 1), values, at);
        if (e != null) {
            rows.add(new Pos(ln, 1), e);
        }
    }
}
