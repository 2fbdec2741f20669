package dockline.view;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.SnapshotParameters;
import javafx.scene.control.Label;
import javafx.scene.image.ImageView;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import javax.imageio.ImageIO;

/**
 * "Export picture": the map as the window shows it now (overlay, replay step, zoom), with the
 * verdict and the step in words above and below it and the safety caveats at the foot, written as
 * a PNG through {@link dockline.io.AtomicFiles} (the whole file or none). FX thread only; cost: one
 * snapshot of the map and one of the composed picture.
 */
final class PictureExport {

    private PictureExport() {
    }

    /** The picture as an image: {@code heading} over the snapshot of {@code map}, {@code caption} under it. */
    static BufferedImage compose(Node map, String heading, String caption) {
        SnapshotParameters p = new SnapshotParameters();
        p.setFill(Color.web("#eceae4"));
        WritableImage shot = map.snapshot(p, null);
        double w = Math.max(480, shot.getWidth());
        Label title = new Label(heading);
        title.getStyleClass().add("picture-title");
        title.setWrapText(true);
        title.setMaxWidth(w);
        Label under = new Label(caption);
        under.setWrapText(true);
        under.setMaxWidth(w);
        CaveatPanel caveats = new CaveatPanel();
        caveats.setMaxWidth(w);
        VBox box = new VBox(6, title, new ImageView(shot), under, caveats);
        box.setPadding(new Insets(8));
        box.setStyle("-fx-background-color: #f2f0ea;");
        Scene scene = new Scene(box);
        scene.getStylesheets().add(PictureRenderer.stylesheet());
        box.applyCss();
        box.layout();
        SnapshotParameters q = new SnapshotParameters();
        q.setFill(Color.web("#f2f0ea"));
        return SwingFXUtils.fromFXImage(box.snapshot(q, null), null);
    }

    /** Asks where to write the picture (a save dialog), starting in {@code folder} with a name made of {@code name}. */
    static java.util.Optional<Path> choose(javafx.stage.Window owner, Path folder, String name) {
        return SaveDialogs.ask(owner, "Export the picture as PNG", "PNG pictures", ".png", folder, name);
    }

    /**
     * Writes the picture as a PNG, atomically.
     *
     * @throws IOException in plain words; the file is then untouched
     */
    static void writePng(BufferedImage img, Path out) throws IOException {
        dockline.io.AtomicFiles.write(out, os -> {
            if (!ImageIO.write(img, "png", os)) {
                throw new IOException("no PNG writer is available");
            }
        });
    }
}
