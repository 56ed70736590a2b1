package dev.sigmawalk.engine.model;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.function.Supplier;

/**
 * The data one rebalance may use: the excess returns x_{t,i} = r_{t,i} - rf_t of the eligible
 * assets over rows τ-L+1..τ (oldest first), and the market's excess return m_t over the same
 * rows. Nothing after row τ is reachable from here, which is how the engine rules out
 * look-ahead.
 *
 * <p>Arrays are owned by the window and must not be modified. Moments are computed at most once
 * (lazily, or handed in precomputed) and shared by every model that asks; a window is used by
 * one thread at a time.
 */
public final class EstimationWindow {
    private final LocalDate date;
    private final int endRow;
    private final List<String> assets;
    private final int[] columns;
    private final double[] excess;
    private final double[] market;
    private final int periodsPerYear;
    private Supplier<WindowMoments> momentsSource;
    private WindowMoments moments;

    /**
     * @param date the rebalance date d_τ
     * @param endRow τ, the panel row of the rebalance
     * @param assets eligible asset ids, in panel column order
     * @param columns their panel columns
     * @param excess L×n row-major excess returns
     * @param market L market excess returns
     * @param periodsPerYear p
     * @param momentsSource how to get the moments; {@code null} = compute from the data
     */
    public EstimationWindow(LocalDate date, int endRow, List<String> assets, int[] columns, double[] excess,
                            double[] market, int periodsPerYear, Supplier<WindowMoments> momentsSource) {
        this.date = Objects.requireNonNull(date, "date");
        this.endRow = endRow;
        this.assets = List.copyOf(assets);
        this.columns = columns;
        this.excess = excess;
        this.market = market;
        this.periodsPerYear = periodsPerYear;
        if (columns.length != this.assets.size()) {
            throw new IllegalArgumentException("columns (" + columns.length + ") must match assets (" + this.assets.size() + ")");
        }
        if (market.length == 0 || excess.length != market.length * this.assets.size()) {
            throw new IllegalArgumentException("excess returns (" + excess.length + ") must be L*n with L = "
                    + market.length + ", n = " + this.assets.size());
        }
        this.momentsSource = momentsSource;
    }

    public LocalDate date() {
        return date;
    }

    /** τ. */
    public int endRow() {
        return endRow;
    }

    /** L. */
    public int length() {
        return market.length;
    }

    /** n. */
    public int assetCount() {
        return assets.size();
    }

    public List<String> assets() {
        return assets;
    }

    /** Panel columns of the eligible assets (read-only). */
    public int[] columns() {
        return columns;
    }

    /** x_{t,i} at excessReturns()[t*n + i], t = 0 the oldest row (read-only). */
    public double[] excessReturns() {
        return excess;
    }

    /** m_t, t = 0 the oldest row (read-only). */
    public double[] marketExcess() {
        return market;
    }

    public int periodsPerYear() {
        return periodsPerYear;
    }

    /**
     * The window's sample moments, computed at most once. When the market's excess return is the
     * same number in every row, s_mm and every s_im are exactly 0: running sums would otherwise
     * leave rounding dust there, from which a single-index beta would be noise divided by noise.
     */
    public WindowMoments moments() {
        if (moments == null) {
            WindowMoments computed = momentsSource != null ? momentsSource.get() : WindowMoments.of(this);
            moments = marketVaries() ? computed : computed.withConstantMarket();
            momentsSource = null;
        }
        return moments;
    }

    /** Whether the market's excess return takes more than one value in the window (compared exactly). */
    public boolean marketVaries() {
        for (int t = 1; t < market.length; t++) {
            if (market[t] != market[0]) {
                return true;
            }
        }
        return false;
    }
}
