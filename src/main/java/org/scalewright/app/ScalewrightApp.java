package org.scalewright.app;

import java.util.List;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.scalewright.app.session.DemoSheet;
import org.scalewright.app.session.DeskSettings;
import org.scalewright.app.session.SettingsStore;
import org.scalewright.app.session.FxPrompts;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.Timings;

/**
 * The JavaFX application: one workstation window on the sheet asked for at launch (the demo
 * grand by default). Started by {@link DesktopLauncher}.
 */
public final class ScalewrightApp extends Application {
    /** Set {@code -Dscalewright.firstStartCautions=false} to skip the first-start cautions (tests). */
    static final String CAUTIONS_PROPERTY = "scalewright.firstStartCautions";

    @Override
    public void start(Stage stage) {
        long fxStarted = Timings.sinceLaunch();
        LaunchRequest request = LaunchRequest.parse(getParameters().getRaw().toArray(String[]::new));
        ScaleSession session = new ScaleSession();
        DesktopLog.start();
        DesktopLog.follow(session);
        DeskSettings settings = new DeskSettings(SettingsStore.forUser());
        FxPrompts prompts = new FxPrompts(stage, settings);
        WorkstationViewModel model = new WorkstationViewModel(session, prompts, settings);
        WorkstationView view = new WorkstationView(stage, model);
        openAtStart(model, request);
        // a sheet double-clicked in the macOS Finder, at launch or later
        OpenFileEvents.shared().attach(sheet -> {
            if (model.settleUnsavedChanges()) {
                model.openSheet(sheet, true);
            }
        }, Platform::runLater);
        long[] shown = new long[1];
        Timings.watch(view.curves().viewers(), fxStarted, Timings.sinceLaunch(), shown);
        stage.show();
        shown[0] = Timings.sinceLaunch();
        view.focusTable();
        boolean cautions = !"false".equalsIgnoreCase(System.getProperty(CAUTIONS_PROPERTY));
        FirstStartCautions first = FirstStartCautions.forUser();
        if (cautions && !first.alreadyShown()) {
            first.markShown();
            Platform.runLater(model::showCautions);
        }
    }

    /** Opens the sheet of the request, or the demo grand, or leaves the window empty with a hint. */
    static void openAtStart(WorkstationViewModel model, LaunchRequest request) {
        if (request.sheet().isPresent()) {
            model.openSheet(request.sheet().get(), true);
        } else {
            var demo = DemoSheet.find();
            if (demo.isPresent()) {
                model.openSheet(demo.get(), false);
            } else {
                List<String> looked = DemoSheet.candidates().stream().map(Object::toString).toList();
                model.session().complain("demo sheet not found (looked for " + String.join(", ", looked)
                        + "); open a sheet with File > Open");
            }
        }
        if (!request.problem().isEmpty()) {
            model.session().complain(request.problem());
        }
    }
}
