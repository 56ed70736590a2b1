package dev.sigmawalk.reports.files;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/** {@code sweep.csv}: one row per grid point, strategy and window; one row for a failed point. */
public final class SweepFiles {
    private SweepFiles() {
    }

    /**
     * One row of {@code sweep.csv}.
     *
     * @param point the point's folder name ({@code 001})
     * @param values the varied keys' values, in the order of the header's keys
     * @param strategy strategy name, {@code market}, or empty for a failed point
     * @param window window length; empty for the market and a failed point
     * @param volatility realised volatility, a year (NaN = empty cell)
     * @param sharpe Sharpe ratio, a year
     * @param meanTurnover mean turnover per rebalance
     * @param bias bias statistic
     * @param status ran, reused or failed
     * @param reason why the point failed; empty otherwise
     */
    public record Line(String point, List<String> values, String strategy, String window, double volatility,
                       double sharpe, double meanTurnover, double bias, String status, String reason) {
        public Line {
            Objects.requireNonNull(point, "point");
            values = List.copyOf(values);
            Objects.requireNonNull(strategy, "strategy");
            Objects.requireNonNull(window, "window");
            Objects.requireNonNull(status, "status");
            Objects.requireNonNull(reason, "reason");
        }
    }

    /**
     * Header {@code point,<one column per varied key>,strategy,window,volatility,sharpe,mean_turnover,bias,status,reason}.
     * Measures are copied from each point's {@code summary.csv}, so they carry the same digits.
     */
    public static void writeSweep(Path file, List<String> keys, List<Line> lines) {
        String[] header = new String[keys.size() + 9];
        header[0] = "point";
        for (int i = 0; i < keys.size(); i++) {
            header[i + 1] = keys.get(i);
        }
        String[] tail = {"strategy", "window", "volatility", "sharpe", "mean_turnover", "bias", "status", "reason"};
        System.arraycopy(tail, 0, header, keys.size() + 1, tail.length);
        try (CsvWriter csv = new CsvWriter(file, header)) {
            for (Line l : lines) {
                if (l.values().size() != keys.size()) {
                    throw new IllegalArgumentException("point " + l.point() + " has " + l.values().size()
                            + " values for " + keys.size() + " keys");
                }
                csv.text(l.point());
                l.values().forEach(csv::text);
                csv.text(l.strategy()).text(l.window()).number(l.volatility()).number(l.sharpe())
                        .number(l.meanTurnover()).number(l.bias()).text(l.status()).text(l.reason()).end();
            }
        }
    }
}
