package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.strategies.risk.EwmaRiskModel;
import dev.sigmawalk.strategies.risk.FactorColumns;
import dev.sigmawalk.strategies.risk.MultiIndexRiskModel;
import dev.sigmawalk.strategies.risk.NonlinearShrinkageRiskModel;
import dev.sigmawalk.strategies.risk.PrincipalComponentsRiskModel;
import java.util.HashMap;
import java.util.Map;
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
 * The Method §11 risk models on a window whose moments are already known, L = 1,000, as
 * {@link RiskModelBenchmark} does for the others: the multi-index model with one factor per
 * sector of ten assets (the benchmark data's own sectors), five principal components, ewma with a
 * half-life of 60 rows and nonlinear shrinkage. {@code ...FactorForm} is the estimate as the
 * optimizer receives it; {@code ...Dense} adds the n×n matrix.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class NewRiskModelBenchmark {
    @Param({"100", "500", "2000"})
    public int n;

    private ReturnPanel panel;
    private WindowMoments moments;
    private MultiIndexRiskModel multiIndex;
    private final PrincipalComponentsRiskModel components = new PrincipalComponentsRiskModel(5);
    private final EwmaRiskModel ewma = new EwmaRiskModel(60);
    private final NonlinearShrinkageRiskModel nonlinear = new NonlinearShrinkageRiskModel();

    @Setup
    public void setUp() {
        panel = BenchData.panel(BenchData.WINDOW, n, 3L);
        moments = WindowMoments.of(BenchData.window(panel, BenchData.WINDOW - 1, BenchData.WINDOW, null));
        Map<String, String> sectors = new HashMap<>();
        int count = Math.max(1, n / 10);
        for (int i = 0; i < n; i++) {
            sectors.put(panel.assets().get(i), "s" + i % count);
        }
        multiIndex = new MultiIndexRiskModel(new FactorColumns.Sectors(sectors));
    }

    private EstimationWindow window() {
        WindowMoments known = moments;
        return BenchData.window(panel, BenchData.WINDOW - 1, BenchData.WINDOW, () -> known);
    }

    @Benchmark
    public CovarianceEstimate multiIndexFactorForm() {
        return multiIndex.estimate(window());
    }

    @Benchmark
    public double[] multiIndexDense() {
        return multiIndex.estimate(window()).dense();
    }

    @Benchmark
    public CovarianceEstimate principalComponentsFactorForm() {
        return components.estimate(window());
    }

    @Benchmark
    public double[] principalComponentsDense() {
        return components.estimate(window()).dense();
    }

    @Benchmark
    public double[] ewmaDense() {
        return ewma.estimate(window()).dense();
    }

    @Benchmark
    public double[] nonlinearShrinkageDense() {
        return nonlinear.estimate(window()).dense();
    }
}
