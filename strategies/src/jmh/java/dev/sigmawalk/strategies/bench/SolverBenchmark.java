package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.strategies.optimize.ActiveSetSolver;
import dev.sigmawalk.strategies.optimize.BoundSide;
import dev.sigmawalk.strategies.optimize.QuadraticProblem;
import dev.sigmawalk.strategies.optimize.SingleFactorMinVariance;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.risk.SampleRiskModel;
import dev.sigmawalk.strategies.risk.ShrinkageRiskModel;
import dev.sigmawalk.strategies.risk.SingleIndexCovariance;
import dev.sigmawalk.strategies.risk.SingleIndexRiskModel;
import java.util.Arrays;
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
 * Long-only minimum variance with bounds [0, 0.02] (the end-to-end case's rule), L = 1,000:
 * the exact active-set solver from a cold start and warm-started from the previous rebalance's
 * partition (the window 21 rows earlier), on the shrinkage (single-index target) or the sample
 * matrix; and the single-factor path on the single-index model.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class SolverBenchmark {
    private static final double UPPER = 0.02;

    @Param({"100", "500", "2000"})
    public int n;

    @Param({"shrinkage", "sample"})
    public String risk;

    private final ActiveSetSolver solver = new ActiveSetSolver(SolverSettings.standard());
    private final SingleFactorMinVariance singleFactor = new SingleFactorMinVariance(SolverSettings.standard());
    private QuadraticProblem problem;
    private BoundSide[] previousSides;
    private SingleIndexCovariance singleIndex;
    private double[] lower;
    private double[] upper;

    @Setup
    public void setUp() {
        ReturnPanel panel = BenchData.panel(BenchData.WINDOW + BenchData.STEP, n, 4L);
        EstimationWindow before = window(panel, BenchData.WINDOW - 1);
        EstimationWindow now = window(panel, BenchData.WINDOW - 1 + BenchData.STEP);
        lower = new double[n];
        upper = new double[n];
        Arrays.fill(upper, UPPER);
        SolveOutcome previous = solver.solve(problem(before));
        if (!(previous instanceof SolveOutcome.Optimal o)) {
            throw new IllegalStateException("previous window not solved: " + previous);
        }
        previousSides = o.sides();
        problem = problem(now);
        singleIndex = new SingleIndexRiskModel().estimate(now);
    }

    private static EstimationWindow window(ReturnPanel panel, int endRow) {
        WindowMoments m = WindowMoments.of(BenchData.window(panel, endRow, BenchData.WINDOW, null));
        return BenchData.window(panel, endRow, BenchData.WINDOW, () -> m);
    }

    private QuadraticProblem problem(EstimationWindow w) {
        double[] sigma = "sample".equals(risk)
                ? new SampleRiskModel().estimate(w).dense()
                : new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(w).dense();
        return new QuadraticProblem(n, sigma, new double[n], lower, upper);
    }

    @Benchmark
    public SolveOutcome activeSetCold() {
        return solver.solve(problem);
    }

    @Benchmark
    public SolveOutcome activeSetWarm() {
        return solver.solve(problem, previousSides);
    }

    /** Independent of {@code risk}: always the single-index model's factor form. */
    @Benchmark
    public SolveOutcome singleFactorPath() {
        return singleFactor.solve(singleIndex, lower, upper);
    }
}
