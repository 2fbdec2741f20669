package dockline.view;

import static dockline.view.FxTests.fx;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MapLoader;
import dockline.model.BuildingMap;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The view's import dialog imports exactly as {@code dockline import} does: the demo image with
 * the documented options gives the committed map (maps/README.md), and bad fields are shown in the
 * dialog with nothing written.
 */
@ExtendWith(ApplicationExtension.class)
class ImportDialogTest {

    @TempDir
    Path dir;

    @Start
    void start(Stage stage) {
        stage.setScene(new Scene(new StackPane(), 200, 100));
        stage.show();
    }

    @Test
    void the_demo_image_gives_the_committed_map() throws Exception {
        Path out = dir.resolve("depot.yaml");
        Path written = fx(() -> {
            ImportDialog d = new ImportDialog(null, Path.of("maps"));
            d.image.setText("maps/depot-annex.pgm");
            d.pixelSize.setText("0.1");
            d.cellSize.setText("0.3");
            d.radius.setText("0.25");
            d.docks.setText("36,13;36,20");
            d.name.setText("Depot annex (demo, imported)");
            d.out.setText(out.toString());
            Path p = d.attempt();
            assertThat(d.problems.getText()).isEmpty();
            assertThat(d.summary.getText()).contains("40 x 28 cells, 334 free (315 lost to the footprint), 2 connected");
            return p;
        });
        assertThat(written).isEqualTo(out);
        assertThat(Files.readString(out)).isEqualTo(Files.readString(Path.of("maps/depot-annex.yaml")));
        BuildingMap m = MapLoader.load(out);
        assertThat(m.docks()).hasSize(2);
    }

    @Test
    void bad_fields_are_shown_and_nothing_is_written() {
        Path out = dir.resolve("never.yaml");
        String shown = fx(() -> {
            ImportDialog d = new ImportDialog(null, null);
            d.image.setText("maps/depot-annex.pgm");
            d.pixelSize.setText("0.2");
            d.cellSize.setText("0.3");
            d.out.setText(out.toString());
            assertThat(d.attempt()).isNull();
            String first = d.problems.getText();
            d.pixelSize.setText("0.1");
            d.docks.setText("0,0");
            assertThat(d.attempt()).isNull();
            return first + "\n" + d.problems.getText();
        });
        assertThat(shown).contains("--cell-size 0.3: the cell size 0.3 m is not a whole multiple of the pixel size 0.2 m")
                .contains("maps/depot-annex.pgm: dock 0:0 is on an occupied cell");
        assertThat(out).doesNotExist();
    }
}
