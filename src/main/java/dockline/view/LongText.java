package dockline.view;

import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;

/**
 * Labels whose text may be longer than their place: they wrap, and carry their full text as a tooltip that
 * follows the text (the window's layout rule, DEVELOPERS.md "The desktop window"). FX thread only.
 */
final class LongText {

    private LongText() {
    }

    /** Makes {@code label} wrap and show its whole text in a tooltip at most {@code tooltipWidth} pixels wide. */
    static void wrap(Label label, double tooltipWidth) {
        label.setWrapText(true);
        Tooltip tip = new Tooltip();
        tip.textProperty().bind(label.textProperty());
        tip.setWrapText(true);
        tip.setMaxWidth(tooltipWidth);
        label.setTooltip(tip);
    }
}
