package dockline.view;

import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javax.imageio.ImageIO;

/** Manual look at the window and the picture (a developer aid, not a test): writes /tmp/spike-*.png. */
final class RenderSpike {
    public static void main(String[] args) throws Exception {
        FxRuntime.startHeadless();
        Path mission = Path.of(args.length > 0 ? args[0] : "missions/night-round.yaml");
        String overlay = args.length > 1 ? args[1] : "heat";
        int steps = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        MissionWindow w = FxRuntime.call(() -> new MissionWindow(new SolverAnalyzer(), new FileMissionSource(), null));
        FxRuntime.call(() -> {
            javafx.scene.Scene sc = w.scene(1260, 780);
            javafx.stage.Stage st = new javafx.stage.Stage();
            st.setScene(sc);
            st.show();
            w.open(mission);
            return null;
        });
        while (FxRuntime.call(() -> w.taskProperty().get() != null)) {
            Thread.sleep(200);
        }
        FxRuntime.call(() -> {
            w.setOverlay(Overlay.ofOption(overlay));
            for (int i = 0; i < steps; i++) {
                w.player().stepForward();
            }
            return null;
        });
        Thread.sleep(300);
        var img = FxRuntime.call(() -> w.root().getScene().snapshot(null));
        ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", new java.io.File("/tmp/spike-window.png"));
        System.exit(0);
    }
}
