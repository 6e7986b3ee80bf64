package org.scalewright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
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
import org.openjdk.jmh.annotations.TearDown;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** Reading an 88-note scale sheet from a file and analysing it (target: under 5 ms). */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class LoadAndAnalyseBenchmark {
    private Path file;
    private ScaleSheetReader reader;
    private AnalysisSettings settings;

    @Setup
    public void setUp() throws IOException {
        file = Files.createTempFile("scalewright-bench", ".csv");
        ScaleSheetWriter.write(DemoScale.grand(), file, false);
        reader = ScaleSheetReader.standard();
        settings = BuiltInData.defaultSettings();
    }

    @TearDown
    public void tearDown() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public ScaleAnalysis loadAndAnalyse() throws BadInputException {
        return ScaleAnalyzer.analyze(reader.read(file), settings);
    }
}
