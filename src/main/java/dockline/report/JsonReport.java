package dockline.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.OptionalInt;

/**
 * The report's content as data ({@code dockline report --json FILE}), in the output vocabulary of
 * DEVELOPERS.md; its schema is src/main/resources/dockline/schemas/report.schema.json. The pictures are not
 * repeated here (the HTML file has them); the run is given as its battery levels.
 */
public final class JsonReport {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JsonReport() {
    }

    /** The report as one JSON document (indented, ending in a newline). */
    public static String json(List<MissionResult> results, ReportMeta meta) {
        try {
            return MAPPER.writeValueAsString(tree(results, meta)) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("internal: the report could not be written as JSON", e);
        }
    }

    /** The report as a JSON tree. */
    public static ObjectNode tree(List<MissionResult> results, ReportMeta meta) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("tool", "dockline");
        o.put("version", meta.version());
        o.put("generated", Html.date(meta));
        o.put("exitCode", ReportRun.exitCode(results));
        ArrayNode ms = o.putArray("missions");
        for (MissionResult r : results) {
            ms.add(mission(r));
        }
        ArrayNode c = o.putArray("caveats");
        Caveats.LINES.forEach(c::add);
        return o;
    }

    private static ObjectNode mission(MissionResult r) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("mission", r.mission());
        o.put("file", r.file().toString());
        o.put("kind", r.kind());
        o.put("status", r.status().word());
        o.put("exitCode", r.status().exitCode());
        ArrayNode in = o.putArray("inputs");
        for (MissionResult.Input i : r.inputs()) {
            ObjectNode n = in.addObject();
            n.put("file", i.file());
            n.put("sha256", i.sha256());
        }
        ArrayNode errs = o.putArray("errors");
        for (LocatedError e : r.errors()) {
            ObjectNode n = errs.addObject();
            n.put("file", e.file());
            n.put("line", e.line()); // null when the error is not located in a file (Jackson writes null)
            n.put("column", e.column());
            n.put("message", e.message());
            n.put("hint", e.hint());
        }
        o.put("disturbances", r.disturbances());
        MissionResult.Figures f = r.figures();
        if (f != null) {
            o.put("verdict", f.guaranteed() ? "guaranteed" : "not-guaranteed");
            o.put("method", f.method());
            o.put("methodReason", f.methodReason());
            o.put("certified", f.certified());
            o.put("certification", f.certification());
            o.put("unitWh", f.scale().unitWh().stripTrailingZeros());
            o.put("rounding", f.scale().describe());
            o.put("capacityUnits", f.capacityUnits());
            o.put("startUnits", f.startUnits());
            o.put("reserveUnits", f.reserveUnits());
            o.put("budget", f.budget());
            optional(o, "lowestLevelUnits", f.lowestLevelUnits());
            optional(o, "highestReserveUnits", f.highestFloorUnits());
            optional(o, "lowestStartUnits", f.lowestStartUnits());
            ArrayNode rules = o.putArray("ruleOfThumb");
            for (RuleOfThumb rule : f.rules()) {
                ObjectNode n = rules.addObject();
                n.put("marginPercent", rule.marginPercent());
                n.put("marginUnits", rule.marginUnits());
                optional(n, "nominalNeedUnits", rule.nominalNeedUnits());
                if (rule.deadline().isPresent()) {
                    RuleOfThumb.Time t = rule.deadline().get();
                    n.put("deadlineTicks", t.deadlineTicks());
                    n.put("marginTicks", t.marginTicks());
                    optional(n, "shortestRunTicks", t.shortestRunTicks());
                    n.put("fitsDeadline", t.fits());
                }
                n.put("saysSafe", rule.saysSafe());
                n.put("flag", rule.flag().word());
            }
            ArrayNode sg = o.putArray("suggestions");
            r.suggestions().forEach(sg::add);
            if (r.run() != null) {
                ObjectNode run = o.putObject("run");
                run.put("title", r.run().title());
                run.put("ending", r.run().ending());
                optional(run, "loopStartStep", r.run().loopStart() >= 0 ? OptionalInt.of(r.run().loopStart())
                        : OptionalInt.empty());
                ArrayNode lv = run.putArray("levelUnits");
                r.run().levelsUnits().forEach(lv::add);
            } else {
                o.putNull("run");
            }
        }
        o.put("picture", r.picture() != null);
        ArrayNode notes = o.putArray("notes");
        r.notes().forEach(notes::add);
        if (r.pictureNote() != null) {
            notes.add(r.pictureNote());
        }
        return o;
    }

    private static void optional(ObjectNode o, String key, OptionalInt v) {
        if (v.isPresent()) {
            o.put(key, v.getAsInt());
        } else {
            o.putNull(key);
        }
    }
}
