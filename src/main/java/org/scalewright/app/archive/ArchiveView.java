package org.scalewright.app.archive;

import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.tool.ToolLayout;
import org.scalewright.archive.VersionLabel;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;

/**
 * The instruments panel: the archive file and its instruments on top; the chosen instrument's scale
 * versions on the left (open one, use one as the reference, save the working scale as a new one) and
 * its broken strings on the right, under the form that logs a break on the selected key. Binds and
 * lays out {@link ArchiveViewModel} only.
 */
public final class ArchiveView {
    private final BorderPane root = new BorderPane();
    private final ArchiveViewModel model;
    private boolean shown;

    ArchiveView(ArchiveViewModel model) {
        root.setId("archive");
        root.setPadding(ToolLayout.padding());
        Label file = new Label();
        file.textProperty().bind(Bindings.createStringBinding(() -> String.valueOf(model.fileProperty().get()),
                model.fileProperty()));
        file.setMaxWidth(320);
        Button other = new Button("Other file…");
        other.setTooltip(new Tooltip("use another archive file (remembered for the next start)"));
        other.setOnAction(e -> model.chooseArchive());
        ComboBox<String> instrument = new ComboBox<>(model.instruments());
        instrument.setId("archive-instrument");
        instrument.valueProperty().bindBidirectional(model.instrumentProperty());
        var name = ToolLayout.entry("archive-new-instrument", model.newInstrumentProperty(), 10, model::addInstrument);
        name.setPromptText("new instrument");
        Button add = new Button("Add");
        add.setId("archive-add-instrument");
        add.setOnAction(e -> model.addInstrument());
        FlowPane top = new FlowPane(12, 4, ToolLayout.field("Archive:", file, other),
                ToolLayout.field("Instrument:", instrument, name, add));
        Label problem = status("archive-problem", "-fx-text-fill: #b00020; -fx-font-weight: bold;");
        problem.textProperty().bind(model.problemProperty());
        Label message = status("archive-message", "-fx-text-fill: #1e5e32;");
        message.textProperty().bind(model.messageProperty());
        root.setTop(new VBox(4, top, problem, message));

        SplitPane center = new SplitPane(versions(model), breaks(model));
        center.setOrientation(Orientation.HORIZONTAL);
        center.setDividerPositions(0.45);
        root.setCenter(center);
        this.model = model;
    }

    private static Node versions(ArchiveViewModel model) {
        TableView<ArchiveViewModel.VersionRow> table = new TableView<>(model.versions());
        table.setId("archive-versions");
        table.setPlaceholder(new Label("No versions yet: save the working scale as the first."));
        table.getColumns().setAll(List.of(
                ToolLayout.<ArchiveViewModel.VersionRow>column("no.", 36, true, r -> Integer.toString(r.number())),
                ToolLayout.<ArchiveViewModel.VersionRow>column("date", 84, false, ArchiveViewModel.VersionRow::date),
                ToolLayout.<ArchiveViewModel.VersionRow>column("label", 96, false, ArchiveViewModel.VersionRow::label),
                ToolLayout.<ArchiveViewModel.VersionRow>column("from", 40, true, ArchiveViewModel.VersionRow::from),
                ToolLayout.<ArchiveViewModel.VersionRow>column("title", 200, false,
                        ArchiveViewModel.VersionRow::title)));
        VBox.setVgrow(table, Priority.ALWAYS);
        Button open = new Button("Open");
        open.setId("archive-open-version");
        open.setTooltip(new Tooltip("make this version the working scale"));
        Button reference = new Button("Use as reference");
        reference.setId("archive-reference-version");
        open.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        reference.disableProperty().bind(open.disableProperty());
        open.setOnAction(e -> model.openVersion(table.getSelectionModel().getSelectedItem().number()));
        reference.setOnAction(e -> model.useAsReference(table.getSelectionModel().getSelectedItem().number()));
        ComboBox<String> label = new ComboBox<>();
        label.setId("archive-label");
        label.setEditable(true);
        label.getItems().setAll(VersionLabel.AS_MEASURED, VersionLabel.PLANNED, VersionLabel.AS_STRUNG);
        label.valueProperty().bindBidirectional(model.labelProperty());
        label.setPrefWidth(120);
        Button save = new Button("Save working scale");
        save.setId("archive-save-version");
        save.setTooltip(new Tooltip("save the working scale as the instrument's next version"));
        save.setOnAction(e -> model.saveWorkingScale());
        save.disableProperty().bind(model.instrumentProperty().isEmpty());
        FlowPane buttons = new FlowPane(6, 4, open, reference, ToolLayout.field("as", label, save));
        VBox box = new VBox(4, new Label("Scale versions"), table, buttons);
        box.setPadding(ToolLayout.padding());
        return box;
    }

    private static Node breaks(ArchiveViewModel model) {
        Label key = new Label();
        key.setId("archive-break-key");
        key.textProperty().bind(model.selectedKeyText());
        ChoiceBox<BreakActivity> during = new ChoiceBox<>();
        during.getItems().setAll(BreakActivity.values());
        during.setConverter(words(BreakActivity::word, BreakActivity::of));
        during.valueProperty().bindBidirectional(model.duringProperty());
        ChoiceBox<BreakPlace> place = new ChoiceBox<>();
        place.getItems().setAll(BreakPlace.values());
        place.setConverter(words(BreakPlace::word, BreakPlace::of));
        place.valueProperty().bindBidirectional(model.placeProperty());
        Runnable log = model::logBreakOnSelectedKey;
        Button logButton = new Button("Log break");
        logButton.setId("archive-log-break");
        logButton.setOnAction(e -> log.run());
        logButton.disableProperty().bind(model.instrumentProperty().isEmpty());
        FlowPane form = new FlowPane(10, 4,
                ToolLayout.field("Key:", key),
                ToolLayout.field("Date:", ToolLayout.entry("archive-break-date", model.dateProperty(), 8, log)),
                ToolLayout.field("Broke at:", ToolLayout.entry("archive-break-pitch", model.pitchProperty(), 6, log),
                        new Label("Hz")),
                ToolLayout.field("String:", ToolLayout.entry("archive-break-string", model.stringProperty(), 2, log)),
                ToolLayout.field("During:", during),
                ToolLayout.field("Where:", place),
                ToolLayout.field("Remark:", ToolLayout.entry("archive-break-remark", model.remarkProperty(), 12, log)),
                logButton);
        Label caution = status("archive-caution", "-fx-text-fill: #8a4b00; -fx-font-weight: bold;");
        caution.textProperty().bind(model.cautionProperty());
        TableView<ArchiveViewModel.BreakRow> table = new TableView<>(model.breaks());
        table.setId("archive-breaks");
        table.setPlaceholder(new Label("No breaks recorded."));
        table.getColumns().setAll(List.of(
                ToolLayout.<ArchiveViewModel.BreakRow>column("key", 40, true, r -> Integer.toString(r.key())),
                ToolLayout.<ArchiveViewModel.BreakRow>column("note", 44, false, ArchiveViewModel.BreakRow::note),
                ToolLayout.<ArchiveViewModel.BreakRow>column("date", 84, false, ArchiveViewModel.BreakRow::date),
                ToolLayout.<ArchiveViewModel.BreakRow>column("str.", 32, true, ArchiveViewModel.BreakRow::string),
                ToolLayout.<ArchiveViewModel.BreakRow>column("broke Hz", 66, true, ArchiveViewModel.BreakRow::hz),
                ToolLayout.<ArchiveViewModel.BreakRow>column("MPa", 52, true,
                        ArchiveViewModel.BreakRow::stressMpa),
                ToolLayout.<ArchiveViewModel.BreakRow>column("of table", 60, true, ArchiveViewModel.BreakRow::ratio),
                ToolLayout.<ArchiveViewModel.BreakRow>column("during", 84, false, ArchiveViewModel.BreakRow::during),
                ToolLayout.<ArchiveViewModel.BreakRow>column("where", 100, false, ArchiveViewModel.BreakRow::place),
                ToolLayout.<ArchiveViewModel.BreakRow>column("remark", 140, false,
                        ArchiveViewModel.BreakRow::remark)));
        VBox.setVgrow(table, Priority.ALWAYS);
        VBox box = new VBox(4, new Label("Broken strings"), form, caution, table);
        box.setPadding(ToolLayout.padding());
        return box;
    }

    private static Label status(String id, String style) {
        Label l = ToolLayout.paragraph(id);
        l.setStyle(style);
        l.visibleProperty().bind(l.textProperty().isNotEmpty());
        l.managedProperty().bind(l.visibleProperty());
        return l;
    }

    private static <T> StringConverter<T> words(java.util.function.Function<T, String> word,
                                                java.util.function.Function<String, T> of) {
        return new StringConverter<>() {
            @Override
            public String toString(T t) {
                return t == null ? "" : word.apply(t);
            }

            @Override
            public T fromString(String s) {
                return of.apply(s);
            }
        };
    }

    /** @return the tool's tab, its view built from {@code model} when the tab is first chosen */
    public static Tool tool(ArchiveViewModel model) {
        return new Tool("Instruments", "archive-tab", () -> new ArchiveView(model).node());
    }

    /** @return the panel */
    Node node() {
        // the archive is opened (created, the first time) only when the panel is first shown
        if (!shown) {
            shown = true;
            model.refresh();
        }
        return root;
    }
}
