package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Cell;
import dockline.model.Mission;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.paint.Color;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The rendered picture: size, format, and that walls, docks and the heat map look as the key says. */
class PictureRendererTest {

    @TempDir
    Path tmp;

    /**
     * Starts the toolkit the way TestFX does, so that window tests running later in the same JVM
     * get TestFX's headless set-up (a toolkit started by plain Platform.startup first leaves
     * TestFX's robot without input).
     */
    @org.junit.jupiter.api.BeforeAll
    static void toolkit() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
    }

    private static int rgb(Color c) {
        return ((int) Math.round(c.getRed() * 255) << 16) | ((int) Math.round(c.getGreen() * 255) << 8)
                | (int) Math.round(c.getBlue() * 255);
    }

    private static int pixel(PictureRenderer.Drawn d, Cell c, double fx, double fy) {
        int x = (int) Math.floor(d.mapX() + (c.x() + fx) * d.cellPx());
        int y = (int) Math.floor(d.mapY() + (c.y() + fy) * d.cellPx());
        return d.image().getRGB(x, y) & 0xffffff;
    }

    private static boolean near(int a, int b, int tol) {
        return Math.abs(((a >> 16) & 255) - ((b >> 16) & 255)) <= tol
                && Math.abs(((a >> 8) & 255) - ((b >> 8) & 255)) <= tol
                && Math.abs((a & 255) - (b & 255)) <= tol;
    }

    @Test
    void writes_a_png_of_the_asked_size() throws Exception {
        ViewData d = FakeAnalyzer.compute(TestMissions.twoRooms());
        Path out = tmp.resolve("sub/map.png");
        PictureRenderer.writePng(d, new PictureRenderer.Options(900, 640, Overlay.POLICY, -1, -1), out);
        BufferedImage img = ImageIO.read(out.toFile());
        assertThat(img.getWidth()).isEqualTo(900);
        assertThat(img.getHeight()).isEqualTo(640);
        try (var files = Files.list(out.getParent())) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("map.png");
        }
    }

    @Test
    void a_wall_cell_and_a_dock_cell_have_their_own_colours() throws Exception {
        Mission m = TestMissions.twoRooms();
        ViewData d = FakeAnalyzer.compute(m);
        PictureRenderer.Drawn drawn = PictureRenderer.renderWithGeometry(d, PictureRenderer.Options.defaults());
        assertThat(drawn.image().getWidth()).isEqualTo(1200);
        assertThat(drawn.image().getHeight()).isEqualTo(800);
        assertThat(drawn.cellPx()).isGreaterThan(10);
        Cell wall = new Cell(13, 6);
        Cell dock = new Cell(11, 1); // the dock the replay does not end on (no robot over it)
        assertThat(m.map().terrainAt(wall).wall()).isTrue();
        assertThat(m.map().terrainAt(dock).dock()).isTrue();
        int w = pixel(drawn, wall, 0.5, 0.5);
        int k = pixel(drawn, dock, 0.7, 0.3);
        assertThat(near(w, rgb(Palette.WALL), 6) || near(w, rgb(Palette.WALL_HATCH), 6))
                .as("wall pixel %06x", w).isTrue();
        assertThat(near(k, rgb(Palette.DOCK), 6)).as("dock pixel %06x", k).isTrue();
        assertThat(near(w, k, 40)).isFalse();
    }

    @Test
    void impossible_cells_are_crossed_not_only_coloured() throws Exception {
        // a room with no way to a dock: every cell is impossible in the stand-in's heat map
        Mission m = TestMissions.twoRooms();
        ViewData base = FakeAnalyzer.compute(m);
        ViewData allImpossible = new ViewData() {
            public Mission mission() {
                return m;
            }

            public VerdictSummary verdict() {
                return base.verdict();
            }

            public boolean solved() {
                return true;
            }

            public int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
                return IMPOSSIBLE;
            }

            public java.util.Optional<dockline.arena.Action> policyAction(int c, int l, int b, int p) {
                return java.util.Optional.empty();
            }

            public java.util.List<ViewReplay> replays() {
                return java.util.List.of();
            }
        };
        PictureRenderer.Drawn drawn = PictureRenderer.renderWithGeometry(allImpossible, PictureRenderer.Options.defaults());
        Cell c = new Cell(8, 3);
        // the cross runs through the centre (light mark) while the corner keeps the dark fill
        int centre = pixel(drawn, c, 0.5, 0.5);
        int corner = pixel(drawn, c, 0.1, 0.9);
        assertThat(near(centre, rgb(Palette.IMPOSSIBLE_MARK), 10)).as("centre %06x", centre).isTrue();
        assertThat(near(corner, rgb(Palette.IMPOSSIBLE), 10)).as("corner %06x", corner).isTrue();
    }
}
