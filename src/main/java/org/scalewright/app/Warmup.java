package org.scalewright.app;

import java.nio.file.Path;
import java.util.Optional;
import org.scalewright.app.session.DemoSheet;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.DisplayUnits;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * Shortens the start: while JavaFX starts up on one thread, another starts the log and the font system,
 * reads the preferences and the sheet the window will open, analyses it and builds the curves
 * once, so that the classes and tables they need are loaded when the window asks for them. Its results are thrown away; the window
 * reads the sheet again itself (and reports any problem with it).
 */
final class Warmup {
    private Warmup() {
    }

    static void start(LaunchRequest request) {
        Optional<Path> sheet = request.sheet().isPresent() ? request.sheet() : DemoSheet.find();
        Thread t = new Thread(() -> run(sheet), "scalewright-warmup");
        t.setDaemon(true);
        t.setPriority(Thread.NORM_PRIORITY - 1);
        t.start();
    }

    private static void run(Optional<Path> sheet) {
        try {
            // the log is started here, off the JavaFX thread (the window's start only finds it
            // started), and so also records a launch whose window then fails to open
            DesktopLog.start();
            // the charts measure their texts with the AWT font system, slow to start the first time
            java.awt.Font font = new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.PLAIN, 11);
            new java.awt.font.TextLayout("Tension per string 1,600 N", font,
                    new java.awt.font.FontRenderContext(null, true, true)).getBounds();
            FirstStartCautions.forUser().alreadyShown();
            var settings = BuiltInData.defaultSettings();
            BuiltInData.astmMaximum();
            BuiltInData.cautions();
            if (sheet.isEmpty()) {
                return;
            }
            var analysis = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(sheet.get()), settings);
            CurveData data = CurveData.of(analysis, DisplayUnits.METRIC).withReference(analysis);
            for (Curve c : Curve.values()) {
                ScaleCurves.build(c, data, false);
            }
        } catch (Exception | LinkageError e) {
            // only a head start: the window does the same work and reports what goes wrong
        }
    }
}
