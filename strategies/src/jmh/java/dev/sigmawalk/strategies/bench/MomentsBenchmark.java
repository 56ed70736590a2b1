package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
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

/** A window's moments computed from its rows (two passes, blocked kernel), L = 1,000. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class MomentsBenchmark {
    @Param({"100", "500", "2000"})
    public int n;

    private EstimationWindow window;

    @Setup
    public void setUp() {
        ReturnPanel panel = BenchData.panel(BenchData.WINDOW, n, 1L);
        window = BenchData.window(panel, BenchData.WINDOW - 1, BenchData.WINDOW, null);
    }

    @Benchmark
    public WindowMoments fullTwoPass() {
        return WindowMoments.of(window);
    }
}
