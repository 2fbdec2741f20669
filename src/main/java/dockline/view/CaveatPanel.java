package dockline.view;

import dockline.report.Caveats;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/** The safety caveats, always on screen (not hidden in a dialog): {@link Caveats#LINES}. */
final class CaveatPanel extends VBox {

    CaveatPanel() {
        setId("caveats");
        getStyleClass().add("caveats");
        Label title = new Label("Safety \u2014 read before relying on any result");
        title.getStyleClass().add("caveats-title");
        getChildren().add(title);
        for (String line : Caveats.LINES) {
            Label l = new Label("\u2022 " + line);
            l.getStyleClass().add("caveat-line");
            l.setWrapText(true);
            getChildren().add(l);
        }
    }
}
