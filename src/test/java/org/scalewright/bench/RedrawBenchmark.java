package org.scalewright.bench;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.jfree.chart.JFreeChart;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.scalewright.chart.ChartImages;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveData;
import org.scalewright.model.DisplayUnits;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * What one edit in the window costs for the 88-note demo grand: analysing the edited scale
 * and putting the new data into the three curve charts ({@link #recomputeAndUpdateCurves}),
 * and the same followed by drawing the three charts at window size into images
 * ({@link #recomputeUpdateAndDraw}, Java2D software drawing, close to what the window's
 * chart canvases do). Target: under 16 ms, one frame at 60 Hz.
 *
 * <p>Run from the project root:
 * {@code mvn -Pbench test-compile exec:exec -Dbench.args="org.scalewright.bench.RedrawBenchmark -f1 -wi 3 -i 5"}
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class RedrawBenchmark {
    private static final int KEY = 40;
    private Scale[] scales;
    private AnalysisSettings settings;
    private final Map<Curve, JFreeChart> charts = new EnumMap<>(Curve.class);
    private ScaleAnalysis reference;
    private int flip;
    private BufferedImage sink;

    @Setup
    public void setUp() throws Exception {
        Path sheet = Path.of("demo-instruments", "grand-190", "grand-190.csv");
        if (!Files.isRegularFile(sheet)) {
            throw new IllegalStateException("run from the project root: the demo grand is missing at "
                    + sheet.toAbsolutePath());
        }
        Scale demo = ScaleSheetReader.standard().read(sheet);
        var note = demo.note(KEY).orElseThrow();
        var thinner = BuiltInData.musicWireSizes().bySize(16).orElseThrow();
        scales = new Scale[] {demo, demo.withNote(note.withWire(CoreWire.ofSize(thinner.size(), thinner.diameter())))};
        settings = BuiltInData.defaultSettings();
        reference = ScaleAnalyzer.analyze(demo, settings);
        CurveData data = CurveData.of(reference, DisplayUnits.METRIC).withReference(reference);
        for (Curve c : Curve.values()) {
            charts.put(c, ScaleCurves.build(c, data));
        }
    }

    private CurveData edit() {
        flip ^= 1;
        ScaleAnalysis a = ScaleAnalyzer.analyze(scales[flip], settings);
        CurveData data = CurveData.of(a, DisplayUnits.METRIC).withReference(reference).withSelectedKey(KEY);
        for (Curve c : Curve.values()) {
            ScaleCurves.refresh(charts.get(c), c, data);
        }
        return data;
    }

    /** Analysis of 88 notes plus new data in the three charts. */
    @Benchmark
    public CurveData recomputeAndUpdateCurves() {
        return edit();
    }

    /** The same, then the three charts drawn at 640 × 280 pixels each. */
    @Benchmark
    public BufferedImage recomputeUpdateAndDraw() {
        edit();
        for (Curve c : Curve.values()) {
            sink = ChartImages.draw(charts.get(c), 640, 280);
        }
        return sink;
    }
}
