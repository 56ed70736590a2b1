package dev.sigmawalk.engine.data;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.HashMap;
import java.util.Objects;

/**
 * An immutable table of per-period simple returns: rows are dates (strictly increasing), columns
 * are assets; the market's total simple return and the per-period risk-free rate sit beside it.
 * Row t holds the return over (d_{t-1}, d_t]. A missing return is {@code NaN}. Values are held in
 * one primitive array, row-major, about 8 bytes a cell.
 *
 * <p>Arrays passed in are copied; accessors never expose internal arrays for writing except
 * {@link #rawReturns()}, which is documented as read-only for the hot path.
 */
public final class ReturnPanel {
    private final LocalDate[] dates;
    private final List<String> assets;
    private final Map<String, Integer> assetIndex;
    private final double[] returns;
    private final double[] market;
    private final double[] riskFree;
    private final String marketName;
    private final int periodsPerYear;

    /**
     * @param dates strictly increasing dates, one per row
     * @param assets distinct asset ids, one per column
     * @param returns row-major rows × assets simple returns, NaN where missing
     * @param market market simple return per row (NaN only outside the rows a study uses)
     * @param riskFree per-period risk-free simple rate per row
     * @param marketName the market series' name, shown in reports
     * @param periodsPerYear periods per year (252, 52, 12, 4 or 1, or as given)
     */
    public ReturnPanel(LocalDate[] dates, List<String> assets, double[] returns, double[] market,
                       double[] riskFree, String marketName, int periodsPerYear) {
        this(dates, assets, returns, market, riskFree, marketName, periodsPerYear, true);
    }

    /**
     * A panel that takes ownership of {@code returns} instead of copying it: intake hands over
     * the array it has just filled, so a large file's values exist once rather than twice.
     * The caller must not keep or write the array.
     */
    static ReturnPanel owning(LocalDate[] dates, List<String> assets, double[] returns, double[] market,
                              double[] riskFree, String marketName, int periodsPerYear) {
        return new ReturnPanel(dates, assets, returns, market, riskFree, marketName, periodsPerYear, false);
    }

    private ReturnPanel(LocalDate[] dates, List<String> assets, double[] returns, double[] market,
                        double[] riskFree, String marketName, int periodsPerYear, boolean copy) {
        Objects.requireNonNull(dates, "dates");
        Objects.requireNonNull(assets, "assets");
        int rows = dates.length;
        int cols = assets.size();
        if (returns.length != rows * cols) {
            throw new IllegalArgumentException("returns length (" + returns.length + ") must be rows*assets ("
                    + rows + "*" + cols + ")");
        }
        if (market.length != rows || riskFree.length != rows) {
            throw new IllegalArgumentException("market (" + market.length + ") and riskfree (" + riskFree.length
                    + ") must have one value per row (" + rows + ")");
        }
        if (!(periodsPerYear > 0)) {
            throw new IllegalArgumentException("periodsPerYear (" + periodsPerYear + ") must be > 0");
        }
        for (int t = 1; t < rows; t++) {
            if (!dates[t].isAfter(dates[t - 1])) {
                throw new IllegalArgumentException("dates must be strictly increasing: " + dates[t - 1] + " then " + dates[t]);
            }
        }
        Map<String, Integer> index = new HashMap<>();
        for (int j = 0; j < cols; j++) {
            if (index.put(assets.get(j), j) != null) {
                throw new IllegalArgumentException("duplicate asset id '" + assets.get(j) + "'");
            }
        }
        this.dates = dates.clone();
        this.assets = Collections.unmodifiableList(new ArrayList<>(assets));
        this.assetIndex = Collections.unmodifiableMap(index);
        this.returns = copy ? returns.clone() : returns;
        this.market = market.clone();
        this.riskFree = riskFree.clone();
        this.marketName = Objects.requireNonNull(marketName, "marketName");
        this.periodsPerYear = periodsPerYear;
    }

    public int rows() {
        return dates.length;
    }

    public int assetCount() {
        return assets.size();
    }

    public LocalDate date(int row) {
        return dates[row];
    }

    /** A copy of the dates. */
    public LocalDate[] dates() {
        return dates.clone();
    }

    public List<String> assets() {
        return assets;
    }

    /** Column of an asset id, or -1 when absent. */
    public int assetColumn(String id) {
        Integer i = assetIndex.get(id);
        return i == null ? -1 : i;
    }

    /** Simple return of asset column {@code col} in row {@code row}; NaN when missing. */
    public double value(int row, int col) {
        return returns[row * assets.size() + col];
    }

    /** Market simple return in row {@code row}. */
    public double market(int row) {
        return market[row];
    }

    /** Per-period risk-free simple rate in row {@code row}. */
    public double riskFree(int row) {
        return riskFree[row];
    }

    /**
     * The internal row-major array, for hot loops that must not copy. Read-only by contract:
     * writing to it breaks the panel's immutability.
     */
    public double[] rawReturns() {
        return returns;
    }

    public String marketName() {
        return marketName;
    }

    public int periodsPerYear() {
        return periodsPerYear;
    }

    /** First row whose date is on or after {@code date}, or {@code rows()} when none. */
    public int firstRowOnOrAfter(LocalDate date) {
        int lo = 0;
        int hi = dates.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (dates[mid].isBefore(date)) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** A panel holding only rows 0..lastRow inclusive (used for `end:`). */
    public ReturnPanel truncateAfter(int lastRow) {
        int rows = lastRow + 1;
        int cols = assets.size();
        double[] r = new double[rows * cols];
        System.arraycopy(returns, 0, r, 0, r.length);
        double[] m = new double[rows];
        double[] f = new double[rows];
        System.arraycopy(market, 0, m, 0, rows);
        System.arraycopy(riskFree, 0, f, 0, rows);
        LocalDate[] d = new LocalDate[rows];
        System.arraycopy(dates, 0, d, 0, rows);
        return new ReturnPanel(d, assets, r, m, f, marketName, periodsPerYear);
    }
}
