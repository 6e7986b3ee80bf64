package org.scalewright.app;

import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuButton;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.scalewright.app.curves.CurvesView;
import org.scalewright.app.session.Choice;
import org.scalewright.app.session.FxPrompts;
import org.scalewright.app.session.StrengthChoice;
import org.scalewright.app.table.FlagsView;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteTableView;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Scale;

/**
 * The workstation window: menus and a tool bar of settings on top, the note table with the
 * flags list and the tools in tabs below it on the left, the three curves on the right, the status line at the
 * bottom. It lays out the part views and wires menu items to the view model's commands.
 */
final class WorkstationView {
    private final Stage stage;
    private final WorkstationViewModel model;
    private final NoteTableView table;
    private final CurvesView curves;
    private final FlagsView flags;
    private final StatusView status;
    private final Scene scene;

    WorkstationView(Stage stage, WorkstationViewModel model) {
        this.stage = stage;
        this.model = model;
        this.table = new NoteTableView(model.table());
        this.curves = new CurvesView(model.curves());
        this.flags = new FlagsView(model.flags());
        this.status = new StatusView(model.status());

        var tools = ToolTabs.build(model, flags);
        tools.setPrefHeight(230);
        tools.setMinHeight(80);
        SplitPane left = new SplitPane(table.node(), tools);
        left.setOrientation(Orientation.VERTICAL);
        left.setDividerPositions(0.7);
        SplitPane.setResizableWithParent(tools, false);
        // a tool needs room for its settings and results: give it the lower half of the left
        // side when its tab is chosen (the table keeps scrolling above), the flags a third
        tools.getSelectionModel().selectedIndexProperty().addListener((o, was, now) -> {
            double wanted = now.intValue() == 0 ? 0.7 : 0.42;
            if (Math.abs(left.getDividerPositions()[0] - wanted) > 0.05 && now.intValue() != was.intValue()) {
                left.setDividerPositions(wanted);
            }
        });
        if (tools.getSelectionModel().getSelectedIndex() > 0) {
            left.setDividerPositions(0.42);
        }
        SplitPane centre = new SplitPane(left, curves.node());
        centre.setDividerPositions(0.58);
        WindowLayout layout = new WindowLayout(model.settings());
        layout.restore("centre", centre);
        if (tools.getSelectionModel().getSelectedIndex() == 0) {
            layout.restore("left", left);
        }
        // the window may be laid out at several sizes while it opens (the tools pane keeps its
        // height on a resize), so the start positions are put back after each size change
        // until the user presses on a divider or picks a tab (a tool tab chosen at start gets
        // the lower half, as on a click)
        double[] leftAtStart = left.getDividerPositions();
        double[] centreAtStart = centre.getDividerPositions();
        boolean[] settled = new boolean[1];
        centre.addEventFilter(javafx.scene.input.MouseEvent.MOUSE_PRESSED, e -> settled[0] = true);
        tools.getSelectionModel().selectedIndexProperty().addListener((o, was, now) -> settled[0] = true);
        javafx.beans.InvalidationListener startPositions = o -> {
            if (!settled[0]) {
                javafx.application.Platform.runLater(() -> {
                    if (!settled[0]) {
                        left.setDividerPositions(leftAtStart);
                        centre.setDividerPositions(centreAtStart);
                    }
                });
            }
        };
        left.heightProperty().addListener(startPositions);
        centre.widthProperty().addListener(startPositions);

        BorderPane root = new BorderPane();
        root.getStyleClass().add("workstation");
        root.setTop(new VBox(menuBar(() -> layout.keep(stage, new String[] {"left", "centre"}, left, centre)),
                toolBar()));
        root.setCenter(centre);
        root.setBottom(status.node());
        double[] size = layout.startSize(javafx.stage.Screen.getPrimary().getVisualBounds());
        scene = new Scene(root, size[0], size[1]);
        scene.getStylesheets().add(WorkstationView.class.getResource("workstation.css").toExternalForm());
        DroppedSheets.install(scene, model);
        stage.setScene(scene);
        stage.titleProperty().bind(model.windowTitleProperty());
        stage.setMinWidth(900);
        stage.setMinHeight(600);
        stage.setOnCloseRequest(e -> {
            if (!model.mayClose()) {
                e.consume();
            } else {
                layout.keep(stage, new String[] {"left", "centre"}, left, centre);
            }
        });
    }

    /** Puts the keyboard focus on the table's first row (wire column), ready for typing. */
    void focusTable() {
        var t = table.node();
        if (!t.getItems().isEmpty()) {
            t.getSelectionModel().clearAndSelect(0, table.tableColumn(NoteColumn.WIRE));
            t.getFocusModel().focus(0, table.tableColumn(NoteColumn.WIRE));
        }
        t.requestFocus();
    }

    Stage stage() {
        return stage;
    }

    Scene scene() {
        return scene;
    }

    NoteTableView table() {
        return table;
    }

    CurvesView curves() {
        return curves;
    }

    WorkstationViewModel model() {
        return model;
    }

    /** @param keepLayout keeps the window size and dividers for the next start */
    private MenuBar menuBar(Runnable keepLayout) {
        Menu file = FileMenu.build(model, () -> {
            if (model.mayClose()) {
                keepLayout.run();
                stage.close();
            }
        });

        MenuItem undo = item("Undo", "menu-undo", new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN),
                model::undo);
        undo.textProperty().bind(Bindings.when(model.canUndoProperty())
                .then(Bindings.concat("Undo ", model.undoTextProperty())).otherwise("Undo"));
        undo.disableProperty().bind(model.canUndoProperty().not());
        MenuItem redo = item("Redo", "menu-redo", new KeyCodeCombination(KeyCode.Y, KeyCombination.SHORTCUT_DOWN),
                model::redo);
        redo.textProperty().bind(Bindings.when(model.canRedoProperty())
                .then(Bindings.concat("Redo ", model.redoTextProperty())).otherwise("Redo"));
        redo.disableProperty().bind(model.canRedoProperty().not());
        MenuItem redoAlt = item("Redo (Ctrl+Shift+Z)", "menu-redo-alt", new KeyCodeCombination(KeyCode.Z,
                KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN), model::redo);
        redoAlt.disableProperty().bind(model.canRedoProperty().not());
        redoAlt.setVisible(false);
        Menu edit = new Menu("Edit", null, undo, redo, redoAlt);

        Menu reference = new Menu("Reference", null, referenceItems());

        ToggleGroup units = new ToggleGroup();
        Menu unitsMenu = new Menu("Units");
        for (Choice<DisplayUnits> c : WorkstationViewModel.UnitChoice.values()) {
            RadioMenuItem r = new RadioMenuItem(c.toString());
            r.setToggleGroup(units);
            r.setSelected(model.unitsProperty().get().equals(c.value()));
            r.setOnAction(e -> model.setUnits(c));
            model.unitsProperty().addListener((o, a, b) -> r.setSelected(b.equals(c.value())));
            unitsMenu.getItems().add(r);
        }
        CheckMenuItem sections = new CheckMenuItem("Section totals in the status line");
        sections.selectedProperty().bindBidirectional(model.status().showSectionsProperty());
        Menu view = new Menu("View", null, unitsMenu, sections);

        Menu strength = new Menu("Strength table", null, strengthItems());
        strength.setId("menu-strength");

        MenuItem cautions = item("Safety cautions…", "menu-cautions", null, model::showCautions);
        MenuItem keys = item("Keyboard…", "menu-keys", null, () -> new FxPrompts(stage).showKeyboardHelp());
        MenuItem about = item("About Scalewright…", "menu-about", null, model::showAbout);
        Menu help = new Menu("Help", null, cautions, keys, new SeparatorMenuItem(), about);
        MenuBar bar = new MenuBar(file, edit, view, reference, strength, help);
        bar.setUseSystemMenuBar(false);
        return bar;
    }

    private MenuItem[] referenceItems() {
        MenuItem current = item("Use the working scale as it is now", "menu-ref-current", null,
                model::useCurrentAsReference);
        MenuItem open = item("Open reference sheet…", "menu-ref-open", null, model::openReference);
        CheckMenuItem show = new CheckMenuItem("Draw the reference on the curves");
        show.selectedProperty().bindBidirectional(model.showReferenceProperty());
        CheckMenuItem diff = new CheckMenuItem("Differences to the reference in the table");
        diff.setId("menu-ref-diff");
        diff.selectedProperty().bindBidirectional(model.showDifferencesProperty());
        return new MenuItem[] {current, open, new SeparatorMenuItem(), show, diff};
    }

    private MenuItem[] strengthItems() {
        ToggleGroup g = new ToggleGroup();
        RadioMenuItem min = new RadioMenuItem("ASTM A228 minimum (default)");
        RadioMenuItem max = new RadioMenuItem("ASTM A228 maximum");
        RadioMenuItem maker = new RadioMenuItem("Maker's table from a file…");
        for (RadioMenuItem r : new RadioMenuItem[] {min, max, maker}) {
            r.setToggleGroup(g);
        }
        Runnable sync = () -> {
            StrengthChoice c = model.strengthProperty().get();
            min.setSelected(c.file().isEmpty() && c.table() == StrengthChoice.minimum().table());
            max.setSelected(c.file().isEmpty() && c.table() == StrengthChoice.maximum().table());
            maker.setSelected(c.file().isPresent());
        };
        model.strengthProperty().addListener((o, a, b) -> sync.run());
        min.setOnAction(e -> model.useBuiltInMinimum());
        max.setOnAction(e -> model.useBuiltInMaximum());
        // a cancelled or failed maker's table leaves the previous choice selected
        maker.setOnAction(e -> {
            model.useMakersTable();
            sync.run();
        });
        sync.run();
        return new MenuItem[] {min, max, maker};
    }

    private ToolBar toolBar() {
        ChoiceBox<Choice<DisplayUnits>> units = new ChoiceBox<>();
        units.setId("units-choice");
        units.getItems().setAll(WorkstationViewModel.UnitChoice.values());
        java.util.function.Consumer<DisplayUnits> show = u -> WorkstationViewModel.UnitChoice.values().stream()
                .filter(c -> c.value().equals(u)).findFirst().ifPresent(units::setValue);
        show.accept(model.unitsProperty().get()); // as remembered from the last start
        units.setOnAction(e -> model.setUnits(units.getValue()));
        model.unitsProperty().addListener((o, a, b) -> show.accept(b));
        units.setTooltip(new Tooltip("units for display and entry; sheets keep their own column units"));

        TextField a4 = new TextField();
        a4.setId("a4-field");
        a4.setPrefColumnCount(5);
        Runnable showA4 = () -> a4.setText(model.a4Text());
        showA4.run();
        model.scaleProperty().addListener((o, a, b) -> showA4.run());
        a4.setOnAction(e -> {
            if (!model.setA4(a4.getText())) {
                showA4.run();
            }
        });
        a4.focusedProperty().addListener((o, was, is) -> {
            if (!is && !a4.getText().equals(model.a4Text())
                    && !model.setA4(a4.getText())) {
                showA4.run();
            }
        });
        a4.setTooltip(new Tooltip("pitch standard: the frequency of A4 (key 49); an undoable edit of the scale"));

        MenuButton strength = new MenuButton();
        strength.setId("strength-button");
        strength.textProperty().bind(Bindings.createStringBinding(() -> model.strengthProperty().get().label(),
                model.strengthProperty()));
        strength.getItems().setAll(strengthItems());
        strength.setTooltip(new Tooltip("breaking-strength table the percent of breaking strength is taken against"));

        MenuButton reference = new MenuButton();
        reference.setId("reference-button");
        reference.textProperty().bind(model.referenceNameProperty());
        reference.getItems().setAll(referenceItems());
        reference.setTooltip(new Tooltip("the reference scale, drawn as a wide pale line under the working scale"));

        ToolBar bar = new ToolBar(label("Units"), units, label("A4"), a4, label("Hz"), gap(),
                label("Strength table"), strength, gap(), label("Reference"), reference);
        bar.setPadding(new Insets(4, 8, 4, 8));
        return bar;
    }

    private static Label label(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("tool-label");
        l.setAlignment(Pos.CENTER_LEFT);
        return l;
    }

    private static javafx.scene.layout.Region gap() {
        javafx.scene.layout.Region r = new javafx.scene.layout.Region();
        r.setMinWidth(14);
        javafx.scene.layout.HBox.setHgrow(r, Priority.NEVER);
        return r;
    }

    private static MenuItem item(String text, String id, KeyCombination keys, Runnable action) {
        return FileMenu.item(text, id, keys, action);
    }

    /** @return the working scale shown (for tests) */
    Scale scale() {
        return model.scaleProperty().get();
    }
}
