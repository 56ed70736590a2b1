package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Objects;
import java.util.TreeMap;

/**
 * A user's per-period alphas by asset and date (Method §4): the single-index expected return of
 * asset i at rebalance τ uses the latest alpha dated on or before τ, and 0 where none is given.
 * Immutable; lookups are a binary search over the asset's dates.
 */
public final class AlphaTable {
    private static final AlphaTable EMPTY = new AlphaTable(Map.of(), Optional.empty(), Optional.empty());
    private static final List<String> HEADER = List.of("date", "asset", "alpha");

    private final Map<String, Series> byAsset;
    private final Optional<Entry> highest;
    private final Optional<Entry> lowest;

    private record Series(LocalDate[] dates, double[] alphas) {
    }

    /**
     * One row of the file.
     *
     * @param line its line in the file
     */
    public record Entry(LocalDate date, String asset, double alpha, int line) {
        public Entry {
            Objects.requireNonNull(date, "date");
            Objects.requireNonNull(asset, "asset");
        }
    }

    private AlphaTable(Map<String, Series> byAsset, Optional<Entry> highest, Optional<Entry> lowest) {
        this.byAsset = byAsset;
        this.highest = highest;
        this.lowest = lowest;
    }

    /** The table with no alphas: {@link #latest} is 0 everywhere. */
    public static AlphaTable empty() {
        return EMPTY;
    }

    /**
     * The alpha of {@code asset} dated latest on or before {@code onOrBefore}; 0 when the asset
     * has none dated that early (or none at all).
     */
    public double latest(String asset, LocalDate onOrBefore) {
        Series s = byAsset.get(asset);
        if (s == null) {
            return 0.0;
        }
        int i = Arrays.binarySearch(s.dates, onOrBefore);
        int at = i >= 0 ? i : -i - 2;
        return at >= 0 ? s.alphas[at] : 0.0;
    }

    /** The assets that have at least one alpha, sorted. */
    public List<String> assets() {
        List<String> out = new ArrayList<>(byAsset.keySet());
        Collections.sort(out);
        return out;
    }

    /** The earliest date of any alpha; empty for a table with none. */
    public Optional<LocalDate> firstDate() {
        return byAsset.values().stream().map(s -> s.dates[0]).min(Comparator.naturalOrder());
    }

    /** The row with the largest alpha (the first in file order among equals); empty for a table with none. */
    public Optional<Entry> highest() {
        return highest;
    }

    /** The row with the smallest alpha (the first in file order among equals); empty for a table with none. */
    public Optional<Entry> lowest() {
        return lowest;
    }

    /** Number of (date, asset) entries. */
    public int size() {
        return byAsset.values().stream().mapToInt(s -> s.dates.length).sum();
    }

    /**
     * Reads a long CSV with the header {@code date,asset,alpha} (per-period alphas, decimal). Rows
     * may come in any order; a repeated (date, asset) pair, a non-ISO date, an empty asset or a
     * missing or non-numeric alpha is an input error naming file, line, column and value.
     */
    public static AlphaTable read(Path file) {
        Map<String, TreeMap<LocalDate, Double>> collected = new HashMap<>();
        Entry high = null;
        Entry low = null;
        try (CsvSource source = CsvSource.open(file)) {
            LongCsv.requireHeader(source, HEADER);
            String[] cells;
            int rows = 0;
            while ((cells = source.next()) != null) {
                int line = source.line();
                LongCsv.requireWidth(source, cells, HEADER.size(), line);
                LocalDate date = Cells.date(cells[0], file, line, "date");
                String asset = LongCsv.requireText(source, cells[1], line, "asset");
                double alpha = Cells.number(cells[2], file, line, "alpha");
                if (Double.isNaN(alpha)) {
                    throw new InputException(new InputException.Location(file, line, "alpha"),
                            "'' is empty; expected a per-period alpha such as 0.001");
                }
                requirePlausible(alpha, cells[2], file, line);
                if (collected.computeIfAbsent(asset, a -> new TreeMap<>()).put(date, alpha) != null) {
                    throw new InputException(new InputException.Location(file, line, "date"),
                            "'" + cells[0] + "' repeats an alpha for asset '" + asset + "' on that date");
                }
                rows++;
                if (high == null || alpha > high.alpha()) {
                    high = new Entry(date, asset, alpha, line);
                }
                if (low == null || alpha < low.alpha()) {
                    low = new Entry(date, asset, alpha, line);
                }
            }
            if (rows == 0) {
                throw new InputException(new InputException.Location(file, 1, null),
                        "the header has no rows below it; expected rows of date,asset,alpha");
            }
        }
        Map<String, Series> byAsset = new HashMap<>();
        collected.forEach((asset, series) -> {
            LocalDate[] dates = series.keySet().toArray(new LocalDate[0]);
            double[] alphas = series.values().stream().mapToDouble(Double::doubleValue).toArray();
            byAsset.put(asset, new Series(dates, alphas));
        });
        return new AlphaTable(Collections.unmodifiableMap(byAsset), Optional.ofNullable(high), Optional.ofNullable(low));
    }

    @Override
    public String toString() {
        return "AlphaTable[" + byAsset.size() + " assets, " + size() + " alphas]";
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof AlphaTable other) || !other.byAsset.keySet().equals(byAsset.keySet())) {
            return false;
        }
        for (Map.Entry<String, Series> e : byAsset.entrySet()) {
            Series mine = e.getValue();
            Series theirs = other.byAsset.get(e.getKey());
            if (!Arrays.equals(mine.dates, theirs.dates) || !Arrays.equals(mine.alphas, theirs.alphas)) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        return Objects.hash(byAsset.keySet(), size());
    }

    /**
     * An alpha is a per-period expected return, so it obeys the bounds of a return (Method §1):
     * above {@link Cells#LARGEST_RETURN} the mean-variance problem's linear term swamps the risk
     * term and the solver's own checks fail, and below -1 it is a loss of more than everything.
     */
    private static void requirePlausible(double alpha, String cell, Path file, int line) {
        if (alpha > Cells.LARGEST_RETURN) {
            throw new InputException(new InputException.Location(file, line, "alpha"), "'" + cell
                    + "' is an alpha above 1e12 per period, more than any asset earns; expected a per-period decimal"
                    + " alpha such as 0.001");
        }
        if (alpha < -1) {
            throw new InputException(new InputException.Location(file, line, "alpha"), "'" + cell
                    + "' is an alpha below -1 per period, a loss of more than everything; expected a per-period"
                    + " decimal alpha such as 0.001 (if the file holds percent, divide every value by 100)");
        }
    }
}
