package dev.sigmawalk.reports.charts;

/**
 * Drawing options of a line chart.
 *
 * @param markers draw a small dot at every point (for sparse series such as rebalances)
 * @param includeZero the y axis always reaches 0 (for quantities whose size matters, like drawdown)
 */
public record LineOptions(boolean markers, boolean includeZero) {
    /** Plain lines, y range fitted to the data. */
    public static final LineOptions PLAIN = new LineOptions(false, false);
}
