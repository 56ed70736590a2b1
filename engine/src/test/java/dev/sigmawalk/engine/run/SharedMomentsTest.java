package dev.sigmawalk.engine.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.moments.RunningMoments;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The moments the walk-forward loop hands to models come from running sums; they must be the window's own. */
class SharedMomentsTest {
    private static final List<Integer> WINDOWS = List.of(24, 36);
    /** Agreement of running sums with a fresh two-pass computation, relative to √(S_ii S_jj). */
    private static final double RELATIVE = 1e-12;

    /**
     * Every window of a run with rebalances every row (over 80 moves a window length, so the
     * sums are rebuilt several times) on a panel with a late listing, a gap and a delisting:
     * the shared moments match {@link WindowMoments#of} on the window's own rows (Method §3,
     * two passes) to 1e-12, over exactly the eligible assets.
     */
    @Test
    void everyWindowsSharedMoments_matchTwoPassOnItsOwnRows() {
        ReturnPanel panel = gappy(TestPanels.random(120, 7, 21));
        WalkForwardSpec spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(1), Optional.empty(),
                Optional.empty(), 0);
        Schedule schedule = Timeline.plan(panel, spec);
        List<StrategyDefinition> strategies = List.of(new InverseVarianceStrategy("iv", -1));
        RunResult<Double> run = new WalkForward<>(panel, schedule, strategies, WINDOWS, 0,
                SharedMomentsTest::largestScaledDifference).run(2, ProgressListener.NONE);
        int windows = 0;
        for (Map.Entry<Integer, List<Double>> e : run.probes().entrySet()) {
            for (double d : e.getValue()) {
                assertTrue(d <= RELATIVE, "window " + e.getKey() + ": scaled difference " + d);
                windows++;
            }
        }
        assertTrue(windows >= 2 * 80, "windows probed: " + windows);
    }

    /** A window whose moments are asked for after the sums moved on is refused, not answered wrongly. */
    @Test
    void staleWindow_isRefused() {
        ReturnPanel panel = TestPanels.random(80, 4, 2);
        WindowBuilder builder = new WindowBuilder(panel);
        RunningMoments running = new RunningMoments(panel, 24);
        EstimationWindow early = builder.build(40, 24, running);
        EstimationWindow late = builder.build(43, 24, running);
        late.moments();
        IllegalStateException e = assertThrows(IllegalStateException.class, early::moments);
        assertTrue(e.getMessage().contains("row 40") && e.getMessage().contains("row 43"), e.getMessage());
    }

    /** The running path and the plain path give the same eligible set and the same moments. */
    @Test
    void runningAndPlainWindows_agree() {
        ReturnPanel panel = gappy(TestPanels.random(90, 6, 8));
        WindowBuilder builder = new WindowBuilder(panel);
        RunningMoments running = new RunningMoments(panel, 30);
        for (int tau = 29; tau < panel.rows(); tau += 4) {
            EstimationWindow viaSums = builder.build(tau, 30, running);
            EstimationWindow plain = builder.build(tau, 30);
            assertEquals(plain.assets(), viaSums.assets(), "eligible at " + tau);
            assertTrue(largestScaledDifference(viaSums) <= RELATIVE, "moments at " + tau);
            assertEquals(0.0, scaledDifference(plain.moments(), WindowMoments.of(plain)), "plain path at " + tau);
        }
    }

    /** max |Δ| over S (scaled by √(S_ii S_jj)), s_im, s_mm and the means, against a fresh computation. */
    private static double largestScaledDifference(EstimationWindow w) {
        EstimationWindow fresh = new EstimationWindow(w.date(), w.endRow(), w.assets(), w.columns(),
                w.excessReturns(), w.marketExcess(), w.periodsPerYear(), null);
        return scaledDifference(WindowMoments.of(fresh), w.moments());
    }

    private static double scaledDifference(WindowMoments want, WindowMoments got) {
        int n = want.assets();
        double smm = want.marketVariance();
        double worst = Math.abs(want.marketVariance() - got.marketVariance()) / smm;
        worst = Math.max(worst, Math.abs(want.marketMean() - got.marketMean())
                / (Math.abs(want.marketMean()) + Math.sqrt(smm)));
        for (int i = 0; i < n; i++) {
            double sii = want.covariance(i, i);
            worst = Math.max(worst, Math.abs(want.mean()[i] - got.mean()[i]) / (Math.abs(want.mean()[i]) + Math.sqrt(sii)));
            worst = Math.max(worst, Math.abs(want.marketCovariance()[i] - got.marketCovariance()[i]) / Math.sqrt(sii * smm));
            for (int j = 0; j < n; j++) {
                worst = Math.max(worst, Math.abs(want.covariance(i, j) - got.covariance(i, j))
                        / Math.sqrt(sii * want.covariance(j, j)));
            }
        }
        return worst;
    }

    /** Asset 1 lists at row 30, asset 3 has no return in rows 50-55, asset 5 stops after row 95. */
    private static ReturnPanel gappy(ReturnPanel base) {
        int n = base.assetCount();
        double[] r = base.rawReturns().clone();
        for (int t = 0; t < base.rows(); t++) {
            if (t < 30) {
                r[t * n + 1] = Double.NaN;
            }
            if (t >= 50 && t <= 55) {
                r[t * n + 3] = Double.NaN;
            }
            if (t > 95 && n > 5) {
                r[t * n + 5] = Double.NaN;
            }
        }
        double[] m = new double[base.rows()];
        double[] rf = new double[base.rows()];
        for (int t = 0; t < base.rows(); t++) {
            m[t] = base.market(t);
            rf[t] = base.riskFree(t);
        }
        return new ReturnPanel(base.dates(), base.assets(), r, m, rf, "index", base.periodsPerYear());
    }
}
