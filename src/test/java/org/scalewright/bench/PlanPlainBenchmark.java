package org.scalewright.bench;

import java.util.List;
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
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.design.rescale.PlainPlanner;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.design.rescale.TestScales;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * Planning all plain keys of an 88-note scale over the 23 music-wire sizes (12 to 23 in half
 * steps): the robust smooth target and the exact plan with its report, as a window would call
 * it on every change of target. Target: well under 50 ms.
 *
 * <p>The run settings (-f1 -wi 3 -i 5 -w 1s -r 1s) are set here as well, because the bench
 * profile hands {@code bench.args} to JMH as one argument:
 * {@code mvn -Pbench test-compile exec:exec -Dbench.args=org.scalewright.bench.PlanPlainBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class PlanPlainBenchmark {
    private ScaleAnalysis present;
    private PlainPlanOptions options;
    private final KeyRange all = new KeyRange(1, 88);

    @Setup
    public void setUp() {
        present = ScaleAnalyzer.analyze(TestScales.random(1), BuiltInData.defaultSettings());
        List<CoreWire> sizes = PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes());
        if (sizes.size() != 23) {
            throw new IllegalStateException("expected 23 sizes, had " + sizes.size());
        }
        options = PlainPlanOptions.of(sizes, 70);
    }

    @Benchmark
    public Proposal targetAndPlan() {
        TargetCurve target = PlainPlanner.target(present, all, TargetSpec.loess(0.5), false);
        return PlainPlanner.plan(present, all, target, options);
    }
}
