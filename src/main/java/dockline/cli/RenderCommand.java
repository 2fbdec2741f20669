package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.io.Quantities;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.report.Caveats;
import dockline.view.Overlay;
import dockline.view.PictureRenderer;
import dockline.view.SolverAnalyzer;
import dockline.view.VerdictSummary;
import dockline.view.ViewData;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code dockline render MISSION --out PICTURE.png}: solves the mission and draws the map (plain,
 * heat map or policy), the worst-case or counterexample path, the battery chart and the safety
 * line into a PNG, with no display (headless toolkit). The file is written atomically. The solving is
 * the core's ({@link dockline.plan.MissionPlanner}, through the view's {@link SolverAnalyzer} on the route of
 * {@link dockline.plan.PictureRoute}: the exported policy's, so the path drawn is a run of the policy {@code export}
 * writes; on a large mission with lasting closures the heat map is one of bounds, which the picture's key and the
 * text output explain); with
 * {@code --json} the result is one JSON object (src/main/resources/dockline/schemas/render.schema.json). A patrol
 * or a deadline mission is planned by {@link dockline.plan.RoundsPlan} (the window's adapter of it): the picture shows
 * its lasso (the way in and one lap of the loop) or its slowest play.
 */
@Command(name = "render",
        description = {"Solves a mission and draws it as a PNG picture, with no display needed.",
                "The picture shows the map with the charge needed per cell (or the policy), the worst-case path,",
                "the battery chart and the safety caveat."},
        exitCodeList = {"0:picture written; the mission is guaranteed", "1:picture written; the mission is not guaranteed",
                "2:bad input or usage (nothing written)", "3:over a resource limit (nothing written)",
                "4:internal error (also: the solver's policy failed the independent certificate check)"})
public final class RenderCommand extends CommandBase {

    private static final Pattern SIZE = Pattern.compile("(\\d{3,4})[xX](\\d{3,4})");

    @Parameters(index = "0", paramLabel = "MISSION", description = "the mission file (YAML)")
    Path mission;

    @Option(names = "--out", required = true, paramLabel = "PNG", description = "the picture to write")
    Path out;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1200x800",
            description = "picture size in pixels (default: ${DEFAULT-VALUE})")
    String size;

    @Option(names = "--layer", paramLabel = "LAYER", defaultValue = "heat",
            description = "what to draw over the map: heat (charge needed), policy or plain (default: ${DEFAULT-VALUE})")
    String layer;

    @Option(names = "--reserve", paramLabel = "CHARGE", description = "reserve floor instead of the mission's, e.g. 25%% or '9 Wh'")
    String reserve;

    @Option(names = "--start-charge", paramLabel = "CHARGE",
            description = "starting charge instead of the mission's, e.g. 80%% or '30 Wh'")
    String start;

    @Mixin
    JsonOption json;

    @Mixin
    QuietOption quiet;

    @Override
    int run(PrintWriter outw, PrintWriter err) throws MissionOptions.BadInput {
        Matcher sm = SIZE.matcher(size.trim());
        Overlay overlay;
        try {
            overlay = Overlay.ofOption(layer);
        } catch (IllegalArgumentException e) {
            err.println("dockline render: --layer: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        PictureRenderer.Options options;
        try {
            if (!sm.matches()) {
                throw new IllegalArgumentException("write the size as WIDTHxHEIGHT, e.g. 1200x800");
            }
            options = new PictureRenderer.Options(Integer.parseInt(sm.group(1)), Integer.parseInt(sm.group(2)), overlay, -1, -1);
        } catch (IllegalArgumentException e) {
            err.println("dockline render: --size " + size + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        Mission m = MissionOptions.read(mission, err);
        try {
            if (reserve != null) {
                m = m.withReserve(charge("--reserve", reserve, m));
            }
            if (start != null) {
                m = m.withStartCharge(charge("--start-charge", start, m));
            }
        } catch (IllegalArgumentException e) {
            err.println("dockline render: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        if (MissionOptions.floorProblem(mission, m, reserve != null, start != null, err)) {
            return ExitCodes.BAD_INPUT;
        }
        if (m.beyondOneTrip() && overlay == Overlay.HEAT) {
            // no charge-needed map for these goals (it would depend on the lap or the turns left): the plain map
            overlay = Overlay.PLAIN;
            options = new PictureRenderer.Options(options.width(), options.height(), overlay, -1, -1);
        }
        String badOut = MissionOptions.outputProblem(out, mission, m);
        if (badOut != null) {
            err.println("dockline: --out " + (out.toString().isEmpty() ? "''" : out) + ": " + badOut);
            return ExitCodes.BAD_INPUT;
        }
        ViewData data;
        try (ProgressLine.Frame progress = ProgressLine.open(outw, err, json.requested, quiet.quiet)) {
            // a patrol or a deadline mission goes through the core's rounds plan and its lasso (or slowest
            // play), as in the window
            data = new SolverAnalyzer().analyze(m, () -> false);
        } catch (IllegalArgumentException e) {
            if (!(e.getCause() instanceof dockline.model.ResourceLimitException)) {
                throw e; // not the input's fault: an internal error (exit 4, Failures)
            }
            err.println("dockline render: " + e.getMessage());
            return ExitCodes.RESOURCE_LIMIT;
        }
        try {
            PictureRenderer.writePng(data, options, out);
        } catch (IOException e) {
            err.println("dockline render: cannot write " + out + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        VerdictSummary v = data.verdict();
        if (json.requested) {
            ObjectNode o = Json.object();
            o.put("mission", m.name());
            o.put("file", m.source() == null ? null : m.source().toString());
            o.put("verdict", switch (v.outcome()) {
                case GUARANTEED -> dockline.solve.Verdict.GUARANTEED.word();
                case NOT_GUARANTEED -> dockline.solve.Verdict.NOT_GUARANTEED.word();
                case NOT_CHECKED -> "not-certified";
            });
            o.put("picture", out.toString());
            o.put("width", options.width());
            o.put("height", options.height());
            o.put("layer", overlay.name().toLowerCase(java.util.Locale.ROOT));
            o.put("headline", v.headline());
            Json.putOptional(o, "lowestLevelUnits", v.worstCaseMinimumUnits());
            Json.putOptional(o, "highestReserveUnits", v.highestReserveUnits());
            outw.println(Json.withCaveats(o));
        } else {
            outw.println("wrote " + out + " (" + options.width() + "x" + options.height() + ", " + overlay.word() + ")");
            outw.println(v.headline());
            if (overlay == Overlay.HEAT && data.heatNote() != null) {
                outw.println(data.heatNote()); // the heat layer is not exact everywhere: say what it claims
            }
            outw.println(Caveats.block());
        }
        outw.flush();
        return switch (v.outcome()) {
            case GUARANTEED -> ExitCodes.OK;
            case NOT_GUARANTEED -> ExitCodes.NOT_GUARANTEED;
            case NOT_CHECKED -> ExitCodes.INTERNAL; // the policy failed the independent certificate check
        };
    }

    private static Charge charge(String option, String text, Mission m) {
        Charge c;
        try {
            c = Quantities.parseCharge(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage());
        }
        String wrong = Quantities.checkAgainstCapacity(c, m.robot().capacityWh());
        if (wrong != null) {
            throw new IllegalArgumentException(option + ": " + wrong);
        }
        return c;
    }
}
