package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.moments.RunningMoments;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.IntPredicate;
import java.util.function.Supplier;

/**
 * Cuts estimation windows out of a panel (Method §2-§3): an asset is eligible at τ for window L
 * when it has a return in every row τ−L+1..τ and its return, or its excess return, is not the
 * same number in every one of those rows (see {@link #constant}); the window holds excess
 * returns x = r − rf and m = r_m − rf over those rows. Only rows up to τ are read, so nothing
 * after τ can reach a model.
 */
final class WindowBuilder {
    private final ReturnPanel panel;
    /** missingBefore[t * n + i] = rows before t in which asset i has no return (prefix counts). */
    private final int[] missingBefore;

    WindowBuilder(ReturnPanel panel) {
        this.panel = panel;
        int rows = panel.rows();
        int n = panel.assetCount();
        double[] r = panel.rawReturns();
        missingBefore = new int[(rows + 1) * n];
        for (int t = 0; t < rows; t++) {
            int from = t * n;
            int to = from + n;
            for (int i = 0; i < n; i++) {
                missingBefore[to + i] = missingBefore[from + i] + (Double.isNaN(r[from + i]) ? 1 : 0);
            }
        }
    }

    /** The panel columns eligible at τ for window L, ascending. */
    int[] eligible(int tau, int length) {
        int[] complete = complete(tau, length);
        int[] out = new int[complete.length];
        int count = 0;
        for (int c : complete) {
            if (!constant(c, tau, length)) {
                out[count++] = c;
            }
        }
        return Arrays.copyOf(out, count);
    }

    /** The panel columns with a return in every row of the window, ascending (before the constancy rule). */
    int[] complete(int tau, int length) {
        int n = panel.assetCount();
        int first = tau - length + 1;
        int[] out = new int[n];
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (missingBefore[(tau + 1) * n + i] - missingBefore[first * n + i] == 0) {
                out[count++] = i;
            }
        }
        return Arrays.copyOf(out, count);
    }

    /**
     * Whether a complete column's return, or its excess return, is the same number in every row
     * of the window. Such a series (a suspended stock with a stale price, or a cash-like asset)
     * has zero sample variance: the sample matrix is singular, a minimum-variance rule would
     * take it for a riskless asset, and its market-model residual has no correlation. It is left
     * out of the window. Compared exactly, so the rule does not depend on rounding; a series
     * that varies exits at its first change, so the check costs O(1) for ordinary assets.
     */
    boolean constant(int col, int tau, int length) {
        int n = panel.assetCount();
        double[] r = panel.rawReturns();
        int first = tau - length + 1;
        double raw = r[first * n + col];
        double excess = raw - panel.riskFree(first);
        boolean rawSame = true;
        boolean excessSame = true;
        for (int t = first + 1; t <= tau && (rawSame || excessSame); t++) {
            double v = r[t * n + col];
            rawSame &= v == raw;
            excessSame &= v - panel.riskFree(t) == excess;
        }
        return rawSame || excessSame;
    }

    /** Whether the asset's own return (not only its excess return) is the same number in every row. */
    boolean rawConstant(int col, int tau, int length) {
        int n = panel.assetCount();
        double[] r = panel.rawReturns();
        int first = tau - length + 1;
        double raw = r[first * n + col];
        for (int t = first + 1; t <= tau; t++) {
            if (r[t * n + col] != raw) {
                return false;
            }
        }
        return true;
    }

    /** Whether the market's excess return is the same number in every row of the window (zero variance). */
    boolean marketConstant(int tau, int length) {
        int first = tau - length + 1;
        double m0 = panel.market(first) - panel.riskFree(first);
        for (int t = first + 1; t <= tau; t++) {
            if (panel.market(t) - panel.riskFree(t) != m0) {
                return false;
            }
        }
        return true;
    }

    /**
     * The window of length L ending at row τ, over the eligible assets; its moments are computed
     * from its own rows when a model first asks.
     */
    EstimationWindow build(int tau, int length) {
        return build(tau, length, null);
    }

    /**
     * The window of length L ending at row τ, whose moments come from the running sums of its
     * window length: they are moved to τ when a model first asks. The sums must not move past τ
     * before then (the walk-forward loop finishes a rebalance before it builds the next window).
     *
     * @param running the running sums for this window length, or {@code null} to compute the
     *     moments from the window's own rows
     */
    EstimationWindow build(int tau, int length, RunningMoments running) {
        return build(tau, length, running, n -> true);
    }

    /**
     * The window of length L ending at row τ. When {@code dense} holds for its number of eligible
     * assets n, its moments include the dense S, from the running sums when given (moved to τ
     * when a model first asks; they must not move past τ before then) or else from the window's
     * own rows; otherwise only the cheap moments are computed, from the window's rows in O(L n),
     * and the dense S only if someone asks anyway ({@link WindowMoments#withoutCovariance}).
     *
     * @param running the running sums for this window length, or {@code null}
     * @param dense whether a consumer of the window needs the dense S, given n
     */
    EstimationWindow build(int tau, int length, RunningMoments running, IntPredicate dense) {
        int[] cols = eligible(tau, length);
        int n = cols.length;
        int all = panel.assetCount();
        double[] r = panel.rawReturns();
        double[] x = new double[length * n];
        double[] m = new double[length];
        int first = tau - length + 1;
        for (int t = 0; t < length; t++) {
            int row = first + t;
            double rf = panel.riskFree(row);
            m[t] = panel.market(row) - rf;
            int src = row * all;
            int dst = t * n;
            for (int k = 0; k < n; k++) {
                x[dst + k] = r[src + cols[k]] - rf;
            }
        }
        List<String> ids = new ArrayList<>(n);
        for (int c : cols) {
            ids.add(panel.assets().get(c));
        }
        Supplier<WindowMoments> source;
        if (!dense.test(n)) {
            source = () -> WindowMoments.withoutCovariance(x, m, n);
        } else {
            source = running == null ? null : () -> momentsAt(running, tau, length, cols);
        }
        return new EstimationWindow(panel.date(tau), tau, ids, cols, x, m, panel.periodsPerYear(), source);
    }

    private static WindowMoments momentsAt(RunningMoments running, int tau, int length, int[] cols) {
        if (running.length() != length) {
            throw new IllegalStateException("running sums of window " + running.length() + " asked for window " + length);
        }
        if (running.endRow() > tau) {
            throw new IllegalStateException("moments of the window ending at row " + tau
                    + " asked after the running sums moved on to row " + running.endRow());
        }
        running.moveTo(tau);
        return running.snapshot(cols);
    }
}
