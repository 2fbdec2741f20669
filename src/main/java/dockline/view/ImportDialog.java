package dockline.view;

import dockline.raster.ImportRequest;
import dockline.raster.ImportResult;
import dockline.raster.ImportSettings;
import dockline.raster.RasterException;
import dockline.raster.RasterProblem;
import dockline.raster.Thresholds;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.event.ActionEvent;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/**
 * The view's way to {@code dockline import}: a dialog with the command's options (image, pixel
 * and cell size, robot radius, docks, grey bounds, invert, surface, name, output map), checked and
 * imported exactly as the command does ({@link ImportRequest}, {@link dockline.raster.Importer});
 * on success the map is written atomically and its path returned, so the window opens it. Problems
 * are shown in the dialog, which stays open, and nothing is written. The safety caveats are shown
 * in the dialog as everywhere else.
 */
final class ImportDialog {

    private final Dialog<Path> dialog = new Dialog<>();
    final TextField image = field("import-image", "");
    final TextField pixelSize = field("import-pixel-size", "0.05");
    final TextField cellSize = field("import-cell-size", "0.25");
    final TextField radius = field("import-radius", "");
    final TextField docks = field("import-docks", "");
    final TextField occupied = field("import-occupied", Thresholds.DEFAULT_OCCUPIED);
    final TextField free = field("import-free", Thresholds.DEFAULT_FREE);
    final CheckBox invert = new CheckBox("Light means occupied (invert)");
    final TextField surface = field("import-surface", "floor");
    final TextField name = field("import-name", "");
    final TextField out = field("import-out", "");
    final Label problems = new Label();
    final Label summary = new Label();

    ImportDialog(Window owner, Path folder) {
        dialog.setTitle("Import an occupancy image");
        if (owner != null) {
            dialog.initOwner(owner);
        }
        invert.setId("import-invert");
        problems.setId("import-problems");
        problems.setWrapText(true);
        problems.setStyle("-fx-text-fill: #a01818;");
        summary.setId("import-summary");
        summary.setWrapText(true);
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        int row = 0;
        g.addRow(row++, new Label("Image (PGM, PBM, PNG)"), withButton(image, "Choose\u2026", () -> chooseImage(folder)));
        g.addRow(row++, new Label("Pixel size (m)"), pixelSize);
        g.addRow(row++, new Label("Cell size (m, whole pixels)"), cellSize);
        g.addRow(row++, new Label("Robot radius (m, optional)"), radius);
        g.addRow(row++, new Label("Docks (x,y;x,y in cells)"), docks);
        g.addRow(row++, new Label("Occupied at or below"), occupied);
        g.addRow(row++, new Label("Free at or above"), free);
        g.addRow(row++, new Label(""), invert);
        g.addRow(row++, new Label("Surface of free cells"), surface);
        g.addRow(row++, new Label("Map name (optional)"), name);
        g.addRow(row++, new Label("Map file to write"), withButton(out, "Save as\u2026", () -> chooseOut(folder)));
        Label note = new Label("A cell is free only if every pixel in it is free; unknown counts as occupied. No zones or"
                + " doors are added (maps/README.md, \"Imported maps\").");
        note.setWrapText(true);
        VBox content = new VBox(8, g, note, problems, summary, new CaveatPanel());
        content.setPadding(new Insets(10));
        content.setPrefWidth(620);
        dialog.getDialogPane().setContent(content);
        ButtonType importButton = new ButtonType("Import and open", ButtonBar.ButtonData.OK_DONE);
        dialog.getDialogPane().getButtonTypes().addAll(importButton, ButtonType.CANCEL);
        Path[] written = new Path[1];
        Node ok = dialog.getDialogPane().lookupButton(importButton);
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            written[0] = attempt();
            if (written[0] == null) {
                e.consume();
            }
        });
        dialog.setResultConverter(b -> b == importButton ? written[0] : null);
    }

    /** Shows the dialog; the written map, or empty when cancelled. */
    Optional<Path> showAndWait() {
        return dialog.showAndWait();
    }

    /**
     * Checks the fields and imports: the written map's path, or {@code null} with the problems
     * shown (then nothing was written).
     */
    Path attempt() {
        problems.setText("");
        summary.setText("");
        List<String> bad = new ArrayList<>();
        if (image.getText().isBlank()) {
            bad.add("Image: choose the image to import");
        }
        if (out.getText().isBlank()) {
            bad.add("Map file: choose where to write the map");
        }
        if (!bad.isEmpty()) {
            problems.setText(String.join("\n", bad));
            return null;
        }
        Path img = Path.of(image.getText().strip());
        Path target = Path.of(out.getText().strip());
        ImportRequest request = new ImportRequest(img, pixelSize.getText(), cellSize.getText(), blankToNull(radius.getText()),
                blankToNull(docks.getText()), occupied.getText(), free.getText(), invert.isSelected(), surface.getText().strip(),
                blankToNull(name.getText()));
        ImportSettings settings = request.settings(bad);
        String why = request.outputProblem(target);
        if (why != null) {
            bad.add("Map file " + target + ": " + why);
        }
        if (!bad.isEmpty()) {
            problems.setText(String.join("\n", bad));
            return null;
        }
        try {
            ImportResult r = ImportRequest.run(img, settings, target).result();
            StringBuilder sb = new StringBuilder("Written " + target + ": " + r.width() + " x " + r.height() + " cells, "
                    + r.free() + " free (" + r.lostToFootprint() + " lost to the footprint), " + r.areaSizes().size()
                    + " connected free area" + (r.areaSizes().size() == 1 ? "" : "s") + ".");
            r.warnings().forEach(w -> sb.append("\nWarning: ").append(w));
            summary.setText(sb.toString());
            return target;
        } catch (RasterException e) {
            problems.setText(String.join("\n", e.problems().stream().map(RasterProblem::format).toList()));
        } catch (IOException e) {
            problems.setText("Map file " + target + ": cannot write the map: " + e.getMessage());
        }
        return null;
    }

    private void chooseImage(Path folder) {
        FileChooser fc = new FileChooser();
        fc.setTitle("Occupancy image");
        fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Images", "*.pgm", "*.pbm", "*.png"),
                new FileChooser.ExtensionFilter("All files", "*"));
        if (folder != null && folder.toFile().isDirectory()) {
            fc.setInitialDirectory(folder.toFile());
        }
        File f = fc.showOpenDialog(dialog.getOwner());
        if (f != null) {
            image.setText(f.getPath());
            if (out.getText().isBlank()) {
                String n = f.getName();
                int dot = n.lastIndexOf('.');
                out.setText(new File(f.getParentFile(), (dot > 0 ? n.substring(0, dot) : n) + ".yaml").getPath());
            }
        }
    }

    private void chooseOut(Path folder) {
        FileChooser fc = new FileChooser();
        fc.setTitle("Map file to write");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Map files", "*.yaml", "*.yml"));
        if (folder != null && folder.toFile().isDirectory()) {
            fc.setInitialDirectory(folder.toFile());
        }
        File f = fc.showSaveDialog(dialog.getOwner());
        if (f != null) {
            out.setText(f.getPath());
        }
    }

    private static TextField field(String id, String value) {
        TextField t = new TextField(value);
        t.setId(id);
        return t;
    }

    private static HBox withButton(TextField f, String text, Runnable action) {
        Button b = new Button(text);
        b.setOnAction(e -> action.run());
        HBox h = new HBox(6, f, b);
        HBox.setHgrow(f, Priority.ALWAYS);
        return h;
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s;
    }
}
