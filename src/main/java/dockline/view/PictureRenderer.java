package dockline.view;

import dockline.model.BuildingMap;
import dockline.model.Mission;
import dockline.report.Caveats;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import javax.imageio.ImageIO;

/**
 * The picture {@code dockline render} writes: title and verdict, the map with the chosen overlay
 * and the first replay's path (worst case or counterexample), the keys, the battery chart, and the
 * safety caveat line. Built from the same pieces as the window ({@link MapPainter},
 * {@link Legends}, {@link BatteryChart}); drawn with no display through the headless toolkit.
 */
public final class PictureRenderer {

    /**
     * What to draw.
     *
     * @param width    picture width in pixels
     * @param height   picture height in pixels
     * @param overlay  plain map, heat map or policy
     * @param progress task progress mask for heat map and policy; -1 for the progress at the start
     * @param level    battery level in units for the policy; -1 for every level the policy has
     */
    public record Options(int width, int height, Overlay overlay, int progress, int level) {
        public Options {
            if (width < 400 || height < 300 || width > 8000 || height > 8000) {
                throw new IllegalArgumentException("picture size must be between 400x300 and 8000x8000");
            }
            Objects.requireNonNull(overlay, "overlay");
        }

        public static Options defaults() {
            return new Options(1200, 800, Overlay.HEAT, -1, -1);
        }
    }

    private static final double KEY_WIDTH = 250;

    private PictureRenderer() {
    }

    /** Draws the picture and writes it as PNG, atomically. Starts the headless toolkit if needed. */
    public static void writePng(ViewData data, Options o, Path out) throws IOException {
        BufferedImage img = render(data, o);
        dockline.io.AtomicFiles.write(out, os -> {
            if (!ImageIO.write(img, "png", os)) {
                throw new IOException("no PNG writer available");
            }
        });
    }

    /** Draws the picture as an AWT image. Starts the headless toolkit if needed. */
    public static BufferedImage render(ViewData data, Options o) throws IOException {
        return renderWithGeometry(data, o).image();
    }

    /**
     * A drawn picture and where the map sits in it.
     *
     * @param image   the picture
     * @param mapX    x of the map's top-left corner in the picture
     * @param mapY    y of the map's top-left corner in the picture
     * @param cellPx  edge of one cell in pixels
     */
    record Drawn(BufferedImage image, double mapX, double mapY, double cellPx) {
    }

    static Drawn renderWithGeometry(ViewData data, Options o) throws IOException {
        FxRuntime.startHeadless();
        try {
            return FxRuntime.call(() -> snapshot(data, o));
        } catch (IOException | RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new IOException("could not draw the picture: " + e.getMessage(), e);
        }
    }

    /** Builds, lays out and snapshots the picture; on the FX thread. */
    static Drawn snapshot(ViewData data, Options o) {
        Parent root = build(data, o);
        Scene scene = new Scene(root, o.width(), o.height(), Color.web("#f2f0ea"));
        scene.getStylesheets().add(stylesheet());
        root.applyCss();
        root.layout();
        WritableImage img = new WritableImage(o.width(), o.height());
        SnapshotParameters p = new SnapshotParameters();
        p.setFill(Color.web("#f2f0ea"));
        root.snapshot(p, img);
        Canvas canvas = (Canvas) root.lookup("#picture-map");
        javafx.geometry.Bounds b = canvas.localToScene(canvas.getLayoutBounds());
        double s = (double) canvas.getProperties().get("cellPx");
        return new Drawn(SwingFXUtils.fromFXImage(img, null), b.getMinX(), b.getMinY(), s);
    }

    static String stylesheet() {
        return Objects.requireNonNull(PictureRenderer.class.getResource("dockline.css"), "dockline.css").toExternalForm();
    }

    /** The picture as a node tree of the given size. */
    static Parent build(ViewData data, Options o) {
        Mission m = data.mission();
        BuildingMap map = m.map();
        int progress = o.progress() >= 0 ? o.progress() : ProgressChoices.initialMask(m);
        int level = o.level();
        int budget = map.disturbances().budget();
        List<ViewReplay> replays = data.replays();
        ViewReplay replay = replays.isEmpty() ? null : replays.get(0);
        MapLayers layers = MapLayers.of(data, o.overlay(), budget, progress, level, replay,
                replay == null ? 0 : replay.length());

        Label title = new Label(m.name() + "  \u00b7  " + map.name());
        title.getStyleClass().add("picture-title");
        VerdictSummary v = data.verdict();
        Label verdict = new Label(v.headline());
        verdict.getStyleClass().addAll("verdict", VerdictStyles.of(v.outcome()));
        verdict.setMaxWidth(Double.MAX_VALUE);
        Label cert = new Label("Certificate: " + v.certificate() + "   \u00b7   " + m.scale().describe());
        cert.getStyleClass().add("certificate");
        VBox top = new VBox(3, title, verdict, cert);
        top.setPadding(new Insets(8, 10, 4, 10));

        double headerH = 96;
        double footerH = 26;
        double chartH = Math.max(170, Math.round(o.height() * 0.26));
        double mapW = o.width() - KEY_WIDTH - 30;
        double mapH = o.height() - headerH - footerH - chartH - 16;
        double s = Math.floor(Math.min(mapW / map.width(), mapH / map.height()) * 4) / 4;
        s = Math.max(2, s);
        Canvas canvas = new Canvas(Math.ceil(s * map.width()), Math.ceil(s * map.height()));
        canvas.setId("picture-map");
        canvas.getProperties().put("cellPx", s);
        MapPainter.paint(canvas.getGraphicsContext2D(), layers, 0, 0, s, canvas.getWidth(), canvas.getHeight());
        StackPane mapBox = new StackPane(canvas);
        mapBox.setPrefSize(mapW, mapH);
        mapBox.setMaxSize(mapW, mapH);

        VBox keys = new VBox(8);
        keys.setPrefWidth(KEY_WIDTH);
        keys.setMinWidth(KEY_WIDTH);
        keys.setMaxWidth(KEY_WIDTH);
        Label overlayWords = new Label(overlayCaption(data, o.overlay(), budget, progress, level));
        overlayWords.setWrapText(true);
        overlayWords.getStyleClass().add("legend-label");
        keys.getChildren().add(overlayWords);
        if (o.overlay() == Overlay.HEAT) {
            keys.getChildren().add(Legends.heatKey(m, layers.heatLow(), layers.heatHigh(), layers.heatNote(), layers.heatRanged() != null));
        } else if (o.overlay() == Overlay.POLICY) {
            keys.getChildren().add(Legends.policyKey());
        }
        keys.getChildren().add(Legends.mapKey(map));
        HBox middle = new HBox(10, mapBox, keys);
        middle.setPadding(new Insets(4, 10, 4, 10));

        BatteryChart chart = new BatteryChart();
        chart.show(m, replay);
        if (replay != null) {
            chart.setStep(replay.length());
        }
        chart.node().setPrefHeight(chartH);
        chart.node().setMaxHeight(chartH);
        chart.node().setMinHeight(chartH);

        Label footer = new Label("Safety: " + Caveats.shortLine());
        footer.getStyleClass().add("picture-footer");
        footer.setWrapText(true);
        footer.setMaxWidth(Double.MAX_VALUE);

        VBox bottom = new VBox(2, chart.node(), footer);
        VBox.setVgrow(chart.node(), Priority.NEVER);
        BorderPane root = new BorderPane();
        root.setTop(top);
        root.setCenter(middle);
        root.setBottom(bottom);
        root.setPrefSize(o.width(), o.height());
        root.setMinSize(o.width(), o.height());
        root.setMaxSize(o.width(), o.height());
        return root;
    }

    static String overlayCaption(ViewData data, Overlay overlay, int budget, int progress, int level) {
        Mission m = data.mission();
        String when = "progress: " + progressWords(m, progress) + "; disturbances left: " + budget;
        return switch (overlay) {
            case PLAIN -> "Plain map. " + when;
            case HEAT -> (data.solved() ? "Charge needed per cell. " : "Charge needed per cell (not solved). ") + when;
            case POLICY -> (level < 0 ? "Policy at every battery level it meets. " : "Policy at battery " + Units.both(m, level) + ". ")
                    + when;
        };
    }

    static String progressWords(Mission m, int mask) {
        for (ProgressChoices.Choice c : ProgressChoices.of(m)) {
            if (c.mask() == mask) {
                return c.label();
            }
        }
        return "mask " + mask;
    }
}
