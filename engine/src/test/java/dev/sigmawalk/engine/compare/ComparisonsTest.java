package dev.sigmawalk.engine.compare;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.evidence.HolmAdjustment;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.TestPanels;
import dev.sigmawalk.engine.run.WalkForward;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Timeline;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class ComparisonsTest {
    private static final List<Integer> WINDOWS = List.of(24, 36);
    private static final DifferenceTests TESTS = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(199, 11L, 0));

    /**
     * The tests and the family correction shared out over 2 and 3 threads give every comparison
     * bit for bit as one thread does (record equality compares the doubles bit-wise), on three
     * seeded panels.
     */
    @Test
    void comparisons_areTheSameBitForBit_atEveryThreadCount() {
        for (long seed = 1; seed <= 3; seed++) {
            RunResult<Void> run = run(seed);
            List<Comparison> one = of(run, 1);
            assertTrue(one.stream().anyMatch(c -> Double.isFinite(c.familySharpe())), "seed " + seed + ": a family value");
            for (int threads = 2; threads <= 3; threads++) {
                assertEquals(one, of(run, threads), "seed " + seed + ", " + threads + " threads");
            }
        }
    }

    /**
     * On several threads each comparison still holds the plain tests of its two paths (Method §9:
     * Sharpe ratios on excess net returns, variances on net returns) and Holm's adjustment of its
     * bootstrap p-values across the windows of its pair.
     */
    @Test
    void eachComparison_holdsThePlainTestsOfItsPaths_onThreeThreads() {
        RunResult<Void> run = run(4);
        List<Comparison> found = of(run, 3);
        for (Comparison c : found) {
            double[] netA = run.path(c.strategy(), c.window()).net();
            double[] netB = run.path(c.baseline(), c.window()).net();
            assertEquals(Optional.of(TESTS.sharpeRatio(SeriesStats.minus(netA, run.riskFree()),
                    SeriesStats.minus(netB, run.riskFree()))), c.sharpe(), c.strategy() + " at " + c.window());
            assertEquals(Optional.of(TESTS.variance(netA, netB)), c.variance(), c.strategy() + " at " + c.window());
        }
        for (String strategy : List.of("inverse", "tilted")) {
            List<Comparison> pair = found.stream().filter(c -> c.strategy().equals(strategy)
                    && c.baseline().equals("equal")).toList();
            assertEquals(WINDOWS.size(), pair.size(), strategy + ": one comparison per window");
            double[] holm = HolmAdjustment.adjust(pair.stream()
                    .mapToDouble(c -> c.sharpe().orElseThrow().bootstrapPValue()).toArray());
            assertArrayEquals(holm, pair.stream().mapToDouble(Comparison::holmSharpe).toArray(), 0.0, strategy);
        }
    }

    private static List<Comparison> of(RunResult<Void> run, int threads) {
        Map<String, String> baselines = new LinkedHashMap<>();
        baselines.put("inverse", "equal");
        baselines.put("tilted", "equal");
        return Comparisons.of(run, baselines, WINDOWS, TESTS, ScannedPair.lowestVolatility(run), threads);
    }

    private static RunResult<Void> run(long seed) {
        var panel = TestPanels.random(150, 6, seed);
        var spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(1), Optional.empty(), Optional.empty(), 10);
        List<StrategyDefinition> strategies = List.of(new Weighted("equal", 0), new Weighted("inverse", 1),
                new Weighted("tilted", 2));
        return new WalkForward<Void>(panel, Timeline.plan(panel, spec), strategies, WINDOWS, 10, w -> null)
                .run(1, ProgressListener.NONE);
    }

    /** Equal weights (0), weights ∝ 1/S_ii (1), or weights rising with the asset's position (2). */
    private record Weighted(String name, int rule) implements StrategyDefinition {
        @Override
        public Allocator newAllocator(int window) {
            return this::decide;
        }

        @Override
        public String riskLabel() {
            return "fixed rule " + rule;
        }

        private Decision decide(EstimationWindow w) {
            int n = w.assetCount();
            double[] weights = new double[n];
            Arrays.setAll(weights, i -> rule == 0 ? 1 : rule == 1 ? 1 / w.moments().covariance(i, i) : i + 1);
            double total = Arrays.stream(weights).sum();
            Arrays.setAll(weights, i -> weights[i] / total);
            // w'Sw over the whole window matrix: the forecast the engine records.
            double variance = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    variance += weights[i] * weights[j] * w.moments().covariance(i, j);
                }
            }
            return new Decision.Chosen(weights, variance, OptionalDouble.empty(), List.of());
        }
    }
}
