package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;

/**
 * A window's excess returns demeaned row by row on request, x̃_ti = x_ti - x̄_i and
 * ỹ_t = m_t - m̄, together with the moments they were centred by. Reading a row costs O(n) and
 * allocates nothing, so the shrinkage estimators can sweep an L×n window without an L×n copy.
 */
final class CentredWindow {
    private final double[] excess;
    private final double[] market;
    private final WindowMoments moments;
    private final int n;

    CentredWindow(EstimationWindow window) {
        this.excess = window.excessReturns();
        this.market = window.marketExcess();
        this.moments = window.moments();
        this.n = window.assetCount();
        if (moments.assets() != n || moments.length() != window.length()) {
            throw new IllegalArgumentException("window moments (n = " + moments.assets() + ", L = " + moments.length()
                    + ") must match the window (n = " + n + ", L = " + window.length() + ")");
        }
    }

    WindowMoments moments() {
        return moments;
    }

    /** n. */
    int assets() {
        return n;
    }

    /** L. */
    int length() {
        return market.length;
    }

    /**
     * (L-1)/L: turns a moment with divisor L-1 into the same moment with divisor L, the
     * convention of the Ledoit-Wolf papers.
     */
    double toPopulationDivisor() {
        return (market.length - 1.0) / market.length;
    }

    /** Writes x̃_t into {@code out} (length n) and returns ỹ_t. */
    double row(int t, double[] out) {
        double[] mean = moments.mean();
        int base = t * n;
        for (int i = 0; i < n; i++) {
            out[i] = excess[base + i] - mean[i];
        }
        return market[t] - moments.marketMean();
    }
}
