package dockline.view;

import java.nio.file.Path;

/** Manual look at the picture: writes /tmp/spike-*.png (not a test). */
final class RenderSpike {
    public static void main(String[] args) throws Exception {
        ViewData d = FakeAnalyzer.compute(TestMissions.twoRooms());
        for (Overlay o : Overlay.values()) {
            PictureRenderer.writePng(d, new PictureRenderer.Options(1200, 800, o, -1, -1), Path.of("/tmp/spike-" + o.name().toLowerCase() + ".png"));
        }
        System.exit(0);
    }
}
