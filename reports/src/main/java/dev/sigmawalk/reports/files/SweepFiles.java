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
     * @param comparison the row's comparison with its baseline over the grid
     */
    public record Line(String point, List<String> values, String strategy, String window, double volatility,
                       double sharpe, double meanTurnover, double bias, String status, String reason,
                       Comparison comparison) {
        public Line {
            Objects.requireNonNull(point, "point");
            values = List.copyOf(values);
            Objects.requireNonNull(strategy, "strategy");
            Objects.requireNonNull(window, "window");
            Objects.requireNonNull(status, "status");
            Objects.requireNonNull(reason, "reason");
            Objects.requireNonNull(comparison, "comparison");
        }
    }

    /**
     * A row's variance comparison in the grid's family (Method §9).
     *
     * @param baseline the strategy it was compared with in its point's {@code tests.csv}; empty for none
     * @param familyPValue Romano-Wolf adjusted over the grid family on the common dates (NaN = empty cell)
     * @param holmPValue Holm-adjusted over every comparison of the grid, each on its own period
     * @param note why a compared row has no family p-value; empty otherwise
     */
    public record Comparison(String baseline, double familyPValue, double holmPValue, String note) {
        /** A row that is not compared with anything. */
        public static final Comparison NONE = new Comparison("", Double.NaN, Double.NaN, "");

        public Comparison {
            Objects.requireNonNull(baseline, "baseline");
            Objects.requireNonNull(note, "note");
        }
    }

    /**
     * Header {@code point,<one column per varied key>,strategy,window,volatility,sharpe,mean_turnover,bias,status,reason,
     * baseline,family_pvalue,holm_pvalue,family_note}. Measures are copied from each point's
     * {@code summary.csv}, so they carry the same digits.
     */
    public static void writeSweep(Path file, List<String> keys, List<Line> lines) {
        String[] header = new String[keys.size() + 13];
        header[0] = "point";
        for (int i = 0; i < keys.size(); i++) {
            header[i + 1] = keys.get(i);
        }
        String[] tail = {"strategy", "window", "volatility", "sharpe", "mean_turnover", "bias", "status", "reason",
            "baseline", "family_pvalue", "holm_pvalue", "family_note"};
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
                        .number(l.meanTurnover()).number(l.bias()).text(l.status()).text(l.reason())
                        .text(l.comparison().baseline()).number(l.comparison().familyPValue())
                        .number(l.comparison().holmPValue()).text(l.comparison().note()).end();
            }
        }
    }
}
