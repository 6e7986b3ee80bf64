package org.scalewright.app.rescale;

import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.tool.ToolLayout;

/**
 * The rescaling panel: on the left the range, kind, target and planner settings with the
 * Propose button; on the right the proposal's summary, its change table, and Apply / Discard.
 * Only binds and lays out; {@link RescaleViewModel} does the work.
 */
public final class RescaleView {
    private final RescaleViewModel model;
    private final HBox root = new HBox(10);

    RescaleView(RescaleViewModel model) {
        this.model = model;
        root.setId("rescale-panel");
        root.setPadding(new Insets(6));
        ScrollPane settings = new ScrollPane(settings());
        settings.setFitToWidth(true);
        settings.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        settings.setMinWidth(350);
        settings.setPrefWidth(378);
        VBox result = result();
        HBox.setHgrow(result, Priority.ALWAYS);
        root.getChildren().addAll(settings, result);
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(RescaleViewModel model) {
        return new Tool("Rescale", "rescale-tab", () -> new RescaleView(model).node());
    }

    /** @return the panel */
    Node node() {
        return root;
    }

    private Node settings() {
        GridPane g = new GridPane();
        g.setHgap(6);
        g.setVgap(4);
        g.setPadding(new Insets(2, 8, 2, 2));
        int row = 0;

        TextField from = field("rescale-from", model.fromProperty(), 4, "lowest key: number or note name (A0, C#3)");
        TextField to = field("rescale-to", model.toProperty(), 4, "highest key: number or note name");
        Button fromSel = button("From selected", "rescale-from-selected", model::fromSelected,
                "the selected note (table or curve) becomes the lower end");
        Button toSel = button("To selected", "rescale-to-selected", model::toSelected,
                "the selected note becomes the upper end");
        Button section = button("Its section", "rescale-section", model::useSelectedSection,
                "the range becomes the selected note's whole section");
        g.addRow(row++, label("Keys"), new HBox(4, from, new Label("to"), to));
        g.add(new HBox(4, fromSel, toSel, section), 1, row++);

        ChoiceBox<RescaleViewModel.Kind> kind = new ChoiceBox<>();
        kind.setId("rescale-kind");
        kind.getItems().setAll(RescaleViewModel.Kind.values());
        kind.valueProperty().bindBidirectional(model.kindProperty());
        TextField max = field("rescale-max", model.maxBreakProperty(), 3,
                "every planned string stays at or under this percent of its breaking strength");
        kind.setMinWidth(Region.USE_PREF_SIZE);
        HBox kindRow = new HBox(6, kind, gapOf(6), label("max % break"), max);
        kindRow.setAlignment(Pos.CENTER_LEFT);
        g.addRow(row++, label("Strings"), kindRow);

        ChoiceBox<RescaleViewModel.TargetKind> target = new ChoiceBox<>();
        target.setId("rescale-target");
        target.getItems().setAll(RescaleViewModel.TargetKind.values());
        target.valueProperty().bindBidirectional(model.targetKindProperty());
        target.setMinWidth(Region.USE_PREF_SIZE);
        target.setTooltip(new Tooltip("what the new tensions aim at: a smooth trend of the present scale, a "
                + "straight or log-linear line between the range ends, or a spline through control points (the "
                + "squares on the tension curve: drag them up or down)"));
        Button seed = button("Points", "rescale-seed", model::seedPoints,
                "put " + RescaleViewModel.SEED_POINTS + " control points on the present target; drag them up or "
                        + "down on the tension curve, and the plan follows when you let go");
        HBox targetRow = new HBox(6, target, seed);
        targetRow.setAlignment(Pos.CENTER_LEFT);
        g.addRow(row++, label("Target"), targetRow);

        TextField bw = field("rescale-bandwidth", model.bandwidthProperty(), 4,
                "fraction of the range in each local fit of the smooth trend, 0 to 1");
        CheckBox perSection = new CheckBox("per section");
        perSection.setMinWidth(Region.USE_PREF_SIZE);
        perSection.setTooltip(new Tooltip("one smooth trend per section, each joined continuously to the next"));
        perSection.selectedProperty().bindBidirectional(model.perSectionProperty());
        HBox smooth = new HBox(6, label("bandwidth"), bw, perSection);
        smooth.setAlignment(Pos.CENTER_LEFT);
        smooth.visibleProperty().bind(model.targetKindProperty().isEqualTo(RescaleViewModel.TargetKind.SMOOTH));
        smooth.managedProperty().bind(smooth.visibleProperty());
        g.add(smooth, 1, row++);

        ChoiceBox<RescaleWireList> list = new ChoiceBox<>();
        list.setId("rescale-wire-list");
        list.getItems().setAll(RescaleWireList.values());
        list.valueProperty().bindBidirectional(model.wireListProperty());
        TextField custom = field("rescale-custom-wire", model.customWiresProperty(), 12,
                "size numbers and diameters, e.g. 13, 13.5, 14, 0.825mm");
        custom.visibleProperty().bind(model.wireListProperty().isEqualTo(RescaleWireList.CUSTOM));
        custom.managedProperty().bind(custom.visibleProperty());
        TextField cost = field("rescale-change-cost", model.changeCostProperty(), 5,
                "cost of each change of size between neighbours (0.002 weighs as one key 4.5 % off the target)");
        HBox plain = new HBox(6, list, custom, labelled("change cost", cost));
        plain.setAlignment(Pos.CENTER_LEFT);
        Label plainLabel = label("Wire");
        g.addRow(row, plainLabel, plain);
        bindShown(model, RescaleViewModel.Kind.PLAIN, plainLabel, plain);
        row++;

        TextField step = field("rescale-wrap-step", model.wrapStepProperty(), 6,
                "wrap wire available in steps of this size (in the display unit, or write mm or in after it); "
                        + "empty: the wrap-wire catalogue (0.01 mm steps)");
        step.setPromptText("catalogue");
        TextField dbl = field("rescale-double-above", model.doubleAboveProperty(), 4,
                "double-wind where a single wrap would be thicker than this (in the display unit, or write mm or in "
                        + "after it); blank keeps each string's winding");
        CheckBox join = new CheckBox("join the break over");
        join.setId("rescale-join");
        join.selectedProperty().bindBidirectional(model.joinBreakProperty());
        TextField joinKeys = field("rescale-join-keys", model.joinKeysProperty(), 2,
                "keys either side of the bass/tenor break whose cores are chosen for a smooth B");
        joinKeys.disableProperty().bind(join.selectedProperty().not());
        join.setMinWidth(Region.USE_PREF_SIZE);
        HBox joinRow = new HBox(6, join, joinKeys, label("keys"));
        joinRow.setAlignment(Pos.CENTER_LEFT);
        HBox stepRow = labelled("wrap step mm", step);
        HBox dblRow = labelled("double-wind above mm", dbl);
        var symbol = model.lengthSymbol();
        ((Label) stepRow.getChildren().get(0)).textProperty().bind(Bindings.concat("wrap step ", symbol));
        ((Label) dblRow.getChildren().get(0)).textProperty().bind(Bindings.concat("double-wind above ", symbol));
        VBox wound = new VBox(4, stepRow, dblRow, joinRow);
        Label woundLabel = label("Wound");
        g.addRow(row, woundLabel, wound);
        bindShown(model, RescaleViewModel.Kind.WOUND, woundLabel, wound);
        return g;
    }

    private VBox result() {
        Label summary = new Label();
        summary.setId("rescale-summary");
        summary.setWrapText(true);
        summary.setMinHeight(Label.USE_PREF_SIZE);
        summary.textProperty().bind(Bindings.createStringBinding(() -> {
            if (!model.problems().isEmpty()) {
                return "No proposal:\n• " + String.join("\n• ", model.problems());
            }
            String s = model.summaryProperty().get();
            return s.isEmpty() ? "Choose the keys and a target, then Propose. The proposal is drawn as the "
                    + "dash-dot curve and listed below; nothing changes until you apply it." : s;
        }, model.summaryProperty(), model.problems()));
        summary.styleProperty().bind(Bindings.when(Bindings.isEmpty(model.problems())).then("")
                .otherwise("-fx-text-fill: #a4161a;"));
        ScrollPane summaryScroll = new ScrollPane(summary);
        summaryScroll.setFitToWidth(true);
        summaryScroll.setPrefViewportHeight(112);
        summaryScroll.setMinViewportHeight(112);

        TableView<RescaleChangeRow> table = new TableView<>(model.changes());
        table.setId("rescale-changes");
        table.setPlaceholder(new Label("no proposal"));
        table.setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
        table.getColumns().add(column("key", 30, r -> Integer.toString(r.key())));
        table.getColumns().add(column("note", 38, RescaleChangeRow::note));
        table.getColumns().add(column("wire old → new", 228, RescaleChangeRow::wire));
        TableColumn<RescaleChangeRow, String> tension = column("tension", 86, RescaleChangeRow::tension);
        tension.textProperty().bind(model.tensionHeaderProperty());
        table.getColumns().add(tension);
        table.getColumns().add(column("% break", 76, RescaleChangeRow::breakPct));
        table.getColumns().add(column("dev. %", 48, RescaleChangeRow::deviation));
        table.setFixedCellSize(20);
        table.setStyle("-fx-font-size: 11px;");
        org.scalewright.app.session.ColumnFit.keepFitted(table, 11, 11);
        VBox.setVgrow(table, Priority.ALWAYS);

        Button propose = button("Propose", "rescale-propose", model::propose,
                "plan the range; the proposal shows as the dash-dot curve and in the change table");
        Button apply = button("Apply as one step", "rescale-apply", model::apply,
                "make the proposal the working scale; Ctrl+Z undoes it in one step");
        Button discard = button("Discard", "rescale-discard", model::discard, "drop the proposal");
        apply.disableProperty().bind(model.proposalProperty().isNull());
        discard.disableProperty().bind(model.proposalProperty().isNull());
        HBox buttons = new HBox(8, propose, apply, discard);
        buttons.setAlignment(Pos.CENTER_LEFT);
        VBox box = new VBox(4, summaryScroll, table, buttons);
        box.setMinWidth(300);
        return box;
    }

    private static void bindShown(RescaleViewModel model, RescaleViewModel.Kind kind, Node... nodes) {
        for (Node n : nodes) {
            n.visibleProperty().bind(model.kindProperty().isEqualTo(kind));
            n.managedProperty().bind(n.visibleProperty());
        }
    }

    private static TableColumn<RescaleChangeRow, String> column(String title, double width,
                                                               Function<RescaleChangeRow, String> text) {
        TableColumn<RescaleChangeRow, String> c = new TableColumn<>(title);
        c.setCellValueFactory(d -> new javafx.beans.property.ReadOnlyStringWrapper(text.apply(d.getValue())));
        c.setPrefWidth(width);
        c.setSortable(false);
        return c;
    }

    private static Label label(String text) {
        Label l = new Label(text);
        l.setMinWidth(Label.USE_PREF_SIZE);
        return l;
    }

    private static javafx.scene.layout.Region gapOf(double width) {
        javafx.scene.layout.Region r = new javafx.scene.layout.Region();
        r.setMinWidth(width);
        return r;
    }

    private static HBox labelled(String text, Node field) {
        HBox h = new HBox(4, label(text), field);
        h.setAlignment(Pos.CENTER_LEFT);
        return h;
    }

    /** @return an entry field with its tip; Enter does nothing here (Propose is a button of its own) */
    private static TextField field(String id, javafx.beans.property.StringProperty p, int columns, String tip) {
        TextField f = ToolLayout.entry(id, p, columns, () -> { });
        f.setMinWidth(Region.USE_PREF_SIZE);
        f.setTooltip(new Tooltip(tip));
        return f;
    }

    private static Button button(String text, String id, Runnable action, String tip) {
        Button b = new Button(text);
        b.setId(id);
        b.setMinWidth(Button.USE_PREF_SIZE);
        b.setOnAction(e -> action.run());
        b.setTooltip(new Tooltip(tip));
        return b;
    }
}
