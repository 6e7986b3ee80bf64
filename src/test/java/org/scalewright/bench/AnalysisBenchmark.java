package org.scalewright.bench;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * Analysing a whole 88-note scale (target: under 20 µs on the project's 2-core machine). Run with
 * {@code mvn -Pbench test-compile exec:exec -Dbench.args="org.scalewright.bench.AnalysisBenchmark -f1 -wi 3 -i 5"};
 * the annotations give the same modest settings when no options are passed.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class AnalysisBenchmark {
    /**
     * {@code smooth}: an invented smooth grand built in code (one flag); {@code demo-grand}: the
     * bundled demo grand sheet with its planted faults (about a dozen flags), read from the
     * project root.
     */
    @Param({"smooth", "demo-grand"})
    public String scaleName;

    private Scale scale;
    private AnalysisSettings settings;

    @Setup
    public void setUp() throws Exception {
        scale = scaleName.equals("smooth") ? DemoScale.grand()
                : ScaleSheetReader.standard().read(Path.of("demo-instruments/grand-190/grand-190.csv"));
        settings = BuiltInData.defaultSettings();
    }

    @Benchmark
    public ScaleAnalysis analyse88Notes() {
        return ScaleAnalyzer.analyze(scale, settings);
    }
}
