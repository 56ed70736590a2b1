package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.strategies.risk.SampleRiskModel;
import dev.sigmawalk.strategies.risk.ShrinkageRiskModel;
import dev.sigmawalk.strategies.risk.SingleIndexRiskModel;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Each risk model on a window whose moments are already known (as in a study, where the window's
 * moments are shared by every strategy), L = 1,000. The estimate's dense matrix is built as the
 * optimizer would ask for it.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class RiskModelBenchmark {
    @Param({"100", "500", "2000"})
    public int n;

    private ReturnPanel panel;
    private WindowMoments moments;
    private final SampleRiskModel sample = new SampleRiskModel();
    private final SingleIndexRiskModel singleIndex = new SingleIndexRiskModel();
    private final ShrinkageRiskModel shrinkage = new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX);

    @Setup
    public void setUp() {
        panel = BenchData.panel(BenchData.WINDOW, n, 3L);
        moments = WindowMoments.of(BenchData.window(panel, BenchData.WINDOW - 1, BenchData.WINDOW, null));
    }

    private EstimationWindow window() {
        WindowMoments known = moments;
        return BenchData.window(panel, BenchData.WINDOW - 1, BenchData.WINDOW, () -> known);
    }

    /** Cutting the window out of the panel alone, to subtract from the figures below. */
    @Benchmark
    public EstimationWindow windowOnly() {
        return window();
    }

    @Benchmark
    public double[] sampleModel() {
        return sample.estimate(window()).dense();
    }

    @Benchmark
    public CovarianceEstimate singleIndexFactorForm() {
        return singleIndex.estimate(window());
    }

    @Benchmark
    public double[] singleIndexDense() {
        return singleIndex.estimate(window()).dense();
    }

    @Benchmark
    public double[] shrinkageToSingleIndex() {
        return shrinkage.estimate(window()).dense();
    }
}
