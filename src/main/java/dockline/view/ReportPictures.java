package dockline.view;

import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import java.util.OptionalInt;
import javax.imageio.ImageIO;

/**
 * The report's map pictures, drawn by the same code as {@code dockline render} ({@link PictureRenderer},
 * headless toolkit): for a one-trip mission the plan's heat map and worst case (or counterexample), for a
 * patrol or deadline mission the plain map with the given run. Pictures are drawn one at a time on the
 * toolkit's thread, so several report workers may call this at once.
 */
public final class ReportPictures implements dockline.report.Pictures {

    /** The picture size in the report (fits the width of an A4 page at print resolution). */
    private final PictureRenderer.Options oneTrip = new PictureRenderer.Options(1100, 760, Overlay.HEAT, -1, -1);
    private final PictureRenderer.Options rounds = new PictureRenderer.Options(1100, 760, Overlay.PLAIN, -1, -1);

    @Override
    public byte[] oneTrip(Plan plan) throws IOException {
        return png(PictureRenderer.render(SolverAnalyzer.of(plan), oneTrip));
    }

    @Override
    public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) throws IOException {
        ViewReplay r = ReplayAdapter.of(mission, run, guaranteed ? ViewReplay.Kind.WORST_CASE
                : ViewReplay.Kind.COUNTEREXAMPLE, SolverAnalyzer.title(mission, run, guaranteed ? "worst case" : "the"
                + " building wins"));
        VerdictSummary v = new VerdictSummary(guaranteed ? VerdictSummary.Outcome.GUARANTEED
                : VerdictSummary.Outcome.NOT_GUARANTEED, headline, "see the report", OptionalInt.empty(),
                OptionalInt.empty());
        return png(PictureRenderer.render(new RunOnly(mission, v, List.of(r)), rounds));
    }

    private static byte[] png(BufferedImage img) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        if (!ImageIO.write(img, "png", bytes)) {
            throw new IOException("no PNG writer available");
        }
        return bytes.toByteArray();
    }

    /** A mission with one run to draw and nothing else (no heat map, no policy). */
    private record RunOnly(Mission mission, VerdictSummary verdict, List<ViewReplay> replays) implements ViewData {
    }
}
