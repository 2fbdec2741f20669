package dockline.view;

import dockline.model.Mission;
import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/**
 * The top of the window under the menu: the verdict in words, the certificate, the mission's figures
 * (all wrapping, each with its full text as a tooltip too), and a notice bar for problems with files
 * and for offers to reload. FX thread only.
 */
final class HeaderPanel {

    private final Label verdict = new Label("Open a mission (File \u203a Open, Ctrl+O)");
    private final Label certificate = new Label("");
    private final Label figures = new Label("");
    private final VBox notice = new VBox(4);
    private final VBox node;

    HeaderPanel() {
        verdict.setId("verdict");
        verdict.setMaxWidth(Double.MAX_VALUE);
        VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
        certificate.setId("certificate");
        certificate.getStyleClass().add("certificate");
        figures.setId("figures");
        figures.getStyleClass().add("certificate");
        for (Label l : List.of(verdict, certificate, figures)) {
            LongText.wrap(l, 600);
        }
        notice.setId("notice");
        notice.setVisible(false);
        notice.setManaged(false);
        notice.setPadding(new Insets(4, 10, 4, 10));
        notice.setStyle("-fx-background-color: #fde6c4; -fx-border-color: #d99a3a; -fx-border-width: 0 0 1 0;");
        VBox header = new VBox(3, verdict, certificate, figures);
        header.setPadding(new Insets(6, 10, 4, 10));
        node = new VBox(header, notice);
    }

    VBox node() {
        return node;
    }

    Label verdictLabel() {
        return verdict;
    }

    /** A checked (or not yet checked) mission's verdict, certificate and figures. */
    void show(Mission m, VerdictSummary v) {
        verdict.setText(v.headline());
        VerdictStyles.apply(verdict, v.outcome());
        certificate.setText("Certificate: " + v.certificate());
        figures.setText(figuresText(m, v));
    }

    /** Something else than a verdict where the verdict goes (a map alone, nothing open). */
    void showOther(String words) {
        verdict.setText(words);
        VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
        certificate.setText("");
        figures.setText("");
    }

    /** A defect of the tool, shown as an error where the verdict goes, not as a status note. */
    void internalError(String what) {
        verdict.setText("Internal error \u2014 " + what + "; this mission was not checked; do not rely on the result shown"
                + " below");
        VerdictStyles.apply(verdict, VerdictSummary.Outcome.NOT_CHECKED);
    }

    static String figuresText(Mission m, VerdictSummary v) {
        StringBuilder sb = new StringBuilder();
        sb.append("Reserve floor ").append(Units.both(m, m.reserveUnits()));
        sb.append(" \u00b7 starting charge ").append(Units.both(m, m.startUnits()));
        sb.append(" \u00b7 capacity ").append(Units.wh(m, m.capacityUnits()));
        v.worstCaseMinimumUnits().ifPresent(u -> sb.append(" \u00b7 worst-case lowest battery ").append(Units.both(m, u)));
        v.highestReserveUnits().ifPresent(u -> sb.append(" \u00b7 highest floor that can be guaranteed ").append(Units.both(m, u)));
        sb.append(" \u00b7 ").append(m.scale().describe());
        return sb.toString();
    }

    /** Shows the notice with its buttons (a "Dismiss" button when none are given). */
    void showNotice(String text, List<Button> actions) {
        Label l = new Label(text);
        l.setId("notice-text");
        l.setWrapText(true);
        notice.getChildren().setAll(l);
        if (!actions.isEmpty()) {
            HBox h = new HBox(6);
            h.getChildren().addAll(actions);
            notice.getChildren().add(h);
        } else {
            Button ok = new Button("Dismiss");
            ok.setOnAction(e -> hideNotice());
            notice.getChildren().add(ok);
        }
        notice.setVisible(true);
        notice.setManaged(true);
    }

    void hideNotice() {
        notice.setVisible(false);
        notice.setManaged(false);
        notice.getChildren().clear();
    }
}
