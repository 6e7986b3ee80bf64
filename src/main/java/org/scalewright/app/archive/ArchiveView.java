package org.scalewright.app.archive;

import java.util.List;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.OverrunStyle;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.tool.ToolLayout;
import org.scalewright.archive.Job;
import org.scalewright.archive.VersionLabel;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;

/**
 * The instruments panel: the archive file and its instruments on top; under them, a tab each for
 * the chosen instrument's scale versions (open one, use one as the reference, save the working scale
 * as a new one), its jobs (under the form that logs one) and its broken strings (under the form that
 * logs a break on the selected key), each the panel's whole width so that a laptop screen shows
 * their columns. Binds and lays out {@link ArchiveViewModel} only.
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
        file.setMaxWidth(560);
        file.setTextOverrun(OverrunStyle.CENTER_ELLIPSIS);
        Tooltip whole = new Tooltip();
        whole.textProperty().bind(file.textProperty());
        file.setTooltip(whole);
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
        Label description = new Label();
        description.setId("archive-description");
        description.textProperty().bind(model.descriptionProperty());
        FlowPane top = new FlowPane(12, 4, ToolLayout.field("Archive:", file, other),
                ToolLayout.field("Instrument:", instrument, name, add, description));
        Label problem = status("archive-problem", "-fx-text-fill: #b00020; -fx-font-weight: bold;");
        problem.textProperty().bind(model.problemProperty());
        Label message = status("archive-message", "-fx-text-fill: #1e5e32;");
        message.textProperty().bind(model.messageProperty());
        root.setTop(new VBox(4, top, problem, message));

        Tab versions = new Tab("Scale versions", versions(model));
        versions.setId("archive-versions-tab");
        Tab jobs = new Tab("Jobs", jobs(model));
        jobs.setId("archive-jobs-tab");
        Tab breaks = new Tab("Broken strings", breaks(model));
        breaks.setId("archive-breaks-tab");
        TabPane records = new TabPane(versions, jobs, breaks);
        records.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        root.setCenter(records);
        this.model = model;
    }

    private static Node versions(ArchiveViewModel model) {
        TableView<ArchiveViewModel.VersionRow> table = new TableView<>(model.versions());
        table.setId("archive-versions");
        table.setPlaceholder(new Label("No versions yet: save the working scale as the first."));
        table.getColumns().setAll(List.of(
                ToolLayout.<ArchiveViewModel.VersionRow>column("no.", 32, true, r -> Integer.toString(r.number())),
                ToolLayout.<ArchiveViewModel.VersionRow>column("date", 80, false, ArchiveViewModel.VersionRow::date),
                ToolLayout.<ArchiveViewModel.VersionRow>column("label", 84, false, ArchiveViewModel.VersionRow::label),
                ToolLayout.<ArchiveViewModel.VersionRow>column("from", 40, true, ArchiveViewModel.VersionRow::from),
                ToolLayout.<ArchiveViewModel.VersionRow>column("title", 510, false,
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
        VBox box = new VBox(4, table, buttons);
        box.setPadding(ToolLayout.padding());
        return box;
    }

    private static Node jobs(ArchiveViewModel model) {
        ComboBox<String> kind = new ComboBox<>();
        kind.setId("archive-job-kind");
        kind.setEditable(true);
        kind.getItems().setAll(Job.USUAL_KINDS);
        kind.setPromptText("kind of job");
        kind.valueProperty().bindBidirectional(model.jobKindProperty());
        kind.setPrefWidth(130);
        ComboBox<ArchiveViewModel.VersionChoice> version = new ComboBox<>(model.jobVersions());
        version.setId("archive-job-version");
        version.setConverter(words(ArchiveViewModel.VersionChoice::text, t -> null));
        version.valueProperty().bindBidirectional(model.jobVersionProperty());
        version.setTooltip(new Tooltip("the scale version the job worked to (blank: none)"));
        Runnable log = model::logJob;
        Button logButton = new Button("Log job");
        logButton.setId("archive-log-job");
        logButton.setOnAction(e -> log.run());
        logButton.disableProperty().bind(model.instrumentProperty().isEmpty());
        var table = ToolLayout.entry("archive-job-table", model.jobTableProperty(), 26, log);
        table.setTooltip(new Tooltip("the strength table the job used; starts as the one chosen above"));
        var a4 = ToolLayout.entry("archive-job-a4", model.jobA4Property(), 4, log);
        a4.setTooltip(new Tooltip("the pitch standard the job used (blank: not recorded); starts as the working A4"));
        FlowPane form = new FlowPane(10, 4,
                ToolLayout.field("Kind:", kind),
                ToolLayout.field("Date:", ToolLayout.entry("archive-job-date", model.jobDateProperty(), 8, log)),
                ToolLayout.field("A4:", a4, new Label("Hz")),
                ToolLayout.field("Table:", table),
                ToolLayout.field("To version:", version),
                ToolLayout.field("Notes:", ToolLayout.entry("archive-job-notes", model.jobNotesProperty(), 16, log)),
                logButton);
        TableView<ArchiveViewModel.JobRow> list = new TableView<>(model.jobs());
        list.setId("archive-jobs");
        list.setPlaceholder(new Label("No jobs recorded."));
        list.getColumns().setAll(List.of(
                ToolLayout.<ArchiveViewModel.JobRow>column("date", 84, false, ArchiveViewModel.JobRow::date),
                ToolLayout.<ArchiveViewModel.JobRow>column("kind", 96, false, ArchiveViewModel.JobRow::kind),
                ToolLayout.<ArchiveViewModel.JobRow>column("A4 Hz", 50, true, ArchiveViewModel.JobRow::a4),
                ToolLayout.<ArchiveViewModel.JobRow>column("table", 280, false, ArchiveViewModel.JobRow::table),
                ToolLayout.<ArchiveViewModel.JobRow>column("to ver.", 50, true, ArchiveViewModel.JobRow::version),
                ToolLayout.<ArchiveViewModel.JobRow>column("notes", 190, false, ArchiveViewModel.JobRow::notes)));
        VBox.setVgrow(list, Priority.ALWAYS);
        VBox box = new VBox(4, form, list);
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
                ToolLayout.<ArchiveViewModel.BreakRow>column("where", 112, false, ArchiveViewModel.BreakRow::place),
                ToolLayout.<ArchiveViewModel.BreakRow>column("remark", 140, false,
                        ArchiveViewModel.BreakRow::remark)));
        VBox.setVgrow(table, Priority.ALWAYS);
        VBox box = new VBox(4, form, caution, table);
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

    private static <T> StringConverter<T> words(Function<T, String> word, Function<String, T> of) {
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
