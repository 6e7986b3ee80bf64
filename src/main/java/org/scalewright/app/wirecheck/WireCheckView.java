package org.scalewright.app.wirecheck;

import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;
import org.scalewright.app.session.Choice;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.tool.ToolLayout;
import org.scalewright.design.wirecheck.WireConversion;

/**
 * The wire check panel: the replacement, the size conversion, the target pitch, the pitch
 * raise and the stage limit on top; under them the notes (at risk first) beside the totals on
 * the plate, the advice on stages and, for a pitch raise, the safety cautions. Binds and lays
 * out {@link WireCheckViewModel} only.
 */
public final class WireCheckView {
    private final BorderPane root = new BorderPane();

    WireCheckView(WireCheckViewModel model) {
        root.setId("wire-check");
        root.setPadding(ToolLayout.padding());

        Label replacement = new Label();
        replacement.setId("wire-check-replacement");
        replacement.textProperty().bind(model.replacementNameProperty());
        replacement.setMaxWidth(260);
        replacement.setWrapText(true);
        replacement.setMinHeight(Label.USE_PREF_SIZE);
        replacement.setTooltip(new Tooltip());
        replacement.getTooltip().textProperty().bind(model.replacementNameProperty());
        Button load = new Button("Load maker's table…");
        load.setId("wire-check-load-table");
        load.setOnAction(e -> model.loadReplacement());
        Button none = new Button("None");
        none.setOnAction(e -> model.clearReplacement());
        none.disableProperty().bind(model.replacementProperty().isNull());

        ChoiceBox<Choice<WireConversion>> sizes = new ChoiceBox<>();
        sizes.setId("wire-check-sizes");
        sizes.getItems().setAll(WireCheckViewModel.Conversion.values());
        sizes.valueProperty().bindBidirectional(model.conversionProperty());

        Runnable check = model::check;
        var a4 = ToolLayout.entry("wire-check-a4", model.targetA4Property(), 4, check);
        var flat = ToolLayout.entry("wire-check-flat", model.centsFlatProperty(), 4, check);
        flat.disableProperty().bind(model.flatFileNameProperty().isNotEmpty());
        Button flatFile = new Button("Per-note file…");
        flatFile.setId("wire-check-flat-file");
        flatFile.setOnAction(e -> model.loadFlatFile());
        Label flatName = new Label();
        flatName.textProperty().bind(model.flatFileNameProperty());
        Button flatClear = new Button("×");
        flatClear.setTooltip(new Tooltip("one figure for every note again"));
        flatClear.visibleProperty().bind(model.flatFileNameProperty().isNotEmpty());
        flatClear.managedProperty().bind(flatClear.visibleProperty());
        flatClear.setOnAction(e -> model.clearFlatFile());
        var pull = ToolLayout.entry("wire-check-overpull", model.overpullProperty(), 3, check);
        var limit = ToolLayout.entry("wire-check-stage-limit", model.stageLimitProperty(), 4, check);
        limit.setTooltip(new Tooltip("advise stages when the total tension changes by more than this in one pass: "
                + "a percent of the present total (5 %) or a force (10 kN, 2200 lbf)"));

        Button run = new Button("Check");
        run.setId("wire-check-run");
        run.setDefaultButton(false);
        run.setOnAction(e -> model.check());
        Button export = new Button("Export CSV…");
        export.setId("wire-check-export");
        export.disableProperty().bind(model.reportProperty().isNull());
        export.setOnAction(e -> model.exportCsv());

        Button off = new Button("Clear");
        off.setTooltip(new Tooltip("take the results and the after and peak curves away"));
        off.disableProperty().bind(model.reportProperty().isNull());
        off.setOnAction(e -> model.clear());
        FlowPane form = new FlowPane(10, 4,
                ToolLayout.field("Replacement:", replacement, load, none),
                ToolLayout.field("Plain sizes:", sizes),
                ToolLayout.field("A4:", a4, new Label("Hz")),
                ToolLayout.field("Flat now:", flat, new Label("cents"), flatFile, flatName, flatClear),
                ToolLayout.field("Overpull:", pull, new Label("%")),
                ToolLayout.field("Stages above:", limit),
                ToolLayout.field("", run, export, off));
        Label problem = ToolLayout.paragraph("wire-check-problem");
        problem.setStyle("-fx-text-fill: #b00020; -fx-font-weight: bold;");
        problem.textProperty().bind(Bindings.when(model.staleProperty())
                .then("The scale or settings changed since this check: press Check again.")
                .otherwise(model.problemProperty()));
        problem.visibleProperty().bind(problem.textProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());
        root.setTop(new VBox(4, form, problem));

        TableView<WireCheckViewModel.Row> table = new TableView<>(model.rows());
        table.setId("wire-check-table");
        table.setPlaceholder(new Label("Set the replacement and the pitch raise, then press Check."));
        table.getColumns().setAll(java.util.List.of(
                ToolLayout.<WireCheckViewModel.Row>column("key", 36, true, r -> Integer.toString(r.key())),
                ToolLayout.<WireCheckViewModel.Row>column("note", 40, false, WireCheckViewModel.Row::note),
                ToolLayout.<WireCheckViewModel.Row>column("core after", 72, false,
                        r -> r.wireAfter().equals(r.wireBefore()) ? r.wireAfter() : r.wireBefore() + " → "
                                + r.wireAfter()),
                flatColumn(model),
                ToolLayout.<WireCheckViewModel.Row>column("% before", 60, true, r -> f(r.pctBefore(), 1)),
                ToolLayout.<WireCheckViewModel.Row>column("% after", 54, true, r -> f(r.pctAfter(), 1)),
                ToolLayout.<WireCheckViewModel.Row>column("% peak", 52, true, r -> f(r.pctPeak(), 1)),
                ToolLayout.<WireCheckViewModel.Row>column("headroom c", 82, true,
                        r -> f(r.headroomAfter(), 0)),
                ToolLayout.<WireCheckViewModel.Row>column("danger", 66, false,
                        r -> r.pctAfter() >= model.dangerPct() ? "at target" : r.overDanger() ? "at peak" : "")));
        ToolLayout.results(table, WireCheckViewModel.Row::overDanger, WireCheckViewModel.Row::cautionAtPeak,
                model::select);

        Label summary = ToolLayout.paragraph("wire-check-summary");
        summary.textProperty().bind(model.summaryProperty());
        summary.setStyle("-fx-font-weight: bold;");
        Label totalsTitle = new Label("Total tension on the plate");
        totalsTitle.getStyleClass().add("tool-label");
        Label totals = ToolLayout.paragraph("wire-check-totals");
        totals.textProperty().bind(model.totalsProperty());
        Label stages = ToolLayout.paragraph("wire-check-stages");
        stages.textProperty().bind(model.stagesProperty());
        VBox cautions = new VBox(2);
        cautions.setId("wire-check-cautions");
        cautions.setStyle("-fx-background-color: #fbeeda; -fx-border-color: #e0b35a; -fx-padding: 4 6 4 6;");
        model.cautions().addListener((javafx.collections.ListChangeListener<String>) c -> fill(cautions, model));
        fill(cautions, model);
        VBox details = new VBox(6, summary, totalsTitle, totals, stages, cautions);
        details.setPadding(ToolLayout.padding());
        details.visibleProperty().bind(model.reportProperty().isNotNull());
        ScrollPane scroll = new ScrollPane(details);
        scroll.setFitToWidth(true);
        scroll.setHbarPolicy(ScrollPane.ScrollBarPolicy.AS_NEEDED);

        SplitPane results = new SplitPane(table, scroll);
        results.setOrientation(Orientation.HORIZONTAL);
        results.setDividerPositions(0.6);
        root.setCenter(results);
    }

    /** The cents-flat column, shown when the figures were measured per note (else they are all the same). */
    private static javafx.scene.control.TableColumn<WireCheckViewModel.Row, String> flatColumn(
            WireCheckViewModel model) {
        var c = ToolLayout.<WireCheckViewModel.Row>column("flat c", 46, true, r -> f(r.centsFlat(), 1));
        c.visibleProperty().bind(Bindings.createBooleanBinding(() -> model.reportProperty().get() != null
                && model.reportProperty().get().request().flat().isPerNote(), model.reportProperty()));
        return c;
    }

    private static void fill(VBox box, WireCheckViewModel model) {
        box.getChildren().clear();
        if (!model.cautions().isEmpty()) {
            Label t = new Label("Cautions for a pitch raise");
            t.setStyle("-fx-font-weight: bold; -fx-text-fill: #7a4a00;");
            box.getChildren().add(t);
            for (String c : model.cautions()) {
                Label l = ToolLayout.paragraph(null);
                l.setText("• " + c);
                box.getChildren().add(l);
            }
        }
        box.setVisible(!model.cautions().isEmpty());
        box.setManaged(box.isVisible());
    }

    private static String f(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(WireCheckViewModel model) {
        return new Tool("Wire check", "wire-check-tab", () -> new WireCheckView(model).node());
    }

    /** @return the panel */
    Node node() {
        return root;
    }
}
