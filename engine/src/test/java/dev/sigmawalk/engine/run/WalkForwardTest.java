package dev.sigmawalk.engine.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class WalkForwardTest {
    private static final List<Integer> WINDOWS = List.of(24, 36);

    private static RunResult<Integer> run(ReturnPanel panel, int threads) {
        WalkForwardSpec spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(3), Optional.empty(),
                Optional.empty(), 10);
        Schedule schedule = Timeline.plan(panel, spec);
        List<StrategyDefinition> strategies = List.of(new InverseVarianceStrategy("iv", -1),
                new InverseVarianceStrategy("iv-failing", 50));
        return new WalkForward<>(panel, schedule, strategies, WINDOWS, 10, EstimationWindowProbe.COUNT)
                .run(threads, ProgressListener.NONE);
    }

    /** Counts eligible assets, to show probes see every window. */
    enum EstimationWindowProbe implements WindowProbe<Integer> {
        COUNT;

        @Override
        public Integer probe(dev.sigmawalk.engine.model.EstimationWindow window) {
            return window.assetCount();
        }
    }

    /**
     * No look-ahead (Method §2): replacing every value after a random row τ with random numbers
     * leaves every weight chosen at or before τ bit-for-bit unchanged. Twenty-five seeded cases
     * (τ and the scrambling seed drawn from a fixed seed, so a failure reproduces).
     */
    @Test
    void weightsChosenByTau_doNotDependOnLaterRows() {
        SplittableRandom cases = new SplittableRandom(20_240_601L);
        for (int c = 0; c < 25; c++) {
            int tau = cases.nextInt(36, 91);
            assertUnchangedUpTo(tau, cases.nextLong(1, 1_000_000));
        }
    }

    private static void assertUnchangedUpTo(int tau, long seed) {
        ReturnPanel original = TestPanels.random(96, 6, 11);
        ReturnPanel scrambled = scrambleAfter(original, tau, seed);
        RunResult<Integer> a = run(original, 1);
        RunResult<Integer> b = run(scrambled, 1);
        for (int p = 0; p < a.paths().size(); p++) {
            List<RebalanceRecord> ra = a.paths().get(p).rebalances();
            List<RebalanceRecord> rb = b.paths().get(p).rebalances();
            for (int j = 0; j < ra.size(); j++) {
                if (ra.get(j).row() > tau) {
                    break;
                }
                assertArrayEquals(ra.get(j).weights(), rb.get(j).weights(), 0.0,
                        "weights at row " + ra.get(j).row() + " changed when rows after " + tau + " changed");
                assertEquals(ra.get(j).forecastVariance(), rb.get(j).forecastVariance(), "forecast at row " + ra.get(j).row());
            }
        }
    }

    private static ReturnPanel scrambleAfter(ReturnPanel p, int tau, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        int n = p.assetCount();
        double[] r = p.rawReturns().clone();
        double[] m = new double[p.rows()];
        double[] rf = new double[p.rows()];
        for (int t = 0; t < p.rows(); t++) {
            m[t] = t > tau ? rng.nextDouble(-0.3, 0.3) : p.market(t);
            rf[t] = t > tau ? rng.nextDouble(0, 0.01) : p.riskFree(t);
            for (int i = 0; t > tau && i < n; i++) {
                r[t * n + i] = rng.nextInt(10) == 0 ? Double.NaN : rng.nextDouble(-0.5, 0.5);
            }
        }
        return new ReturnPanel(p.dates(), p.assets(), r, m, rf, p.marketName(), p.periodsPerYear());
    }

    /** Results do not depend on the number of threads. */
    @Test
    void twoThreads_giveTheSameResultsAsOne() {
        ReturnPanel panel = TestPanels.random(120, 8, 5);
        RunResult<Integer> one = run(panel, 1);
        RunResult<Integer> two = run(panel, 2);
        assertEquals(one.paths().size(), two.paths().size());
        for (int p = 0; p < one.paths().size(); p++) {
            assertArrayEquals(one.paths().get(p).net(), two.paths().get(p).net(), 0.0, "path " + p);
            assertArrayEquals(one.paths().get(p).gross(), two.paths().get(p).gross(), 0.0, "path " + p);
        }
        assertEquals(one.probes(), two.probes());
    }

    /**
     * One window and several strategies: the strategies decide in parallel at each rebalance,
     * and the result equals the one-thread run bit for bit.
     */
    @Test
    void oneWindow_strategiesDecidingInParallel_matchOneThread() {
        ReturnPanel panel = TestPanels.random(90, 7, 17);
        WalkForwardSpec spec = new WalkForwardSpec(List.of(30), new RebalanceRule.EveryRows(2), Optional.empty(),
                Optional.empty(), 5);
        Schedule schedule = Timeline.plan(panel, spec);
        List<StrategyDefinition> strategies = List.of(new InverseVarianceStrategy("a", -1),
                new InverseVarianceStrategy("b", 41), new InverseVarianceStrategy("c", 60),
                new InverseVarianceStrategy("d", -1));
        RunResult<Integer> one = new WalkForward<>(panel, schedule, strategies, List.of(30), 5,
                EstimationWindowProbe.COUNT).run(1, ProgressListener.NONE);
        RunResult<Integer> four = new WalkForward<>(panel, schedule, strategies, List.of(30), 5,
                EstimationWindowProbe.COUNT).run(4, ProgressListener.NONE);
        for (int p = 0; p < one.paths().size(); p++) {
            assertArrayEquals(one.paths().get(p).net(), four.paths().get(p).net(), 0.0, "path " + p);
            assertEquals(one.paths().get(p).rebalances().size(), four.paths().get(p).rebalances().size());
            for (int j = 0; j < one.paths().get(p).rebalances().size(); j++) {
                assertArrayEquals(one.paths().get(p).rebalances().get(j).weights(),
                        four.paths().get(p).rebalances().get(j).weights(), 0.0, "path " + p + " rebalance " + j);
            }
        }
    }

    /** All windows share one out-of-sample period starting after τ_0 = L_max − 1 (Method §2). */
    @Test
    void everyWindow_sharesTheOutOfSamplePeriod() {
        ReturnPanel panel = TestPanels.random(100, 5, 3);
        RunResult<Integer> r = run(panel, 2);
        assertEquals(35, r.schedule().firstRebalance(), "τ_0 = L_max − 1");
        assertEquals(panel.date(36), r.dates()[0]);
        assertEquals(100 - 36, r.dates().length);
        for (PathResult p : r.paths()) {
            assertEquals(64, p.net().length, p.strategy() + "/" + p.window());
        }
        assertEquals(List.of(24, 36), new ArrayList<>(List.of(r.paths().get(0).window(), r.paths().get(2).window())));
    }

    /**
     * A failed rebalance keeps the drifted portfolio without trading and has no forecast; the row
     * it starts has no cost.
     */
    @Test
    void failedRebalance_keepsDriftedHoldings_withoutTrading() {
        ReturnPanel panel = TestPanels.random(100, 5, 3);
        RunResult<Integer> r = run(panel, 1);
        PathResult failing = r.path("iv-failing", 24);
        RebalanceRecord failed = failing.rebalances().stream().filter(x -> x.row() == 50).findFirst().orElseThrow();
        assertTrue(failed.failure().isPresent());
        assertEquals(0.0, failed.turnover());
        assertTrue(failed.forecastVariance().isEmpty());
        int k = 50 + 1 - (r.schedule().firstRebalance() + 1);
        assertEquals(failing.gross()[k], failing.net()[k], 0.0, "no cost after a failed rebalance");
        assertTrue(Double.isNaN(failing.forecastVolatility()[k]));
        assertEquals(1.0, sum(failed.weights()), 1e-12, "drifted weights still sum to one");
    }

    /** The first rebalance trades from cash: turnover = Σ|w| = 1 for a long-only portfolio. */
    @Test
    void firstRebalance_tradesFromCash() {
        RunResult<Integer> r = run(TestPanels.random(80, 4, 9), 1);
        RebalanceRecord first = r.path("iv", 36).rebalances().get(0);
        assertEquals(1.0, first.turnover(), 1e-15);
        assertEquals(0.001, first.cost(), 1e-15, "10 bp of a turnover of 1");
        PathResult p = r.path("iv", 36);
        assertEquals(p.gross()[0] - 0.001, p.net()[0], 1e-15);
    }

    /** An asset with a missing return inside its window is not eligible there. */
    @Test
    void assetWithGapInWindow_isNotEligible() {
        ReturnPanel base = TestPanels.random(60, 4, 1);
        double[] r = base.rawReturns().clone();
        r[30 * 4 + 2] = Double.NaN;
        ReturnPanel gappy = new ReturnPanel(base.dates(), base.assets(), r, marketOf(base), rfOf(base), "index", 12);
        WindowBuilder b = new WindowBuilder(gappy);
        assertArrayEquals(new int[] {0, 1, 3}, b.eligible(35, 24), "gap at row 30 lies in rows 12..35");
        assertArrayEquals(new int[] {0, 1, 2, 3}, b.eligible(29, 24), "window 6..29 ends before the gap");
        assertArrayEquals(new int[] {0, 1, 2, 3}, b.eligible(54, 24), "window 31..54 starts after the gap");
        assertEquals(LocalDate.of(2003, 12, 31), b.build(35, 24).date());
    }

    private static double[] marketOf(ReturnPanel p) {
        double[] m = new double[p.rows()];
        for (int t = 0; t < m.length; t++) {
            m[t] = p.market(t);
        }
        return m;
    }

    private static double[] rfOf(ReturnPanel p) {
        double[] m = new double[p.rows()];
        for (int t = 0; t < m.length; t++) {
            m[t] = p.riskFree(t);
        }
        return m;
    }

    private static double sum(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s;
    }
}
