package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.compare.PairScanPlan;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.compare.WindowEvidenceProbe;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.timeline.Schedule;
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
 * The residual evidence of one rebalance (Method §8): every statistic of {@code diagnostics.csv},
 * the ten largest pairs and the sector × sector means over eleven sectors, on a window of
 * L = 120 rows (ten years of months, the longer window of the 10,000-asset case). The window's
 * cheap moments are computed in the set-up and handed in, as the walk-forward does, so the
 * figure is the probe's own time; {@code denseMoments} is what the dense moments cost, which the
 * evidence needed before it could work from the rows.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx5g")
public class ResidualEvidenceBenchmark {
    /** Rows of the window. */
    static final int LENGTH = 120;
    /** Sectors the assets are spread over, round robin. */
    static final int SECTORS = 11;
    /** Largest pairs kept, as a run keeps them. */
    static final int PAIRS = 10;

    @Param({"500", "2000", "10000"})
    public int n;

    private EstimationWindow window;
    private EstimationWindow bare;
    private WindowEvidenceProbe probe;
    private WindowEvidenceProbe betweenScans;

    @Setup
    public void setUp() {
        ReturnPanel panel = BenchData.panel(LENGTH, n, 3L);
        bare = BenchData.window(panel, LENGTH - 1, LENGTH, null);
        // The cheap moments only, as the walk-forward hands them to a window whose consumers do
        // not need the dense S (L < n here for every n).
        WindowMoments moments = WindowMoments.withoutCovariance(bare.excessReturns(), bare.marketExcess(), n);
        window = BenchData.window(panel, LENGTH - 1, LENGTH, () -> moments);
        window.moments();
        Map<String, String> sectors = new HashMap<>();
        for (int i = 0; i < n; i++) {
            sectors.put(panel.assets().get(i), "S" + (i % SECTORS));
        }
        probe = new WindowEvidenceProbe(sectors, PAIRS);
        // The window ends at the third of four rebalances: not a scan date of a thinned plan.
        Schedule schedule = new Schedule(new int[] {LENGTH - 3, LENGTH - 2, LENGTH - 1, LENGTH}, LENGTH + 1);
        betweenScans = new WindowEvidenceProbe(sectors, PAIRS, PairScanPlan.of(schedule, 2, PairScanPlan.EVERY));
    }

    /** A rebalance at which every statistic is computed, the all-pairs ones included. */
    @Benchmark
    public WindowEvidence everyStatistic() {
        return probe.probe(window);
    }

    /** A rebalance between two pair scans: CD, LM, LM_adj and the sector means only. */
    @Benchmark
    public WindowEvidence betweenPairScans() {
        return betweenScans.probe(window);
    }

    /** The window's dense moments from its rows (the n×n matrix the moment route reads). */
    @Benchmark
    public WindowMoments denseMoments() {
        return WindowMoments.of(bare);
    }
}
