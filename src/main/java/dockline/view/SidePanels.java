package dockline.view;

import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/** The look shared by the side panel's sections: a title over the content. */
final class SidePanels {

    private SidePanels() {
    }

    static VBox section(String title, Node... content) {
        Label t = new Label(title);
        t.getStyleClass().add("section-title");
        t.setWrapText(true);
        VBox v = new VBox(t);
        v.getChildren().addAll(content);
        v.getStyleClass().add("section");
        return v;
    }
}
