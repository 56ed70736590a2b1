package dev.sigmawalk.reports.sweep;

import java.util.Objects;

/**
 * One line of a point's {@code summary.csv} as the sweep uses it (annualised as there).
 *
 * @param point the grid point
 * @param strategy strategy name, or {@code market}
 * @param window estimation window length; empty for the market
 * @param volatility realised volatility, a year
 * @param sharpe Sharpe ratio, a year
 * @param meanTurnover mean turnover per rebalance
 * @param bias bias statistic (NaN where the summary has none)
 * @param invested whether the path formed a portfolio at one rebalance at least (the market
 *                 always counts as invested); a path that never did held cash throughout, and its
 *                 volatility is the risk-free rate's, not a model's
 */
public record PointRow(GridPoint point, String strategy, String window, double volatility, double sharpe,
                       double meanTurnover, double bias, boolean invested) {
    public PointRow {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(window, "window");
    }

    /** A row of a path that formed a portfolio. */
    public PointRow(GridPoint point, String strategy, String window, double volatility, double sharpe,
                    double meanTurnover, double bias) {
        this(point, strategy, window, volatility, sharpe, meanTurnover, bias, true);
    }

    /** Whether this is the market benchmark's row (not a strategy). */
    public boolean isMarket() {
        return window.isEmpty();
    }
}
