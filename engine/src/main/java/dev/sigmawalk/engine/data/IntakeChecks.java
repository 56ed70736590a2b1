package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The checks run once the panel exists: completeness of the market and risk-free series over the
 * rows a study needs (an error), and the warnings of Method §1 and the study contract.
 */
final class IntakeChecks {
    /** A period return above +500 % is implausible for any listed asset. */
    static final double IMPLAUSIBLE_RETURN = 5.0;
    /**
     * A period return at or below −75 % (a price falling to a quarter or less) is most often a
     * split of 4-for-1 or more that the prices or returns do not adjust for, a change of unit or
     * a bad tick. Common practice, no source: real falls that deep in one period are rare enough
     * that a warning asking for a look costs the user little.
     */
    static final double COLLAPSE_RETURN = -0.75;
    /** A risk-free rate above 100 % a year is implausible. */
    static final double IMPLAUSIBLE_ANNUAL_RATE = 1.0;
    /**
     * A risk-free rate below −50 % a year is implausible: no deposit or bill rate has been near it
     * (common practice, from memory: the most negative policy rates were about −1 % a year), while
     * a rate of −1 per period would turn every excess return into r + 1.
     */
    static final double IMPLAUSIBLE_NEGATIVE_ANNUAL_RATE = -0.5;
    /** Method §1: the market "equals" the assets' mean when every row agrees within this. */
    static final double MEAN_MARKET_TOLERANCE = 1e-10;
    /** Decimal returns above this in size in most rows mean the file holds percent. */
    static final double PERCENT_MEDIAN = 0.5;
    /**
     * A market whose standard deviation is below this fraction of the median asset's is not an
     * index's returns. Common practice, no source: a broad equity index's volatility is of the
     * order of a half to one times a typical member's, never a hundredth of it.
     */
    static final double BARELY_VARYING_MARKET = 0.01;
    /**
     * A market whose standard deviation is above this multiple of the median asset's is not an
     * index's decimal returns either: percent returns (or returns ten times too large) beside
     * decimal assets divide every beta by that factor. Common practice, no source: an index
     * averages its members' idiosyncratic moves away, so it varies less than a typical member.
     */
    static final double FAR_MORE_VARYING_MARKET = 10;
    /** Fewer returns beyond ±100 % in a column are left to the +500 % warning. */
    static final int MANY_BEYOND_ONE = 3;

    private final ReturnPanel panel;
    private final ValueKind kind;
    private final int offset;
    private final List<String> warnings;
    private final PanelStats stats;

    /**
     * @param panel the panel, already cut at the end date
     * @param kind what the assets and market files hold
     * @param offset file rows before panel row 0 (1 with prices)
     * @param warnings where warnings are appended
     */
    IntakeChecks(ReturnPanel panel, ValueKind kind, int offset, List<String> warnings) {
        this.panel = panel;
        this.kind = kind;
        this.offset = offset;
        this.warnings = warnings;
        this.stats = PanelStats.of(panel, IMPLAUSIBLE_RETURN, COLLAPSE_RETURN, PERCENT_MEDIAN);
    }

    /** The counts the checks used, for the coverage report. */
    PanelStats stats() {
        return stats;
    }

    /**
     * Method §1: the series must have a value in every panel row from {@code firstNeeded}
     * (τ_0 − L_max + 1) to the last row.
     *
     * @param column where the series came from
     * @param seriesKind prices for a market read as prices; returns otherwise
     * @param perRow the series per panel row (may be longer than the cut panel)
     * @throws InputException at the empty cell that causes the first gap, or at the assets file's
     *                        line of the first needed date that the series' own file has no row for
     */
    void requireComplete(SeriesColumn column, ValueKind seriesKind, double[] perRow, int firstNeeded, int firstRebalance) {
        for (int t = firstNeeded; t < panel.rows(); t++) {
            if (Double.isNaN(perRow[t])) {
                int fileRow = t + offset;
                boolean earlierPrice = seriesKind == ValueKind.PRICES && !Double.isNaN(column.values()[fileRow]);
                int cellRow = earlierPrice ? fileRow - 1 : fileRow;
                int line = column.lines()[cellRow];
                String span = " on every date from " + panel.date(firstNeeded) + " (the start of the longest window"
                        + " before the first rebalance on " + panel.date(firstRebalance) + ") to "
                        + panel.date(panel.rows() - 1);
                if (line == 0 && column.joinedTo().isPresent()) {
                    throw column.noRow(cellRow, span);
                }
                String missing = line > 0 ? "'' is missing"
                        : "no row of the file gives '" + column.column() + "' the value for the return to " + panel.date(t);
                throw new InputException(new InputException.Location(column.file(), line, column.column()),
                        missing + (earlierPrice ? ", so the return to " + panel.date(t) + " cannot be computed" : "")
                                + "; the " + column.role() + " needs a value" + span);
            }
        }
    }

    /**
     * Refuses returns that are in percent: when most returns are above 0.5 in size (a median
     * |r| over 50 % a period, which no listed asset shows in decimal returns), the file holds
     * percent. Counting against 0.5 finds the median's side without sorting.
     */
    void requireDecimalScale(WideTable table, List<Integer> assetCols, List<Integer> kept) {
        if (kind != ValueKind.RETURNS || !(stats.largeCount * 2 > stats.presentCount)) {
            return;
        }
        int col = assetCols.get(kept.get(stats.firstLargeAsset));
        throw new InputException(new InputException.Location(table.file(), 0, null), String.format(Locale.ROOT,
                "%.0f %% of the returns are larger than %.1f in size (line %d, column '%s' holds %s), so the file"
                        + " looks like percent; expected decimal returns (0.012 for 1.2 %%): divide every value by 100",
                100.0 * stats.largeCount / stats.presentCount, PERCENT_MEDIAN, table.line(stats.firstLargeRow + offset, col),
                table.columns().get(col), panel.value(stats.firstLargeRow, stats.firstLargeAsset)));
    }

    /**
     * The same refusal for the market's returns: a market file of prices (or percent) beside
     * decimal returns of the assets passed every check, since its values are above −1, and made
     * every beta a thousandth of itself. The values kind is one for the assets and the market, so
     * the file is refused at the line of its first large value.
     */
    void requireMarketDecimalScale(SeriesColumn column) {
        if (kind != ValueKind.RETURNS) {
            return;
        }
        int present = 0;
        int large = 0;
        int first = -1;
        for (int t = 0; t < panel.rows(); t++) {
            double m = panel.market(t);
            if (m == m) {
                present++;
                if (Math.abs(m) > PERCENT_MEDIAN && large++ == 0) {
                    first = t;
                }
            }
        }
        if (large * 2 > present) {
            throw new InputException(new InputException.Location(column.file(), column.lines()[first + offset],
                    column.column()), String.format(Locale.ROOT, "%.0f %% of the market's returns are larger than %.1f"
                    + " in size (this one is %s), so the market looks like prices or percent; expected decimal returns"
                    + " (0.012 for 1.2 %%), as data.values: returns says for the assets and the market alike: divide"
                    + " percent by 100, or give prices in both with values: prices", 100.0 * large / present,
                    PERCENT_MEDIAN, panel.market(first)));
        }
    }

    /**
     * Warns about a column where more than a tenth of the returns (and at least three) exceed
     * 100 % in size: a mix of percent and decimal values, or prices given as returns.
     */
    void warnManyReturnsBeyondOne(WideTable table, List<Integer> assetCols, List<Integer> kept) {
        for (int k = 0; k < kept.size(); k++) {
            int beyond = stats.beyondOne[k];
            if (beyond >= MANY_BEYOND_ONE && beyond * 10 > stats.present[k]) {
                warnings.add(table.file().getFileName() + " column '" + table.columns().get(assetCols.get(kept.get(k)))
                        + "': " + beyond + " of " + stats.present[k] + " returns exceed 100 % in size in one period;"
                        + (kind == ValueKind.PRICES ? " check the prices" : " check that they are decimals, not percent"));
            }
        }
    }

    /** Warns once per column about period returns above +500 %, naming the first one. */
    void warnImplausibleReturns(WideTable table, List<Integer> assetCols, List<Integer> kept) {
        for (int k = 0; k < kept.size(); k++) {
            if (stats.aboveImplausible[k] > 0) {
                int col = assetCols.get(kept.get(k));
                warnings.add(outlier(table.file(), table.line(stats.firstImplausible[k] + offset, col),
                        table.columns().get(col), "a return of ", panel.value(stats.firstImplausible[k], k),
                        stats.aboveImplausible[k], " in this column"));
            }
        }
    }

    /** Warns once per column about period returns at or below −75 %, naming the first one. */
    void warnCollapsedReturns(WideTable table, List<Integer> assetCols, List<Integer> kept) {
        for (int k = 0; k < kept.size(); k++) {
            if (stats.collapsed[k] > 0) {
                int col = assetCols.get(kept.get(k));
                warnings.add(outlier(table.file(), table.line(stats.firstCollapse[k] + offset, col),
                        table.columns().get(col), "a return of ", panel.value(stats.firstCollapse[k], k),
                        stats.collapsed[k], " in this column"));
            }
        }
    }

    /**
     * Warns once per column about its longest run of returns exactly 0 when the run spans at
     * least {@code minRun} rows (half the shortest window, see {@link #staleRun}): a price that
     * stopped updating, or zeros written for missing values. Every window holding the run sees
     * too little variance, so the asset looks nearly riskless and minimum-variance weights pile
     * into it, with no other sign; a window that is all zeros is already left out (Method §2).
     */
    void warnStaleRuns(WideTable table, List<Integer> assetCols, List<Integer> kept, int minRun) {
        for (int k = 0; k < kept.size(); k++) {
            int length = stats.zeroRun[k];
            if (length >= minRun) {
                int end = stats.zeroRunEnd[k];
                int begin = end - length + 1;
                int col = assetCols.get(kept.get(k));
                warnings.add(table.file().getFileName() + " column '" + table.columns().get(col) + "': its return is"
                        + " exactly 0 in " + length + " consecutive rows, " + panel.date(begin) + " to " + panel.date(end)
                        + " (lines " + table.line(begin + offset, col) + " to " + table.line(end + offset, col) + "), at"
                        + " least half of the shortest window: a stale price, or zeros standing for missing values;"
                        + " every window holding them understates its risk, so minimum-variance weights favour it:"
                        + " leave the cells empty where the asset had no " + (kind == ValueKind.PRICES ? "price" : "return"));
            }
        }
    }

    /** Half the shortest window (rounded up), and at least 3 rows: the run {@link #warnStaleRuns} warns of. */
    static int staleRun(List<Integer> windows) {
        int shortest = windows.stream().mapToInt(Integer::intValue).min().orElseThrow();
        return Math.max(3, (shortest + 1) / 2);
    }

    /**
     * Warns of asset columns that hold the same series as an earlier one, the same return (or the
     * same gap) on every row: a column pasted twice under another name. The sample covariance is
     * then singular, and every other model and equal weight count the asset twice. Columns are
     * compared exactly, only where their hashes agree; each repeat is named once, with the first
     * column it repeats.
     */
    void warnRepeatedColumns(WideTable table, List<Integer> assetCols, List<Integer> kept) {
        Map<Long, List<Integer>> byHash = new HashMap<>();
        for (int k = 0; k < kept.size(); k++) {
            List<Integer> same = byHash.computeIfAbsent(stats.columnHash[k], h -> new ArrayList<>());
            for (int earlier : same) {
                if (sameColumn(earlier, k)) {
                    warnings.add(table.file().getFileName() + " column '" + table.columns().get(assetCols.get(kept.get(k)))
                            + "' holds the same return as column '" + table.columns().get(assetCols.get(kept.get(earlier)))
                            + "' on every row (a column pasted twice?): the sample covariance is singular with both, and"
                            + " every model and equal weight count that asset twice; remove one of them");
                    break;
                }
            }
            same.add(k);
        }
    }

    private boolean sameColumn(int a, int b) {
        for (int t = 0; t < panel.rows(); t++) {
            if (Double.doubleToLongBits(panel.value(t, a)) != Double.doubleToLongBits(panel.value(t, b))) {
                return false;
            }
        }
        return true;
    }

    /**
     * The same two warnings for the market's returns: a bad tick or an unadjusted level shift in
     * the index moves every beta, every single-index forecast and every tracking error.
     */
    void warnMarketOutliers(SeriesColumn column) {
        int above = 0;
        int firstAbove = -1;
        int below = 0;
        int firstBelow = -1;
        for (int t = 0; t < panel.rows(); t++) {
            double m = panel.market(t);
            if (m > IMPLAUSIBLE_RETURN && above++ == 0) {
                firstAbove = t;
            }
            if (m <= COLLAPSE_RETURN && below++ == 0) {
                firstBelow = t;
            }
        }
        if (above > 0) {
            warnings.add(outlier(column.file(), column.lines()[firstAbove + offset], column.column(),
                    "a market return of ", panel.market(firstAbove), above, ""));
        }
        if (below > 0) {
            warnings.add(outlier(column.file(), column.lines()[firstBelow + offset], column.column(),
                    "a market return of ", panel.market(firstBelow), below, ""));
        }
    }

    /**
     * One warning of a return above +500 % or at or below −75 %, at its line (the later price's
     * line with prices).
     *
     * @param count the rows beyond the same limit
     * @param where what the count covers, after "such rows"
     */
    private String outlier(Path file, int line, String column, String what, double r, int count, String where) {
        String unit = kind == ValueKind.PRICES ? "prices" : "returns";
        boolean up = r > 0;
        return file.getFileName() + " line " + line + ", column '" + column + "': " + what + r
                + (up ? " is above +500 % in one period" : " is a fall of 75 % or more in one period")
                + (count > 1 ? " (" + count + " such rows" + where + ")" : "") + "; "
                + (!up ? "check for a split or a change of unit that the " + unit + " do not adjust for, or a bad value"
                        : kind == ValueKind.PRICES ? "check the prices" : "check that returns are decimals, not percent");
    }

    /**
     * Warns about per-period risk-free rates worth more than 100 % a year, (1 + rf)^p − 1 > 1, and
     * about rates worth less than −50 % a year, each once, naming the first.
     */
    void warnImplausibleRiskFree(SeriesColumn column) {
        int p = panel.periodsPerYear();
        int high = 0;
        int firstHigh = -1;
        int low = 0;
        int firstLow = -1;
        for (int t = 0; t < panel.rows(); t++) {
            double annual = Math.pow(1.0 + panel.riskFree(t), p) - 1.0;
            if (annual > IMPLAUSIBLE_ANNUAL_RATE && high++ == 0) {
                firstHigh = t;
            }
            if (annual < IMPLAUSIBLE_NEGATIVE_ANNUAL_RATE && low++ == 0) {
                firstLow = t;
            }
        }
        if (high > 0) {
            warnings.add(implausibleRate(column, firstHigh, "above 100 %", high));
        }
        if (low > 0) {
            warnings.add(implausibleRate(column, firstLow, "below -50 %", low));
        }
    }

    private String implausibleRate(SeriesColumn column, int t, String limit, int count) {
        return column.file().getFileName() + " line " + column.lines()[t + offset] + ", column '" + column.column()
                + "': a risk-free rate of " + panel.riskFree(t) + " per period is " + limit + " a year"
                + (count > 1 ? " (" + count + " such rows)" : "") + "; rates must be per period and decimal";
    }

    /**
     * Method §1: warns when, in every row where the market and at least one asset have a
     * return, the market equals the mean of the assets' returns within 1e-10; the single-index
     * residuals then sum to zero across assets and the §8 tests are distorted.
     */
    void warnMarketIsAssetMean() {
        int compared = 0;
        for (int t = 0; t < panel.rows(); t++) {
            double m = panel.market(t);
            if (Double.isNaN(m)) {
                continue;
            }
            double sum = 0;
            int n = 0;
            for (int j = 0; j < panel.assetCount(); j++) {
                double r = panel.value(t, j);
                if (!Double.isNaN(r)) {
                    sum += r;
                    n++;
                }
            }
            if (n == 0) {
                continue;
            }
            if (!(Math.abs(sum / n - m) <= MEAN_MARKET_TOLERANCE)) {
                return;
            }
            compared++;
        }
        if (compared > 0) {
            warnings.add("the market '" + panel.marketName() + "' equals the mean of the assets' returns in every row;"
                    + " use an index measured on its own, or the residual tests are distorted (mean residual"
                    + " correlation near -1/(n-1))");
        }
    }

    /**
     * Warns when the market's standard deviation over the panel is positive but below
     * {@value #BARELY_VARYING_MARKET} of the median of the assets' (each over its own returns):
     * betas against such a series are enormous and mean nothing, while windows where it does not
     * vary at all are already refused by the models (Method §3). A rate or a stale series
     * standing in for an index's returns looks like this. Warns too when it is above
     * {@value #FAR_MORE_VARYING_MARKET} times that median: an index in percent beside decimal
     * assets, whose betas come out a hundred times too small.
     */
    void warnMarketScale() {
        double market = marketStandardDeviation();
        double[] sd = assetStandardDeviations();
        int counted = 0;
        for (double s : sd) {
            if (!Double.isNaN(s)) {
                sd[counted++] = s;
            }
        }
        if (counted == 0 || !(market > 0)) {
            return;
        }
        double[] kept = java.util.Arrays.copyOf(sd, counted);
        java.util.Arrays.sort(kept);
        double median = counted % 2 == 1 ? kept[counted / 2] : (kept[counted / 2 - 1] + kept[counted / 2]) / 2;
        if (market < BARELY_VARYING_MARKET * median) {
            warnings.add(String.format(Locale.ROOT, "the market '%s' barely varies: its returns' standard deviation is"
                    + " %.3g per period against a median of %.3g for the assets (%.2g %% of it); betas measured"
                    + " against it are enormous and mean nothing: check that the column holds an index's returns,"
                    + " not a rate or a stale series", panel.marketName(), market, median, 100 * market / median));
        } else if (market > FAR_MORE_VARYING_MARKET * median) {
            warnings.add(String.format(Locale.ROOT, "the market '%s' varies far more than the assets: its returns'"
                    + " standard deviation is %.3g per period against a median of %.3g for the assets (%.3g times it),"
                    + " while an index varies less than a typical member; betas measured against it are too small by"
                    + " about that factor: check that the market holds decimal returns, not percent, in the units of"
                    + " the assets", panel.marketName(), market, median, market / median));
        }
    }

    /**
     * Every asset's sample standard deviation (divisor n − 1) over its non-missing returns, NaN
     * below two: two passes over the rows in storage order (means, then squared deviations), so
     * a wide file is read the way it lies in memory.
     */
    private double[] assetStandardDeviations() {
        int n = panel.assetCount();
        double[] r = panel.rawReturns();
        double[] sum = new double[n];
        int[] count = new int[n];
        for (int t = 0, at = 0; t < panel.rows(); t++) {
            for (int j = 0; j < n; j++, at++) {
                double v = r[at];
                if (v == v) {
                    sum[j] += v;
                    count[j]++;
                }
            }
        }
        double[] mean = new double[n];
        for (int j = 0; j < n; j++) {
            mean[j] = sum[j] / count[j];
        }
        double[] squares = new double[n];
        for (int t = 0, at = 0; t < panel.rows(); t++) {
            for (int j = 0; j < n; j++, at++) {
                double v = r[at];
                if (v == v) {
                    double d = v - mean[j];
                    squares[j] += d * d;
                }
            }
        }
        double[] sd = new double[n];
        for (int j = 0; j < n; j++) {
            sd[j] = count[j] < 2 ? Double.NaN : Math.sqrt(squares[j] / (count[j] - 1));
        }
        return sd;
    }

    /** The market's sample standard deviation over its non-missing returns, NaN below two. */
    private double marketStandardDeviation() {
        double sum = 0;
        int count = 0;
        for (int t = 0; t < panel.rows(); t++) {
            double v = panel.market(t);
            if (!Double.isNaN(v)) {
                sum += v;
                count++;
            }
        }
        if (count < 2) {
            return Double.NaN;
        }
        double mean = sum / count;
        double squares = 0;
        for (int t = 0; t < panel.rows(); t++) {
            double v = panel.market(t);
            if (!Double.isNaN(v)) {
                squares += (v - mean) * (v - mean);
            }
        }
        return Math.sqrt(squares / (count - 1));
    }
}
