package org.scalewright.app;

import java.util.ArrayList;
import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import org.scalewright.app.archive.ArchiveChoice;
import org.scalewright.app.archive.ArchiveView;
import org.scalewright.app.archive.ArchiveViewModel;
import org.scalewright.app.diagnosis.DiagnosisView;
import org.scalewright.app.diagnosis.DiagnosisViewModel;
import org.scalewright.app.export.ExportView;
import org.scalewright.app.export.ExportViewModel;
import org.scalewright.app.rescale.RescaleView;
import org.scalewright.app.rescale.RescaleViewModel;
import org.scalewright.app.stretch.StretchView;
import org.scalewright.app.stretch.StretchViewModel;
import org.scalewright.app.table.FlagsView;
import org.scalewright.app.tool.Tool;
import org.scalewright.app.wirecheck.WireCheckView;
import org.scalewright.app.wirecheck.WireCheckViewModel;

/**
 * The tabbed area under the note table, beside the curves: the flags list first, then one
 * tab per tool (rescaling, wire check, diagnosis, exports). Each tool is a view over its own
 * view model; a tool adds itself in {@link #tools}.
 */
final class ToolTabs {
    private ToolTabs() {
    }

    /** @return the tab pane with the flags tab and every tool */
    static TabPane build(WorkstationViewModel model, FlagsView flags) {
        TabPane pane = new TabPane();
        pane.setId("tool-tabs");
        pane.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        Tab flagsTab = new Tab();
        flagsTab.setId("flags-tab");
        flagsTab.textProperty().bind(Bindings.size(model.flags().items()).asString("Flags (%d)"));
        flagsTab.setContent(flags.node());
        pane.getTabs().add(flagsTab);
        for (Tool t : tools(model)) {
            Tab tab = new Tab(t.title());
            tab.setId(t.id());
            // a tool's panel is built when its tab is first chosen, so start-up does not build,
            // style and lay out panels nobody has opened yet (its view model is made at once)
            tab.selectedProperty().addListener((o, was, now) -> {
                if (now && tab.getContent() == null) {
                    tab.setContent(t.panel().get());
                }
            });
            pane.getTabs().add(tab);
        }
        String start = System.getProperty("scalewright.startTab"); // e.g. exports-tab, to look at a tool
        pane.getTabs().stream().filter(t -> t.getId().equals(start)).findFirst().ifPresent(pane.getSelectionModel()::select);
        return pane;
    }

    /** The tools in the order their tabs appear. */
    private static List<Tool> tools(WorkstationViewModel model) {
        List<Tool> tools = new ArrayList<>();
        tools.add(RescaleView.tool(new RescaleViewModel(model.session(), model.curves())));
        tools.add(WireCheckView.tool(new WireCheckViewModel(model.session(), model.prompts(), model.curves())));
        tools.add(DiagnosisView.tool(new DiagnosisViewModel(model.session(), model.prompts(), model.curves())));
        tools.add(StretchView.tool(new StretchViewModel(model.session())));
        tools.add(ExportView.tool(ExportViewModel.of(model.session(), model.prompts())));
        tools.add(ArchiveView.tool(new ArchiveViewModel(model.session(), model.prompts(), ArchiveChoice.file(),
                model::settleUnsavedChanges, ArchiveChoice::remember)));
        return tools;
    }
}
