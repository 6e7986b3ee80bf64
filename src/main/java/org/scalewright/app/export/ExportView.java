package org.scalewright.app.export;

import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.scalewright.app.tool.Tool;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.report.ReportPaper;

/**
 * The Exports tab: the whole report into a folder, or one table, chart or the PDF alone into a
 * file; beside them, what the last export wrote.
 */
public final class ExportView {
    private final ExportViewModel model;
    private final HBox root;

    ExportView(ExportViewModel model) {
        this.model = model;
        Button report = new Button("Whole report into a folder…");
        report.setId("export-report");
        report.setDefaultButton(false);
        report.setOnAction(e -> model.exportReportInBackground());
        report.disableProperty().bind(model.busyProperty());
        report.setTooltip(new Tooltip("report.pdf, the four charts as PNG and SVG, results, schedule, "
                + "wound-order, wire-order and stretch as CSV, and the five tables together in tables.xlsx"));
        Label reportText = small("PDF, charts and the five tables (CSV and one .xlsx)");
        report.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);

        Label settings = small("");
        settings.textProperty().bind(model.settingsTextProperty());
        ChoiceBox<OctaveType> octave = new ChoiceBox<>();
        octave.setId("export-octave");
        octave.getItems().setAll(OctaveType.values());
        octave.valueProperty().bindBidirectional(model.octaveProperty());
        octave.setTooltip(new Tooltip("octave type of stretch_cents in the stretch table (the PDF shows all three)"));

        ChoiceBox<ReportPaper> paper = new ChoiceBox<>();
        paper.setId("export-paper");
        paper.getItems().setAll(ReportPaper.values());
        paper.valueProperty().bindBidirectional(model.paperProperty());
        paper.setTooltip(new Tooltip("paper of the PDF report (A4 for metric units, Letter for imperial "
                + "until you choose)"));

        FlowPane choices = flow(heading("Choices"), small("stretch for"), octave, small("octaves"), small("PDF on"),
                paper, small("paper"));

        FlowPane tables = flow(heading("Tables (CSV, or .xlsx by name)"));
        for (ExportPiece p : ExportPiece.all()) {
            if (p.format() == ExportFormat.CSV) {
                tables.getChildren().add(button(p, p.title()));
            }
        }

        FlowPane charts = flow(heading("Charts"));
        for (ExportContent c : ExportContent.values()) {
            if (c.isChart()) {
                HBox pair = new HBox(2, small(c.title().replace(" curve", "")));
                c.formats().forEach(f -> pair.getChildren().add(button(new ExportPiece(c, f),
                        f.extension().toUpperCase(Locale.ROOT))));
                pair.setAlignment(Pos.CENTER_LEFT);
                charts.getChildren().add(pair);
            }
        }
        FlowPane pdf = flow(heading("PDF"), button(ExportPiece.PDF, "PDF report alone…"));

        HBox top = new HBox(8, report, reportText);
        top.setAlignment(Pos.CENTER_LEFT);
        VBox left = new VBox(6, top, settings, choices, tables, charts, pdf);
        left.setPadding(new Insets(6, 8, 6, 8));
        left.setFillWidth(true);
        ScrollPane scroll = new ScrollPane(left);
        scroll.setFitToWidth(true);
        scroll.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        HBox.setHgrow(scroll, Priority.ALWAYS);

        Label note = new Label();
        note.setId("export-note");
        note.setWrapText(true);
        note.textProperty().bind(model.noteProperty());
        model.noteIsProblemProperty().addListener((o, was, is) -> {
            note.getStyleClass().remove("export-problem");
            if (is) {
                note.getStyleClass().add("export-problem");
            }
        });
        ListView<ExportViewModel.Written> list = new ListView<>(model.written());
        list.setId("export-written");
        list.setPlaceholder(new Label(""));
        list.setPrefWidth(250);
        VBox.setVgrow(list, Priority.ALWAYS);
        VBox right = new VBox(4, note, list);
        right.setPadding(new Insets(6, 8, 6, 0));
        right.setPrefWidth(270);
        right.setMinWidth(200);
        root = new HBox(scroll, right);
        root.getStyleClass().add("export-tool");
    }

    private Button button(ExportPiece p, String text) {
        Button b = new Button(text);
        b.setId("export-" + p.id());
        b.setOnAction(e -> model.export(p));
        b.setTooltip(new Tooltip(p.title() + " as " + p.format().extension().toUpperCase(Locale.ROOT)
                + ", into a file you choose"));
        b.setMinWidth(Button.USE_PREF_SIZE);
        return b;
    }

    private static FlowPane flow(Node... first) {
        FlowPane f = new FlowPane(6, 4, first);
        f.setAlignment(Pos.CENTER_LEFT);
        return f;
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("tool-label");
        l.setMinWidth(Label.USE_PREF_SIZE);
        l.setStyle("-fx-font-weight: bold;");
        return l;
    }

    private static Label small(String text) {
        Label l = new Label(text);
        l.setMinWidth(Label.USE_PREF_SIZE);
        return l;
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(ExportViewModel model) {
        return new Tool("Exports", "exports-tab", () -> new ExportView(model).node());
    }

    /** @return the panel */
    Node node() {
        return root;
    }
}
