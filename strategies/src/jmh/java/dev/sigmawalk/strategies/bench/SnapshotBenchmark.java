package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.moments.RunningMoments;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
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
 * The snapshot of the running sums alone (L = 1,000, the sums moved once in the set-up): the
 * window's n×n S, both triangles, from D and s. {@code columns = all} takes every panel column,
 * one run read straight from the rows of D; {@code gaps} leaves out a seeded one column in 30,
 * as assets that list, pause or delist do, so the rows are gathered through the column list.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class SnapshotBenchmark {
    @Param({"500", "2000"})
    public int n;

    @Param({"all", "gaps"})
    public String columns;

    private RunningMoments running;
    private int[] chosen;

    @Setup
    public void setUp() {
        ReturnPanel panel = BenchData.panel(BenchData.WINDOW + BenchData.STEP, n, 2L);
        running = new RunningMoments(panel, BenchData.WINDOW);
        running.moveTo(panel.rows() - 1);
        SplittableRandom rng = new SplittableRandom(3L);
        chosen = "all".equals(columns) ? BenchData.allColumns(n)
                : IntStream.range(0, n).filter(i -> rng.nextInt(30) != 0).toArray();
    }

    @Benchmark
    public WindowMoments snapshot() {
        return running.snapshot(chosen);
    }
}
