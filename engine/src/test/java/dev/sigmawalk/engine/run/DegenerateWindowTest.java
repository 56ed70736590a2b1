package dev.sigmawalk.engine.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.moments.RunningMoments;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Zero-variance windows are data, not crashes: a series that is the same number in every row of
 * a window is found exactly, left out of the eligible assets (an asset) or given an exactly zero
 * variance (the market), and named with its window length and dates.
 */
class DegenerateWindowTest {
    private static final int ROWS = 60;
    private static final int ASSETS = 5;
    /** Asset Q03 (column 2) is suspended, zero return, in rows 20..39. */
    private static final int SUSPENDED = 2;

    private static ReturnPanel withRows(ReturnPanel base, int col, int from, int to, double value, boolean market) {
        double[] r = base.rawReturns().clone();
        double[] m = new double[base.rows()];
        double[] rf = new double[base.rows()];
        for (int t = 0; t < base.rows(); t++) {
            m[t] = base.market(t);
            rf[t] = base.riskFree(t);
            if (t >= from && t <= to) {
                if (market) {
                    m[t] = value;
                } else {
                    r[t * base.assetCount() + col] = value;
                }
            }
        }
        return new ReturnPanel(base.dates(), base.assets(), r, m, rf, base.marketName(), base.periodsPerYear());
    }

    private static ReturnPanel suspended() {
        return withRows(TestPanels.random(ROWS, ASSETS, 5), SUSPENDED, 20, 39, 0.0, false);
    }

    @Test
    void suspendedStock_isLeftOutOfEveryWindowInsideItsSuspension_only() {
        WindowBuilder builder = new WindowBuilder(suspended());
        assertEquals(List.of("Q01", "Q02", "Q04", "Q05"), builder.build(39, 12).assets(), "window 28..39 all zero");
        assertEquals(List.of("Q01", "Q02", "Q04", "Q05"), builder.build(31, 12).assets(), "window 20..31 all zero");
        assertEquals(5, builder.build(30, 12).assetCount(), "window 19..30 has one traded row");
        assertEquals(5, builder.build(40, 12).assetCount(), "window 29..40 has one traded row");
    }

    /**
     * A cash-like asset (bill rate plus a fixed spread) has a constant excess return although its
     * return varies. Binary fractions, so the spread survives the subtraction exactly.
     */
    @Test
    void constantExcessReturn_withVaryingRiskFree_isLeftOut() {
        ReturnPanel base = TestPanels.random(ROWS, ASSETS, 6);
        double[] r = base.rawReturns().clone();
        double[] m = new double[ROWS];
        double[] rf = new double[ROWS];
        for (int t = 0; t < ROWS; t++) {
            m[t] = base.market(t);
            rf[t] = t % 2 == 0 ? 0.25 : 0.5;
            r[t * ASSETS] = rf[t] + 0.25;
        }
        WindowBuilder builder = new WindowBuilder(new ReturnPanel(base.dates(), base.assets(), r, m, rf, "index", 12));
        assertTrue(builder.constant(0, 23, 12), "excess exactly 0.25 in every row");
        assertFalse(builder.constant(1, 23, 12), "an ordinary asset");
        assertEquals(List.of("Q02", "Q03", "Q04", "Q05"), builder.build(23, 12).assets());
    }

    /** The same cash-like asset: its warning must not say its return is constant, since it is not. */
    @Test
    void constantExcessReturn_isWarnedAsSuch() {
        ReturnPanel base = TestPanels.random(ROWS, ASSETS, 6);
        double[] r = base.rawReturns().clone();
        double[] m = new double[ROWS];
        double[] rf = new double[ROWS];
        for (int t = 0; t < ROWS; t++) {
            m[t] = base.market(t);
            rf[t] = t % 2 == 0 ? 0.25 : 0.5;
            r[t * ASSETS] = rf[t] + 0.25;
        }
        ReturnPanel panel = new ReturnPanel(base.dates(), base.assets(), r, m, rf, "index", 12);
        WalkForwardSpec spec = new WalkForwardSpec(List.of(12), new RebalanceRule.EveryRows(1), Optional.empty(),
                Optional.empty(), 0);
        List<ConstantSpan> spans = WindowScan.of(panel, Timeline.plan(panel, spec), List.of(12)).constantSpans();
        assertEquals(1, spans.size(), spans.toString());
        LocalDate[] d = panel.dates();
        assertEquals("asset 'Q01': its excess return is the same in every row of the 12-row window at 48 rebalances"
                + " from " + d[11] + " to " + d[58] + " (first such window " + d[0] + " to " + d[11] + "), though its"
                + " return moves with the risk-free rate; a series with zero variance (a suspended stock or a stale"
                + " price) has no risk to estimate, so it is left out of the eligible assets at those rebalances,"
                + " for every strategy", spans.get(0).warning());
    }

    @Test
    void constantMarket_givesExactlyZeroMarketMoments_alsoFromRunningSums() {
        ReturnPanel panel = withRows(TestPanels.random(ROWS, ASSETS, 7), 0, 20, 45, 0.004, true);
        WindowBuilder builder = new WindowBuilder(panel);
        RunningMoments running = new RunningMoments(panel, 12);
        for (int tau = 11; tau < ROWS; tau++) {
            EstimationWindow w = builder.build(tau, 12, running);
            boolean flat = tau >= 31 && tau <= 45;
            assertEquals(flat, builder.marketConstant(tau, 12), "market constant at " + tau);
            assertEquals(!flat, w.marketVaries(), "window agrees with the builder at " + tau);
            if (flat) {
                assertEquals(0.0, w.moments().marketVariance(), "s_mm at " + tau);
                for (double sim : w.moments().marketCovariance()) {
                    assertEquals(0.0, sim, "s_im at " + tau);
                }
            } else {
                assertTrue(w.moments().marketVariance() > 0, "s_mm at " + tau);
            }
        }
    }

    @Test
    void scan_namesTheSeriesWindowAndDates_andCountsEligibleAssets() {
        ReturnPanel panel = withRows(suspended(), 0, 44, 57, 0.003, true);
        WalkForwardSpec spec = new WalkForwardSpec(List.of(12), new RebalanceRule.EveryRows(1), Optional.empty(),
                Optional.empty(), 0);
        Schedule schedule = Timeline.plan(panel, spec);
        WindowScan scan = WindowScan.of(panel, schedule, List.of(12));
        List<ConstantSpan> spans = scan.constantSpans();
        assertEquals(2, spans.size(), spans.toString());
        ConstantSpan market = spans.get(0);
        LocalDate[] d = panel.dates();
        // Rows 44..57 flat: windows ending at 55, 56, 57.
        assertEquals(new ConstantSpan("index", true, 12, 3, d[55], d[57], d[44]), market);
        ConstantSpan asset = spans.get(1);
        // Rows 20..39 zero: windows ending at 31..39.
        assertEquals(new ConstantSpan("Q03", false, 12, 9, d[31], d[39], d[20]), asset);
        assertEquals("asset 'Q03': its return is the same in every row of the 12-row window at 9 rebalances from "
                + d[31] + " to " + d[39] + " (first such window " + d[20] + " to " + d[31] + "); a series with zero"
                + " variance (a suspended stock or a stale price) has no risk to estimate, so it is left out of the"
                + " eligible assets at those rebalances, for every strategy", asset.warning());
        assertTrue(market.warning().startsWith("market 'index': its excess return is the same in every row of the"
                + " 12-row window at 3 rebalances from " + d[55]), market.warning());
        for (int j = 0; j < scan.rebalances(); j++) {
            int tau = schedule.rebalanceRow(j);
            assertEquals(new WindowBuilder(panel).build(tau, 12).assetCount(), scan.eligible(12, j),
                    "scan and walk-forward agree at row " + tau);
        }
    }
}
