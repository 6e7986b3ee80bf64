package org.scalewright.app.diagnosis;

import java.util.List;
import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.collections.ListChangeListener;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.tool.ToolLayout;

/**
 * The diagnosis panel: the key range, the margin and the tables to compare on top; under them
 * the notes of the range (those standing out marked) beside the finding, the changes that would
 * help with their computed effect, and what to inspect. Binds and lays out
 * {@link DiagnosisViewModel} only.
 */
public final class DiagnosisView {
    private final BorderPane root = new BorderPane();

    DiagnosisView(DiagnosisViewModel model) {
        root.setId("diagnosis");
        root.setPadding(ToolLayout.padding());
        Runnable run = model::diagnose;
        var keys = ToolLayout.entry("diagnosis-keys", model.rangeProperty(), 7, run);
        keys.setTooltip(new Tooltip("key numbers or note names: 64-71 or C6-G6"));
        Button section = new Button("Section of selected key");
        section.setOnAction(e -> model.useSectionOfSelection());
        var margin = ToolLayout.entry("diagnosis-margin", model.marginProperty(), 3, run);
        margin.setTooltip(new Tooltip("a note stands out when it differs from its section's trend by more than this"));
        Label tables = new Label();
        tables.textProperty().bind(model.candidateNamesProperty());
        tables.setMaxWidth(240);
        Button add = new Button("Add maker's table…");
        add.setId("diagnosis-add-table");
        add.setOnAction(e -> model.addCandidate());
        Button clear = new Button("None");
        clear.setOnAction(e -> model.clearCandidates());
        clear.disableProperty().bind(model.candidateNamesProperty().isEqualTo("none"));
        Button diagnose = new Button("Diagnose");
        diagnose.setId("diagnosis-run");
        diagnose.setOnAction(e -> model.diagnose());
        Button export = new Button("Export CSV…");
        export.setId("diagnosis-export");
        export.disableProperty().bind(model.reportProperty().isNull());
        export.setOnAction(e -> model.exportCsv());
        Button off = new Button("Clear");
        off.setTooltip(new Tooltip("take the results and their marks off the curves"));
        off.disableProperty().bind(model.reportProperty().isNull());
        off.setOnAction(e -> model.clear());
        FlowPane form = new FlowPane(12, 4,
                ToolLayout.field("Keys:", keys, section),
                ToolLayout.field("Margin:", margin, new Label("%")),
                ToolLayout.field("Compare tables:", tables, add, clear),
                ToolLayout.field("", diagnose, export, off));
        Label problem = ToolLayout.paragraph("diagnosis-problem");
        problem.setStyle("-fx-text-fill: #b00020; -fx-font-weight: bold;");
        problem.textProperty().bind(Bindings.when(model.staleProperty())
                .then("The scale or settings changed since this diagnosis: press Diagnose again.")
                .otherwise(model.problemProperty()));
        problem.visibleProperty().bind(problem.textProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());
        root.setTop(new VBox(4, form, problem));

        TableView<DiagnosisViewModel.Row> table = new TableView<>(model.rows());
        var stress = ToolLayout.<DiagnosisViewModel.Row>column("stress", 82, true, model::stressText);
        var stressHeader = model.stressHeader();
        stress.textProperty().bind(stressHeader);
        stressHeader.addListener((o, a, b) -> table.refresh());
        table.setId("diagnosis-table");
        table.setPlaceholder(new Label("Choose the keys where strings break, then press Diagnose."));
        table.getColumns().setAll(List.of(
                ToolLayout.<DiagnosisViewModel.Row>column("key", 40, true, r -> Integer.toString(r.key())),
                ToolLayout.<DiagnosisViewModel.Row>column("note", 44, false, DiagnosisViewModel.Row::note),
                stress,
                ToolLayout.<DiagnosisViewModel.Row>column("% break", 60, true, r -> f(r.breakPct(), 1)),
                ToolLayout.<DiagnosisViewModel.Row>column("trend %", 58, true, r -> f(r.trendPct(), 1)),
                ToolLayout.<DiagnosisViewModel.Row>column("from trend", 78, true,
                        r -> String.format(Locale.ROOT, "%+.1f %%", r.deviationPct())),
                ToolLayout.<DiagnosisViewModel.Row>column("headroom c", 76, true,
                        r -> f(r.headroomCents(), 0)),
                ToolLayout.<DiagnosisViewModel.Row>column("breaks at Hz", 80, true, r -> f(r.breakHz(), 1)),
                ToolLayout.<DiagnosisViewModel.Row>column("stands out", 72, false,
                        DiagnosisViewModel.Row::standsOut)));
        ToolLayout.results(table, r -> r.standsOut().equals("high"),
                r -> r.breakPct() >= model.cautionPct(), model::select);

        Label finding = ToolLayout.paragraph("diagnosis-finding");
        finding.textProperty().bind(model.findingProperty());
        VBox remedies = new VBox(3);
        remedies.setId("diagnosis-remedies");
        VBox inspect = new VBox(2);
        inspect.setId("diagnosis-inspect");
        Runnable fill = () -> fill(model, remedies, inspect);
        model.remedies().addListener((ListChangeListener<DiagnosisViewModel.RemedyLine>) c -> fill.run());
        model.inspect().addListener((ListChangeListener<String>) c -> fill.run());
        VBox details = new VBox(6, finding, remedies, inspect);
        details.setPadding(ToolLayout.padding());
        details.visibleProperty().bind(model.reportProperty().isNotNull());
        ScrollPane scroll = new ScrollPane(details);
        scroll.setFitToWidth(true);
        SplitPane results = new SplitPane(table, scroll);
        results.setOrientation(Orientation.HORIZONTAL);
        results.setDividerPositions(0.56);
        root.setCenter(results);
    }

    private static void fill(DiagnosisViewModel model, VBox remedies, VBox inspect) {
        remedies.getChildren().clear();
        if (!model.remedies().isEmpty()) {
            Label t = new Label(String.format(Locale.ROOT, "Changes to bring the range under the caution band "
                    + "(%.0f %%), each applied and recomputed", model.cautionPct()));
            t.getStyleClass().add("tool-label");
            t.setWrapText(true);
            remedies.getChildren().add(t);
            int i = 1;
            for (DiagnosisViewModel.RemedyLine m : model.remedies()) {
                Label l = ToolLayout.paragraph(null);
                l.setText(String.format(Locale.ROOT, "%d. %s %s", i++, m.fixes() ? "✔ brings it under:"
                        : "✘ not enough:", m.text()));
                l.setStyle(m.fixes() ? "-fx-text-fill: #1e5e32;" : "-fx-text-fill: #6b5a3a;");
                remedies.getChildren().add(l);
            }
        }
        inspect.getChildren().clear();
        if (!model.inspect().isEmpty()) {
            Label t = new Label("What the figures cannot see: inspect");
            t.getStyleClass().add("tool-label");
            inspect.getChildren().add(t);
            for (String s : model.inspect()) {
                Label l = ToolLayout.paragraph(null);
                l.setText("• " + s);
                inspect.getChildren().add(l);
            }
        }
    }

    private static String f(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(DiagnosisViewModel model) {
        return new Tool("Diagnosis", "diagnosis-tab", () -> new DiagnosisView(model).node());
    }

    /** @return the panel */
    Node node() {
        return root;
    }
}
