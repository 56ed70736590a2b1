package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.moments.RunningMoments;
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
 * One rebalance's moments from the running sums: move the window 21 rows (L = 1,000) and take
 * the snapshot of every asset. With {@code refreshRows = 1000} (the window length, the budget a
 * study uses) the figure includes the rebuild once 1,000 rows have slid, every 48th move; with
 * 10^9 it is the pure incremental move. After 200 moves
 * the panel is exhausted and the sums restart from a fresh window, inside the measured call (an
 * extra 1/200 of a full computation per move).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class RunningMomentsBenchmark {
    private static final int MOVES = 200;

    @Param({"100", "500", "2000"})
    public int n;

    @Param({"1000", "1000000000"})
    public int refreshRows;

    private ReturnPanel panel;
    private int[] columns;
    private RunningMoments running;
    private int tau;

    @Setup
    public void setUp() {
        panel = BenchData.panel(BenchData.WINDOW + BenchData.STEP * MOVES, n, 2L);
        columns = BenchData.allColumns(n);
        restart();
    }

    private void restart() {
        running = new RunningMoments(panel, BenchData.WINDOW, refreshRows);
        tau = BenchData.WINDOW - 1;
        running.moveTo(tau);
    }

    @Benchmark
    public WindowMoments moveAndSnapshot() {
        if (tau + BenchData.STEP >= panel.rows()) {
            restart();
        }
        tau += BenchData.STEP;
        running.moveTo(tau);
        return running.snapshot(columns);
    }
}
