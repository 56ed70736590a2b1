package dev.sigmawalk.reports.sweep;

import java.util.Objects;

/**
 * One strategy-against-baseline test of a point's {@code tests.csv} on the volatility measure.
 *
 * @param point the grid point
 * @param strategy the strategy tested
 * @param baseline the strategy it was compared with
 * @param window estimation window length
 * @param pValue the studentised block bootstrap p-value of the variance difference
 */
public record PointComparison(GridPoint point, String strategy, String baseline, String window, double pValue) {
    public PointComparison {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(window, "window");
        if (!(pValue >= 0 && pValue <= 1)) {
            throw new IllegalArgumentException("pValue (" + pValue + ") must be in [0, 1]");
        }
    }
}
