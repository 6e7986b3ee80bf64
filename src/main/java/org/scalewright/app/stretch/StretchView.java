package org.scalewright.app.stretch;

import java.util.List;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.fx.ChartViewer;
import org.scalewright.app.tool.Tool;
import org.scalewright.chart.StretchChart;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;

/**
 * The Tuning stretch tab: the stretch curve of the working scale (cents from equal temperament
 * over key number) for the chosen octave type, redrawn after every edit of the scale or A4.
 */
public final class StretchView {
    private final StretchViewModel model;
    private final Label empty = new Label("No scale open.");
    private ChartViewer viewer;
    private final BorderPane root = new BorderPane();

    StretchView(StretchViewModel model) {
        this.model = model;
        ChoiceBox<OctaveType> octave = new ChoiceBox<>();
        octave.setId("stretch-octave");
        octave.getItems().setAll(OctaveType.values());
        octave.valueProperty().bindBidirectional(model.octaveProperty());
        octave.setTooltip(new Tooltip("the octave tuned beatless: 2:1 matches the upper note's fundamental with the "
                + "lower note's partial 2; 4:2 partial 2 with 4; 6:3 partial 3 with 6"));
        CheckBox all = new CheckBox("draw all three");
        all.setId("stretch-all");
        all.setMinWidth(CheckBox.USE_PREF_SIZE);
        all.selectedProperty().bindBidirectional(model.showAllProperty());
        Label octaveLabel = new Label("Octave type");
        octaveLabel.getStyleClass().add("tool-label");
        octaveLabel.setMinWidth(Label.USE_PREF_SIZE);
        Label summary = new Label();
        summary.setId("stretch-summary");
        summary.setWrapText(true);
        summary.textProperty().bind(model.summaryProperty());
        summary.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(summary, javafx.scene.layout.Priority.ALWAYS);
        HBox bar = new HBox(8, octaveLabel, octave, all, summary);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 8, 4, 8));
        root.setTop(bar);
        model.drawnProperty().addListener((o, a, b) -> show(b));
        show(model.drawnProperty().get());
    }

    private void show(List<StretchCurve> curves) {
        if (curves.isEmpty()) {
            root.setCenter(empty);
            return;
        }
        JFreeChart chart = StretchChart.build(model.title(), curves);
        // the tab is short: the summary above names the octave type, so no title, a short axis label
        // and a legend only when more than one octave type is drawn
        chart.setTitle((org.jfree.chart.title.TextTitle) null);
        chart.getXYPlot().getRangeAxis().setLabel("stretch, cents");
        if (curves.size() == 1) {
            chart.removeLegend();
        }
        if (viewer == null) {
            viewer = new ChartViewer(chart);
            viewer.setId("stretch-chart");
            viewer.setMinHeight(60);
        } else {
            viewer.setChart(chart);
        }
        root.setCenter(viewer);
    }

    /** @return the chart shown, or null with no scale open */
    JFreeChart chart() {
        return viewer == null || root.getCenter() != viewer ? null : viewer.getChart();
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(StretchViewModel model) {
        return new Tool("Tuning stretch", "stretch-tab", () -> new StretchView(model).node());
    }

    /** @return the panel */
    Node node() {
        return root;
    }
}
