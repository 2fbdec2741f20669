package dockline.report;

import java.nio.charset.StandardCharsets;
import java.time.format.DateTimeFormatter;
import java.util.Base64;
import java.util.List;
import java.util.OptionalInt;

/**
 * The report as one self-contained HTML file: styles inline (with print rules for A4), every picture a
 * {@code data:} URI (the map as PNG, the battery chart as SVG), no script, and no link that leaves the
 * file (only {@code #} links to its own sections). Layout: heading with the safety cautions, the summary
 * table, one section per mission, the traceability block.
 *
 * <p>Cost: O(size of the results), pictures included.
 */
public final class Html {

    private Html() {
    }

    private static final String CSS = """
            body { font-family: "DejaVu Sans", Arial, sans-serif; font-size: 10.5pt; color: #1c1c1c; margin: 24px; }
            h1 { font-size: 18pt; margin: 0 0 4px 0; }
            h2 { font-size: 14pt; border-bottom: 2px solid #5a6b7a; padding-bottom: 2px; margin-top: 28px; }
            h3 { font-size: 11.5pt; margin: 14px 0 4px 0; }
            table { border-collapse: collapse; width: 100%; }
            th, td { border: 1px solid #b8b8b8; padding: 3px 5px; text-align: left; vertical-align: top; }
            th { background: #e9ecef; }
            td.num { text-align: right; white-space: nowrap; }
            .guaranteed { color: #1d6b34; font-weight: bold; }
            .not-guaranteed { color: #a3241a; font-weight: bold; }
            .bad { color: #7a4b00; font-weight: bold; }
            .flag-danger { background: #f8d7d3; font-weight: bold; }
            .flag-refuses { background: #fcefc9; }
            .cautions { border: 2px solid #a3241a; background: #fff6f4; padding: 6px 10px; }
            .cautions li { margin: 2px 0; }
            figure { margin: 8px 0; }
            figure img { max-width: 100%; height: auto; border: 1px solid #cccccc; }
            figcaption { font-size: 9pt; color: #444444; }
            dl.figures { display: grid; grid-template-columns: max-content auto; gap: 2px 12px; }
            dl.figures dt { font-weight: bold; }
            dl.figures dd { margin: 0; }
            code, .mono { font-family: "DejaVu Sans Mono", monospace; font-size: 9pt; word-break: break-all; }
            @page { size: A4; margin: 14mm 12mm; }
            @media print {
              body { margin: 0; font-size: 9.5pt; }
              section.mission { break-before: page; }
              section#traceability { break-before: page; }
              figure, table, .cautions { break-inside: avoid; }
              a { color: inherit; text-decoration: none; }
            }
            """;

    /** The whole report. */
    public static String report(List<MissionResult> results, ReportMeta meta) {
        StringBuilder sb = new StringBuilder(1 << 16);
        sb.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"generator\" content=\"dockline ").append(escape(meta.version())).append("\">\n")
                .append("<title>Mission sign-off report (dockline)</title>\n<style>\n").append(CSS).append("</style>\n")
                .append("</head>\n<body>\n");
        sb.append("<header>\n<h1>Mission sign-off report</h1>\n<p>").append(results.size())
                .append(results.size() == 1 ? " mission" : " missions").append(" checked by dockline ")
                .append(escape(meta.version())).append(" on ").append(escape(date(meta))).append(". ")
                .append(escape(overall(results))).append("</p>\n");
        cautions(sb, "cautions-top");
        sb.append("</header>\n");
        summary(sb, results);
        for (int i = 0; i < results.size(); i++) {
            mission(sb, results.get(i), i + 1);
        }
        traceability(sb, results, meta);
        sb.append("</body>\n</html>\n");
        return sb.toString();
    }

    static String date(ReportMeta meta) {
        return DateTimeFormatter.ISO_INSTANT.format(meta.generated().truncatedTo(java.time.temporal.ChronoUnit.SECONDS));
    }

    private static String overall(List<MissionResult> results) {
        int ok = 0;
        int not = 0;
        int bad = 0;
        for (MissionResult r : results) {
            switch (r.status()) {
                case GUARANTEED -> ok++;
                case NOT_GUARANTEED -> not++;
                default -> bad++;
            }
        }
        return ok + " guaranteed, " + not + " not guaranteed, " + bad + " not checked (errors).";
    }

    private static void cautions(StringBuilder sb, String id) {
        sb.append("<div class=\"cautions\" id=\"").append(id).append("\">\n<strong>Safety cautions.</strong>\n<ul>\n");
        for (String line : Caveats.LINES) {
            sb.append("<li>").append(escape(line)).append("</li>\n");
        }
        sb.append("<li>").append(escape("This report supports, and does not replace, the robot maker's guidance, local"
                + " codes and the judgement of licensed, qualified staff.")).append("</li>\n");
        sb.append("</ul>\n</div>\n");
    }

    // ---- summary

    private static void summary(StringBuilder sb, List<MissionResult> results) {
        sb.append("<section id=\"summary\">\n<h2>Summary</h2>\n<table id=\"summary-table\">\n<thead><tr>")
                .append("<th>Mission</th><th>Verdict</th><th>Reserve floor</th><th>Worst case</th>")
                .append("<th>Highest guaranteed floor</th><th>Lowest start</th><th>Method</th><th>Certified</th>");
        for (int pct : RuleOfThumb.MARGINS) {
            sb.append("<th>Rule of thumb, ").append(pct).append(" % margin</th>");
        }
        sb.append("</tr></thead>\n<tbody>\n");
        for (int i = 0; i < results.size(); i++) {
            MissionResult r = results.get(i);
            sb.append("<tr class=\"mission-row\" data-file=\"").append(escape(r.file().toString()))
                    .append("\" data-status=\"").append(r.status().word()).append("\">");
            sb.append("<td><a href=\"#mission-").append(i + 1).append("\">").append(escape(r.mission()))
                    .append("</a><br><span class=\"mono\">").append(escape(r.file().toString())).append("</span></td>");
            MissionResult.Figures f = r.figures();
            if (f == null) {
                sb.append("<td class=\"bad\">").append(escape(statusWords(r))).append("</td>");
                sb.append("<td colspan=\"").append(6 + RuleOfThumb.MARGINS.length).append("\">")
                        .append(escape(r.errors().size() + (r.errors().size() == 1 ? " error" : " errors")
                                + ", see the mission's section")).append("</td>");
            } else {
                sb.append("<td class=\"").append(r.status().word()).append("\">").append(escape(statusWords(r)))
                        .append("</td>");
                sb.append("<td class=\"num\">").append(escape(f.wh(f.reserveUnits()))).append("</td>");
                sb.append("<td class=\"num\">").append(escape(opt(f, f.lowestLevelUnits()))).append("</td>");
                sb.append("<td class=\"num\">").append(escape(opt(f, f.highestFloorUnits()))).append("</td>");
                sb.append("<td class=\"num\">").append(escape(opt(f, f.lowestStartUnits()))).append("</td>");
                sb.append("<td>").append(escape(f.method())).append("</td>");
                sb.append("<td>").append(f.certified() ? "yes" : "no").append("</td>");
                for (RuleOfThumb rule : f.rules()) {
                    sb.append("<td class=\"").append(flagClass(rule)).append("\" data-flag=\"")
                            .append(rule.flag().word()).append("\">").append(escape(rule.words())).append("</td>");
                }
            }
            sb.append("</tr>\n");
        }
        sb.append("</tbody>\n</table>\n<p>").append(escape("Worst case: the lowest battery level the disturbances can"
                + " force under the certified policy. Rule of thumb (common practice, not a guarantee): safe when the"
                + " charge above the floor covers the cheapest run with no disturbance plus the margin, in percent of"
                + " the capacity; for a mission with a deadline, also when the shortest run with no disturbance plus"
                + " the same percentage of the deadline fits in the deadline. Marked red where it calls an unsafe"
                + " mission safe, yellow where it turns down a guaranteed one.")).append("</p>\n</section>\n");
    }

    private static String flagClass(RuleOfThumb r) {
        return switch (r.flag()) {
            case AGREES -> "flag-agrees";
            case CALLS_UNSAFE_SAFE -> "flag-danger";
            case REFUSES_GUARANTEED -> "flag-refuses";
        };
    }

    static String statusWords(MissionResult r) {
        return switch (r.status()) {
            case GUARANTEED -> "guaranteed";
            case NOT_GUARANTEED -> "NOT guaranteed";
            case BAD_INPUT -> "not checked: bad input";
            case OVER_RESOURCE_LIMIT -> "not checked: over a resource limit";
            case INTERNAL_ERROR -> "not checked: internal error";
        };
    }

    private static String opt(MissionResult.Figures f, OptionalInt u) {
        return u.isPresent() ? f.wh(u.getAsInt()) : "\u2014";
    }

    // ---- one mission

    private static void mission(StringBuilder sb, MissionResult r, int index) {
        sb.append("<section class=\"mission\" id=\"mission-").append(index).append("\" data-status=\"")
                .append(r.status().word()).append("\">\n<h2>").append(index).append(". ").append(escape(r.mission()))
                .append("</h2>\n<p class=\"mono\">").append(escape(r.file().toString())).append("</p>\n");
        MissionResult.Figures f = r.figures();
        if (f == null) {
            sb.append("<p class=\"bad\">").append(escape(statusWords(r))).append("</p>\n<ul class=\"errors\">\n");
            for (LocatedError e : r.errors()) {
                sb.append("<li class=\"mono\">").append(escape(e.format())).append("</li>\n");
            }
            sb.append("</ul>\n");
            if (r.disturbances() != null) {
                sb.append("<h3>Disturbance model</h3>\n<p class=\"disturbances\">").append(escape(r.disturbances()))
                        .append("</p>\n");
            }
            cautions(sb, "cautions-" + index);
            sb.append("</section>\n");
            return;
        }
        sb.append("<p class=\"verdict ").append(r.status().word()).append("\">").append(escape(verdictWords(r)))
                .append("</p>\n");
        sb.append("<dl class=\"figures\">\n");
        dt(sb, "Kind", r.kind());
        dt(sb, "Battery capacity", f.wh(f.capacityUnits()));
        dt(sb, "Starting charge", f.wh(f.startUnits()));
        dt(sb, "Reserve floor", f.wh(f.reserveUnits()));
        dt(sb, "Worst case", opt(f, f.lowestLevelUnits()));
        dt(sb, "Highest guaranteed floor", f.highestFloorUnits().isPresent() ? f.wh(f.highestFloorUnits().getAsInt())
                : "none can be guaranteed from this start");
        dt(sb, "Lowest start", f.lowestStartUnits().isPresent() ? f.wh(f.lowestStartUnits().getAsInt())
                : !f.lowestStartSearched() ? "not computed (see the notes)"
                : r.kind().equals("deadline") ? "no start charge guarantees the floor within the deadline"
                : "no start charge guarantees the floor");
        dt(sb, "Method", f.method() + " \u2014 " + f.methodReason());
        dt(sb, "Certificate", f.certification());
        sb.append("</dl>\n");
        sb.append("<h3>Rule of thumb (common practice)</h3>\n<ul class=\"rule-of-thumb\">\n");
        for (RuleOfThumb rule : f.rules()) {
            sb.append("<li class=\"").append(flagClass(rule)).append("\" data-flag=\"").append(rule.flag().word())
                    .append("\">").append(escape(ruleWords(f, rule))).append("</li>\n");
        }
        sb.append("</ul>\n");
        sb.append("<h3>Map and ").append(r.run() == null ? "run" : escape(r.run().title())).append("</h3>\n");
        if (r.picture() != null) {
            sb.append("<figure class=\"map\"><img alt=\"map of ").append(escape(r.mission()))
                    .append(" with the run drawn\" src=\"data:image/png;base64,")
                    .append(Base64.getEncoder().encodeToString(r.picture())).append("\"><figcaption>")
                    .append(escape("The map with the run (drawn by the same code as 'dockline render').")).append(
                            "</figcaption></figure>\n");
        } else {
            sb.append("<p class=\"picture-note\">").append(escape(r.pictureNote())).append("</p>\n");
        }
        if (r.run() != null) {
            String svg = BatterySvg.svg(r.run().levelsUnits(), f.capacityUnits(), f.reserveUnits(), f::wh,
                    r.run().loopStart());
            sb.append("<figure class=\"battery\"><img alt=\"battery chart\" width=\"").append(BatterySvg.WIDTH)
                    .append("\" height=\"").append(BatterySvg.HEIGHT).append("\" src=\"data:image/svg+xml;base64,")
                    .append(Base64.getEncoder().encodeToString(svg.getBytes(StandardCharsets.UTF_8)))
                    .append("\"><figcaption>").append(escape("Battery level at each step of the " + r.run().title()
                            + "; ends: " + r.run().ending() + ".")).append("</figcaption></figure>\n");
        }
        if (!f.guaranteed()) {
            sb.append("<h3>Suggestions</h3>\n");
            if (r.suggestions().isEmpty()) {
                sb.append("<p class=\"suggestions\">").append(escape("No suggestion was found (or none is searched for"
                        + " this kind of mission).")).append("</p>\n");
            } else {
                sb.append("<ul class=\"suggestions\">\n");
                for (String s : r.suggestions()) {
                    sb.append("<li>").append(escape(s)).append("</li>\n");
                }
                sb.append("</ul>\n");
            }
        }
        sb.append("<h3>Disturbance model</h3>\n<p class=\"disturbances\">").append(escape(r.disturbances()))
                .append("</p>\n");
        if (!r.notes().isEmpty()) {
            sb.append("<h3>Notes</h3>\n<ul class=\"notes\">\n");
            for (String n : r.notes()) {
                sb.append("<li>").append(escape(n)).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        cautions(sb, "cautions-" + index);
        sb.append("</section>\n");
    }

    private static String verdictWords(MissionResult r) {
        MissionResult.Figures f = r.figures();
        String k = f.budget() == 0 ? "with no disturbance" : "under every sequence of up to " + f.budget()
                + " disturbances the model allows";
        String floor = "the reserve floor of " + f.wh(f.reserveUnits());
        if (f.guaranteed()) {
            String what = switch (r.kind()) {
                case "patrol" -> "keep visiting every checkpoint, lap after lap,";
                case "deadline" -> "complete the mission and dock within the deadline";
                default -> "complete the mission";
            };
            return "GUARANTEED: the robot can always " + what + " " + k + " without its battery going below " + floor
                    + ".";
        }
        String what = switch (r.kind()) {
            case "patrol" -> "drive the battery below " + floor + " or keep the robot from completing its laps";
            case "deadline" -> "make the robot miss the deadline or drive the battery below " + floor;
            default -> "drive the battery below " + floor + " (or stop the mission)";
        };
        return "NOT GUARANTEED: " + k + ", the building can " + what + ", whatever the robot does.";
    }

    private static String ruleWords(MissionResult.Figures f, RuleOfThumb rule) {
        String need = rule.nominalNeedUnits().isPresent() ? f.wh(rule.nominalNeedUnits().getAsInt())
                : "more than the starting charge";
        return rule.marginPercent() + " % margin (" + f.wh(rule.marginUnits()) + "): cheapest run with no disturbance"
                + " needs " + need + ", the charge above the floor is " + f.wh(f.startUnits() - f.reserveUnits())
                + rule.deadline().map(Html::timeWords).orElse("") + "; the rule says " + rule.words() + ".";
    }

    /** The time half of the rule in words: the shortest run and the buffer against the deadline. */
    private static String timeWords(RuleOfThumb.Time t) {
        String deadline = t.deadlineTicks() + (t.deadlineTicks() == 1 ? " turn" : " turns");
        if (t.shortestRunTicks().isEmpty()) {
            return "; no run with no disturbance finishes, so none fits the deadline of " + deadline;
        }
        int run = t.shortestRunTicks().getAsInt();
        String runWords = "the shortest run with no disturbance takes " + run + (run == 1 ? " turn" : " turns");
        if (t.shortestRunTooLong()) {
            return "; even " + runWords + ", more than the deadline of " + deadline;
        }
        return "; " + runWords + ", with a buffer of " + t.marginTicks() + (t.marginTicks() == 1 ? " turn" : " turns")
                + (t.fits() ? " it fits in" : " it does not fit in") + " the deadline of " + deadline;
    }

    private static void dt(StringBuilder sb, String term, String value) {
        sb.append("<dt>").append(escape(term)).append("</dt><dd>").append(escape(value)).append("</dd>\n");
    }

    // ---- traceability

    private static void traceability(StringBuilder sb, List<MissionResult> results, ReportMeta meta) {
        sb.append("<section id=\"traceability\">\n<h2>Traceability</h2>\n<dl class=\"figures\">\n");
        dt(sb, "Tool", "dockline " + meta.version());
        dt(sb, "Date", date(meta));
        dt(sb, "Java", System.getProperty("java.version", "?"));
        sb.append("</dl>\n<h3>Input files</h3>\n<table id=\"inputs\">\n<thead><tr><th>File</th><th>SHA-256</th></tr>"
                + "</thead>\n<tbody>\n");
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (MissionResult r : results) {
            for (MissionResult.Input in : r.inputs()) {
                if (seen.add(in.file())) {
                    sb.append("<tr><td class=\"mono\">").append(escape(in.file())).append("</td><td class=\"mono\">")
                            .append(in.sha256() == null ? "(could not be read)" : in.sha256()).append("</td></tr>\n");
                }
            }
        }
        sb.append("</tbody>\n</table>\n<h3>Rounding of the figures</h3>\n<ul class=\"rounding\">\n");
        for (MissionResult r : results) {
            if (r.figures() != null) {
                sb.append("<li>").append(escape(r.mission() + ": " + r.figures().scale().describe())).append("</li>\n");
            }
        }
        sb.append("<li>").append(escape("Figures are shown in Wh from whole energy units; the rule of thumb's margin is"
                + " rounded up to whole units.")).append("</li>\n</ul>\n</section>\n");
    }

    /** HTML text escaping (also for attribute values). */
    static String escape(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }
}
